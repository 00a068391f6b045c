package dev.sweepline.ground.instrument;

/**
 * A range of numbers a key of FORMAT.md allows, open or closed at either end, with the text an error
 * shows ({@code > 0}, {@code 1..256}, {@code (0, 1]}).
 *
 * @param lo     lower end (-∞ for none)
 * @param loOpen the lower end itself is excluded
 * @param hi     upper end (+∞ for none)
 * @param hiOpen the upper end itself is excluded
 */
record NumberRange(double lo, boolean loOpen, double hi, boolean hiOpen) {
    /** x > lo. */
    static NumberRange above(double lo) {
        return new NumberRange(lo, true, Double.POSITIVE_INFINITY, false);
    }

    /** x ≥ lo. */
    static NumberRange atLeast(double lo) {
        return new NumberRange(lo, false, Double.POSITIVE_INFINITY, false);
    }

    /** lo ≤ x ≤ hi. */
    static NumberRange closed(double lo, double hi) {
        return new NumberRange(lo, false, hi, false);
    }

    /** lo ≤ x ≤ hi for whole numbers (the text reads lo..hi). */
    static NumberRange whole(long lo, long hi) {
        return new NumberRange(lo, false, hi, false);
    }

    /** True when x lies in the range. */
    boolean holds(double x) {
        boolean aboveLo = loOpen ? x > lo : x >= lo;
        boolean belowHi = hiOpen ? x < hi : x <= hi;
        return aboveLo && belowHi;
    }

    /** The range as FORMAT.md writes it. */
    String text() {
        boolean noLo = lo == Double.NEGATIVE_INFINITY;
        boolean noHi = hi == Double.POSITIVE_INFINITY;
        if (noHi) {
            return (loOpen ? "> " : ">= ") + number(lo);
        }
        if (noLo) {
            return (hiOpen ? "< " : "<= ") + number(hi);
        }
        if (!loOpen && !hiOpen) {
            return number(lo) + ".." + number(hi);
        }
        return (loOpen ? "(" : "[") + number(lo) + ", " + number(hi) + (hiOpen ? ")" : "]");
    }

    /** A number as a person writes it: 3 rather than 3.0. */
    static String number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
