/**
 * The modulator high-voltage supply.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.hv.HvCalibration} maps DAC codes to volts for the real unit (demo: the
 * nominal 0.1 V per code +0.15 %, offset -0.8 V, which the flight software does not know).
 * {@link dev.sweepline.sim.hv.HvRail} is one rail, dV/dt = clamp((target - V)/tau, -S, S), in closed
 * form: a linear slew, then exponential settling inside the band S tau.
 * {@link dev.sweepline.sim.hv.HvSupply} has the low and high rails, the HV enable, and a noisy monitor
 * of the high rail in DAC code units ({@link dev.sweepline.sim.hv.HvSupplyParameters}: demo 100 V/ms,
 * tau 150 us, 0.5 V rms). {@link dev.sweepline.sim.hv.WindowVolts} gives the energy-per-charge
 * windows a table's DAC codes make through the calibration: where the bench places the true peaks and
 * the D-optimal design spends its time.
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>HV-1: a step larger than S tau slews at S for (|dV| - S tau)/S, then settles exponentially.</li>
 *   <li>HV-2: a step inside the band settles as a first-order system: within 1e-3 of the step after
 *       7 tau (e^-7 = 9.1e-4), not yet after 6.9 tau.</li>
 *   <li>HV-3: the output is continuous in time, also across a new command mid-transition, and never
 *       moves faster than S.</li>
 *   <li>HV-4: the monitor noise rms equals the parameter (plus the code quantisation) over many seeded
 *       samples; the readback of a settled rail equals the commanded code on average.</li>
 *   <li>HV-5: with HV disabled both rails are 0 V; re-enabling starts from 0 V.</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * {@code HvSupplyTest} (HV-1..HV-5) and {@code HvCalibrationTest} (code/volt round trip, closeness to
 * the nominal scale).
 */
package dev.sweepline.sim.hv;
