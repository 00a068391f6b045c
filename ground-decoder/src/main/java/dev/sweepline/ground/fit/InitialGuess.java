package dev.sweepline.ground.fit;

/**
 * Start values for the proton fit from the spectrum itself: the window with the largest phase-space
 * density I/(qA v̄ Δv) gives U; the second moment of the density below the peak (one half of a
 * symmetric Maxwellian has the full variance w²/2) gives w, so that alphas above the peak do not inflate
 * it; the summed density Σ I/(qA v̄) gives n.
 */
final class InitialGuess {
    private InitialGuess() {
    }

    /** {n, U, w} in SI units, or null when no window has positive current. */
    static double[] protons(PlasmaModel m, double[] amps, double areaM2) {
        double[] g = new double[PlasmaModel.PROTON_PARAMETERS];
        return protons(m, amps, areaM2, g) ? g : null;
    }

    /** {n, U, w} in SI units into {@code out}; false (and {@code out} as it was) when no window has positive current. */
    static boolean protons(PlasmaModel m, double[] amps, double areaM2, double[] out) {
        double qA = Species.PROTON.chargeC() * areaM2;
        int best = -1;
        double bestF = 0;
        double density = 0;
        for (int j = 0; j < m.windows(); j++) {
            double v1 = m.protonThreshold(j, false);
            double v2 = m.protonThreshold(j, true);
            double vm = 0.5 * (v1 + v2);
            if (amps[j] <= 0 || vm <= 0 || v2 <= v1) {
                continue;
            }
            double g = amps[j] / (qA * vm);
            density += g;
            if (g / (v2 - v1) > bestF) {
                bestF = g / (v2 - v1);
                best = j;
            }
        }
        if (best < 0) {
            return false;
        }
        double u = 0.5 * (m.protonThreshold(best, false) + m.protonThreshold(best, true));
        double sum = 0;
        double sum2 = 0;
        for (int j = 0; j < m.windows(); j++) {
            double v1 = m.protonThreshold(j, false);
            double v2 = m.protonThreshold(j, true);
            double vm = 0.5 * (v1 + v2);
            if (amps[j] <= 0 || vm <= 0 || vm > u) {
                continue;
            }
            double g = amps[j] / (qA * vm);
            sum += g;
            sum2 += g * ((vm - u) * (vm - u) + (v2 - v1) * (v2 - v1) / 12);
        }
        double peakWidth = m.protonThreshold(best, true) - m.protonThreshold(best, false);
        double w = sum > 0 ? Math.sqrt(2 * sum2 / sum) : peakWidth;
        w = Math.max(w, 0.5 * peakWidth);
        out[0] = density;
        out[1] = u;
        out[2] = w;
        return true;
    }
}
