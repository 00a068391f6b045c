package dev.sweepline.fsw.link;

/** Status codes of the link's message checks (bad input is a status, not an exception). */
public final class LinkStatus {
    /** Accepted. */
    public static final int OK = 0;
    /** The first octet is no message type of the ICD. */
    public static final int UNKNOWN_TYPE = 1;
    /** The payload length is not the one of its type. */
    public static final int WRONG_LENGTH = 2;
    /** A valid message that this side does not expect (e.g. a step command arriving at the flight software). */
    public static final int UNEXPECTED = 3;

    private LinkStatus() {
    }
}
