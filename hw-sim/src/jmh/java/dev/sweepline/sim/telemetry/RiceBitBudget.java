package dev.sweepline.sim.telemetry;

import java.util.HashMap;
import java.util.Map;

/**
 * Where the bits of a CCSDS 121.0-B stream go, written from the standard (standards.md "CCSDS 121.0-B";
 * CCSDS 121.0-B-3 §3 coder options, §4 preprocessor, §5 coded data set and reference sample interval
 * [memory for the section numbers]) and not from fsw-core's encoder, so that the two can be checked
 * against each other. For every block it takes the shortest coded data set among all the standard's
 * options of the basic set for n = 16 (zero-block runs, second extension, fundamental sequence, split-sample
 * k = 1..13, no compression; ID included), trying every k rather than searching: an oracle of the
 * per-block choice for one configuration (J, r). Ties are broken as fsw-core does (no compression, then
 * second extension, then the smallest k), which changes which class a block counts in, never its length.
 *
 * <p>Each stream's bits are split, exactly, into
 * <pre>
 *   total = option IDs (4 bits, +1 for zero-block and second extension)
 *         + reference samples (16 bits each)
 *         + data of the real residuals          (the chosen option's codewords for the stream's samples)
 *         + data of the padding samples          (a last partial block is padded with its last sample,
 *                                                 mapped value 0; pairs all padding in second extension)
 *         + zero-block run codewords             (the FS(m) after the zero-block ID)
 *         + fill                                 (0..7 zero bits to the stream's last octet)
 * </pre>
 * and the real residuals are counted per option class (each k, second extension, no compression) so that
 * {@link #conditionalIdealBits()} can give what an ideal code per class would take for the same blocks.
 * Accumulates over many streams; not thread-safe.
 */
public final class RiceBitBudget {
    /** n, bits per sample of the study's samples (16-bit ADC, telemetry ICD §4). */
    static final int BITS = 16;
    /** Option-ID width of the basic set for 8 &lt; n &lt;= 16 (standards.md). */
    static final int ID_BITS = 4;
    /** Largest split position the ID space holds for a 4-bit ID: IDs 1..14 are k = 0..13 (standards.md). */
    static final int MAX_K = 13;
    /** Blocks per zero-block segment (standards.md, CCSDS 121.0-B). */
    static final int SEGMENT_BLOCKS = 64;
    /** FS value standing for "remainder of segment" (standards.md). */
    static final int ROS = 4;

    /** Option class of a block coded with second extension (classes 0..13 are split k, 0 the FS option). */
    static final int CLASS_SECOND_EXTENSION = MAX_K + 1;
    /** Option class of a block sent with no compression. */
    static final int CLASS_NO_COMPRESSION = MAX_K + 2;
    /** Option classes: split k = 0..13, second extension, no compression. */
    static final int CLASSES = MAX_K + 3;
    private static final int X_MAX = (1 << BITS) - 1;

    private final int blockSize;
    private final int intervalBlocks;
    private final long[] mapped;
    private final boolean[] real;

    private final long[][] classHistogram = new long[CLASSES][];
    private final Map<Long, Long> secondExtensionPairs = new HashMap<>();
    private final long[] blocksPerClass = new long[CLASSES];
    private final long[] dataBitsPerClass = new long[CLASSES];

    private long streams;
    private long samples;
    private long residuals;
    private long idBits;
    private long referenceBits;
    private long residualDataBits;
    private long paddingDataBits;
    private long zeroRunBits;
    private long zeroBlocks;
    private long fillBits;
    private long lastStreamOctets;

    private int zeroRun;
    private boolean zeroRunHasReference;

    /**
     * @param blockSize      J, one of 8, 16, 32, 64
     * @param intervalBlocks r, blocks per reference sample interval
     */
    public RiceBitBudget(int blockSize, int intervalBlocks) {
        if (blockSize != 8 && blockSize != 16 && blockSize != 32 && blockSize != 64) {
            throw new IllegalArgumentException("block size J must be 8, 16, 32 or 64: " + blockSize);
        }
        if (intervalBlocks < 1 || intervalBlocks > 4096) {
            throw new IllegalArgumentException("reference interval r must be 1..4096 blocks: " + intervalBlocks);
        }
        this.blockSize = blockSize;
        this.intervalBlocks = intervalBlocks;
        this.mapped = new long[blockSize];
        this.real = new boolean[blockSize];
    }

    /** Adds one self-contained stream (sample 0 is a reference, zero-filled to an octet); returns its octets. */
    public long add(int[] stream) {
        if (stream.length == 0) {
            throw new IllegalArgumentException("an empty stream has no reference sample");
        }
        long before = bits();
        int count = stream.length;
        int blocks = (count + blockSize - 1) / blockSize;
        zeroRun = 0;
        int previous = 0;
        for (int block = 0; block < blocks; block++) {
            int inInterval = block % intervalBlocks;
            boolean reference = inInterval == 0;
            long any = 0;
            for (int i = 0; i < blockSize; i++) {
                int at = block * blockSize + i;
                real[i] = at < count;
                int x = stream[Math.min(at, count - 1)];
                if (x < 0 || x > X_MAX) {
                    throw new IllegalArgumentException("sample " + at + " is " + x + ", outside 0.." + X_MAX);
                }
                mapped[i] = reference && i == 0 ? 0 : ResidualEntropy.map(x, previous);
                previous = x;
                any |= mapped[i];
            }
            if (reference) {
                referenceBits += BITS;
            }
            if (any == 0) {
                zeroBlock(reference, inInterval, block == blocks - 1);
            } else {
                if (zeroRun > 0) {
                    closeZeroRun(false);
                }
                codeBlock(reference ? 1 : 0);
            }
        }
        streams++;
        samples += count;
        residuals += count - 1;
        long streamBits = bits() - before;
        long fill = (8 - streamBits % 8) % 8;
        fillBits += fill;
        lastStreamOctets = (streamBits + fill) / 8;
        return lastStreamOctets;
    }

    private void zeroBlock(boolean reference, int inInterval, boolean last) {
        if (zeroRun == 0) {
            zeroRunHasReference = reference;
        }
        zeroRun++;
        zeroBlocks++;
        boolean segmentEnd = (inInterval + 1) % SEGMENT_BLOCKS == 0;
        if (segmentEnd || inInterval + 1 == intervalBlocks || last) {
            closeZeroRun(zeroRun > ROS);
        }
    }

    /** A run of m zero blocks: ID + '0', FS(m - 1) for m &lt;= 4, FS(m) for m &gt;= 5, FS(4) for "to the end". */
    private void closeZeroRun(boolean remainderOfSegment) {
        idBits += ID_BITS + 1;
        long fs = remainderOfSegment ? ROS : zeroRun > ROS ? zeroRun : zeroRun - 1;
        zeroRunBits += fs + 1;
        zeroRun = 0;
    }

    private void codeBlock(int first) {
        // the order of fsw-core's encoder: the smallest k among equal splits, then second extension, then
        // no compression win a tie (lengths are the same whichever wins; only the class counted differs)
        long best = Long.MAX_VALUE;
        int bestClass = 0;
        for (int k = 0; k <= MAX_K; k++) {
            long bits = 0;
            for (int i = first; i < blockSize; i++) {
                bits += (mapped[i] >>> k) + 1 + k;
            }
            if (bits < best) {
                best = bits;
                bestClass = k;
            }
        }
        long se = secondExtensionDataBits() + 1; // + the extension bit after the ID
        if (se <= best) {
            best = se;
            bestClass = CLASS_SECOND_EXTENSION;
        }
        if ((long) (blockSize - first) * BITS <= best) {
            bestClass = CLASS_NO_COMPRESSION;
        }
        blocksPerClass[bestClass]++;
        idBits += ID_BITS + (bestClass == CLASS_SECOND_EXTENSION ? 1 : 0);
        if (classHistogram[bestClass] == null) {
            classHistogram[bestClass] = new long[X_MAX + 1];
        }
        for (int i = first; i < blockSize; i++) {
            if (real[i]) {
                classHistogram[bestClass][(int) mapped[i]]++;
            }
        }
        if (bestClass == CLASS_SECOND_EXTENSION) {
            // in a reference block the first pair takes delta_a = 0 (mapped[0] holds 0): standards.md
            for (int i = 0; i < blockSize; i += 2) {
                long sum = mapped[i] + mapped[i + 1];
                long gamma = sum * (sum + 1) / 2 + mapped[i + 1];
                if (!real[i]) {
                    paddingDataBits += gamma + 1;
                } else {
                    residualDataBits += gamma + 1;
                    dataBitsPerClass[bestClass] += gamma + 1;
                    secondExtensionPairs.merge(gamma, 1L, Long::sum);
                }
            }
            return;
        }
        for (int i = first; i < blockSize; i++) {
            long bits = bestClass == CLASS_NO_COMPRESSION ? BITS : (mapped[i] >>> bestClass) + 1 + bestClass;
            if (real[i]) {
                residualDataBits += bits;
                dataBitsPerClass[bestClass] += bits;
            } else {
                paddingDataBits += bits;
            }
        }
    }

    /** Second-extension data bits (without the ID and its extension bit), or a large value if absurd. */
    private long secondExtensionDataBits() {
        long bits = 0;
        for (int i = 0; i < blockSize; i += 2) {
            long sum = mapped[i] + mapped[i + 1];
            if (sum > (long) blockSize * BITS) {
                return Long.MAX_VALUE / 4; // its codeword alone is longer than no compression
            }
            bits += sum * (sum + 1) / 2 + mapped[i + 1] + 1;
        }
        return bits;
    }

    /**
     * The least number of bits any code of each option class could give the same real residuals, the
     * blocks' classes as chosen: sum over classes of N_c H(p_c), with p_c the empirical distribution of the
     * mapped residuals coded in class c (of the pairs' gamma values for second extension). Every class is a
     * memoryless prefix code of its symbols (split k: (d &gt;&gt; k) + 1 + k bits; second extension: gamma + 1
     * bits per pair; no compression: 16 bits), so by the Kraft inequality and Gibbs' inequality its data
     * bits are at least this (Cover &amp; Thomas, Elements of Information Theory, Thm 5.3.1).
     */
    public double conditionalIdealBits() {
        double bits = 0;
        for (int c = 0; c < CLASSES; c++) {
            if (c != CLASS_SECOND_EXTENSION && classHistogram[c] != null) {
                bits += empiricalBits(classHistogram[c]);
            }
        }
        long[] pairs = secondExtensionPairs.values().stream().mapToLong(Long::longValue).toArray();
        return bits + empiricalBits(pairs);
    }

    /** The mapped residuals of every class together: the histogram of the pooled order-0 entropy H0. */
    public long[] residualHistogram() {
        long[] all = new long[X_MAX + 1];
        for (long[] h : classHistogram) {
            if (h != null) {
                for (int d = 0; d <= X_MAX; d++) {
                    all[d] += h[d];
                }
            }
        }
        return all;
    }

    /**
     * How much longer the codes of class {@code c}'s real residuals are than their ideal lengths under the
     * distribution {@code histogram} (normally {@link #residualHistogram()} of the whole scenario): data bits
     * minus the sum of -log2 p(d). Summed over all classes against the pooled histogram it is the residual
     * data bits minus N H0, exactly.
     */
    public double excessOverIdeal(int c, long[] histogram) {
        if (classHistogram[c] == null) {
            return 0;
        }
        long n = 0;
        for (long x : histogram) {
            n += x;
        }
        double ideal = 0;
        for (int d = 0; d < classHistogram[c].length; d++) {
            long m = classHistogram[c][d];
            if (m > 0) {
                if (histogram[d] == 0) {
                    throw new IllegalArgumentException("residual " + d + " of class " + c + " has p = 0");
                }
                ideal -= m * Math.log((double) histogram[d] / n);
            }
        }
        return dataBitsPerClass[c] - ideal / Math.log(2);
    }

    /** N H(p) of a histogram, p the empirical distribution: sum of -log2 p over its symbols. */
    static double empiricalBits(long[] histogram) {
        long n = 0;
        for (long c : histogram) {
            n += c;
        }
        double bits = 0;
        for (long c : histogram) {
            if (c > 0) {
                bits -= c * Math.log((double) c / n);
            }
        }
        return bits / Math.log(2);
    }

    /** Octets of the last stream added. */
    public long lastStreamOctets() {
        return lastStreamOctets;
    }

    /** Streams added. */
    public long streams() {
        return streams;
    }

    /** Samples added (references and residuals). */
    public long samples() {
        return samples;
    }

    /** Real residuals (samples that are not references). */
    public long residuals() {
        return residuals;
    }

    /** All bits, the sum of the parts: IDs + references + residual data + padding data + zero runs + fill. */
    public long bits() {
        return idBits + referenceBits + residualDataBits + paddingDataBits + zeroRunBits + fillBits;
    }

    /** Option-ID bits, the low-entropy extension bit included. */
    public long idBits() {
        return idBits;
    }

    /** Reference-sample bits. */
    public long referenceBits() {
        return referenceBits;
    }

    /** Data bits of the real residuals. */
    public long residualDataBits() {
        return residualDataBits;
    }

    /** Data bits of the padding samples of last partial blocks. */
    public long paddingDataBits() {
        return paddingDataBits;
    }

    /** FS codeword bits of the zero-block runs. */
    public long zeroRunBits() {
        return zeroRunBits;
    }

    /** End-of-stream fill bits. */
    public long fillBits() {
        return fillBits;
    }

    /** Blocks coded with option class {@code c} (0..13 split k, then second extension, no compression). */
    public long blocks(int c) {
        return blocksPerClass[c];
    }

    /** All-zero blocks (coded in zero-block runs). */
    public long zeroBlocks() {
        return zeroBlocks;
    }
}
