package dev.sweepline.ground.spectrum;

/**
 * Outcome of decoding one spectrum packet: a spectrum, or an error with a detail text.
 *
 * @param spectrum the spectrum, or null on error
 * @param error    null on success
 * @param detail   what was wrong, for listings; empty on success
 */
public record SpectrumResult(DecodedSpectrum spectrum, SpectrumError error, String detail) {
    /** A success. */
    public static SpectrumResult ok(DecodedSpectrum s) {
        return new SpectrumResult(s, null, "");
    }

    /** A failure. */
    public static SpectrumResult fail(SpectrumError e, String detail) {
        return new SpectrumResult(null, e, detail);
    }

    /** True on success. */
    public boolean isOk() {
        return error == null;
    }
}
