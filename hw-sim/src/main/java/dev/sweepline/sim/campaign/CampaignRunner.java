package dev.sweepline.sim.campaign;

import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.GroundCheck;
import dev.sweepline.sim.bench.GroundInstruments;
import dev.sweepline.sim.bench.RunPool;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Runs a campaign's jobs (set x ensemble member) on a {@link RunPool}. Every job is an independent,
 * seeded closed loop, and results come back in job order, so the result is the same whatever the
 * thread count, and a shard's rows are exactly the unsharded rows it owns.
 */
public final class CampaignRunner {
    private CampaignRunner() {
    }

    /**
     * Runs the jobs of {@code shard} on {@code threads} threads (at least 1); rows in job order;
     * {@code progress} counts this shard's jobs.
     */
    public static List<RunRow> run(CampaignSpec spec, int threads, Shard shard, RunPool.Progress progress) {
        return RunPool.map("campaign run", threads, jobs(spec, shard, Set.of()), job -> runOne(spec, job[0], job[1]),
                progress);
    }

    /**
     * As {@link #run(CampaignSpec, int, Shard, RunPool.Progress)}, resuming from {@code journal}: the runs it
     * holds are not run again, every other run is appended to it as it finishes. The rows, in job order, are
     * the same as those of an uninterrupted run (a row read back from the journal equals the row written,
     * {@link RunRow}); {@code progress} counts the finished runs too.
     *
     * @throws UncheckedIOException when the journal cannot be written (the runs appended so far are kept)
     */
    public static List<RunRow> run(CampaignSpec spec, int threads, Shard shard, RunJournal journal,
            RunPool.Progress progress) {
        List<RunRow> rows = new ArrayList<>(journal.finished());
        Set<Long> finished = new HashSet<>();
        rows.forEach(r -> finished.add(job(spec, r)));
        int skipped = rows.size();
        rows.addAll(RunPool.map("campaign run", threads, jobs(spec, shard, finished), job -> {
            RunRow row = runOne(spec, job[0], job[1]);
            try {
                journal.append(row);
            } catch (IOException e) {
                throw new UncheckedIOException(journal.file() + ": cannot append a finished run: " + e.getMessage(), e);
            }
            return row;
        }, (done, total) -> progress.update(done + skipped, total + skipped)));
        rows.sort(Comparator.comparingLong(r -> job(spec, r)));
        return rows;
    }

    /** The job number of {@code row}: set-major, as {@link Shard#owns} counts. */
    static long job(CampaignSpec spec, RunRow row) {
        return (long) row.set() * spec.runsPerSet() + row.run();
    }

    /** The (set, member) jobs {@code shard} owns, in job order, without those in {@code finished}. */
    private static List<int[]> jobs(CampaignSpec spec, Shard shard, Set<Long> finished) {
        List<int[]> jobs = new ArrayList<>();
        for (int set = 0; set < spec.setCount(); set++) {
            for (int run = 0; run < spec.runsPerSet(); run++) {
                long job = (long) set * spec.runsPerSet() + run;
                if (shard.owns(job) && !finished.contains(job)) {
                    jobs.add(new int[] {set, run});
                }
            }
        }
        return jobs;
    }

    /** Set {@code set} on ensemble member {@code run}: the default flight software with the set's parameters. */
    static BenchConfig config(CampaignSpec spec, int set, int run) {
        return BenchConfig.defaults(spec.member(run), spec.runSeed(run), spec.durationSeconds(), spec.instrument())
                .withFlight(f -> f.parameters = spec.parameters(set)).withAllocation(spec.allocationBitsPerSecond());
    }

    /** One job: set {@code set} on ensemble member {@code run}. */
    static RunRow runOne(CampaignSpec spec, int set, int run) {
        BenchConfig config = config(spec, set, run);
        GroundCheck ground = new GroundCheck(config.flight(), GroundInstruments.of(spec.instrument().spec()));
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        return RunRow.of(set, run, r.summary(), ground.compare(r.recorder().sweeps(), r.recorder()::truthAt));
    }
}
