package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.compress.RiceEncoder;
import dev.sweepline.fsw.compress.RiceParameters;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.table.WindowTable;

/**
 * Writes the user data of a spectrum packet (telemetry ICD §4): the sweep's header fields, gain tags
 * (2 bits per window), saturation flags (1 bit per window), then each quadrant's ADC samples coded
 * with CCSDS 121.0-B (n = 16, J = 8, one reference interval per quadrant stream).
 *
 * <pre>
 * mode(1) flags(1) sweep(2) tableId(2) first(2) count(2) peakQ8(2) periods(2)
 * gain tags ceil(c/4) | saturation ceil(c/8) | compression(1) | 4 x [ Lq(2) | Lq octets ]
 * </pre>
 *
 * Allocation-free after construction. Threading: one thread, the executive's.
 */
public final class SpectrumPacker {
    /** Compression id: CCSDS 121.0-B as the ICD specifies. */
    public static final int COMPRESSION_RICE = 0x01;
    /** Compression id: raw 16-bit samples. */
    public static final int COMPRESSION_NONE = 0x00;
    /**
     * CCSDS 121 block size J of the ICD: 8, because spectra change fast along the sweep (a peak, gain
     * switches); on simulated spectra J = 8 codes 12.5 bits/sample against 13.2 for J = 16 (hw-sim
     * CompressionStudy).
     */
    public static final int BLOCK_SIZE = 8;
    /**
     * CCSDS 121 reference-interval padding of the ICD (§4): off. Each quadrant stream is a single
     * reference sample interval, whose end is the stream's end, zero-filled to an octet anyway.
     */
    public static final boolean PAD_INTERVALS_TO_OCTET = false;
    /** Octets of the fixed header of the user data. */
    public static final int HEADER_LENGTH = 14;
    /** Flag bit: the sweep stepped downward. */
    public static final int FLAG_DESCENDING = 0x80;
    /** Flag bit: a new table took effect with this sweep. */
    public static final int FLAG_TABLE_CHANGED = 0x40;
    /** Peak field value when the sweep held no valid peak. */
    public static final int NO_PEAK = 0xFFFF;

    private static final int Q = InstrumentDescription.QUADRANTS;

    private final RiceEncoder encoder;
    private final int[] samples = new int[WindowTable.CAPACITY];
    private final boolean compress;
    private final int sampleBits;
    private final int sampleOctets;
    private final int sampleMask;

    /**
     * A packer for {@code instrument}'s samples (w = its ADC width) that codes the quadrants with
     * CCSDS 121 ({@code compress}, n = w) or sends them raw (⌈w/8⌉ octets each).
     */
    public SpectrumPacker(boolean compress, InstrumentDescription instrument) {
        this.compress = compress;
        this.sampleBits = instrument.adcBits();
        this.sampleOctets = instrument.sampleOctets();
        this.sampleMask = instrument.adcTopCode();
        int blocks = (WindowTable.CAPACITY + BLOCK_SIZE - 1) / BLOCK_SIZE;
        this.encoder = new RiceEncoder(RiceParameters.of(sampleBits, BLOCK_SIZE, blocks, true, false,
                PAD_INTERVALS_TO_OCTET), WindowTable.CAPACITY);
    }

    /** Largest user data this packer writes for a full-capacity spectrum. */
    public int maxUserDataLength() {
        int c = WindowTable.CAPACITY;
        int perQuadrant = (int) Math.max(encoder.maxEncodedBytes(c), (long) sampleOctets * c);
        return HEADER_LENGTH + (c + 3) / 4 + (c + 7) / 8 + 1 + Q * (2 + perQuadrant);
    }

    /**
     * Writes the user data of {@code s} at {@code offset}.
     *
     * @return octets written
     */
    public int write(Spectrum s, int integrationPeriods, int tableId, int flags, byte[] out, int offset) {
        int c = s.count();
        int p = offset;
        out[p++] = (byte) (s.mode() == SweepMode.FOCUS ? 2 : 1);
        out[p++] = (byte) ((s.ascending() ? 0 : FLAG_DESCENDING) | (flags & FLAG_TABLE_CHANGED));
        p = put16(out, p, (int) s.sweepNumber());
        p = put16(out, p, tableId);
        p = put16(out, p, s.firstWindow());
        p = put16(out, p, c);
        p = put16(out, p, s.peakValid() ? Math.min(s.peakWindowQ8(), NO_PEAK - 1) : NO_PEAK);
        p = put16(out, p, integrationPeriods);
        p = writeGainTags(s, out, p);
        p = writeSaturationFlags(s, out, p);
        out[p++] = (byte) (compress ? COMPRESSION_RICE : COMPRESSION_NONE);
        for (int q = 0; q < Q; q++) {
            for (int i = 0; i < c; i++) {
                samples[i] = s.quadrant(i, q) & sampleMask;
            }
            int lengthAt = p;
            p += 2;
            int n;
            if (compress) {
                n = encoder.encode(samples, 0, c, out, p);
                if (n < 0) {
                    throw new IllegalStateException("packet buffer too small: status " + n);
                }
            } else {
                for (int i = 0; i < c; i++) {
                    BigEndian.putN(out, p + sampleOctets * i, samples[i], sampleOctets);
                }
                n = sampleOctets * c;
            }
            put16(out, lengthAt, n);
            p += n;
        }
        return p - offset;
    }

    private static int writeGainTags(Spectrum s, byte[] out, int p) {
        int c = s.count();
        int octets = (c + 3) / 4;
        for (int k = 0; k < octets; k++) {
            out[p + k] = 0;
        }
        for (int i = 0; i < c; i++) {
            out[p + (i >> 2)] |= (byte) ((s.gainRange(i) & 3) << (6 - 2 * (i & 3)));
        }
        return p + octets;
    }

    private static int writeSaturationFlags(Spectrum s, byte[] out, int p) {
        int c = s.count();
        int octets = (c + 7) / 8;
        for (int k = 0; k < octets; k++) {
            out[p + k] = 0;
        }
        for (int i = 0; i < c; i++) {
            if ((s.status(i) & SampleReply.STATUS_SATURATED) != 0) {
                out[p + (i >> 3)] |= (byte) (0x80 >>> (i & 7));
            }
        }
        return p + octets;
    }

    static int put16(byte[] out, int p, int value) {
        return BigEndian.put16(out, p, value);
    }
}
