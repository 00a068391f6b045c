package dev.sweepline.fsw.link;

import dev.sweepline.fsw.DemoCup;
import java.util.Arrays;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Golden wire frames of the hardware ICD §2-3. The expected octets were made with python3 from the
 * ICD's layout, binascii.crc_hqx(payload, 0xFFFF) (CRC-16/IBM-3740, check 0x29B1 confirmed there) and
 * a COBS encoder written from Cheshire and Baker 1999, independent of this code.
 */
class MessageCodecTest {
    private static final HexFormat HEX = HexFormat.of();
    /** seq 0x1234, low 0x0102, high 0xA0B0, gain 2, HV on, settle 0x12345 us, 8 periods (python3, see class doc). */
    private static final String STEP_FRAME = "0a0112340102a0b002010401234504089d6500";
    /** seq 0x1234, status 5, gain 1, Q 0x0100 0x0200 0xFFFF 0x0000, HV monitor 0xA0B0 (python3). */
    private static final String REPLY_FRAME = "07811234050101020203ffff0105a0b038d700";

    @Test
    void shouldFrameAStepCommandAsTheIcdSays() {
        StepCommand s = new StepCommand();
        s.sequence = 0x1234;
        s.dacLow = 0x0102;
        s.dacHigh = 0xA0B0;
        s.gainRange = 2;
        s.hvEnabled = true;
        s.settleMicros = 0x12345;
        s.integrationPeriods = 8;
        s.window = 77; // not on the wire
        byte[] payload = new byte[StepCommandCodec.LENGTH];
        assertEquals(15, StepCommandCodec.encode(s, payload, 0)); // ICD §3 table: 15 octets
        byte[] wire = new byte[FrameEncoder.MAX_WIRE_FRAME];
        int n = new FrameEncoder().encode(payload, 0, payload.length, wire, 0);
        assertArrayEquals(HEX.parseHex(STEP_FRAME), Arrays.copyOf(wire, n));
        assertEquals(19, n); // ICD §6: 19 octets per direction

        StepCommand back = new StepCommand();
        assertEquals(LinkStatus.OK, StepCommandCodec.decode(payload, 0, payload.length, back));
        assertEquals(0x1234, back.sequence);
        assertEquals(0x0102, back.dacLow);
        assertEquals(0xA0B0, back.dacHigh);
        assertEquals(2, back.gainRange);
        assertTrue(back.hvEnabled);
        assertEquals(0x12345, back.settleMicros);
        assertEquals(8, back.integrationPeriods);
        assertEquals(s.durationMicros(DemoCup.MODULATION_PERIOD_MICROS), back.durationMicros(DemoCup.MODULATION_PERIOD_MICROS));
    }

    @Test
    void shouldDeframeAndDecodeTheGoldenReply() {
        LinkCounters c = new LinkCounters();
        FrameReceiver rx = new FrameReceiver(c, DemoCup.REPLIES);
        int type = FrameReceiver.NONE;
        for (byte b : HEX.parseHex(REPLY_FRAME)) {
            type = rx.accept(b);
        }
        assertEquals(MessageType.SAMPLE_REPLY, type);
        SampleReply r = new SampleReply();
        assertEquals(LinkStatus.OK, DemoCup.REPLIES.decode(rx.payload(), 0, rx.payloadLength(), r));
        assertEquals(0x1234, r.sequence);
        assertEquals(SampleReply.STATUS_SATURATED | SampleReply.STATUS_HV_OFF, r.status);
        assertEquals(1, r.gainRange);
        assertArrayEquals(new int[] {0x0100, 0x0200, 0xFFFF, 0}, r.quadrant);
        assertEquals(0xA0B0, r.hvMonitorCode);
        byte[] again = new byte[DemoCup.REPLIES.length()];
        DemoCup.REPLIES.encode(r, again, 0);
        assertArrayEquals(Arrays.copyOf(rx.payload(), rx.payloadLength()), again);
        assertEquals(1, c.framesGood);
    }

    @Test
    void shouldRefuseUnknownTypesAndWrongLengths() {
        assertEquals(LinkStatus.UNKNOWN_TYPE, MessageType.check(HEX.parseHex("7f0000"), 0, 3, DemoCup.REPLIES.length()));
        assertEquals(LinkStatus.WRONG_LENGTH, MessageType.check(HEX.parseHex("010000"), 0, 3, DemoCup.REPLIES.length())); // a step is 15
        assertEquals(LinkStatus.OK, MessageType.check(HEX.parseHex("020001"), 0, 3, DemoCup.REPLIES.length())); // HK request is 3
        assertEquals(LinkStatus.WRONG_LENGTH, StepCommandCodec.decode(new byte[14], 0, 14, new StepCommand()));
        assertEquals(LinkStatus.UNKNOWN_TYPE, DemoCup.REPLIES.decode(new byte[15], 0, 15, new SampleReply()));
    }

    @Test
    void shouldRoundTripHousekeeping() {
        HousekeepingReply hk = new HousekeepingReply();
        hk.sequence = 9;
        hk.framesGood = 0xFFFF_FFF0L;
        hk.framesBad = 3;
        hk.lastStepSequence = 0xBEEF;
        hk.hvMonitorLowCode = 100;
        hk.hvMonitorHighCode = 60_000;
        hk.temperatureCentiCelsius = -1234; // signed field (ICD §3.3)
        hk.status = HousekeepingCodec.STATUS_WATCHDOG_OFF; // HV off by the link watchdog (ICD §3.3, §4.1)
        hk.watchdogTrips = 70_000; // saturates at 65535 (ICD §3.3)
        byte[] b = new byte[HousekeepingCodec.REPLY_LENGTH];
        assertEquals(22, HousekeepingCodec.encodeReply(hk, b, 0)); // ICD §3 table
        // ICD §3.3 field by field: 82 | 0009 | fffffff0 | 00000003 | beef | 0064 | ea60 | fb2e | 02 | ffff
        assertArrayEquals(HEX.parseHex("820009fffffff000000003beef0064ea60fb2e02ffff"), b);
        HousekeepingReply back = new HousekeepingReply();
        assertEquals(LinkStatus.OK, HousekeepingCodec.decodeReply(b, 0, b.length, back));
        assertEquals(0xFFFF_FFF0L, back.framesGood);
        assertEquals(3, back.framesBad);
        assertEquals(0xBEEF, back.lastStepSequence);
        assertEquals(60_000, back.hvMonitorHighCode);
        assertEquals(-1234, back.temperatureCentiCelsius);
        assertEquals(HousekeepingCodec.STATUS_WATCHDOG_OFF, back.status);
        assertEquals(0xFFFF, back.watchdogTrips);
        assertEquals(LinkStatus.WRONG_LENGTH, HousekeepingCodec.decodeReply(b, 0, 19, back)); // the old length
        byte[] req = new byte[3];
        HousekeepingCodec.encodeRequest(0x0102, req, 0);
        assertArrayEquals(HEX.parseHex("020102"), req);
        assertEquals(0x0102, HousekeepingCodec.decodeRequest(req, 0, 3));
    }
}
