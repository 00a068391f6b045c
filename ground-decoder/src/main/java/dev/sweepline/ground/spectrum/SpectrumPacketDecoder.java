package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.BigEndian;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.SpacePacketHeader;
import java.util.Arrays;

/**
 * Decodes a spectrum packet (APIDs 0x100, 0x101) per ICD §4, layout 2 or layout 1 ({@link
 * SpectrumHeader} gives the fixed fields of both). After the fixed fields:
 *
 * <pre>
 *  ⌈c/4⌉   gain-range tags, 2 bits per window, MSB first: 0 .. ranges − 1 of the instrument
 *  ⌈c/8⌉   saturation flags, 1 bit per window, MSB first
 *  1       compression 0x00 raw / 0x01 CCSDS 121
 *  4×(2+Lq) per quadrant: Lq then Lq octets of c samples of w bits
 * </pre>
 *
 * The instrument is the one whose description has the packet's instrument id (layout 2), or the demo
 * cup (layout 1); a packet of an instrument the ground has no description for, or whose sample width
 * is not its description's ADC width, is refused. Currents and window edges come from that
 * instrument's description. Not thread-safe (one scratch buffer per instance).
 */
public final class SpectrumPacketDecoder {
    /** APID of survey spectra (ICD §3.3). */
    public static final int APID_SURVEY = 0x100;
    /** APID of focus spectra (ICD §3.3). */
    public static final int APID_FOCUS = 0x101;
    /** Compression octet: raw samples, ⌈w/8⌉ octets each (ICD §4). */
    public static final int COMPRESSION_RAW = 0x00;
    /** Compression octet: CCSDS 121.0-B (ICD §4). */
    public static final int COMPRESSION_CCSDS121 = 0x01;
    /** Largest window count (ICD §4). */
    public static final int MAX_WINDOWS = 256;

    private final QuadrantDecompressor ccsds121;
    private final WindowCatalogue windows;
    private final InstrumentSet instruments;
    private final int[] scratch = new int[QuadrantDecompressor.paddedCount(MAX_WINDOWS)];

    /**
     * A decoder for every built-in instrument.
     *
     * @param ccsds121 decoder for compression 0x01 ({@link QuadrantDecompressor#UNAVAILABLE} if none)
     */
    public SpectrumPacketDecoder(QuadrantDecompressor ccsds121) {
        this(ccsds121, new WindowCatalogue());
    }

    /** A decoder that takes window edges from {@code windows}, for every built-in instrument. */
    public SpectrumPacketDecoder(QuadrantDecompressor ccsds121, WindowCatalogue windows) {
        this(ccsds121, windows, InstrumentSet.builtIns());
    }

    /** A decoder for the instruments of {@code instruments}, window edges from {@code windows}. */
    public SpectrumPacketDecoder(QuadrantDecompressor ccsds121, WindowCatalogue windows, InstrumentSet instruments) {
        this.ccsds121 = ccsds121;
        this.windows = windows;
        this.instruments = instruments;
    }

    /** True for the two spectrum APIDs. */
    public static boolean isSpectrumApid(int apid) {
        return apid == APID_SURVEY || apid == APID_FOCUS;
    }

    /** Decodes the whole packet (primary header first) of {@code len} octets at {@code off}. */
    public SpectrumResult decode(byte[] pkt, int off, int len) {
        final int end = off + len;
        final int u = off + SpacePacketHeader.OCTETS + CucTime.OCTETS;
        if (len < u - off + 1) {
            return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "packet of " + len + " octets");
        }
        int apid = SpacePacketHeader.apid(pkt, off);
        if (!isSpectrumApid(apid)) {
            return SpectrumResult.fail(SpectrumError.NOT_A_SPECTRUM, "APID " + Integer.toHexString(apid));
        }
        if (!SpacePacketHeader.secondaryHeaderFlag(pkt, off)) {
            return SpectrumResult.fail(SpectrumError.NO_SECONDARY_HEADER, "");
        }
        int fixed = SpectrumHeader.octetsOf(pkt[u] & 0xFF);
        if (fixed < 0) {
            return SpectrumResult.fail(SpectrumError.UNKNOWN_LAYOUT,
                    String.format("first octet 0x%02X", pkt[u] & 0xFF));
        }
        if (end - u < fixed) {
            return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "packet of " + len + " octets");
        }
        SpectrumHeader h = SpectrumHeader.read(pkt, u);
        GroundInstrument instrument = h.layout() == 1 ? instruments.layoutOne() : instruments.byId(h.instrumentId());
        if (instrument == null) {
            return SpectrumResult.fail(SpectrumError.UNKNOWN_INSTRUMENT, h.layout() == 1
                    ? "layout 1 is the demo cup's and the ground has no demo-cup description (it has "
                            + instruments.labels() + ")"
                    : "instrument id " + h.instrumentId() + ": no description (the ground has "
                            + instruments.labels() + ")");
        }
        if (h.sampleBits() != instrument.sampleBits()) {
            return SpectrumResult.fail(SpectrumError.SAMPLE_WIDTH_MISMATCH, "instrument " + instrument.label()
                    + ": samples of " + h.sampleBits() + " bits, its description's ADC has " + instrument.sampleBits());
        }
        if (h.mode() != (apid == APID_SURVEY ? DecodedSpectrum.MODE_SURVEY : DecodedSpectrum.MODE_FOCUS)) {
            return SpectrumResult.fail(SpectrumError.BAD_MODE, "mode " + h.mode() + " on APID "
                    + Integer.toHexString(apid));
        }
        if (h.windowCount() < 1 || h.windowCount() > MAX_WINDOWS) {
            return SpectrumResult.fail(SpectrumError.BAD_WINDOW_COUNT, "c = " + h.windowCount());
        }
        return body(pkt, off, end, u + h.octets(), h, instrument);
    }

    /** The tags, flags and quadrant streams from {@code p} to the packet's {@code end}. */
    private SpectrumResult body(byte[] pkt, int off, int end, int p, SpectrumHeader h, GroundInstrument instrument) {
        int c = h.windowCount();
        int gainOctets = (c + 3) / 4;
        int satOctets = (c + 7) / 8;
        if (end - p < gainOctets + satOctets + 1) {
            return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "tags of " + c + " windows");
        }
        int[] gain = new int[c];
        boolean[] sat = new boolean[c];
        for (int i = 0; i < c; i++) {
            gain[i] = (pkt[p + i / 4] >>> (6 - 2 * (i % 4))) & 3;
            if (!instrument.gains().hasRange(gain[i])) {
                return SpectrumResult.fail(SpectrumError.BAD_GAIN_RANGE, "window " + (h.firstWindow() + i) + " tag "
                        + gain[i] + ": " + instrument.label() + " has ranges 0.." + (instrument.gains().ranges() - 1));
            }
            sat[i] = ((pkt[p + gainOctets + i / 8] >>> (7 - i % 8)) & 1) != 0;
        }
        p += gainOctets + satOctets;
        int compression = pkt[p++] & 0xFF;
        QuadrantDecompressor qd;
        if (compression == COMPRESSION_RAW) {
            qd = RawQuadrantDecoder.INSTANCE;
        } else if (compression == COMPRESSION_CCSDS121) {
            qd = ccsds121;
        } else {
            return SpectrumResult.fail(SpectrumError.UNKNOWN_COMPRESSION, "0x" + Integer.toHexString(compression));
        }
        int[][] adc = new int[DecodedSpectrum.QUADRANTS][];
        for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
            if (end - p < 2) {
                return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "Lq of quadrant " + (q + 1));
            }
            int lq = BigEndian.u16(pkt, p);
            p += 2;
            if (end - p < lq) {
                return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA,
                        "quadrant " + (q + 1) + " Lq " + lq + " > " + (end - p) + " left");
            }
            int got = qd.decode(pkt, p, lq, c, h.sampleBits(), scratch);
            if (got != c) {
                return SpectrumResult.fail(quadrantError(got), "quadrant " + (q + 1) + " returned " + got);
            }
            adc[q] = Arrays.copyOf(scratch, c);
            p += lq;
        }
        if (p != end) {
            return SpectrumResult.fail(SpectrumError.TRAILING_OCTETS, (end - p) + " octets");
        }
        return SpectrumResult.ok(build(CucTime.read(pkt, off + SpacePacketHeader.OCTETS),
                SpacePacketHeader.apid(pkt, off), SpacePacketHeader.sequenceCount(pkt, off), h, instrument, compression,
                gain, sat, adc));
    }

    /** The spectrum error of a quadrant decoder's error code. */
    private static SpectrumError quadrantError(int code) {
        return switch (code) {
            case QuadrantDecompressor.ERROR_UNAVAILABLE -> SpectrumError.DECOMPRESSOR_UNAVAILABLE;
            case QuadrantDecompressor.ERROR_UNUSED_OCTETS -> SpectrumError.UNUSED_OCTETS;
            default -> SpectrumError.DECOMPRESSION_FAILED;
        };
    }

    private DecodedSpectrum build(CucTime time, int apid, int seq, SpectrumHeader h, GroundInstrument instrument,
            int compression, int[] gain, boolean[] sat, int[][] adc) {
        int c = h.windowCount();
        double[][] amps = new double[DecodedSpectrum.QUADRANTS][c];
        double[] total = new double[c];
        double[] low = new double[c];
        double[] high = new double[c];
        double[] lsb = new double[instrument.gains().ranges()];
        for (int r = 0; r < lsb.length; r++) {
            lsb[r] = instrument.lsbAmps(r); // GroundInstrument.amps, one LSB per range and spectrum
        }
        int pedestal = instrument.adc().pedestalCounts();
        for (int i = 0; i < c; i++) {
            double sum = 0;
            for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
                double a = (adc[q][i] - pedestal) * lsb[gain[i]];
                amps[q][i] = a;
                sum += a;
            }
            total[i] = sum;
        }
        windows.edges(instrument, h.tableId(), h.firstWindow(), c, low, high);
        return new DecodedSpectrum(time, apid, seq, h.mode(), h.steppedDown(), h.tableChanged(), h.sweep(),
                h.tableId(), h.firstWindow(), c, h.peakQ8(), h.integrationPeriods(), compression, gain, sat, adc, amps,
                total, low, high, h.layout(), instrument);
    }
}
