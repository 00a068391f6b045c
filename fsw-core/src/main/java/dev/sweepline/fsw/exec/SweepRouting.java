package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.fault.FaultProtection;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.report.EventWriter;
import dev.sweepline.fsw.science.SpectrumLayout;
import dev.sweepline.fsw.science.SpectrumTelemetry;
import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;

/**
 * Where the scheduler's callbacks go in the flight software: fault protection sees every sample and
 * sweep, telemetry gets every completed sweep (decimated) and every mode change, then the observer (the
 * bench's recorder) sees each callback. Keeps the sweep counters of housekeeping and the id of the table
 * the sweeps are made with: a commit takes effect at the scheduler's next sweep boundary
 * ({@link #onConfigurationApplied}), and the first sweep completed after it carries the table-changed
 * flag (telemetry ICD §4 flags bit 6). Allocation-free. Threading: the executive's.
 */
final class SweepRouting implements SweepListener {
    private final SweepScheduler scheduler;
    private final FaultProtection faults;
    private final SpectrumTelemetry spectra;
    private final EventWriter events;
    private final SweepListener observer;
    private int spectrumDecimation;
    /** Id of the table the scheduler sweeps with now. */
    private int sweepTableId;
    /** Id of the committed table waiting for the scheduler's next sweep boundary. */
    private int committedTableId;
    private boolean commitPending;
    private boolean tableChangedFlag;
    private long surveySweeps;
    private long focusSweeps;
    private long lockLosses;

    SweepRouting(SweepScheduler scheduler, FaultProtection faults, SpectrumTelemetry spectra, EventWriter events,
            SweepListener observer, int tableId, int spectrumDecimation) {
        this.scheduler = scheduler;
        this.faults = faults;
        this.spectra = spectra;
        this.events = events;
        this.observer = observer;
        this.sweepTableId = tableId;
        this.spectrumDecimation = spectrumDecimation;
    }

    /** A committed table was handed to the scheduler: its id stamps the sweeps once it takes effect. */
    void tableCommitted(int tableId, int decimation) {
        committedTableId = tableId;
        commitPending = true;
        spectrumDecimation = decimation;
    }

    @Override
    public void onConfigurationApplied(int applied, int generation, long nowMicros) {
        if (commitPending) {
            commitPending = false;
            sweepTableId = committedTableId;
            tableChangedFlag = true;
        }
        observer.onConfigurationApplied(applied, generation, nowMicros);
    }

    @Override
    public void onStep(StepCommand step, long nowMicros) {
        observer.onStep(step, nowMicros);
    }

    @Override
    public void onSample(StepCommand step, SampleReply reply, long nowMicros) {
        faults.onSample(step, reply);
        observer.onSample(step, reply, nowMicros);
    }

    @Override
    public void onSweepComplete(Spectrum spectrum, long nowMicros) {
        if (spectrum.count() > 0) {
            long ofMode = switch (spectrum.mode()) {
                case SURVEY -> surveySweeps++;
                case FOCUS -> focusSweeps++;
                case SAFE -> throw new IllegalStateException("a sweep completed in safe");
            };
            int flags = tableChangedFlag ? SpectrumLayout.FLAG_TABLE_CHANGED : 0;
            tableChangedFlag = false;
            if (ofMode % spectrumDecimation == 0) {
                spectra.write(spectrum, spectrum.integrationPeriods(), sweepTableId, flags, nowMicros);
            }
        }
        faults.onSweepComplete(spectrum);
        observer.onSweepComplete(spectrum, nowMicros);
    }

    @Override
    public void onBandChosen(int firstWindow, int lastWindow, int peakWindowQ8, long nowMicros) {
        observer.onBandChosen(firstWindow, lastWindow, peakWindowQ8, nowMicros);
    }

    @Override
    public void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
        if (from == SweepMode.FOCUS && to == SweepMode.SURVEY && reason != ModeChangeReason.RESURVEY) {
            lockLosses++;
        }
        events.write(EventWriter.MODE_CHANGE, from.icdCode(), to.icdCode(), reason, nowMicros);
        observer.onModeChange(from, to, reason, nowMicros);
    }

    /** Clears the sweep counters (RESET_COUNTERS bit 2). */
    void resetCounters() {
        surveySweeps = 0;
        focusSweeps = 0;
        lockLosses = 0;
    }

    long surveySweeps() {
        return surveySweeps;
    }

    long focusSweeps() {
        return focusSweeps;
    }

    long lockLosses() {
        return lockLosses;
    }

    /** Id of the table the scheduler sweeps with now. */
    int sweepTableId() {
        return sweepTableId;
    }
}
