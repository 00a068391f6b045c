package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;

import java.util.ArrayList;
import java.util.List;

/** Test listener that keeps every mode change, band and step (allocates: not for the allocation test). */
public final class RecordingListener implements SweepListener {
    /** One mode change. */
    public record Change(SweepMode from, SweepMode to, int reason, long nowMicros) {
    }

    /** One step as it was chosen. */
    public record Step(int window, int dacLow, int dacHigh, int gainRange, int settleMicros, int periods, SweepMode mode) {
    }

    /** Mode changes in order. */
    public final List<Change> changes = new ArrayList<>();
    /** Steps in order. */
    public final List<Step> steps = new ArrayList<>();
    /** Bands as {first, last, peakQ8}. */
    public final List<int[]> bands = new ArrayList<>();
    /** Sweeps completed, as (sweep number, mode, count, firstWindow). */
    public final List<long[]> sweeps = new ArrayList<>();
    /** Saturated samples seen. */
    public int saturatedSamples;
    /** The scheduler, to read its mode at each step. */
    public SweepScheduler scheduler;

    @Override
    public void onStep(StepCommand s, long nowMicros) {
        steps.add(new Step(s.window, s.dacLow, s.dacHigh, s.gainRange, s.settleMicros, s.integrationPeriods,
            scheduler == null ? null : scheduler.mode()));
    }

    @Override
    public void onSample(StepCommand step, SampleReply reply, long nowMicros) {
        if ((reply.status & SampleReply.STATUS_SATURATED) != 0) {
            saturatedSamples++;
        }
    }

    @Override
    public void onSweepComplete(Spectrum spectrum, long nowMicros) {
        sweeps.add(new long[] {spectrum.sweepNumber(), spectrum.mode().ordinal(), spectrum.count(), spectrum.firstWindow()});
    }

    @Override
    public void onBandChosen(int firstWindow, int lastWindow, int peakWindowQ8, long nowMicros) {
        bands.add(new int[] {firstWindow, lastWindow, peakWindowQ8});
    }

    @Override
    public void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
        changes.add(new Change(from, to, reason, nowMicros));
    }

    /** The last mode change. */
    public Change lastChange() {
        return changes.get(changes.size() - 1);
    }
}
