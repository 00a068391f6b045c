package dev.sweepline.ground.rice;

import java.util.Arrays;

/**
 * Ground decoder for CCSDS 121.0-B (adaptive Rice coder) streams, written from the standard and the
 * telemetry ICD: reads coded data sets (option ID, reference sample, data), expands zero-block runs,
 * undoes the unit-delay predictor and mapper, and writes unsigned samples (for n = 32 the int's
 * bits are the unsigned sample).
 *
 * <pre>
 *   ID (idBits)      meaning                    then
 *   0 + '0'          zero-block run             [ref] FS(v): v = 0..3 -&gt; v+1 blocks, 4 -&gt; rest of
 *                                               segment (64 blocks) or interval, v &gt;= 5 -&gt; v blocks
 *   0 + '1'          second extension           [ref] J/2 x FS(gamma); first pair of a reference block has a = 0
 *   1                fundamental sequence       [ref] FS(d) per sample
 *   k + 1            split-sample k             [ref] FS(d &gt;&gt; k) per sample, then the k LSBs per sample
 *   all ones         no compression             [ref] n bits per sample
 *
 *   padded intervals: after the last CDS of every r blocks, zero bits up to the next octet
 *   (checked to be zero); after the last CDS of the stream, whatever fill there is is not read
 * </pre>
 *
 * <p>Bad input never throws: {@link #decode} returns a {@link DecodeResult} with the reason and the
 * bit position. Threading: one decode at a time per instance.
 */
public final class RiceDecoder {
    private static final long ROS_CODE = 4;
    private static final long MAX_ZERO_RUN_FS = RiceSettings.SEGMENT_BLOCKS;

    private final RiceSettings settings;
    private final int n;
    private final int blockSize;
    private final int idBits;
    private final long maxSample;
    private final long allOnesId;
    private final long maxGamma;
    private final boolean padIntervals;
    private final boolean preprocessed;
    private final long[] mapped;

    private final BitReader reader = new BitReader(new byte[0], 0, 0);
    private int[] out;
    private int wanted;
    private int produced;
    private long previous;
    private DecodeStatus failure;
    private long failurePosition;
    private long endPosition;

    /** A decoder for streams coded with {@code settings}. */
    public RiceDecoder(RiceSettings settings) {
        this.settings = settings;
        this.n = settings.bitsPerSample();
        this.blockSize = settings.blockSize();
        this.idBits = settings.idBits();
        this.maxSample = settings.maxSample();
        this.allOnesId = (1L << idBits) - 1;
        this.maxGamma = SecondExtension.maxGamma(n);
        this.padIntervals = settings.padIntervalsToOctet();
        this.preprocessed = settings.preprocessed();
        this.mapped = new long[blockSize];
    }

    /** The settings this decoder reads. */
    public RiceSettings settings() {
        return settings;
    }

    /**
     * Decodes {@code sampleCount} samples from {@code in[offset .. offset+length)} into
     * {@code out[0 .. sampleCount)}. Fill bits after the last coded data set are ignored; with
     * padded intervals the fill between intervals must be zero ({@link DecodeStatus#INTERVAL_FILL_NOT_ZERO}).
     */
    public DecodeResult decode(byte[] in, int offset, int length, int sampleCount, int[] out) {
        DecodeStatus status = decodeInPlace(in, offset, length, sampleCount, out);
        return new DecodeResult(status, samplesDecoded(), bitPosition());
    }

    /**
     * As {@link #decode} without the result object: the status, with {@link #samplesDecoded()} and
     * {@link #bitPosition()} telling the rest until the next call. Allocates nothing.
     */
    public DecodeStatus decodeInPlace(byte[] in, int offset, int length, int sampleCount, int[] out) {
        if (in == null || out == null || offset < 0 || length < 0 || offset > in.length - length
                || sampleCount < 0 || sampleCount > out.length) {
            this.produced = 0;
            this.endPosition = 0;
            return DecodeStatus.BAD_ARGUMENTS;
        }
        reader.wrap(in, offset, length);
        this.out = out;
        this.wanted = sampleCount;
        this.produced = 0;
        this.previous = 0;
        this.failure = null;
        int blocks = (int) (((long) sampleCount + blockSize - 1) / blockSize);
        int block = 0;
        int intervalBlocks = settings.referenceIntervalBlocks();
        while (block < blocks && failure == null) {
            block += decodeCds(block, blocks - block);
            // a CDS never spans an interval end (zero runs stop there), so block lands on it exactly
            if (padIntervals && failure == null && block < blocks && block % intervalBlocks == 0) {
                skipIntervalFill();
            }
        }
        this.out = null;
        this.endPosition = failure == null ? reader.position() : failurePosition;
        return failure == null ? DecodeStatus.OK : failure;
    }

    /** Samples the last {@link #decodeInPlace} wrote. */
    public int samplesDecoded() {
        return produced;
    }

    /** Where the last {@link #decodeInPlace} stopped: after its last coded bit, or where it failed (bits). */
    public long bitPosition() {
        return endPosition;
    }

    /** Decodes one coded data set starting at {@code block}; returns the blocks it covered. */
    private int decodeCds(int block, int blocksLeft) {
        int intervalBlocks = settings.referenceIntervalBlocks();
        // the ICD's streams lie within their first interval: no division there (an int division per block)
        int inInterval = block < intervalBlocks ? block : block % intervalBlocks;
        boolean reference = preprocessed && inInterval == 0;
        long idPosition = reader.position();
        long id = reader.read(idBits);
        if (id < 0) {
            return fail(DecodeStatus.TRUNCATED, idPosition);
        }
        if (id == 0) {
            long extension = reader.read(1);
            if (extension < 0) {
                return fail(DecodeStatus.TRUNCATED, idPosition);
            }
            long refSample = reference ? readReference() : 0;
            if (failure != null) {
                return 0;
            }
            if (extension == 0) {
                int remaining = Math.min(RiceSettings.SEGMENT_BLOCKS - inInterval % RiceSettings.SEGMENT_BLOCKS,
                        intervalBlocks - inInterval);
                return zeroRun(reference, refSample, remaining, blocksLeft);
            }
            return secondExtension(reference, refSample) ? 1 : 0;
        }
        if (id == allOnesId) {
            long refSample = reference ? readReference() : 0;
            return failure == null && noCompression(reference, refSample) ? 1 : 0;
        }
        int k = (int) id - 1;
        if (k >= n) {
            return fail(DecodeStatus.INVALID_OPTION_ID, idPosition);
        }
        long refSample = reference ? readReference() : 0;
        return failure == null && split(reference, refSample, k) ? 1 : 0;
    }

    /** Skips the zero fill that ends a padded reference sample interval; a one bit in it is a fault. */
    private void skipIntervalFill() {
        long position = reader.position();
        if (reader.skipToOctet() != 0) {
            fail(DecodeStatus.INTERVAL_FILL_NOT_ZERO, position);
        }
    }

    private long readReference() {
        long position = reader.position();
        long value = reader.read(n);
        if (value < 0) {
            fail(DecodeStatus.TRUNCATED, position);
        }
        return value;
    }

    private int zeroRun(boolean reference, long refSample, int remaining, int blocksLeft) {
        long position = reader.position();
        long code = reader.readFundamentalSequence(MAX_ZERO_RUN_FS);
        if (code == BitReader.TRUNCATED) {
            return fail(DecodeStatus.TRUNCATED, position);
        }
        if (code == BitReader.TOO_LONG) {
            return fail(DecodeStatus.FS_TOO_LONG, position);
        }
        long runBlocks;
        if (code == ROS_CODE) {
            runBlocks = remaining;
        } else {
            runBlocks = code < ROS_CODE ? code + 1 : code;
            if (runBlocks > remaining) {
                return fail(DecodeStatus.ZERO_RUN_BEYOND_SEGMENT, position);
            }
        }
        // a run may reach past the last data block only into padding the encoder added; clip it
        int blocks = (int) Math.min(runBlocks, blocksLeft);
        Arrays.fill(mapped, 0);
        for (int b = 0; b < blocks; b++) {
            emitBlock(reference && b == 0, refSample, position);
        }
        return blocks;
    }

    private boolean secondExtension(boolean reference, long refSample) {
        for (int i = 0; i < blockSize; i += 2) {
            long position = reader.position();
            long gamma = reader.readFundamentalSequence(maxGamma);
            if (gamma < 0) {
                fail(gamma == BitReader.TRUNCATED ? DecodeStatus.TRUNCATED : DecodeStatus.FS_TOO_LONG, position);
                return false;
            }
            long sum = SecondExtension.pairSum(gamma);
            long second = gamma - SecondExtension.triangle(sum);
            long first = sum - second;
            if (reference && i == 0 && first != 0) {
                fail(DecodeStatus.VALUE_OUT_OF_RANGE, position); // the reference slot is coded as 0
                return false;
            }
            mapped[i] = first;
            mapped[i + 1] = second;
        }
        return emitBlock(reference, refSample, reader.position());
    }

    private boolean noCompression(boolean reference, long refSample) {
        for (int i = reference ? 1 : 0; i < blockSize; i++) {
            long position = reader.position();
            long value = reader.read(n);
            if (value < 0) {
                fail(DecodeStatus.TRUNCATED, position);
                return false;
            }
            mapped[i] = value;
        }
        return emitBlock(reference, refSample, reader.position());
    }

    private boolean split(boolean reference, long refSample, int k) {
        int first = reference ? 1 : 0;
        long maxHigh = maxSample >>> k;
        if (reader.readSplitBlock(mapped, first, blockSize, k, maxHigh)) {
            return emitBlock(reference, refSample, reader.position());
        }
        // field by field: the block has an error (or a codeword too long for one load); find it exactly
        for (int i = first; i < blockSize; i++) {
            long position = reader.position();
            long high = reader.readFundamentalSequence(maxHigh);
            if (high < 0) {
                fail(high == BitReader.TRUNCATED ? DecodeStatus.TRUNCATED : DecodeStatus.FS_TOO_LONG, position);
                return false;
            }
            mapped[i] = high << k;
        }
        if (k > 0) {
            for (int i = first; i < blockSize; i++) {
                long position = reader.position();
                long low = reader.read(k);
                if (low < 0) {
                    fail(DecodeStatus.TRUNCATED, position);
                    return false;
                }
                mapped[i] |= low;
            }
        }
        return emitBlock(reference, refSample, reader.position());
    }

    /**
     * Turns the block's mapped values into samples; writes those the caller asked for. On a value no
     * sample can give, the samples before it stay written and counted.
     */
    private boolean emitBlock(boolean reference, long refSample, long position) {
        final long[] m = mapped;
        final int[] o = out;
        final long top = maxSample;
        // samples of this block the caller wants: the last block may carry the encoder's padding
        final int wantedHere = Math.min(blockSize, wanted - produced);
        int written = produced;
        long prev = previous;
        int i = 0;
        if (reference) {
            prev = refSample;
            if (wantedHere > 0) {
                o[written++] = (int) refSample;
            }
            i = 1;
        }
        for (; i < blockSize; i++) {
            long x = preprocessed ? UnitDelayReconstructor.sample(m[i], prev, top)
                    : m[i] <= top ? m[i] : UnitDelayReconstructor.INVALID;
            if (x < 0) {
                previous = prev;
                produced = written;
                fail(DecodeStatus.VALUE_OUT_OF_RANGE, position);
                return false;
            }
            prev = x;
            if (i < wantedHere) {
                o[written++] = (int) x;
            }
        }
        previous = prev;
        produced = written;
        return true;
    }

    private int fail(DecodeStatus status, long position) {
        if (failure == null) {
            failure = status;
            failurePosition = position;
        }
        return 0;
    }
}
