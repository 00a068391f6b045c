package dev.sweepline.fsw.science;

import dev.sweepline.fsw.compress.RiceEncoder;
import dev.sweepline.fsw.compress.RiceParameters;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.table.WindowTable;

/**
 * Writes the user data of a spectrum packet (telemetry ICD §4, layout version 2, or 3 when the sweep had
 * support windows, {@link SpectrumLayout}):
 * the header with the instrument's id and sample width w, gain tags (2 bits per window), saturation
 * flags (1 bit per window), then each quadrant's ADC samples of w bits, coded with CCSDS 121.0-B
 * (n = w, J = 8, x_max = 2^w − 1, one reference interval per quadrant stream) or raw (⌈w/8⌉ octets each).
 *
 * <p>Every buffer is sized at construction for {@link WindowTable#CAPACITY} windows; allocation-free
 * after it. Threading: one thread, the executive's.
 */
public final class SpectrumPacker {
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

    private static final int Q = InstrumentDescription.QUADRANTS;

    private final SpectrumLayout layout = new SpectrumLayout();
    private final RiceEncoder encoder;
    private final int[] samples = new int[WindowTable.CAPACITY];
    private final boolean compress;
    private final int instrumentId;
    private final int sampleBits;
    private final int sampleOctets;
    private final int sampleMask;

    /**
     * A packer for {@code instrument}'s samples (w = its ADC width) that codes the quadrants with
     * CCSDS 121 ({@code compress}, n = w) or sends them raw (⌈w/8⌉ octets each).
     */
    public SpectrumPacker(boolean compress, InstrumentDescription instrument) {
        this.compress = compress;
        this.instrumentId = instrument.id();
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
        return SpectrumLayout.HEADER_LENGTH + 1 + SpectrumLayout.SUPPORT_ENTRY_OCTETS * SpectrumLayout.MAX_SUPPORT_WINDOWS
                + SpectrumLayout.gainTagOctets(c) + SpectrumLayout.saturationOctets(c) + 1
                + Q * (2 + perQuadrant);
    }

    /**
     * Writes the user data of {@code s} at {@code offset}; {@code flags} may carry
     * {@link SpectrumLayout#FLAG_TABLE_CHANGED} (the descending and interleaved flags come from the spectrum).
     *
     * @return octets written
     */
    public int write(Spectrum s, int integrationPeriods, int tableId, int flags, byte[] out, int offset) {
        int c = s.count();
        int peak = s.peakValid() ? Math.min(s.peakWindowQ8(), SpectrumLayout.NO_PEAK - 1) : SpectrumLayout.NO_PEAK;
        layout.wrap(out, offset)
                .instrument(instrumentId, sampleBits)
                .modeAndFlags(s.mode().icdCode(),
                        (s.ascending() ? 0 : SpectrumLayout.FLAG_DESCENDING)
                                | (s.interleaved() ? SpectrumLayout.FLAG_INTERLEAVED : 0)
                                | (flags & SpectrumLayout.FLAG_TABLE_CHANGED))
                .sweep((int) s.sweepNumber(), tableId)
                .windows(s.firstWindow(), c, peak, integrationPeriods);
        if (s.supportCount() > 0) {
            layout.supportCount(s.supportCount());
            for (int k = 0; k < s.supportCount(); k++) {
                layout.supportWindow(k, s.supportEntry(k), s.supportPeriods(k));
            }
        }
        int p = layout.variablePartOffset();
        p = writeGainTags(s, out, p);
        p = writeSaturationFlags(s, out, p);
        out[p++] = (byte) (compress ? SpectrumLayout.COMPRESSION_RICE : SpectrumLayout.COMPRESSION_NONE);
        for (int q = 0; q < Q; q++) {
            p = writeQuadrant(s, q, out, p);
        }
        return p - offset;
    }

    private int writeQuadrant(Spectrum s, int q, byte[] out, int p) {
        int c = s.count();
        for (int i = 0; i < c; i++) {
            samples[i] = s.quadrant(i, q) & sampleMask;
        }
        int lengthAt = p;
        int at = p + 2;
        int n;
        if (compress) {
            n = encoder.encode(samples, 0, c, out, at);
            if (n < 0) {
                throw new IllegalStateException("packet buffer too small: status " + n);
            }
        } else {
            for (int i = 0; i < c; i++) {
                BigEndian.putN(out, at + sampleOctets * i, samples[i], sampleOctets);
            }
            n = sampleOctets * c;
        }
        BigEndian.put16(out, lengthAt, n);
        return at + n;
    }

    private static int writeGainTags(Spectrum s, byte[] out, int p) {
        int c = s.count();
        int octets = SpectrumLayout.gainTagOctets(c);
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
        int octets = SpectrumLayout.saturationOctets(c);
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
}
