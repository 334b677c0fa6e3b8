package org.tracewell.engine.axis;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * A filter stage in the torque-command path of the velocity controller, unity gain at DC.
 * Frequencies in rad/s.
 */
public sealed interface FilterStage {

    /** The filter as a transfer function. */
    TransferFunction transferFunction();

    /** First-order low-pass ω/(s + ω). */
    record LowPass1(double cornerRadPerSec) implements FilterStage {
        public LowPass1 {
            Checks.positive("low-pass corner frequency", cornerRadPerSec, "rad/s");
        }

        @Override
        public TransferFunction transferFunction() {
            return TransferFunction.of(Polynomial.constant(cornerRadPerSec), Polynomial.ofAscending(cornerRadPerSec, 1));
        }
    }

    /** Second-order low-pass ω²/(s² + 2ζω s + ω²). */
    record LowPass2(double cornerRadPerSec, double dampingRatio) implements FilterStage {
        public LowPass2 {
            Checks.positive("low-pass corner frequency", cornerRadPerSec, "rad/s");
            Checks.positive("low-pass damping ratio", dampingRatio, "");
        }

        @Override
        public TransferFunction transferFunction() {
            double w = cornerRadPerSec;
            return TransferFunction.of(Polynomial.constant(w * w),
                    Polynomial.ofAscending(w * w, 2 * dampingRatio * w, 1));
        }
    }

    /**
     * Notch (s² + 2·d·ζ·ω s + ω²)/(s² + 2ζω s + ω²) with ζ = width/(2ω): {@code widthRadPerSec} is the
     * −3 dB width of the full-depth notch, {@code depth} the gain left at the centre (0 = full notch,
     * 0.1 = −20 dB), in [0, 1).
     */
    record Notch(double centreRadPerSec, double widthRadPerSec, double depth) implements FilterStage {
        public Notch {
            Checks.positive("notch centre frequency", centreRadPerSec, "rad/s");
            Checks.positive("notch width", widthRadPerSec, "rad/s");
            if (!(depth >= 0 && depth < 1)) {
                throw new IllegalArgumentException("notch depth (gain left at the centre) must lie in [0, 1), got "
                        + depth);
            }
        }

        @Override
        public TransferFunction transferFunction() {
            double w = centreRadPerSec;
            double twoZetaW = widthRadPerSec; // 2ζω = width
            return TransferFunction.of(Polynomial.ofAscending(w * w, depth * twoZetaW, 1),
                    Polynomial.ofAscending(w * w, twoZetaW, 1));
        }
    }

    /**
     * Lead/lag (s/ω_z + 1)/(s/ω_p + 1): a lead when ω_p &gt; ω_z (phase up to asin((α−1)/(α+1)) at
     * √(ω_z·ω_p), α = ω_p/ω_z), a lag when ω_p &lt; ω_z.
     */
    record LeadLag(double zeroRadPerSec, double poleRadPerSec) implements FilterStage {
        public LeadLag {
            Checks.positive("lead/lag zero frequency", zeroRadPerSec, "rad/s");
            Checks.positive("lead/lag pole frequency", poleRadPerSec, "rad/s");
        }

        @Override
        public TransferFunction transferFunction() {
            return TransferFunction.of(Polynomial.ofAscending(1, 1 / zeroRadPerSec),
                    Polynomial.ofAscending(1, 1 / poleRadPerSec));
        }
    }
}
