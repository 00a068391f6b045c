package dev.sweepline.sim.hv;

/**
 * One HV rail: a first-order loop whose rate is slew-limited, dV/dt = clamp((target - V)/tau, -S, +S).
 * Closed-form trajectory from the last command: a linear slew at S until the error is S tau, then
 * exponential settling; value and slope are continuous at the switch. The state of a first-order
 * system is its output alone, so a new command simply starts from the present value.
 *
 * <p>Threading: not thread-safe. Allocation-free.
 */
public final class HvRail {
    private final double slewVoltsPerSecond;
    private final double tauSeconds;
    private final double bandVolts;
    private long startMicros;
    private double startVolts;
    private double targetVolts;

    /** A rail at 0 V with the given dynamics. */
    public HvRail(HvSupplyParameters parameters) {
        this.slewVoltsPerSecond = parameters.slewVoltsPerSecond();
        this.tauSeconds = parameters.tauSeconds();
        this.bandVolts = parameters.slewBandVolts();
    }

    /** Sets a new target at {@code nowMicros}, starting from the rail's value then. */
    public void command(double targetVolts, long nowMicros) {
        this.startVolts = voltsAt(nowMicros);
        this.startMicros = nowMicros;
        this.targetVolts = targetVolts;
    }

    /** Forces the rail to {@code volts} at once (HV switched off: output crowbarred). */
    public void reset(double volts, long nowMicros) {
        this.startVolts = volts;
        this.targetVolts = volts;
        this.startMicros = nowMicros;
    }

    /** The target of the last command, volts. */
    public double targetVolts() {
        return targetVolts;
    }

    /** Rail value at {@code micros} (times before the last command give the value at the command), volts. */
    public double voltsAt(long micros) {
        double dt = (micros - startMicros) * 1e-6;
        if (dt <= 0) {
            return startVolts;
        }
        double delta = targetVolts - startVolts;
        double magnitude = Math.abs(delta);
        if (magnitude > bandVolts) {
            double sign = Math.signum(delta);
            double slewSeconds = (magnitude - bandVolts) / slewVoltsPerSecond;
            if (dt < slewSeconds) {
                return startVolts + sign * slewVoltsPerSecond * dt;
            }
            return targetVolts - sign * bandVolts * Math.exp(-(dt - slewSeconds) / tauSeconds);
        }
        return targetVolts - delta * Math.exp(-dt / tauSeconds);
    }

    /** Duration of the linear slew phase after the last command, seconds (0 for a step inside the band). */
    public double slewSeconds() {
        return Math.max(0, (Math.abs(targetVolts - startVolts) - bandVolts) / slewVoltsPerSecond);
    }
}
