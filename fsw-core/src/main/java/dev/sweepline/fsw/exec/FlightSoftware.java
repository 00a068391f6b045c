package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.CommandAuthenticator;
import dev.sweepline.fsw.command.CommandProcessor;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.CommandTarget;
import dev.sweepline.fsw.command.HvInterlock;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.command.TableManager;
import dev.sweepline.fsw.fault.FaultProtection;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.LinkHealth;
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
 * through an {@link InstrumentLink}, the telemetry that packs every completed sweep, each mode
 * change and fault response (events), command reports and periodic housekeeping into transfer
 * frames, the command processor (telecommands, parameter tables, HV interlock) and fault protection.
 *
 * <p>Driven from outside: the host or the bench calls {@link #doWork(long)} with the time, hands
 * every telecommand to {@link #acceptTelecommand} and may report each cycle's measured work with
 * {@link #reportCycleWork}; nothing here reads a clock or starts a thread. Nothing is allocated after
 * construction. At construction the table kept in non-volatile memory, if intact and valid,
 * replaces the configured one. An observer (the bench's recorder) sees every scheduler callback
 * after the telemetry has.
 */
public final class FlightSoftware {
    /** Event id of a mode change (telemetry ICD §6). */
    public static final int EVENT_MODE_CHANGE = 1;
    /** Event id of a table commit: reason field = table id (telemetry ICD §6). */
    public static final int EVENT_TABLE_COMMITTED = 4;
    /** Event id of the start-up table restore: argument a = TableManager RESTORE_* code, reason = table id. */
    public static final int EVENT_TABLE_RESTORED = 5;
    /** Event id of the start-up anti-replay restore: argument a = CommandAuthenticator restore code. */
    public static final int EVENT_AUTH_RESTORED = 6;
    /** Event id of a locked authenticator's challenge: a, b, reason = its 32 bits, most significant first. */
    public static final int EVENT_AUTH_CHALLENGE = 7;
    /** Housekeeping user data octets (telemetry ICD §5). */
    public static final int HOUSEKEEPING_OCTETS = 40;

    private final SweepScheduler scheduler;
    private final Executive executive;
    /** The link's own health counters, when it has framing (null in process). */
    private final LinkHealth linkHealth;
    private final TelemetryWriter telemetry;
    private final SweepParameters active = new SweepParameters();
    private final TableManager tables;
    private final HvInterlock hv;
    private final FaultProtection faults;
    private final CommandProcessor commands;
    private final CommandAuthenticator authenticator;
    private final int restoreStatus;
    private final int authRestoreStatus;
    /** The host's HV permission (arm-then-fire on real electronics; true for the simulator). */
    private boolean hostHvPermitted;
    private long housekeepingPeriodMicros;
    /** Id of the table the scheduler sweeps with now (a commit takes effect at the next sweep boundary). */
    private int sweepTableId;
    private boolean commitPending;
    private int spectrumDecimation;
    private long nextHousekeepingMicros;
    private long surveySweeps;
    private long focusSweeps;
    private long lockLosses;

    /** Builds the flight software on {@code link}, writing frames to {@code frames}. */
    public FlightSoftware(FlightConfig config, InstrumentLink link, FrameSink frames, SweepListener observer) {
        this.telemetry = new TelemetryWriter(config.frameLength, config.flushIntervalMicros,
                new CucTime(config.coarseTimeAtTickZero, 0), config.compressSpectra, config.instrument, frames);
        ParameterTable startUp = ParameterTable.of(config.table, config.parameters);
        requireWithinLimits(startUp, config);
        startUp.housekeepingSeconds = (int) Math.max(ParameterTable.MIN_HOUSEKEEPING_SECONDS,
                Math.min(ParameterTable.MAX_HOUSEKEEPING_SECONDS, config.housekeepingPeriodMicros / 1_000_000L));
        startUp.faults.copyFrom(config.faults);
        this.tables = new TableManager(startUp, config.nonVolatileStore, config.instrument.limits());
        this.restoreStatus = tables.restore();
        ParameterTable inForce = tables.activeTable();
        this.housekeepingPeriodMicros = restoreStatus == TableManager.RESTORE_OK
                ? inForce.housekeepingSeconds * 1_000_000L : config.housekeepingPeriodMicros;
        this.spectrumDecimation = inForce.spectrumDecimation;
        this.sweepTableId = tables.activeId();
        this.scheduler = new SweepScheduler(config.instrument, inForce.windowTable(), inForce.sweep,
                new Forwarder(observer));
        this.executive = new Executive(link, scheduler, config.timeoutMarginMicros, config.maxRetries);
        this.linkHealth = healthOf(link);
        this.hostHvPermitted = config.hvPermitted;
        this.faults = new FaultProtection(inForce.faults, scheduler, telemetry);
        this.hv = new HvInterlock(config.hvArmTimeoutMicros, config.hvEnabledAtStart);
        scheduler.permitHv(hostHvPermitted && hv.enabled());
        this.authenticator = new CommandAuthenticator(config.commandKey, config.authenticateCommands,
                config.nonVolatileStore, config.bootChallenge);
        this.authRestoreStatus = config.authenticateCommands
                ? authenticator.restore(restoreStatus != TableManager.RESTORE_NONE) : CommandAuthenticator.VOLATILE;
        this.commands = new CommandProcessor(authenticator, scheduler, hv, tables, telemetry, new Target());
        if (restoreStatus != TableManager.RESTORE_NONE) {
            writeEvent(EVENT_TABLE_RESTORED, restoreStatus, 0, tables.activeId(), 0);
        }
        if (authRestoreStatus != CommandAuthenticator.VOLATILE) {
            writeEvent(EVENT_AUTH_RESTORED, authRestoreStatus, 0, 0, 0);
        }
        if (authenticator.locked()) {
            long c = authenticator.bootChallenge();
            writeEvent(EVENT_AUTH_CHALLENGE, (int) (c >>> 24) & 0xFF, (int) (c >>> 16) & 0xFF, (int) c & 0xFFFF, 0);
        }
    }

    /**
     * One cycle: the executive's step work, the fault responses, housekeeping when due, stale-frame
     * flushing. Returns work done.
     */
    public int doWork(long nowMicros) {
        // steps ask for HV only while both the host permits it and the core interlock is enabled
        scheduler.permitHv(hostHvPermitted && hv.enabled());
        int work = executive.doWork(nowMicros);
        if (faults.respond(executive.safeEntries(), hv.enabled(), nowMicros) == FaultProtection.SAFE_TAKEN) {
            hv.disable();
            scheduler.permitHv(false);
        }
        if (nowMicros - nextHousekeepingMicros >= 0) {
            writeHousekeeping(nowMicros);
            nextHousekeepingMicros = nowMicros + housekeepingPeriodMicros;
            work++;
        }
        return work + telemetry.doWork(nowMicros);
    }

    /**
     * Handles one telecommand packet (commands.md) at once: acceptance and execution reports go out
     * on APID 0x130.
     *
     * @return the acceptance reason code, {@link CommandReason#OK} when accepted
     */
    public int acceptTelecommand(byte[] packet, int off, int length, long nowMicros) {
        return commands.accept(packet, off, length, nowMicros);
    }

    /**
     * The operator's arm-then-fire on a PC host (sweepline-fsw.jar run), confirmed at the console: it
     * stands for the ground's HV_ARM and HV_ENABLE (commands.md §2.3) and gives the host's permission.
     * Nothing else enables the HV but those two telecommands.
     */
    public void operatorFireHv(long nowMicros) {
        hostHvPermitted = true;
        hv.arm(nowMicros);
        hv.enable(nowMicros);
        scheduler.permitHv(true);
    }

    /** Withdraws the host's HV permission (end of a run, a signal, a link loss): steps ask for HV off. */
    public void operatorInhibitHv() {
        hostHvPermitted = false;
        hv.disable();
        scheduler.permitHv(false);
    }

    /**
     * The host's measurement of the last cycle's work, in ticks (microseconds), for the cycle-overrun
     * monitor; the flight software has no clock of its own.
     */
    public void reportCycleWork(long workTicks) {
        faults.onCycleWork(workTicks);
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

    /** The command processor (accepted / rejected counters). */
    public CommandProcessor commands() {
        return commands;
    }

    /** Fault protection (trip counters). */
    public FaultProtection faults() {
        return faults;
    }

    /** The HV interlock. */
    public HvInterlock hv() {
        return hv;
    }

    /** The parameter tables (active id, images). */
    public TableManager tables() {
        return tables;
    }

    /** What the start-up restore found: a TableManager RESTORE_* code. */
    public int restoreStatus() {
        return restoreStatus;
    }

    /** What the start-up anti-replay restore found: a CommandAuthenticator restore code. */
    public int authRestoreStatus() {
        return authRestoreStatus;
    }

    /** The command authenticator (last accepted sequence, lock state, challenge). */
    public CommandAuthenticator authenticator() {
        return authenticator;
    }

    /** A start-up table outside the instrument's limits is a configuration error, refused at once. */
    private static void requireWithinLimits(ParameterTable startUp, FlightConfig config) {
        int status = TableImage.validate(startUp, config.instrument.limits());
        if (status != 0) {
            throw new IllegalArgumentException("start-up table refused against the instrument's limits: code "
                    + status + " (" + dev.sweepline.fsw.table.TableStatus.name(status) + ")");
        }
    }

    /** Focus-to-survey transitions other than scheduled re-surveys. */
    public long lockLosses() {
        return lockLosses;
    }

    private static LinkHealth healthOf(InstrumentLink link) {
        return link instanceof LinkHealth h ? h : null;
    }

    /** Housekeeping user data, telemetry ICD §5. */
    private void writeHousekeeping(long nowMicros) {
        byte[] b = telemetry.buffer();
        int p = telemetry.userDataOffset();
        SweepMode mode = scheduler.mode();
        b[p] = (byte) modeCode(mode);
        b[p + 1] = (byte) (mode != SweepMode.SAFE && hv.enabled() && scheduler.hvPermitted() ? 1 : 0);
        put32(b, p + 2, executive.stepsSent());
        put32(b, p + 6, executive.repliesAccepted());
        put16(b, p + 10, saturate16(executive.sequenceErrors()));
        put16(b, p + 12, saturate16(executive.timeouts()));
        put16(b, p + 14, saturate16(executive.retries()));
        put16(b, p + 16, (int) surveySweeps);
        put16(b, p + 18, (int) focusSweeps);
        put16(b, p + 20, saturate16(lockLosses));
        put32(b, p + 22, telemetry.counters().packetOctets());
        put16(b, p + 26, saturate16(commands.accepted()));
        put16(b, p + 28, saturate16(commands.rejected()));
        put16(b, p + 30, saturate16(commands.executionFailures()));
        b[p + 32] = (byte) commands.lastRejection();
        b[p + 33] = (byte) hv.code(nowMicros);
        put16(b, p + 34, tables.activeId());
        put16(b, p + 36, saturate16(faults.totalTrips()));
        put16(b, p + 38, linkHealth == null ? 0 : saturate16(linkHealth.framesBad()));
        telemetry.sendEngineering(Apid.HOUSEKEEPING, HOUSEKEEPING_OCTETS, nowMicros, nowMicros);
    }

    private void writeEvent(int id, int a, int b2, int reason, long nowMicros) {
        byte[] b = telemetry.buffer();
        int p = telemetry.userDataOffset();
        put16(b, p, id);
        b[p + 2] = (byte) a;
        b[p + 3] = (byte) b2;
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
            if (commitPending && schedulerHasActiveTable()) {
                commitPending = false;
                sweepTableId = tables.activeId();
            }
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
                long ofMode;
                if (spectrum.mode() == SweepMode.FOCUS) {
                    ofMode = focusSweeps++;
                } else {
                    ofMode = surveySweeps++;
                }
                if (ofMode % spectrumDecimation == 0) {
                    scheduler.activeParameters(active);
                    telemetry.writeSpectrum(spectrum, active.integrationPeriods, sweepTableId, 0, nowMicros);
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
            writeEvent(EVENT_MODE_CHANGE, modeCode(from), modeCode(to), reason, nowMicros);
            observer.onModeChange(from, to, reason, nowMicros);
        }
    }

    /**
     * Whether the scheduler's windows are those of the committed table: the scheduler applies a
     * commit at a sweep boundary, so spectra are stamped with the old id until then. At most 256
     * comparisons per step, and only while a commit waits.
     */
    private boolean schedulerHasActiveTable() {
        ParameterTable t = tables.activeTable();
        if (scheduler.windowCount() != t.windowCount) {
            return false;
        }
        for (int w = 0; w < t.windowCount; w++) {
            if (scheduler.dacLow(w) != t.dacLow[w] || scheduler.dacHigh(w) != t.dacHigh[w]) {
                return false;
            }
        }
        return true;
    }

    /** The command processor's view of the rest of the flight software. */
    private final class Target implements CommandTarget {
        @Override
        public void resetCounters(int mask) {
            if ((mask & RESET_FAULT_COUNTERS) != 0) {
                faults.resetCounters();
            }
            if ((mask & RESET_SWEEP_COUNTERS) != 0) {
                surveySweeps = 0;
                focusSweeps = 0;
                lockLosses = 0;
            }
        }

        @Override
        public int applyTable(ParameterTable table, int tableId, long nowMicros) {
            int status = scheduler.loadTable(table.dacLow, table.dacHigh, table.windowCount);
            if (status == dev.sweepline.fsw.table.TableStatus.OK) {
                status = scheduler.loadParameters(table.sweep);
            }
            if (status != dev.sweepline.fsw.table.TableStatus.OK || faults.configure(table.faults) != 0) {
                return CommandReason.TABLE_INVALID; // cannot happen: the table was validated
            }
            housekeepingPeriodMicros = table.housekeepingSeconds * 1_000_000L;
            nextHousekeepingMicros = Math.min(nextHousekeepingMicros, nowMicros + housekeepingPeriodMicros);
            spectrumDecimation = table.spectrumDecimation;
            commitPending = true;
            writeEvent(EVENT_TABLE_COMMITTED, 0, 0, tableId, nowMicros);
            return CommandReason.OK;
        }
    }
}
