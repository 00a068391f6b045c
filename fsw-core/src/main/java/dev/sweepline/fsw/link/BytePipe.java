package dev.sweepline.fsw.link;

/**
 * One direction of an in-process byte stream: a bounded ring buffer, allocated at construction.
 * Neither side blocks: a full pipe takes fewer octets, an empty one gives none.
 *
 * <p>Threading: single producer, single consumer (one thread may be both). The indices are
 * volatile so that a write happens-before the read that sees it.
 */
public final class BytePipe {
    private final byte[] ring;
    private final int mask;
    private volatile long written;
    private volatile long read;
    private volatile boolean closed;

    /** A pipe holding up to {@code capacity} octets, rounded up to a power of two. */
    public BytePipe(int capacity) {
        int size = Integer.highestOneBit(Math.max(2, capacity - 1)) << 1;
        this.ring = new byte[size];
        this.mask = size - 1;
    }

    /** Copies up to {@code length} octets in; returns how many fit, or -1 after {@link #close()}. */
    public int write(byte[] buffer, int offset, int length) {
        if (closed) {
            return -1;
        }
        long w = written;
        int n = (int) Math.min(length, ring.length - (w - read));
        for (int i = 0; i < n; i++) {
            ring[(int) (w + i) & mask] = buffer[offset + i];
        }
        written = w + n;
        return n;
    }

    /** Copies up to {@code length} octets out; 0 when empty, -1 when closed and drained. */
    public int read(byte[] buffer, int offset, int length) {
        long r = read;
        long available = written - r;
        if (available == 0) {
            return closed ? -1 : 0;
        }
        int n = (int) Math.min(length, available);
        for (int i = 0; i < n; i++) {
            buffer[offset + i] = ring[(int) (r + i) & mask];
        }
        read = r + n;
        return n;
    }

    /** Octets waiting to be read. */
    public int available() {
        return (int) (written - read);
    }

    /** Ends the stream: the reader drains what is left, then sees -1. */
    public void close() {
        closed = true;
    }
}
