package org.tracewell.model.units;

import java.util.Objects;

/**
 * A unit a value can be shown or entered in, with its exact relation to the SI unit the model stores.
 *
 * @param symbol    the unit as printed, e.g. {@code (m/min)/mm}
 * @param siSymbol  the SI unit of the same quantity, e.g. {@code 1/s}
 * @param siPerUnit how many SI units one of this unit is (linear units); for {@code dB} the reference ratio 1
 * @param decibel   true for the logarithmic amplitude ratio 20·log10(ratio)
 * @param minFractionDigits decimals always shown (trade habit: a gain of 3 (m/min)/mm is written 3.0)
 */
public record TradeUnit(String symbol, String siSymbol, double siPerUnit, boolean decibel, int minFractionDigits) {

    public TradeUnit {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(siSymbol, "siSymbol");
        if (!(siPerUnit > 0) || Double.isInfinite(siPerUnit)) {
            throw new IllegalArgumentException("siPerUnit of " + symbol + " must be finite and > 0, was " + siPerUnit);
        }
        if (minFractionDigits < 0) {
            throw new IllegalArgumentException("minFractionDigits of " + symbol + " must be >= 0, was " + minFractionDigits);
        }
    }

    /** Converts a value given in this unit to the SI unit. */
    public double toSi(double value) {
        return decibel ? Math.pow(10.0, value / 20.0) : value * siPerUnit;
    }

    /** Converts an SI value to this unit. */
    public double fromSi(double siValue) {
        return decibel ? 20.0 * Math.log10(siValue) : siValue / siPerUnit;
    }

    /** True when both units measure the same quantity, so a value can be converted between them. */
    public boolean isCompatibleWith(TradeUnit other) {
        return siSymbol.equals(other.siSymbol);
    }
}
