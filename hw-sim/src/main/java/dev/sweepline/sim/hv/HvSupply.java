package dev.sweepline.sim.hv;

import java.util.random.RandomGenerator;

/**
 * The modulator HV supply: a low and a high rail, each slew-limited with first-order settling
 * ({@link HvRail}), set by DAC codes through the unit's {@link HvCalibration}, and a noisy monitor of
 * the high rail read back in DAC code units. The supply is unipolar: a code below the offset gives 0 V.
 *
 * <p>Time is data: every call carries its time in microseconds. Threading: not thread-safe.
 * Allocation-free.
 */
public final class HvSupply {
    private final HvCalibration calibration;
    private final HvSupplyParameters parameters;
    private final HvRail low;
    private final HvRail high;
    private boolean enabled;

    /** A supply, initially disabled (0 V on both rails). */
    public HvSupply(HvCalibration calibration, HvSupplyParameters parameters) {
        this.calibration = calibration;
        this.parameters = parameters;
        this.low = new HvRail(parameters);
        this.high = new HvRail(parameters);
    }

    /** Enables the supply (if off, the rails start from 0 V) and sets both rails' targets at {@code nowMicros}. */
    public void command(int codeLow, int codeHigh, long nowMicros) {
        if (!enabled) {
            low.reset(0, nowMicros);
            high.reset(0, nowMicros);
            enabled = true;
        }
        low.command(Math.max(0, calibration.volts(codeLow)), nowMicros);
        high.command(Math.max(0, calibration.volts(codeHigh)), nowMicros);
    }

    /** Switches the high voltage off at {@code nowMicros}: both rails read 0 V from then on. */
    public void disable(long nowMicros) {
        enabled = false;
        low.reset(0, nowMicros);
        high.reset(0, nowMicros);
    }

    /** True while the supply is on. */
    public boolean enabled() {
        return enabled;
    }

    /** Low (modulator low level) rail at {@code micros}, volts. */
    public double lowVoltsAt(long micros) {
        return enabled ? low.voltsAt(micros) : 0;
    }

    /** High (modulator high level) rail at {@code micros}, volts. */
    public double highVoltsAt(long micros) {
        return enabled ? high.voltsAt(micros) : 0;
    }

    /** Monitor readback of the high rail at {@code micros}: Gaussian noise, then the calibration's code, clamped. */
    public int monitorCode(long micros, RandomGenerator rng) {
        return calibration.code(highVoltsAt(micros) + parameters.monitorNoiseVoltsRms() * rng.nextGaussian());
    }

    /** The unit's calibration. */
    public HvCalibration calibration() {
        return calibration;
    }

    /** The supply's dynamics. */
    public HvSupplyParameters parameters() {
        return parameters;
    }
}
