/**
 * What the flight software knows of its own instrument: {@link dev.sweepline.fsw.instrument.InstrumentDescription},
 * the integer facts of the instrument description file ({@code instruments/FORMAT.md}: quadrants, gain
 * ranges and their ratio, ADC width, pedestal and top code, sample octets on the link, DAC width and
 * nominal scale, modulator limits, modulation period, default table and parameters), given at start-up
 * as configuration and checked by its builder; and its {@link dev.sweepline.fsw.instrument.InstrumentLimits}
 * (the highest modulator voltage, the nominal DAC scale, the DAC's top code, the range ratio and the HV
 * supply's slew and settling), against which every window table and sweep parameter set is checked
 * before it can be verified, committed, restored or flown. JDK only, no floating point: the file is read
 * by the host ({@code host.instrument}), which hands the core integers.
 *
 * <p>Requirements: I1 no table whose level exceeds the voltage limit is ever verified, committed,
 * restored from non-volatile memory or flown (verified by {@code InstrumentLimitsTableTest} and the
 * hw-sim {@code UnsafeTableRunTest}); I2 the settle parameters are never below the supply's slew and
 * settling (same tests); I3 no instrument fact is a compile-time constant of the core: every buffer is sized
 * from the description at construction, every check takes its values (ArchitectureTest: this package
 * depends on the table package alone; the host reader's InstrumentFileReaderTest checks the derived values
 * of the built-in descriptions by hand; science WideSampleTest runs a 24-bit description).
 */
package dev.sweepline.fsw.instrument;
