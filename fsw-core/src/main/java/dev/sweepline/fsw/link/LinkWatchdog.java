package dev.sweepline.fsw.link;

/** The electronics' link watchdog of the hardware ICD (§4.1), a property of the link protocol, not of a cup. */
public final class LinkWatchdog {
    /**
     * The watchdog time T, microseconds (hardware ICD §4.1): with the HV on and no valid step frame
     * for 2 s after the reply to the last step, the electronics switch the HV off. A flying link never
     * leaves such a gap: in real time a re-send follows the reply deadline by the 20 ms margin (§4); on
     * the link-event clock a lost reply costs two waits of {@code --reply-wait-ms} (default 500 ms)
     * before the re-send. A dead host leaves the HV on for at most 2 s (design value).
     */
    public static final long TIMEOUT_MICROS = 2_000_000L;

    private LinkWatchdog() {
    }
}
