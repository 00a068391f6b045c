/**
 * The instrument as the ground knows it: the description files of FORMAT.md (format
 * {@code sweepline-instrument/1}), read by the ground itself, so that no instrument fact is a constant of
 * its code (architecture.md, "The instrument is data").
 *
 * <h2>Design note</h2>
 * <p>{@link dev.sweepline.ground.instrument.InstrumentReader} reads one description with the Jackson YAML
 * streaming parser ({@code LocatedYaml}), which keeps the line of every key and value; each mapping is
 * opened with the keys FORMAT.md gives it ({@code DescriptionSection}), so an unknown key is refused at
 * once, and every value is checked for its kind and range and against the values it must agree with.
 * The result is a {@link dev.sweepline.ground.instrument.GroundInstrument}: id, name, geometry (the
 * aperture radius derived from the effective area when the area is given), modulator with its DAC and
 * HV calibration, the default window table (edges E_k = low × (high/low)^(k/count) rounded to the nominal
 * DAC scale, then calibrated), gain ranges (FS_r = FS₀ × ratio^r), ADC width (the sample width) and
 * pedestal. The built-ins are the flight software's own files, copied by this module's build into its
 * class path at {@code /instruments}: data shared, no code dependency ({@code ArchitectureTest}). An
 * {@link dev.sweepline.ground.instrument.InstrumentSet} holds the descriptions a ground is configured with,
 * keyed by the id spectrum packets carry; the default is every built-in.
 *
 * <p>Requirements and how each is verified:
 * <ol>
 *   <li>I1 both built-ins parse and give the derived values of FORMAT.md and ICD §8 checked by hand: the demo
 *       cup's aperture radius 6.9653 mm, first window code 500 and 49.275 V, 16-bit top code and ranges; the
 *       fine cup's 256 windows, codes and calibrated edges, top code 1048575 ({@code BuiltInInstrumentsTest},
 *       {@code DefaultWindowTableTest}, {@code DefaultWindowTableLookupTest}, {@code InstrumentCurrentTest}).</li>
 *   <li>I2 a broken file fails with file, line and field: an unknown key (also in {@code sweep} and at the top
 *       level), a missing key, a wrong kind, a negative radius, 257 windows, a voltage limit above the DAC's
 *       reach, values that contradict each other, a key written twice ({@code InstrumentReaderTest}).</li>
 *   <li>I3 {@code --instrument NAME|FILE}: a built-in name wins, else a file; two descriptions of one id are
 *       refused ({@code InstrumentReaderTest}, {@code InstrumentOptionTest}).</li>
 * </ol>
 *
 * <p>Choices: a zero-width window of the default table (two edges rounding to one code) is refused, as the
 * flight software's table check refuses a table that does not rise (commands.md §4.2). The optional
 * {@code sweep} section is checked for its keys and their kind only (whole window counts within the table,
 * fractions in (0, 1), settle times within the instrument's limits); the flight software's finer ranges are
 * its table validation's. Values the ground has no use for (HV slew and settling, monitor noise, cadence)
 * are checked and not kept.
 */
package dev.sweepline.ground.instrument;
