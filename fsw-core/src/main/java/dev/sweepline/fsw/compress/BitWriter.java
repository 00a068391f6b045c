package dev.sweepline.fsw.compress;

/**
 * Packs bit fields MSB-first into a byte array: a flyweight, wrapped over the caller's buffer for
 * each stream and reused.
 *
 * <pre>
 *   writeBits(0b101, 3); writeBits(0b1, 1); finish()   -&gt;   byte 0 = 1011 0000
 *                                                             (first bit written = bit 7)
 * </pre>
 *
 * <p>Bits not yet forming a whole byte wait in a 64-bit accumulator. Writing past the end of the
 * wrapped region does not throw: the bytes are dropped, {@link #overflowed()} turns true and
 * {@link #finish()} returns {@link #OVERFLOW}. Threading: owned by one thread.
 */
public final class BitWriter {
    /** {@link #finish()} result when the wrapped region was too small. */
    public static final int OVERFLOW = -1;
    /** Largest field {@link #writeBits} takes in one call. */
    public static final int MAX_FIELD_BITS = 32;

    private byte[] buffer;
    private int start;
    private int limit;
    private int position;
    private long accumulator;
    private int pendingBits;
    private boolean overflow;
    private long bitsWritten;

    /** Starts a new stream at {@code buffer[offset]}, writing at most {@code length} bytes. */
    public BitWriter wrap(byte[] buffer, int offset, int length) {
        this.buffer = buffer;
        this.start = offset;
        this.limit = offset + length;
        this.position = offset;
        this.accumulator = 0;
        this.pendingBits = 0;
        this.overflow = false;
        this.bitsWritten = 0;
        return this;
    }

    /** Writes the low {@code count} bits of {@code value}, most significant first; {@code count} is 0..32. */
    public void writeBits(long value, int count) {
        accumulator = (accumulator << count) | (value & ((1L << count) - 1));
        pendingBits += count;
        bitsWritten += count;
        while (pendingBits >= 8) {
            pendingBits -= 8;
            put((byte) (accumulator >>> pendingBits));
        }
    }

    /** Writes {@code count} zero bits. */
    public void writeZeros(long count) {
        long left = count;
        while (left > MAX_FIELD_BITS) {
            writeBits(0, MAX_FIELD_BITS);
            left -= MAX_FIELD_BITS;
        }
        writeBits(0, (int) left);
    }

    /** Writes the fundamental sequence codeword FS(m): m zeros, then a one (CCSDS 121.0-B). */
    public void writeFundamentalSequence(long m) {
        if (m < MAX_FIELD_BITS) {
            writeBits(1, (int) m + 1);
        } else {
            writeZeros(m);
            writeBits(1, 1);
        }
    }

    /**
     * Zero-fills to the next byte boundary; writes nothing when already on one. The end of a padded
     * reference sample interval and the end of the stream (CCSDS 121.0-B) both use it.
     */
    public void padToOctet() {
        if (pendingBits > 0) {
            writeBits(0, 8 - pendingBits);
        }
    }

    /**
     * Ends the stream: zero-fills the last byte (CCSDS 121.0-B, end of stream).
     *
     * @return bytes written since {@link #wrap}, or {@link #OVERFLOW}
     */
    public int finish() {
        padToOctet();
        return overflow ? OVERFLOW : position - start;
    }

    /** Bits written since {@link #wrap}, fill bits of {@link #finish()} included. */
    public long bitsWritten() {
        return bitsWritten;
    }

    /** True once a byte did not fit into the wrapped region. */
    public boolean overflowed() {
        return overflow;
    }

    private void put(byte b) {
        if (position < limit) {
            buffer[position++] = b;
        } else {
            overflow = true;
        }
    }
}
