/**
 * The closed-loop bench: the flight software drives the simulated instrument through the in-process
 * link on simulated time, a recorder keeps the truth beside every decision, and the ground check
 * decodes and fits the run's own telemetry. A run is described by a {@code BenchConfig} (scenario, seed,
 * duration, the flight software's whole {@code FlightConfig}, the simulated instrument, the allocation);
 * campaigns and budgets run many on a {@code RunPool}.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>B1 Same scenario, seed and configuration give the same decisions (decision hash) and the same
 *     telemetry bytes, in one JVM and across JVMs. Verified: ClosedLoopDeterminismTest.</li>
 * <li>B2 The summary has lockFraction, alphaLocks, reacquireSweepsMax/SecondsMax, spectraPerSecond by
 *     mode, integratingFraction, steps, bitsPerSecond against the allocation, the D-efficiency and the
 *     ground's momentErrors and crlbRatio. Verified: ClosedLoopBenchTest, BenchCommandLineTest.</li>
 * <li>B3 The scheduler's closed-loop properties hold over 1000 seeds each: no alpha lock for He/H
 *     1-15 %, lock fraction at least 0.99 in steady wind, the new peak held within 2 sweeps after a
 *     shock. Verified: SweepPropertiesTest.</li>
 * <li>B4 On a plasma held still the whole chain recovers n, U, T at the Cramér-Rao bound (0.8-1.3 x).
 *     Verified: GroundCheckTest.</li>
 * <li>B5 Independent runs on N threads ({@code RunPool}, used by campaigns and budgets) come back in the
 *     order they were given, whatever N; N below 1 is refused. Verified: RunPoolTest,
 *     CampaignDeterminismTest.</li>
 * <li>B6 A run's configuration carries the flight software's start-up configuration whole, as a value:
 *     every option reaches the flight software, and no run or hook changes the config it came from.
 *     Verified: FlightConfigCopyTest.</li>
 * <li>B7 The evaluation table ({@code Evaluation}, {@code bench evaluate}) flies every built-in and every
 *     evaluation case on seeds 1..K with the ground on and gives per case the median and p95 errors, the
 *     bias (median z), the rms and robust CRLB ratios, the flagged count and the errors without them, the
 *     spurious-alpha rate, the tracking error, the strict reacquisition and the mean reduced chi-square
 *     per mode; on a steady plasma without alphas that mean is 1 within 4 of its standard errors
 *     sqrt(sum 2/nu)/N. Verified: EvaluationTest.</li>
 * <li>B8 A run's memory does not grow with its length unless its records are asked for (the ground check
 *     asks): the summary's sweep figures are tallied as the sweeps complete, in memory bounded by the table,
 *     and are the figures the list functions give (SweepTallyTest); {@code decisions.csv} is written as the
 *     run goes, the bytes the formatter gave (DecisionsCsvTest); the chart is drawn from a bounded series
 *     (DecisionSeriesTest). The true peak's pruned search finds the exhaustive search's window (TruePeakTest).
 *     The whole: a 7-simulated-day {@code run --no-ground} under {@code -Xmx64m}, the live heap after a
 *     full GC the same at its start and end (measured by hand, {@code jcmd PID GC.class_histogram}).
 *     The steps' plasma is one plasma refilled in place, the built plasma to the bit
 *     (ReusedPlasmaSeriesTest); the truth the recorder keeps is built afresh.</li>
 * </ol>
 * Truth conventions: the true peak of a species is the window where its noise-free current peaks
 * (for a hot wind well above the bulk-speed E/q); a focus sweep is locked when its band holds the
 * true proton peak; it is an alpha lock when its band was centred nearer the alpha peak; moments are
 * compared at the sweep's mid-time, with the temperature along the cup normal.
 */
package dev.sweepline.sim.bench;
