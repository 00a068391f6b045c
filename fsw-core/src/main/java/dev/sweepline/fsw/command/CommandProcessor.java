package dev.sweepline.fsw.command;

import dev.sweepline.fsw.report.CommandReportWriter;
import dev.sweepline.fsw.sweep.ModeChangeReason;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SweepScheduler;

/**
 * Accepts, validates and executes telecommands (commands.md): header, length, MAC, sequence, code,
 * argument length, argument range and state are checked in that order, and the first failure is
 * the rejection's reason. A rejected command changes nothing but the counters; every command gets
 * an acceptance report, every accepted one an execution report (APID 0x130, telemetry ICD §9).
 * Allocation-free after construction; one thread, the executive's.
 */
public final class CommandProcessor {
    /** Report type: acceptance (success or rejection). */
    public static final int REPORT_ACCEPTANCE = CommandReportWriter.ACCEPTANCE;
    /** Report type: execution (success or failure; a dump carries data). */
    public static final int REPORT_EXECUTION = CommandReportWriter.EXECUTION;
    /** The longest report this processor sends: a dump of {@link CommandCode#MAX_DUMP_OCTETS}. */
    public static final int MAX_REPORT_OCTETS = CommandReportWriter.maxLength(CommandCode.MAX_DUMP_OCTETS);

    private final CommandAuthenticator auth;
    private final SweepScheduler scheduler;
    private final HvInterlock hv;
    private final TableManager tables;
    private final CommandReportWriter reports;
    private final CommandTarget target;
    private final long[] rejectedByReason = new long[CommandReason.COUNT];

    private long accepted;
    private long rejected;
    private long executionFailures;
    private int lastRejection;

    /** A processor acting on these parts. */
    public CommandProcessor(CommandAuthenticator auth, SweepScheduler scheduler, HvInterlock hv, TableManager tables,
                            CommandReportWriter reports, CommandTarget target) {
        this.auth = auth;
        this.scheduler = scheduler;
        this.hv = hv;
        this.tables = tables;
        this.reports = reports;
        this.target = target;
    }

    /**
     * Handles one telecommand packet of {@code length} octets at {@code off}.
     *
     * @return the acceptance reason: {@link CommandReason#OK} when accepted (its execution status is
     *         in the execution report)
     */
    public int accept(byte[] b, int off, int length, long nowMicros) {
        boolean inBounds = b != null && off >= 0 && length >= 0 && off <= b.length - length;
        int reason = inBounds ? validate(b, off, length, nowMicros) : CommandReason.PACKET_LENGTH;
        int code = inBounds && length > Telecommand.CODE_AT ? b[off + Telecommand.CODE_AT] & 0xFF : 0;
        int packetSequence = inBounds && length >= 4 ? Telecommand.packetSequence(b, off) : 0xFFFF;
        long authSequence = inBounds && length >= Telecommand.CODE_AT ? Telecommand.authSequence(b, off) : 0;
        if (reason != CommandReason.OK) {
            rejected++;
            rejectedByReason[reason]++;
            lastRejection = reason;
            report(REPORT_ACCEPTANCE, code, packetSequence, authSequence, reason, 0, 0, nowMicros);
            return reason;
        }
        accepted++;
        report(REPORT_ACCEPTANCE, code, packetSequence, authSequence, CommandReason.OK, 0, 0, nowMicros);
        int detail = execute(b, off, code, Telecommand.argumentOctets(length), nowMicros);
        int status = detail >>> 8;
        if (status != CommandReason.OK) {
            executionFailures++;
        }
        int dumpOctets = code == CommandCode.TABLE_DUMP ? writeDump(b, off) : 0;
        report(REPORT_EXECUTION, code, packetSequence, authSequence, status, detail & 0xFF, dumpOctets, nowMicros);
        return CommandReason.OK;
    }

    private int validate(byte[] b, int off, int length, long nowMicros) {
        int reason = Telecommand.checkHeader(b, off, length);
        if (reason == CommandReason.OK) {
            reason = auth.check(b, off, length);
        }
        if (reason == CommandReason.OK) {
            reason = CommandCode.checkLength(b[off + Telecommand.CODE_AT] & 0xFF, Telecommand.argumentOctets(length));
        }
        if (reason == CommandReason.OK) {
            reason = checkArguments(b, off + Telecommand.ARGUMENTS_AT, b[off + Telecommand.CODE_AT] & 0xFF,
                    Telecommand.argumentOctets(length), nowMicros);
        }
        return reason;
    }

    /** Range and state checks of a command whose length is right; changes nothing. */
    private int checkArguments(byte[] b, int a, int code, int argOctets, long nowMicros) {
        switch (code) {
            case CommandCode.NO_OP:
            case CommandCode.HV_ARM:
            case CommandCode.AUTH_RECOVER: // checked by the authenticator (challenge), nothing more to check
                return CommandReason.OK;
            case CommandCode.SET_MODE: {
                SweepMode mode = SweepMode.fromIcdCode(b[a] & 0xFF);
                if (mode == null) {
                    return CommandReason.ARGUMENT_RANGE;
                }
                return mode != SweepMode.SAFE && !hv.enabled() ? CommandReason.HV_NOT_ENABLED : CommandReason.OK;
            }
            case CommandCode.HV_ENABLE:
                return hv.canEnable(nowMicros) ? CommandReason.OK : CommandReason.NOT_ARMED;
            case CommandCode.RESET_COUNTERS: {
                int mask = b[a] & 0xFF;
                return mask == 0 || (mask & ~7) != 0 ? CommandReason.ARGUMENT_RANGE : CommandReason.OK;
            }
            case CommandCode.TABLE_LOAD: {
                int offset = Telecommand.u16(b, a);
                int octets = argOctets - CommandCode.LOAD_HEADER_OCTETS;
                return offset + octets > TableImage.MAX_OCTETS ? CommandReason.ARGUMENT_RANGE : CommandReason.OK;
            }
            case CommandCode.TABLE_VERIFY: {
                int length = Telecommand.u16(b, a);
                return length < TableImage.MIN_OCTETS || length > TableImage.MAX_OCTETS
                    ? CommandReason.ARGUMENT_RANGE : CommandReason.OK;
            }
            case CommandCode.TABLE_COMMIT:
                return tables.checkCommit(Telecommand.u16(b, a));
            case CommandCode.TABLE_DUMP: {
                int copy = b[a] & 0xFF;
                int offset = Telecommand.u16(b, a + 1);
                int octets = Telecommand.u16(b, a + 3);
                if (copy > 1 || octets < 1 || octets > CommandCode.MAX_DUMP_OCTETS
                    || offset + octets > tables.dumpableOctets(copy)) {
                    return CommandReason.ARGUMENT_RANGE;
                }
                return CommandReason.OK;
            }
            default:
                throw new IllegalStateException("code passed the length check: " + code);
        }
    }

    /** Executes an accepted command; returns status << 8 | detail. */
    private int execute(byte[] b, int off, int code, int argOctets, long nowMicros) {
        int a = off + Telecommand.ARGUMENTS_AT;
        switch (code) {
            case CommandCode.NO_OP:
                return CommandReason.OK;
            case CommandCode.SET_MODE:
                return setMode(b[a] & 0xFF, nowMicros);
            case CommandCode.HV_ARM:
                hv.arm(nowMicros);
                return CommandReason.OK;
            case CommandCode.HV_ENABLE:
                hv.enable(nowMicros);
                return CommandReason.OK;
            case CommandCode.RESET_COUNTERS: {
                int mask = b[a] & 0xFF;
                if ((mask & CommandTarget.RESET_COMMAND_COUNTERS) != 0) {
                    resetCounters();
                }
                target.resetCounters(mask);
                return CommandReason.OK;
            }
            case CommandCode.TABLE_LOAD: {
                int octets = argOctets - CommandCode.LOAD_HEADER_OCTETS;
                tables.load(b, a + CommandCode.LOAD_HEADER_OCTETS, Telecommand.u16(b, a), octets);
                return CommandReason.OK;
            }
            case CommandCode.TABLE_VERIFY: {
                int status = tables.verify(Telecommand.u16(b, a));
                return status << 8 | (tables.lastDetail() & 0xFF);
            }
            case CommandCode.TABLE_COMMIT:
                return commit(nowMicros);
            case CommandCode.TABLE_DUMP:
                return CommandReason.OK; // the data goes into the execution report
            case CommandCode.AUTH_RECOVER:
                return CommandReason.OK; // the authenticator set the new floor when it accepted it
            default:
                throw new IllegalStateException("unknown code accepted: " + code);
        }
    }

    /** SET_MODE: the mode of the ICD code (range-checked at acceptance); SAFE also disables the HV interlock. */
    private int setMode(int modeCode, long nowMicros) {
        SweepMode mode = SweepMode.fromIcdCode(modeCode);
        if (mode == SweepMode.SAFE) {
            hv.disable();
        }
        scheduler.requestMode(mode, ModeChangeReason.COMMANDED, nowMicros);
        return CommandReason.OK;
    }

    private int commit(long nowMicros) {
        int stored = tables.commit();
        int applied = target.applyTable(tables.activeTable(), tables.activeId(), nowMicros);
        if (applied != CommandReason.OK) {
            return applied << 8;
        }
        return stored << 8;
    }

    /** Copies the dump data into the report after its fixed part; returns the octets added. */
    private int writeDump(byte[] cmd, int off) {
        int a = off + Telecommand.ARGUMENTS_AT;
        int copy = cmd[a] & 0xFF;
        return reports.dump(copy, tables.image(copy), Telecommand.u16(cmd, a + 1), Telecommand.u16(cmd, a + 3));
    }

    private void report(int type, int code, int packetSequence, long authSequence, int status, int detail,
                        int extraOctets, long nowMicros) {
        reports.write(type, code, packetSequence, authSequence, status, detail, accepted, rejected, extraOctets,
                nowMicros);
    }

    private void resetCounters() {
        accepted = 0;
        rejected = 0;
        executionFailures = 0;
        lastRejection = 0;
        for (int i = 0; i < rejectedByReason.length; i++) {
            rejectedByReason[i] = 0;
        }
    }

    /** Commands accepted. */
    public long accepted() {
        return accepted;
    }

    /** Commands rejected at acceptance. */
    public long rejected() {
        return rejected;
    }

    /** Commands rejected with {@code reason}. */
    public long rejected(int reason) {
        return rejectedByReason[reason];
    }

    /** Accepted commands whose execution failed. */
    public long executionFailures() {
        return executionFailures;
    }

    /** Reason of the last rejection (0 before the first). */
    public int lastRejection() {
        return lastRejection;
    }
}
