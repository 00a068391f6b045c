package dev.sweepline.sim.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;

/**
 * Runs independent, seeded jobs (campaign runs, budget points) on a fixed number of worker threads
 * and hands the results back in the order the jobs were given, whatever the thread count: a job's
 * result depends on the job alone, so one thread and many give the same list.
 *
 * <p>Threading: {@link #map} blocks its caller until every job is done; the jobs run on daemon threads
 * named after the pool, which end with the call. The progress callback is called from the workers.
 */
public final class RunPool {
    /** Told after each finished job, from the worker that finished it. */
    public interface Progress {
        /** {@code done} of {@code total} jobs finished. */
        void update(int done, int total);

        /** Shows nothing. */
        Progress NONE = (done, total) -> { };
    }

    private RunPool() {
    }

    /**
     * The results of {@code work} over {@code jobs}, in job order, computed on {@code threads} threads.
     *
     * @param name     names the threads and the failure ("campaign run", "budget point")
     * @param threads  worker threads, at least 1 (more than there are jobs are not started)
     * @throws IllegalArgumentException when {@code threads} is below 1
     * @throws IllegalStateException    when a job fails (its exception is the cause) or the caller is interrupted
     */
    public static <J, R> List<R> map(String name, int threads, List<J> jobs, Function<? super J, ? extends R> work,
            Progress progress) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        if (jobs.isEmpty()) {
            return List.of();
        }
        AtomicInteger started = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, jobs.size()), r -> {
            Thread t = new Thread(r, name.replace(' ', '-') + "-" + started.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        try {
            AtomicInteger done = new AtomicInteger();
            List<Future<R>> futures = new ArrayList<>(jobs.size());
            for (J job : jobs) {
                futures.add(pool.submit(() -> {
                    R result = work.apply(job);
                    progress.update(done.incrementAndGet(), jobs.size());
                    return result;
                }));
            }
            List<R> results = new ArrayList<>(jobs.size());
            for (Future<R> f : futures) {
                results.add(f.get());
            }
            return results;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(name + "s interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a " + name + " failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
