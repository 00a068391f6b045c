package dev.sweepline.ground.spectrum;

import dev.sweepline.ground.frame.BigEndian;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.SpacePacketHeader;
import java.util.Arrays;

/**
 * Decodes a spectrum packet (APIDs 0x100, 0x101) per ICD §4, layout 2, its support-dwell form layout 3
 * (the support windows and their dwell after the fixed fields), or layout 1 ({@link SpectrumHeader} gives
 * the fixed fields of all three). After the fixed fields:
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
 * instrument's description. {@link #decodeInto} fills a reused {@link SpectrumView} and allocates nothing
 * on success; {@link #decode} returns an owned {@link DecodedSpectrum}. Not thread-safe.
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
    /** The view {@link #decode} fills before copying it; made on its first call. */
    private SpectrumView own;
    private String detail = "";
    /** The fixed fields of the packet being decoded, read in place. */
    private final SpectrumHeader header = new SpectrumHeader();
    /**
     * The LSB of each gain tag of the spectrum being decoded, amperes (NaN for a range its instrument has
     * not): one per value of the 2-bit tag (ICD §4).
     */
    private final double[] lsbByRange = new double[1 << 2];

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
        if (own == null) {
            own = new SpectrumView();
        }
        SpectrumError e = decodeInto(pkt, off, len, own);
        return e == null ? SpectrumResult.ok(own.toDecoded()) : SpectrumResult.fail(e, detail);
    }

    /** What was wrong with the last packet {@link #decodeInto} refused, for listings. */
    public String lastDetail() {
        return detail;
    }

    /**
     * Decodes the whole packet (primary header first) of {@code len} octets at {@code off} into {@code v}.
     *
     * @return null on success ({@code v} then holds the spectrum), else the error ({@link #lastDetail()}
     *         says more; {@code v} is then partly overwritten)
     */
    public SpectrumError decodeInto(byte[] pkt, int off, int len, SpectrumView v) {
        final int end = off + len;
        final int u = off + SpacePacketHeader.OCTETS + CucTime.OCTETS;
        if (len < u - off + 1) {
            return fail(SpectrumError.LENGTH_BEYOND_DATA, "packet of " + len + " octets");
        }
        int apid = SpacePacketHeader.apid(pkt, off);
        if (!isSpectrumApid(apid)) {
            return fail(SpectrumError.NOT_A_SPECTRUM, "APID " + Integer.toHexString(apid));
        }
        if (!SpacePacketHeader.secondaryHeaderFlag(pkt, off)) {
            return fail(SpectrumError.NO_SECONDARY_HEADER, "");
        }
        int fixed = SpectrumHeader.octetsOf(pkt[u] & 0xFF);
        if (fixed < 0) {
            return fail(SpectrumError.UNKNOWN_LAYOUT, String.format("first octet 0x%02X", pkt[u] & 0xFF));
        }
        if (end - u < fixed) {
            return fail(SpectrumError.LENGTH_BEYOND_DATA, "packet of " + len + " octets");
        }
        SpectrumHeader h = header.wrap(pkt, u);
        GroundInstrument instrument = h.layout() == 1 ? instruments.layoutOne() : instruments.byId(h.instrumentId());
        if (instrument == null) {
            return fail(SpectrumError.UNKNOWN_INSTRUMENT, h.layout() == 1
                    ? "layout 1 is the demo cup's and the ground has no demo-cup description (it has "
                            + instruments.labels() + ")"
                    : "instrument id " + h.instrumentId() + ": no description (the ground has "
                            + instruments.labels() + ")");
        }
        if (h.sampleBits() != instrument.sampleBits()) {
            return fail(SpectrumError.SAMPLE_WIDTH_MISMATCH, "instrument " + instrument.label()
                    + ": samples of " + h.sampleBits() + " bits, its description's ADC has " + instrument.sampleBits());
        }
        if (h.mode() != (apid == APID_SURVEY ? DecodedSpectrum.MODE_SURVEY : DecodedSpectrum.MODE_FOCUS)) {
            return fail(SpectrumError.BAD_MODE, "mode " + h.mode() + " on APID " + Integer.toHexString(apid));
        }
        if (h.windowCount() < 1 || h.windowCount() > MAX_WINDOWS) {
            return fail(SpectrumError.BAD_WINDOW_COUNT, "c = " + h.windowCount());
        }
        if (h.layout() == 3 && (h.supportCount() < 1 || h.supportCount() > SpectrumHeader.MAX_SUPPORT_WINDOWS)) {
            return fail(SpectrumError.BAD_SUPPORT_WINDOWS, "b = " + h.supportCount() + ", not 1.."
                    + SpectrumHeader.MAX_SUPPORT_WINDOWS);
        }
        if (end - u < h.octets()) {
            return fail(SpectrumError.LENGTH_BEYOND_DATA, "support windows of a packet of " + len + " octets");
        }
        if (h.integrationPeriods() < 1 && h.layout() == 3) {
            return fail(SpectrumError.BAD_SUPPORT_WINDOWS, "floor dwell of 0 periods");
        }
        if (h.integrationPeriods() < 1 || h.integrationPeriods() > SpectrumHeader.MAX_DWELL_PERIODS) {
            return fail(SpectrumError.BAD_DWELL, "integration periods " + h.integrationPeriods() + ", not 1.."
                    + SpectrumHeader.MAX_DWELL_PERIODS);
        }
        if (h.interleaved() && h.mode() == DecodedSpectrum.MODE_SURVEY) {
            return fail(SpectrumError.BAD_FLAGS, String.format("flags 0x%02X: interleaved order (bit 5) on a survey"
                    + " spectrum (focus sweeps only)", h.flags()));
        }
        Arrays.fill(v.windowPeriods, 0, h.windowCount(), h.integrationPeriods());
        for (int k = 0, previous = -1; k < h.supportCount(); k++) {
            int at = h.supportOffset(k);
            if (at <= previous || at >= h.windowCount()) {
                return fail(SpectrumError.BAD_SUPPORT_WINDOWS, "support window " + (k + 1) + " at offset " + at
                        + (at >= h.windowCount() ? " beyond c = " + h.windowCount() : " not above " + previous));
            }
            if (h.supportPeriods(k) < 1 || h.supportPeriods(k) > SpectrumHeader.MAX_DWELL_PERIODS) {
                return fail(SpectrumError.BAD_SUPPORT_WINDOWS, "support window " + (k + 1) + " of "
                        + h.supportPeriods(k) + " periods, not 1.." + SpectrumHeader.MAX_DWELL_PERIODS);
            }
            v.windowPeriods[at] = h.supportPeriods(k);
            previous = at;
        }
        v.apid = apid;
        v.sequenceCount = SpacePacketHeader.sequenceCount(pkt, off);
        v.coarseSeconds = BigEndian.u32(pkt, off + SpacePacketHeader.OCTETS);
        v.fine = BigEndian.u16(pkt, off + SpacePacketHeader.OCTETS + 4);
        v.layoutVersion = h.layout();
        v.mode = h.mode();
        v.flags = h.flags();
        v.sweep = h.sweep();
        v.tableId = h.tableId();
        v.firstWindow = h.firstWindow();
        v.windowCount = h.windowCount();
        v.peakQ8 = h.peakQ8();
        v.integrationPeriods = h.integrationPeriods();
        v.instrument = instrument;
        return body(pkt, end, u + h.octets(), h.sampleBits(), v);
    }

    private SpectrumError fail(SpectrumError e, String why) {
        detail = why;
        return e;
    }

    /** The tags, flags and quadrant streams from {@code p} to the packet's {@code end}. */
    private SpectrumError body(byte[] pkt, int end, int p, int sampleBits, SpectrumView v) {
        int c = v.windowCount;
        GroundInstrument instrument = v.instrument;
        int gainOctets = (c + 3) / 4;
        int satOctets = (c + 7) / 8;
        if (end - p < gainOctets + satOctets + 1) {
            return fail(SpectrumError.LENGTH_BEYOND_DATA, "tags of " + c + " windows");
        }
        int[] gain = v.gainRange;
        boolean[] sat = v.saturated;
        for (int i = 0; i < c; i++) {
            gain[i] = (pkt[p + i / 4] >>> (6 - 2 * (i % 4))) & 3;
            if (!instrument.gains().hasRange(gain[i])) {
                return fail(SpectrumError.BAD_GAIN_RANGE, "window " + (v.firstWindow + i) + " tag "
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
            return fail(SpectrumError.UNKNOWN_COMPRESSION, "0x" + Integer.toHexString(compression));
        }
        v.compression = compression;
        for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
            if (end - p < 2) {
                return fail(SpectrumError.LENGTH_BEYOND_DATA, "Lq of quadrant " + (q + 1));
            }
            int lq = BigEndian.u16(pkt, p);
            p += 2;
            if (end - p < lq) {
                return fail(SpectrumError.LENGTH_BEYOND_DATA,
                        "quadrant " + (q + 1) + " Lq " + lq + " > " + (end - p) + " left");
            }
            int got = qd.decode(pkt, p, lq, c, sampleBits, v.adcCounts[q]);
            if (got != c) {
                return fail(quadrantError(got), "quadrant " + (q + 1) + " returned " + got);
            }
            p += lq;
        }
        if (p != end) {
            return fail(SpectrumError.TRAILING_OCTETS, (end - p) + " octets");
        }
        currents(v);
        windows.edges(instrument, v.tableId, v.firstWindow, c, v.lowVolts, v.highVolts);
        return null;
    }

    /** The error of a quadrant decoder's error code. */
    private static SpectrumError quadrantError(int code) {
        return switch (code) {
            case QuadrantDecompressor.ERROR_UNAVAILABLE -> SpectrumError.DECOMPRESSOR_UNAVAILABLE;
            case QuadrantDecompressor.ERROR_UNUSED_OCTETS -> SpectrumError.UNUSED_OCTETS;
            default -> SpectrumError.DECOMPRESSION_FAILED;
        };
    }

    /** Quadrant and total currents from the ADC samples: (count − pedestal) × the LSB of the window's range. */
    private void currents(SpectrumView v) {
        GroundInstrument instrument = v.instrument;
        int pedestal = instrument.adc().pedestalCounts();
        int[] gain = v.gainRange;
        int[][] adc = v.adcCounts;
        double[][] amps = v.currentAmps;
        // GroundInstrument.amps: one LSB per range, looked up once per spectrum and then by the window's tag
        // (an index rather than a branch on it: tags change from window to window)
        double[] lsb = lsbByRange;
        for (int r = 0; r < lsb.length; r++) {
            lsb[r] = instrument.gains().hasRange(r) ? instrument.lsbAmps(r) : Double.NaN;
        }
        for (int i = 0, c = v.windowCount; i < c; i++) {
            double l = lsb[gain[i]];
            double a0 = (adc[0][i] - pedestal) * l;
            double a1 = (adc[1][i] - pedestal) * l;
            double a2 = (adc[2][i] - pedestal) * l;
            double a3 = (adc[3][i] - pedestal) * l;
            amps[0][i] = a0;
            amps[1][i] = a1;
            amps[2][i] = a2;
            amps[3][i] = a3;
            v.totalAmps[i] = a0 + a1 + a2 + a3;
        }
    }
}
