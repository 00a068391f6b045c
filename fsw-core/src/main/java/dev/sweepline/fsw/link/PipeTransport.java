package dev.sweepline.fsw.link;

/**
 * A {@link ByteTransport} over two in-process {@link BytePipe}s, for tests and single-process
 * runs. {@link #pair(int)} gives the two connected ends.
 *
 * <p>Threading: each end used by one thread (or both ends by the same thread).
 */
public final class PipeTransport implements ByteTransport {
    private final BytePipe in;
    private final BytePipe out;

    /** An end that reads from {@code in} and writes to {@code out}. */
    public PipeTransport(BytePipe in, BytePipe out) {
        this.in = in;
        this.out = out;
    }

    /** Two connected ends, element 0 for one side and 1 for the other, each direction {@code capacity} octets. */
    public static PipeTransport[] pair(int capacity) {
        BytePipe aToB = new BytePipe(capacity);
        BytePipe bToA = new BytePipe(capacity);
        return new PipeTransport[] {new PipeTransport(bToA, aToB), new PipeTransport(aToB, bToA)};
    }

    @Override
    public int read(byte[] buffer, int offset, int length) {
        return in.read(buffer, offset, length);
    }

    @Override
    public int write(byte[] buffer, int offset, int length) {
        return out.write(buffer, offset, length);
    }

    /** Octets waiting to be read at this end. */
    public int available() {
        return in.available();
    }

    /** Closes this end's outgoing direction; the peer drains it and then reads -1. */
    public void close() {
        out.close();
    }
}
