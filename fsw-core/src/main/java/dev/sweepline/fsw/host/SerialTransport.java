package dev.sweepline.fsw.host;

import com.fazecast.jSerialComm.SerialPort;
import java.io.IOException;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArraySet;

/**
 * A {@link ByteTransport} on a serial port through jSerialComm (hardware ICD §1): 8 data bits, no
 * parity, 1 stop bit, no flow control, non-blocking reads.
 *
 * <p>Threading: one reader and one writer.
 */
public final class SerialTransport implements HostTransport {
    /** Default line rate (hardware ICD §1). */
    public static final int DEFAULT_BAUD = 115_200;

    /** The actions of {@link #onShutdown}, run from the one hook given to jSerialComm. */
    private static final Set<Runnable> SHUTDOWN_ACTIONS = new CopyOnWriteArraySet<>();
    private static boolean hookGiven;

    private final SerialPort port;

    private SerialTransport(SerialPort port) {
        this.port = port;
    }

    /**
     * Opens {@code device} (a path such as {@code /dev/ttyUSB0}, or a pty) at {@code baud}, 8N1.
     *
     * @throws IOException when the port cannot be opened
     */
    public static SerialTransport open(String device, int baud) throws IOException {
        SerialPort port;
        try {
            port = SerialPort.getCommPort(device);
        } catch (RuntimeException e) {
            throw new IOException("no serial port " + device, e);
        }
        port.setComPortParameters(baud, 8, SerialPort.ONE_STOP_BIT, SerialPort.NO_PARITY);
        port.setFlowControl(SerialPort.FLOW_CONTROL_DISABLED);
        port.setComPortTimeouts(SerialPort.TIMEOUT_NONBLOCKING, 0, 0);
        if (!port.openPort()) {
            throw new IOException("cannot open serial port " + device + " (error " + port.getLastErrorCode() + ")");
        }
        return new SerialTransport(port);
    }

    @Override
    public int read(byte[] buffer, int offset, int length) {
        if (port.bytesAvailable() <= 0) {
            return port.isOpen() ? 0 : -1;
        }
        int n = port.readBytes(buffer, length, offset);
        return Math.max(n, 0);
    }

    @Override
    public int write(byte[] buffer, int offset, int length) {
        int n = port.writeBytes(buffer, length, offset);
        return n < 0 ? 0 : n;
    }

    /**
     * jSerialComm (2.11) closes every port in a JVM shutdown hook of its own, after running the hooks
     * given to {@link SerialPort#addShutdownHook}; a plain JVM hook races with it and finds the port
     * closed (seen: a SIGTERM then could not confirm the HV off). So the action runs from there. jSerialComm cannot remove a hook: one is given, once,
     * and it runs the actions registered at the time.
     */
    @Override
    public Runnable onShutdown(Runnable action) {
        synchronized (SHUTDOWN_ACTIONS) {
            if (!hookGiven) {
                SerialPort.addShutdownHook(new Thread(() -> SHUTDOWN_ACTIONS.forEach(Runnable::run), "fsw-shutdown"));
                hookGiven = true;
            }
        }
        SHUTDOWN_ACTIONS.add(action);
        return () -> SHUTDOWN_ACTIONS.remove(action);
    }

    @Override
    public void close() {
        port.closePort();
    }
}
