/**
 * The simulated instrument: plasma, cup, HV supply and preamplifier put together behind the
 * hardware ICD's step command and sample reply.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.instrument.SimulatedInstrument#execute} runs one
 * {@link dev.sweepline.fsw.link.StepCommand}: commands the HV supply (or switches it off), waits the
 * settle time, takes the energy-per-charge window at the rails' actual levels at mid-integration,
 * computes the noiseless quadrant currents ({@code FaradayCup}), adds preamplifier noise and
 * quantises in the commanded gain range, and fills a {@link dev.sweepline.fsw.link.SampleReply} and a
 * {@link dev.sweepline.sim.instrument.StepTruth}. {@link dev.sweepline.sim.instrument.InstrumentModel}
 * is the parameter set, built from an instrument description file ({@code InstrumentModel.of(spec)}:
 * geometry, HV calibration and dynamics, preamplifier and ADC, instruments/FORMAT.md); the demo cup is
 * {@code InstrumentModel.of(Instruments.builtIn("demo-cup"))}. {@link dev.sweepline.sim.instrument.InstrumentKey}
 * reads the {@code instrument:} key of campaign and plan files.
 *
 * <h2>Requirements</h2>
 * <ol>
 *   <li>INS-1: same model, same seed, same calls give identical replies and truths; another seed gives
 *       other noise.</li>
 *   <li>INS-2: with HV off the reply says STATUS_HV_OFF and the samples sit at the pedestal within the
 *       Johnson noise; the truth current is zero.</li>
 *   <li>INS-3: a step that does not wait for the HV to settle (e.g. settle 0 after a large jump) is
 *       flagged STATUS_HV_UNSETTLED and its truth records the window at the voltage really applied.</li>
 *   <li>INS-4: the reply echoes the sequence, reports the range actually used and the monitor code;
 *       saturation is flagged; the return value is start + cmd.durationMicros().</li>
 *   <li>INS-5: the recovered current (counts to amperes) agrees with the truth within the noise.</li>
 *   <li>INS-6: a few microseconds per step; no allocation per step (the error function is the
 *       allocation-free {@code plasma.ErrorFunction}; JMH {@code -prof gc}).</li>
 * </ol>
 *
 * <h2>How verified</h2>
 * INS-1..INS-5 by {@code SimulatedInstrumentTest}; INS-6 by {@code SimulatedInstrumentBenchmark}
 * (JMH, {@code -prof gc}).
 */
package dev.sweepline.sim.instrument;
