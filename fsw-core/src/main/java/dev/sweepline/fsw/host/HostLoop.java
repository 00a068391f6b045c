package dev.sweepline.fsw.host;

/**
 * A loop that drives the flight software on a PC until a planned end, a stop, or a link loss
 * ({@link LoopEnd}). {@code sweepline-fsw.jar run} runs one and then, whatever the end, the
 * {@link HvShutdown}. Subclasses keep {@link #end} and {@link #lastMicros} up to date and end their
 * loop when {@link #stopped} is set.
 *
 * <p>Threading: {@link #run} on one thread; {@link #stop()} from any thread.
 */
public abstract class HostLoop {
    /** Set by {@link #stop()}. */
    protected volatile boolean stopped;
    /** Why the last run returned. */
    protected LoopEnd end = LoopEnd.RUNNING;
    /** The loop's time at its last cycle, microseconds of run time. */
    protected long lastMicros;
    /** Called before every cycle with the cycle's time (a command script's due telecommands). */
    protected BeforeCycle beforeCycle = BeforeCycle.NONE;

    /** Work a loop does before each cycle of the flight software, on the loop's thread. */
    public interface BeforeCycle {
        /** Called with the time of the cycle about to run, microseconds of run time. */
        void at(long nowMicros);

        /** Does nothing. */
        BeforeCycle NONE = nowMicros -> { };
    }

    /** Calls {@code hook} before every cycle from now on. */
    public final HostLoop beforeEachCycle(BeforeCycle hook) {
        this.beforeCycle = hook;
        return this;
    }

    /** Runs until {@code endMicros} of run time, a stop or a link loss; returns the last time. */
    public abstract long run(long endMicros);

    /** Asks the loop to end after its current cycle. */
    public final void stop() {
        stopped = true;
    }

    /** The loop's time at its last cycle, microseconds of run time (also after an exception). */
    public final long lastMicros() {
        return lastMicros;
    }

    /** Why the last {@link #run} returned ({@link LoopEnd#RUNNING} before that, or after an exception). */
    public final LoopEnd end() {
        return end;
    }
}
