package dev.sweepline.sim.cup;

/**
 * Geometry of a Faraday cup with a circular aperture, a stack of grids and a circular collector
 * split into four quadrants, centred under the aperture.
 *
 * <p>A parallel beam at angle theta to the normal projects the aperture onto the collector as a disc
 * of the aperture's radius shifted by d tan theta (physics.md "Oblique flow and a split collector").
 *
 * @param apertureRadiusM      aperture radius, metres
 * @param apertureToCollectorM distance d from the aperture to the collector plane, metres
 * @param collectorRadiusM     collector radius, metres (at least the aperture radius)
 * @param grids                number of grids the ions cross
 * @param gridTransparency     geometric transparency of one grid, 0..1
 */
public record CupGeometry(double apertureRadiusM, double apertureToCollectorM, double collectorRadiusM,
                          int grids, double gridTransparency) {

    /** Checks the geometry is physical. */
    public CupGeometry {
        if (!(apertureRadiusM > 0) || !(apertureToCollectorM > 0) || !(collectorRadiusM >= apertureRadiusM)
                || grids < 0 || !(gridTransparency > 0 && gridTransparency <= 1)) {
            throw new IllegalArgumentException("bad cup geometry: R " + apertureRadiusM + " m, d " + apertureToCollectorM
                    + " m, collector " + collectorRadiusM + " m, " + grids + " grids of " + gridTransparency);
        }
    }

    /**
     * A cup whose aperture gives {@code effectiveAreaM2} at normal incidence behind its grids:
     * R = sqrt(area / (pi transparency^grids)) (instruments/FORMAT.md, derived values).
     */
    public static CupGeometry ofEffectiveArea(double effectiveAreaM2, double apertureToCollectorM, double collectorRadiusM,
                                              int grids, double gridTransparency) {
        double transmission = Math.pow(gridTransparency, grids);
        double radius = Math.sqrt(effectiveAreaM2 / (Math.PI * transmission));
        return new CupGeometry(radius, apertureToCollectorM, collectorRadiusM, grids, gridTransparency);
    }

    /** Transmission of the whole grid stack, transparency^grids. */
    public double gridTransmission() {
        return Math.pow(gridTransparency, grids);
    }

    /** Geometric aperture area, square metres. */
    public double apertureAreaM2() {
        return Math.PI * apertureRadiusM * apertureRadiusM;
    }

    /** Effective area at normal incidence: aperture area times grid transmission, square metres. */
    public double effectiveAreaM2() {
        return apertureAreaM2() * gridTransmission();
    }

    /** Largest flow angle from the normal at which the whole aperture image still falls on the collector, radians. */
    public double fullAcceptanceAngleRad() {
        return Math.atan((collectorRadiusM - apertureRadiusM) / apertureToCollectorM);
    }

    /** Flow angle from the normal beyond which no part of the aperture image reaches the collector, radians. */
    public double cutoffAngleRad() {
        return Math.atan((collectorRadiusM + apertureRadiusM) / apertureToCollectorM);
    }
}
