package org.tracewell.engine.measured;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.units.TradeUnits;

/**
 * A circular test measured on a machine (a ball bar or a grid encoder): nominal radius, feed, nominal centre and
 * one run per direction. SI inside. Evaluated by {@link MeasuredCircleEvaluation#of}, which runs the same
 * {@code CircleTest} code as the predictions.
 * <p>
 * CSV layouts (any column order):
 * <pre>
 *   angle_deg,radial_deviation_um[,direction]     polar: angle about the nominal centre, ρ − R
 *   x_mm,y_mm[,direction]                         positions in the test plane
 * </pre>
 * Metadata lines: {@code # radius_mm: 100} and {@code # feed_m_min: 3} (required: ISO 230-4 states both),
 * {@code # direction: CW|CCW} (required when there is no direction column), {@code # centre_mm: 0, 0} (nominal
 * centre of x/y data, default 0, 0), {@code # axes: X Y} (names of the two plane axes, default X Y),
 * {@code # date: yyyy-mm-dd}. A direction column holds CW or CCW; each direction's samples form one contiguous run
 * in time order. Every run must travel its stated direction through a full turn.
 */
public final class MeasuredCircleTest {

    static final List<List<String>> LAYOUTS = List.of(List.of("angle_deg", "radial_deviation_um"),
            List.of("x_mm", "y_mm"));
    static final List<String> OPTIONAL = List.of("direction");
    private static final String DIRECTION_VALID = "CW or CCW";

    private final MeasurementSource source;
    private final double radius;
    private final double feed;
    private final Point2 centre;
    private final String firstAxisName;
    private final String secondAxisName;
    private final List<MeasuredCircleRun> runs;

    private MeasuredCircleTest(MeasurementSource source, double radius, double feed, Point2 centre,
            String firstAxisName, String secondAxisName, List<MeasuredCircleRun> runs) {
        this.source = source;
        this.radius = radius;
        this.feed = feed;
        this.centre = centre;
        this.firstAxisName = firstAxisName;
        this.secondAxisName = secondAxisName;
        this.runs = List.copyOf(runs);
    }

    /** Reads a CSV file; nothing is returned unless every line is valid. */
    public static MeasuredCircleTest read(Path file) throws MeasuredDataException, IOException {
        return fromTable(CsvTable.read(file));
    }

    /** Parses CSV text; {@code fileName} names the source in messages and evidence. */
    public static MeasuredCircleTest parse(String fileName, String text) throws MeasuredDataException {
        return fromTable(CsvTable.parse(fileName, text, Optional.empty()));
    }

    private static MeasuredCircleTest fromTable(CsvTable table) throws MeasuredDataException {
        boolean polar = table.requireLayout(LAYOUTS, OPTIONAL) == 0;
        double radiusMm = table.requiredNumber("radius_mm", "'# radius_mm: R', the nominal radius in mm > 0");
        if (!(radiusMm > 0)) {
            throw metadataError(table, "radius_mm", "radius must be > 0 mm", "the nominal radius in mm > 0, e.g. 100");
        }
        double feedMPerMin = table.requiredNumber("feed_m_min", "'# feed_m_min: F', the programmed feed in m/min > 0");
        if (!(feedMPerMin > 0)) {
            throw metadataError(table, "feed_m_min", "feed must be > 0 m/min", "the programmed feed in m/min > 0, e.g. 3");
        }
        double radius = radiusMm * 1e-3;
        Point2 centre = centre(table);
        String[] axes = axisNames(table);
        int directionColumn = table.column("direction");
        ArcDirection fileDirection = null;
        if (directionColumn < 0) {
            CsvTable.Metadata m = table.metadata("direction").orElseThrow(() -> new MeasuredDataException(
                    table.fileName(), table.headerLine(), 0, "", "the run direction is not stated",
                    "a '# direction: CW' (or CCW) line, or a direction column"));
            fileDirection = direction(table, new CsvTable.Cell(m.value(), m.line(), m.column()));
        }
        int a = table.column(polar ? "angle_deg" : "x_mm");
        int b = table.column(polar ? "radial_deviation_um" : "y_mm");

        List<MeasuredCircleRun> runs = new ArrayList<>();
        List<CsvTable.Row> rows = table.rows();
        int runStart = 0;
        while (runStart < rows.size()) {
            ArcDirection direction = fileDirection != null ? fileDirection
                    : direction(table, rows.get(runStart).cell(directionColumn));
            int runEnd = runStart + 1;
            while (runEnd < rows.size() && (fileDirection != null
                    || direction(table, rows.get(runEnd).cell(directionColumn)) == direction)) {
                runEnd++;
            }
            for (MeasuredCircleRun earlier : runs) {
                if (earlier.direction() == direction) {
                    throw table.error(rows.get(runStart).cell(directionColumn), "a second " + direction
                            + " run (the first starts on line " + earlier.firstLine() + ")",
                            "one contiguous run per direction");
                }
            }
            runs.add(run(table, rows.subList(runStart, runEnd), direction, polar, a, b, radius, centre));
            runStart = runEnd;
        }
        return new MeasuredCircleTest(table.source(), radius, feedMPerMin / 60, centre, axes[0], axes[1], runs);
    }

    private static MeasuredCircleRun run(CsvTable table, List<CsvTable.Row> rows, ArcDirection direction,
            boolean polar, int a, int b, double radius, Point2 centre) throws MeasuredDataException {
        int n = rows.size();
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            CsvTable.Row row = rows.get(k);
            if (polar) {
                double angle = Math.toRadians(table.number(row, a, "an angle in degrees, e.g. 47.5"));
                double deviationUm = table.number(row, b, "a radial deviation in µm, e.g. -3.2");
                double rho = radius + deviationUm * 1e-6;
                if (!(rho > 0)) {
                    throw table.error(row.cell(b), "radial deviation reaches the centre of the "
                            + format(radius * 1e3) + " mm circle", "a deviation above -" + format(radius * 1e6) + " µm");
                }
                u[k] = centre.u() + rho * Math.cos(angle);
                v[k] = centre.v() + rho * Math.sin(angle);
            } else {
                u[k] = table.number(row, a, "a position in mm, e.g. 100.0021") * 1e-3;
                v[k] = table.number(row, b, "a position in mm, e.g. -0.0034") * 1e-3;
                if (Math.hypot(u[k] - centre.u(), v[k] - centre.v()) < 0.5 * radius) {
                    throw table.error(row.cell(a), "sample lies within half the nominal radius of the centre "
                            + format(centre.u() * 1e3) + ", " + format(centre.v() * 1e3) + " mm",
                            "positions on the " + format(radius * 1e3) + " mm circle (check '# centre_mm')");
                }
            }
        }
        if (n < 3) {
            throw table.error(rows.get(0), "the " + direction + " run has " + n + " sample(s)",
                    "at least 3 samples per run, covering a full turn");
        }
        // The run must travel its direction through a full turn: the evaluation selects the 360° by travelled angle.
        double travelled = 0;
        double largestStep = 0;
        double previous = Math.atan2(v[0] - centre.v(), u[0] - centre.u());
        for (int k = 1; k < n; k++) {
            double angle = Math.atan2(v[k] - centre.v(), u[k] - centre.u());
            double step = Math.IEEEremainder(angle - previous, 2 * Math.PI);
            if (Math.abs(step) >= Math.PI / 2) {
                throw table.error(rows.get(k), "a jump of " + format(Math.toDegrees(Math.abs(step)))
                        + "° about the centre from the previous sample", "samples in time order, less than 90° apart");
            }
            travelled += step;
            largestStep = Math.max(largestStep, Math.abs(step));
            previous = angle;
        }
        if (travelled * direction.sign() <= 0) {
            throw table.error(rows.get(0), String.format(Locale.ROOT,
                    "the samples travel %s (%.1f°) but the run is stated %s", direction.reversed(),
                    Math.toDegrees(travelled), direction), "samples in the stated direction (CCW = counter-clockwise,"
                            + " positive angles)");
        }
        if (Math.abs(travelled) < 2 * Math.PI - 2 * largestStep) {
            throw table.error(rows.get(n - 1), String.format(Locale.ROOT,
                    "the %s run covers %.1f° only", direction, Math.toDegrees(Math.abs(travelled))),
                    "samples over a full turn of 360°");
        }
        return new MeasuredCircleRun(direction, u, v, rows.get(0).line());
    }

    private static ArcDirection direction(CsvTable table, CsvTable.Cell cell) throws MeasuredDataException {
        return switch (cell.text().toUpperCase(Locale.ROOT)) {
            case "CW" -> ArcDirection.CW;
            case "CCW" -> ArcDirection.CCW;
            default -> throw table.error(cell, "not a run direction", DIRECTION_VALID);
        };
    }

    private static Point2 centre(CsvTable table) throws MeasuredDataException {
        Optional<CsvTable.Metadata> given = table.metadata("centre_mm");
        if (given.isEmpty()) {
            return new Point2(0, 0);
        }
        CsvTable.Metadata m = given.get();
        String[] parts = m.value().split("[,\\s]+");
        if (parts.length != 2) {
            throw new MeasuredDataException(table.fileName(), m.line(), m.column(), m.value(),
                    "the nominal centre needs two coordinates", "'# centre_mm: u, v' in mm, e.g. 0, 0");
        }
        double cu = table.metadataNumber(new CsvTable.Metadata(m.key(), parts[0], m.line(), m.column()),
                "'# centre_mm: u, v' in mm, e.g. 0, 0");
        double cv = table.metadataNumber(new CsvTable.Metadata(m.key(), parts[1], m.line(), m.column()),
                "'# centre_mm: u, v' in mm, e.g. 0, 0");
        return new Point2(cu * 1e-3, cv * 1e-3);
    }

    private static String[] axisNames(CsvTable table) throws MeasuredDataException {
        Optional<CsvTable.Metadata> given = table.metadata("axes");
        if (given.isEmpty()) {
            return new String[] {"X", "Y"};
        }
        String[] parts = given.get().value().split("[,\\s]+");
        if (parts.length != 2 || parts[0].isEmpty()) {
            throw new MeasuredDataException(table.fileName(), given.get().line(), given.get().column(),
                    given.get().value(), "the test plane needs two axis names", "'# axes: X Y', first then second axis");
        }
        return parts;
    }

    private static MeasuredDataException metadataError(CsvTable table, String key, String problem, String valid) {
        CsvTable.Metadata m = table.metadata(key).orElseThrow();
        return new MeasuredDataException(table.fileName(), m.line(), m.column(), m.value(), problem, valid);
    }

    private static String format(double value) {
        return TradeUnits.format(value, 4);
    }

    public MeasurementSource source() {
        return source;
    }

    /** Nominal radius R, metres. */
    public double radius() {
        return radius;
    }

    /** Programmed feed, m/s. */
    public double feed() {
        return feed;
    }

    /** Nominal centre in plane coordinates, metres. */
    public Point2 centre() {
        return centre;
    }

    public String firstAxisName() {
        return firstAxisName;
    }

    public String secondAxisName() {
        return secondAxisName;
    }

    /** One run per measured direction, in file order. */
    public List<MeasuredCircleRun> runs() {
        return runs;
    }

    /** The run in this direction, if measured. */
    public Optional<MeasuredCircleRun> run(ArcDirection direction) {
        return runs.stream().filter(r -> r.direction() == direction).findFirst();
    }
}
