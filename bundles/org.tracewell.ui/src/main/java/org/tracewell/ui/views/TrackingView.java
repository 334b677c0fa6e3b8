package org.tracewell.ui.views;

import java.util.List;

import org.tracewell.charts.AxisTrack;
import org.tracewell.charts.ContourChartData;
import org.tracewell.charts.DisplayScale;
import org.tracewell.charts.TrackingChart;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.MachineAnalysis;

/**
 * Tracking: how each axis of the selected contour follows its reference — reference and actual position and the
 * following error against time, per axis, with the peak against the steady estimate v/Kv. Selecting an axis shows a
 * contour it takes part in.
 */
public final class TrackingView extends ContourView {

    public static final String ID = "org.tracewell.ui.view.tracking";

    @Override
    String contourForAxis(String axisId, MachineAnalysis analysis, String currentContourId) {
        if (currentContourId != null
                && analysis.contour(currentContourId).filter(c -> takesPart(c, axisId)).isPresent()) {
            return null;
        }
        return analysis.contours().stream().filter(c -> takesPart(c, axisId)).map(ContourResult::contourId)
                .findFirst().orElse(null);
    }

    private static boolean takesPart(ContourResult contour, String axisId) {
        return contour.firstAxisId().equals(axisId) || contour.secondAxisId().equals(axisId);
    }

    @Override
    Drawing draw(ContourResult contour, int runIndex, Object options, int widthPx) {
        ContourRun run = contour.runs().get(runIndex);
        List<AxisTrack> tracks = List.of(ContourChartData.track(contour.firstAxisName(), run.tracking(), 0),
                ContourChartData.track(contour.secondAxisName(), run.tracking(), 1));
        String title = "Tracking of " + contour.contourName() + " (" + run.direction().label() + ")";
        String figures = contour.firstAxisName() + ": peak following error "
                + Units.um(run.metrics().peakFollowingErrorFirst()) + " µm (v/Kv " + Units.um(
                        contour.estimate().followingErrorFirst()) + " µm) · " + contour.secondAxisName()
                + ": peak " + Units.um(run.metrics().peakFollowingErrorSecond()) + " µm (v/Kv "
                + Units.um(contour.estimate().followingErrorSecond()) + " µm) · " + Units.plain(run.metrics()
                        .duration(), 3) + " s, " + run.metrics().sampleCount() + " samples";
        return new Drawing(TrackingChart.create(title, tracks, DisplayScale.SECONDS, widthPx), figures);
    }
}
