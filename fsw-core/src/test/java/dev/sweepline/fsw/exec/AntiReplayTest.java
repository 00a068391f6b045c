package dev.sweepline.fsw.exec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.command.AuthRecord;
import dev.sweepline.fsw.command.CommandAuthenticator;
import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.TcBuilder;
import org.junit.jupiter.api.Test;

/**
 * Anti-replay across restarts and for refused commands (commands.md §1.3, §1.4): an authentic fresh
 * command consumes its number whatever its fate (common practice for authenticated telecommand),
 * the number survives a restart in non-volatile memory, a lost record locks the authenticator until
 * a recovery naming this boot's challenge, and the end of the sequence space is defined.
 */
class AntiReplayTest {
    private static final long CHALLENGE = 0x5A17_C0DEL; // an arbitrary 32-bit boot challenge

    private final TcBuilder tc = TcBuilder.demo();
    private final FswRig.MemoryStore store = new FswRig.MemoryStore();

    private FswRig boot(long challenge) {
        FlightConfig c = FswRig.withStore(store);
        c.bootChallenge = challenge;
        return new FswRig(c);
    }

    @Test
    void shouldRefuseACommandRecordedBeforeARestart() {
        FswRig first = boot(CHALLENGE);
        assertEquals(CommandAuthenticator.NEW_MEMORY, first.fsw.authRestoreStatus());
        byte[] recorded = tc.command(CommandCode.NO_OP);
        assertEquals(CommandReason.OK, first.send(recorded));
        FswRig second = boot(CHALLENGE + 1);
        assertEquals(CommandAuthenticator.RESTORED, second.fsw.authRestoreStatus());
        assertEquals(CommandReason.REPLAY, second.send(recorded));
        assertEquals(CommandReason.OK, second.send(tc.command(CommandCode.NO_OP)), "a correctly counted command");
    }

    @Test
    void shouldConsumeTheNumberOfAnAuthenticCommandRefusedForItsState() {
        FswRig rig = boot(CHALLENGE);
        rig.send(tc.command(CommandCode.SET_MODE, (byte) 0)); // SAFE: the interlock goes OFF
        byte[] enable = tc.command(CommandCode.HV_ENABLE);
        assertEquals(CommandReason.NOT_ARMED, rig.send(enable));
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.HV_ARM)));
        assertEquals(CommandReason.REPLAY, rig.send(enable), "the kept HV_ENABLE cannot be replayed after an arm");
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.HV_ENABLE)));
    }

    @Test
    void shouldDefineTheEndOfTheSequenceSpace() {
        FswRig rig = boot(CHALLENGE);
        assertEquals(CommandReason.OK, rig.send(tc.command(5, CommandCode.NO_OP)));
        assertEquals(CommandReason.SEQUENCE_RANGE, rig.send(tc.command(0xFFFF_FFFFL, CommandCode.NO_OP)));
        assertEquals(CommandReason.SEQUENCE_RANGE, rig.send(tc.command(5 + (1L << 24) + 1, CommandCode.NO_OP)));
        assertEquals(5, rig.fsw.authenticator().lastAccepted(), "refused numbers are not consumed");
        assertEquals(CommandReason.OK, rig.send(tc.command(6, CommandCode.NO_OP)), "no lock-out");
        assertEquals(CommandReason.OK, rig.send(tc.command(6 + (1L << 24), CommandCode.NO_OP)), "the window's edge");
        assertEquals(CommandReason.REPLAY, rig.send(tc.command(0, CommandCode.NO_OP)), "0 is never fresh");
    }

    @Test
    void shouldLockWhenTheRecordIsLostAndRecoverOnlyWithThisBootsChallenge() {
        boot(CHALLENGE).send(tc.command(CommandCode.NO_OP));
        store.content = TableCommandingTest.newImage(); // the memory holds a table ...
        store.auth = null;                               // ... but the anti-replay record is gone
        FswRig locked = boot(CHALLENGE);
        assertEquals(CommandAuthenticator.LOCKED, locked.fsw.authRestoreStatus());
        assertEquals(CommandReason.AUTH_LOCKED, locked.send(tc.command(CommandCode.NO_OP)));
        byte[] wrong = tc.command(CommandCode.AUTH_RECOVER, u32(CHALLENGE ^ 1));
        assertEquals(CommandReason.AUTH_LOCKED, locked.send(wrong));
        long floor = tc.nextAuth;
        byte[] recovery = tc.command(CommandCode.AUTH_RECOVER, u32(CHALLENGE));
        assertEquals(CommandReason.OK, locked.send(recovery));
        assertFalse(locked.fsw.authenticator().locked());
        assertEquals(floor, locked.fsw.authenticator().lastAccepted());
        assertEquals(CommandReason.OK, locked.send(tc.command(CommandCode.NO_OP)));

        store.auth = new byte[0]; // a torn write: as lost as a missing record
        FswRig nextBoot = boot(CHALLENGE + 7);
        assertTrue(nextBoot.fsw.authenticator().locked());
        assertEquals(CommandReason.AUTH_LOCKED, nextBoot.send(recovery), "a recorded recovery of another boot");
    }

    @Test
    void shouldLockOnACorruptRecord() {
        boot(CHALLENGE).send(tc.command(CommandCode.NO_OP));
        store.auth[5] ^= 0x40; // CRC-16/IBM-3740 over octets 0..7 no longer matches (AuthRecord layout)
        assertEquals(AuthRecord.CORRUPT, AuthRecord.decode(store.auth, store.auth.length));
        assertEquals(CommandAuthenticator.LOCKED, boot(CHALLENGE).fsw.authRestoreStatus());
    }

    @Test
    void shouldNotExecuteACommandWhoseNumberCannotBeMadeDurable() {
        FswRig rig = boot(CHALLENGE);
        store.failAuthWrites = true;
        int before = rig.fsw.scheduler().mode().ordinal();
        assertEquals(CommandReason.NVM_WRITE_FAILED, rig.send(tc.command(CommandCode.SET_MODE, (byte) 0)));
        assertEquals(before, rig.fsw.scheduler().mode().ordinal(), "the state is unchanged");
    }

    private static byte[] u32(long v) {
        return new byte[] {(byte) (v >>> 24), (byte) (v >>> 16), (byte) (v >>> 8), (byte) v};
    }
}
