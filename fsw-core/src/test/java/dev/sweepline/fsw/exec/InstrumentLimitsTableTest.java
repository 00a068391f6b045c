package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.command.TableManager;
import dev.sweepline.fsw.command.TcBuilder;
import dev.sweepline.fsw.fault.FaultMonitorId;
import dev.sweepline.fsw.fault.FaultResponse;
import dev.sweepline.fsw.instrument.InstrumentLimits;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * No table takes the instrument outside its own limits (commands.md §4.4, §6.1): the demo cup is
 * rated to 6000 V at 0.1 V per DAC code (the demo instrument's description), so a window at 6400 V
 * (code 64000, well inside the 16-bit DAC) is refused at verify, at restore and at start-up; settle
 * below the supply's slew and settling is refused; a monitor may be relaxed but never silenced.
 */
class InstrumentLimitsTableTest {
    private final TcBuilder tc = TcBuilder.demo();

    private static byte[] image(ParameterTable t) {
        byte[] b = new byte[TableImage.MAX_OCTETS];
        return Arrays.copyOf(b, TableImage.encode(t, b));
    }

    private static ParameterTable logSpaced(int highVolts) {
        return ParameterTable.of(WindowTable.logSpaced(64, 100_000, highVolts * 1000, DemoCup.INSTRUMENT.millivoltsPerCode()), DemoCup.parameters());
    }

    private int verify(FswRig rig, byte[] image) {
        for (int from = 0; from < image.length; from += CommandCode.MAX_LOAD_OCTETS) {
            int n = Math.min(CommandCode.MAX_LOAD_OCTETS, image.length - from);
            rig.send(tc.command(CommandCode.TABLE_LOAD, TcBuilder.load(image, from, n)));
        }
        rig.send(tc.command(CommandCode.TABLE_VERIFY, TcBuilder.u16(image.length)));
        return rig.fsw.tables().verified() ? 0 : rig.fsw.tables().lastDetail();
    }

    @Test
    void shouldRefuseAWindowAboveTheVoltageLimitAndCommitOneBelow() {
        FswRig rig = new FswRig();
        byte[] unsafe = image(logSpaced(6400));
        assertEquals(TableStatus.ABOVE_VOLTAGE_LIMIT, verify(rig, unsafe));
        int id = TableImage.tableId(unsafe, unsafe.length);
        assertEquals(CommandReason.TABLE_NOT_VERIFIED, rig.send(tc.command(CommandCode.TABLE_COMMIT, TcBuilder.u16(id))));
        assertEquals(0, rig.fsw.tables().activeId());
        byte[] safe = image(logSpaced(3000));
        assertEquals(0, verify(rig, safe));
        assertEquals(CommandReason.OK, rig.send(tc.command(CommandCode.TABLE_COMMIT,
                TcBuilder.u16(TableImage.tableId(safe, safe.length)))));
    }

    @Test
    void shouldAcceptTheLimitItselfAndRefuseOneCodeAbove() {
        InstrumentLimits demo = DemoCup.INSTRUMENT.limits();
        assertEquals(60_000, demo.maxLevelCode); // 6000 V / 0.1 V per code
        int[] low = {59_000};
        assertEquals(TableStatus.OK, demo.checkLevels(low, new int[] {60_000}, 1));
        assertEquals(TableStatus.ABOVE_VOLTAGE_LIMIT, demo.checkLevels(low, new int[] {60_001}, 1));
    }

    @Test
    void shouldNotRestoreAnUnsafeImageFromNonVolatileMemory() {
        FswRig.MemoryStore store = new FswRig.MemoryStore();
        store.content = image(logSpaced(6400)); // intact (CRC right), written behind the flight software's back
        FswRig rig = new FswRig(FswRig.withStore(store));
        assertEquals(TableManager.RESTORE_REJECTED, rig.fsw.restoreStatus());
        assertEquals(128, rig.fsw.scheduler().windowCount(), "the built-in table flies");
    }

    @Test
    void shouldRefuseAnUnsafeStartUpConfiguration() {
        FlightConfig c = FswRig.benchConfig();
        c.table = WindowTable.logSpaced(64, 100_000, 6_400_000, DemoCup.INSTRUMENT.millivoltsPerCode());
        assertThrows(IllegalArgumentException.class, () -> new FswRig(c));
    }

    @Test
    void shouldRefuseSettleBelowTheSupplysSlewAndSettling() {
        FswRig rig = new FswRig();
        ParameterTable fast = logSpaced(3000);
        fast.sweep.settleMicrosPerCodeQ8 = 128; // 0.5 us per code: the demo supply slews 1 code per us
        assertEquals(TableStatus.SETTLE_BELOW_SLEW, verify(rig, image(fast)));
        ParameterTable short_ = logSpaced(3000);
        short_.sweep.fixedSettleMicros = 300; // 2 tau of the 150 us supply: 13.5 % of the step left
        assertEquals(TableStatus.SETTLE_TOO_SHORT, verify(rig, image(short_)));
    }

    @Test
    void shouldLetATableRelaxButNeverSilenceAMonitor() {
        FswRig rig = new FswRig();
        ParameterTable off = logSpaced(3000);
        off.faults.threshold[FaultMonitorId.HV_READBACK] = 0;
        assertEquals(100 + FaultMonitorId.HV_READBACK, verify(rig, image(off)));
        ParameterTable eventOnly = logSpaced(3000);
        eventOnly.faults.response[FaultMonitorId.HV_READBACK] = FaultResponse.NONE;
        assertEquals(100 + FaultMonitorId.HV_READBACK, verify(rig, image(eventOnly)));
        ParameterTable modeOnly = logSpaced(3000);
        modeOnly.faults.response[FaultMonitorId.LINK_TIMEOUT] = FaultResponse.SURVEY;
        assertEquals(100 + FaultMonitorId.LINK_TIMEOUT, verify(rig, image(modeOnly)));
        ParameterTable deaf = logSpaced(3000);
        deaf.faults.limit[FaultMonitorId.HV_READBACK] = 60_000; // 6 kV of readback error tolerated
        assertEquals(100 + FaultMonitorId.HV_READBACK, verify(rig, image(deaf)));
        ParameterTable relaxed = logSpaced(3000);
        relaxed.faults.threshold[FaultMonitorId.HV_READBACK] = 32; // 4x the default 8 steps
        relaxed.faults.limit[FaultMonitorId.HV_READBACK] = 1_000;  // 100 V
        assertEquals(0, verify(rig, image(relaxed)));
        assertTrue(rig.fsw.tables().verified());
        assertFalse(rig.fsw.authenticator().locked());
    }
}
