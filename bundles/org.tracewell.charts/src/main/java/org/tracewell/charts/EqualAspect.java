package org.tracewell.charts;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;

/**
 * Equal data spans on both axes of a plane plot, so a circle stays a circle when the chart is exported
 * with a square plot area (the report exports these charts square).
 */
final class EqualAspect {

    private EqualAspect() {
    }

    /** Sets both axis ranges to the same span around the data's centre, widened by {@code padFraction}. */
    static void apply(XYPlot plot, double padFraction, XYDataset... datasets) {
        double[] box = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        for (XYDataset data : datasets) {
            include(box, data);
        }
        if (!(box[1] >= box[0])) {
            return;
        }
        double span = Math.max(box[1] - box[0], box[3] - box[2]);
        if (span == 0) {
            span = 1;
        }
        span *= 1 + 2 * padFraction;
        setRange(plot.getDomainAxis(), 0.5 * (box[0] + box[1]), span);
        setRange(plot.getRangeAxis(), 0.5 * (box[2] + box[3]), span);
    }

    /** Widens {@code box} = {minX, maxX, minY, maxY} to hold every finite point of {@code data}. */
    private static void include(double[] box, XYDataset data) {
        for (int s = 0; s < data.getSeriesCount(); s++) {
            for (int i = 0; i < data.getItemCount(s); i++) {
                double x = data.getXValue(s, i);
                double y = data.getYValue(s, i);
                if (Double.isFinite(x) && Double.isFinite(y)) {
                    box[0] = Math.min(box[0], x);
                    box[1] = Math.max(box[1], x);
                    box[2] = Math.min(box[2], y);
                    box[3] = Math.max(box[3], y);
                }
            }
        }
    }

    private static void setRange(ValueAxis axis, double centre, double span) {
        axis.setAutoRange(false);
        axis.setRange(centre - span / 2, centre + span / 2);
    }
}
