package dev.sweepline.sim.hv;

/**
 * Dynamics and monitor noise of the modulator HV supply.
 *
 * @param slewVoltsPerSecond   largest rate of change of either rail, volts per second
 * @param tauSeconds           time constant of the first-order settling once inside the slew band, seconds
 * @param monitorNoiseVoltsRms Gaussian noise of the monitor readback, volts rms
 */
public record HvSupplyParameters(double slewVoltsPerSecond, double tauSeconds, double monitorNoiseVoltsRms) {
    /** Checks the parameters are positive (noise may be 0). */
    public HvSupplyParameters {
        if (!(slewVoltsPerSecond > 0) || !(tauSeconds > 0) || !(monitorNoiseVoltsRms >= 0)) {
            throw new IllegalArgumentException("bad HV supply parameters");
        }
    }

    /** Half-width of the band inside which the rail settles exponentially rather than slewing: slew * tau, volts. */
    public double slewBandVolts() {
        return slewVoltsPerSecond * tauSeconds;
    }
}
