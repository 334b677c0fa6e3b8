package org.tracewell.report;

/**
 * The one HTML escaper of the report. Every string that comes from a model or a result (names,
 * descriptions, statements, rationales, evidence, notes, ids) passes through {@link #escape} before it is
 * written, in text and in attribute values alike; the report writes no script and no event attributes.
 */
public final class Html {

    private Html() {
    }

    /**
     * Text safe in element content and in double- or single-quoted attribute values: {@code & < > " '}
     * become character references; control characters other than tab, newline and carriage return (which
     * HTML does not allow) become U+FFFD. {@code null} becomes the empty string.
     */
    public static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            String replacement = switch (c) {
                case '&' -> "&amp;";
                case '<' -> "&lt;";
                case '>' -> "&gt;";
                case '"' -> "&quot;";
                case '\'' -> "&#39;";
                default -> isForbiddenControl(c) ? "\uFFFD" : null;
            };
            if (replacement != null && out == null) {
                out = new StringBuilder(text.length() + 16).append(text, 0, i);
            }
            if (out != null) {
                if (replacement != null) {
                    out.append(replacement);
                } else {
                    out.append(c);
                }
            }
        }
        return out == null ? text : out.toString();
    }

    /**
     * A fragment id made from any string: letters, digits, '-' and '_' kept, everything else as
     * {@code _xx} hex, prefixed so it never starts with a digit. Injective, so different ids stay different.
     */
    public static String fragmentId(String prefix, String id) {
        StringBuilder out = new StringBuilder(prefix).append('-');
        for (int i = 0; i < id.length(); i++) {
            char c = id.charAt(i);
            if ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '-') {
                out.append(c);
            } else {
                out.append('_').append(Integer.toHexString(c)).append('_');
            }
        }
        return out.toString();
    }

    private static boolean isForbiddenControl(char c) {
        return (c < 0x20 && c != '\t' && c != '\n' && c != '\r') || c == 0x7F || (c >= 0x80 && c <= 0x9F);
    }
}
