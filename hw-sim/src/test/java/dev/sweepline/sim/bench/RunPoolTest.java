package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.locks.LockSupport;
import org.junit.jupiter.api.Test;

/** The run pool's contract (bench design note B5): results in job order whatever the thread count. */
class RunPoolTest {
    /** Jobs 0..39; job k sleeps (40 - k) x 0.2 ms, so on several threads the late jobs finish first. */
    private static final List<Integer> JOBS = jobs(40);

    @Test
    void shouldGiveTheResultsInJobOrderOnAnyThreadCount() {
        List<String> expected = new ArrayList<>();
        JOBS.forEach(k -> expected.add("job " + k));
        for (int threads : new int[] {1, 2, 3, 8, 100}) {
            assertEquals(expected, RunPool.map("test job", threads, JOBS, RunPoolTest::slowJob, RunPool.Progress.NONE),
                    threads + " threads");
        }
    }

    @Test
    void shouldRunOnTheThreadsAskedForAndNoMore() {
        Set<String> names = ConcurrentHashMap.newKeySet();
        RunPool.map("test job", 3, JOBS, k -> names.add(Thread.currentThread().getName()), RunPool.Progress.NONE);
        assertTrue(names.size() <= 3 && !names.isEmpty(), names.toString());
        assertTrue(names.stream().allMatch(n -> n.startsWith("test-job-")), names.toString());
        names.clear();
        RunPool.map("test job", 8, jobs(2), k -> names.add(Thread.currentThread().getName()), RunPool.Progress.NONE);
        assertTrue(names.size() <= 2, "no more threads than jobs: " + names);
    }

    @Test
    void shouldRefuseFewerThanOneThread() {
        for (int threads : new int[] {0, -1, Integer.MIN_VALUE}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> RunPool.map("test job", threads, JOBS, k -> k, RunPool.Progress.NONE));
            assertEquals("threads must be at least 1, got " + threads, e.getMessage());
        }
    }

    @Test
    void shouldReportEveryJobOnceAndTheTotal() {
        AtomicInteger calls = new AtomicInteger();
        Set<Integer> done = ConcurrentHashMap.newKeySet();
        RunPool.map("test job", 4, JOBS, k -> k, (d, total) -> {
            calls.incrementAndGet();
            done.add(d);
            assertEquals(JOBS.size(), total);
        });
        assertEquals(JOBS.size(), calls.get());
        assertEquals(JOBS.size(), done.size()); // 1..40, each once
    }

    @Test
    void shouldFailWithTheJobsExceptionAsTheCause() {
        ArithmeticException boom = new ArithmeticException("job 7");
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> RunPool.map("test job", 2, JOBS, k -> {
            if (k == 7) {
                throw boom;
            }
            return k;
        }, RunPool.Progress.NONE));
        assertSame(boom, e.getCause());
        assertTrue(e.getMessage().startsWith("a test job failed"), e.getMessage());
    }

    @Test
    void shouldGiveNothingForNoJobs() {
        assertEquals(List.of(), RunPool.map("test job", 2, List.<Integer>of(), k -> k, RunPool.Progress.NONE));
    }

    private static String slowJob(int k) {
        LockSupport.parkNanos((JOBS.size() - k) * 200_000L);
        return "job " + k;
    }

    private static List<Integer> jobs(int n) {
        List<Integer> jobs = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            jobs.add(k);
        }
        return jobs;
    }
}
