package org.tracewell.charts;

/**
 * How an SI quantity is shown on an axis: label with unit and the factor from SI,
 * e.g. {@code new DisplayScale("Following error", "µm", 1e6)}.
 */
public record DisplayScale(String quantity, String unit, double factorFromSi) {

    public static final DisplayScale SECONDS = new DisplayScale("Time", "s", 1);
    public static final DisplayScale MILLISECONDS = new DisplayScale("Time", "ms", 1e3);
    public static final DisplayScale MICROMETRES = new DisplayScale("Deviation", "µm", 1e6);
    public static final DisplayScale MILLIMETRES = new DisplayScale("Position", "mm", 1e3);
    public static final DisplayScale RATIO = new DisplayScale("Output", "1", 1);

    public String label() {
        return unit.isEmpty() || unit.equals("1") ? quantity : quantity + " (" + unit + ")";
    }

    public DisplayScale named(String newQuantity) {
        return new DisplayScale(newQuantity, unit, factorFromSi);
    }
}
