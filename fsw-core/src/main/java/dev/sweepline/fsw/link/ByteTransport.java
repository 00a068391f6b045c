package dev.sweepline.fsw.link;

/**
 * A full-duplex byte stream between the flight software and the electronics (hardware ICD §1):
 * an in-process pipe, a TCP connection or a serial port. Both calls return at once.
 *
 * <p>Threading: one reader thread and one writer thread (they may be the same thread).
 */
public interface ByteTransport {
    /**
     * Reads what has arrived, up to {@code length} octets, without blocking.
     *
     * @return octets read, 0 when nothing has arrived, -1 when the stream has ended
     */
    int read(byte[] buffer, int offset, int length);

    /**
     * Writes up to {@code length} octets without blocking.
     *
     * @return octets taken (possibly fewer than asked, possibly 0), -1 when the stream has ended
     */
    int write(byte[] buffer, int offset, int length);
}
