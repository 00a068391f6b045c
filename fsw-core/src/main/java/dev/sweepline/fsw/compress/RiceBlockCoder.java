package dev.sweepline.fsw.compress;

/**
 * Codes one block that is not all zero: picks, among split-sample (k = 0 is the fundamental
 * sequence), second extension and no compression, the option with the fewest bits, ID included
 * (CCSDS 121.0-B, code selection), and writes its coded data set.
 *
 * <p>On a tie no compression wins over second extension, and both over split-sample; among split
 * positions the smallest k wins. That is the order the reference coders behind standards.md's small
 * vectors and the official test set follow, so our streams match theirs byte for byte there. The
 * split length as a function of k is convex (increasing k by one costs one bit per sample and saves
 * the sum of ceil((d &gt;&gt; k) / 2), which does not grow with k), so a local search from an
 * estimate of k finds the best k in two or three passes over the block. Allocation-free;
 * threading: owned by the encoder's thread.
 */
final class RiceBlockCoder {
    private static final int OPTION_SPLIT = 0;
    private static final int OPTION_SECOND_EXTENSION = 1;
    private static final int OPTION_NO_COMPRESSION = 2;

    private final int bitsPerSample;
    private final int blockSize;
    private final int idBits;
    private final boolean hasSplit;
    private final int maxK;

    RiceBlockCoder(RiceParameters parameters) {
        this.bitsPerSample = parameters.bitsPerSample();
        this.blockSize = parameters.blockSize();
        this.idBits = parameters.idBits();
        this.hasSplit = parameters.hasSplitOptions();
        this.maxK = Math.max(0, parameters.maxSplitK());
    }

    /**
     * Writes one coded data set.
     *
     * @param mapped    the block's J mapped values (unsigned in a long); in a reference block index 0
     *                  holds 0 and stands for the reference sample
     * @param reference true if this block starts a reference sample interval
     * @param refSample the reference sample, sent raw (n bits) after the ID when {@code reference}
     */
    void encode(long[] mapped, boolean reference, long refSample, BitWriter writer) {
        int first = reference ? 1 : 0;
        int coded = blockSize - first;
        long uncompressedBits = idBits + (long) coded * bitsPerSample;
        long bestBits = Long.MAX_VALUE;
        int option = OPTION_NO_COMPRESSION;
        int bestK = 0;
        if (hasSplit) {
            bestK = bestSplitK(mapped, first, coded);
            bestBits = idBits + splitDataBits(mapped, first, coded, bestK);
            option = OPTION_SPLIT;
        }
        long seBits = secondExtensionBits(mapped, Math.min(bestBits, uncompressedBits));
        if (seBits <= bestBits) {
            bestBits = seBits;
            option = OPTION_SECOND_EXTENSION;
        }
        if (uncompressedBits <= bestBits) {
            option = OPTION_NO_COMPRESSION;
        }
        switch (option) {
            case OPTION_SPLIT:
                writeSplit(mapped, first, reference, refSample, bestK, writer);
                break;
            case OPTION_SECOND_EXTENSION:
                writeSecondExtension(mapped, reference, refSample, writer);
                break;
            case OPTION_NO_COMPRESSION:
                writeNoCompression(mapped, first, reference, refSample, writer);
                break;
            default:
                throw new IllegalStateException("unknown code option " + option);
        }
    }

    private int bestSplitK(long[] mapped, int first, int coded) {
        long sum0 = fsSum(mapped, first, 0);
        long mean = sum0 / coded;
        // floor(log2(mean)) is near the optimum for geometric-like data; convexity does the rest
        int k = mean == 0 ? 0 : Math.min(maxK, 63 - Long.numberOfLeadingZeros(mean));
        long bits = k == 0 ? sum0 + coded : splitDataBits(mapped, first, coded, k);
        boolean moved = false;
        while (k < maxK) {
            long up = splitDataBits(mapped, first, coded, k + 1);
            if (up >= bits) {
                break;
            }
            k++;
            bits = up;
            moved = true;
        }
        if (!moved) {
            while (k > 0) {
                long down = k - 1 == 0 ? sum0 + coded : splitDataBits(mapped, first, coded, k - 1);
                if (down > bits) {
                    break;
                }
                k--;
                bits = down;
            }
        }
        return k;
    }

    private long splitDataBits(long[] mapped, int first, int coded, int k) {
        return fsSum(mapped, first, k) + (long) coded * (k + 1);
    }

    private long fsSum(long[] mapped, int first, int k) {
        long sum = 0;
        for (int i = first; i < blockSize; i++) {
            sum += mapped[i] >>> k;
        }
        return sum;
    }

    /** Length with the ID, or {@code Long.MAX_VALUE} once it reaches {@code limitBits} (no use then). */
    private long secondExtensionBits(long[] mapped, long limitBits) {
        long bits = idBits + 1;
        for (int i = 0; i < blockSize; i += 2) {
            long sum = mapped[i] + mapped[i + 1];
            if (sum >= limitBits) {
                return Long.MAX_VALUE; // the codeword alone is longer than sum bits; also avoids overflow
            }
            bits += sum * (sum + 1) / 2 + mapped[i + 1] + 1;
            if (bits > limitBits) {
                return Long.MAX_VALUE;
            }
        }
        return bits;
    }

    private void writeSplit(long[] mapped, int first, boolean reference, long refSample, int k, BitWriter w) {
        w.writeBits(k + 1, idBits);
        if (reference) {
            w.writeBits(refSample, bitsPerSample);
        }
        for (int i = first; i < blockSize; i++) {
            w.writeFundamentalSequence(mapped[i] >>> k);
        }
        if (k > 0) {
            for (int i = first; i < blockSize; i++) {
                w.writeBits(mapped[i], k);
            }
        }
    }

    private void writeSecondExtension(long[] mapped, boolean reference, long refSample, BitWriter w) {
        w.writeBits(1, idBits + 1);
        if (reference) {
            w.writeBits(refSample, bitsPerSample);
        }
        // in a reference block mapped[0] is 0: the first pair takes delta_a = 0 (standards.md)
        for (int i = 0; i < blockSize; i += 2) {
            long sum = mapped[i] + mapped[i + 1];
            w.writeFundamentalSequence(sum * (sum + 1) / 2 + mapped[i + 1]);
        }
    }

    private void writeNoCompression(long[] mapped, int first, boolean reference, long refSample, BitWriter w) {
        w.writeBits((1 << idBits) - 1, idBits);
        if (reference) {
            w.writeBits(refSample, bitsPerSample);
        }
        for (int i = first; i < blockSize; i++) {
            w.writeBits(mapped[i], bitsPerSample);
        }
    }
}
