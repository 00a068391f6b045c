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

    private static final int DENSITY = PlasmaParameter.PROTON_DENSITY.ordinal();
    private static final int SPEED = PlasmaParameter.PROTON_SPEED.ordinal();
    private static final int TEMPERATURE = PlasmaParameter.PROTON_TEMPERATURE.ordinal();
    private static final int ANISOTROPY = PlasmaParameter.TEMPERATURE_ANISOTROPY.ordinal();
    private static final int ABUNDANCE = PlasmaParameter.ALPHA_ABUNDANCE.ordinal();
    private static final int DRIFT = PlasmaParameter.ALPHA_DRIFT.ordinal();
    private static final int TEMPERATURE_RATIO = PlasmaParameter.ALPHA_TEMPERATURE_RATIO.ordinal();
    private static final int FLOW_X = PlasmaParameter.FLOW_THETA_X.ordinal();
    private static final int FLOW_Y = PlasmaParameter.FLOW_THETA_Y.ordinal();
    private static final int FIELD_X = PlasmaParameter.FIELD_THETA_X.ordinal();
    private static final int FIELD_Y = PlasmaParameter.FIELD_THETA_Y.ordinal();

    /** The protons and alphas of {@code c} as convected (bi-)Maxwellians, alphas drifting along {@code drift}. */
    public static PlasmaState of(PlasmaConditions c, AlphaDriftDirection drift) {
        double[] v = new double[PlasmaParameter.values().length];
        for (PlasmaParameter p : PlasmaParameter.values()) {
            v[p.ordinal()] = c.get(p);
        }
        return of(v, direction(c.fieldThetaXDeg(), c.fieldThetaYDeg()), drift.unitVector(c), new double[3]);
    }

    /**
     * {@link #of(PlasmaConditions, AlphaDriftDirection)} of a timeline's conditions, one time after another,
     * without the per-call garbage of the conditions and the flow direction: the values are read from the
     * timeline, and the field direction and the alpha drift's unit vector (functions of the two field angles
     * alone) are kept while those angles stay the same; so the plasma is the same to the bit. Not thread-safe.
     */
    public static final class Series {
        private final ScenarioTimeline timeline;
        private final AlphaDriftDirection drift;
        private final double[] flow = new double[3];
        private double fieldThetaXDeg = Double.NaN;
        private double fieldThetaYDeg = Double.NaN;
        private double[] field;
        private double[] driftVector;

        /** The plasmas of {@code timeline}, its alphas drifting along {@code drift}. */
        public Series(ScenarioTimeline timeline, AlphaDriftDirection drift) {
            this.timeline = timeline;
            this.drift = drift;
        }

        /** The plasma at {@code seconds} from the scenario start (as {@code of(timeline.at(seconds), drift)}). */
        public PlasmaState at(double seconds) {
            double[] v = timeline.valuesAt(seconds);
            if (Double.compare(v[FIELD_X], fieldThetaXDeg) != 0 || Double.compare(v[FIELD_Y], fieldThetaYDeg) != 0) {
                field = direction(v[FIELD_X], v[FIELD_Y]);
                driftVector = drift.unitVector(PlasmaConditions.of(v));
                fieldThetaXDeg = v[FIELD_X];
                fieldThetaYDeg = v[FIELD_Y];
            }
            return PlasmaStates.of(v, field, driftVector, flow);
        }
    }

    /** The plasma of the values {@code v} (by {@link PlasmaParameter#ordinal()}); {@code flow} is scratch. */
    private static PlasmaState of(double[] v, double[] field, double[] d, double[] flow) {
        direction(v[FLOW_X], v[FLOW_Y], flow);
        double speed = v[SPEED] * KM_TO_M;
        double vx = flow[0] * speed;
        double vy = flow[1] * speed;
        double vz = flow[2] * speed;

        double tParallel = PlasmaConditions.parallelTemperatureK(v[TEMPERATURE], v[ANISOTROPY]);
        double tPerp = PlasmaConditions.perpendicularTemperatureK(v[TEMPERATURE], v[ANISOTROPY]);
        IonPopulation protons = new IonPopulation(IonSpecies.PROTON, v[DENSITY] * PER_CC_TO_PER_M3,
                vx, vy, vz,
                IonPopulation.thermalSpeed(tParallel, IonSpecies.PROTON.massKg()),
                IonPopulation.thermalSpeed(tPerp, IonSpecies.PROTON.massKg()));
        if (v[ABUNDANCE] <= 0) {
            return new PlasmaState(List.of(protons), field[0], field[1], field[2]);
        }
        double driftSpeed = v[DRIFT] * KM_TO_M;
        double ratio = v[TEMPERATURE_RATIO];
        IonPopulation alphas = new IonPopulation(IonSpecies.ALPHA,
                v[ABUNDANCE] * v[DENSITY] * PER_CC_TO_PER_M3,
                vx + driftSpeed * d[0], vy + driftSpeed * d[1], vz + driftSpeed * d[2],
                IonPopulation.thermalSpeed(ratio * tParallel, IonSpecies.ALPHA.massKg()),
                IonPopulation.thermalSpeed(ratio * tPerp, IonSpecies.ALPHA.massKg()));
        return new PlasmaState(List.of(protons, alphas), field[0], field[1], field[2]);
    }

    /** Unit vector with tan(thetaX) = x/z and tan(thetaY) = y/z, z > 0. */
    static double[] direction(double thetaXDeg, double thetaYDeg) {
        double[] out = new double[3];
        direction(thetaXDeg, thetaYDeg, out);
        return out;
    }

    private static void direction(double thetaXDeg, double thetaYDeg, double[] out) {
        double tx = Math.tan(Math.toRadians(thetaXDeg));
        double ty = Math.tan(Math.toRadians(thetaYDeg));
        double z = 1.0 / Math.sqrt(1.0 + tx * tx + ty * ty);
        out[0] = tx * z;
        out[1] = ty * z;
        out[2] = z;
    }

    /** Energy per charge (V) at which a population's bulk speed along the cup normal sits. */
    public static double peakVolts(IonPopulation p) {
        double vn = p.vzMetresPerSecond();
        return p.species().massKg() * vn * vn / (2.0 * p.species().chargeCoulomb());
    }
}
