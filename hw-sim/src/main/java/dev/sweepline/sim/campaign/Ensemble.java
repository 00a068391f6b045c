package dev.sweepline.sim.campaign;

import dev.sweepline.sim.scenario.PlasmaParameter;

/** Where a drawn scenario parameter may lie (the scenario format's ranges, FORMAT.md). */
final class Ensemble {
    private Ensemble() {
    }

    /** [low, high] of a parameter; a low of 0 for a positive parameter means "above 0". */
    static double[] range(PlasmaParameter p) {
        switch (p) {
            case ALPHA_ABUNDANCE:
                return new double[] {0, PlasmaParameter.MAX_ABUNDANCE};
            case ALPHA_DRIFT:
                return new double[] {Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY};
            case FLOW_THETA_X:
            case FLOW_THETA_Y:
            case FIELD_THETA_X:
            case FIELD_THETA_Y:
                return new double[] {-PlasmaParameter.MAX_ANGLE_DEG, PlasmaParameter.MAX_ANGLE_DEG};
            default:
                return new double[] {0, Double.POSITIVE_INFINITY};
        }
    }

    /** True for the parameters a normal draw is clipped into range for (angles) or needs no range (drift). */
    static boolean clipped(PlasmaParameter p) {
        double[] r = range(p);
        return r[0] < 0;
    }

    /** {@code v} clipped into the parameter's range (only angles can leave it: normal draws). */
    static double clip(PlasmaParameter p, double v) {
        double[] r = range(p);
        return Math.max(r[0], Math.min(r[1], v));
    }
}
