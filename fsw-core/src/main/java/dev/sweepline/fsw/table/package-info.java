/**
 * Parameter tables of the sweep: design note.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.table.WindowTable} is the immutable list of energy-per-charge windows as
 * HV DAC codes (the default comes from the instrument description: {@code logSpaced(count, low, high,
 * millivoltsPerCode)}; the demo cup's is 128 contiguous log-spaced windows 50-6000 V, edges
 * 50 V * 120^(k/128), at the nominal 0.1 V/code); {@link dev.sweepline.fsw.table.SweepParameters} holds
 * the scheduler's tunables with units and fixed-point scales in their names (the flight defaults of the
 * tunables here, the cadence and noise from the description); {@link dev.sweepline.fsw.table.SettleTime}
 * is the settle formula; {@link dev.sweepline.fsw.table.TableStatus} names the reason codes with which a
 * load is refused. The checks take the instrument's numbers as arguments (its DAC's top code, its range
 * ratio): the package knows no instrument, the {@code instrument} package's limits call it.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>T1</b> The default table is the physics.md demo table: 128 windows, 500..60000 codes,
 *     contiguous, about 3.8 % wide. <i>WindowTableTest.shouldBuildDefaultTableFromPhysicsSpec,
 *     shouldSpaceDefaultWindowsAtAboutFourPercent.</i></li>
 * <li><b>T2</b> A table is valid only with 1..256 windows, every code in 0..the DAC's top code (at most the
 *     hardware ICD's 65535), lows and highs
 *     strictly increasing and low &lt; high; each violation has its own reason code (EMPTY,
 *     TOO_MANY_WINDOWS, OUT_OF_DAC_RANGE, NOT_MONOTONIC, MISSING_DATA).
 *     <i>WindowTableTest.shouldRefuse*.</i></li>
 * <li><b>T3</b> Bad input is a status, not an exception: validate returns a code; the factories throw
 *     only for programmer misuse. <i>WindowTableTest.shouldThrowOnlyWhenFactoryIsMisused.</i></li>
 * <li><b>T4</b> A built table is immutable (inputs copied). <i>WindowTableTest.shouldCopyInputArrays.</i></li>
 * <li><b>T5</b> Parameters validate by group with their own codes, the gain hysteresis against the
 *     instrument's range ratio; the demo cup's defaults validate and carry the physics.md values (alpha
 *     ratio 1.986300 in Q16, gain thresholds 80 % / 2 % in Q16); copies are independent.
 *     <i>SweepParametersTest, host InstrumentFileReaderTest.</i></li>
 * </ol>
 * Floating point is used only by the start-up factory {@code logSpaced} (NoFloatingPointTest allows it
 * there and nowhere else).
 */
package dev.sweepline.fsw.table;
