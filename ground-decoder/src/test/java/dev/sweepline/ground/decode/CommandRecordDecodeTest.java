package dev.sweepline.ground.decode;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

/** Command reports (ICD §9), the issue-6 housekeeping fields (ICD §5) and fault events (ICD §6), byte by byte. */
class CommandRecordDecodeTest {
    private static final String TIME = "4EFFA2008000"; // CUC 2000-01-01T00:00:00.5 TAI (standards.md, verified)

    private static byte[] packet(int apid, String userHex) {
        return TestPackets.packet(apid, 5, true, Hex.bytes(TIME + userHex));
    }

    @Test
    void shouldDecodeCommandReportsThroughTheWholeChain() {
        // ICD §3.3: APID 0x130 on VC 1; the ground decodes it (ICD §9) and counts it by type and status
        byte[] p = packet(0x130, "0102" + "0007" + "00000102" + "03" + "00" + "0009" + "0004");
        byte[] stream = new FrameStreamBuilder(1024).add(1, p).flush(1).stream();
        java.util.List<CommandReport> seen = new java.util.ArrayList<>();
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(),
                dev.sweepline.ground.spectrum.QuadrantDecompressor.UNAVAILABLE, new DecodeListener() {
                    @Override
                    public void onCommandReport(CommandReport r) {
                        seen.add(r);
                    }
                });
        d.accept(stream, 0, stream.length);
        d.finish();
        assertEquals(1, seen.size());
        assertEquals(CommandReport.ACCEPTANCE, seen.get(0).type()); // ICD §9: report type 1; status 3 BAD_MAC (commands.md §3)
        assertEquals(java.util.Map.of("acceptance BAD_MAC", 1L), d.stats().commandReports());
        assertEquals(0, d.stats().recordErrors());
    }

    @Test
    void shouldDecodeRejectionReport() {
        // ICD §9: acceptance, code 0x02, TC count 0x0007, auth 0x00000102, status 3 BAD_MAC, detail 0, 9 accepted, 4 rejected
        byte[] p = packet(0x130, "0102" + "0007" + "00000102" + "03" + "00" + "0009" + "0004");
        CommandReport r = RecordPacketDecoder.commandReport(p, 0, p.length);
        assertEquals(CommandReport.ACCEPTANCE, r.type());
        assertEquals(0x02, r.commandCode());
        assertEquals(7, r.tcSequence());
        assertEquals(0x102, r.authSequence());
        assertEquals("BAD_MAC", CommandReport.reasonName(r.status()));
        assertEquals(9, r.accepted());
        assertEquals(4, r.rejected());
        assertEquals(-1, r.dumpCopy());
    }

    @Test
    void shouldDecodeDumpDataAndRefuseBadDumpLength() {
        // ICD §9: execution of TABLE_DUMP (0x33), copy 0, offset 0, length 3, octets 53 54 01
        String head = "0233" + "0001" + "00000005" + "00" + "00" + "0005" + "0000";
        byte[] p = packet(0x130, head + "00" + "0000" + "0003" + "535401");
        CommandReport r = RecordPacketDecoder.commandReport(p, 0, p.length);
        assertEquals(0, r.dumpCopy());
        assertArrayEquals(new byte[] {0x53, 0x54, 0x01}, r.dumpData());
        byte[] bad = packet(0x130, head + "00" + "0000" + "0004" + "535401"); // length field says 4, 3 present
        assertNull(RecordPacketDecoder.commandReport(bad, 0, bad.length));
    }

    @Test
    void shouldDecodeIssueSixHousekeepingFields() {
        // ICD §5 offsets 0..25 as before, then 26..37: accepted 0x0011, rejected 0x0002, failures 1,
        // last reason 4 REPLAY, HV state 2 enabled, table id 0xBEEF, fault trips 3
        String base = "02" + "01" + "00000064" + "00000063" + "0000" + "0001" + "0000" + "0005" + "0006" + "0000"
                + "00001000";
        byte[] p = packet(0x110, base + "0011" + "0002" + "0001" + "04" + "02" + "BEEF" + "0003");
        HousekeepingReport h = RecordPacketDecoder.housekeeping(p, 0, p.length);
        assertEquals(0x11, h.commandsAccepted());
        assertEquals(2, h.commandsRejected());
        assertEquals(1, h.commandFailures());
        assertEquals(4, h.lastRejection());
        assertEquals(2, h.hvState());
        assertEquals(0xBEEF, h.tableId());
        assertEquals(3, h.faultTrips());
        byte[] old = packet(0x110, base); // the issue-3 baseline, 26 octets, still read
        assertEquals(0, RecordPacketDecoder.housekeeping(old, 0, old.length).tableId());
    }

    @Test
    void shouldNameFaultEvent() {
        // ICD §6 event 2: monitor 4 link time-out, response 1 retry, detail 2
        byte[] p = packet(0x120, "0002" + "04" + "01" + "0002");
        EventReport e = RecordPacketDecoder.event(p, 0, p.length);
        assertEquals("fault LINK_TIMEOUT response RETRY detail 2", e.describe());
    }
}
