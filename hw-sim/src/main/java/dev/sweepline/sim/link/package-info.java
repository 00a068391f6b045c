/**
 * The flight software's {@link dev.sweepline.fsw.link.InstrumentLink} served in process by the
 * simulated instrument on simulated time: a step sent at t is executed against the plasma at its
 * mid-integration and its reply appears at t + the step's duration, as over a wire. The serial and
 * TCP links of the hardware ICD implement the same interface (fsw-core link and host, hw-sim serve).
 */
package dev.sweepline.sim.link;
