package dev.sweepline.sim.scenario;

/**
 * Slow seeded fluctuations laid over a scenario's plasma: each of density, speed, temperature and the
 * two flow angles follows its own stationary Ornstein-Uhlenbeck process with one shared correlation
 * time. Density, speed and temperature are multiplied by {@code 1 + rms * x(t)} (x of unit variance);
 * the flow angles get {@code rms * x(t)} degrees added.
 *
 * @param correlationSeconds   correlation time tau of every process, s
 * @param densityRelativeRms   relative rms of the proton density (and so of the alphas, which scale with it)
 * @param speedRelativeRms     relative rms of the bulk speed
 * @param temperatureRelativeRms relative rms of the proton temperature
 * @param flowAngleRmsDeg      rms of each flow angle, degrees (absolute: a relative rms of an angle near 0 means nothing)
 */
public record Fluctuations(double correlationSeconds, double densityRelativeRms, double speedRelativeRms,
        double temperatureRelativeRms, double flowAngleRmsDeg) {

    /** No fluctuations. */
    public static final Fluctuations NONE = new Fluctuations(1.0, 0, 0, 0, 0);

    /** Largest relative rms allowed: beyond it the linear factor 1 + rms x goes negative too often. */
    public static final double MAX_RELATIVE_RMS = 0.3;

    /** Largest flow-angle rms allowed, degrees ("slow fluctuations", not a change of regime). */
    public static final double MAX_ANGLE_RMS_DEG = 10.0;

    /** Shortest correlation time allowed, s: faster than a few sweeps is not "slow". */
    public static final double MIN_CORRELATION_SECONDS = 0.1;

    /** Whether any rms is non-zero. */
    public boolean any() {
        return densityRelativeRms > 0 || speedRelativeRms > 0 || temperatureRelativeRms > 0 || flowAngleRmsDeg > 0;
    }
}
