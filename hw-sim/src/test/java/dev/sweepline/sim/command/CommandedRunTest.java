package dev.sweepline.sim.command;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.nvm.FileNonVolatileStore;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.ground.decode.CommandReport;
import dev.sweepline.ground.decode.EventReport;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A parameter table loaded by a command script during a closed-loop run changes the sweep, is
 * reported and dumped in telemetry, and is back in force after a restart from the NVM file
 * (commands.md §4, §7).
 */
class CommandedRunTest {
    /** The scripted table: 64 windows 100..3000 V, 4 integration periods. */
    private static byte[] expectedImage() {
        ParameterTable t = ParameterTable.of(WindowTable.logSpaced(64, 100_000, 3_000_000, TestInstruments.DEMO_CUP.flight().millivoltsPerCode()), TestInstruments.DEMO_CUP.flight().defaultParameters());
        t.sweep.integrationPeriods = 4;
        byte[] b = new byte[TableImage.MAX_OCTETS];
        return Arrays.copyOf(b, TableImage.encode(t, b));
    }

    @Test
    void shouldChangeSweepWithScriptedTableAndRestoreItAfterRestart(@TempDir Path dir) throws Exception {
        Path nvm = dir.resolve("table.nvm");
        byte[] image = expectedImage();
        int id = TableImage.tableId(image, image.length);
        DecodedRun run = DecodedRun.of(List.of(
                "1.0 NO_OP",
                "2.0 TABLE_LOGSPACED 64 100 3000 4",
                "2.5 TABLE_DUMP 0 0 64"), 6, new FileNonVolatileStore(nvm), f -> { });

        // every scripted command accepted: no-op, 3 loads (138 + 4*64 = 394 octets), verify, commit, dump
        assertEquals(7, run.runner.sent().size());
        assertTrue(run.runner.sent().stream().allMatch(s -> s.reason() == CommandReason.OK), run.runner.sent().toString());
        assertTrue(run.reports.stream().allMatch(CommandReport::ok), run.reports.toString());
        assertEquals(14, run.reports.size()); // an acceptance and an execution report each (telemetry ICD §9)
        CommandReport dump = run.reports.stream().filter(r -> r.commandCode() == CommandCode.TABLE_DUMP
                && r.type() == CommandReport.EXECUTION).findFirst().orElseThrow();
        assertArrayEquals(Arrays.copyOf(image, 64), dump.dumpData());
        assertEquals(1, run.events.stream().filter(e -> e.eventId() == EventReport.TABLE_COMMITTED
                && e.reasonCode() == id).count());

        // the sweep before the commit: default table; after the next sweep boundary: the new one
        DecodedSpectrum first = run.spectra.get(0);
        assertEquals(0, first.tableId());
        assertEquals(128, first.windowCount());
        assertEquals(8, first.integrationPeriods());
        DecodedSpectrum last = run.spectra.get(run.spectra.size() - 1);
        assertEquals(id, last.tableId());
        assertEquals(4, last.integrationPeriods());
        assertTrue(run.spectra.stream().anyMatch(s -> s.tableId() == id && s.windowCount() == 64), "a 64-window survey");
        assertTrue(run.spectra.stream().allMatch(s -> s.tableId() != id || s.firstWindow() + s.windowCount() <= 64));
        assertEquals(id, run.housekeeping.get(run.housekeeping.size() - 1).tableId());
        assertArrayEquals(image, Files.readAllBytes(nvm));

        // restart: the flight software restores the image from the NVM file at start-up
        DecodedRun again = DecodedRun.of(List.of(), 3, new FileNonVolatileStore(nvm), f -> { });
        EventReport restored = again.events.get(0);
        assertEquals(EventReport.TABLE_RESTORED, restored.eventId());
        assertEquals(1, restored.argumentA()); // TableManager.RESTORE_OK
        assertEquals(id, restored.reasonCode());
        assertEquals(id, again.spectra.get(0).tableId());
        assertEquals(64, again.spectra.get(0).windowCount());
        assertEquals(4, again.spectra.get(0).integrationPeriods());
    }

    @Test
    void shouldKeepDefaultTableWhenNvmFileIsCorrupt(@TempDir Path dir) throws Exception {
        Path nvm = dir.resolve("table.nvm");
        byte[] image = expectedImage();
        image[150] ^= 0x10; // one flipped bit: the CRC no longer matches
        Files.write(nvm, image);
        DecodedRun run = DecodedRun.of(List.of(), 2, new FileNonVolatileStore(nvm), f -> { });
        assertEquals(2, run.events.get(0).argumentA()); // TableManager.RESTORE_REJECTED
        assertEquals(0, run.spectra.get(0).tableId());
        assertEquals(128, run.spectra.get(0).windowCount());
    }
}
