package dev.sweepline.fsw.host;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.InetSocketAddress;
import java.net.StandardSocketOptions;
import java.nio.ByteBuffer;
import java.nio.channels.ServerSocketChannel;
import java.nio.channels.SocketChannel;

/**
 * A {@link ByteTransport} on a TCP connection (hardware ICD §1), non-blocking, Nagle off so that a
 * 19-octet frame leaves at once. {@link #listen} binds to loopback unless given another host.
 *
 * <p>Threading: one reader and one writer.
 */
public final class TcpTransport implements HostTransport {
    private static final int BUFFER_OCTETS = 4096;
    private final SocketChannel channel;
    private final ByteBuffer readBuffer = ByteBuffer.allocate(BUFFER_OCTETS);
    private final ByteBuffer writeBuffer = ByteBuffer.allocate(BUFFER_OCTETS);

    private TcpTransport(SocketChannel channel) throws IOException {
        channel.setOption(StandardSocketOptions.TCP_NODELAY, true);
        channel.configureBlocking(false);
        this.channel = channel;
    }

    /** Connects to {@code host:port}. */
    public static TcpTransport connect(String host, int port) throws IOException {
        return new TcpTransport(SocketChannel.open(new InetSocketAddress(host, port)));
    }

    /** Binds a listening socket on {@code host:port} (use "127.0.0.1" for loopback; port 0 picks one). */
    public static ServerSocketChannel listen(String host, int port) throws IOException {
        ServerSocketChannel server = ServerSocketChannel.open();
        server.bind(new InetSocketAddress(host, port));
        return server;
    }

    /** Waits for one connection on {@code server}. */
    public static TcpTransport accept(ServerSocketChannel server) throws IOException {
        return new TcpTransport(server.accept());
    }

    @Override
    public int read(byte[] buffer, int offset, int length) {
        try {
            readBuffer.clear().limit(Math.min(length, BUFFER_OCTETS));
            int n = channel.read(readBuffer);
            if (n > 0) {
                System.arraycopy(readBuffer.array(), 0, buffer, offset, n);
            }
            return n;
        } catch (IOException e) {
            return -1;
        }
    }

    @Override
    public int write(byte[] buffer, int offset, int length) {
        try {
            int n = Math.min(length, BUFFER_OCTETS);
            writeBuffer.clear();
            writeBuffer.put(buffer, offset, n).flip();
            return channel.write(writeBuffer);
        } catch (IOException e) {
            return -1;
        }
    }

    @Override
    public void close() {
        try {
            channel.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
