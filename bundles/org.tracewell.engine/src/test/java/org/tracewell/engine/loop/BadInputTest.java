package org.tracewell.engine.loop;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracewell.engine.tf.TransferFunction;

class BadInputTest {

    @Test
    void improperForwardPathIsRejected() {
        TransferFunction improper = TransferFunction.ofDescending(new double[] {1, 2, 3}, new double[] {1, 1});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LoopAnalyzer.analyze(improper, null));
        assertTrue(e.getMessage().contains("improper"), e.getMessage());
    }

    @Test
    void algebraicLoopIsRejected() {
        // L = −s/(s+1): 1 + L = 1/(s+1), the closed loop s·(…) is improper.
        TransferFunction l = TransferFunction.ofDescending(new double[] {-1, 0}, new double[] {1, 1});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LoopAnalyzer.analyze(l, null));
        assertTrue(e.getMessage().contains("algebraic loop"), e.getMessage());
    }

    @Test
    void allZeroAndNonFiniteCoefficientsAreRejected() {
        assertThrows(IllegalArgumentException.class,
                () -> TransferFunction.ofDescending(new double[] {0, 0}, new double[] {1, 1}));
        assertThrows(IllegalArgumentException.class,
                () -> TransferFunction.ofDescending(new double[] {1}, new double[] {1, Double.NaN}));
        assertThrows(IllegalArgumentException.class,
                () -> TransferFunction.ofDescending(new double[] {}, new double[] {1}));
    }
}
