package dev.sweepline.fsw.host;

/** The high-voltage caution both command lines print in their help. */
public final class HvText {
    /** Caution text (picocli help; hardware ICD, high-voltage note). */
    public static final String CAUTION =
            "HIGH VOLTAGE: the modulator supply of a Faraday cup reaches several kilovolts. On real "
            + "electronics the HV stays off unless armed (--hv arm) and then fired (type FIRE at the "
            + "prompt, or --hv-confirm FIRE) within the time-out. Run only behind the bench's hardware "
            + "interlock, with the lab's HV procedures in force; your laboratory's own safety rules take "
            + "precedence over this program. This software permission is not a safety interlock.";

    private HvText() {
    }
}
