package dev.sweepline.sim.serve;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.ByteTransport;
import dev.sweepline.fsw.link.FrameReceiver;
import dev.sweepline.fsw.link.FrameSender;
import dev.sweepline.fsw.link.HousekeepingCodec;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.LinkWatchdog;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.fsw.link.MessageType;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.SampleReplyCodec;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.link.StepCommandCodec;
import java.util.concurrent.locks.LockSupport;

/**
 * The electronics' side of the hardware ICD on a {@link ByteTransport}: reads step frames, executes
 * each with a {@link StepExecutor} on the instrument's own clock, which advances by each executed
 * step's duration (so the sample stream is that of the in-process bench), and replies when the step
 * is over: after {@code duration / speed} of wall time, or at once for speed 0.
 *
 * <p>One step in flight (ICD §4): no further frame is read while a reply waits. A step whose
 * sequence number is that of the last executed step gets the stored reply again without executing.
 * A step with low level not below the high level is executed with the HV off (ICD §5). Bad frames are
 * discarded and counted. Housekeeping requests are answered between steps.
 *
 * <p>Link watchdog (ICD §4.1): with the HV on, no valid step frame for
 * {@link #WATCHDOG_NANOS} of wall time after the reply to the last step, or the end of the stream,
 * switches the HV off ({@link StepExecutor#switchHvOff}); housekeeping reports it (status bit 1 and
 * the trip count) until a step enables the HV again.
 *
 * <p>Threading: one thread ({@link #doWork(long)} or {@link #run}); {@link #stop()} from any thread.
 */
public final class InstrumentServer {
    /** Octets read from the transport per read at most: the size of the one receive buffer. */
    static final int READ_CHUNK = 256;
    /**
     * Reads per {@link #doWork} at most, so one cycle handles at most 8 x 256 = 2048 octets however fast
     * they come (as the flight software's link bounds its pump; common practice: bound every loop).
     */
    static final int MAX_READS_PER_CALL = 8;
    /** The link watchdog, wall nanoseconds (hardware ICD §4.1: 2 s). */
    public static final long WATCHDOG_NANOS = LinkWatchdog.TIMEOUT_MICROS * 1_000;

    private final StepExecutor executor;
    private final ByteTransport transport;
    private final double speed;
    private final LinkCounters counters = new LinkCounters();
    /** The instrument's sample replies (its ADC width sets the sample octets: hardware ICD §3.2). */
    private final SampleReplyCodec replies;
    private final FrameReceiver receiver;
    private final int modulationPeriodMicros;
    private final FrameSender sender;
    private final StepCommand step = new StepCommand();
    private final SampleReply reply = new SampleReply();
    private final HousekeepingReply hk = new HousekeepingReply();
    private final byte[] out = new byte[64];
    private final byte[] in = new byte[READ_CHUNK];
    private int inPos;
    private int inLength;
    private boolean replyPending;
    private long replyDueNanos;
    private boolean hkPending;
    private boolean haveLast;
    private int lastSequence;
    private long clockMicros;
    private long stepsExecuted;
    private long repeatsAnswered;
    private long levelRefusals;
    private long housekeepingAnswered;
    private boolean ended;
    private volatile boolean stopped;
    /** The HV as the last executed step left it (after a refusal of its levels). */
    private boolean hvOn;
    /** Wall time since which the link has been quiet: when the last reply went out. */
    private long quietSinceNanos;
    private boolean watchdogOff;
    private volatile long watchdogTrips;

    /**
     * A server of {@code executor} on {@code transport}.
     *
     * @param speed simulated seconds per wall second (1 = real time); 0 answers at once
     */
    public InstrumentServer(StepExecutor executor, ByteTransport transport, double speed) {
        if (!(speed >= 0)) {
            throw new IllegalArgumentException("speed must be >= 0");
        }
        this.executor = executor;
        this.transport = transport;
        this.speed = speed;
        this.sender = new FrameSender(transport, counters);
        InstrumentDescription d = executor.instrument();
        this.replies = SampleReplyCodec.of(d);
        this.receiver = new FrameReceiver(counters, replies);
        this.modulationPeriodMicros = d.modulationPeriodMicros();
    }

    /**
     * One cycle at wall time {@code nowNanos}: send what is due, else read and handle frames (at most
     * {@link #MAX_READS_PER_CALL} reads). Returns work done: frames sent and handled, reads that moved octets.
     */
    public int doWork(long nowNanos) {
        int work = watchdog(nowNanos);
        if (!sender.flush()) {
            return work;
        }
        if (hkPending) {
            int n = HousekeepingCodec.encodeReply(hk, out, 0);
            sender.send(out, 0, n);
            hkPending = false;
            housekeepingAnswered++;
            return work + 1;
        }
        if (replyPending) {
            if (nowNanos - replyDueNanos < 0) {
                return work;
            }
            int n = replies.encode(reply, out, 0);
            sender.send(out, 0, n);
            replyPending = false;
            quietSinceNanos = nowNanos;
            work++;
        }
        work += readFrames(nowNanos);
        return work + watchdog(nowNanos); // the stream may have ended just now
    }

    /**
     * Reads and deframes until a reply or a housekeeping answer waits, nothing more has arrived, or
     * {@link #MAX_READS_PER_CALL} reads were made; octets of a read left over stay for the next call.
     */
    private int readFrames(long nowNanos) {
        int work = 0;
        for (int reads = 0; !replyPending && !hkPending; ) {
            if (inPos == inLength) {
                if (reads == MAX_READS_PER_CALL) {
                    break;
                }
                int n = ended ? -1 : transport.read(in, 0, in.length);
                if (n <= 0) {
                    ended |= n < 0;
                    break;
                }
                counters.octetsRead += n;
                inPos = 0;
                inLength = n;
                reads++;
                work++;
            }
            while (inPos < inLength && !replyPending && !hkPending) {
                int type = receiver.accept(in[inPos++]);
                if (type != FrameReceiver.NONE) {
                    handle(type, nowNanos);
                    work++;
                }
            }
        }
        return work;
    }

    /**
     * Trips the link watchdog (ICD §4.1) when the HV is on, no step executes, and either the link has
     * been quiet for more than {@link #WATCHDOG_NANOS} since the last reply (at exactly that time it
     * has not) or the stream has ended. Returns 1 when it tripped.
     */
    private int watchdog(long nowNanos) {
        if (!hvOn || replyPending) {
            return 0;
        }
        boolean streamGone = ended || sender.ended();
        if (!streamGone && nowNanos - (quietSinceNanos + WATCHDOG_NANOS) <= 0) {
            return 0;
        }
        executor.switchHvOff(clockMicros);
        hvOn = false;
        watchdogOff = true;
        watchdogTrips++;
        return 1;
    }

    private void handle(int type, long nowNanos) {
        byte[] p = receiver.payload();
        int len = receiver.payloadLength();
        switch (type) {
            case MessageType.STEP_COMMAND:
                StepCommandCodec.decode(p, 0, len, step); // type and length already checked
                executeStep(nowNanos);
                break;
            case MessageType.HOUSEKEEPING_REQUEST:
                hk.sequence = HousekeepingCodec.decodeRequest(p, 0, len);
                hk.framesGood = counters.framesGood;
                hk.framesBad = counters.framesBad();
                hk.lastStepSequence = lastSequence;
                hk.status = (hvOn ? HousekeepingCodec.STATUS_HV_ON : 0)
                        | (watchdogOff ? HousekeepingCodec.STATUS_WATCHDOG_OFF : 0);
                hk.watchdogTrips = (int) Math.min(watchdogTrips, HousekeepingCodec.MAX_WATCHDOG_TRIPS);
                executor.housekeeping(hk);
                hkPending = true;
                break;
            default:
                counters.unexpected++; // a valid message for the other side: discard
                break;
        }
    }

    private void executeStep(long nowNanos) {
        long durationMicros = step.durationMicros(modulationPeriodMicros);
        if (haveLast && step.sequence == lastSequence) {
            repeatsAnswered++; // a repeat: the stored reply again, no second execution
        } else {
            if (step.hvEnabled && step.dacLow >= step.dacHigh) {
                step.hvEnabled = false; // ICD §5: levels refused, HV kept off for this step
                levelRefusals++;
            }
            executor.execute(step, clockMicros, reply);
            hvOn = step.hvEnabled;
            watchdogOff &= !hvOn; // reported until a step enables the HV again
            clockMicros += durationMicros;
            stepsExecuted++;
            haveLast = true;
            lastSequence = step.sequence;
        }
        replyPending = true;
        replyDueNanos = speed == 0 ? nowNanos : nowNanos + Math.round(durationMicros * 1_000 / speed);
    }

    /** Serves on the calling thread until {@link #stop()} or the peer leaves, parking briefly when idle. */
    public void run() {
        int idle = 0;
        while (!stopped && !ended()) {
            if (doWork(System.nanoTime()) > 0) {
                idle = 0;
            } else if (++idle < 200) {
                Thread.onSpinWait();
            } else {
                LockSupport.parkNanos(20_000);
            }
        }
    }

    /** Asks {@link #run} to return. */
    public void stop() {
        stopped = true;
    }

    /** True once the peer has closed the stream and everything read has been handled. */
    public boolean ended() {
        return (ended && inPos == inLength && !replyPending) || sender.ended();
    }

    /** The instrument's own clock: the sum of the executed steps' durations, microseconds. */
    public long clockMicros() {
        return clockMicros;
    }

    /** Steps executed. */
    public long stepsExecuted() {
        return stepsExecuted;
    }

    /** Repeated steps answered with the stored reply. */
    public long repeatsAnswered() {
        return repeatsAnswered;
    }

    /** Steps executed with the HV off because their levels were refused. */
    public long levelRefusals() {
        return levelRefusals;
    }

    /** Link watchdog trips (ICD §4.1); readable from any thread. */
    public long watchdogTrips() {
        return watchdogTrips;
    }

    /** True while the HV is on as the last executed step left it (false after a watchdog trip). */
    public boolean hvOn() {
        return hvOn;
    }

    /** Housekeeping requests answered. */
    public long housekeepingAnswered() {
        return housekeepingAnswered;
    }

    /** Receive and send counters. */
    public LinkCounters counters() {
        return counters;
    }
}
