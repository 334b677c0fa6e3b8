package org.tracewell.engine.poly;

import java.util.Arrays;
import java.util.regex.Pattern;

/**
 * Reads polynomial coefficients typed by a user: descending powers of s, separated by spaces
 * and/or commas ("0.003 1 0" is 0.003·s² + s). Shared by the command line and the workbench so
 * both accept and reject exactly the same text.
 */
public final class CoefficientText {

    private static final Pattern SEPARATORS = Pattern.compile("[\\s,]+");
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private CoefficientText() {
    }

    /**
     * @param what names the field in messages, e.g. "--num" or "Numerator"
     * @throws IllegalArgumentException naming {@code what}, the bad token and what is expected
     */
    public static Polynomial parse(String what, String text) {
        String trimmed = text == null ? "" : text.trim();
        if (trimmed.isEmpty()) {
            throw new IllegalArgumentException(what + " is empty; give coefficients in descending powers of s, e.g. \"1 15 0\"");
        }
        double[] values = Arrays.stream(SEPARATORS.split(trimmed))
                .filter(token -> !token.isEmpty())
                .mapToDouble(token -> parseNumber(what, token))
                .toArray();
        if (values.length == 0) {
            throw new IllegalArgumentException(what + " \"" + text + "\" holds no coefficients");
        }
        Polynomial p = Polynomial.ofDescending(values);
        if (p.isZero()) {
            throw new IllegalArgumentException(what + " \"" + trimmed + "\" is all zero; give at least one non-zero coefficient");
        }
        return p;
    }

    /** One finite decimal number, with the same rules and messages as the coefficients. */
    public static double parseNumber(String what, String token) {
        if (!NUMBER.matcher(token).matches()) {
            throw new IllegalArgumentException(what + ": '" + token + "' is not a number (expected a decimal like 12, -0.5 or 1e-3)");
        }
        double v = Double.parseDouble(token);
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + ": '" + token + "' is out of the range of finite numbers");
        }
        return v;
    }
}
