package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.command.TableManager;
import dev.sweepline.fsw.command.TcBuilder;
import dev.sweepline.fsw.octets.Crc16;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.fsw.telemetry.Apid;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Table load, verify, commit, dump and restore by command (commands.md §2.4, §4). */
class TableCommandingTest {
    private final TcBuilder tc = TcBuilder.demo();

    /** 64 log-spaced windows 100..3000 V, 4 integration periods: visibly different from the default. */
    static byte[] newImage() {
        ParameterTable t = ParameterTable.of(WindowTable.logSpaced(64, 100_000, 3_000_000, DemoCup.INSTRUMENT.millivoltsPerCode()), DemoCup.parameters());
        t.sweep.integrationPeriods = 4;
        byte[] image = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(t, image);
        return java.util.Arrays.copyOf(image, n);
    }

    private void load(FswRig rig, byte[] image) {
        for (int from = 0; from < image.length; from += CommandCode.MAX_LOAD_OCTETS) {
            int n = Math.min(CommandCode.MAX_LOAD_OCTETS, image.length - from);
            assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_LOAD, TcBuilder.load(image, from, n))));
        }
    }

    @Test
    void shouldSizeImageAsDocumented() {
        // commands.md §4.1: L = 138 + 4 n; the CRC is CRC-16/IBM-3740 of octets 0..L-3
        byte[] image = newImage();
        assertEquals(138 + 4 * 64, image.length);
        assertEquals(Crc16.of(image, 0, image.length - 2), TableImage.tableId(image, image.length));
        assertEquals(0x53, image[0]);
        assertEquals(0x54, image[1]);
        assertTrue(TableImage.intact(image, image.length));
    }

    @Test
    void shouldChangeSweepAfterCommitAndSurviveRestart() {
        FswRig.MemoryStore store = new FswRig.MemoryStore();
        FswRig rig = new FswRig(FswRig.withStore(store));
        rig.run(500_000);
        byte[] image = newImage();
        int id = TableImage.tableId(image, image.length);
        load(rig, image);
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length))));
        assertEquals(0, rig.fsw.commands().executionFailures());
        assertEquals(CommandReason.TABLE_ID_MISMATCH, rig.send(tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(id ^ 1))));
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(id))));
        assertEquals(0, rig.fsw.commands().executionFailures());
        assertEquals(id, rig.fsw.tables().activeId());
        rig.run(3_000_000); // past the next sweep boundary (a default survey is about 0.3 s)
        assertEquals(64, rig.fsw.scheduler().windowCount());
        assertEquals(1000, rig.fsw.scheduler().dacLow(0)); // 100 V at 0.1 V/code
        assertEquals(4, rig.fsw.executive().currentStep().integrationPeriods);
        assertEquals(image.length, store.content.length);

        FswRig restarted = new FswRig(FswRig.withStore(store));
        assertEquals(TableManager.RESTORE_OK, restarted.fsw.restoreStatus());
        assertEquals(id, restarted.fsw.tables().activeId());
        assertEquals(64, restarted.fsw.scheduler().windowCount());
        restarted.run(100_000);
        assertEquals(4, restarted.fsw.executive().currentStep().integrationPeriods);
    }

    @Test
    void shouldNeverActivateCorruptImage() {
        FswRig rig = new FswRig();
        rig.run(100_000);
        byte[] image = newImage();
        image[200] ^= 0x40; // one flipped bit in a window code: the CRC no longer matches
        load(rig, image);
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length))));
        assertEquals(1, rig.fsw.commands().executionFailures()); // execution report TABLE_CORRUPT
        assertFalse(rig.fsw.tables().verified());
        assertEquals(CommandReason.TABLE_NOT_VERIFIED, rig.send(tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(0))));
        rig.run(2_000_000);
        assertEquals(128, rig.fsw.scheduler().windowCount()); // the default table stays in force
        assertEquals(0, rig.fsw.tables().activeId());
    }

    @Test
    void shouldRefuseInvalidImageWithItsTableStatus() {
        ParameterTable t = ParameterTable.of(DemoCup.table(), DemoCup.parameters());
        t.dacLow[5] = t.dacLow[4]; // lows must rise strictly (TableStatus.NOT_MONOTONIC)
        byte[] buf = new byte[TableImage.MAX_OCTETS];
        int n = TableImage.encode(t, buf);
        assertEquals(TableStatus.NOT_MONOTONIC, TableImage.decode(buf, n, new ParameterTable(), DemoCup.INSTRUMENT.limits()));
        FswRig rig = new FswRig();
        load(rig, java.util.Arrays.copyOf(buf, n));
        rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(n)));
        assertEquals(TableStatus.NOT_MONOTONIC, rig.fsw.tables().lastDetail());
        assertFalse(rig.fsw.tables().verified());
    }

    @Test
    void shouldRejectCorruptStoredImageAtStartUp() {
        FswRig.MemoryStore store = new FswRig.MemoryStore();
        store.content = newImage();
        store.content[10] ^= 1;
        FswRig rig = new FswRig(FswRig.withStore(store));
        assertEquals(TableManager.RESTORE_REJECTED, rig.fsw.restoreStatus());
        assertEquals(128, rig.fsw.scheduler().windowCount());
        // events: the table restore (rejected), the anti-replay restore (locked: a memory holding a table
        // but no auth record has lost it, commands.md §1.3) and the lock's challenge
        assertEquals(3, rig.fsw.telemetry().counters().packets(Apid.EVENT));
        assertTrue(rig.fsw.authenticator().locked());
    }

    @Test
    void shouldReportFailedNvmWriteButKeepCommittedTable() {
        FswRig.MemoryStore store = new FswRig.MemoryStore();
        store.failWrites = true;
        FswRig rig = new FswRig(FswRig.withStore(store));
        byte[] image = newImage();
        load(rig, image);
        rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length)));
        rig.send(tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(TableImage.tableId(image, image.length))));
        assertEquals(1, rig.fsw.commands().executionFailures()); // NVM_WRITE_FAILED
        assertEquals(TableImage.tableId(image, image.length), rig.fsw.tables().activeId());
    }

    @Test
    void shouldDumpActiveImageIntoReport() {
        FswRig rig = new FswRig();
        long before = rig.fsw.telemetry().counters().packetOctets(Apid.COMMAND_REPORT);
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_DUMP, (byte) 0, (byte) 0, (byte) 0,
                (byte) 0, (byte) 100)));
        // acceptance: 6 + 6 + 14 octets; execution: 6 + 6 + 14 + 5 + 100 (telemetry ICD §9)
        assertEquals(26 + 131, rig.fsw.telemetry().counters().packetOctets(Apid.COMMAND_REPORT) - before);
        // the default image is 138 + 4 * 128 = 650 octets: a dump past it is out of range
        assertEquals(CommandReason.ARGUMENT_RANGE, rig.send(tc.command(CommandCode.TABLE_DUMP, (byte) 0,
                (byte) 0x02, (byte) 0x30, (byte) 0, (byte) 100)));
    }
}
