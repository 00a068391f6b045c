package dev.sweepline.sim.hv;

/**
 * Dynamics and monitor noise of the modulator HV supply.
 *
 * @param slewVoltsPerSecond   largest rate of change of either rail, volts per second
 * @param tauSeconds           time constant of the first-order settling once inside the slew band, seconds
 * @param monitorNoiseVoltsRms Gaussian noise of the monitor readback, volts rms
 */
public record HvSupplyParameters(double slewVoltsPerSecond, double tauSeconds, double monitorNoiseVoltsRms) {
    /** Demo slew limit: 100 V per ms (invented). */
    public static final double DEMO_SLEW_VOLTS_PER_SECOND = 1e5;
    /** Demo settling time constant: 150 microseconds (invented). */
    public static final double DEMO_TAU_SECONDS = 150e-6;
    /** Demo monitor noise: 0.5 V rms (invented). */
    public static final double DEMO_MONITOR_NOISE_VOLTS_RMS = 0.5;

    /** Checks the parameters are positive (noise may be 0). */
    public HvSupplyParameters {
        if (!(slewVoltsPerSecond > 0) || !(tauSeconds > 0) || !(monitorNoiseVoltsRms >= 0)) {
            throw new IllegalArgumentException("bad HV supply parameters");
        }
    }

    /** The demo supply. */
    public static HvSupplyParameters demo() {
        return new HvSupplyParameters(DEMO_SLEW_VOLTS_PER_SECOND, DEMO_TAU_SECONDS, DEMO_MONITOR_NOISE_VOLTS_RMS);
    }

    /** Half-width of the band inside which the rail settles exponentially rather than slewing: slew * tau, volts. */
    public double slewBandVolts() {
        return slewVoltsPerSecond * tauSeconds;
    }
}
