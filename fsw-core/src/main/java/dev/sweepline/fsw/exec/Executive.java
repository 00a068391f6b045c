package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;

/**
 * The flight software's executive: one step in flight at a time between the scheduler and the
 * instrument link (exec design note). Driven from outside by {@link #doWork(long)}; it never
 * blocks, reads no clock and allocates nothing after construction.
 *
 * <p>Every transmission of a step gets a fresh 16-bit sequence number; a reply is accepted when it
 * carries the number of any transmission of the step in flight (a late answer to the first send is
 * as good as the answer to a re-send: the command was the same). Other numbers are counted and
 * dropped. A step with no reply by {@code send time + step duration + margin} is re-sent up to
 * {@code maxRetries} times; then the executive puts the scheduler in SAFE (LINK_TIMEOUT).
 * Threading: one thread.
 */
public final class Executive {
    /**
     * Default reply margin beyond the step's own duration, microseconds: 20 ms (hardware ICD §4: the
     * wire time of both frames, 3.3 ms at 115200 baud, and the host's jitter).
     */
    public static final int DEFAULT_TIMEOUT_MARGIN_MICROS = 20_000;
    /** Default number of re-sends before SAFE (hardware ICD §4: at most 2). */
    public static final int DEFAULT_MAX_RETRIES = 2;
    /** Replies drained per {@link #doWork} call at most (bounds the work of one cycle). */
    public static final int MAX_POLLS_PER_CYCLE = 4;

    private static final int SEQUENCE_MASK = 0xFFFF;

    private final InstrumentLink link;
    private final SweepScheduler scheduler;
    private final int timeoutMarginMicros;
    private final int maxRetries;
    private final int modulationPeriodMicros;
    private final StepCommand step = new StepCommand();
    private final SampleReply reply = new SampleReply();

    private boolean outstanding;
    private boolean linkAccepted;
    /** True once the link accepted any transmission of the step in flight. */
    private boolean everAccepted;
    private int nextSequence;
    private int firstSequence;
    private int transmissions;
    private int retriesThisStep;
    private long sentMicros;
    private long deadlineMicros;
    private long lastNowMicros;

    private long stepsSent;
    private long repliesAccepted;
    private long sequenceErrors;
    private long timeouts;
    private long retries;
    private long sendRefusals;
    private long safeEntries;
    private long abandonedSteps;

    /** An executive with the default margin and retry count. */
    public Executive(InstrumentLink link, SweepScheduler scheduler) {
        this(link, scheduler, DEFAULT_TIMEOUT_MARGIN_MICROS, DEFAULT_MAX_RETRIES);
    }

    /**
     * An executive between {@code link} and {@code scheduler}.
     *
     * @param timeoutMarginMicros time allowed beyond the step's duration for its reply (>= 0)
     * @param maxRetries          re-sends of one step before SAFE (>= 0)
     * @throws IllegalArgumentException on a negative margin or retry count (programmer misuse)
     */
    public Executive(InstrumentLink link, SweepScheduler scheduler, int timeoutMarginMicros, int maxRetries) {
        if (timeoutMarginMicros < 0 || maxRetries < 0) {
            throw new IllegalArgumentException("negative margin or retry count");
        }
        this.link = link;
        this.scheduler = scheduler;
        this.timeoutMarginMicros = timeoutMarginMicros;
        this.maxRetries = maxRetries;
        this.modulationPeriodMicros = scheduler.instrument().modulationPeriodMicros();
    }

    /**
     * One cycle: with a step in flight, hand it to the link if it was refused before, poll for its
     * reply and check its deadline; with none in flight, get the next step and send it.
     *
     * @return work done (sends, replies handled, timeouts), 0 when idle
     */
    public int doWork(long nowMicros) {
        lastNowMicros = nowMicros;
        int work = 0;
        if (outstanding && !scheduler.awaitingReply()) {
            // a mode change (SAFE, or a commanded mode) abandoned the step: never re-send it; an
            // unsent one is dropped at once, a sent one may still answer until its deadline
            if (!linkAccepted || nowMicros - deadlineMicros > 0) {
                outstanding = false;
                abandonedSteps++;
                work++;
                if (!everAccepted) {
                    scheduler.stepNotSent(); // the electronics never saw its levels
                }
            }
        }
        if (outstanding) {
            if (!linkAccepted) {
                work += trySend(nowMicros);
            } else {
                work += pollReplies(nowMicros);
            }
            if (outstanding && nowMicros - deadlineMicros > 0) {
                work += timeout(nowMicros);
            }
        }
        if (!outstanding) {
            if (scheduler.nextStep(step, nowMicros)) {
                outstanding = true;
                retriesThisStep = 0;
                transmissions = 0;
                everAccepted = false;
                firstSequence = nextSequence;
                work += transmit(nowMicros);
            } else {
                work += drainStale(nowMicros);
            }
        }
        return work;
    }

    private int transmit(long nowMicros) {
        step.sequence = nextSequence;
        nextSequence = (nextSequence + 1) & SEQUENCE_MASK;
        transmissions++;
        linkAccepted = false;
        sentMicros = nowMicros;
        deadlineMicros = nowMicros + step.durationMicros(modulationPeriodMicros) + timeoutMarginMicros;
        return trySend(nowMicros) + 1;
    }

    private int trySend(long nowMicros) {
        if (link.send(step, nowMicros)) {
            linkAccepted = true;
            everAccepted = true;
            stepsSent++;
            return 1;
        }
        sendRefusals++;
        return 0;
    }

    private int pollReplies(long nowMicros) {
        int work = 0;
        for (int i = 0; i < MAX_POLLS_PER_CYCLE && outstanding; i++) {
            if (!link.poll(reply, nowMicros)) {
                break;
            }
            work++;
            if (((reply.sequence - firstSequence) & SEQUENCE_MASK) < transmissions) {
                outstanding = false;
                repliesAccepted++;
                scheduler.ingest(reply, nowMicros);
            } else {
                sequenceErrors++;
            }
        }
        return work;
    }

    private int drainStale(long nowMicros) {
        int work = 0;
        for (int i = 0; i < MAX_POLLS_PER_CYCLE; i++) {
            if (!link.poll(reply, nowMicros)) {
                break;
            }
            sequenceErrors++;
            work++;
        }
        return work;
    }

    private int timeout(long nowMicros) {
        timeouts++;
        if (retriesThisStep < maxRetries) {
            retriesThisStep++;
            retries++;
            return transmit(nowMicros);
        }
        outstanding = false;
        safeEntries++;
        scheduler.requestMode(SweepMode.SAFE, ModeChangeReason.LINK_TIMEOUT, nowMicros);
        if (!everAccepted) {
            scheduler.stepNotSent(); // every transmission was refused: the electronics never saw its levels
        }
        return 1;
    }

    /**
     * When {@link #doWork} next has something to do, microseconds: the expected reply time, then the
     * first instant past the deadline; the last time given when a step can be chosen now;
     * {@link Long#MAX_VALUE} in SAFE with nothing in flight.
     */
    public long nextWakeMicros() {
        if (outstanding) {
            if (!linkAccepted) {
                return lastNowMicros;
            }
            long expected = sentMicros + step.durationMicros(modulationPeriodMicros);
            return lastNowMicros - expected < 0 ? expected : deadlineMicros + 1;
        }
        return scheduler.mode() == SweepMode.SAFE ? Long.MAX_VALUE : lastNowMicros;
    }

    /** True while a step waits for its reply. */
    public boolean outstanding() {
        return outstanding;
    }

    /** The step in flight (or the last one), the executive's flyweight. */
    public StepCommand currentStep() {
        return step;
    }

    /** Transmissions the link accepted (first sends and re-sends). */
    public long stepsSent() {
        return stepsSent;
    }

    /** Replies ingested. */
    public long repliesAccepted() {
        return repliesAccepted;
    }

    /** Replies dropped for a sequence number of no step in flight. */
    public long sequenceErrors() {
        return sequenceErrors;
    }

    /** Deadlines passed without a reply. */
    public long timeouts() {
        return timeouts;
    }

    /** Re-sends after a timeout. */
    public long retries() {
        return retries;
    }

    /** Times the link refused a send (busy or down). */
    public long sendRefusals() {
        return sendRefusals;
    }

    /** Steps dropped because the scheduler abandoned them (mode change while in flight). */
    public long abandonedSteps() {
        return abandonedSteps;
    }

    /** Times the executive put the scheduler in SAFE for a link time-out. */
    public long safeEntries() {
        return safeEntries;
    }
}
