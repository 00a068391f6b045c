package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import java.util.concurrent.locks.LockSupport;

/**
 * The flight software on a PC in real time: reads the monotonic clock once per cycle, calls
 * {@link FlightSoftware#doWork(long)} with it, and parks briefly when there is nothing to do (at most
 * {@link #MAX_PARK_MICROS}, less when the executive wakes sooner). Ends at the planned end, on
 * {@link #stop()}, or at a link loss: the peer gone, or a link time-out of the executive
 * ({@link LoopEnd}).
 *
 * <p>Threading: runs on the calling thread; {@link #stop()} may be called from any thread.
 */
public final class RealTimeLoop extends HostLoop {
    /** Longest park between cycles with nothing to do, microseconds (bounds the added reply latency). */
    public static final long MAX_PARK_MICROS = 200;

    private final FlightSoftware fsw;
    private final FramedInstrumentLink link;
    private final MonotonicClock clock;
    private long cycles;

    /** A loop driving {@code fsw}, whose link is (or wraps) {@code link}, on {@code clock}. */
    public RealTimeLoop(FlightSoftware fsw, FramedInstrumentLink link, MonotonicClock clock) {
        this.fsw = fsw;
        this.link = link;
        this.clock = clock;
    }

    /** Runs until {@code endMicros} on the clock, {@link #stop()}, or a link loss; returns the last time. */
    @Override
    public long run(long endMicros) {
        long safeAtStart = fsw.executive().safeEntries();
        long now = clock.nowMicros();
        while ((end = LoopEnd.check(now, endMicros, stopped, link, fsw, safeAtStart)) == LoopEnd.RUNNING) {
            lastMicros = now;
            beforeCycle.at(now);
            int work = fsw.doWork(now);
            cycles++;
            if (work == 0 && !link.pump()) {
                long wake = fsw.executive().nextWakeMicros() - now;
                LockSupport.parkNanos(Math.max(1, Math.min(MAX_PARK_MICROS, wake)) * 1_000);
            }
            now = clock.nowMicros();
        }
        lastMicros = now;
        return now;
    }

    /** Cycles run. */
    public long cycles() {
        return cycles;
    }
}
