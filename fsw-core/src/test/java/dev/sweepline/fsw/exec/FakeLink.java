package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.CannedReplies;

/**
 * A scripted link: each accepted step queues its canned reply, due after the step's duration plus a
 * latency; the test can drop, corrupt or inject replies. One reply queue slot per step (the executive
 * keeps one step in flight), plus one injected stale reply. Allocation-free after construction.
 */
final class FakeLink implements InstrumentLink {
    private final CannedReplies canned;
    private final SampleReply pending = new SampleReply();
    private final SampleReply stale = new SampleReply();
    private boolean hasPending;
    private boolean hasStale;
    private long dueMicros;
    /** Delivery latency beyond the step duration, microseconds. */
    long latencyMicros = 100;
    /** Replies to drop (counting down). */
    int dropNext;
    /** When true every reply is dropped. */
    boolean dead;
    /** Sends to refuse (counting down). */
    int refuseNext;
    /** Sequence numbers of accepted sends, in order (ring of 16). */
    final int[] sentSequences = new int[16];
    int sends;

    FakeLink(CannedReplies canned) {
        this.canned = canned;
    }

    @Override
    public boolean send(StepCommand step, long nowMicros) {
        if (refuseNext > 0) {
            refuseNext--;
            return false;
        }
        sentSequences[sends++ & 15] = step.sequence;
        if (dead) {
            return true;
        }
        if (dropNext > 0) {
            dropNext--;
            return true;
        }
        canned.answer(step, pending);
        hasPending = true;
        dueMicros = nowMicros + step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS) + latencyMicros;
        return true;
    }

    /** Queues a reply with {@code sequence} that arrives before the real one. */
    void injectStale(int sequence) {
        stale.copyFrom(pending);
        stale.sequence = sequence;
        hasStale = true;
    }

    @Override
    public boolean poll(SampleReply into, long nowMicros) {
        if (hasStale) {
            hasStale = false;
            into.copyFrom(stale);
            return true;
        }
        if (hasPending && nowMicros - dueMicros >= 0) {
            hasPending = false;
            into.copyFrom(pending);
            return true;
        }
        return false;
    }
}
