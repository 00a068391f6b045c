package dev.sweepline.fsw.link;

/**
 * Fixed properties of the demo instrument's electronics (hardware ICD; the values are an invented
 * parameter set, see physics.md "The demo instrument").
 */
public final class InstrumentConstants {
    /** Collector quadrants. */
    public static final int QUADRANTS = 4;
    /** Preamplifier gain ranges; each range's full scale is {@link #RANGE_RATIO} times the last. */
    public static final int GAIN_RANGES = 3;
    /** Full-scale ratio between neighbouring gain ranges (physics.md, noise and gain ranging). */
    public static final int RANGE_RATIO = 32;
    /** log2 of {@link #RANGE_RATIO}, for shifts. */
    public static final int RANGE_RATIO_SHIFT = 5;
    /** Highest ADC code (16-bit unsigned). */
    public static final int ADC_MAX_COUNTS = 65535;
    /** ADC code of zero current; keeps negative noise excursions on scale. */
    public static final int ADC_PEDESTAL_COUNTS = 256;
    /** Highest HV DAC code (16-bit). */
    public static final int DAC_MAX_CODE = 65535;
    /** Nominal HV DAC scale: 0.1 V per code, so code 60000 is 6000 V (the calibration refines it). */
    public static final int DAC_MILLIVOLTS_PER_CODE = 100;
    /** Modulation period of the grid (square wave), microseconds: 1 kHz chopping (common practice). */
    public static final int MODULATION_PERIOD_MICROS = 1000;
    /**
     * Full scale of gain range 0 in femtoamperes (40 pA; physics.md, gain ranging). Range r has
     * full scale {@code FULL_SCALE_RANGE0_FEMTOAMPS << (5 r)}.
     */
    public static final long FULL_SCALE_RANGE0_FEMTOAMPS = 40_000L;
    /**
     * The electronics' link watchdog, microseconds (hardware ICD §4.1): with the HV on and no valid step
     * frame for 2 s after the reply to the last step, the electronics switch the HV off. A flying link
     * never leaves such a gap: in real time a re-send follows the reply deadline by the 20 ms margin
     * (§4); on the link-event clock a lost reply costs two waits of {@code --reply-wait-ms} (default
     * 500 ms) before the re-send. A dead host leaves the HV on for at most 2 s (design value).
     */
    public static final long LINK_WATCHDOG_MICROS = 2_000_000L;

    private InstrumentConstants() {
    }
}
