package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import java.util.concurrent.locks.LockSupport;

/**
 * The flight software on an accelerated clock driven by link events, for hardware-in-the-loop
 * runs faster than real time against a simulator that answers at once: time is simulated, and
 * when a reply arrives it is taken to arrive at the step's send time plus its duration (what the
 * electronics would take). That is exactly the time line of the in-process bench, so the same
 * seed gives the same decisions and telemetry. A reply that does not come within a wall-clock wait
 * lets simulated time jump to the executive's next wake-up, so its time-out and retries run as in
 * flight. With nothing in flight, time moves in steps of {@link #IDLE_MICROS}. Ends at the planned
 * end, on {@link #stop()}, or at a link loss: the peer gone, or a link time-out of the executive
 * ({@link LoopEnd}).
 *
 * <p>Threading: runs on the calling thread; {@link #stop()} may be called from any thread.
 */
public final class LinkClockLoop extends HostLoop {
    /** Simulated time step with nothing in flight, microseconds (the in-process bench's idle step). */
    public static final long IDLE_MICROS = 10_000;
    /** Busy polls before the wait starts to park (a reply over a pty takes a few ms; design value). */
    private static final int SPINS_BEFORE_PARK = 200;
    /** Park between polls after that, nanoseconds. */
    private static final long PARK_NANOS = 20_000;

    /** Waits, in wall-clock time, for a reply to be held by the link. */
    public interface ReplyWait {
        /** Returns true once {@code link} holds a reply, false when the wait gave up. */
        boolean await(FramedInstrumentLink link);
    }

    private final FlightSoftware fsw;
    private final FramedInstrumentLink link;
    private final ReplyWait wait;
    private long gaveUp;

    /** A loop driving {@code fsw}, whose link is (or wraps) {@code link}. */
    public LinkClockLoop(FlightSoftware fsw, FramedInstrumentLink link, ReplyWait wait) {
        this.fsw = fsw;
        this.link = link;
        this.wait = wait;
    }

    /** A wait that pumps the link until a reply is held or {@code timeoutMillis} of wall time pass. */
    public static ReplyWait wallClockWait(long timeoutMillis) {
        long timeoutNanos = timeoutMillis * 1_000_000L;
        return l -> {
            long start = System.nanoTime();
            for (int spins = 0; !l.pump(); spins++) {
                if (l.ended() || System.nanoTime() - start > timeoutNanos) {
                    return false;
                }
                if (spins < SPINS_BEFORE_PARK) {
                    Thread.onSpinWait();
                } else {
                    LockSupport.parkNanos(PARK_NANOS);
                }
            }
            return true;
        };
    }

    /** Runs simulated time from 0 to {@code endMicros}, until {@link #stop()} or a link loss; returns where time stopped. */
    @Override
    public long run(long endMicros) {
        long now = 0;
        Executive exec = fsw.executive();
        long safeAtStart = exec.safeEntries();
        while ((end = LoopEnd.check(now, endMicros, stopped, link, fsw, safeAtStart)) == LoopEnd.RUNNING) {
            lastMicros = now;
            beforeCycle.at(now);
            int work = fsw.doWork(now);
            if (exec.outstanding()) {
                if (wait.await(link)) {
                    now = Math.max(now, link.expectedReplyMicros());
                } else {
                    gaveUp++;
                    now = Math.max(now, exec.nextWakeMicros());
                }
            } else if (work == 0) {
                now += IDLE_MICROS;
            }
        }
        lastMicros = now;
        return now;
    }

    /** Waits that gave up (reply overdue in wall time). */
    public long waitsGivenUp() {
        return gaveUp;
    }
}
