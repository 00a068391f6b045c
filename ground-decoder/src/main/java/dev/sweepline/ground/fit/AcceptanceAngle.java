package dev.sweepline.ground.fit;

/**
 * The flow angle beyond the split's reach from the total current's fall-off (physics.md, "What can say more
 * about the angle beyond the reach"). The summed spectrum fixes m = n·A(θ)/A(0); with a density carried from
 * an earlier spectrum ({@link DensityPrior}) the acceptance is A = m/n_prior, and the image shift s follows by
 * inverting the disc overlap, which falls monotonically from 1 at s = R_c − R to 0 at s = R_c + R. The axis
 * whose ratio is saturated takes tan θ_sat = √((s/d)² − tan²θ_other), the other keeps its ratio's angle
 * (both saturated: the diagonal). By linear propagation
 * <pre>
 *   σ_lnA² = σ_ln m² + σ_ln n_prior²,   σ_s = σ_lnA · A/|A′|,
 *   σ_tan,sat² = [(σ_s/d)(s/d)]² + [σ_tan,other · tan θ_other]²  over tan²θ_sat,   σθ = σ_tan/(1 + tan²θ)
 * </pre>
 * with A′ = dA/ds ({@link DiscOverlap#twoDiscAreaSlope}). An inverted angle within 3σ outside [reach, cut-off]
 * is clamped to the interval's edge (the saturated ratio places it inside); one further out (the density
 * changed, not the angle), an acceptance ≥ 1, or a 1σ no better than the interval's leaves the interval
 * estimate.
 */
final class AcceptanceAngle {
    /** How far outside [reach, cut-off], in its 1σ, an inverted angle still counts as consistent (common practice: 3σ). */
    static final double CONSISTENT_SIGMAS = 3.0;
    private AcceptanceAngle() {
    }

    /**
     * The angles of a beyond-reach spectrum given the fitted density {@code density} at the acceptance of
     * {@code interval} (the interval estimate) and its relative 1σ; {@code interval} itself when the prior
     * cannot improve it.
     */
    static FlowAngles fromDensity(CupGeometry cup, FlowAngles interval, double density, double sigmaLogDensity,
            DensityPrior prior) {
        if (prior == null || !interval.measured() || !(density > 0) || !Double.isFinite(sigmaLogDensity)) {
            return interval;
        }
        // the axes the estimator placed beyond the reach (a ratio within 3σ of ±1 counts as saturated there)
        double reach = FlowAngleEstimator.reachAngle(cup);
        boolean satX = Math.abs(interval.thetaXRad()) > reach;
        boolean satY = Math.abs(interval.thetaYRad()) > reach;
        if (!satX && !satY) {
            return interval;
        }
        // m = n A: the acceptance the prior's density implies
        double a = density * cup.transmission(interval.tanX(), interval.tanY()) / prior.densityPerM3();
        double sigmaLogA = Math.hypot(sigmaLogDensity, prior.sigmaLog());
        double s = cup.shiftOfTransmission(a);
        if (!Double.isFinite(s)) {
            return interval;
        }
        double slope = cup.transmissionSlope(s);
        if (!(slope < 0)) {
            return interval;
        }
        double d = cup.apertureToCollectorM();
        double tanTotal = s / d;
        double sigmaTanTotal = sigmaLogA * a / -slope / d;
        double tx;
        double ty;
        double sTx;
        double sTy;
        if (satX && satY) {
            tx = Math.copySign(tanTotal / Math.sqrt(2), interval.thetaXRad());
            ty = Math.copySign(tanTotal / Math.sqrt(2), interval.thetaYRad());
            sTx = sigmaTanTotal / Math.sqrt(2);
            sTy = sTx;
        } else {
            double other = satX ? interval.tanY() : interval.tanX();
            double sat2 = tanTotal * tanTotal - other * other;
            if (!(sat2 > 0)) {
                return interval;
            }
            double sat = Math.copySign(Math.sqrt(sat2), satX ? interval.thetaXRad() : interval.thetaYRad());
            double sigmaOther = (satX ? interval.sigmaThetaYRad() : interval.sigmaThetaXRad()) * (1 + other * other);
            // ∂tan θ_sat/∂(s/d) = (s/d)/tan θ_sat and ∂tan θ_sat/∂tan θ_other = −tan θ_other/tan θ_sat
            double sigmaSat = Math.hypot(sigmaTanTotal * tanTotal, sigmaOther * other) / Math.abs(sat);
            tx = satX ? sat : interval.tanX();
            ty = satX ? interval.tanY() : sat;
            sTx = satX ? sigmaSat : sigmaOther;
            sTy = satX ? sigmaOther : sigmaSat;
        }
        double thx = Math.atan(tx);
        double thy = Math.atan(ty);
        double sx = sTx / (1 + tx * tx);
        double sy = sTy / (1 + ty * ty);
        double cutOff = FlowAngleEstimator.cutOffAngle(cup);
        double satAngle = Math.abs(satX ? thx : thy);
        double satSigma = satX ? sx : sy;
        double intervalSigma = satX ? interval.sigmaThetaXRad() : interval.sigmaThetaYRad();
        if (!(satSigma < intervalSigma) || !Double.isFinite(sx) || !Double.isFinite(sy)
                || satAngle < reach - CONSISTENT_SIGMAS * satSigma || satAngle > cutOff + CONSISTENT_SIGMAS * satSigma) {
            return interval;
        }
        // within 3σ outside the interval: the saturated ratio says the angle is inside, so clamp to its edge
        double clamped = Math.copySign(Math.max(reach, Math.min(cutOff, satAngle)), satX ? thx : thy);
        return new FlowAngles(satX ? clamped : thx, satX ? thy : clamped, sx, sy, interval.ratioX(), interval.ratioY());
    }
}
