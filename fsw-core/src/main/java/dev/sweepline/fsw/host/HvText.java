package dev.sweepline.fsw.host;

/** The high-voltage texts of the command lines' help. */
public final class HvText {
    /** Caution text (picocli help; hardware ICD, high-voltage note). */
    public static final String CAUTION =
            "HIGH VOLTAGE: the modulator supply of a Faraday cup reaches several kilovolts. On real "
            + "electronics the HV stays off unless armed (--hv arm) and then fired (type FIRE at the "
            + "prompt, or --hv-confirm FIRE) within the time-out. Run only behind the bench's hardware "
            + "interlock, with the lab's HV procedures in force; your laboratory's own safety rules take "
            + "precedence over this program. This software permission is not a safety interlock.";

    /** What every end of {@code run} does to the HV (hardware ICD §4.2; picocli help). */
    public static final String END_OF_RUN =
            "END OF RUN: however the run ends (--minutes reached, Ctrl-C or SIGTERM, an error, a lost link), the "
            + "HV permission is withdrawn and the electronics are sent HV-off steps; the run waits up to "
            + HvShutdown.CONFIRM_WAIT_MICROS / 1_000_000 + " s for their HV monitor to read below "
            + HvShutdown.OFF_THRESHOLD_CODES + " codes and prints 'HV off confirmed' or 'HV off NOT confirmed' "
            + "(exit status 3). The electronics' own link watchdog switches the HV off "
            + dev.sweepline.fsw.link.LinkWatchdog.TIMEOUT_MICROS / 1_000_000
            + " s after the last step when the host is gone (hardware ICD §4.1).";

    private HvText() {
    }
}
