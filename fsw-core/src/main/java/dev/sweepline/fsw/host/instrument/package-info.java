/**
 * Instrument description files on the host ({@code instruments/FORMAT.md}, format
 * {@code sweepline-instrument/1}): {@link dev.sweepline.fsw.host.instrument.Instruments} finds a
 * built-in by name or a file by path, {@link dev.sweepline.fsw.host.instrument.InstrumentFileReader}
 * reads and checks it into an {@link dev.sweepline.fsw.host.instrument.InstrumentSpec} (plain units,
 * every key of the format: what the simulator builds its cup, HV supply and preamplifier from), and
 * {@code InstrumentSpec.flight()} gives the flight software's integer
 * {@link dev.sweepline.fsw.instrument.InstrumentDescription}.
 *
 * <p>Requirements: H1 every built-in loads and its name matches its file (verified by
 * {@code InstrumentFileReaderTest}); H2 a broken file fails with its file, line and field named, for an
 * unknown key, a value out of its range, and values that contradict each other (the parameterised
 * broken-file test of {@code InstrumentFileReaderTest}); H3 the derived values are those of FORMAT.md
 * (aperture radius, highest level code, settle limits; checked against hand computation there).
 */
package dev.sweepline.fsw.host.instrument;
