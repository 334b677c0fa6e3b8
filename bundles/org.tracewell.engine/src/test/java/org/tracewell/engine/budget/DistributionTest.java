package org.tracewell.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.BetaDistribution;
import org.apache.commons.math3.distribution.TriangularDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.junit.jupiter.api.Test;

class DistributionTest {

    private static final double A = 3e-6;

    @Test
    void gumConversionsOfAStatedValueToAStandardUncertainty() {
        // JCGM 100:2008 §4.3 (from memory): normal U = k·u so u = U/k; rectangular ±a → a/√3 (§4.3.7);
        // triangular ±a → a/√6 (§4.3.9); rounding to step q → q/√12 (F.2.2.1); arcsine ±a → a/√2
        // (EA-4/02, from memory). Tolerance: relative 1e-15 (one rounding).
        assertEquals(A / 2.0, Distribution.NORMAL.standardUncertainty(A, 2.0), 1e-15 * A);
        assertEquals(A / 3.0, Distribution.NORMAL.standardUncertainty(A, 3.0), 1e-15 * A);
        assertEquals(A / Math.sqrt(3.0), Distribution.UNIFORM.standardUncertainty(A, 2.0), 1e-15 * A);
        assertEquals(A / Math.sqrt(2.0), Distribution.U_SHAPED.standardUncertainty(A, 2.0), 1e-15 * A);
        assertEquals(A / Math.sqrt(12.0), Distribution.QUANTISATION.standardUncertainty(A, 2.0), 1e-15 * A);
        assertEquals(A / Math.sqrt(6.0), Distribution.TRIANGULAR.standardUncertainty(A, 2.0), 1e-15 * A);
    }

    @Test
    void conversionsAgreeWithTheVarianceOfTheDistributions() {
        // Independent numerics: variances from Commons Math distributions of the stated shapes.
        double uniform = Math.sqrt(new UniformRealDistribution(-A, A).getNumericalVariance());
        double rounding = Math.sqrt(new UniformRealDistribution(-A / 2, A / 2).getNumericalVariance());
        double triangular = Math.sqrt(new TriangularDistribution(-A, 0.0, A).getNumericalVariance());
        // Arcsine on ±a = 2a·Beta(½, ½) − a, so σ = 2a·σ_Beta.
        double arcsine = 2.0 * A * Math.sqrt(new BetaDistribution(0.5, 0.5).getNumericalVariance());
        assertEquals(uniform, Distribution.UNIFORM.standardUncertainty(A, 2.0), 1e-12 * A);
        assertEquals(rounding, Distribution.QUANTISATION.standardUncertainty(A, 2.0), 1e-12 * A);
        assertEquals(triangular, Distribution.TRIANGULAR.standardUncertainty(A, 2.0), 1e-12 * A);
        assertEquals(arcsine, Distribution.U_SHAPED.standardUncertainty(A, 2.0), 1e-12 * A);
    }

    @Test
    void signOfTheValueIsIgnored() {
        assertEquals(A / Math.sqrt(3.0), Distribution.UNIFORM.standardUncertainty(-A, 2.0), 1e-15 * A);
    }

    @Test
    void badCoverageFactorIsRejectedWithItsValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Distribution.NORMAL.standardUncertainty(A, 0.0));
        assertTrue(e.getMessage().contains("coverage factor k = 0.0"), e.getMessage());
        assertTrue(e.getMessage().contains("> 0"), e.getMessage());
    }

    @Test
    void everyDistributionStatesItsConversion() {
        for (Distribution distribution : Distribution.values()) {
            assertTrue(distribution.conversion().startsWith("u = "), distribution.name());
            assertTrue(distribution.valueMeaning().startsWith("value = "), distribution.name());
        }
    }
}
