package dev.sweepline.fsw.host;

import dev.sweepline.fsw.link.ByteTransport;

/** A {@link ByteTransport} the host opened and must close (a serial port or a TCP connection). */
public interface HostTransport extends ByteTransport, AutoCloseable {
    /**
     * Registers {@code action} to run at JVM shutdown (SIGINT, SIGTERM) while this transport still
     * works, and returns what unregisters it. By default a JVM shutdown hook.
     */
    default Runnable onShutdown(Runnable action) {
        Thread hook = new Thread(action, "fsw-shutdown");
        Runtime.getRuntime().addShutdownHook(hook);
        return () -> {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException e) {
                // the JVM is shutting down: the hook is running or has run
            }
        };
    }

    /** Releases the port or connection; never throws a checked exception. */
    @Override
    void close();
}
