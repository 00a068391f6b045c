package dev.sweepline.ground.fit;

import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.GroundInstrument;
import java.util.Collections;
import java.util.EnumSet;

/**
 * Fits one spectrum: flow angles from the quadrants ({@link FlowAngleEstimator}), then the summed
 * spectrum by weighted Levenberg–Marquardt ({@link LeastSquaresRun}), first protons alone from
 * {@link InitialGuess}, then, where the windows reach the alpha peak, protons and alphas jointly. The
 * summed spectrum sees the normal speed U cos θ (physics.md, oblique flow) and the acceptance
 * A(θ)/A(0) of ICD §8; the bulk speed is U_n / cos θ. One fitter per cup geometry; immutable and
 * thread-safe.
 */
public final class SpectrumFitter {
    /** Fewest windows for the proton model: 3 parameters and one degree of freedom. */
    public static final int MIN_WINDOWS = PlasmaModel.PROTON_PARAMETERS + 1;
    /** Fewest windows for the joint model: 6 parameters and two degrees of freedom. */
    public static final int MIN_WINDOWS_JOINT = PlasmaModel.JOINT_PARAMETERS + 2;
    /** Summed current needed, in units of its 1σ (common practice: 5σ detection). */
    public static final double MIN_SNR = 5.0;
    /** Reduced χ² above which a fit is flagged POOR_FIT (common practice: an order of magnitude above 1). */
    public static final double POOR_FIT_REDUCED_CHI2 = 10.0;
    /** Largest n_α/n_p accepted from the joint fit: far above any solar wind (physics.md He/H: CME > 8.5 %). */
    public static final double MAX_ALPHA_RATIO = 0.5;
    /** Start of n_α/n_p when the residuals say nothing: He/H of slow wind, 2–4.5 % (physics.md). */
    public static final double DEFAULT_ALPHA_RATIO = 0.03;
    /** T_α/T_p at the start of the joint fit: T_α ≈ 4 T_p (physics.md [memory]). */
    public static final double START_ALPHA_TEMPERATURE_RATIO = 4.0;

    /**
     * Score (Rao) statistic below which the constrained fit is not tried: z = (∂χ²/∂n_α)/(2√F) at n_α = 0,
     * i.e. how many σ the proton fit's residuals lean toward an alpha component of the prior's shape. Under
     * H0 z is standard normal, so z ≤ 1 skips 84 % of alpha-free spectra (only lowering the false-alarm
     * rate) while any alpha current the likelihood-ratio test could accept leaves z well above 1 (common
     * practice: the score test screens before the likelihood-ratio fit; Rao 1948 [memory]).
     */
    static final double MIN_ALPHA_SCORE = 1.0;

    /** The test that admits the joint model: the 3 alpha parameters (n_α, U_α, w_α) free, α = 1 %. */
    private static final AlphaSelection FREE_ALPHAS = new AlphaSelection(3);

    private final CupGeometry cup;
    private final Solver solver;
    /** The models of the last spectrum, per thread (the fitter is shared between threads). */
    private final ThreadLocal<ModelCache> models = ThreadLocal.withInitial(ModelCache::new);

    /** A fitter for a cup of geometry {@code cup}. */
    public SpectrumFitter(CupGeometry cup) {
        this(cup, threadWorkspaces());
    }

    /** A fitter for {@code cup} whose least-squares runs are {@code solver}'s (the reference comparison's). */
    SpectrumFitter(CupGeometry cup, Solver solver) {
        this.cup = cup;
        this.solver = solver;
    }

    /**
     * One weighted least-squares run: the fitted outcome of {@code model} on the amps from the physical
     * start, with prior rows (null for none), or null when it does not converge.
     */
    interface Solver {
        LeastSquaresRun.Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical,
                AlphaPrior prior);
    }

    /** The default solver: {@link LevenbergMarquardt} with one workspace per thread, so the fitter stays thread-safe. */
    private static Solver threadWorkspaces() {
        ThreadLocal<LevenbergMarquardt> workspaces = ThreadLocal.withInitial(LevenbergMarquardt::new);
        return (model, amps, sigma, start, prior) -> LeastSquaresRun.fit(workspaces.get(), model, amps, sigma, start,
                prior);
    }

    /** A fitter for {@code instrument}'s cup. */
    public SpectrumFitter(GroundInstrument instrument) {
        this(CupGeometry.of(instrument));
    }

    /** A fitter for the demo cup, the default instrument (its built-in description). */
    public SpectrumFitter() {
        this(BuiltInInstruments.demoCup());
    }

    /** The cup this fitter models. */
    public CupGeometry cup() {
        return cup;
    }

    /** Fits {@code in}; never throws for bad data, flags it instead. */
    public PlasmaFit fit(SpectrumInput in) {
        return fit(in, null);
    }

    /**
     * Fits {@code in} with the density carried from an earlier spectrum inside the split's reach (null for
     * none): beyond the reach the angle then comes from the total current's fall-off ({@link AcceptanceAngle}).
     */
    public PlasmaFit fit(SpectrumInput in, DensityPrior densityPrior) {
        EnumSet<FitFlag> flags = EnumSet.noneOf(FitFlag.class);
        if (in.saturatedDropped() > 0) {
            flags.add(FitFlag.SATURATED_DROPPED);
        }
        int m = in.windows();
        if (m == 0 && in.uncalibratedDropped() > 0) {
            flags.add(FitFlag.NO_CALIBRATION);
            return PlasmaFit.failed(flags, m, FlowAngles.NONE, cup.effectiveAreaM2());
        }
        if (m < MIN_WINDOWS) {
            flags.add(FitFlag.TOO_FEW_WINDOWS);
            return PlasmaFit.failed(flags, m, FlowAngles.NONE, cup.effectiveAreaM2());
        }
        double signal = 0;
        double var = 0;
        for (int j = 0; j < m; j++) {
            signal += in.totalAmps()[j];
            var += in.sigmaAmps()[j] * in.sigmaAmps()[j];
        }
        if (!(signal > MIN_SNR * Math.sqrt(var))) {
            flags.add(FitFlag.NO_SIGNAL);
            return PlasmaFit.failed(flags, m, FlowAngles.NONE, cup.effectiveAreaM2());
        }
        FlowAngles preliminary = FlowAngleEstimator.estimate(in, cup);
        double area = cup.effectiveAreaM2() * cup.transmission(preliminary.tanX(), preliminary.tanY());
        if (!(area > 0)) {
            // the estimated image lies off the collector: nothing to scale the current by
            flags.add(FitFlag.NO_SIGNAL);
            angleFlags(preliminary, flags);
            return PlasmaFit.failed(flags, m, preliminary, cup.effectiveAreaM2());
        }
        ModelCache models = this.models.get();
        PlasmaModel protonModel = models.model(in.lowVolts(), in.highVolts(), area, false);
        double[] guess = InitialGuess.protons(protonModel, in.totalAmps(), area);
        if (guess == null) {
            flags.add(FitFlag.NO_SIGNAL);
            angleFlags(preliminary, flags);
            return PlasmaFit.failed(flags, m, preliminary, cup.effectiveAreaM2());
        }
        LeastSquaresRun.Outcome best = solver.fit(protonModel, in.totalAmps(), in.sigmaAmps(), guess, null);
        // no covariance means no errors: a product without errors is not a product
        if (best == null || !physical(best.parameters(), in) || !finiteErrors(best.covariance())) {
            flags.add(FitFlag.NO_CONVERGENCE);
            angleFlags(preliminary, flags);
            return PlasmaFit.failed(flags, m, preliminary, cup.effectiveAreaM2());
        }
        AlphaPrior prior = null;
        LeastSquaresRun.Outcome joint = null;
        PlasmaModel jointModel = null;
        if (m >= MIN_WINDOWS_JOINT) {
            jointModel = models.model(in.lowVolts(), in.highVolts(), area, true); // one for every joint try
            AlphaCoverage coverage = AlphaCoverage.of(protonModel, best.parameters());
            LeastSquaresRun.Outcome free = coverage == AlphaCoverage.PEAK
                    ? jointFit(in, area, protonModel, jointModel, best) : null;
            if (free != null) {
                // a physical free fit: the test alone decides, no second try
                joint = FREE_ALPHAS.accepts(best.chiSquare(), free.chiSquare()) ? free : null;
            } else if (coverage != AlphaCoverage.NONE && alphaScore(in, protonModel, best.parameters()) > MIN_ALPHA_SCORE) {
                // part of the alphas in the band, or a free fit that put the alpha peak outside it (a drifting
                // alpha peak just above the top window): the constrained component
                Constrained c = constrainedFit(in, protonModel, jointModel, best,
                        AlphaPrior.forProtonSpeed(best.parameters()[1]));
                if (c != null) {
                    prior = c.prior();
                    joint = c.outcome();
                }
            }
        }
        if (joint != null) {
            best = joint;
            if (prior != null) {
                flags.add(FitFlag.ALPHAS_CONSTRAINED);
            }
        } else {
            prior = null;
            flags.add(FitFlag.ALPHAS_NOT_FITTED);
        }
        FlowAngles angles = speciesAngles(in, preliminary, joint != null ? jointModel : protonModel,
                best.parameters());
        if (densityPrior != null && FlowAngleEstimator.beyondReach(angles, cup)) {
            double n = best.parameters()[0];
            double[][] c = best.covariance();
            angles = AcceptanceAngle.fromDensity(cup, angles, n, Math.sqrt(c[0][0]) / n, densityPrior);
        }
        double acceptance = cup.transmission(angles.tanX(), angles.tanY());
        if (acceptance > 0 && acceptance != area / cup.effectiveAreaM2()) {
            // beyond full acceptance the refined angle changes A(θ)/A(0), and n with it (I ∝ n A)
            best = best.withDensityScale(area / (cup.effectiveAreaM2() * acceptance));
            area = cup.effectiveAreaM2() * acceptance;
        }
        angleFlags(angles, flags);
        double sigmaLogArea = cup.sigmaLogTransmission(angles);
        if (!Double.isFinite(sigmaLogArea)) {
            // the image at the estimated angle is off the collector: no density can be scaled from the current
            flags.add(FitFlag.NO_SIGNAL);
            return PlasmaFit.failed(flags, m, angles, cup.effectiveAreaM2());
        }
        return compose(in, angles, area, best, flags, prior, sigmaLogArea);
    }

    /** The angle flags of {@code angles}. */
    private void angleFlags(FlowAngles angles, EnumSet<FitFlag> flags) {
        if (!angles.measured()) {
            flags.add(FitFlag.ANGLES_NOT_FITTED);
        } else if (Math.abs(angles.ratioX()) >= 1 || Math.abs(angles.ratioY()) >= 1
                || Math.hypot(angles.tanX(), angles.tanY()) > cup.fullAcceptanceTan()) {
            flags.add(FitFlag.ANGLE_OUT_OF_RANGE);
        }
        if (FlowAngleEstimator.beyondReach(angles, cup)) {
            flags.add(FitFlag.BEYOND_SPLIT_REACH);
        }
    }

    /**
     * The proton angles from each species' share of the quadrant differences ({@link SpeciesFlowAngles}),
     * with the fitted model's proton and alpha currents per window.
     */
    private FlowAngles speciesAngles(SpectrumInput in, FlowAngles preliminary, PlasmaModel model, double[] p) {
        if (!preliminary.measured()) {
            return preliminary;
        }
        int m = in.windows();
        double[] protons = new double[m];
        double[] alphas = model.withAlphas() ? new double[m] : null;
        for (int j = 0; j < m; j++) {
            protons[j] = model.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]);
            if (alphas != null) {
                alphas[j] = model.speciesCurrent(Species.ALPHA, j, p[3], p[4], p[5]);
            }
        }
        return SpeciesFlowAngles.refine(in, cup, preliminary, protons, alphas);
    }

    private static boolean physical(double[] p, SpectrumInput in) {
        return p[0] > 0 && p[2] > 0 && p[1] > LeastSquaresRun.MIN_SPEED && p[1] < LeastSquaresRun.MAX_SPEED;
    }

    /**
     * The free joint fit (n_α, U_α, w_α free), or null when it does not converge to physical values with the
     * alpha peak inside the windows; the selection test is the caller's.
     */
    private LeastSquaresRun.Outcome jointFit(SpectrumInput in, double area, PlasmaModel protonModel,
            PlasmaModel joint, LeastSquaresRun.Outcome protons) {
        double[] p = protons.parameters();
        double residual = 0;
        for (int j = 0; j < in.windows(); j++) {
            double va = 0.5 * (protonModel.alphaThreshold(j, false) + protonModel.alphaThreshold(j, true));
            if (Math.abs(va - p[1]) < 2 * p[2]) {
                residual += Math.max(0, in.totalAmps()[j] - protonModel.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]));
            }
        }
        double ratio = residual / (Species.ALPHA.chargeC() * area * p[1] * p[0]);
        if (!(ratio > 0.005 && ratio < 0.2)) {
            ratio = DEFAULT_ALPHA_RATIO;
        }
        double wAlpha = p[2] * Math.sqrt(START_ALPHA_TEMPERATURE_RATIO * Species.PROTON.massKg() / Species.ALPHA.massKg());
        double[] start = {p[0], p[1], p[2], ratio * p[0], p[1], wAlpha};
        LeastSquaresRun.Outcome o = solver.fit(joint, in.totalAmps(), in.sigmaAmps(), start, null);
        if (o == null || !physical(o.parameters(), in)) {
            return null;
        }
        double[] q = o.parameters();
        double alphaRatio = q[3] / q[0];
        double alphaPeakVolts = Species.ALPHA.voltsAtSpeed(q[4]);
        boolean sane = alphaRatio > 0 && alphaRatio < MAX_ALPHA_RATIO && q[4] > 0.7 * q[1] && q[4] < 1.5 * q[1]
                && alphaPeakVolts < max(in.highVolts());
        return sane && finiteErrors(o.covariance()) ? o : null;
    }

    /**
     * The score statistic z of an alpha component at the prior's shape (U_α = U_p, T_α = 4 T_p) on the proton
     * fit's residuals: Σ a_j r_j/σ_j² / √(Σ a_j²/σ_j²), a_j the alpha current per unit density ratio.
     */
    private static double alphaScore(SpectrumInput in, PlasmaModel protonModel, double[] p) {
        double wAlpha = AlphaCoverage.startThermalSpeed(p[2]);
        double lean = 0;
        double info = 0;
        for (int j = 0; j < in.windows(); j++) {
            double s2 = Math.max(in.sigmaAmps()[j], LeastSquaresRun.MIN_SIGMA_AMPS);
            s2 *= s2;
            double a = protonModel.speciesCurrent(Species.ALPHA, j, p[0], p[1], wAlpha);
            double r = in.totalAmps()[j] - protonModel.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]);
            lean += a * r / s2;
            info += a * a / s2;
        }
        return info > 0 ? lean / Math.sqrt(info) : 0;
    }

    /**
     * The constrained alpha component for windows that hold part of the alphas but not their peak: the
     * joint model with the {@code prior} rows, started from the proton fit and an alpha density that
     * explains the proton fit's positive residuals in the windows the alphas reach (alphas at U_p with
     * T_α = 4 T_p). Kept when physical and when the χ² drop passes {@link AlphaSelection} with k the
     * effective number of extra free parameters (3 less the prior's leverage). When the fit runs past
     * {@link #MAX_ALPHA_RATIO} (the n_α–U_α trade-off of a band that holds only the alphas' low tail), it is
     * tried once more with the abundance row ({@link AlphaPrior#withAbundance}), so alpha-free spectra, whose
     * constrained fit stays below the limit or is not tried, never pay for the third fit.
     */
    private Constrained constrainedFit(SpectrumInput in, PlasmaModel protonModel, PlasmaModel joint,
            LeastSquaresRun.Outcome protons, AlphaPrior prior) {
        double[] p = protons.parameters();
        double wAlpha = AlphaCoverage.startThermalSpeed(p[2]);
        double residual = 0;
        double unit = 0;
        for (int j = 0; j < in.windows(); j++) {
            if (protonModel.alphaThreshold(j, true) > p[1] - AlphaCoverage.REACH_THERMAL * wAlpha) {
                residual += Math.max(0, in.totalAmps()[j] - protonModel.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]));
                unit += protonModel.speciesCurrent(Species.ALPHA, j, p[0], p[1], wAlpha);
            }
        }
        double ratio = unit > 0 ? residual / unit : DEFAULT_ALPHA_RATIO;
        if (!(ratio > 0.005 && ratio < MAX_ALPHA_RATIO)) {
            ratio = DEFAULT_ALPHA_RATIO;
        }
        double[] start = {p[0], p[1], p[2], ratio * p[0], p[1], wAlpha};
        LeastSquaresRun.Outcome o = solver.fit(joint, in.totalAmps(), in.sigmaAmps(), start, prior);
        if (o == null || !physical(o.parameters(), in) || !finiteErrors(o.covariance())) {
            return null;
        }
        double[] q = o.parameters();
        double alphaRatio = q[3] / q[0];
        double extra = PlasmaModel.JOINT_PARAMETERS - PlasmaModel.PROTON_PARAMETERS - o.leverage();
        if (!(alphaRatio < MAX_ALPHA_RATIO)) {
            return prior.abundance() ? null : constrainedFit(in, protonModel, joint, protons, prior.withAbundance());
        }
        boolean sane = alphaRatio > 0 && q[4] > 0.7 * q[1] && q[4] < 1.5 * q[1]
                && extra > 0 && AlphaSelection.accepts(extra, protons.chiSquare(), o.totalChiSquare());
        return sane ? new Constrained(o, prior) : null;
    }

    /** A kept constrained fit and the prior it was fitted with. */
    private record Constrained(LeastSquaresRun.Outcome outcome, AlphaPrior prior) {
    }

    /** True when the covariance exists and every diagonal is positive and finite (errors can be reported). */
    private static boolean finiteErrors(double[][] cov) {
        if (cov == null) {
            return false;
        }
        for (int a = 0; a < cov.length; a++) {
            if (!(cov[a][a] > 0) || !Double.isFinite(cov[a][a])) {
                return false;
            }
        }
        return true;
    }

    private static double max(double[] a) {
        double x = Double.NEGATIVE_INFINITY;
        for (double v : a) {
            x = Math.max(x, v);
        }
        return x;
    }

    private static double min(double[] a) {
        double x = Double.POSITIVE_INFINITY;
        for (double v : a) {
            x = Math.min(x, v);
        }
        return x;
    }

    private static PlasmaFit compose(SpectrumInput in, FlowAngles angles, double area, LeastSquaresRun.Outcome o,
            EnumSet<FitFlag> flags, AlphaPrior prior, double sigmaLogArea) {
        double[] p = o.parameters();
        int np = p.length;
        // the data's degrees of freedom: windows less the parameters in effect (a prior pins some down)
        double dof = in.windows() - o.effectiveParameters();
        double chi2 = dof > 0 ? o.chiSquare() / dof : Double.NaN;
        if (chi2 > POOR_FIT_REDUCED_CHI2) {
            flags.add(FitFlag.POOR_FIT);
        }
        double peakVolts = Species.PROTON.voltsAtSpeed(p[1]);
        if (peakVolts < min(in.lowVolts()) || peakVolts > max(in.highVolts())) {
            flags.add(FitFlag.PEAK_OUTSIDE_WINDOWS);
        }
        SpeciesMoments protons = moments(Species.PROTON, p, o.covariance(), 0, angles, sigmaLogArea);
        SpeciesMoments alphas = np == PlasmaModel.JOINT_PARAMETERS
                ? moments(Species.ALPHA, p, o.covariance(), 3, angles, sigmaLogArea) : SpeciesMoments.NONE;
        return new PlasmaFit(protons, alphas, angles, chi2, in.windows(), o.iterations(),
                Collections.unmodifiableSet(flags), p.clone(), area, prior, sigmaLogArea);
    }

    /**
     * The moments of species {@code k} with their 1σ: n's 1σ is the fit's (area fixed) and the angle's part
     * n·σ_lnA added in quadrature (physics.md, "Density and speed beyond the split's reach"; the alphas share
     * the protons' acceptance, an approximation where their drift shifts their image); U's carries the
     * angles' 1σ ({@link FlowAngles#sigmaBulkSpeed}).
     */
    private static SpeciesMoments moments(Species s, double[] p, double[][] cov, int k, FlowAngles angles,
            double sigmaLogArea) {
        double tx = angles.tanX();
        double ty = angles.tanY();
        double sec = 1 / CupGeometry.cosOfFlow(tx, ty);
        double n = p[k];
        double un = p[k + 1];
        double w = p[k + 2];
        double t = s.temperature(w);
        if (cov == null) {
            return new SpeciesMoments(n, un * sec, w, t, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double sn = Math.hypot(Math.sqrt(cov[k][k]), n * sigmaLogArea);
        double sun = Math.sqrt(cov[k + 1][k + 1]);
        double sw = Math.sqrt(cov[k + 2][k + 2]);
        return new SpeciesMoments(n, un * sec, w, t, sn, angles.sigmaBulkSpeed(un, sun), sw, 2 * t * sw / w);
    }
}
