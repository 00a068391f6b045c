package dev.sweepline.ground.fit;

import java.util.Collections;
import java.util.EnumSet;
import java.util.Set;

/**
 * Result of fitting one spectrum. Moments are NaN when a failure flag is set.
 *
 * @param protons          proton moments (bulk speed along the flow)
 * @param alphas           alpha moments, {@link SpeciesMoments#NONE} unless fitted
 * @param angles           flow angles
 * @param reducedChiSquare χ² / (windows − parameters); NaN on failure
 * @param windowsUsed      windows in the fit
 * @param iterations       optimiser iterations
 * @param flags            flags (unmodifiable)
 * @param normalParameters physical parameters of the model along the normal (n_p, U_p cos θ, w_p[, n_α,
 *                         U_α cos θ, w_α][, ΔU cos θ]), for the bound and the plots; empty on failure. ΔU, last, is
 *                         the normal speed's change over an interleaved sweep (a 4th or 7th parameter;
 *                         {@link PlasmaModel#withDrift}); the speeds are then the mid-sweep ones
 * @param areaM2           effective area times acceptance used by the model, m²
 * @param alphaPrior       the prior rows of a constrained alpha component ({@link FitFlag#ALPHAS_CONSTRAINED}),
 *                         null otherwise; the bound of the fit adds their information
 * @param sigmaLogArea     1σ of ln A(θ) from the angles' 1σ ({@link CupGeometry#sigmaLogTransmission}): the
 *                         density's relative 1σ from the angle, in its 1σ and its bound; 0 inside full
 *                         acceptance and on failure
 * @param speedChangeMPerS      the bulk speed's change over the sweep ΔU, m/s: the normal change over cos θ,
 *                              as |U_p| is from U_p cos θ; NaN unless {@link #driftFitted}
 * @param sigmaSpeedChangeMPerS 1σ of ΔU from the fit covariance with the angles' 1σ propagated, as U_p's
 *                              ({@link FlowAngles#sigmaBulkSpeed}); NaN unless {@link #driftFitted}
 */
public record PlasmaFit(SpeciesMoments protons, SpeciesMoments alphas, FlowAngles angles, double reducedChiSquare,
        int windowsUsed, int iterations, Set<FitFlag> flags, double[] normalParameters, double areaM2,
        AlphaPrior alphaPrior, double sigmaLogArea, double speedChangeMPerS, double sigmaSpeedChangeMPerS) {

    /** A failed fit with these flags on a cup of effective area {@code areaM2}. */
    public static PlasmaFit failed(EnumSet<FitFlag> flags, int windows, FlowAngles angles, double areaM2) {
        return new PlasmaFit(SpeciesMoments.NONE, SpeciesMoments.NONE, angles, Double.NaN, windows, 0,
                Collections.unmodifiableSet(flags), new double[0], areaM2, null, 0.0, Double.NaN, Double.NaN);
    }

    /** A failed fit with these flags and no cup (area NaN): nothing was fitted, so no model is drawn. */
    public static PlasmaFit failed(EnumSet<FitFlag> flags, int windows, FlowAngles angles) {
        return failed(flags, windows, angles, Double.NaN);
    }

    /** The same fit with one more flag. */
    public PlasmaFit withFlag(FitFlag flag) {
        EnumSet<FitFlag> f = flags.isEmpty() ? EnumSet.noneOf(FitFlag.class) : EnumSet.copyOf(flags);
        f.add(flag);
        return new PlasmaFit(protons, alphas, angles, reducedChiSquare, windowsUsed, iterations,
                Collections.unmodifiableSet(f), normalParameters, areaM2, alphaPrior, sigmaLogArea, speedChangeMPerS,
                sigmaSpeedChangeMPerS);
    }

    /** True unless a failure flag is set. */
    public boolean ok() {
        for (FitFlag f : flags) {
            if (f.failure()) {
                return false;
            }
        }
        return true;
    }

    /** True when the joint proton + alpha model was fitted. */
    public boolean alphasFitted() {
        return alphasIn(normalParameters.length);
    }

    /** True when the speed's change over the sweep ΔU was fitted (an interleaved spectrum): the last parameter. */
    public boolean driftFitted() {
        return driftIn(normalParameters.length);
    }

    /** The normal speed's change over the sweep, ΔU cos θ, m/s; NaN unless {@link #driftFitted}. */
    public double normalSpeedChangeMPerS() {
        return driftFitted() ? normalParameters[normalParameters.length - 1] : Double.NaN;
    }

    /** True when a fit of {@code parameters} normal parameters holds the alphas: 6, or 7 with ΔU. */
    static boolean alphasIn(int parameters) {
        return parameters == PlasmaModel.JOINT_PARAMETERS || parameters == PlasmaModel.JOINT_PARAMETERS + 1;
    }

    /** True when a fit of {@code parameters} normal parameters holds ΔU: 4 or 7. */
    static boolean driftIn(int parameters) {
        return parameters == PlasmaModel.PROTON_PARAMETERS + 1 || parameters == PlasmaModel.JOINT_PARAMETERS + 1;
    }

    /** Flags as a '|'-separated list of names, empty when none. */
    public String flagText() {
        StringBuilder b = new StringBuilder();
        for (FitFlag f : FitFlag.values()) {
            if (flags.contains(f)) {
                b.append(b.length() == 0 ? "" : "|").append(f.name());
            }
        }
        return b.toString();
    }
}
