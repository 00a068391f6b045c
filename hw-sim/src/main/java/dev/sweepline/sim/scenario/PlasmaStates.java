package dev.sweepline.sim.scenario;

import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.plasma.ReusablePlasma;
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
        double[] populations = new double[POPULATION_VALUES];
        return of(populations(v, drift.unitVector(c), new double[3], populations),
                direction(c.fieldThetaXDeg(), c.fieldThetaYDeg()));
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
        private final double[] populations = new double[POPULATION_VALUES];
        private final ReusablePlasma reusable = new ReusablePlasma();

        /** The plasmas of {@code timeline}, its alphas drifting along {@code drift}. */
        public Series(ScenarioTimeline timeline, AlphaDriftDirection drift) {
            this.timeline = timeline;
            this.drift = drift;
        }

        /** The plasma at {@code seconds} from the scenario start (as {@code of(timeline.at(seconds), drift)}). */
        public PlasmaState at(double seconds) {
            return of(valuesAt(seconds), field);
        }

        /**
         * {@link #at} in this series' one reused plasma, refilled by every call (the same values to the
         * bit): valid until the next call of {@code reused}; a caller that keeps it uses {@link #at}.
         */
        public PlasmaState reused(double seconds) {
            double[] p = valuesAt(seconds);
            reusable.protons(p[0], p[1], p[2], p[3], p[4], p[5]);
            boolean withAlphas = p[WITH_ALPHAS] != 0;
            if (withAlphas) {
                reusable.alphas(p[6], p[7], p[8], p[9], p[10], p[11]);
            }
            return reusable.set(withAlphas, field[0], field[1], field[2]);
        }

        /** The populations' values at {@code seconds} (see {@link #populations}), in this series' scratch. */
        private double[] valuesAt(double seconds) {
            double[] v = timeline.valuesAt(seconds);
            if (Double.compare(v[FIELD_X], fieldThetaXDeg) != 0 || Double.compare(v[FIELD_Y], fieldThetaYDeg) != 0) {
                field = direction(v[FIELD_X], v[FIELD_Y]);
                driftVector = drift.unitVector(PlasmaConditions.of(v));
                fieldThetaXDeg = v[FIELD_X];
                fieldThetaYDeg = v[FIELD_Y];
            }
            return populations(v, driftVector, flow, populations);
        }
    }

    /**
     * Values per population in {@link #populations}: density, vx, vy, vz, w parallel, w perpendicular (SI),
     * the protons' then the alphas'.
     */
    private static final int PER_POPULATION = 6;
    /** The slot in {@link #populations} that is 1 when there are alphas, 0 when not. */
    private static final int WITH_ALPHAS = 2 * PER_POPULATION;
    private static final int POPULATION_VALUES = WITH_ALPHAS + 1;

    /**
     * The protons' and the alphas' values (see {@link #PER_POPULATION}) of the values {@code v} (by
     * {@link PlasmaParameter#ordinal()}) into {@code out}, alphas drifting along {@code d}; no alphas when
     * their abundance is not positive (their slots then left as they were). {@code flow} is scratch.
     */
    private static double[] populations(double[] v, double[] d, double[] flow, double[] out) {
        direction(v[FLOW_X], v[FLOW_Y], flow);
        double speed = v[SPEED] * KM_TO_M;
        double vx = flow[0] * speed;
        double vy = flow[1] * speed;
        double vz = flow[2] * speed;

        double tParallel = PlasmaConditions.parallelTemperatureK(v[TEMPERATURE], v[ANISOTROPY]);
        double tPerp = PlasmaConditions.perpendicularTemperatureK(v[TEMPERATURE], v[ANISOTROPY]);
        out[0] = v[DENSITY] * PER_CC_TO_PER_M3;
        out[1] = vx;
        out[2] = vy;
        out[3] = vz;
        out[4] = IonPopulation.thermalSpeed(tParallel, IonSpecies.PROTON.massKg());
        out[5] = IonPopulation.thermalSpeed(tPerp, IonSpecies.PROTON.massKg());
        if (v[ABUNDANCE] <= 0) {
            out[WITH_ALPHAS] = 0;
            return out;
        }
        double driftSpeed = v[DRIFT] * KM_TO_M;
        double ratio = v[TEMPERATURE_RATIO];
        out[6] = v[ABUNDANCE] * v[DENSITY] * PER_CC_TO_PER_M3;
        out[7] = vx + driftSpeed * d[0];
        out[8] = vy + driftSpeed * d[1];
        out[9] = vz + driftSpeed * d[2];
        out[10] = IonPopulation.thermalSpeed(ratio * tParallel, IonSpecies.ALPHA.massKg());
        out[11] = IonPopulation.thermalSpeed(ratio * tPerp, IonSpecies.ALPHA.massKg());
        out[WITH_ALPHAS] = 1;
        return out;
    }

    /** The plasma of the populations' values {@code p} (see {@link #populations}) and the field direction. */
    private static PlasmaState of(double[] p, double[] field) {
        IonPopulation protons = new IonPopulation(IonSpecies.PROTON, p[0], p[1], p[2], p[3], p[4], p[5]);
        if (p[WITH_ALPHAS] == 0) {
            return new PlasmaState(List.of(protons), field[0], field[1], field[2]);
        }
        IonPopulation alphas = new IonPopulation(IonSpecies.ALPHA, p[6], p[7], p[8], p[9], p[10], p[11]);
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
