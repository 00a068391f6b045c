package dev.sweepline.fsw.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.CucTime;
import dev.sweepline.fsw.telemetry.TelemetryWriter;
import java.io.ByteArrayOutputStream;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/**
 * The engineering writers put every field at its telemetry ICD offset (§5, §6, §9 tables), big-endian;
 * the expected octets are written out here by hand from those tables.
 */
class ReportWritersTest {
    private static final HexFormat HEX = HexFormat.of();
    /** Octets before the user data: primary header 6 + CUC 6 (telemetry ICD §3). */
    private static final int UD = 12;

    private final ByteArrayOutputStream frames = new ByteArrayOutputStream();
    private final TelemetryWriter telemetry = new TelemetryWriter(TelemetryWriter.DEFAULT_FRAME_LENGTH, Long.MAX_VALUE,
            new CucTime(0, 0), CommandReportWriter.maxLength(192), (f, off, len) -> frames.write(f, off, len));

    private String userData(int length) {
        return HEX.formatHex(telemetry.buffer(), telemetry.userDataOffset(), telemetry.userDataOffset() + length);
    }

    @Test
    void shouldWriteHousekeepingAtTheIcdOffsets() {
        new HousekeepingWriter(telemetry).begin().mode(2, true).link(0x01020304L, 0x05060708L, 0x1_0000, 9, 10)
                .sweeps(0x1_0011, 0x12, 0x13, 0x1415_1617L).commands(0x18, 0x19, 0x1A, 0x1B)
                .state(2, 0xBEEF, 0x1C, 0x1D).send(0);
        // ICD §5: mode 2, HV 1, steps, replies, seq errors saturated at FFFF, time-outs 9, retries 10,
        // survey sweeps wrap to 0011, focus 0012, lock losses 0013, TM octets, TC 0018 0019 001A, last 1B,
        // interlock 2, table BEEF, trips 001C, link bad 001D
        assertEquals("0201" + "01020304" + "05060708" + "ffff" + "0009" + "000a" + "0011" + "0012" + "0013"
                + "14151617" + "0018" + "0019" + "001a" + "1b" + "02" + "beef" + "001c" + "001d", userData(40));
        assertEquals(40, HousekeepingWriter.LENGTH);
        assertEquals(1, telemetry.counters().packets(Apid.HOUSEKEEPING));
        assertEquals(UD + 40, telemetry.counters().packetOctets(Apid.HOUSEKEEPING));
    }

    @Test
    void shouldWriteAnEventAtTheIcdOffsets() {
        new EventWriter(telemetry).write(EventWriter.MODE_CHANGE, 2, 1, 5, 0);
        // ICD §6: id 0001, from 2 (focus), to 1 (survey), reason 0005 (peak jump)
        assertEquals("0001" + "02" + "01" + "0005", userData(6));
        assertEquals(UD + 6, telemetry.counters().packetOctets(Apid.EVENT));
    }

    @Test
    void shouldWriteACommandReportWithItsDumpAtTheIcdOffsets() {
        CommandReportWriter w = new CommandReportWriter(telemetry);
        byte[] image = HEX.parseHex("00112233445566");
        int extra = w.dump(1, image, 2, 3);
        w.write(CommandReportWriter.EXECUTION, 9, 0x1234, 0x89ABCDEFL, 0, 0, 0x1_0005, 6, extra, 0);
        // ICD §9: type 2, code 09, packet seq 1234, auth seq 89ABCDEF, status 0, detail 0, accepted wraps to
        // 0005, rejected 0006; dump: copy 1, offset 0002, length 0003, the octets 22 33 44
        assertEquals("02" + "09" + "1234" + "89abcdef" + "00" + "00" + "0005" + "0006" + "01" + "0002" + "0003"
                + "223344", userData(14 + 5 + 3));
        assertEquals(5 + 3, extra);
        assertEquals(UD + 14 + 8, telemetry.counters().packetOctets(Apid.COMMAND_REPORT));
    }
}
