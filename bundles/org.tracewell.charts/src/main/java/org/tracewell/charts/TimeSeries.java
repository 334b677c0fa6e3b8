package org.tracewell.charts;

/** One signal against time, SI: time in seconds, value in the signal's SI unit. */
public record TimeSeries(String name, double[] timeSeconds, double[] value) {

    public TimeSeries {
        if (timeSeconds.length != value.length) {
            throw new IllegalArgumentException("series '" + name + "': " + timeSeconds.length + " times but "
                    + value.length + " values");
        }
    }
}
