package dev.sweepline.ground.rice;

/**
 * Reads an MSB-first bit stream from a byte array region. Reads never throw: past the end they
 * return {@link #TRUNCATED} and leave the position where the read started.
 */
final class BitReader {
    /** Result of a read that ran past the end of the region. */
    static final long TRUNCATED = -1;
    /** Result of a fundamental-sequence read with more zeros than its limit. */
    static final long TOO_LONG = -2;

    private byte[] data;
    private int offset;
    private long endBit;
    private long position;

    BitReader(byte[] data, int offset, int length) {
        wrap(data, offset, length);
    }

    /** Reads {@code length} octets of {@code data} from {@code offset} from their first bit: one reader, reused. */
    BitReader wrap(byte[] data, int offset, int length) {
        this.data = data;
        this.offset = offset;
        this.endBit = (long) length * 8;
        this.position = 0;
        return this;
    }

    /** Bit position from the start of the region. */
    long position() {
        return position;
    }

    /** Big-endian view of 8 octets at once: the fast path of {@link #read(int)}. */
    private static final java.lang.invoke.VarHandle LONG_BE = java.lang.invoke.MethodHandles
            .byteArrayViewVarHandle(long[].class, java.nio.ByteOrder.BIG_ENDIAN);

    /** Reads an unsigned {@code count}-bit field, 0..32 bits, or {@link #TRUNCATED}. */
    long read(int count) {
        if (endBit - position < count) {
            return TRUNCATED;
        }
        int at = offset + (int) (position >>> 3);
        if (count > 0 && count <= 57 && at + 8 <= data.length) {
            // 8 octets hold the count bits wherever they start in the first: one load, two shifts
            long word = (long) LONG_BE.get(data, at);
            long value = (word << (position & 7)) >>> (64 - count);
            position += count;
            return value;
        }
        long value = 0;
        int left = count;
        while (left > 0) {
            int bitInByte = (int) (position & 7);
            int available = 8 - bitInByte;
            int take = Math.min(available, left);
            int current = data[offset + (int) (position >>> 3)] & 0xFF;
            int bits = (current >>> (available - take)) & ((1 << take) - 1);
            value = (value << take) | bits;
            position += take;
            left -= take;
        }
        return value;
    }

    /**
     * Reads the data of one split-sample block (CCSDS 121.0-B-3 §3.4.3.4): the fundamental sequences of
     * {@code values[from .. to)}, then their {@code k}-bit low parts, each value becoming
     * {@code (zeros << k) | low}. The fast path of the field-by-field reads: the bits are held in one 64-bit
     * word loaded 8 octets at a time, each codeword's end found with {@code Long.numberOfLeadingZeros},
     * and the stream's end and {@code maxHigh} are checked once for the whole block. Returns false, with the position unchanged and {@code values}
     * partly overwritten, when the block does not pass that way (a codeword of more than 56 zeros, a load
     * past the array, a bit past the stream, more than {@code maxHigh} zeros); the caller then reads the
     * block field by field, which finds the exact error.
     */
    boolean readSplitBlock(long[] values, int from, int to, int k, long maxHigh) {
        final byte[] d = data;
        final int lastLoad = d.length - 8;
        final long base = (long) offset * 8;
        long p = base + position; // bit of the array the next field starts at
        int at = (int) (p >>> 3);
        if (at > lastLoad) {
            return false;
        }
        long w = ((long) LONG_BE.get(d, at)) << (p & 7); // the bits from p on, MSB first, zeros after them
        int valid = 64 - (int) (p & 7); // bits of w that are the array's: at least 57 after a load
        int longest = 0;
        for (int i = from; i < to; i++) {
            int zeros = Long.numberOfLeadingZeros(w);
            if (zeros >= valid) { // no one among the bits held: load from p again
                at = (int) (p >>> 3);
                if (at > lastLoad) {
                    return false;
                }
                w = ((long) LONG_BE.get(d, at)) << (p & 7);
                valid = 64 - (int) (p & 7);
                zeros = Long.numberOfLeadingZeros(w);
                if (zeros >= valid) {
                    return false;
                }
            }
            longest = Math.max(longest, zeros);
            values[i] = (long) zeros << k;
            w = (w << zeros) << 1; // two shifts: zeros + 1 may be 64, which a Java shift takes as 0
            valid -= zeros + 1;
            p += zeros + 1;
        }
        if (k > 0) {
            final int drop = 64 - k;
            for (int i = from; i < to; i++) {
                if (valid < k) {
                    at = (int) (p >>> 3);
                    if (at > lastLoad) {
                        return false;
                    }
                    w = ((long) LONG_BE.get(d, at)) << (p & 7);
                    valid = 64 - (int) (p & 7); // >= 57 > k (k <= 31)
                }
                values[i] |= w >>> drop;
                w <<= k;
                valid -= k;
                p += k;
            }
        }
        if (p - base > endBit || longest > maxHigh) {
            return false;
        }
        position = p - base;
        return true;
    }

    /**
     * Skips to the next octet boundary of the stream (nothing when already on one) and returns the
     * skipped bits as an unsigned value, 0 when they are all zero. The skipped bits lie in the octet
     * of the last bit read, so this never runs past the region.
     */
    long skipToOctet() {
        return read((int) (-position & 7));
    }

    /**
     * Reads a fundamental sequence codeword (zeros ended by a one) and returns the number of zeros,
     * or {@link #TRUNCATED} if the region ends first, or {@link #TOO_LONG} once more than
     * {@code maxZeros} zeros are seen (the position then stays at the codeword's start).
     */
    long readFundamentalSequence(long maxZeros) {
        long start = position;
        long p = position;
        while (p < endBit) {
            int at = offset + (int) (p >>> 3);
            int bitInByte = (int) (p & 7);
            int span;
            long word;
            if (at + 8 <= data.length) {
                word = ((long) LONG_BE.get(data, at)) << bitInByte; // 64 - bitInByte real bits
                span = 64 - bitInByte;
            } else {
                word = ((long) ((data[at] << bitInByte) & 0xFF)) << 56; // the last octets: one at a time
                span = 8 - bitInByte;
            }
            if (word != 0) {
                long ones = p + Long.numberOfLeadingZeros(word);
                if (ones >= endBit) {
                    return TRUNCATED; // the one lies past the stream (padding or the next field)
                }
                long zeros = ones - start;
                if (zeros > maxZeros) {
                    return TOO_LONG;
                }
                position = ones + 1;
                return zeros;
            }
            p += span;
            if (p - start > maxZeros) {
                return TOO_LONG;
            }
        }
        return TRUNCATED;
    }
}
