package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.SpacePacketHeader;

/**
 * Decodes a spectrum packet (APIDs 0x100, 0x101) per ICD §4. User data after the 6-octet CUC time, layout 1
 * below; layout 2 puts version 0x82, the instrument id (2) and the sample width (1) before it, and is read
 * for the demo cup (id 1, 16-bit samples) only:
 *
 * <pre>
 * off  octets  field
 *  0   1       mode (1 survey, 2 focus)
 *  1   1       flags: bit 7 stepped downward, bit 6 table changed
 *  2   2       sweep number
 *  4   2       table id
 *  6   2       first window f
 *  8   2       window count c (1..256)
 * 10   2       peak, window units Q8 (0xFFFF none)
 * 12   2       integration periods per window
 * 14   ⌈c/4⌉   gain-range tags, 2 bits per window, MSB first
 *  …   ⌈c/8⌉   saturation flags, 1 bit per window, MSB first
 *  …   1       compression 0x00 raw / 0x01 CCSDS 121
 *  …   4×(2+Lq) per quadrant: Lq then Lq octets of c samples
 * </pre>
 *
 * Not thread-safe (one scratch buffer per instance).
 */
public final class SpectrumPacketDecoder {
    /** APID of survey spectra (ICD §3.3). */
    public static final int APID_SURVEY = 0x100;
    /** APID of focus spectra (ICD §3.3). */
    public static final int APID_FOCUS = 0x101;
    /** Compression octet: raw 16-bit samples (ICD §4). */
    public static final int COMPRESSION_RAW = 0x00;
    /** Compression octet: CCSDS 121.0-B (ICD §4). */
    public static final int COMPRESSION_CCSDS121 = 0x01;
    /** Largest window count (ICD §4). */
    public static final int MAX_WINDOWS = 256;
    /** Fixed part of the user data before the gain tags, octets (ICD §4, layout 1). */
    static final int FIXED_OCTETS = 14;
    /** First octet of layout version 2 (ICD §4): bit 7 set, version 2. */
    static final int LAYOUT_VERSION_2 = 0x82;
    /** Octets layout 2 puts before the layout-1 fields: version, instrument id, sample width (ICD §4). */
    static final int LAYOUT_2_PREFIX_OCTETS = 4;
    /** The instrument this ground has a description of: the demo cup (ICD §4, §8; instruments/demo-cup.yaml id). */
    static final int DEMO_CUP_ID = 1;
    /** The demo cup's sample width, bits (ICD §4: w = 16 for the demo cup). */
    static final int DEMO_CUP_BITS = 16;

    private final QuadrantDecompressor ccsds121;
    private final WindowCatalogue windows;
    private final int[] scratch = new int[QuadrantDecompressor.paddedCount(MAX_WINDOWS)];

    /** @param ccsds121 decoder for compression 0x01 ({@link QuadrantDecompressor#UNAVAILABLE} if none) */
    public SpectrumPacketDecoder(QuadrantDecompressor ccsds121) {
        this(ccsds121, new WindowCatalogue());
    }

    /** A decoder that takes window edges from {@code windows} (built-in and registered uplinked tables). */
    public SpectrumPacketDecoder(QuadrantDecompressor ccsds121, WindowCatalogue windows) {
        this.ccsds121 = ccsds121;
        this.windows = windows;
    }

    /** True for the two spectrum APIDs. */
    public static boolean isSpectrumApid(int apid) {
        return apid == APID_SURVEY || apid == APID_FOCUS;
    }

    private static int u16(byte[] b, int i) {
        return ((b[i] & 0xFF) << 8) | (b[i + 1] & 0xFF);
    }

    /** Decodes the whole packet (primary header first) of {@code len} octets at {@code off}. */
    public SpectrumResult decode(byte[] pkt, int off, int len) {
        final int end = off + len;
        if (len < SpacePacketHeader.OCTETS + CucTime.OCTETS + FIXED_OCTETS) {
            return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "packet of " + len + " octets");
        }
        int apid = SpacePacketHeader.apid(pkt, off);
        if (!isSpectrumApid(apid)) {
            return SpectrumResult.fail(SpectrumError.NOT_A_SPECTRUM, "APID " + Integer.toHexString(apid));
        }
        if (!SpacePacketHeader.secondaryHeaderFlag(pkt, off)) {
            return SpectrumResult.fail(SpectrumError.NO_SECONDARY_HEADER, "");
        }
        CucTime time = CucTime.read(pkt, off + SpacePacketHeader.OCTETS);
        int u = off + SpacePacketHeader.OCTETS + CucTime.OCTETS;
        if ((pkt[u] & 0x80) != 0) {
            // ICD §4 layout 2: version 0x82, instrument id (2), sample width w (1), then the layout-1 fields
            int id = u16(pkt, u + 1);
            int width = pkt[u + 3] & 0xFF;
            if ((pkt[u] & 0xFF) != LAYOUT_VERSION_2 || id != DEMO_CUP_ID || width != DEMO_CUP_BITS) {
                return SpectrumResult.fail(SpectrumError.UNKNOWN_INSTRUMENT, "layout 0x" + Integer.toHexString(pkt[u] & 0xFF)
                        + ", instrument " + id + ", " + width + "-bit samples");
            }
            u += LAYOUT_2_PREFIX_OCTETS;
            if (end - u < FIXED_OCTETS) {
                return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "packet of " + len + " octets");
            }
        }
        int mode = pkt[u] & 0xFF;
        if (mode != (apid == APID_SURVEY ? DecodedSpectrum.MODE_SURVEY : DecodedSpectrum.MODE_FOCUS)) {
            return SpectrumResult.fail(SpectrumError.BAD_MODE, "mode " + mode + " on APID " + Integer.toHexString(apid));
        }
        int flags = pkt[u + 1] & 0xFF;
        int sweep = u16(pkt, u + 2);
        int tableId = u16(pkt, u + 4);
        int first = u16(pkt, u + 6);
        int c = u16(pkt, u + 8);
        int peak = u16(pkt, u + 10);
        int periods = u16(pkt, u + 12);
        if (c < 1 || c > MAX_WINDOWS) {
            return SpectrumResult.fail(SpectrumError.BAD_WINDOW_COUNT, "c = " + c);
        }
        int p = u + FIXED_OCTETS;
        int gainOctets = (c + 3) / 4;
        int satOctets = (c + 7) / 8;
        if (end - p < gainOctets + satOctets + 1) {
            return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA, "tags of " + c + " windows");
        }
        int[] gain = new int[c];
        boolean[] sat = new boolean[c];
        for (int i = 0; i < c; i++) {
            gain[i] = (pkt[p + i / 4] >>> (6 - 2 * (i % 4))) & 3;
            if (gain[i] > QuadrantCurrent.MAX_RANGE) {
                return SpectrumResult.fail(SpectrumError.BAD_GAIN_RANGE, "window " + (first + i));
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
            int lq = u16(pkt, p);
            p += 2;
            if (end - p < lq) {
                return SpectrumResult.fail(SpectrumError.LENGTH_BEYOND_DATA,
                        "quadrant " + (q + 1) + " Lq " + lq + " > " + (end - p) + " left");
            }
            int got = qd.decode(pkt, p, lq, c, scratch);
            if (got != c) {
                return SpectrumResult.fail(quadrantError(got), "quadrant " + (q + 1) + " returned " + got);
            }
            adc[q] = java.util.Arrays.copyOf(scratch, c);
            p += lq;
        }
        if (p != end) {
            return SpectrumResult.fail(SpectrumError.TRAILING_OCTETS, (end - p) + " octets");
        }
        return SpectrumResult.ok(build(time, apid, SpacePacketHeader.sequenceCount(pkt, off), mode, flags, sweep,
                tableId, first, c, peak, periods, compression, gain, sat, adc));
    }

    /** The spectrum error of a quadrant decoder's error code. */
    private static SpectrumError quadrantError(int code) {
        return switch (code) {
            case QuadrantDecompressor.ERROR_UNAVAILABLE -> SpectrumError.DECOMPRESSOR_UNAVAILABLE;
            case QuadrantDecompressor.ERROR_UNUSED_OCTETS -> SpectrumError.UNUSED_OCTETS;
            default -> SpectrumError.DECOMPRESSION_FAILED;
        };
    }

    private DecodedSpectrum build(CucTime time, int apid, int seq, int mode, int flags, int sweep,
            int tableId, int first, int c, int peak, int periods, int compression, int[] gain, boolean[] sat,
            int[][] adc) {
        double[][] amps = new double[DecodedSpectrum.QUADRANTS][c];
        double[] total = new double[c];
        double[] low = new double[c];
        double[] high = new double[c];
        for (int i = 0; i < c; i++) {
            double sum = 0;
            for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
                double a = QuadrantCurrent.amps(adc[q][i], gain[i]);
                amps[q][i] = a;
                sum += a;
            }
            total[i] = sum;
        }
        windows.edges(tableId, first, c, low, high);
        return new DecodedSpectrum(time, apid, seq, mode, (flags & 0x80) != 0, (flags & 0x40) != 0, sweep,
                tableId, first, c, peak, periods, compression, gain, sat, adc, amps, total, low, high);
    }
}
