package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.TcBuilder;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.telemetry.Apid;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Every malformed command is rejected with its own reason code (commands.md §3), changes nothing but
 * the counters, is counted, and gets one acceptance report (APID 0x130) and no execution report.
 */
class CommandRejectionTest {
    private FswRig rig;
    private TcBuilder tc;

    /** What a rejected command must leave alone. */
    private record State(SweepMode mode, int hv, int tableId, boolean verified, int windows, long accepted,
                         long failures, int pendingHash, int activeHash) {
    }

    private State state() {
        FlightSoftware f = rig.fsw;
        return new State(f.scheduler().mode(), f.hv().code(rig.nowMicros), f.tables().activeId(), f.tables().verified(),
                f.scheduler().windowCount(), f.commands().accepted(), f.commands().executionFailures(),
                Arrays.hashCode(f.tables().image(1)), Arrays.hashCode(f.tables().image(0)));
    }

    @BeforeEach
    void setUp() {
        rig = new FswRig();
        tc = TcBuilder.demo();
        rig.run(200_000); // sweeping in SURVEY, HV enabled
    }

    private void assertRejected(byte[] packet, int reason) {
        State before = state();
        long rejected = rig.fsw.commands().rejected();
        long byReason = rig.fsw.commands().rejected(reason);
        long reports = rig.fsw.telemetry().counters().packets(Apid.COMMAND_REPORT);
        assertEquals(CommandReason.name(reason), CommandReason.name(rig.send(packet)));
        assertEquals(before, state(), "state changed");
        assertEquals(rejected + 1, rig.fsw.commands().rejected());
        assertEquals(byReason + 1, rig.fsw.commands().rejected(reason));
        assertEquals(reason, rig.fsw.commands().lastRejection());
        assertEquals(reports + 1, rig.fsw.telemetry().counters().packets(Apid.COMMAND_REPORT), "one acceptance report");
    }

    @Test
    void shouldRejectWrongLength() {
        byte[] ok = tc.command(CommandCode.NO_OP);
        assertRejected(Arrays.copyOf(ok, ok.length - 1), CommandReason.PACKET_LENGTH); // length field disagrees
        assertRejected(Arrays.copyOf(ok, 5), CommandReason.PACKET_LENGTH); // shorter than a header
        assertRejected(new byte[0], CommandReason.PACKET_LENGTH);
    }

    @Test
    void shouldRejectTelemetryTypeAndWrongApid() {
        byte[] tm = tc.command(CommandCode.NO_OP);
        tm[0] &= ~0x10; // type bit 0: TM (CCSDS 133.0-B-2 §4.1.3.3)
        tc.resign(tm, tm.length);
        assertRejected(tm, CommandReason.BAD_HEADER);
        byte[] apid = tc.command(CommandCode.NO_OP);
        apid[1] ^= 0x01;
        tc.resign(apid, apid.length);
        assertRejected(apid, CommandReason.BAD_HEADER);
    }

    @Test
    void shouldRejectBadMac() {
        byte[] forged = tc.command(CommandCode.SET_MODE, (byte) 0);
        forged[forged.length - 1] ^= 1;
        assertRejected(forged, CommandReason.BAD_MAC);
        byte[] altered = tc.command(CommandCode.SET_MODE, (byte) 0);
        altered[11] = 1; // argument changed after signing
        assertRejected(altered, CommandReason.BAD_MAC);
    }

    @Test
    void shouldRejectReplayedSequence() {
        byte[] first = tc.command(10, CommandCode.NO_OP);
        assertEquals(CommandReason.OK, rig.send(first));
        assertRejected(first, CommandReason.REPLAY); // the same packet again
        assertRejected(tc.command(9, CommandCode.NO_OP), CommandReason.REPLAY); // an older number
        assertRejected(tc.command(10, CommandCode.NO_OP), CommandReason.REPLAY); // equal is not above
        assertEquals(CommandReason.OK, rig.send(tc.command(11, CommandCode.NO_OP)));
    }

    @Test
    void shouldRejectUnknownCodeAndWrongArgumentLength() {
        assertRejected(tc.command(0x7F), CommandReason.UNKNOWN_CODE);
        assertRejected(tc.command(0x00), CommandReason.UNKNOWN_CODE);
        assertRejected(tc.command(CommandCode.SET_MODE, (byte) 1, (byte) 1), CommandReason.ARGUMENT_LENGTH);
        assertRejected(tc.command(CommandCode.NO_OP, (byte) 0), CommandReason.ARGUMENT_LENGTH);
        assertRejected(tc.command(CommandCode.TABLE_LOAD, (byte) 0, (byte) 0), CommandReason.ARGUMENT_LENGTH);
    }

    @Test
    void shouldRejectArgumentsOutOfRange() {
        assertRejected(tc.command(CommandCode.SET_MODE, (byte) 3), CommandReason.ARGUMENT_RANGE);
        assertRejected(tc.command(CommandCode.RESET_COUNTERS, (byte) 0), CommandReason.ARGUMENT_RANGE);
        assertRejected(tc.command(CommandCode.RESET_COUNTERS, (byte) 8), CommandReason.ARGUMENT_RANGE);
        assertRejected(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(137)), CommandReason.ARGUMENT_RANGE);
        assertRejected(tc.command(CommandCode.TABLE_DUMP, (byte) 2, (byte) 0, (byte) 0, (byte) 0, (byte) 1),
                CommandReason.ARGUMENT_RANGE);
        byte[] load = TcBuilder.load(new byte[1200], 1100, 100); // ends at 1200 > 1186 (commands.md §4.1)
        assertRejected(tc.command(CommandCode.TABLE_LOAD, load), CommandReason.ARGUMENT_RANGE);
    }

    @Test
    void shouldRefuseEnableWithoutArmAndModeWithoutHv() {
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.SET_MODE, (byte) 0)));
        assertRejected(tc.command(CommandCode.HV_ENABLE), CommandReason.NOT_ARMED);
        assertRejected(tc.command(CommandCode.SET_MODE, (byte) 1), CommandReason.HV_NOT_ENABLED);
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.HV_ARM)));
        rig.nowMicros += 10_000_001; // arm time-out 10 s (FlightConfig), tested at T+1 (style.md habit 2)
        assertRejected(tc.command(CommandCode.HV_ENABLE), CommandReason.NOT_ARMED);
    }

    @Test
    void shouldAcceptEnableAtArmTimeOutThenLeaveSafe() {
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.SET_MODE, (byte) 0)));
        assertEquals(SweepMode.SAFE, rig.fsw.scheduler().mode());
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.HV_ARM)));
        rig.nowMicros += 10_000_000; // exactly at the arm time-out: still valid (deadline - now >= 0)
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.HV_ENABLE)));
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.SET_MODE, (byte) 1)));
        assertEquals(SweepMode.SURVEY, rig.fsw.scheduler().mode());
    }

    @Test
    void shouldRefuseCommitWithoutVerifyAndWithWrongId() {
        assertRejected(tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(0)), CommandReason.TABLE_NOT_VERIFIED);
    }
}
