/**
 * Tuning campaigns: a scenario ensemble (seeded draws of the starting plasma and of when the shocks
 * come) crossed with a grid over the sweep parameters, run in parallel, sharded for job arrays.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>C1 Results do not depend on the thread count, and sharded-then-merged equals unsharded, file
 *     for file (runs.csv, sets.csv, summary.json). Verified: CampaignDeterminismTest.</li>
 * <li>C2 A broken campaign file names file, line and field; a set the flight software would refuse
 *     fails the file. Verified: CampaignReaderTest.</li>
 * <li>C3 The recommended set, written as a table image, loaded by telecommand and restored from
 *     non-volatile memory in a fresh flight software, reproduces every reported metric. Verified:
 *     RecommendedTableTest.</li>
 * </ol>
 * Every set runs on the same ensemble members (common random numbers). The Pareto front is over
 * accuracy (mean median error of n, U, T), telemetry rate and cadence; the recommendation is the most
 * accurate sound set on the front within the allocation.
 */
package dev.sweepline.sim.campaign;
