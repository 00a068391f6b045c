/**
 * The link between the flight software and the simulated instrument: design note.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.sim.link.InProcessLink} serves the flight software's
 * {@link dev.sweepline.fsw.link.InstrumentLink} in process by the simulated instrument on simulated
 * time: a step sent at t is executed against the plasma at its mid-integration and its reply appears
 * at t + the step's duration, as over a wire. The serial and TCP links of the hardware ICD implement
 * the same interface (fsw-core link and host, hw-sim serve). {@link dev.sweepline.sim.link.LinkBudget}
 * sizes the serial link: the octets per second a table's step rate puts on it against the line rate.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>L1</b> One step in flight; its reply is visible at its send time plus its duration, not before.
 *     <i>LinkClockEquivalenceTest (the in-process and the served sample streams are equal).</i></li>
 * <li><b>L2</b> Link load per mode against the baud rate, 19 octets per frame each way (hardware ICD
 *     §2, §6), steps timed as the scheduler times them, warning above 80 %. <i>LinkBudgetTest (values
 *     computed by hand, and the ICD §6 figures of the default table).</i></li>
 * </ol>
 * Threading: one thread, the bench's.
 */
package dev.sweepline.sim.link;
