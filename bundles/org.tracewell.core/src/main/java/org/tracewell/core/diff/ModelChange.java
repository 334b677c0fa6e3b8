package org.tracewell.core.diff;

/**
 * One semantic difference between two versions of a model.
 *
 * @param kind     added, removed or changed
 * @param id       stable id of the element concerned
 * @param element  how the element is named for people, e.g. {@code Axis 'Y' [lm3020-y]}
 * @param feature  the attribute or reference that changed; empty for added and removed elements
 * @param oldValue the previous value in display units; empty for added elements
 * @param newValue the new value in display units; empty for removed elements
 */
public record ModelChange(Kind kind, String id, String element, String feature, String oldValue, String newValue) {

    /** What happened to the element. */
    public enum Kind {
        ADDED("+"), REMOVED("-"), CHANGED("~");

        private final String symbol;

        Kind(String symbol) {
            this.symbol = symbol;
        }

        /** The one-character marker used in listings. */
        public String symbol() {
            return symbol;
        }
    }

    /** {@code ~ Axis 'Y' [lm3020-y] › lead: 10 mm → 5 mm}, {@code + Contour 'corner' [id]}. */
    @Override
    public String toString() {
        return switch (kind) {
            case ADDED, REMOVED -> kind.symbol() + " " + element;
            case CHANGED -> kind.symbol() + " " + element + " › " + feature + ": " + oldValue + " → " + newValue;
        };
    }
}
