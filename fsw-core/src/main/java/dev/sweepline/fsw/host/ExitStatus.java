package dev.sweepline.fsw.host;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The exit statuses of {@code sweepline-fsw.jar} and {@code sweepline-bench.jar}, in one place. The
 * ground decoder (which may not depend on this module) uses the same numbers in its
 * {@code cli.ExitCodes}; hw-sim's {@code ExitStatusAgreementTest} holds the three jars' {@code --help}
 * lists to the same words. {@link CommandLines#configure} prints the list in every command's help.
 */
public final class ExitStatus {
    /** Done: the run reached its planned end (HV off confirmed), the products are written. */
    public static final int OK = 0;
    /** The run failed (exception, link lost, SAFE; HV off confirmed) or an unexpected error. */
    public static final int FAILED = 1;
    /** Usage error: unknown option, missing or malformed value, value out of range (picocli's own 2). */
    public static final int USAGE = 2;
    /** {@code sweepline-fsw.jar run} only: the HV off could not be confirmed (hardware ICD §4.2). */
    public static final int HV_NOT_CONFIRMED = 3;
    /** Input error: a scenario, script, table, campaign, plan, instrument or telemetry file missing or malformed. */
    public static final int INPUT = 4;
    /** I/O error: an output file or folder, a port or a socket that cannot be opened or written. */
    public static final int IO = 5;
    /** Did not fit / warnings: results written, but the telemetry exceeds its allocation or the link its line rate. */
    public static final int WARNINGS = 6;

    private ExitStatus() {
    }

    /**
     * The list {@code --help} prints, status to meaning.
     *
     * @param withHv true for the flight software's {@code run}, which alone can end with {@link #HV_NOT_CONFIRMED}
     */
    public static Map<String, String> helpList(boolean withHv) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put(Integer.toString(OK), "done");
        m.put(Integer.toString(FAILED), "failed: the run stopped early or an unexpected error");
        m.put(Integer.toString(USAGE), "usage error: unknown option, missing or malformed value, value out of range");
        if (withHv) {
            m.put(Integer.toString(HV_NOT_CONFIRMED), "HV off NOT confirmed (hardware ICD §4.2)");
        }
        m.put(Integer.toString(INPUT), "input error: an input file or a named input (scenario, instrument) missing "
                + "or malformed");
        m.put(Integer.toString(IO), "I/O error: an output, port or socket that cannot be opened or written");
        m.put(Integer.toString(WARNINGS), "did not fit / warnings: results written, but over an allocation or "
                + "the line rate");
        return m;
    }
}
