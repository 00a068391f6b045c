package dev.sweepline.ground.cli;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Exit statuses of the ground decoder's commands: the same numbers and words as the flight software's
 * and the bench's ({@code dev.sweepline.fsw.host.ExitStatus}, which this module may not depend on;
 * hw-sim's {@code ExitStatusAgreementTest} holds the three {@code --help} lists to one another).
 */
final class ExitCodes {
    /** Input read and decoded (bad frames are counted, not failures). */
    static final int OK = 0;
    /** An unexpected error. */
    static final int FAILED = 1;
    /** Usage error: unknown option, missing or malformed value, value out of range (picocli's own 2). */
    static final int USAGE = 2;
    /** Input error: the telemetry, a table image or an instrument description missing or malformed. */
    static final int INPUT = 4;
    /** I/O error: the products cannot be written. */
    static final int IO = 5;
    /** Did not fit / warnings (the flight software's and the bench's; the ground has none of its own yet). */
    static final int WARNINGS = 6;

    private ExitCodes() {
    }

    /** The list {@code --help} prints, status to meaning (the words of the other two jars). */
    static Map<String, String> helpList() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put(Integer.toString(OK), "done");
        m.put(Integer.toString(FAILED), "failed: the run stopped early or an unexpected error");
        m.put(Integer.toString(USAGE), "usage error: unknown option, missing or malformed value, value out of range");
        m.put(Integer.toString(INPUT), "input error: an input file or a named input (scenario, instrument) missing "
                + "or malformed");
        m.put(Integer.toString(IO), "I/O error: an output, port or socket that cannot be opened or written");
        m.put(Integer.toString(WARNINGS), "did not fit / warnings: results written, but over an allocation or "
                + "the line rate");
        return m;
    }
}
