package dev.sweepline.sim.campaign;

import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.GroundCheck;
import dev.sweepline.sim.bench.GroundInstruments;
import dev.sweepline.sim.bench.RunPool;
import java.util.ArrayList;
import java.util.List;

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
        List<int[]> jobs = new ArrayList<>();
        for (int set = 0; set < spec.setCount(); set++) {
            for (int run = 0; run < spec.runsPerSet(); run++) {
                if (shard.owns((long) set * spec.runsPerSet() + run)) {
                    jobs.add(new int[] {set, run});
                }
            }
        }
        return RunPool.map("campaign run", threads, jobs, job -> runOne(spec, job[0], job[1]), progress);
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
