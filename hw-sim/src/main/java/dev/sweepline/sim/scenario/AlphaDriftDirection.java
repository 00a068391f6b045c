package dev.sweepline.sim.scenario;

/** The direction along which the alphas drift relative to the protons. */
public enum AlphaDriftDirection {
    /** Along the magnetic field, on the anti-sunward side (the usual case in the fast wind). */
    FIELD("field"),
    /** Along the radial direction, taken as the cup normal z of a sun-pointing cup. */
    RADIAL("radial");

    private final String key;

    AlphaDriftDirection(String key) {
        this.key = key;
    }

    /** Name in the scenario file. */
    public String key() {
        return key;
    }

    /**
     * Unit vector (x, y, z) of the drift in the cup frame for {@code c}: for {@link #FIELD} the field
     * direction (tan thetaX, tan thetaY, 1) normalised, for {@link #RADIAL} (0, 0, 1).
     */
    public double[] unitVector(PlasmaConditions c) {
        return switch (this) {
            case RADIAL -> new double[] {0, 0, 1};
            case FIELD -> {
                double x = Math.tan(Math.toRadians(c.fieldThetaXDeg()));
                double y = Math.tan(Math.toRadians(c.fieldThetaYDeg()));
                double norm = Math.sqrt(x * x + y * y + 1.0);
                yield new double[] {x / norm, y / norm, 1.0 / norm};
            }
        };
    }
}
