/**
 * Tuning campaigns: a scenario ensemble (seeded draws of the starting plasma and of when the shocks
 * come) crossed with a grid over the sweep parameters, run in parallel, sharded for job arrays, journalled
 * run by run so that a killed shard resumes.
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
 * <li>C4 A killed shard, run again, skips the runs its journal holds (a torn last line dropped, a damaged
 *     journal refused) and writes the same files as an uninterrupted run, octet for octet. Verified:
 *     CampaignResumeTest, TuneShardCommandLineTest.</li>
 * <li>C5 Merge takes only shards of one campaign file (SHA-256) and code version, every shard of one split
 *     exactly once and finished, and names the missing shard indexes. Verified: ShardSetTest,
 *     TuneShardCommandLineTest.</li>
 * <li>C6 {@code --shard auto} takes the shard from a Slurm job array or a Kubernetes Indexed Job, and says in
 *     one line which variable is missing, malformed or out of range. Verified: ShardEnvironmentTest,
 *     TuneShardCommandLineTest.</li>
 * </ol>
 * Every set runs on the same ensemble members (common random numbers). The Pareto front is over
 * accuracy (mean median error of n, U, T), telemetry rate and cadence; the recommendation is the most
 * accurate sound set on the front within the allocation.
 */
package dev.sweepline.sim.campaign;
