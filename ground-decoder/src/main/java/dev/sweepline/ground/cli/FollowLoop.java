package dev.sweepline.ground.cli;

import dev.sweepline.ground.product.GroundSession;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;

/**
 * {@code decode --follow}: decodes a telemetry stream while it grows and rewrites the products, the
 * quick-look report among them, whenever new octets have arrived and {@link #REFRESH_MILLIS} have passed;
 * the report asks the browser to reload itself as often. The stream is a file being written (read on from
 * where it ended, polled every {@link #POLL_MILLIS}; it never ends by itself: stop with Ctrl-C, the last
 * products stand) or {@code tcp://HOST:PORT}, a telemetry server's frames (the session ends, with a final
 * report that no longer reloads, when the server closes the connection).
 */
final class FollowLoop {
    /** How often the products are rewritten while octets arrive, ms: a quick-look pace, a second or two. */
    static final int REFRESH_MILLIS = 2000;
    /** The report's reload interval, s (as the rewrite pace). */
    static final int REFRESH_SECONDS = REFRESH_MILLIS / 1000;
    /** Pause between polls of a file that has no new octets, ms. */
    static final int POLL_MILLIS = 200;
    /** Scheme of a TCP stream. */
    static final String TCP = "tcp://";

    /** Where octets come from: returns octets read, 0 for none yet, -1 at the stream's end. */
    interface Source extends AutoCloseable {
        int read(byte[] b) throws IOException;

        @Override
        void close() throws IOException;
    }

    private FollowLoop() {
    }

    /** True when {@code input} names a TCP stream. */
    static boolean isTcp(String input) {
        return input.startsWith(TCP);
    }

    /** The source {@code input} names: a TCP stream or a file. */
    static Source open(String input) throws IOException {
        if (isTcp(input)) {
            String hostPort = input.substring(TCP.length());
            int colon = hostPort.lastIndexOf(':');
            if (colon <= 0) {
                throw new IllegalArgumentException("expected tcp://HOST:PORT, got " + input);
            }
            int port = Integer.parseInt(hostPort.substring(colon + 1));
            Socket socket = new Socket();
            socket.connect(new InetSocketAddress(hostPort.substring(0, colon), port), 5000);
            socket.setSoTimeout(POLL_MILLIS);
            InputStream in = socket.getInputStream();
            return new Source() {
                @Override
                public int read(byte[] b) throws IOException {
                    try {
                        return in.read(b);
                    } catch (SocketTimeoutException e) {
                        return 0;
                    }
                }

                @Override
                public void close() throws IOException {
                    socket.close();
                }
            };
        }
        InputStream in = Files.newInputStream(Path.of(input));
        return new Source() {
            @Override
            public int read(byte[] b) throws IOException {
                int n = in.read(b);
                return Math.max(n, 0); // a file at its end may still grow
            }

            @Override
            public void close() throws IOException {
                in.close();
            }
        };
    }

    /**
     * Follows {@code source} into {@code session} until the source ends or {@code stop} says so; writes the
     * products on the way and a finished report at the end.
     */
    static void run(Source source, GroundSession session, BooleanSupplier stop, PrintWriter out) throws IOException,
            InterruptedException {
        byte[] chunk = new byte[64 * 1024];
        long lastWrite = System.nanoTime();
        long written = -1;
        session.write(REFRESH_SECONDS);
        while (!stop.getAsBoolean()) {
            int n = source.read(chunk);
            if (n < 0) {
                break;
            }
            if (n > 0) {
                session.accept(chunk, 0, n);
            } else {
                Thread.sleep(POLL_MILLIS);
            }
            if (session.octets() != written && System.nanoTime() - lastWrite >= REFRESH_MILLIS * 1_000_000L) {
                session.write(REFRESH_SECONDS);
                written = session.octets();
                lastWrite = System.nanoTime();
                out.printf("%d octets, %d spectra%n", session.octets(), session.spectra());
                out.flush();
            }
        }
        session.finish();
        session.write(0);
    }
}
