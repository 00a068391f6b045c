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

    /** Grids in the demo cup: ground, two modulator, suppressor (four is common practice). */
    public static final int DEMO_GRIDS = 4;
    /** Transparency of one demo grid: fine tungsten mesh, ~90 % (physics.md "The demo instrument", common practice). */
    public static final double DEMO_GRID_TRANSPARENCY = 0.90;
    /** Effective area of the demo cup (aperture area times grid transmission), square metres: 1 cm^2, as physics.md's worked cases. */
    public static final double DEMO_EFFECTIVE_AREA_M2 = 1e-4;
    /** Aperture-to-collector distance of the demo cup, metres (invented). */
    public static final double DEMO_APERTURE_TO_COLLECTOR_M = 15e-3;
    /** Collector radius of the demo cup, metres (invented): full acceptance to about 20 deg, none beyond about 52 deg. */
    public static final double DEMO_COLLECTOR_RADIUS_M = 12.5e-3;

    /** Checks the geometry is physical. */
    public CupGeometry {
        if (!(apertureRadiusM > 0) || !(apertureToCollectorM > 0) || !(collectorRadiusM >= apertureRadiusM)
                || grids < 0 || !(gridTransparency > 0 && gridTransparency <= 1)) {
            throw new IllegalArgumentException("bad cup geometry: R " + apertureRadiusM + " m, d " + apertureToCollectorM
                    + " m, collector " + collectorRadiusM + " m, " + grids + " grids of " + gridTransparency);
        }
    }

    /**
     * The demo cup: four grids of 0.90, aperture sized so that the effective area is exactly 1 cm^2
     * (radius about 6.97 mm), collector 12.5 mm radius 15 mm behind the aperture.
     */
    public static CupGeometry demo() {
        double transmission = Math.pow(DEMO_GRID_TRANSPARENCY, DEMO_GRIDS);
        double radius = Math.sqrt(DEMO_EFFECTIVE_AREA_M2 / (Math.PI * transmission));
        return new CupGeometry(radius, DEMO_APERTURE_TO_COLLECTOR_M, DEMO_COLLECTOR_RADIUS_M, DEMO_GRIDS,
                DEMO_GRID_TRANSPARENCY);
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
