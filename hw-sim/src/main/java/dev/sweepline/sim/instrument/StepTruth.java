package dev.sweepline.sim.instrument;

import dev.sweepline.sim.plasma.MaxwellianWindow;

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
    /**
     * The closed-form evaluation of the plasma's first population's window current (the protons, in the
     * scenarios' plasmas), cleared when the cup did not evaluate it: the bench takes the protons'
     * sensitivities of the same window from it.
     */
    public final MaxwellianWindow firstPopulation = new MaxwellianWindow();
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
