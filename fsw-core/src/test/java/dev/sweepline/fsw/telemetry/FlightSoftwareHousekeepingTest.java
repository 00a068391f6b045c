package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.sweep.SyntheticInstrument;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The flight software's housekeeping packet carries the ICD §5 image of its own counters: the same
 * {@link HousekeepingImage} that reproduces the golden housekeeping frames, so FlightSoftware's
 * private writer and the golden frames agree field by field.
 */
class FlightSoftwareHousekeepingTest {
    /** Simulated run length: long enough for steps sent to pass 255 (a 32-bit field's low octets both set). */
    private static final long RUN_MICROS = 40_000_000L;
    /** Time of the plasma jump that breaks the focus lock (a lock loss, ICD §5 offset 20). */
    private static final long JUMP_MICROS = 20_000_000L;
    /** Recorded seed of the synthetic instrument's noise. */
    private static final long SEED = 20261207L;

    private final List<byte[]> frames = new ArrayList<>();

    @Test
    void shouldWriteTheIcdImageOfItsCountersInTheLastHousekeepingPacket() {
        SyntheticInstrument plasma = new SyntheticInstrument(SEED); // 1 AU slow wind, 400 km/s
        FaultyLink link = new FaultyLink(plasma, 97, 89);
        FlightConfig config = DemoCup.config();
        config.hvEnabledAtStart = true; // as the simulator bench configures it (flight default: OFF)
        config.frameLength = 256;
        FlightSoftware fsw = new FlightSoftware(config, link, (f, off, len) ->
                frames.add(Arrays.copyOfRange(f, off, off + len)), SweepListener.NONE);
        long now = 0;
        while (now < RUN_MICROS) {
            if (now >= JUMP_MICROS) {
                plasma.speedKmPerS = 700; // fast wind: the proton peak leaves the focus band
            }
            fsw.doWork(now);
            now += 200;
        }
        fsw.close(now);

        Executive e = fsw.executive();
        // preconditions: every field moved, so a misplaced or swapped field cannot pass unseen
        assertTrue(e.stepsSent() > 0xFF && e.sequenceErrors() > 0 && e.timeouts() > 0 && e.retries() > 0,
                "counters " + e.stepsSent() + " " + e.sequenceErrors() + " " + e.timeouts() + " " + e.retries());
        assertTrue(fsw.lockLosses() > 0, "no lock loss");
        byte[] last = lastHousekeepingUserData();
        TelemetryCounters c = fsw.telemetry().counters();
        int housekeepingOctets = SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH + HousekeepingImage.LENGTH;
        byte[] expected = HousekeepingImage.of(mode(fsw.scheduler().mode()),
                fsw.scheduler().mode() != SweepMode.SAFE && fsw.hv().enabled() ? 1 : 0, e.stepsSent(),
                e.repliesAccepted(),
                (int) e.sequenceErrors(), (int) e.timeouts(), (int) e.retries(),
                (int) (c.packets(Apid.SURVEY_SPECTRUM)), (int) (c.packets(Apid.FOCUS_SPECTRUM)),
                (int) fsw.lockLosses(),
                // ICD §5 offset 22: octets generated before this packet (the packet is counted once sent)
                c.packetOctets() - housekeepingOctets,
                (int) fsw.commands().accepted(), (int) fsw.commands().rejected(),
                (int) fsw.commands().executionFailures(), fsw.commands().lastRejection(), fsw.hv().code(now),
                fsw.tables().activeId(), (int) Math.min(0xFFFF, fsw.faults().totalTrips()),
                0); // the test's link has no framing: ICD §5 offset 38 reads 0
        assertArrayEquals(expected, last);
    }

    private static int mode(SweepMode m) {
        return m == SweepMode.SAFE ? 0 : m == SweepMode.SURVEY ? 1 : 2; // ICD §5 offset 0
    }

    /** User data of the last housekeeping packet on VC 1 (packets walked from the first frame's FHP 0). */
    private byte[] lastHousekeepingUserData() {
        byte[] stream = GoldenFramesTest.dataFields(frames, Apid.VC_ENGINEERING);
        byte[] last = null;
        int p = 0;
        while (p + SpacePacket.PRIMARY_HEADER_LENGTH <= stream.length) {
            int total = SpacePacket.totalLength(stream, p);
            if (SpacePacket.apid(stream, p) == Apid.HOUSEKEEPING) {
                int from = p + SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH;
                last = Arrays.copyOfRange(stream, from, from + HousekeepingImage.LENGTH);
                assertEquals(HousekeepingImage.LENGTH, total - SpacePacket.PRIMARY_HEADER_LENGTH - CucTime.LENGTH);
            }
            p += total;
        }
        assertTrue(last != null, "no housekeeping packet");
        return last;
    }
}
