package org.tracewell.engine.measured;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * Positioning runs of one axis after ISO 230-2: at each target position P_i the positional deviation
 * x_ij = P_ij − P_i (actual minus target) of approach j, approached in the positive (↑) and negative (↓)
 * direction. SI inside (metres). Immutable; evaluated by {@link Iso230Positioning#evaluate}.
 * <p>
 * CSV layout (any column order): {@code target_mm,run,direction,deviation_um}, direction {@code +} or {@code -},
 * run a whole number ≥ 1. Every target must carry the same runs in both directions, at least 2 of them and at
 * least 2 targets (the standard asks for 5 of each; fewer gives a note, not an error). Metadata such as
 * {@code # axis: Y} and {@code # date: 2026-03-14} is kept.
 */
public final class PositioningMeasurement {

    static final List<List<String>> LAYOUTS = List.of(List.of("target_mm", "run", "direction", "deviation_um"));
    private static final Pattern RUN = Pattern.compile("[0-9]{1,6}");

    private final MeasurementSource source;
    private final double[] targets;
    private final double[][] up;
    private final double[][] down;

    private PositioningMeasurement(MeasurementSource source, double[] targets, double[][] up, double[][] down) {
        this.source = source;
        this.targets = targets;
        this.up = up;
        this.down = down;
    }

    /**
     * Deviations already in SI (for tests and other importers).
     *
     * @param targets target positions P_i, metres, strictly increasing
     * @param up      up[i][j]: deviation of approach j in the positive direction at target i, metres
     * @param down    the same for the negative direction; as many approaches as {@code up}
     */
    public static PositioningMeasurement of(MeasurementSource source, double[] targets, double[][] up,
            double[][] down) {
        int m = targets.length;
        if (m < 2 || up.length != m || down.length != m) {
            throw new IllegalArgumentException("positioning runs of " + source.fileName() + ": need at least 2 targets"
                    + " and one row of deviations per target and direction, got " + m + " targets, " + up.length
                    + " and " + down.length + " rows");
        }
        int n = up[0].length;
        double[][] u = new double[m][];
        double[][] d = new double[m][];
        for (int i = 0; i < m; i++) {
            if (!Double.isFinite(targets[i]) || (i > 0 && !(targets[i] > targets[i - 1]))) {
                throw new IllegalArgumentException("positioning runs of " + source.fileName() + ": target #" + i + " = "
                        + targets[i] + " m; targets must be finite and strictly increasing");
            }
            if (up[i].length != n || down[i].length != n || n < 2) {
                throw new IllegalArgumentException("positioning runs of " + source.fileName() + ": target #" + i
                        + " has " + up[i].length + " approaches up and " + down[i].length + " down; every target"
                        + " needs the same number (at least 2) both ways");
            }
            for (int j = 0; j < n; j++) {
                if (!Double.isFinite(up[i][j]) || !Double.isFinite(down[i][j])) {
                    throw new IllegalArgumentException("positioning runs of " + source.fileName() + ": deviation of"
                            + " approach " + j + " at target #" + i + " is not finite");
                }
            }
            u[i] = up[i].clone();
            d[i] = down[i].clone();
        }
        return new PositioningMeasurement(source, targets.clone(), u, d);
    }

    /** Reads a CSV file; nothing is returned unless every line is valid. */
    public static PositioningMeasurement read(Path file) throws MeasuredDataException, IOException {
        return fromTable(CsvTable.read(file));
    }

    /** Parses CSV text; {@code fileName} names the source in messages and evidence. */
    public static PositioningMeasurement parse(String fileName, String text) throws MeasuredDataException {
        return fromTable(CsvTable.parse(fileName, text, Optional.empty()));
    }

    /** Where a (target, direction) was first seen, for messages. */
    private record Approaches(int firstLine, TreeMap<Integer, Double> byRun) {
    }

    private static PositioningMeasurement fromTable(CsvTable table) throws MeasuredDataException {
        table.requireLayout(LAYOUTS, List.of());
        int t = table.column("target_mm");
        int r = table.column("run");
        int dir = table.column("direction");
        int dev = table.column("deviation_um");
        TreeMap<Double, Approaches[]> byTarget = new TreeMap<>(); // keyed by the target in mm as written
        for (CsvTable.Row row : table.rows()) {
            double target = table.number(row, t, "a target position in mm, e.g. 250") + 0.0; // -0 and 0 alike
            CsvTable.Cell runCell = row.cell(r);
            if (!RUN.matcher(runCell.text()).matches() || Integer.parseInt(runCell.text()) < 1) {
                throw table.error(runCell, "not a run number", "a whole number >= 1, e.g. 3");
            }
            int run = Integer.parseInt(runCell.text());
            CsvTable.Cell dirCell = row.cell(dir);
            int side = switch (dirCell.text()) {
                case "+" -> 0;
                case "-" -> 1;
                default -> throw table.error(dirCell, "not an approach direction",
                        "'+' (approach in the positive direction) or '-' (negative)");
            };
            double deviation = table.number(row, dev, "a positional deviation in µm, e.g. -1.8") * 1e-6;
            Approaches[] both = byTarget.computeIfAbsent(target, k -> new Approaches[2]);
            if (both[side] == null) {
                both[side] = new Approaches(row.line(), new TreeMap<>());
            }
            if (both[side].byRun().put(run, deviation) != null) {
                throw table.error(runCell, "run " + run + " in direction " + dirCell.text() + " at target "
                        + row.cell(t).text() + " mm given twice", "each (target, run, direction) once");
            }
        }
        if (byTarget.size() < 2) {
            throw new MeasuredDataException(table.fileName(), table.headerLine(), 0, "", "only " + byTarget.size()
                    + " target position", "at least 2 target positions (ISO 230-2 asks for 5 or more)");
        }
        TreeSet<Integer> runs = null;
        int firstLine = 0;
        int m = byTarget.size();
        double[] targets = new double[m];
        double[][] up = new double[m][];
        double[][] down = new double[m][];
        int i = 0;
        for (var entry : byTarget.entrySet()) {
            Approaches[] both = entry.getValue();
            for (int side = 0; side < 2; side++) {
                if (both[side] == null) {
                    int line = both[1 - side].firstLine();
                    throw new MeasuredDataException(table.fileName(), line, 0, "", "target "
                            + trim(entry.getKey()) + " mm has no approach in direction " + (side == 0 ? "+" : "-"),
                            "the same runs in both directions at every target");
                }
                TreeSet<Integer> these = new TreeSet<>(both[side].byRun().keySet());
                if (runs == null) {
                    runs = these;
                    firstLine = both[side].firstLine();
                    if (runs.size() < 2) {
                        throw new MeasuredDataException(table.fileName(), firstLine, 0, "", "only one run at target "
                                + trim(entry.getKey()) + " mm", "at least 2 runs each way (ISO 230-2 asks for 5)");
                    }
                } else if (!these.equals(runs)) {
                    throw new MeasuredDataException(table.fileName(), both[side].firstLine(), 0, "", "target "
                            + trim(entry.getKey()) + " mm, direction " + (side == 0 ? "+" : "-") + " has runs "
                            + these + " but line " + firstLine + " starts runs " + runs,
                            "the same runs in both directions at every target");
                }
            }
            targets[i] = entry.getKey() * 1e-3;
            up[i] = values(both[0]);
            down[i] = values(both[1]);
            i++;
        }
        return new PositioningMeasurement(table.source(), targets, up, down);
    }

    private static double[] values(Approaches a) {
        List<Double> list = new ArrayList<>(a.byRun().values());
        double[] out = new double[list.size()];
        for (int j = 0; j < out.length; j++) {
            out[j] = list.get(j);
        }
        return out;
    }

    private static String trim(double mm) {
        return java.math.BigDecimal.valueOf(mm).stripTrailingZeros().toPlainString();
    }

    public MeasurementSource source() {
        return source;
    }

    /** Number of target positions m. */
    public int targetCount() {
        return targets.length;
    }

    /** Approaches per target and direction n. */
    public int approachCount() {
        return up[0].length;
    }

    /** Target position P_i, metres. */
    public double target(int i) {
        return targets[i];
    }

    /** Deviation x_ij↑ of approach j in the positive direction at target i, metres. */
    public double up(int i, int j) {
        return up[i][j];
    }

    /** Deviation x_ij↓ of approach j in the negative direction at target i, metres. */
    public double down(int i, int j) {
        return down[i][j];
    }
}
