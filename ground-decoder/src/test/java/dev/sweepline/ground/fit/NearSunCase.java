package dev.sweepline.ground.fit;

/**
 * The near-Sun case of physics.md "Solar wind": near 0.05 AU, n 3000–4300 cm⁻³, U 250–350 km/s, T_p
 * 4e5–1e6 K, U/w near 3; He/H a few % (2–4.5 % in slow wind); T_α ≈ 4 T_p. Here n = 3600 cm⁻³,
 * U = 300 km/s, T_p = 6e5 K (U/w = 3.0), He/H 3 %, T_α = 2.4e6 K, no drift; all 128 windows of the default
 * table with their calibrated edges (ICD §8); the noise model of ICD §8 with the lowest gain range whose
 * full scale exceeds 1.25 × the quadrant current (physics.md gain ranging: switch up above ~80 %),
 * 4 ms integration, normal incidence (each quadrant a quarter of the current).
 */
final class NearSunCase {
    static final double N_P = 3600e6;
    static final double U = 300e3;
    static final double T_P = 6e5;
    static final double ALPHA_RATIO = 0.03;
    static final double T_A = 4 * T_P;
    static final int PERIODS = 4;

    private NearSunCase() {
    }

    static double[] truth() {
        return new double[] {N_P, U, Species.PROTON.thermalSpeed(T_P), ALPHA_RATIO * N_P, U,
            Species.ALPHA.thermalSpeed(T_A)};
    }

    static double[] low() {
        double[] v = new double[DemoCup.TABLE.windows()];
        for (int w = 0; w < v.length; w++) {
            v[w] = DemoCup.TABLE.lowVolts(w);
        }
        return v;
    }

    static double[] high() {
        double[] v = new double[DemoCup.TABLE.windows()];
        for (int w = 0; w < v.length; w++) {
            v[w] = DemoCup.TABLE.highVolts(w);
        }
        return v;
    }

    static double[] currents() {
        double[] i = new double[DemoCup.TABLE.windows()];
        new PlasmaModel(low(), high(), DemoCup.CUP.effectiveAreaM2(), true).evaluate(truth(), i, null);
        return i;
    }

    static int range(double quadrantAmps) {
        for (int r = 0; r < 2; r++) {
            if (Math.abs(quadrantAmps) * 1.25 < DemoCup.NOISE.fullScaleAmps(r)) {
                return r;
            }
        }
        return 2;
    }

    /** 1σ of the summed current of each window: four independent quadrants (ICD §8). */
    static double[] sigma(double[] currents) {
        double[] s = new double[currents.length];
        for (int j = 0; j < s.length; j++) {
            double q = currents[j] / 4;
            s[j] = Math.sqrt(4 * DemoCup.NOISE.quadrantVariance(q, range(q), PERIODS));
        }
        return s;
    }
}
