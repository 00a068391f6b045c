package dev.sweepline.ground.bound;

import dev.sweepline.ground.fit.AlphaPrior;
import dev.sweepline.ground.fit.PlasmaModel;
import java.util.Arrays;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Fisher information of a window set under independent Gaussian noise,
 * F_ab = Σ_j (∂I_j/∂θ_a)(∂I_j/∂θ_b)/σ_j², and its inverse, the Cramér–Rao bound Cov(θ̂) ≥ F⁻¹
 * (physics.md, after Kay 1993). F is scaled to a unit diagonal before it is inverted, so that the
 * condition number compares like with like across parameters of different units.
 */
public final class FisherMatrix {
    /** Scaled condition number above which F counts as singular (common practice: ~1/√ε of a double). */
    public static final double SINGULAR_CONDITION = 1e12;

    private FisherMatrix() {
    }

    /**
     * F from a Jacobian [window][parameter] and per-window 1σ. Each term J_ja J_jb w_j is the same product
     * either way round (multiplication commutes in IEEE 754 arithmetic), so F is symmetric to the bit: the
     * lower triangle is summed and mirrored.
     */
    public static double[][] information(double[][] jacobian, double[] sigma) {
        int np = jacobian.length == 0 ? 0 : jacobian[0].length;
        double[][] f = new double[np][np];
        for (int j = 0; j < jacobian.length; j++) {
            double w = 1 / (sigma[j] * sigma[j]);
            double[] row = jacobian[j];
            for (int a = 0; a < np; a++) {
                double[] fa = f[a];
                double ra = row[a];
                for (int b = 0; b <= a; b++) {
                    fa[b] += ra * row[b] * w;
                }
            }
        }
        for (int a = 0; a < np; a++) {
            for (int b = a + 1; b < np; b++) {
                f[a][b] = f[b][a];
            }
        }
        return f;
    }

    /**
     * The bound of a Fisher matrix; singular when a diagonal is 0 or the scaled condition is too large.
     *
     * <p>S, F scaled to a unit diagonal, is decomposed by Hipparchus' SingularValueDecomposition, S = U Σ Vᵀ;
     * cond = σ_max/σ_min. Its solver's inverse is V Σ⁻¹ Uᵀ, each σ_k above its cut-off (np σ_max 2⁻⁵², at least
     * 2⁻⁵¹¹) giving 1/σ_k: below {@link #SINGULAR_CONDITION} every σ_k is above it (σ_min &gt; 10⁻¹² σ_max and
     * σ_max ≥ tr S/np = 1), so (S⁻¹)_aa = Σ_k V_ak (U_ak · (1/σ_k)), summed over k upwards from 0 as the solver's
     * matrix product sums, is taken here without the solver's transpose, copies and full product: the same bits
     * ({@code FisherMatrixBitsTest}, against the solver).
     */
    public static CramerRaoBound bound(double[][] f) {
        int np = f.length;
        double[] scale = new double[np];
        for (int a = 0; a < np; a++) {
            if (!(f[a][a] > 0) || !Double.isFinite(f[a][a])) {
                return new CramerRaoBound(nan(np), true, Double.POSITIVE_INFINITY);
            }
            scale[a] = 1 / Math.sqrt(f[a][a]);
        }
        double[][] s = new double[np][np];
        for (int a = 0; a < np; a++) {
            for (int b = 0; b < np; b++) {
                s[a][b] = f[a][b] * scale[a] * scale[b];
                if (!Double.isFinite(s[a][b])) {
                    return new CramerRaoBound(nan(np), true, Double.POSITIVE_INFINITY);
                }
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(s, false));
        double cond = svd.getConditionNumber();
        if (!(cond < SINGULAR_CONDITION)) {
            return new CramerRaoBound(nan(np), true, cond);
        }
        RealMatrix u = svd.getU();
        RealMatrix v = svd.getV();
        double[] singularValues = svd.getSingularValues();
        double[] sigma = new double[np];
        for (int a = 0; a < np; a++) {
            double inverseDiagonal = 0;
            for (int k = 0; k < np; k++) {
                inverseDiagonal += v.getEntry(a, k) * (u.getEntry(a, k) * (1 / singularValues[k]));
            }
            sigma[a] = Math.sqrt(inverseDiagonal) * scale[a];
        }
        return new CramerRaoBound(sigma, false, cond);
    }

    private static double[] nan(int np) {
        double[] nan = new double[np];
        Arrays.fill(nan, Double.NaN);
        return nan;
    }

    /** The bound of a model at {@code parameters} (physical) with per-window 1σ. */
    public static CramerRaoBound bound(PlasmaModel model, double[] parameters, double[] sigma) {
        double[] cur = new double[model.windows()];
        double[][] jac = new double[model.windows()][model.parameters()];
        model.evaluate(parameters, cur, jac);
        return bound(information(jac, sigma));
    }

    /**
     * The bound of the joint model with a constrained alpha component: F of the windows plus the prior's
     * information Σ g gᵀ ({@link AlphaPrior#information}); the Bayesian form of the bound, the inverse of
     * the data's and the prior's information together (Van Trees 1968, Detection, Estimation and Modulation
     * Theory Part I §2.4 [memory]). {@code prior} null gives {@link #bound(PlasmaModel, double[], double[])}.
     */
    public static CramerRaoBound bound(PlasmaModel model, double[] parameters, double[] sigma, AlphaPrior prior) {
        if (prior == null) {
            return bound(model, parameters, sigma);
        }
        double[] cur = new double[model.windows()];
        double[][] jac = new double[model.windows()][model.parameters()];
        model.evaluate(parameters, cur, jac);
        double[][] f = information(jac, sigma);
        double[][] fp = prior.information(parameters);
        for (int a = 0; a < fp.length; a++) { // the alpha rows only: a drift model's ΔU (last) has no prior information
            for (int b = 0; b < fp.length; b++) {
                f[a][b] += fp[a][b];
            }
        }
        return bound(f);
    }

    /**
     * The proton bound of (n, U, w) for any window set: edges in volts, 1σ per window (A), effective
     * area (m²), n (m⁻³), U along the normal (m/s), w (m/s).
     */
    public static CramerRaoBound protons(double[] lowVolts, double[] highVolts, double[] sigma, double areaM2,
            double densityPerM3, double speedMPerS, double thermalSpeedMPerS) {
        PlasmaModel m = new PlasmaModel(lowVolts, highVolts, areaM2, false);
        return bound(m, new double[] {densityPerM3, speedMPerS, thermalSpeedMPerS}, sigma);
    }
}
