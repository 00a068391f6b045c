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
    /** |D| within this of 1 counts as saturated: D − 1 ~ (1 − u)^1.5, so 1e-9 is u within ~1e-6 of 1 (double rounding). */
    static final double SATURATION_MARGIN = 1e-9;
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
        // a ratio within 3σ of ±1 cannot be told from a saturated one (common practice: 3σ)
        double sx = Math.sqrt(varX) / total;
        double sy = Math.sqrt(varY) / total;
        double rx = Math.abs(dx) + 3 * sx >= 1 ? Math.copySign(1.0, dx) : dx;
        double ry = Math.abs(dy) + 3 * sy >= 1 ? Math.copySign(1.0, dy) : dy;
        return new FlowAngles(angle(cup, rx), angle(cup, ry), sigma(cup, rx, sx), sigma(cup, ry, sy), dx, dy);
    }

    /** True when either angle was taken from the beyond-reach interval (|θ| past the reach R/d). */
    static boolean beyondReach(FlowAngles a, CupGeometry cup) {
        double reach = reachAngle(cup);
        return a.measured() && (Math.abs(a.thetaXRad()) > reach || Math.abs(a.thetaYRad()) > reach);
    }

    /** True when a ratio is saturated: the image lies wholly on one half (u ≥ 1), beyond the split's reach. */
    static boolean saturated(double ratio) {
        return !(Math.abs(ratio) < 1 - SATURATION_MARGIN);
    }

    /**
     * Beyond the split's reach the ratio says only that the angle lies between the reach, tan θ = R/d, and
     * the cut-off, where the image leaves the collector, tan θ = (R_c + R)/d (the transmission A(θ)/A(0) of
     * {@link CupGeometry#transmission} falls to 0 there). On one spectrum the total current n·A(θ) cannot
     * separate the fall-off from the density, so the estimate is the middle of that interval and its 1σ
     * that of a uniform distribution over it, width/√12 (common practice): finite, and honest about it.
     */
    private static double beyondReachAngle(CupGeometry cup, double ratio) {
        return Math.copySign(0.5 * (reachAngle(cup) + cutOffAngle(cup)), ratio);
    }

    private static double beyondReachSigma(CupGeometry cup) {
        return (cutOffAngle(cup) - reachAngle(cup)) / Math.sqrt(12);
    }

    /** θ at which the image touches the split line from one side: tan θ = R/d. */
    static double reachAngle(CupGeometry cup) {
        return Math.atan(cup.tanOfShift(1.0));
    }

    /** θ at which the image leaves the collector: transmission 0, tan θ = (R_c + R)/d. */
    static double cutOffAngle(CupGeometry cup) {
        return Math.atan(cup.fullAcceptanceTan() + 2 * cup.tanOfShift(1.0));
    }

    /** θ of a half-difference ratio on {@code cup}; the beyond-reach middle when saturated. */
    static double angle(CupGeometry cup, double ratio) {
        if (saturated(ratio)) {
            return beyondReachAngle(cup, ratio);
        }
        return Math.atan(cup.tanOfShift(CupGeometry.inverseHalfDifference(ratio)));
    }

    /** 1σ of θ from the 1σ of its ratio (linear propagation through D⁻¹ and atan). */
    static double sigma(CupGeometry cup, double ratio, double sigmaRatio) {
        if (saturated(ratio)) {
            return beyondReachSigma(cup);
        }
        double u = CupGeometry.inverseHalfDifference(ratio);
        double slope = CupGeometry.halfDifferenceSlope(u);
        if (!(slope > 0)) {
            return beyondReachSigma(cup);
        }
        double t = cup.tanOfShift(u);
        return cup.tanOfShift(sigmaRatio / slope) / (1 + t * t);
    }
}
