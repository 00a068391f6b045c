/**
 * The collector preamplifier, demodulator and ADC.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.preamp.Preamplifier} turns a quadrant's window current into a demodulated
 * sample of the instrument's ADC width: its gain ranges (demo cup: full scale 40 pA, 1.28 nA, 40.96 nA;
 * R_f = 4 V / FS; every figure from the description file), shot and feedback-resistor Johnson noise in
 * the integration's noise bandwidth B = 1/(2 T_int) (at most the analog bandwidth), rounding to
 * the ADC code above the pedestal, clipping and saturation. The output is calibrated to the window
 * current: the (2/pi) square-wave fundamental factor of physics.md is absorbed in the chain gain.
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>PRE-1: ranges, feedback resistors and LSBs follow the description (demo-cup.yaml: 40 pA * 32^r, 4 V full scale).</li>
 *   <li>PRE-2: counts = pedestal + round(I/LSB); zero current reads the pedestal; full scale reads
 *       65535 and is flagged saturated; below 0 and above 65535 clip.</li>
 *   <li>PRE-3: the sample variance over many seeded samples equals 2eIB + 4kTB/R_f + LSB^2/12.</li>
 *   <li>PRE-4: shot and Johnson noise are equal at I* = 2kT/(eR_f), 0.52 pA for 1e11 ohm (physics.md).</li>
 *   <li>PRE-5: deterministic given the caller's seeded stream; allocation-free.</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * {@code PreamplifierTest}: PRE-1, PRE-2, PRE-4 exactly; PRE-3 with a chi-square tolerance over 40 000
 * samples from a recorded seed; PRE-5 by repeating a seeded stream.
 *
 * <h2>Limits</h2>
 * The shot term uses the window current and e; the whole collected current (and 2e for alphas)
 * would be stricter. No 1/f noise, no amplifier voltage noise, no range-switch transients.
 */
package dev.sweepline.sim.preamp;
