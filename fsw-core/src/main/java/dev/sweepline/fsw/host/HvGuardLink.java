package dev.sweepline.fsw.host;

import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

/**
 * Sits between the executive and the real link and clears each step's HV flag unless
 * {@link HvArming} has been fired: the default of the host is HV off. The executive's own step is
 * never modified (a copy goes out).
 *
 * <p>Threading: the executive's thread.
 */
public final class HvGuardLink implements InstrumentLink {
    private final InstrumentLink link;
    private final HvArming arming;
    private final StepCommand outgoing = new StepCommand();
    private long stepsWithHvCleared;

    /** Guards {@code link} with {@code arming}. */
    public HvGuardLink(InstrumentLink link, HvArming arming) {
        this.link = link;
        this.arming = arming;
    }

    @Override
    public boolean send(StepCommand step, long nowMicros) {
        outgoing.copyFrom(step);
        if (outgoing.hvEnabled && !arming.hvAllowed()) {
            outgoing.hvEnabled = false;
            stepsWithHvCleared++;
        }
        return link.send(outgoing, nowMicros);
    }

    @Override
    public boolean poll(SampleReply into, long nowMicros) {
        return link.poll(into, nowMicros);
    }

    /** Steps sent with the HV flag cleared because HV was not fired. */
    public long stepsWithHvCleared() {
        return stepsWithHvCleared;
    }
}
