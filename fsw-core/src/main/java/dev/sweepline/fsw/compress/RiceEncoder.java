package dev.sweepline.fsw.compress;

/**
 * The CCSDS 121.0-B lossless encoder (adaptive Rice coder) of the flight software: unit-delay
 * predictor and mapper, then per block the shortest of zero-block, second extension, fundamental
 * sequence, split-sample and no compression.
 *
 * <p>Each {@link #encode} call codes one self-contained stream: sample 0 starts a reference sample
 * interval, and the stream ends zero-filled to a byte. A last partial block is padded by repeating
 * the last sample (its mapped values are 0), so the decoder needs the sample count.
 *
 * <pre>
 *   stream  = interval interval ... interval fill
 *   interval = CDS CDS ... CDS [pad]        (r blocks; the last interval may be shorter)
 *   CDS     = ID [reference sample, n bits, first block of an interval] data
 *   zero run: ID 0 + '0' [ref] FS(m-1) for m = 1..4, FS(4) = rest of segment/interval, FS(m) for m &gt;= 5
 *   pad     = 0..7 zero bits to the next octet, only with {@link RiceParameters#padIntervalsToOctet()}
 *             (libaec "pad RSI"); after the last interval it coincides with the stream's fill
 * </pre>
 *
 * <p>All buffers are sized in the constructor; {@link #encode} allocates nothing, uses no floating
 * point and reports bad input as a negative status. Threading: one instance per thread.
 */
public final class RiceEncoder {
    /** {@link #encode} status: the output region is too small for the stream. */
    public static final int STATUS_OUTPUT_TOO_SMALL = -1;
    /** {@link #encode} status: more samples than the maximum given at construction. */
    public static final int STATUS_TOO_MANY_SAMPLES = -2;
    /** {@link #encode} status: offset or count outside the arrays. */
    public static final int STATUS_BAD_RANGE = -3;
    /** {@link #encode} status: a sample is larger than x_max = 2^n - 1. */
    public static final int STATUS_SAMPLE_OUT_OF_RANGE = -4;

    /** Zero-block FS value meaning "remainder of segment" (CCSDS 121.0-B, zero-block option). */
    private static final int ROS_FS_VALUE = 4;
    private static final long UNSIGNED_INT_MASK = 0xFFFF_FFFFL;

    private final RiceParameters parameters;
    private final int maxSamples;
    private final int bitsPerSample;
    private final int blockSize;
    private final int intervalBlocks;
    private final boolean preprocessed;
    private final boolean padIntervals;
    private final long maxSample;
    private final long[] mapped;
    private final BitWriter writer = new BitWriter();
    private final RiceBlockCoder blockCoder;

    private int zeroRunBlocks;
    private boolean zeroRunHasReference;
    private long zeroRunReference;

    /**
     * @param parameters the validated parameter set
     * @param maxSamples the largest sample count one {@link #encode} call may take (sizes the limits)
     */
    public RiceEncoder(RiceParameters parameters, int maxSamples) {
        if (maxSamples < 1) {
            throw new IllegalArgumentException("maxSamples must be positive: " + maxSamples);
        }
        this.parameters = parameters;
        this.maxSamples = maxSamples;
        this.bitsPerSample = parameters.bitsPerSample();
        this.blockSize = parameters.blockSize();
        this.intervalBlocks = parameters.referenceIntervalBlocks();
        this.preprocessed = parameters.preprocessed();
        this.padIntervals = parameters.padIntervalsToOctet();
        this.maxSample = parameters.maxSample();
        this.mapped = new long[blockSize];
        this.blockCoder = new RiceBlockCoder(parameters);
    }

    /** The parameter set this encoder was built with. */
    public RiceParameters parameters() {
        return parameters;
    }

    /**
     * Largest stream, in bytes, that {@code sampleCount} samples can give: every block with no
     * compression (no option chosen is longer, and a zero-block CDS is shorter for J &gt;= 8), plus
     * at most 7 fill bits per reference sample interval when intervals are padded, else at the end.
     */
    public long maxEncodedBytes(int sampleCount) {
        long blocks = (sampleCount + (long) blockSize - 1) / blockSize;
        long bits = blocks * (parameters.idBits() + (long) blockSize * bitsPerSample);
        long fillRuns = padIntervals ? (blocks + intervalBlocks - 1) / intervalBlocks : 1;
        return (bits + 7 * Math.max(1, fillRuns)) / 8;
    }

    /**
     * Encodes {@code samples[offset .. offset+count)}, unsigned n-bit values (for n = 32 the int's
     * bits are read as unsigned), into {@code out} from {@code outOffset}.
     *
     * @return bytes written, or a negative {@code STATUS_*}; {@code out} may be partly written on error
     */
    public int encode(int[] samples, int offset, int count, byte[] out, int outOffset) {
        if (count < 0 || offset < 0 || offset > samples.length - count
                || outOffset < 0 || outOffset > out.length) {
            return STATUS_BAD_RANGE;
        }
        if (count > maxSamples) {
            return STATUS_TOO_MANY_SAMPLES;
        }
        writer.wrap(out, outOffset, out.length - outOffset);
        zeroRunBlocks = 0;
        int blocks = (count + blockSize - 1) / blockSize;
        long previous = 0;
        for (int block = 0; block < blocks; block++) {
            int blockInInterval = block % intervalBlocks;
            boolean reference = preprocessed && blockInInterval == 0;
            int base = offset + block * blockSize;
            int end = offset + count;
            long refSample = 0;
            long anyBits = 0;
            for (int i = 0; i < blockSize; i++) {
                int index = Math.min(base + i, end - 1); // pad a partial block with the last sample
                long x = samples[index] & UNSIGNED_INT_MASK;
                if (x > maxSample) {
                    return STATUS_SAMPLE_OUT_OF_RANGE;
                }
                long d;
                if (!preprocessed) {
                    d = x;
                } else if (reference && i == 0) {
                    refSample = x;
                    d = 0;
                } else {
                    d = PredictionMapper.map(x, previous, maxSample);
                }
                previous = x;
                mapped[i] = d;
                anyBits |= d;
            }
            if (anyBits == 0) {
                addZeroBlock(reference, refSample, blockInInterval, block == blocks - 1);
            } else {
                if (zeroRunBlocks > 0) {
                    writeZeroRun(false);
                }
                blockCoder.encode(mapped, reference, refSample, writer);
            }
            if (padIntervals && blockInInterval + 1 == intervalBlocks) {
                // the interval's last CDS is written (a zero run is closed at an interval end):
                // zero-fill so that the next interval starts on an octet
                writer.padToOctet();
            }
        }
        int written = writer.finish();
        return written == BitWriter.OVERFLOW ? STATUS_OUTPUT_TOO_SMALL : written;
    }

    private void addZeroBlock(boolean reference, long refSample, int blockInInterval, boolean lastBlock) {
        if (zeroRunBlocks == 0) {
            zeroRunHasReference = reference;
            zeroRunReference = refSample;
        }
        zeroRunBlocks++;
        boolean segmentEnd = (blockInInterval + 1) % RiceParameters.SEGMENT_BLOCKS == 0;
        boolean intervalEnd = blockInInterval + 1 == intervalBlocks;
        if (segmentEnd || intervalEnd || lastBlock) {
            // a run is closed at a segment or interval end (standards.md); ROS says "to that end"
            writeZeroRun(zeroRunBlocks > ROS_FS_VALUE);
        }
    }

    private void writeZeroRun(boolean remainderOfSegment) {
        writer.writeBits(0, parameters.idBits() + 1);
        if (zeroRunHasReference) {
            writer.writeBits(zeroRunReference, bitsPerSample);
        }
        long fsValue;
        if (remainderOfSegment) {
            fsValue = ROS_FS_VALUE;
        } else if (zeroRunBlocks > ROS_FS_VALUE) {
            fsValue = zeroRunBlocks;
        } else {
            fsValue = zeroRunBlocks - 1;
        }
        writer.writeFundamentalSequence(fsValue);
        zeroRunBlocks = 0;
    }
}
