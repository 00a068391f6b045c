package dev.sweepline.fsw.host;

/**
 * A command's failure as the one line the user sees (what and where) and its {@link ExitStatus};
 * {@link CommandLines}' execution-exception handler prints the line and returns the status.
 */
public final class CliException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int status;

    /**
     * @param status  an {@link ExitStatus}
     * @param message one line: the option or file, and what is wrong with it
     */
    public CliException(int status, String message) {
        super(message, null, false, false);
        this.status = status;
    }

    /** An input error ({@link ExitStatus#INPUT}). */
    public static CliException input(String message) {
        return new CliException(ExitStatus.INPUT, message);
    }

    /** An I/O error ({@link ExitStatus#IO}). */
    public static CliException io(String message) {
        return new CliException(ExitStatus.IO, message);
    }

    /** The exit status. */
    public int status() {
        return status;
    }
}
