package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.CucTime;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * The flight software assembled: the sweep scheduler, the executive that drives the electronics
 * through an {@link InstrumentLink}, and the telemetry that packs every completed sweep, each mode
 * change (event) and periodic housekeeping into transfer frames.
 *
 * <p>Driven from outside: the host or the bench calls {@link #doWork(long)} with the time; nothing
 * here reads a clock or starts a thread. Nothing is allocated after construction. An observer (the
 * bench's recorder) sees every scheduler callback after the telemetry has.
 */
public final class FlightSoftware {
    /** Event id of a mode change (telemetry ICD §6). */
    public static final int EVENT_MODE_CHANGE = 1;

    private final SweepScheduler scheduler;
    private final Executive executive;
    private final TelemetryWriter telemetry;
    private final SweepParameters active = new SweepParameters();
    private final long housekeepingPeriodMicros;
    private long nextHousekeepingMicros;
    private long surveySweeps;
    private long focusSweeps;
    private long lockLosses;

    /** Builds the flight software on {@code link}, writing frames to {@code frames}. */
    public FlightSoftware(FlightConfig config, InstrumentLink link, FrameSink frames, SweepListener observer) {
        this.telemetry = new TelemetryWriter(config.frameLength, config.flushIntervalMicros,
                new CucTime(config.coarseTimeAtTickZero, 0), config.compressSpectra, frames);
        this.housekeepingPeriodMicros = config.housekeepingPeriodMicros;
        this.scheduler = new SweepScheduler(config.table, config.parameters, new Forwarder(observer));
        this.executive = new Executive(link, scheduler, config.timeoutMarginMicros, config.maxRetries);
    }

    /** One cycle: the executive's step work, housekeeping when due, stale-frame flushing. Returns work done. */
    public int doWork(long nowMicros) {
        int work = executive.doWork(nowMicros);
        if (nowMicros - nextHousekeepingMicros >= 0) {
            writeHousekeeping(nowMicros);
            nextHousekeepingMicros = nowMicros + housekeepingPeriodMicros;
            work++;
        }
        return work + telemetry.doWork(nowMicros);
    }

    /** Ends a run: one last housekeeping packet, then every open frame completed with idle data. */
    public void close(long nowMicros) {
        writeHousekeeping(nowMicros);
        telemetry.flush(nowMicros);
    }

    /** The scheduler (mode, table, decision hash). */
    public SweepScheduler scheduler() {
        return scheduler;
    }

    /** The executive (link counters). */
    public Executive executive() {
        return executive;
    }

    /** The telemetry writer (bandwidth counters). */
    public TelemetryWriter telemetry() {
        return telemetry;
    }

    /** Focus-to-survey transitions other than scheduled re-surveys. */
    public long lockLosses() {
        return lockLosses;
    }

    /** Housekeeping user data, telemetry ICD §5. */
    private void writeHousekeeping(long nowMicros) {
        byte[] b = telemetry.buffer();
        int p = telemetry.userDataOffset();
        SweepMode mode = scheduler.mode();
        b[p] = (byte) modeCode(mode);
        b[p + 1] = (byte) (mode == SweepMode.SAFE ? 0 : 1);
        put32(b, p + 2, executive.stepsSent());
        put32(b, p + 6, executive.repliesAccepted());
        put16(b, p + 10, saturate16(executive.sequenceErrors()));
        put16(b, p + 12, saturate16(executive.timeouts()));
        put16(b, p + 14, saturate16(executive.retries()));
        put16(b, p + 16, (int) surveySweeps);
        put16(b, p + 18, (int) focusSweeps);
        put16(b, p + 20, saturate16(lockLosses));
        put32(b, p + 22, telemetry.counters().packetOctets());
        telemetry.sendEngineering(Apid.HOUSEKEEPING, 26, nowMicros, nowMicros);
    }

    private void writeModeEvent(SweepMode from, SweepMode to, int reason, long nowMicros) {
        byte[] b = telemetry.buffer();
        int p = telemetry.userDataOffset();
        put16(b, p, EVENT_MODE_CHANGE);
        b[p + 2] = (byte) modeCode(from);
        b[p + 3] = (byte) modeCode(to);
        put16(b, p + 4, reason);
        telemetry.sendEngineering(Apid.EVENT, 6, nowMicros, nowMicros);
    }

    /** Mode code of the telemetry ICD §5/§6: 0 safe, 1 survey, 2 focus. */
    static int modeCode(SweepMode mode) {
        switch (mode) {
            case SAFE:
                return 0;
            case SURVEY:
                return 1;
            case FOCUS:
                return 2;
            default:
                throw new IllegalStateException("unknown mode " + mode);
        }
    }

    private static int saturate16(long v) {
        return (int) Math.min(v, 0xFFFF);
    }

    private static void put16(byte[] b, int p, int v) {
        b[p] = (byte) (v >>> 8);
        b[p + 1] = (byte) v;
    }

    private static void put32(byte[] b, int p, long v) {
        b[p] = (byte) (v >>> 24);
        b[p + 1] = (byte) (v >>> 16);
        b[p + 2] = (byte) (v >>> 8);
        b[p + 3] = (byte) v;
    }

    /** Telemetry first, then the observer, for every scheduler callback. */
    private final class Forwarder implements SweepListener {
        private final SweepListener observer;

        Forwarder(SweepListener observer) {
            this.observer = observer;
        }

        @Override
        public void onStep(StepCommand step, long nowMicros) {
            observer.onStep(step, nowMicros);
        }

        @Override
        public void onSample(StepCommand step, SampleReply reply, long nowMicros) {
            observer.onSample(step, reply, nowMicros);
        }

        @Override
        public void onSweepComplete(Spectrum spectrum, long nowMicros) {
            if (spectrum.count() > 0) {
                if (spectrum.mode() == SweepMode.FOCUS) {
                    focusSweeps++;
                } else {
                    surveySweeps++;
                }
                scheduler.activeParameters(active);
                telemetry.writeSpectrum(spectrum, active.integrationPeriods, 0, 0, nowMicros);
            }
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
            writeModeEvent(from, to, reason, nowMicros);
            observer.onModeChange(from, to, reason, nowMicros);
        }
    }
}
