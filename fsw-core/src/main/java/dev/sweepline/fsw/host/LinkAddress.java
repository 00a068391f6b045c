package dev.sweepline.fsw.host;

import java.io.IOException;

/**
 * A link address as the command lines take it: {@code tcp:HOST:PORT} for TCP, anything else a
 * serial device path (hardware ICD §1).
 *
 * @param tcp    true for TCP
 * @param host   TCP host (loopback when given as empty, e.g. {@code tcp::5000})
 * @param port   TCP port
 * @param device serial device path
 */
public record LinkAddress(boolean tcp, String host, int port, String device) {
    /** Loopback, where TCP binds unless told otherwise. */
    public static final String LOOPBACK = "127.0.0.1";

    /**
     * Parses {@code spec}.
     *
     * @throws IllegalArgumentException on a malformed TCP address
     */
    public static LinkAddress parse(String spec) {
        if (!spec.startsWith("tcp:")) {
            return new LinkAddress(false, null, 0, spec);
        }
        String rest = spec.substring(4);
        int colon = rest.lastIndexOf(':');
        if (colon < 0) {
            throw new IllegalArgumentException("expected tcp:HOST:PORT, got " + spec);
        }
        String host = rest.substring(0, colon).isEmpty() ? LOOPBACK : rest.substring(0, colon);
        int port;
        try {
            port = Integer.parseInt(rest.substring(colon + 1));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("bad port in " + spec, e);
        }
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("port out of range in " + spec);
        }
        return new LinkAddress(true, host, port, null);
    }

    /** Opens the client end: connects over TCP, or opens the serial device at {@code baud}. */
    public HostTransport open(int baud) throws IOException {
        return tcp ? TcpTransport.connect(host, port) : SerialTransport.open(device, baud);
    }

    @Override
    public String toString() {
        return tcp ? "tcp:" + host + ":" + port : device;
    }
}
