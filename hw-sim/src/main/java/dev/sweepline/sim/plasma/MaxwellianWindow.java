package dev.sweepline.sim.plasma;

/**
 * One evaluation of {@link ConvectedMaxwellian}'s window current, kept for the window's sensitivities at
 * the same plasma: the speeds it was evaluated at (bulk and thermal speed along the normal, the window's
 * edge speeds) and the two terms the current and the sensitivities share, the error-function difference
 * and e1 - e2. {@link ConvectedMaxwellian#relativeSensitivities(double, double, double, double, double,
 * double, double, MaxwellianWindow, double[])} takes them from here only when it is asked for exactly
 * those four speeds (the same doubles, bit for bit), so the terms are the doubles it would compute itself.
 *
 * <p>Mutable, refilled by each evaluation; not thread-safe.
 */
public final class MaxwellianWindow {
    double uNormal = Double.NaN;
    double w = Double.NaN;
    double v1 = Double.NaN;
    double v2 = Double.NaN;
    double erfDifference;
    double expDifference;

    /** Holds no evaluation (every later comparison fails). */
    public void clear() {
        uNormal = Double.NaN;
        w = Double.NaN;
        v1 = Double.NaN;
        v2 = Double.NaN;
    }

    /** True when this holds the evaluation at exactly these speeds (the same doubles, none NaN). */
    boolean isAt(double uNormal, double w, double v1, double v2) {
        return same(this.uNormal, uNormal) && same(this.w, w) && same(this.v1, v1) && same(this.v2, v2);
    }

    private static boolean same(double a, double b) {
        return a == b && Double.doubleToRawLongBits(a) == Double.doubleToRawLongBits(b);
    }

    void set(double uNormal, double w, double v1, double v2, double erfDifference, double expDifference) {
        this.uNormal = uNormal;
        this.w = w;
        this.v1 = v1;
        this.v2 = v2;
        this.erfDifference = erfDifference;
        this.expDifference = expDifference;
    }
}
