package dev.sweepline.sim.cup;

import dev.sweepline.sim.plasma.ConvectedMaxwellian;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.MaxwellianWindow;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;

/**
 * Response of a split-collector Faraday cup to a plasma: the current of each quadrant for an
 * energy-per-charge window between the modulator's low and high levels.
 *
 * <p>Per population: the window current in closed form ({@link ConvectedMaxwellian}) with U the bulk
 * velocity's component along the normal (physics.md: replace U by U cos theta, exact for unlimited
 * acceptance) and w the bi-Maxwellian thermal speed along the normal; times the grid transmission;
 * times the fraction of the aperture image on each quadrant of the collector ({@link SplitCollector},
 * which carries the finite acceptance A(theta)/A(0)). The image is placed by the bulk flow
 * direction: the angular spread of the thermal motion is not followed ion by ion, so the split and
 * the acceptance are those of a narrow beam. A population that does not flow into the cup
 * ({@code vz <= 0}) gives no current. Every species responds with its own charge (alphas 2e).
 *
 * <p>Threading: not thread-safe (scratch arrays and the collector's cache). Allocation-free.
 */
public final class FaradayCup {
    private final CupGeometry geometry;
    private final SplitCollector collector;
    private final double effectiveAreaM2;
    private final double[] fractions = new double[4];
    private final double[] scratch = new double[4];
    /** Where the evaluations nobody asked to keep go. */
    private final MaxwellianWindow evaluation = new MaxwellianWindow();

    /** A cup of the given geometry. */
    public FaradayCup(CupGeometry geometry) {
        this.geometry = geometry;
        this.collector = SplitCollector.of(geometry);
        this.effectiveAreaM2 = geometry.effectiveAreaM2();
    }

    /** The cup's geometry. */
    public CupGeometry geometry() {
        return geometry;
    }

    /**
     * Current on each collector quadrant for the window between the two modulator levels.
     *
     * @param plasma    the plasma at the cup
     * @param lowVolts  modulator low level, volts
     * @param highVolts modulator high level, volts
     * @param outAmps4  receives the currents of Q1..Q4, amperes (noiseless)
     */
    public void quadrantCurrents(PlasmaState plasma, double lowVolts, double highVolts, double[] outAmps4) {
        quadrantCurrents(plasma, lowVolts, highVolts, null, outAmps4);
    }

    /**
     * {@link #quadrantCurrents(PlasmaState, double, double, double[])}, the closed-form evaluation of the
     * plasma's first population's window current kept in {@code first} (cleared when the cup does not
     * evaluate it: that population does not flow into the cup): the instrument's step keeps it for the
     * bench, which takes the protons' sensitivities of the same window from it.
     */
    public void quadrantCurrents(PlasmaState plasma, double lowVolts, double highVolts, MaxwellianWindow first,
            double[] outAmps4) {
        clear(outAmps4);
        if (first != null) {
            first.clear();
        }
        List<IonPopulation> populations = plasma.populations();
        for (int i = 0, n = populations.size(); i < n; i++) {
            IonPopulation p = populations.get(i);
            double vz = p.vzMetresPerSecond();
            if (!(vz > 0) || p.densityPerM3() == 0) {
                continue;
            }
            IonSpecies species = p.species();
            double v1 = ConvectedMaxwellian.speedForVoltage(lowVolts, species.massKg(), species.chargeCoulomb());
            double v2 = ConvectedMaxwellian.speedForVoltage(highVolts, species.massKg(), species.chargeCoulomb());
            // one call site of the closed form (the compiler inlines it once), every evaluation kept somewhere
            MaxwellianWindow kept = i == 0 && first != null ? first : evaluation;
            double current = ConvectedMaxwellian.windowCurrent(species.chargeCoulomb(), p.densityPerM3(),
                    effectiveAreaM2, vz, plasma.normalThermalSpeed(p), v1, v2, kept);
            addSplit(p, current, outAmps4);
        }
    }

    /**
     * {@link #quadrantCurrents(PlasmaState, double, double, double[])} with every population's window current
     * computed by the caller ({@code populationAmps}, in the order of the plasma's populations: the closed
     * form of {@link ConvectedMaxwellian} before the split; read only for the populations that flow into
     * the cup): the yardstick computes them from the edges its windows share.
     */
    public void splitCurrents(PlasmaState plasma, double[] populationAmps, double[] outAmps4) {
        clear(outAmps4);
        List<IonPopulation> populations = plasma.populations();
        for (int i = 0, n = populations.size(); i < n; i++) {
            IonPopulation p = populations.get(i);
            if (!(p.vzMetresPerSecond() > 0) || p.densityPerM3() == 0) {
                continue;
            }
            addSplit(p, populationAmps[i], outAmps4);
        }
    }

    /** Adds the window current {@code current} of {@code p} (flowing into the cup), split over the quadrants. */
    private void addSplit(IonPopulation p, double current, double[] outAmps4) {
        double d = geometry.apertureToCollectorM();
        double vz = p.vzMetresPerSecond();
        collector.fractions(d * p.vxMetresPerSecond() / vz, d * p.vyMetresPerSecond() / vz, fractions);
        for (int q = 0; q < 4; q++) {
            outAmps4[q] += current * fractions[q];
        }
    }

    private static void clear(double[] amps4) {
        amps4[0] = 0;
        amps4[1] = 0;
        amps4[2] = 0;
        amps4[3] = 0;
    }

    /** Sum of the four quadrant currents for the window, amperes. */
    public double totalCurrent(PlasmaState plasma, double lowVolts, double highVolts) {
        quadrantCurrents(plasma, lowVolts, highVolts, scratch);
        return scratch[0] + scratch[1] + scratch[2] + scratch[3];
    }
}
