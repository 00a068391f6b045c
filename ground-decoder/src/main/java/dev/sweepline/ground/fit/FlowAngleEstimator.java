package dev.sweepline.ground.fit;

/**
 * Flow angles from the four quadrants (physics.md, split collector): the current-weighted ratios over the
 * spectrum D_x = Σ[(Q1+Q4) − (Q2+Q3)] / ΣQ and D_y = Σ[(Q1+Q2) − (Q3+Q4)] / ΣQ, inverted with
 * tan θ = (R/d)·D⁻¹(D). A half-plane split depends only on the shift across its line, so D_x is exactly
 * D(u_x) for the disc image even when it is also shifted in y. 1σ by linear propagation of the quadrant
 * noise: ∂D/∂Q_qj = (s_q − D)/ΣQ with s_q = ±1.
 */
public final class FlowAngleEstimator {
    /** Minimum summed current, in units of its 1σ, for an angle estimate (common practice: 5σ). */
    public static final double MIN_SNR = 5.0;
    private static final int[] SIGN_X = {1, -1, -1, 1};
    private static final int[] SIGN_Y = {1, 1, -1, -1};

    private FlowAngleEstimator() {
    }

    /**
     * The angles on a cup of geometry {@code cup}, or {@link FlowAngles#NONE} when there are no quadrants or
     * too little current.
     */
    public static FlowAngles estimate(SpectrumInput in, CupGeometry cup) {
        if (!in.hasQuadrants() || in.windows() == 0) {
            return FlowAngles.NONE;
        }
        double total = 0;
        double x = 0;
        double y = 0;
        double var = 0;
        double[][] q = in.quadrantAmps();
        for (int j = 0; j < in.windows(); j++) {
            for (int k = 0; k < 4; k++) {
                total += q[k][j];
                x += SIGN_X[k] * q[k][j];
                y += SIGN_Y[k] * q[k][j];
                var += in.quadrantSigmaAmps()[k][j] * in.quadrantSigmaAmps()[k][j];
            }
        }
        if (!(total > MIN_SNR * Math.sqrt(var))) {
            return FlowAngles.NONE;
        }
        double dx = x / total;
        double dy = y / total;
        double varX = 0;
        double varY = 0;
        for (int j = 0; j < in.windows(); j++) {
            for (int k = 0; k < 4; k++) {
                double s2 = in.quadrantSigmaAmps()[k][j] * in.quadrantSigmaAmps()[k][j];
                varX += (SIGN_X[k] - dx) * (SIGN_X[k] - dx) * s2;
                varY += (SIGN_Y[k] - dy) * (SIGN_Y[k] - dy) * s2;
            }
        }
        return new FlowAngles(angle(cup, dx), angle(cup, dy), sigma(cup, dx, Math.sqrt(varX) / total),
                sigma(cup, dy, Math.sqrt(varY) / total), dx, dy);
    }

    private static double angle(CupGeometry cup, double ratio) {
        return Math.atan(cup.tanOfShift(CupGeometry.inverseHalfDifference(ratio)));
    }

    private static double sigma(CupGeometry cup, double ratio, double sigmaRatio) {
        double u = CupGeometry.inverseHalfDifference(ratio);
        double slope = CupGeometry.halfDifferenceSlope(u);
        if (slope <= 0) {
            return Double.NaN;
        }
        double t = cup.tanOfShift(u);
        return cup.tanOfShift(sigmaRatio / slope) / (1 + t * t);
    }
}
