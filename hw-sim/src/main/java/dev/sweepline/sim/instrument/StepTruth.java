package dev.sweepline.sim.instrument;

/**
 * What really happened in one simulated step, for the bench to compare with what the flight
 * software and the ground made of it. Mutable, allocated once and refilled by
 * {@link SimulatedInstrument#execute}. Threading: owned by one thread.
 */
public final class StepTruth {
    /** Actual modulator low level at mid-integration, volts. */
    public double lowVolts;
    /** Actual modulator high level at mid-integration, volts. */
    public double highVolts;
    /** Noiseless window current of quadrants Q1..Q4, amperes. */
    public final double[] quadrantAmps = new double[4];
    /** Sum of {@link #quadrantAmps}, amperes. */
    public double totalAmps;
    /** Time integration started, microseconds. */
    public long integrationStartMicros;
    /** Time the step ended, microseconds. */
    public long endMicros;
    /** True when at least one quadrant saturated. */
    public boolean saturated;
    /** True when the monitor disagreed with the command at integration start (STATUS_HV_UNSETTLED). */
    public boolean hvUnsettled;
}
