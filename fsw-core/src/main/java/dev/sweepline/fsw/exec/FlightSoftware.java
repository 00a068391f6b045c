package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.CommandAuthenticator;
import dev.sweepline.fsw.command.CommandProcessor;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.HvInterlock;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableManager;
import dev.sweepline.fsw.fault.FaultProtection;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.LinkHealth;
import dev.sweepline.fsw.report.CommandReportWriter;
import dev.sweepline.fsw.report.EventWriter;
import dev.sweepline.fsw.report.HousekeepingWriter;
import dev.sweepline.fsw.science.SpectrumPacker;
import dev.sweepline.fsw.science.SpectrumTelemetry;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;
import dev.sweepline.fsw.telemetry.CucTime;
import dev.sweepline.fsw.telemetry.FrameSink;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * The flight software assembled for one instrument (its description in {@link FlightConfig#instrument}):
 * the sweep scheduler, the executive that drives the electronics through an {@link InstrumentLink}, the
 * science and engineering telemetry, the command processor (telecommands, parameter tables, HV
 * interlock) and fault protection. This class wires them and runs the cycle; what each part does is in
 * its own package.
 *
 * <p>Driven from outside: the host or the bench calls {@link #doWork(long)} with the time, hands
 * every telecommand to {@link #acceptTelecommand} and may report each cycle's measured work with
 * {@link #reportCycleWork}; nothing here reads a clock or starts a thread. Nothing is allocated after
 * construction. At construction the table kept in non-volatile memory, if intact and valid,
 * replaces the configured one. An observer (the bench's recorder) sees every scheduler callback
 * after the telemetry has.
 */
public final class FlightSoftware {
    private final SweepScheduler scheduler;
    private final Executive executive;
    /** The link's own health counters, when it has framing (null in process). */
    private final LinkHealth linkHealth;
    private final TelemetryWriter telemetry;
    private final SpectrumTelemetry spectra;
    private final HousekeepingWriter housekeepingPacket;
    private final HousekeepingClock housekeeping;
    private final TableManager tables;
    private final HvInterlock hv;
    private final FaultProtection faults;
    private final SweepRouting routing;
    private final CommandProcessor commands;
    private final CommandAuthenticator authenticator;
    private final int restoreStatus;
    private final int authRestoreStatus;
    /** The host's HV permission (arm-then-fire on real electronics; true for the simulator). */
    private boolean hostHvPermitted;

    /** Builds the flight software on {@code link}, writing frames to {@code frames}. */
    public FlightSoftware(FlightConfig config, InstrumentLink link, FrameSink frames, SweepListener observer) {
        SpectrumPacker packer = new SpectrumPacker(config.compressSpectra, config.instrument);
        this.telemetry = new TelemetryWriter(config.frameLength, config.flushIntervalMicros,
                new CucTime(config.coarseTimeAtTickZero, 0),
                Math.max(packer.maxUserDataLength(), CommandProcessor.MAX_REPORT_OCTETS), frames);
        this.spectra = new SpectrumTelemetry(packer, telemetry);
        this.housekeepingPacket = new HousekeepingWriter(telemetry);
        EventWriter events = new EventWriter(telemetry);
        ParameterTable startUp = config.startUpTable();
        this.tables = new TableManager(startUp, config.nonVolatileStore, config.instrument.limits());
        this.restoreStatus = tables.restore();
        ParameterTable inForce = tables.activeTable();
        telemetry.engineeringFlush(inForce.sweep.engineeringFlushSeconds);
        this.housekeeping = new HousekeepingClock(restoreStatus == TableManager.RESTORE_OK
                ? inForce.housekeepingSeconds * 1_000_000L : config.housekeepingPeriodMicros);
        this.scheduler = new SweepScheduler(config.instrument, inForce.windowTable(), inForce.sweep, null);
        this.faults = new FaultProtection(inForce.faults, scheduler, events);
        this.routing = new SweepRouting(scheduler, faults, spectra, events, observer, tables.activeId(),
                inForce.spectrumDecimation);
        scheduler.listen(routing);
        this.executive = new Executive(link, scheduler, config.timeoutMarginMicros, config.maxRetries);
        this.linkHealth = link instanceof LinkHealth h ? h : null;
        this.hostHvPermitted = config.hvPermitted;
        this.hv = new HvInterlock(config.hvArmTimeoutMicros, config.hvEnabledAtStart);
        scheduler.permitHv(hostHvPermitted && hv.enabled());
        this.authenticator = new CommandAuthenticator(config.commandKey, config.authenticateCommands,
                config.nonVolatileStore, config.bootChallenge);
        this.authRestoreStatus = config.authenticateCommands
                ? authenticator.restore(restoreStatus != TableManager.RESTORE_NONE) : CommandAuthenticator.VOLATILE;
        this.commands = new CommandProcessor(authenticator, scheduler, hv, tables, new CommandReportWriter(telemetry),
                new FlightTarget(scheduler, faults, routing, housekeeping, events, telemetry));
        reportStartUp(events);
    }

    /** The start-up events: table restored, authentication restored, the recovery challenge when locked. */
    private void reportStartUp(EventWriter events) {
        if (restoreStatus != TableManager.RESTORE_NONE) {
            events.write(EventWriter.TABLE_RESTORED, restoreStatus, 0, tables.activeId(), 0);
        }
        if (authRestoreStatus != CommandAuthenticator.VOLATILE) {
            events.write(EventWriter.AUTH_RESTORED, authRestoreStatus, 0, 0, 0);
        }
        if (authenticator.locked()) {
            long c = authenticator.bootChallenge();
            events.write(EventWriter.AUTH_CHALLENGE, (int) (c >>> 24) & 0xFF, (int) (c >>> 16) & 0xFF,
                    (int) c & 0xFFFF, 0);
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
        if (housekeeping.due(nowMicros)) {
            writeHousekeeping(nowMicros);
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

    /** Housekeeping user data, telemetry ICD §5. */
    private void writeHousekeeping(long nowMicros) {
        SweepMode mode = scheduler.mode();
        housekeepingPacket.begin()
                .mode(mode.icdCode(), mode != SweepMode.SAFE && hv.enabled() && scheduler.hvPermitted())
                .link(executive.stepsSent(), executive.repliesAccepted(), executive.sequenceErrors(),
                        executive.timeouts(), executive.retries())
                .sweeps(routing.surveySweeps(), routing.focusSweeps(), routing.lockLosses(),
                        telemetry.counters().packetOctets())
                .commands(commands.accepted(), commands.rejected(), commands.executionFailures(),
                        commands.lastRejection())
                .state(hv.code(nowMicros), tables.activeId(), faults.totalTrips(),
                        linkHealth == null ? 0 : linkHealth.framesBad())
                .send(nowMicros);
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

    /** The spectrum telemetry (spectrum octets per mode). */
    public SpectrumTelemetry spectra() {
        return spectra;
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

    /** Focus-to-survey transitions other than scheduled re-surveys. */
    public long lockLosses() {
        return routing.lockLosses();
    }

    /** Id of the table the scheduler sweeps with now (a commit takes effect at the next sweep boundary). */
    public int sweepTableId() {
        return routing.sweepTableId();
    }
}
