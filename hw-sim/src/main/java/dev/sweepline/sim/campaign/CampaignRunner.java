package dev.sweepline.sim.campaign;

import dev.sweepline.fsw.telemetry.TelemetryWriter;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.GroundCheck;
import dev.sweepline.sim.instrument.InstrumentModel;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Runs a campaign's jobs (set x ensemble member) on a pool of threads. Every job is an independent,
 * seeded closed loop, and results are collected in job order, so the result is the same whatever
 * the thread count, and a shard's rows are exactly the unsharded rows it owns.
 */
public final class CampaignRunner {
    /** Told after each finished job. */
    public interface Progress {
        /** {@code done} of {@code total} jobs of this shard finished. */
        void update(int done, int total);

        /** Shows nothing. */
        Progress NONE = (done, total) -> { };
    }

    private CampaignRunner() {
    }

    /** Runs the jobs of {@code shard} on {@code threads} threads; rows in job order. */
    public static List<RunRow> run(CampaignSpec spec, int threads, Shard shard, Progress progress) {
        List<int[]> jobs = new ArrayList<>();
        for (int set = 0; set < spec.setCount(); set++) {
            for (int run = 0; run < spec.runsPerSet(); run++) {
                if (shard.owns((long) set * spec.runsPerSet() + run)) {
                    jobs.add(new int[] {set, run});
                }
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads), r -> {
            Thread t = new Thread(r, "campaign-run");
            t.setDaemon(true);
            return t;
        });
        try {
            AtomicInteger done = new AtomicInteger();
            List<Future<RunRow>> futures = new ArrayList<>();
            for (int[] job : jobs) {
                futures.add(pool.submit(() -> {
                    RunRow row = runOne(spec, job[0], job[1]);
                    progress.update(done.incrementAndGet(), jobs.size());
                    return row;
                }));
            }
            List<RunRow> rows = new ArrayList<>();
            for (Future<RunRow> f : futures) {
                rows.add(f.get());
            }
            return rows;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("campaign interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a campaign run failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /** One job: set {@code set} on ensemble member {@code run}. */
    static RunRow runOne(CampaignSpec spec, int set, int run) {
        InstrumentModel instrument = InstrumentModel.demo();
        BenchConfig config = new BenchConfig(spec.member(run), spec.runSeed(run), spec.durationSeconds(),
                instrument.flight().defaultTable(), spec.parameters(set), instrument,
                TelemetryWriter.DEFAULT_FRAME_LENGTH, spec.allocationBitsPerSecond(), true);
        GroundCheck ground = new GroundCheck();
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        return RunRow.of(set, run, r.summary(), ground.compare(r.recorder().sweeps(), r.recorder()::truthAt));
    }
}
