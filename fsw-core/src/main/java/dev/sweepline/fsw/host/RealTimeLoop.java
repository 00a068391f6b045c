package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import java.util.concurrent.locks.LockSupport;

/**
 * The flight software on a PC in real time: reads the monotonic clock once per cycle, calls
 * {@link FlightSoftware#doWork(long)} with it, and parks briefly when there is nothing to do (at most
 * {@link #MAX_PARK_MICROS}, less when the executive wakes sooner).
 *
 * <p>Threading: runs on the calling thread; {@link #stop()} may be called from any thread.
 */
public final class RealTimeLoop {
    /** Longest park between cycles with nothing to do, microseconds (bounds the added reply latency). */
    public static final long MAX_PARK_MICROS = 200;

    private final FlightSoftware fsw;
    private final FramedInstrumentLink link;
    private final MonotonicClock clock;
    private volatile boolean stopped;
    private long cycles;

    /** A loop driving {@code fsw}, whose link is (or wraps) {@code link}, on {@code clock}. */
    public RealTimeLoop(FlightSoftware fsw, FramedInstrumentLink link, MonotonicClock clock) {
        this.fsw = fsw;
        this.link = link;
        this.clock = clock;
    }

    /** Runs until {@code endMicros} on the clock, {@link #stop()}, or the link's peer leaves; returns the last time. */
    public long run(long endMicros) {
        long now = clock.nowMicros();
        while (now < endMicros && !stopped && !link.ended()) {
            int work = fsw.doWork(now);
            cycles++;
            if (work == 0 && !link.pump()) {
                long wake = fsw.executive().nextWakeMicros() - now;
                LockSupport.parkNanos(Math.max(1, Math.min(MAX_PARK_MICROS, wake)) * 1_000);
            }
            now = clock.nowMicros();
        }
        return now;
    }

    /** Asks the loop to end after its current cycle. */
    public void stop() {
        stopped = true;
    }

    /** Cycles run. */
    public long cycles() {
        return cycles;
    }
}
