package dev.sweepline.sim.plasma;

/**
 * {@link ConvectedMaxwellian}'s window current and relative sensitivities of one population over a fixed
 * set of window edges, with what belongs to an edge evaluated once per edge: its normal speed (once, at
 * construction), and for each bulk and thermal speed x = (v - U)/w, the error function's
 * {@link ErrorFunction#kernel kernel} and exp(-x^2). Adjacent windows that share an edge (the high edge
 * of one is the low edge of the next) so share its error function and exponential; what remains per
 * window is the difference of the exponentials (one expm1) and arithmetic.
 *
 * <p>Exactness: every value is the double {@link ConvectedMaxwellian#windowCurrent} and
 * {@link ConvectedMaxwellian#relativeSensitivities} give for the same population and the edges' speeds
 * (the same operations on the same operands; {@code MaxwellianEdgesTest}).
 *
 * <p>Not thread-safe (the per-edge values of the last {@link #set}); allocation-free after construction.
 */
public final class MaxwellianEdges {
    private final IonSpecies species;
    private final double chargeCoulomb;
    private final double[] speeds;
    private final double[] x;
    private final double[] kernel;
    private final double[] gauss;
    private double uNormal = Double.NaN;
    private double w = Double.NaN;

    /** The edges {@code edgeVolts} (grid voltages, volts) for ions of {@code species}. */
    public MaxwellianEdges(double[] edgeVolts, IonSpecies species) {
        int n = edgeVolts.length;
        this.species = species;
        this.chargeCoulomb = species.chargeCoulomb();
        this.speeds = new double[n];
        this.x = new double[n];
        this.kernel = new double[n];
        this.gauss = new double[n];
        for (int k = 0; k < n; k++) {
            speeds[k] = ConvectedMaxwellian.speedForVoltage(edgeVolts[k], species.massKg(), species.chargeCoulomb());
        }
    }

    /** The ions' species. */
    public IonSpecies species() {
        return species;
    }

    /** Number of edges. */
    public int count() {
        return speeds.length;
    }

    /** Normal speed of edge {@code k}, metres per second. */
    public double speed(int k) {
        return speeds[k];
    }

    /**
     * The population's bulk speed along the normal {@code uNormal} and thermal speed along the normal
     * {@code w} (metres per second) from now on: every edge's x, kernel and exp(-x^2) evaluated.
     */
    public void set(double uNormal, double w) {
        this.uNormal = uNormal;
        this.w = w;
        for (int k = 0; k < speeds.length; k++) {
            double xk = (speeds[k] - uNormal) / w;
            x[k] = xk;
            kernel[k] = ErrorFunction.kernel(xk);
            gauss[k] = Math.exp(-xk * xk);
        }
    }

    /**
     * Current of the window from edge {@code low} to edge {@code high} for density {@code nPerM3} and
     * effective area {@code areaM2}: {@link ConvectedMaxwellian#windowCurrent} at the edges' speeds, amperes.
     */
    public double windowCurrent(double nPerM3, double areaM2, int low, int high) {
        double v1 = speeds[low];
        double v2 = speeds[high];
        double x1 = x[low];
        double x2 = x[high];
        double erfDiff = ErrorFunction.difference(x1, x2, kernel[low], kernel[high]);
        double expDiff = ConvectedMaxwellian.expDifference(x1, x2, (v2 - v1) / w, (v1 + v2 - 2 * uNormal) / w,
                gauss[low], gauss[high]);
        return ConvectedMaxwellian.current(chargeCoulomb, nPerM3, areaM2, uNormal, w, v1, v2, erfDiff, expDiff);
    }

    /**
     * The relative sensitivities n dI/dn, U dI/dU and w dI/dw of the window from edge {@code low} to edge
     * {@code high}, into {@code out3}: {@link ConvectedMaxwellian#relativeSensitivities} at the edges' speeds.
     */
    public void relativeSensitivities(double nPerM3, double areaM2, int low, int high, double[] out3) {
        double x1 = x[low];
        double x2 = x[high];
        double erfDiff = ErrorFunction.difference(x1, x2, kernel[low], kernel[high]);
        ConvectedMaxwellian.relativeSensitivities(chargeCoulomb, nPerM3, areaM2, uNormal, w, speeds[low], speeds[high],
                x1, x2, erfDiff, gauss[low], gauss[high], out3);
    }
}
