package dev.sweepline.ground.plot;

/**
 * One quantity over time for {@link MomentsPlot}; non-finite points are left out when drawn.
 *
 * @param name    quantity and unit, e.g. "n (cm^-3)"
 * @param seconds time since start, s
 * @param values  values
 * @param sigma   1σ error bars (NaN: no bar)
 * @param truth   reference values at the same times, drawn as a line (NaN where none); null for none
 */
public record TimeSeries(String name, double[] seconds, double[] values, double[] sigma, double[] truth) {
}
