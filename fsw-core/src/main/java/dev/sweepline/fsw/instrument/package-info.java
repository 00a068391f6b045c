/**
 * What the flight software knows of its own instrument's limits: the highest modulator voltage, the
 * nominal DAC scale, and the HV supply's slew and settling, against which every window table and
 * sweep parameter set is checked before it can be verified, committed, restored or flown.
 *
 * <p>Requirements: I1 no table whose level exceeds the voltage limit is ever verified, committed,
 * restored from non-volatile memory or flown (verified by {@code InstrumentLimitsTableTest} and the
 * hw-sim {@code UnsafeTableRunTest}); I2 the settle parameters are never below the supply's slew and
 * settling (same tests). The limits are configuration ({@code FlightConfig.instrumentLimits}), not
 * constants of the code.
 */
package dev.sweepline.fsw.instrument;
