package dev.sweepline.ground.fit;

import dev.sweepline.ground.special.ErrorFunction;

/**
 * Window current of a convected Maxwellian along the cup normal and its derivatives (physics.md,
 * "Window current of a convected Maxwellian"): with x_i = (v_i − U)/w and e_i = exp(−x_i²),
 * <pre>
 *   I     = q n A [ (U/2)(erf x2 − erf x1) + (w/(2√π))(e1 − e2) ]
 *   ∂I/∂n = I/n
 *   ∂I/∂U = q n A [ ½(erf x2 − erf x1) + (v1 e1 − v2 e2)/(w√π) ]
 *   ∂I/∂w = q n A [ (x1 v1 e1 − x2 v2 e2)/(w√π) + (e1 − e2)/(2√π) ]
 * </pre>
 * The erf difference uses {@link ErrorFunction#difference(double, double)}, which keeps its precision
 * where both arguments lie deep in one tail (far windows) and allocates nothing.
 */
public final class WindowCurrent {
    /** Index of I in the output of {@link #evaluate}. */
    public static final int VALUE = 0;
    /** Index of ∂I/∂n. */
    public static final int D_DENSITY = 1;
    /** Index of ∂I/∂U. */
    public static final int D_SPEED = 2;
    /** Index of ∂I/∂w. */
    public static final int D_THERMAL = 3;

    private WindowCurrent() {
    }

    /**
     * Current of particles with normal speed between {@code v1} and {@code v2} (m/s).
     *
     * @param chargeAreaC q × A, C·m²
     */
    public static double current(double chargeAreaC, double densityPerM3, double speedMPerS,
            double thermalSpeedMPerS, double v1, double v2) {
        double x1 = (v1 - speedMPerS) / thermalSpeedMPerS;
        double x2 = (v2 - speedMPerS) / thermalSpeedMPerS;
        double e1 = Math.exp(-x1 * x1);
        double e2 = Math.exp(-x2 * x2);
        return chargeAreaC * densityPerM3 * (0.5 * speedMPerS * ErrorFunction.difference(x1, x2)
                + thermalSpeedMPerS / (2 * PlasmaConstants.SQRT_PI) * (e1 - e2));
    }

    /** Writes I, ∂I/∂n, ∂I/∂U, ∂I/∂w into {@code out[0..3]} (indices {@link #VALUE} ...). */
    public static void evaluate(double chargeAreaC, double densityPerM3, double speedMPerS,
            double thermalSpeedMPerS, double v1, double v2, double[] out) {
        double w = thermalSpeedMPerS;
        double x1 = (v1 - speedMPerS) / w;
        double x2 = (v2 - speedMPerS) / w;
        double e1 = Math.exp(-x1 * x1);
        double e2 = Math.exp(-x2 * x2);
        combine(chargeAreaC, densityPerM3, speedMPerS, w, v1, v2, x1, x2, e1, e2, ErrorFunction.difference(x1, x2), out);
    }

    /**
     * I and its derivatives into {@code out[0..3]} from the edge values x_i = (v_i − U)/w, e_i = exp(−x_i²) and
     * erf x2 − erf x1 (the class note's formulas): the edges of adjacent windows are shared, so a spectrum's
     * model computes them once per edge ({@link PlasmaModel}).
     */
    static void combine(double chargeAreaC, double densityPerM3, double speedMPerS, double w, double v1,
            double v2, double x1, double x2, double e1, double e2, double derf, double[] out) {
        out[VALUE] = combineInto(chargeAreaC, densityPerM3, speedMPerS, w, v1, v2, x1, x2, e1, e2, derf, out, D_DENSITY);
    }

    /**
     * {@link #combine}'s I, returned, with ∂I/∂n, ∂I/∂U, ∂I/∂w into {@code row[offset..offset + 2]} (none when
     * {@code row} is null): a model writes them straight into its Jacobian row.
     */
    static double combineInto(double chargeAreaC, double densityPerM3, double speedMPerS, double w, double v1,
            double v2, double x1, double x2, double e1, double e2, double derf, double[] row, int offset) {
        double qnA = chargeAreaC * densityPerM3;
        double bracket = 0.5 * speedMPerS * derf + w / (2 * PlasmaConstants.SQRT_PI) * (e1 - e2);
        if (row != null) {
            row[offset] = chargeAreaC * bracket;
            row[offset + 1] = qnA * (0.5 * derf + (v1 * e1 - v2 * e2) / (w * PlasmaConstants.SQRT_PI));
            row[offset + 2] = qnA * ((x1 * v1 * e1 - x2 * v2 * e2) / (w * PlasmaConstants.SQRT_PI)
                    + (e1 - e2) / (2 * PlasmaConstants.SQRT_PI));
        }
        return qnA * bracket;
    }

    /** erfc|x| at an edge: one rational evaluation serves both {@link #erfOfEdge} and the tail differences. */
    static double erfcOfEdge(double x) {
        return ErrorFunction.erfc(Math.abs(x));
    }

    /**
     * erf x from {@code erfcAbs} = erfc|x|, bit for bit {@link ErrorFunction#erf}: beyond its first interval
     * erf x = ±(1 − erfc|x|) is how it computes it; within |x| ≤ 0.5 (its series holds to 0.46875, Cody
     * 1969) it is called itself.
     */
    static double erfOfEdge(double x, double erfcAbs) {
        if (Math.abs(x) <= 0.5) {
            return ErrorFunction.erf(x);
        }
        double oneMinus = 1.0 - erfcAbs;
        return x < 0 ? -oneMinus : oneMinus;
    }

    /**
     * erf b − erf a from the edge values, bit for bit {@link ErrorFunction#difference}: erfc values where both
     * arguments lie beyond {@link ErrorFunction#HALF_POINT} in one tail, erf values otherwise.
     */
    static double difference(double a, double erfcAbsA, double erfA, double b, double erfcAbsB, double erfB) {
        if (b < a) {
            return -difference(b, erfcAbsB, erfB, a, erfcAbsA, erfA);
        }
        if (a >= 0 && b > ErrorFunction.HALF_POINT) {
            return erfcAbsA - erfcAbsB;
        }
        if (b <= 0 && a < -ErrorFunction.HALF_POINT) {
            return erfcAbsB - erfcAbsA;
        }
        return erfB - erfA;
    }
}
