package dev.sweepline.ground.cli;

/** A command's failure as the one line the user sees (what and where) and its {@link ExitCodes} status. */
final class GroundFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int status;

    GroundFailure(int status, String message) {
        super(message, null, false, false);
        this.status = status;
    }

    int status() {
        return status;
    }
}
