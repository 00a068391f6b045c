package dev.sweepline.ground.fit;

/**
 * The reference case of physics.md "Cramér–Rao bound": protons n = 5 cm⁻³, U = 400 km/s, T = 1e5 K,
 * A = 1 cm², σ = 10 fA, "14 log-spaced windows around the peak". The window set that reproduces the
 * figures of physics.md to their digits: 15 log-spaced edges from the E/q of U − 3.5w to that of U + 3.5w
 * (346.89 V .. 1534.58 V, one window spans a ratio of 1.1122). Found by a scan with python3/numpy of the
 * bound over window families (see the bound package note).
 */
public final class ReferenceCase {
    /** n, m⁻³ (physics.md). */
    public static final double DENSITY = 5e6;
    /** U, m/s (physics.md). */
    public static final double SPEED = 400e3;
    /** T, K (physics.md). */
    public static final double TEMPERATURE = 1e5;
    /** σ per window, A: 10 fA (physics.md). */
    public static final double SIGMA = 10e-15;
    /** A, m²: 1 cm² (physics.md). */
    public static final double AREA = 1e-4;
    /** Windows (physics.md). */
    public static final int WINDOWS = 14;
    /** Half-span of the windows in thermal speeds around U (the choice that reproduces physics.md). */
    public static final double HALF_SPAN_THERMAL = 3.5;

    private ReferenceCase() {
    }

    /** w = √(2kT/m_p), m/s; 40.6310 km/s (physics.md table). */
    public static double thermalSpeed() {
        return Species.PROTON.thermalSpeed(TEMPERATURE);
    }

    /** The 15 edges, volts. */
    public static double[] edges() {
        double lo = Species.PROTON.voltsAtSpeed(SPEED - HALF_SPAN_THERMAL * thermalSpeed());
        double hi = Species.PROTON.voltsAtSpeed(SPEED + HALF_SPAN_THERMAL * thermalSpeed());
        double[] e = new double[WINDOWS + 1];
        for (int i = 0; i <= WINDOWS; i++) {
            e[i] = lo * Math.pow(hi / lo, i / (double) WINDOWS);
        }
        return e;
    }

    /** Low edges. */
    public static double[] low() {
        return java.util.Arrays.copyOfRange(edges(), 0, WINDOWS);
    }

    /** High edges. */
    public static double[] high() {
        return java.util.Arrays.copyOfRange(edges(), 1, WINDOWS + 1);
    }

    /** Noise-free currents, A. */
    public static double[] currents() {
        PlasmaModel m = new PlasmaModel(low(), high(), AREA, false);
        double[] i = new double[WINDOWS];
        m.evaluate(new double[] {DENSITY, SPEED, thermalSpeed()}, i, null);
        return i;
    }
}
