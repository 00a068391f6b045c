package dev.sweepline.fsw.host;

import java.io.IOException;

/**
 * A link address as the command lines take it: {@code tcp:HOST:PORT} for TCP, anything else without
 * a scheme a serial device path (hardware ICD §1); another scheme ({@code udp:...}) is refused.
 *
 * @param tcp    true for TCP
 * @param host   TCP host (loopback when given as empty, e.g. {@code tcp::5000})
 * @param port   TCP port
 * @param device serial device path
 */
public record LinkAddress(boolean tcp, String host, int port, String device) {
    /** Loopback, where TCP binds unless told otherwise. */
    public static final String LOOPBACK = "127.0.0.1";
    /** A URI-style scheme (RFC 3986 §3.1) of two letters or more, so that a drive letter is not one. */
    private static final java.util.regex.Pattern SCHEME = java.util.regex.Pattern.compile("[A-Za-z][A-Za-z0-9+.-]+:");

    /**
     * Parses {@code spec}.
     *
     * @throws IllegalArgumentException on a malformed TCP address or an unknown scheme
     */
    public static LinkAddress parse(String spec) {
        java.util.regex.Matcher scheme = SCHEME.matcher(spec);
        if (scheme.lookingAt() && !spec.startsWith("tcp:")) {
            throw new IllegalArgumentException("unknown scheme '" + scheme.group() + "' in " + spec
                    + " (expected tcp:HOST:PORT or a serial device path)");
        }
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
