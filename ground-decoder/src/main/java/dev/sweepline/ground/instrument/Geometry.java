package dev.sweepline.ground.instrument;

/**
 * The cup's geometry in SI units, from the description's {@code geometry} (FORMAT.md; telemetry ICD
 * §8). Exactly one of the effective area and the aperture radius is written; the other follows from
 * effective area = π R² × gridTransparency^grids (FORMAT.md, derived values).
 *
 * @param effectiveAreaM2      aperture area × grid transmission at normal incidence, m²
 * @param apertureRadiusM      aperture radius R, m
 * @param apertureToCollectorM aperture-to-collector distance d, m
 * @param collectorRadiusM     collector radius, m (≥ R)
 * @param grids                grids the ions cross, 0..8
 * @param gridTransparency     geometric transparency of one grid, (0, 1]
 */
public record Geometry(double effectiveAreaM2, double apertureRadiusM, double apertureToCollectorM,
        double collectorRadiusM, int grids, double gridTransparency) {
    /** Square metres per cm². */
    static final double M2_PER_CM2 = 1e-4;
    /** Metres per mm. */
    static final double M_PER_MM = 1e-3;

    /** The geometry of a description that gives the effective area, cm², and lengths in mm. */
    static Geometry fromArea(double effectiveAreaCm2, double apertureToCollectorMm, double collectorRadiusMm,
            int grids, double gridTransparency) {
        double area = effectiveAreaCm2 * M2_PER_CM2;
        double radius = Math.sqrt(area / (Math.PI * Math.pow(gridTransparency, grids)));
        return new Geometry(area, radius, apertureToCollectorMm * M_PER_MM, collectorRadiusMm * M_PER_MM, grids,
                gridTransparency);
    }

    /** The geometry of a description that gives the aperture radius; lengths in mm. */
    static Geometry fromRadius(double apertureRadiusMm, double apertureToCollectorMm, double collectorRadiusMm,
            int grids, double gridTransparency) {
        double radius = apertureRadiusMm * M_PER_MM;
        double area = Math.PI * radius * radius * Math.pow(gridTransparency, grids);
        return new Geometry(area, radius, apertureToCollectorMm * M_PER_MM, collectorRadiusMm * M_PER_MM, grids,
                gridTransparency);
    }

    /** Transmission of all the grids at normal incidence: gridTransparency^grids. */
    public double gridTransmission() {
        return Math.pow(gridTransparency, grids);
    }

    /** tan θ up to which the aperture image falls wholly on the collector: (collector − R) / d (FORMAT.md). */
    public double fullAcceptanceTan() {
        return (collectorRadiusM - apertureRadiusM) / apertureToCollectorM;
    }
}
