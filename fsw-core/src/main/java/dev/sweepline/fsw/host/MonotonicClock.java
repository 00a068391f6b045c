package dev.sweepline.fsw.host;

/**
 * The host's clock: microseconds since construction from {@link System#nanoTime()}, monotonic.
 * Only the host adapter reads it, once per loop cycle (style.md 2: time is data).
 */
public final class MonotonicClock {
    private final long originNanos = System.nanoTime();

    /** Microseconds since construction. */
    public long nowMicros() {
        return (System.nanoTime() - originNanos) / 1_000;
    }
}
