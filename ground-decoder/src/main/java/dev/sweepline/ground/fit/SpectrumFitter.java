package dev.sweepline.ground.fit;

import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.GroundInstrument;
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
    /** The models of the last spectrum and the fit's slots, per thread (the fitter is shared between threads). */
    private final ThreadLocal<Workspace> workspaces = ThreadLocal.withInitial(Workspace::new);

    /**
     * What one thread's fits reuse: the models of the last spectrum, the start vectors, an outcome slot per
     * least-squares run of a fit and the holder behind {@link #fit(SpectrumInput, DensityPrior)}.
     */
    private static final class Workspace {
        final ModelCache models = new ModelCache();
        final double[] guess = new double[PlasmaModel.PROTON_PARAMETERS];
        final double[] start = new double[PlasmaModel.JOINT_PARAMETERS];
        final LeastSquaresRun.Outcome protons = new LeastSquaresRun.Outcome(PlasmaModel.PROTON_PARAMETERS);
        final LeastSquaresRun.Outcome warmProtons = new LeastSquaresRun.Outcome(PlasmaModel.PROTON_PARAMETERS);
        /** The marker of a proton run that did not converge. */
        final LeastSquaresRun.Outcome none = new LeastSquaresRun.Outcome(PlasmaModel.PROTON_PARAMETERS);
        final LeastSquaresRun.Outcome free = new LeastSquaresRun.Outcome(PlasmaModel.JOINT_PARAMETERS);
        final LeastSquaresRun.Outcome constrained = new LeastSquaresRun.Outcome(PlasmaModel.JOINT_PARAMETERS);
        final LeastSquaresRun.Outcome scaledProtons = new LeastSquaresRun.Outcome(PlasmaModel.PROTON_PARAMETERS);
        final LeastSquaresRun.Outcome scaledJoint = new LeastSquaresRun.Outcome(PlasmaModel.JOINT_PARAMETERS);
        final double[] driftStart = new double[PlasmaModel.JOINT_PARAMETERS + 1];
        final LeastSquaresRun.Outcome driftProtons = new LeastSquaresRun.Outcome(PlasmaModel.PROTON_PARAMETERS + 1);
        final LeastSquaresRun.Outcome driftJoint = new LeastSquaresRun.Outcome(PlasmaModel.JOINT_PARAMETERS + 1);
        final LeastSquaresRun.Outcome scaledDriftProtons = new LeastSquaresRun.Outcome(PlasmaModel.PROTON_PARAMETERS + 1);
        final LeastSquaresRun.Outcome scaledDriftJoint = new LeastSquaresRun.Outcome(PlasmaModel.JOINT_PARAMETERS + 1);
        final MutablePlasmaFit result = new MutablePlasmaFit();
        /** The prior of the constrained alpha fit, set per spectrum ({@link AlphaPrior#setForProtonSpeed}). */
        final AlphaPrior prior = new AlphaPrior(0, 1, false);
    }

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

        /** The same run into the slot {@code into} (of the model's parameter count); false when it does not converge. */
        default boolean fitInto(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical,
                AlphaPrior prior, LeastSquaresRun.Outcome into) {
            LeastSquaresRun.Outcome o = fit(model, amps, sigma, startPhysical, prior);
            if (o == null) {
                return false;
            }
            into.copyFrom(o);
            return true;
        }
    }

    /** The default solver: {@link LevenbergMarquardt} with one workspace per thread, so the fitter stays thread-safe. */
    private static Solver threadWorkspaces() {
        return new ThreadSolver();
    }

    /** {@link LevenbergMarquardt} with one workspace per thread; {@link #fitInto} allocates nothing. */
    private static final class ThreadSolver implements Solver {
        private final ThreadLocal<LevenbergMarquardt> workspaces = ThreadLocal.withInitial(LevenbergMarquardt::new);

        @Override
        public LeastSquaresRun.Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] start,
                AlphaPrior prior) {
            return LeastSquaresRun.fit(workspaces.get(), model, amps, sigma, start, prior);
        }

        @Override
        public boolean fitInto(PlasmaModel model, double[] amps, double[] sigma, double[] start, AlphaPrior prior,
                LeastSquaresRun.Outcome into) {
            LevenbergMarquardt lm = workspaces.get();
            if (!lm.fit(model, amps, sigma, start, prior)) {
                return false;
            }
            LeastSquaresRun.outcomeInto(lm, prior, into);
            return true;
        }
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
        MutablePlasmaFit holder = workspaces.get().result;
        fitInto(in, densityPrior, holder);
        return holder.toPlasmaFit();
    }

    /**
     * Fits {@code in} into {@code out}, as {@link #fit(SpectrumInput, DensityPrior)} (the same values bit for
     * bit), allocating nothing after warm-up on spectra without quadrants or density prior and on the
     * proton-only path (see the package note for what still allocates). With {@code out}'s warm start on and a
     * previous good solution in it, the proton fit starts from that solution; when that run fails, is not
     * physical, or ends with a reduced χ² above {@link #POOR_FIT_REDUCED_CHI2}, the fit starts again from
     * {@link InitialGuess} and keeps the lower χ² of the two. Never throws for bad data, flags it instead.
     */
    public void fitInto(SpectrumInput in, DensityPrior densityPrior, MutablePlasmaFit out) {
        Workspace ws = workspaces.get();
        EnumSet<FitFlag> flags = out.flags;
        int m = in.windows();
        out.reset(m);
        if (in.saturatedDropped() > 0) {
            flags.add(FitFlag.SATURATED_DROPPED);
        }
        if (m == 0 && in.uncalibratedDropped() > 0) {
            flags.add(FitFlag.NO_CALIBRATION);
            out.failed(FlowAngles.NONE, cup.effectiveAreaM2());
            return;
        }
        if (m < MIN_WINDOWS) {
            flags.add(FitFlag.TOO_FEW_WINDOWS);
            out.failed(FlowAngles.NONE, cup.effectiveAreaM2());
            return;
        }
        double signal = 0;
        double var = 0;
        for (int j = 0; j < m; j++) {
            signal += in.totalAmps()[j];
            var += in.sigmaAmps()[j] * in.sigmaAmps()[j];
        }
        if (!(signal > MIN_SNR * Math.sqrt(var))) {
            flags.add(FitFlag.NO_SIGNAL);
            out.failed(FlowAngles.NONE, cup.effectiveAreaM2());
            return;
        }
        FlowAngles preliminary = FlowAngleEstimator.estimate(in, cup);
        double area = cup.effectiveAreaM2() * cup.transmission(preliminary.tanX(), preliminary.tanY());
        if (!(area > 0)) {
            // the estimated image lies off the collector: nothing to scale the current by
            flags.add(FitFlag.NO_SIGNAL);
            angleFlags(preliminary, flags);
            out.failed(preliminary, cup.effectiveAreaM2());
            return;
        }
        ModelCache models = ws.models;
        PlasmaModel protonModel = models.model(in.lowVolts(), in.highVolts(), area, false);
        LeastSquaresRun.Outcome best = protonFit(in, protonModel, area, ws, out);
        if (best == null) {
            flags.add(FitFlag.NO_SIGNAL);
            angleFlags(preliminary, flags);
            out.failed(preliminary, cup.effectiveAreaM2());
            return;
        }
        // no covariance means no errors: a product without errors is not a product
        if (best == ws.none || !physical(best.parameters(), in) || !finiteErrors(best.covariance())) {
            out.hasLast = false;
            flags.add(FitFlag.NO_CONVERGENCE);
            angleFlags(preliminary, flags);
            out.failed(preliminary, cup.effectiveAreaM2());
            return;
        }
        if (out.warmStart()) {
            System.arraycopy(best.parameters(), 0, out.lastProtons, 0, PlasmaModel.PROTON_PARAMETERS);
            out.hasLast = true;
        }
        AlphaPrior prior = null;
        LeastSquaresRun.Outcome joint = null;
        PlasmaModel jointModel = null;
        if (m >= MIN_WINDOWS_JOINT) {
            jointModel = models.model(in.lowVolts(), in.highVolts(), area, true); // one for every joint try
            AlphaCoverage coverage = AlphaCoverage.of(protonModel, best.parameters());
            LeastSquaresRun.Outcome free = coverage == AlphaCoverage.PEAK
                    ? jointFit(in, area, protonModel, jointModel, best, ws) : null;
            if (free != null) {
                // a physical free fit: the test alone decides, no second try
                joint = FREE_ALPHAS.accepts(best.chiSquare(), free.chiSquare()) ? free : null;
            } else if (coverage != AlphaCoverage.NONE && alphaScore(in, protonModel, best.parameters()) > MIN_ALPHA_SCORE) {
                // part of the alphas in the band, or a free fit that put the alpha peak outside it (a drifting
                // alpha peak just above the top window): the constrained component
                ws.prior.setForProtonSpeed(best.parameters()[1]);
                if (constrainedFit(in, protonModel, jointModel, best, ws.prior, ws)) {
                    prior = ws.prior;
                    joint = ws.constrained;
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
        PlasmaModel fitted = joint != null ? jointModel : protonModel;
        if (in.interleaved()) {
            PlasmaModel driftModel = models.model(in.lowVolts(), in.highVolts(), area, joint != null, in.stepFraction());
            LeastSquaresRun.Outcome drift = driftFit(in, driftModel, best, prior, ws);
            if (drift != null) {
                best = drift;
                fitted = driftModel;
            }
        }
        FlowAngles angles = speciesAngles(in, preliminary, fitted, best.parameters());
        if (densityPrior != null && FlowAngleEstimator.beyondReach(angles, cup)) {
            double n = best.parameters()[0];
            double[][] c = best.covariance();
            angles = AcceptanceAngle.fromDensity(cup, angles, n, Math.sqrt(c[0][0]) / n, densityPrior);
        }
        double acceptance = cup.transmission(angles.tanX(), angles.tanY());
        if (acceptance > 0 && acceptance != area / cup.effectiveAreaM2()) {
            // beyond full acceptance the refined angle changes A(θ)/A(0), and n with it (I ∝ n A)
            LeastSquaresRun.Outcome scaled = switch (best.parameters().length) {
                case PlasmaModel.JOINT_PARAMETERS -> ws.scaledJoint;
                case PlasmaModel.PROTON_PARAMETERS -> ws.scaledProtons;
                case PlasmaModel.JOINT_PARAMETERS + 1 -> ws.scaledDriftJoint;
                default -> ws.scaledDriftProtons;
            };
            scaled.scaledFrom(best, area / (cup.effectiveAreaM2() * acceptance));
            best = scaled;
            area = cup.effectiveAreaM2() * acceptance;
        }
        angleFlags(angles, flags);
        double sigmaLogArea = cup.sigmaLogTransmission(angles);
        if (!Double.isFinite(sigmaLogArea)) {
            // the image at the estimated angle is off the collector: no density can be scaled from the current
            flags.add(FitFlag.NO_SIGNAL);
            out.failed(angles, cup.effectiveAreaM2());
            return;
        }
        compose(in, angles, area, best, prior, sigmaLogArea, out);
    }

    /**
     * The proton-only fit into the workspace's slot: from {@code out}'s last solution when its warm start is on
     * and that run is good, else from {@link InitialGuess}; null when the guess finds no positive current,
     * {@code ws.none} when the run does not converge.
     */
    private LeastSquaresRun.Outcome protonFit(SpectrumInput in, PlasmaModel protonModel, double area, Workspace ws,
            MutablePlasmaFit out) {
        if (out.warmStart() && out.hasLast) {
            LeastSquaresRun.Outcome warm = ws.warmProtons;
            boolean warmGood = solver.fitInto(protonModel, in.totalAmps(), in.sigmaAmps(), out.lastProtons, null, warm)
                    && physical(warm.parameters(), in) && finiteErrors(warm.covariance());
            if (warmGood
                    && warm.chiSquare() <= POOR_FIT_REDUCED_CHI2 * (in.windows() - PlasmaModel.PROTON_PARAMETERS)) {
                out.warmStarted = true;
                return warm;
            }
            // a failed or poor warm start: the cold start decides, keeping the lower χ² of the two
            LeastSquaresRun.Outcome cold = coldProtonFit(in, protonModel, area, ws);
            if (warmGood && (cold == null || cold == ws.none || warm.chiSquare() < cold.chiSquare())) {
                out.warmStarted = true;
                return warm;
            }
            return cold;
        }
        return coldProtonFit(in, protonModel, area, ws);
    }

    /** The proton fit from {@link InitialGuess}: null without a guess, {@code ws.none} when it does not converge. */
    private LeastSquaresRun.Outcome coldProtonFit(SpectrumInput in, PlasmaModel protonModel, double area,
            Workspace ws) {
        if (!InitialGuess.protons(protonModel, in.totalAmps(), area, ws.guess)) {
            return null;
        }
        return solver.fitInto(protonModel, in.totalAmps(), in.sigmaAmps(), ws.guess, null, ws.protons)
                ? ws.protons : ws.none;
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
        double du = model.withDrift() ? p[model.driftIndex()] : 0;
        for (int j = 0; j < m; j++) {
            protons[j] = model.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2], du);
            if (alphas != null) {
                alphas[j] = model.speciesCurrent(Species.ALPHA, j, p[3], p[4], p[5], du);
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
            PlasmaModel joint, LeastSquaresRun.Outcome protons, Workspace ws) {
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
        double[] start = startVector(ws.start, p, ratio, wAlpha);
        LeastSquaresRun.Outcome o = ws.free;
        if (!solver.fitInto(joint, in.totalAmps(), in.sigmaAmps(), start, null, o) || !physical(o.parameters(), in)) {
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
    private boolean constrainedFit(SpectrumInput in, PlasmaModel protonModel, PlasmaModel joint,
            LeastSquaresRun.Outcome protons, AlphaPrior prior, Workspace ws) {
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
        double[] start = startVector(ws.start, p, ratio, wAlpha);
        LeastSquaresRun.Outcome o = ws.constrained;
        if (!solver.fitInto(joint, in.totalAmps(), in.sigmaAmps(), start, prior, o) || !physical(o.parameters(), in)
                || !finiteErrors(o.covariance())) {
            return false;
        }
        double[] q = o.parameters();
        double alphaRatio = q[3] / q[0];
        double extra = PlasmaModel.JOINT_PARAMETERS - PlasmaModel.PROTON_PARAMETERS - o.leverage();
        if (!(alphaRatio < MAX_ALPHA_RATIO)) {
            if (prior.abundance()) {
                return false;
            }
            // the workspace's prior, with the abundance row added (AlphaPrior#withAbundance)
            prior.set(prior.driftMeanMPerS(), prior.driftSigmaMPerS(), true);
            return constrainedFit(in, protonModel, joint, protons, prior, ws);
        }
        boolean sane = alphaRatio > 0 && q[4] > 0.7 * q[1] && q[4] < 1.5 * q[1]
                && extra > 0 && AlphaSelection.accepts(extra, protons.chiSquare(), o.totalChiSquare());
        return sane;
    }

    /**
     * The fit of an interleaved spectrum with the speed's change over the sweep, ΔU, as one more parameter
     * ({@link PlasmaModel#withDrift}): the chosen model (protons, or protons and alphas with the chosen fit's
     * prior rows) started from its solution and ΔU = 0, so the drift fit holds the chosen one and its χ² can
     * only fall. Null when the windows leave the drift model no degree of freedom (as {@link #MIN_WINDOWS} keeps
     * one for the protons), or when it does not converge to physical values with finite errors and ΔU inside its
     * guard ±{@link PlasmaModel#MAX_SPEED_CHANGE} (a run held at the guard found no minimum): the chosen fit stays.
     */
    private LeastSquaresRun.Outcome driftFit(SpectrumInput in, PlasmaModel driftModel, LeastSquaresRun.Outcome chosen,
            AlphaPrior prior, Workspace ws) {
        double[] p = chosen.parameters();
        int np = p.length;
        if (in.windows() <= driftModel.parameters()) {
            return null;
        }
        System.arraycopy(p, 0, ws.driftStart, 0, np);
        ws.driftStart[np] = 0;
        LeastSquaresRun.Outcome o = np == PlasmaModel.JOINT_PARAMETERS ? ws.driftJoint : ws.driftProtons;
        if (!solver.fitInto(driftModel, in.totalAmps(), in.sigmaAmps(), ws.driftStart, prior, o)
                || !physical(o.parameters(), in) || !finiteErrors(o.covariance())
                || !(Math.abs(o.parameters()[np]) < PlasmaModel.MAX_SPEED_CHANGE)) {
            return null;
        }
        return o;
    }

    /** The joint start (n_p, U_p, w_p, ratio·n_p, U_p, w_α) from the proton fit {@code p}, into {@code s}. */
    private static double[] startVector(double[] s, double[] p, double ratio, double wAlpha) {
        s[0] = p[0];
        s[1] = p[1];
        s[2] = p[2];
        s[3] = ratio * p[0];
        s[4] = p[1];
        s[5] = wAlpha;
        return s;
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

    private static void compose(SpectrumInput in, FlowAngles angles, double area, LeastSquaresRun.Outcome o,
            AlphaPrior prior, double sigmaLogArea, MutablePlasmaFit out) {
        double[] p = o.parameters();
        int np = p.length;
        // the data's degrees of freedom: windows less the parameters in effect (a prior pins some down)
        double dof = in.windows() - o.effectiveParameters();
        double chi2 = dof > 0 ? o.chiSquare() / dof : Double.NaN;
        if (chi2 > POOR_FIT_REDUCED_CHI2) {
            out.flags.add(FitFlag.POOR_FIT);
        }
        double peakVolts = Species.PROTON.voltsAtSpeed(p[1]);
        if (peakVolts < min(in.lowVolts()) || peakVolts > max(in.highVolts())) {
            out.flags.add(FitFlag.PEAK_OUTSIDE_WINDOWS);
        }
        moments(Species.PROTON, p, o.covariance(), 0, angles, sigmaLogArea, out.protons);
        if (PlasmaFit.alphasIn(np)) {
            moments(Species.ALPHA, p, o.covariance(), 3, angles, sigmaLogArea, out.alphas);
        }
        out.angles = angles;
        out.reducedChiSquare = chi2;
        out.iterations = o.iterations();
        System.arraycopy(p, 0, out.normalParameters, 0, np);
        out.parameterCount = np;
        out.areaM2 = area;
        out.hasPrior = prior != null;
        if (prior != null) {
            out.alphaPrior.set(prior.driftMeanMPerS(), prior.driftSigmaMPerS(), prior.abundance());
        }
        out.sigmaLogArea = sigmaLogArea;
        if (PlasmaFit.driftIn(np)) {
            // ΔU along the flow as U_p is (moments): the normal value over cos θ, its 1σ with the angles' 1σ
            double du = p[np - 1];
            out.speedChangeMPerS = du / CupGeometry.cosOfFlow(angles.tanX(), angles.tanY());
            out.sigmaSpeedChangeMPerS = o.covariance() == null ? Double.NaN
                    : angles.sigmaBulkSpeed(du, Math.sqrt(o.covariance()[np - 1][np - 1]));
        }
    }

    /**
     * The moments of species {@code k} with their 1σ: n's 1σ is the fit's (area fixed) and the angle's part
     * n·σ_lnA added in quadrature (physics.md, "Density and speed beyond the split's reach"; the alphas share
     * the protons' acceptance, an approximation where their drift shifts their image); U's carries the
     * angles' 1σ ({@link FlowAngles#sigmaBulkSpeed}).
     */
    private static void moments(Species s, double[] p, double[][] cov, int k, FlowAngles angles,
            double sigmaLogArea, double[] out) {
        double tx = angles.tanX();
        double ty = angles.tanY();
        double sec = 1 / CupGeometry.cosOfFlow(tx, ty);
        double n = p[k];
        double un = p[k + 1];
        double w = p[k + 2];
        double t = s.temperature(w);
        out[0] = n;
        out[1] = un * sec;
        out[2] = w;
        out[3] = t;
        if (cov == null) {
            java.util.Arrays.fill(out, 4, MutablePlasmaFit.MOMENTS, Double.NaN);
            return;
        }
        double sn = Math.hypot(Math.sqrt(cov[k][k]), n * sigmaLogArea);
        double sun = Math.sqrt(cov[k + 1][k + 1]);
        double sw = Math.sqrt(cov[k + 2][k + 2]);
        out[4] = sn;
        out[5] = angles.sigmaBulkSpeed(un, sun);
        out[6] = sw;
        out[7] = 2 * t * sw / w;
    }
}
