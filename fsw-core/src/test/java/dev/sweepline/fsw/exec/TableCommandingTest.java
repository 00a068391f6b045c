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
import dev.sweepline.fsw.telemetry.TelemetryWriter;
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

    /** The default table with the engineering flush at {@code seconds} (0: the build's). */
    private static byte[] flushImage(int seconds) {
        ParameterTable t = ParameterTable.of(DemoCup.table(), DemoCup.parameters());
        t.sweep.engineeringFlushSeconds = seconds;
        byte[] image = new byte[TableImage.MAX_OCTETS];
        return java.util.Arrays.copyOf(image, TableImage.encode(t, image));
    }

    private void commit(FswRig rig, byte[] image) {
        load(rig, image);
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length))));
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_COMMIT,
                TcBuilder.u16(TableImage.tableId(image, image.length)))));
        assertEquals(0, rig.fsw.commands().executionFailures());
    }

    @Test
    void shouldWriteTheEngineeringFlushInVersionThreeOnly() {
        int n = DemoCup.table().count();
        byte[] build = flushImage(0);
        assertEquals(TableImage.VERSION, build[2]); // commands.md §4.1: the build's flush needs no extension
        assertEquals(138 + 4 * n, build.length); // §4.1: L = 138 + 4 n in version 1
        byte[] minute = flushImage(60);
        assertEquals(TableImage.VERSION_FLUSH, minute[2]);
        assertEquals(158 + 4 * n, minute.length); // §4.1: L = 158 + 4 n in version 3
        assertEquals(60, minute[136 + 4 * n + 16 + 3]); // §4.1: the flush after the 16 octets of styles
        ParameterTable back = new ParameterTable();
        assertEquals(0, TableImage.decode(minute, minute.length, back, DemoCup.INSTRUMENT.limits()));
        assertEquals(60, back.sweep.engineeringFlushSeconds);
        assertTrue(back.sweep.defaultStyles()); // the styles written as their defaults come back so
        assertEquals(0, TableImage.decode(build, build.length, back, DemoCup.INSTRUMENT.limits()));
        assertEquals(0, back.sweep.engineeringFlushSeconds); // §4.1: version 1 loads with the build's flush
    }

    @Test
    void shouldWriteTheFocusFloorInVersionFourOnly() {
        int n = DemoCup.table().count();
        ParameterTable t = ParameterTable.of(DemoCup.table(), DemoCup.parameters());
        t.sweep.focusStyle = 7;
        t.sweep.focusFloorPeriods = 2;
        byte[] image = new byte[TableImage.MAX_OCTETS];
        image = java.util.Arrays.copyOf(image, TableImage.encode(t, image));
        assertEquals(TableImage.VERSION_FLOOR, image[2]); // commands.md §4.1: a floor dwell needs version 4
        assertEquals(162 + 4 * n, image.length); // §4.1: L = 162 + 4 n in version 4
        assertEquals(7, image[136 + 4 * n + 3]); // §4.1: focusStyle first of the styles
        assertEquals(2, image[136 + 4 * n + 16 + 4 + 3]); // §4.1: the floor after the styles and the flush
        ParameterTable back = new ParameterTable();
        assertEquals(0, TableImage.decode(image, image.length, back, DemoCup.INSTRUMENT.limits()));
        assertEquals(2, back.sweep.focusFloorPeriods);
        assertEquals(7, back.sweep.focusStyle);
        assertEquals(0, back.sweep.engineeringFlushSeconds);
        // a version-3 image loads with no floor dwell (0)
        byte[] minute = flushImage(60);
        assertEquals(0, TableImage.decode(minute, minute.length, back, DemoCup.INSTRUMENT.limits()));
        assertEquals(0, back.sweep.focusFloorPeriods);
        // support dwell without a floor is refused: 18 BAD_STYLE (§4.2)
        t.sweep.focusFloorPeriods = 0;
        byte[] bad = new byte[TableImage.MAX_OCTETS];
        bad = java.util.Arrays.copyOf(bad, TableImage.encode(t, bad));
        assertEquals(TableImage.VERSION_STYLES, bad[2]);
        assertEquals(TableStatus.BAD_STYLE, TableImage.decode(bad, bad.length, back, DemoCup.INSTRUMENT.limits()));
    }

    @Test
    void shouldRefuseAnEngineeringFlushOutsideItsRange() {
        // commands.md §4.1/§4.2: 0 (the build's) or 1..600 s; else TableStatus 19 BAD_FLUSH
        for (int seconds : new int[] {1, 600}) {
            byte[] image = flushImage(seconds);
            assertEquals(0, TableImage.decode(image, image.length, new ParameterTable(), DemoCup.INSTRUMENT.limits()));
        }
        for (int seconds : new int[] {-1, 601, Integer.MAX_VALUE}) {
            byte[] image = flushImage(seconds);
            assertEquals(TableStatus.BAD_FLUSH, TableImage.decode(image, image.length, new ParameterTable(),
                    DemoCup.INSTRUMENT.limits()), seconds + " s");
        }
        assertEquals(19, TableStatus.BAD_FLUSH); // commands.md §4.2: the next code after 18 BAD_STYLE
        assertEquals("BAD_FLUSH", TableStatus.name(19));
        FswRig rig = new FswRig();
        byte[] image = flushImage(601);
        load(rig, image);
        rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length)));
        assertEquals(TableStatus.BAD_FLUSH, rig.fsw.tables().lastDetail());
        assertFalse(rig.fsw.tables().verified());
    }

    @Test
    void shouldFlushTheEngineeringChannelAsTheCommittedTableSays() {
        long build = rigFlush(new FswRig(), Apid.VC_ENGINEERING);
        assertEquals(TelemetryWriter.DEFAULT_FLUSH_INTERVAL_MICROS, build);
        FswRig.MemoryStore store = new FswRig.MemoryStore();
        FswRig rig = new FswRig(FswRig.withStore(store));
        FswRig reference = new FswRig();
        commit(rig, flushImage(60));
        commit(reference, flushImage(0));
        assertEquals(60_000_000L, rigFlush(rig, Apid.VC_ENGINEERING)); // in force at once (§4.2)
        assertEquals(build, rigFlush(rig, Apid.VC_SCIENCE)); // the science channel keeps the build's
        assertEquals(build, rigFlush(reference, Apid.VC_ENGINEERING));
        rig.run(50_000_000);
        reference.run(50_000_000);
        // housekeeping every 16 s opens an engineering frame: at 10 s each leaves part-filled alone,
        // at 60 s they share one frame, so the same packets cost fewer frame octets
        long packets = rig.fsw.telemetry().counters().packets(Apid.HOUSEKEEPING);
        assertEquals(reference.fsw.telemetry().counters().packets(Apid.HOUSEKEEPING), packets);
        assertTrue(packets >= 3, packets + " housekeeping packets");
        long minute = rig.fsw.telemetry().counters().frameOctets(Apid.VC_ENGINEERING);
        long tenSeconds = reference.fsw.telemetry().counters().frameOctets(Apid.VC_ENGINEERING);
        assertTrue(minute < tenSeconds, minute + " octets at 60 s against " + tenSeconds + " at 10 s");
        FswRig restarted = new FswRig(FswRig.withStore(store));
        assertEquals(TableManager.RESTORE_OK, restarted.fsw.restoreStatus());
        assertEquals(60_000_000L, rigFlush(restarted, Apid.VC_ENGINEERING)); // the stored table's, from start-up
        commit(rig, flushImage(0));
        assertEquals(build, rigFlush(rig, Apid.VC_ENGINEERING)); // 0: back to the build's
    }

    private static long rigFlush(FswRig rig, int vc) {
        return rig.fsw.telemetry().flushInterval(vc);
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
