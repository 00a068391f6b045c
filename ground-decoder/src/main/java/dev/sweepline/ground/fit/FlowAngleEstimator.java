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

    /** The angles, or {@link FlowAngles#NONE} when there are no quadrants or too little current. */
    public static FlowAngles estimate(SpectrumInput in) {
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
        return new FlowAngles(angle(dx), angle(dy), sigma(dx, Math.sqrt(varX) / total),
                sigma(dy, Math.sqrt(varY) / total), dx, dy);
    }

    private static double angle(double ratio) {
        return Math.atan(CupGeometry.tanOfShift(CupGeometry.inverseHalfDifference(ratio)));
    }

    private static double sigma(double ratio, double sigmaRatio) {
        double u = CupGeometry.inverseHalfDifference(ratio);
        double slope = CupGeometry.halfDifferenceSlope(u);
        if (slope <= 0) {
            return Double.NaN;
        }
        double t = CupGeometry.tanOfShift(u);
        return CupGeometry.tanOfShift(sigmaRatio / slope) / (1 + t * t);
    }
}
