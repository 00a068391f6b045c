package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.science.SpectrumLayout;
import dev.sweepline.fsw.science.SpectrumPacker;
import dev.sweepline.fsw.science.SpectrumTelemetry;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SpectrumFill;
import dev.sweepline.fsw.sweep.SweepMode;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * fsw-core's own writers (TransferFrameBuilder, SpacePacket, CucTime, SpectrumPacker raw, the ICD §5
 * housekeeping image) reproduce the golden frames of the telemetry ICD octet for octet. The golden
 * frames come from make_golden_frames.py and, for the spectrum of layout 2, make_golden_frames_v2.py (see
 * {@link GoldenFrames}); every field value below is the one those scripts pack, and the expected octets
 * are the scripts', computed from the ICD in python, never this code's.
 */
class GoldenFramesTest {
    private static final HexFormat HEX = HexFormat.of();
    /** SCID of the demo probe (telemetry ICD §1). */
    private static final int SCID = 0x2C5;
    /** Idle VC of the ICD §2 table (VC 7) and a VC the ICD leaves unused, for priming the MC count. */
    private static final int VC_IDLE = 7;
    private static final int VC_UNUSED = 2;

    private final List<byte[]> frames = new ArrayList<>();
    private final FrameSink sink = (f, off, len) -> frames.add(Arrays.copyOfRange(f, off, off + len));
    private final CucTime time = new CucTime(GoldenFrames.T0_COARSE, 0);

    @Test
    void shouldReproduceTheWholeGoldenStream() {
        TransferFrameBuilder b = new TransferFrameBuilder(SCID, GoldenFrames.FRAME_LENGTH, Long.MAX_VALUE, sink);
        primeCounters(b);
        writeGoldenStream(b);
        assertEquals(GoldenFrames.STREAM.length, frames.size());
        for (int i = 0; i < frames.size(); i++) {
            byte[] f = frames.get(i);
            // ICD §1: the ASM 1A CF FC 1D precedes every frame; the golden frames are stored without it
            assertEquals("1acffc1d", HEX.formatHex(f, 0, TransferFrameBuilder.ASM_LENGTH), "ASM of frame " + i);
            assertEquals(GoldenFrames.STREAM[i], HEX.formatHex(f, TransferFrameBuilder.ASM_LENGTH, f.length),
                    "golden frame " + i);
        }
    }

    @Test
    void shouldPackTheGoldenSpectrumPacketRaw() {
        byte[] packet = spectrumPacket(7);
        assertEquals(GoldenFrames.SPECTRUM_PACKET, HEX.formatHex(packet)); // make_golden_frames_v2.py demo_spectrum()
    }

    @Test
    void shouldPackTheFineCupsTwentyBitSpectrumInThreeOctets() {
        InstrumentDescription fine = Instruments.builtIn("fine-cup").flight();
        SpectrumPacker packer = new SpectrumPacker(false, fine);
        byte[] buf = new byte[SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH + packer.maxUserDataLength()];
        Spectrum s = new Spectrum(fine);
        // make_golden_frames_v2.py fine_spectrum(): focus sweep 9 over windows 100..104, ascending
        SpectrumFill.begin(s, 9, SweepMode.FOCUS, 100, 5, true, 20_250_000L);
        int[] gains = {0, 1, 1, 0, 0};
        int[] q1 = {1024, 0x0F_FFFF, 0x01_2345, 0x0A_BCDE, 1024 + 5};
        for (int i = 0; i < 5; i++) {
            SpectrumFill.store(s, i, gains[i], i == 1 ? SampleReply.STATUS_SATURATED : 0, q1[i], 1024 + 1 + i, i,
                    0x0F_0000 - 0x01_0000 * i);
        }
        SpectrumFill.end(s, 20_400_000L);
        int n = packer.write(s, 16, 0xBEEF, SpectrumLayout.FLAG_TABLE_CHANGED, buf,
                SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH);
        SpacePacket.writePrimaryHeader(buf, 0, SpacePacket.TYPE_TM, true, Apid.FOCUS_SPECTRUM, SpacePacket.UNSEGMENTED,
                3, CucTime.LENGTH + n);
        time.write(buf, SpacePacket.PRIMARY_HEADER_LENGTH, s.startMicros());
        assertEquals(GoldenFrames.FINE_SPECTRUM_PACKET,
                HEX.formatHex(buf, 0, SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH + n));
    }

    @Test
    void shouldPackTheGoldenSpectrumThroughTheTelemetryWriter() {
        // the writer's own path (APID by mode, CUC from the sweep's start, sequence per APID): the 8th
        // spectrum it writes carries sequence count 7, the golden packet's (make_golden_frames_v2.py)
        SpectrumPacker packer = new SpectrumPacker(false, DemoCup.INSTRUMENT);
        TelemetryWriter w = new TelemetryWriter(GoldenFrames.FRAME_LENGTH, Long.MAX_VALUE, time,
                packer.maxUserDataLength(), sink);
        SpectrumTelemetry spectra = new SpectrumTelemetry(packer, w);
        Spectrum s = goldenSpectrum();
        for (int i = 0; i <= 7; i++) {
            spectra.write(s, 4, 0, 0, 0);
        }
        w.flush(0);
        byte[] stream = dataFields(frames, Apid.VC_SCIENCE);
        int packetLength = GoldenFrames.SPECTRUM_PACKET.length() / 2;
        // every spectrum packet is the same length (173 octets), back to back from offset 0 (FHP 0 of the first frame)
        assertEquals(GoldenFrames.SPECTRUM_PACKET,
                HEX.formatHex(stream, 7 * packetLength, 8 * packetLength));
    }

    /**
     * Brings the builder's counts to those before the golden stream: VC 1 count 3, VC 0 count 0x10,
     * VC 7 count 0, MC 5 (make_golden_frames.py). 3 + 16 frames on VC 1 and 0 leave the MC at 19; 242
     * idle frames on an unused VC take it to 261 = 5 mod 256 (CCSDS 132.0-B-3: the MC count is 8 bits).
     */
    private void primeCounters(TransferFrameBuilder b) {
        for (int i = 0; i < 3; i++) {
            b.emitIdleFrame(Apid.VC_ENGINEERING);
        }
        for (int i = 0; i < 0x10; i++) {
            b.emitIdleFrame(Apid.VC_SCIENCE);
        }
        for (int i = 0; i < 256 + 5 - 3 - 0x10; i++) {
            b.emitIdleFrame(VC_UNUSED);
        }
        frames.clear();
    }

    /** The packets of make_golden_frames.py, in its order, through the frame builder. */
    private void writeGoldenStream(TransferFrameBuilder b) {
        byte[] hk = housekeepingPacket(42, 250_000); // seq 42, T0 + 0.25 s
        b.writePacket(Apid.VC_ENGINEERING, hk, 0, hk.length, 0);
        b.flush(Apid.VC_ENGINEERING, 0); // idle packet seq 0 fills the 82-octet tail
        byte[] spectrum = spectrumPacket(7);
        b.writePacket(Apid.VC_SCIENCE, spectrum, 0, spectrum.length, 0);
        b.flush(Apid.VC_SCIENCE, 0); // idle packet seq 1 fills the 67-octet tail
        b.emitIdleFrame(VC_IDLE);
        for (int k = 0; k < 3; k++) { // seq 43..45 at T0 + 4.25, 8.25, 12.25 s
            byte[] p = housekeepingPacket(43 + k, 4_250_000L + 4_000_000L * k);
            b.writePacket(Apid.VC_ENGINEERING, p, 0, p.length, 0);
        }
        b.flush(Apid.VC_ENGINEERING, 0); // 6-octet tail: idle packet seq 2 spills into the next frame
    }

    /** A housekeeping packet with the golden user data (make_golden_frames.py hk()). */
    private byte[] housekeepingPacket(int seq, long micros) {
        byte[] ud = HousekeepingImage.firstForm(1, 1, 0x00012345, 0x00012340, 2, 3, 5, 0x0102, 0x0304, 1, 0x00ABCDEF);
        byte[] p = new byte[SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH + ud.length];
        SpacePacket.writePrimaryHeader(p, 0, SpacePacket.TYPE_TM, true, Apid.HOUSEKEEPING, SpacePacket.UNSEGMENTED,
                seq, CucTime.LENGTH + ud.length);
        time.write(p, SpacePacket.PRIMARY_HEADER_LENGTH, micros);
        System.arraycopy(ud, 0, p, SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH, ud.length);
        return p;
    }

    /** The golden spectrum packet: primary header, CUC, SpectrumPacker raw user data. */
    private byte[] spectrumPacket(int seq) {
        SpectrumPacker packer = new SpectrumPacker(false, DemoCup.INSTRUMENT);
        byte[] buf = new byte[SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH + packer.maxUserDataLength()];
        Spectrum s = goldenSpectrum();
        int n = packer.write(s, 4, 0, 0, buf, SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH);
        SpacePacket.writePrimaryHeader(buf, 0, SpacePacket.TYPE_TM, true, Apid.SURVEY_SPECTRUM,
                SpacePacket.UNSEGMENTED, seq, CucTime.LENGTH + n);
        time.write(buf, SpacePacket.PRIMARY_HEADER_LENGTH, s.startMicros());
        return Arrays.copyOf(buf, SpacePacket.PRIMARY_HEADER_LENGTH + CucTime.LENGTH + n);
    }

    /**
     * The spectrum of make_golden_frames.py spectrum(): survey sweep 0x0123 stepped downward from T0 +
     * 10.5 s over windows 40..55, gain ranges 0,0,0,0, 0,1,1,1, 2,2,1,1, 0,0,0,0, window 48 saturated,
     * peak 0x2F80 (47.5 windows Q8), q1 = 256 + 100 i except q1[8] = 65535, q2 = 256 + 50 i,
     * q3 = 300 + 7 i, q4 = 250 + i.
     */
    static Spectrum goldenSpectrum() {
        int[] gains = {0, 0, 0, 0, 0, 1, 1, 1, 2, 2, 1, 1, 0, 0, 0, 0};
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        SpectrumFill.begin(s, 0x0123, SweepMode.SURVEY, 40, 16, false, 10_500_000L);
        for (int i = 0; i < 16; i++) {
            boolean saturated = i == 8;
            SpectrumFill.store(s, i, gains[i], saturated ? SampleReply.STATUS_SATURATED : 0,
                    saturated ? 65535 : 256 + 100 * i, 256 + 50 * i, 300 + 7 * i, 250 + i);
        }
        SpectrumFill.setPeak(s, 7, 0x2F80);
        SpectrumFill.end(s, 10_700_000L);
        return s;
    }

    /** The data fields of {@code vc}'s frames, concatenated (ASM, header and FECF stripped). */
    static byte[] dataFields(List<byte[]> frames, int vc) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (byte[] f : frames) {
            int h = TransferFrameBuilder.ASM_LENGTH;
            if (((f[h + 1] >> 1) & 7) == vc) {
                int from = h + TransferFrameBuilder.HEADER_LENGTH;
                out.write(f, from, f.length - TransferFrameBuilder.FECF_LENGTH - from);
            }
        }
        return out.toByteArray();
    }
}
