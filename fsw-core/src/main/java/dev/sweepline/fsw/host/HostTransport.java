package dev.sweepline.fsw.host;

import dev.sweepline.fsw.link.ByteTransport;

/** A {@link ByteTransport} the host opened and must close (a serial port or a TCP connection). */
public interface HostTransport extends ByteTransport, AutoCloseable {
    /** Releases the port or connection; never throws a checked exception. */
    @Override
    void close();
}
