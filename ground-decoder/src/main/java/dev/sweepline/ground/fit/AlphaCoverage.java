package dev.sweepline.ground.fit;

/**
 * How much of the alpha distribution a window set holds, judged from the proton fit: alphas at the
 * protons' normal speed U_p (no drift) with T_α = 4 T_p ({@link AlphaPrior#TEMPERATURE_RATIO}), whose
 * thermal speed is then w_α = w_p √(4 m_p/m_α) ≈ w_p. The top window's alpha threshold v_top decides
 * (physics.md "Alpha particles": the alpha peak sits at the proton-equivalent speed 1.409 U):
 * <ul>
 *   <li>{@link #PEAK}: v_top &gt; U_p, the alpha peak is inside: the free joint fit; when that fit is not
 *       physical (a drifting alpha peak just above the top window, which the proton-only U_p cannot see),
 *       the constrained component.</li>
 *   <li>{@link #PART}: U_p − {@link #REACH_THERMAL} w_α &lt; v_top ≤ U_p: part of the alphas (from
 *       ½ erfc(3) = 1e-5 up to half of them) is in the band, the peak is not: the constrained component.</li>
 *   <li>{@link #NONE}: no alpha current to speak of: protons alone.</li>
 * </ul>
 */
enum AlphaCoverage {
    /** The alpha peak lies inside the windows. */
    PEAK,
    /** Part of the alpha distribution, not its peak, lies inside. */
    PART,
    /** The windows stop more than 3 alpha thermal speeds below the alpha peak. */
    NONE;

    /** Alpha thermal speeds below the peak from which the band counts as holding alphas (common practice: 3σ-like). */
    static final double REACH_THERMAL = 3.0;

    /** The coverage of {@code m}'s windows for proton parameters {@code p} (n, U, w). */
    static AlphaCoverage of(PlasmaModel m, double[] p) {
        double top = 0;
        for (int j = 0; j < m.windows(); j++) {
            top = Math.max(top, m.alphaThreshold(j, true));
        }
        if (top > p[1]) {
            return PEAK;
        }
        return top > p[1] - REACH_THERMAL * startThermalSpeed(p[2]) ? PART : NONE;
    }

    /** w_α of alphas at T_α = 4 T_p for a proton thermal speed {@code protonThermal}: w_p √(4 m_p/m_α). */
    static double startThermalSpeed(double protonThermal) {
        return protonThermal * Math.sqrt(AlphaPrior.TEMPERATURE_RATIO * Species.PROTON.massKg() / Species.ALPHA.massKg());
    }
}
