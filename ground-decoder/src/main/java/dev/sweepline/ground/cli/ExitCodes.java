package dev.sweepline.ground.cli;

/** Exit statuses of the ground decoder commands. */
final class ExitCodes {
    /** Input read and decoded (bad frames are counted, not failures). */
    static final int OK = 0;
    /** Products could not be written. */
    static final int OUTPUT_FAILED = 1;
    /** Input missing or unreadable (also picocli's status for bad usage). */
    static final int UNREADABLE_INPUT = 2;

    private ExitCodes() {
    }
}
