package dev.sweepline.sim.scenario;

import dev.sweepline.sim.seed.SeedTree;

/**
 * The plasma of one scenario run as a function of time: the event-driven course of each parameter
 * with the seeded fluctuations laid over it. Values are fixed by the seed alone, whatever times are
 * asked and in whatever order; asking in non-decreasing time order (as the bench does) is the cheap
 * case, a few tens of nanoseconds per call.
 *
 * <p>Not thread-safe: it caches the current block of each fluctuation series. Give each thread its own
 * timeline (same seed, same values).
 */
public final class ScenarioTimeline {
    /**
     * Smallest factor a fluctuation may apply to density, speed or temperature: keeps them positive
     * when a large rms meets a rare deep excursion (reached only below -3 sigma at the largest rms).
     */
    static final double MIN_FLUCTUATION_FACTOR = 0.1;

    private static final int DENSITY = 0;
    private static final int SPEED = 1;
    private static final int TEMPERATURE = 2;
    private static final int FLOW_X = 3;
    private static final int FLOW_Y = 4;

    private final ParameterTrack[] tracks;
    private final Fluctuations fluctuations;
    private final OrnsteinUhlenbeckSeries[] series;
    private final double[] values = new double[PlasmaParameter.values().length];

    ScenarioTimeline(ParameterTrack[] tracks, Fluctuations fluctuations, SeedTree seeds) {
        this.tracks = tracks;
        this.fluctuations = fluctuations;
        double[] rms = {fluctuations.densityRelativeRms(), fluctuations.speedRelativeRms(),
            fluctuations.temperatureRelativeRms(), fluctuations.flowAngleRmsDeg(), fluctuations.flowAngleRmsDeg()};
        this.series = new OrnsteinUhlenbeckSeries[rms.length];
        for (int i = 0; i < series.length; i++) {
            // The stream index is the quantity's index, so adding a fluctuation to one quantity in a
            // file leaves the others' histories for the same seed unchanged.
            series[i] = rms[i] > 0
                    ? new OrnsteinUhlenbeckSeries(seeds.fluctuation(i), fluctuations.correlationSeconds()) : null;
        }
    }

    /** The plasma at {@code seconds} from the scenario start (before 0: the starting plasma). */
    public PlasmaConditions at(double seconds) {
        return PlasmaConditions.of(valuesAt(seconds));
    }

    /**
     * The values of {@link #at} by {@link PlasmaParameter#ordinal()}, in this timeline's own array: read
     * them before the next call.
     */
    double[] valuesAt(double seconds) {
        for (int i = 0; i < tracks.length; i++) {
            values[i] = tracks[i].at(seconds);
        }
        values[PlasmaParameter.PROTON_DENSITY.ordinal()] *=
                factor(fluctuations.densityRelativeRms(), DENSITY, seconds);
        values[PlasmaParameter.PROTON_SPEED.ordinal()] *= factor(fluctuations.speedRelativeRms(), SPEED, seconds);
        values[PlasmaParameter.PROTON_TEMPERATURE.ordinal()] *=
                factor(fluctuations.temperatureRelativeRms(), TEMPERATURE, seconds);
        values[PlasmaParameter.FLOW_THETA_X.ordinal()] += offset(fluctuations.flowAngleRmsDeg(), FLOW_X, seconds);
        values[PlasmaParameter.FLOW_THETA_Y.ordinal()] += offset(fluctuations.flowAngleRmsDeg(), FLOW_Y, seconds);
        return values;
    }

    /** The event-driven value of {@code p} at {@code seconds}, without fluctuations. */
    public double meanAt(PlasmaParameter p, double seconds) {
        return tracks[p.ordinal()].at(seconds);
    }

    private double factor(double rms, int stream, double seconds) {
        return rms == 0 ? 1.0 : Math.max(MIN_FLUCTUATION_FACTOR, 1.0 + rms * series[stream].at(seconds));
    }

    private double offset(double rms, int stream, double seconds) {
        return rms == 0 ? 0.0 : rms * series[stream].at(seconds);
    }
}
