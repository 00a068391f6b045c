package dev.sweepline.sim.link;

import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import dev.sweepline.sim.instrument.StepTruth;
import dev.sweepline.sim.plasma.PlasmaState;

/**
 * The flight software's {@link InstrumentLink} served in process by the simulated instrument, on
 * simulated time: a step sent at {@code t} is executed at once against the plasma of the moment and
 * its reply becomes visible to {@link #poll} at {@code t + step duration}, as it would over a wire.
 *
 * <p>One step is in flight at a time (the hardware ICD's rule). Threading: one thread, the bench's.
 */
public final class InProcessLink implements InstrumentLink {
    /** Where the plasma of a given time comes from (the scenario timeline, in the bench). */
    public interface PlasmaSource {
        /** The plasma at {@code micros} of simulated time: read during the step only (a source may reuse it). */
        PlasmaState plasmaAt(long micros);
    }

    /** Sees every executed step with its truth: the bench records truth beside each decision. */
    public interface StepObserver {
        /** Called once per executed step, before the reply becomes visible, with the plasma it saw (not to be kept). */
        void onExecuted(StepCommand step, SampleReply reply, StepTruth truth, PlasmaState plasma, long startMicros);
    }

    private final SimulatedInstrument instrument;
    private final PlasmaSource plasma;
    private final StepObserver observer;
    private final int modulationPeriodMicros;
    private final SampleReply pending = new SampleReply();
    private final StepTruth truth = new StepTruth();
    private boolean replyPending;
    private long replyReadyMicros;

    /** A link to {@code instrument}, evaluating the plasma at each step's mid-integration time. */
    public InProcessLink(SimulatedInstrument instrument, PlasmaSource plasma, StepObserver observer) {
        this.instrument = instrument;
        this.plasma = plasma;
        this.observer = observer;
        this.modulationPeriodMicros = instrument.model().flight().modulationPeriodMicros();
    }

    @Override
    public boolean send(StepCommand step, long nowMicros) {
        if (replyPending) {
            return false;
        }
        long midMicros = nowMicros + step.settleMicros + (step.durationMicros(modulationPeriodMicros) - step.settleMicros) / 2;
        PlasmaState now = plasma.plasmaAt(midMicros);
        replyReadyMicros = instrument.execute(step, nowMicros, now, pending, truth);
        replyPending = true;
        observer.onExecuted(step, pending, truth, now, nowMicros);
        return true;
    }

    @Override
    public boolean poll(SampleReply into, long nowMicros) {
        if (!replyPending || nowMicros - replyReadyMicros < 0) {
            return false;
        }
        into.copyFrom(pending);
        replyPending = false;
        return true;
    }

    /** Time at which the next reply becomes visible, or {@code Long.MAX_VALUE} when none is in flight. */
    public long nextReplyMicros() {
        return replyPending ? replyReadyMicros : Long.MAX_VALUE;
    }
}
