package dev.sweepline.sim.scenario;

import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;

/**
 * Turns a scenario's conditions (trade units: cm^-3, km/s, K, degrees) into the simulator's plasma
 * state (SI, instrument frame: +z is the cup normal pointing into the cup).
 */
public final class PlasmaStates {
    private static final double PER_CC_TO_PER_M3 = 1e6;
    private static final double KM_TO_M = 1e3;

    private PlasmaStates() {
    }

    /** The protons and alphas of {@code c} as convected (bi-)Maxwellians, alphas drifting along {@code drift}. */
    public static PlasmaState of(PlasmaConditions c, AlphaDriftDirection drift) {
        return of(c, direction(c.fieldThetaXDeg(), c.fieldThetaYDeg()), drift.unitVector(c));
    }

    /**
     * {@link #of(PlasmaConditions, AlphaDriftDirection)} for a series of conditions (a timeline's), keeping
     * the field direction and the alpha drift's unit vector while the field angles stay the same: they are
     * functions of those two angles alone, so the plasma is the same to the bit. Not thread-safe.
     */
    public static final class Series {
        private final AlphaDriftDirection drift;
        private double fieldThetaXDeg = Double.NaN;
        private double fieldThetaYDeg = Double.NaN;
        private double[] field;
        private double[] driftVector;

        /** A series whose alphas drift along {@code drift}. */
        public Series(AlphaDriftDirection drift) {
            this.drift = drift;
        }

        /** The plasma of {@code c}. */
        public PlasmaState of(PlasmaConditions c) {
            if (Double.compare(c.fieldThetaXDeg(), fieldThetaXDeg) != 0
                    || Double.compare(c.fieldThetaYDeg(), fieldThetaYDeg) != 0) {
                field = direction(c.fieldThetaXDeg(), c.fieldThetaYDeg());
                driftVector = drift.unitVector(c);
                fieldThetaXDeg = c.fieldThetaXDeg();
                fieldThetaYDeg = c.fieldThetaYDeg();
            }
            return PlasmaStates.of(c, field, driftVector);
        }
    }

    private static PlasmaState of(PlasmaConditions c, double[] field, double[] d) {
        double[] flow = direction(c.flowThetaXDeg(), c.flowThetaYDeg());
        double speed = c.protonSpeedKmPerS() * KM_TO_M;
        double vx = flow[0] * speed;
        double vy = flow[1] * speed;
        double vz = flow[2] * speed;

        double tParallel = c.protonParallelTemperatureK();
        double tPerp = c.protonPerpendicularTemperatureK();
        IonPopulation protons = new IonPopulation(IonSpecies.PROTON, c.protonDensityPerCc() * PER_CC_TO_PER_M3,
                vx, vy, vz,
                IonPopulation.thermalSpeed(tParallel, IonSpecies.PROTON.massKg()),
                IonPopulation.thermalSpeed(tPerp, IonSpecies.PROTON.massKg()));
        if (c.alphaAbundance() <= 0) {
            return new PlasmaState(List.of(protons), field[0], field[1], field[2]);
        }
        double driftSpeed = c.alphaDriftKmPerS() * KM_TO_M;
        double ratio = c.alphaTemperatureRatio();
        IonPopulation alphas = new IonPopulation(IonSpecies.ALPHA,
                c.alphaAbundance() * c.protonDensityPerCc() * PER_CC_TO_PER_M3,
                vx + driftSpeed * d[0], vy + driftSpeed * d[1], vz + driftSpeed * d[2],
                IonPopulation.thermalSpeed(ratio * tParallel, IonSpecies.ALPHA.massKg()),
                IonPopulation.thermalSpeed(ratio * tPerp, IonSpecies.ALPHA.massKg()));
        return new PlasmaState(List.of(protons, alphas), field[0], field[1], field[2]);
    }

    /** Unit vector with tan(thetaX) = x/z and tan(thetaY) = y/z, z > 0. */
    static double[] direction(double thetaXDeg, double thetaYDeg) {
        double tx = Math.tan(Math.toRadians(thetaXDeg));
        double ty = Math.tan(Math.toRadians(thetaYDeg));
        double z = 1.0 / Math.sqrt(1.0 + tx * tx + ty * ty);
        return new double[] {tx * z, ty * z, z};
    }

    /** Energy per charge (V) at which a population's bulk speed along the cup normal sits. */
    public static double peakVolts(IonPopulation p) {
        double vn = p.vzMetresPerSecond();
        return p.species().massKg() * vn * vn / (2.0 * p.species().chargeCoulomb());
    }
}
