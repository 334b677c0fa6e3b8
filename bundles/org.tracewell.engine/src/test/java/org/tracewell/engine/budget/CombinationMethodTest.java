package org.tracewell.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class CombinationMethodTest {

    private static final double UM = 1e-6;

    private static List<CombinationTerm> terms(ErrorClass errorClass, double... micrometres) {
        return Arrays.stream(micrometres).mapToObj(v -> new CombinationTerm(v * UM, errorClass)).toList();
    }

    @Test
    void slocumExampleLinearRssAndMean() {
        List<CombinationTerm> terms = terms(ErrorClass.SYSTEMATIC, 5, 3, 2, 1);
        // DOMAIN.md §6 example {5, 3, 2, 1} µm, [der] recomputed: 5+3+2+1 = 11, √39 = 6.2450, (11+√39)/2 = 8.6225;
        // the mean of linear and RSS as a "probable" figure after Slocum, Precision Machine Design 1992 (from memory).
        // Tolerance 0.0005 µm: the published figures are rounded to 3 decimals.
        assertEquals(11.0, CombinationMethod.LINEAR_SUM.combine(terms) / UM, 1e-12);
        assertEquals(6.245, CombinationMethod.RSS.combine(terms) / UM, 5e-4);
        assertEquals(8.622, CombinationMethod.MEAN_OF_LINEAR_AND_RSS.combine(terms) / UM, 5e-4);
        // Exact values to rounding (independent arithmetic: √39).
        assertEquals(Math.sqrt(39.0), CombinationMethod.RSS.combine(terms) / UM, 1e-12);
    }

    @Test
    void systematicPlusRssAddsSystematicLinesAndRootSumsRandomOnes() {
        List<CombinationTerm> terms = new java.util.ArrayList<>(terms(ErrorClass.SYSTEMATIC, 5, 3));
        terms.addAll(terms(ErrorClass.RANDOM, 2, 1));
        // DOMAIN.md §6 conservative total Σ|systematic| + √(Σ random²) (Slocum 1992, from memory):
        // 5 + 3 + √(4 + 1) = 10.2361 µm [der].
        assertEquals(8.0 + Math.sqrt(5.0), CombinationMethod.SYSTEMATIC_PLUS_RSS.combine(terms) / UM, 1e-12);
        // With only systematic lines it is the linear sum; with only random lines it is the RSS.
        assertEquals(11.0, CombinationMethod.SYSTEMATIC_PLUS_RSS.combine(terms(ErrorClass.SYSTEMATIC, 5, 3, 2, 1))
                / UM, 1e-12);
        assertEquals(Math.sqrt(39.0), CombinationMethod.SYSTEMATIC_PLUS_RSS.combine(
                terms(ErrorClass.RANDOM, 5, 3, 2, 1)) / UM, 1e-12);
    }

    @ParameterizedTest
    @EnumSource(CombinationMethod.class)
    void portionsAddUpToTheTotal(CombinationMethod method) {
        List<CombinationTerm> terms = new java.util.ArrayList<>(terms(ErrorClass.SYSTEMATIC, 4, 0.5));
        terms.addAll(terms(ErrorClass.RANDOM, 3, 2, 0));
        double sum = Arrays.stream(method.portions(terms)).sum();
        // Identity of the portion definition; tolerance: a few ulps of a µm-sized total.
        assertEquals(method.combine(terms), sum, 1e-18);
    }

    @ParameterizedTest
    @EnumSource(CombinationMethod.class)
    void homogeneousOfDegreeOne(CombinationMethod method) {
        List<CombinationTerm> terms = new java.util.ArrayList<>(terms(ErrorClass.SYSTEMATIC, 4, 1));
        terms.addAll(terms(ErrorClass.RANDOM, 3, 2));
        List<CombinationTerm> scaled = terms.stream()
                .map(t -> new CombinationTerm(7.5 * t.magnitude(), t.errorClass())).toList();
        // Property the closed-form apportionment relies on: M(λ·c) = λ·M(c).
        assertEquals(7.5 * method.combine(terms), method.combine(scaled), 1e-18);
    }

    @ParameterizedTest
    @EnumSource(CombinationMethod.class)
    void noTermsGiveZero(CombinationMethod method) {
        assertEquals(0.0, method.combine(List.of()));
        assertEquals(0, method.portions(List.of()).length);
    }

    @Test
    void rssOfHugeAndTinyTermsNeitherOverflowsNorUnderflows() {
        List<CombinationTerm> huge = List.of(new CombinationTerm(3e200, ErrorClass.RANDOM),
                new CombinationTerm(4e200, ErrorClass.RANDOM));
        List<CombinationTerm> tiny = List.of(new CombinationTerm(3e-200, ErrorClass.RANDOM),
                new CombinationTerm(4e-200, ErrorClass.RANDOM));
        // 3-4-5 triangle; a naive Σc² would overflow / underflow.
        assertEquals(5e200, CombinationMethod.RSS.combine(huge), 1e186);
        assertEquals(5e-200, CombinationMethod.RSS.combine(tiny), 1e-214);
    }

    @Test
    void everyMethodPrintsItsNameFormulaAndCoverageConvention() {
        for (CombinationMethod method : CombinationMethod.values()) {
            assertTrue(method.description().contains("T ="), method + " description lacks its formula");
            assertTrue(method.printable().startsWith(method.displayName()));
            assertTrue(method.printable().contains("k·u"), method + " printable lacks the coverage convention");
        }
        assertTrue(CombinationMethod.RSS.description().contains("√(Σ c_i²)"));
        assertTrue(CombinationMethod.SYSTEMATIC_PLUS_RSS.description().contains("Σ |systematic c_i|"));
    }
}
