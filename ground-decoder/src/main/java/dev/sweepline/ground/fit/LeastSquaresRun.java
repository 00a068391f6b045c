package dev.sweepline.ground.fit;


/**
 * One weighted Levenberg–Marquardt fit of a {@link PlasmaModel} ({@link LevenbergMarquardt}). The optimiser works in
 * (ln n, U, ln w) per species, so that densities and thermal speeds stay positive; the covariance
 * (JᵀWJ)⁻¹ is mapped back to physical parameters. A joint fit may carry an {@link AlphaPrior}: its rows
 * are appended to the window rows as whitened pseudo-observations (target 0, weight 1), so that the
 * optimiser minimises χ²_data + χ²_prior and the covariance is (F_data + F_prior)⁻¹.
 */
final class LeastSquaresRun {
    /** Iterations allowed: a converging fit of this model needs well under 50 (measured on the tests). */
    static final int MAX_ITERATIONS = 200;
    /** Model evaluations allowed. */
    static final int MAX_EVALUATIONS = 400;
    /** Smallest 1σ used as a weight, A: guards against a zero noise estimate. */
    static final double MIN_SIGMA_AMPS = 1e-18;
    /** Bounds of the speed while iterating, m/s: a guard, far outside any solar wind. */
    static final double MIN_SPEED = 1e3;
    static final double MAX_SPEED = 1e7;

    /**
     * The outcome. Made by a solver and then read only, or, as a slot of a fitter's per-thread workspace
     * ({@link #Outcome(int)}), filled again by every fit ({@link #outcomeInto}) so that a fit allocates nothing.
     */
    static final class Outcome {
        private final double[] parameters;
        private final double[][] covariance;
        private boolean hasCovariance;
        private double chiSquare;
        private int iterations;
        private double priorChiSquare;
        private double leverage;

        /**
         * @param parameters physical parameters
         * @param covariance physical covariance, or null when singular
         * @param chiSquare  Σ (r_j/σ_j)² over the windows
         * @param iterations iterations used
         * @param priorChiSquare the prior rows' part of the minimised χ², 0 without a prior
         * @param leverage   parameters the prior pins down ({@link AlphaPrior#leverage}), 0 without a prior
         */
        Outcome(double[] parameters, double[][] covariance, double chiSquare, int iterations, double priorChiSquare,
                double leverage) {
            this.parameters = parameters;
            this.covariance = covariance == null ? new double[parameters.length][parameters.length] : covariance;
            this.hasCovariance = covariance != null;
            this.chiSquare = chiSquare;
            this.iterations = iterations;
            this.priorChiSquare = priorChiSquare;
            this.leverage = leverage;
        }

        /** An empty slot for a model of {@code np} parameters, filled by {@link #outcomeInto} or {@link #copyFrom}. */
        Outcome(int np) {
            this(new double[np], new double[np][np], Double.NaN, 0, 0, 0);
        }

        double[] parameters() {
            return parameters;
        }

        /** The physical covariance, or null when singular. */
        double[][] covariance() {
            return hasCovariance ? covariance : null;
        }

        double chiSquare() {
            return chiSquare;
        }

        int iterations() {
            return iterations;
        }

        double priorChiSquare() {
            return priorChiSquare;
        }

        double leverage() {
            return leverage;
        }

        /** The minimised χ²: windows and prior rows. */
        double totalChiSquare() {
            return chiSquare + priorChiSquare;
        }

        /**
         * The same fit with every density times {@code factor}: the window currents are linear in n·A, so a
         * change of the acceptance A(θ)/A(0) by 1/factor leaves the fit as it is but for n (and its
         * covariance rows).
         */
        Outcome withDensityScale(double factor) {
            Outcome o = new Outcome(parameters.length);
            o.scaledFrom(this, factor);
            return o;
        }

        /** This slot made {@code from} with every density times {@code factor} ({@link #withDensityScale}). */
        void scaledFrom(Outcome from, double factor) {
            copyFrom(from);
            for (int a = 0; a < parameters.length; a++) {
                parameters[a] *= density(a) ? factor : 1;
                for (int b = 0; b < parameters.length; b++) {
                    covariance[a][b] *= (density(a) ? factor : 1) * (density(b) ? factor : 1);
                }
            }
        }

        /**
         * True when parameter {@code a} is a density: the first of each species' (n, U, w); a drift fit's ΔU,
         * last of 4 or 7, is not.
         */
        private boolean density(int a) {
            return a % 3 == 0 && !(parameters.length % 3 == 1 && a == parameters.length - 1);
        }

        /** This slot a copy of {@code from}, a fit of as many parameters. */
        void copyFrom(Outcome from) {
            int np = parameters.length;
            if (from.parameters.length != np) {
                throw new IllegalArgumentException("outcome of " + from.parameters.length
                        + " parameters copied into a slot of " + np);
            }
            System.arraycopy(from.parameters, 0, parameters, 0, np);
            for (int a = 0; a < np; a++) {
                System.arraycopy(from.covariance[a], 0, covariance[a], 0, np);
            }
            hasCovariance = from.hasCovariance;
            chiSquare = from.chiSquare;
            iterations = from.iterations;
            priorChiSquare = from.priorChiSquare;
            leverage = from.leverage;
        }

        /** Free parameters in effect: the model's count less what the prior pins down. */
        double effectiveParameters() {
            return parameters.length - leverage;
        }
    }

    private LeastSquaresRun() {
    }

    private static boolean isLog(int a) {
        return a % 3 != 1;
    }

    /** Fits; returns null when the optimiser fails to converge or leaves finite numbers. */
    static Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical) {
        return fit(model, amps, sigma, startPhysical, null);
    }

    /** Fits with {@code prior} rows (joint model only; null for none), with a workspace of its own. */
    static Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical, AlphaPrior prior) {
        return fit(new LevenbergMarquardt(), model, amps, sigma, startPhysical, prior);
    }

    /** Fits in the workspace {@code lm}; null when it fails to converge or leaves no finite numbers. */
    static Outcome fit(LevenbergMarquardt lm, PlasmaModel model, double[] amps, double[] sigma,
            double[] startPhysical, AlphaPrior prior) {
        if (!lm.fit(model, amps, sigma, startPhysical, prior)) {
            return null;
        }
        return outcome(lm, prior);
    }

    /** The outcome of {@code lm}'s last successful fit, with the prior's part of χ² and its leverage. */
    static Outcome outcome(LevenbergMarquardt lm, AlphaPrior prior) {
        Outcome o = new Outcome(lm.parameterCount());
        outcomeInto(lm, prior, o);
        return o;
    }

    /** {@link #outcome} into the slot {@code into} (of {@code lm}'s parameter count), allocating nothing. */
    static void outcomeInto(LevenbergMarquardt lm, AlphaPrior prior, Outcome into) {
        int np = lm.parameterCount();
        double[] out = into.parameters;
        System.arraycopy(lm.parameters(), 0, out, 0, np);
        into.hasCovariance = lm.hasCovariance();
        if (into.hasCovariance) {
            for (int a = 0; a < np; a++) {
                System.arraycopy(lm.covariance(), a * np, into.covariance[a], 0, np);
            }
        }
        double priorChi2 = prior == null ? 0 : prior.chiSquare(out, lm.priorResidual(), lm.priorGradient());
        double leverage = prior == null || !into.hasCovariance ? 0
                : prior.leverage(out, into.covariance, lm.priorResidual(), lm.priorGradient());
        into.chiSquare = lm.chiSquare() - priorChi2;
        into.iterations = lm.iterations();
        into.priorChiSquare = priorChi2;
        into.leverage = leverage;
    }
}
