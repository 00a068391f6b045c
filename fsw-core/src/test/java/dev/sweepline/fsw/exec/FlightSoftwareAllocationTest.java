package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.TcBuilder;
import dev.sweepline.fsw.sweep.AllocationMeter;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Zero allocation on the flight path with commanding and fault protection on (architecture.md,
 * determinism): cycles of the whole flight software with one authenticated command every 50 cycles
 * (no-op, dump, a forgery, HV arm), measured with the rule of {@link AllocationMeter}. Not timed.
 */
class FlightSoftwareAllocationTest {
    private static final int EVERY = 50;

    @Test
    void shouldAllocateNothingPerCycleOrCommand() {
        FswRig rig = new FswRig();
        TcBuilder tc = TcBuilder.demo();
        int commands = AllocationMeter.WINDOWS * AllocationMeter.STEPS_PER_WINDOW * 2 / EVERY + 1;
        byte[][] packets = new byte[commands][];
        for (int i = 0; i < commands; i++) {
            switch (i % 4) {
                case 0:
                    packets[i] = tc.command(CommandCode.NO_OP);
                    break;
                case 1:
                    packets[i] = tc.command(CommandCode.TABLE_DUMP, (byte) 0, (byte) 0, (byte) 0, (byte) 0, (byte) 192);
                    break;
                case 2:
                    packets[i] = tc.command(CommandCode.NO_OP);
                    packets[i][packets[i].length - 1] ^= 1; // forged
                    break;
                default:
                    packets[i] = tc.command(CommandCode.HV_ARM);
                    break;
            }
        }
        int[] next = {0};
        long[] cycle = {0};
        AllocationMeter.assertAllocationFree(steps -> {
            for (int k = 0; k < steps; k++) {
                rig.fsw.doWork(rig.nowMicros);
                rig.fsw.reportCycleWork(20);
                if (++cycle[0] % EVERY == 0) {
                    byte[] p = packets[next[0]++];
                    rig.fsw.acceptTelecommand(p, 0, p.length, rig.nowMicros);
                }
                rig.nowMicros += 100;
            }
        });
        // 200k cycles of 100 us = 20 s of simulated time: about 54 sweeps; the loop really swept
        assertTrue(rig.fsw.scheduler().sweepCount() > 20, "sweeps " + rig.fsw.scheduler().sweepCount());
        assertTrue(rig.fsw.commands().accepted() > 2000, "accepted " + rig.fsw.commands().accepted());
    }
}
