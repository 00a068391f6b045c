package dev.sweepline.fsw.sweep;

import java.lang.management.ManagementFactory;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Measures bytes allocated by the current thread over windows of a step loop, with the JVM's
 * per-thread allocation counter (com.sun.management.ThreadMXBean#getThreadAllocatedBytes).
 *
 * <p>Why windows: with the JIT on, the JVM itself now and then allocates a few dozen bytes on the
 * running thread (seen here: 48-264 bytes once in 100k-400k steps, never with -Xint), which is not
 * the code under test. A per-step or per-sweep allocation instead shows in every window (10k steps
 * allocating even 16 bytes each is 160 kB). So the rule: at least 8 of 10 windows allocate exactly
 * 0 bytes, and no window more than 1 kB.
 */
public final class AllocationMeter {
    /** Windows measured. */
    public static final int WINDOWS = 10;
    /** Steps per window. */
    public static final int STEPS_PER_WINDOW = 10_000;

    /** One window of the loop under test. */
    public interface Loop {
        /** Runs {@code steps} steps. */
        void run(int steps);
    }

    private AllocationMeter() {
    }

    /** Runs a warm-up of {@code WINDOWS * STEPS_PER_WINDOW} steps, then measures and asserts the rule. */
    public static long[] assertAllocationFree(Loop loop) {
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        assertTrue(threads.isThreadAllocatedMemorySupported());
        threads.setThreadAllocatedMemoryEnabled(true);
        long id = Thread.currentThread().getId();
        loop.run(WINDOWS * STEPS_PER_WINDOW); // warm-up: class loading, constant resolution, JIT
        long[] bytes = new long[WINDOWS];
        for (int w = 0; w < WINDOWS; w++) {
            long before = threads.getThreadAllocatedBytes(id);
            loop.run(STEPS_PER_WINDOW);
            bytes[w] = threads.getThreadAllocatedBytes(id) - before;
        }
        int zero = 0;
        long max = 0;
        for (long b : bytes) {
            zero += b == 0 ? 1 : 0;
            max = Math.max(max, b);
        }
        assertTrue(zero >= WINDOWS - 2 && max <= 1024, "bytes per window: " + java.util.Arrays.toString(bytes));
        return bytes;
    }
}
