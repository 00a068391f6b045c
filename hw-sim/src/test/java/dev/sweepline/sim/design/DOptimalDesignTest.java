package dev.sweepline.sim.design;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.sim.cup.CupGeometry;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.HvCalibration;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.ConvectedMaxwellian;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class DOptimalDesignTest {
    /** physics.md reference protons: n = 5 cm^-3, U = 400 km/s, T = 1e5 K, along the normal. */
    private static final PlasmaState REFERENCE = new PlasmaState(List.of(new IonPopulation(IonSpecies.PROTON, 5e6,
            0, 0, 400e3, IonPopulation.thermalSpeed(1e5, IonSpecies.PROTON.massKg()),
            IonPopulation.thermalSpeed(1e5, IonSpecies.PROTON.massKg()))), 0, 0, 1);
    private static final double STEP_SECONDS = 0.008;

    private final FaradayCup cup = new FaradayCup(TestInstruments.DEMO_CUP.cup());
    private final WindowVolts windows = new WindowVolts(TestInstruments.DEMO_CUP.flight().defaultTable(), HvCalibration.nominal(TestInstruments.DEMO_CUP.flight()));
    private final ProtonInformation info = new ProtonInformation(TestInstruments.DEMO_CUP.cup(), TestInstruments.DEMO_CUP.preamp());

    @Test
    void shouldBeatEveryOtherAllocationOfTheSameTime() {
        double[][] optimal = new DOptimalDesign(cup, TestInstruments.DEMO_CUP.preamp(), windows).optimalInformation(REFERENCE, 1.0, STEP_SECONDS);
        assertNotNull(optimal);
        // Kiefer-Wolfowitz (1960): the D-optimal design maximises det F over all designs of the same
        // total time; 2000 random allocations (seeded) must not exceed it (1e-6: the algorithm's tolerance)
        SplittableRandom random = new SplittableRandom(1960);
        for (int trial = 0; trial < 2000; trial++) {
            double[] share = new double[windows.count()];
            double sum = 0;
            int support = 3 + random.nextInt(20);
            int centre = 50 + random.nextInt(30);
            for (int k = 0; k < support; k++) {
                int w = Math.max(0, Math.min(windows.count() - 1, centre + random.nextInt(-12, 13)));
                double x = -Math.log(1 - random.nextDouble());
                share[w] += x;
                sum += x;
            }
            double[][] f = allocate(share, sum, 1.0);
            double e = DOptimalDesign.efficiency(f, optimal);
            assertTrue(Double.isNaN(e) || e <= 1 + 1e-3, "trial " + trial + ": efficiency " + e);
        }
        assertEquals(1.0, DOptimalDesign.efficiency(optimal, optimal), 1e-12); // against itself
    }

    @Test
    void shouldRateAFullSurveyWellBelowTheOptimum() {
        double[][] optimal = new DOptimalDesign(cup, TestInstruments.DEMO_CUP.preamp(), windows).optimalInformation(REFERENCE, 1.0, STEP_SECONDS);
        double[] uniform = new double[windows.count()];
        java.util.Arrays.fill(uniform, 1.0);
        double e = DOptimalDesign.efficiency(allocate(uniform, windows.count(), 1.0), optimal);
        // a survey spends most of its time on the 100+ windows far from a 1 AU peak that holds ~10
        // windows: its D-efficiency must be small (here it is about 0.1; textbook behaviour of D-optimality)
        assertTrue(e > 0 && e < 0.3, "uniform survey efficiency " + e);
    }

    @Test
    void shouldScaleInformationWithTime() {
        DOptimalDesign d = new DOptimalDesign(cup, TestInstruments.DEMO_CUP.preamp(), windows);
        double[][] one = d.optimalInformation(REFERENCE, 1.0, STEP_SECONDS);
        double[][] two = d.optimalInformation(REFERENCE, 2.0, STEP_SECONDS);
        // Fisher information adds over independent measurements: twice the time, twice F, det x8
        assertEquals(8.0, ProtonInformation.det(two) / ProtonInformation.det(one), 1e-9);
    }

    @Test
    void shouldInvertAThreeByThreeMatrix() {
        double[][] f = {{4, 1, 0.5}, {1, 3, 0.2}, {0.5, 0.2, 2}};
        double[][] inv = ProtonInformation.inverse(f);
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double s = 0;
                for (int k = 0; k < 3; k++) {
                    s += f[i][k] * inv[k][j];
                }
                assertEquals(i == j ? 1 : 0, s, 1e-12); // F F^-1 = I
            }
        }
    }

    @Test
    void shouldGiveEachWindowTheInformationOfItsOwnClosedFormToTheBit() {
        // the windows' information from the edges they share is, to the bit, that of each window evaluated
        // on its own (the definition: the protons' sensitivities from ProtonInformation.gradient, their
        // current n dI/dn and the alphas' closed-form current split by the cup, the range and the noise of
        // the sum), averaged over the plasmas: protons with alphas drifting off the normal, a hot and a
        // cold plasma, protons alone
        IonSpecies a = IonSpecies.ALPHA;
        List<PlasmaState> plasmas = List.of(
                new PlasmaState(List.of(new IonPopulation(IonSpecies.PROTON, 5e6, 20e3, -10e3, 400e3, 40e3, 30e3),
                        new IonPopulation(a, 2e5, 35e3, -5e3, 420e3, 30e3, 25e3)), 0.3, 0.1, 1),
                new PlasmaState(List.of(new IonPopulation(IonSpecies.PROTON, 80e6, -5e3, 0, 300e3, 90e3, 90e3),
                        new IonPopulation(a, 3e6, -5e3, 0, 310e3, 60e3, 60e3)), 0, 0, 1),
                REFERENCE);
        double[][][] got = new DOptimalDesign(cup, TestInstruments.DEMO_CUP.preamp(), windows)
                .windowInformation(plasmas, STEP_SECONDS);
        double[][][] expected = new double[windows.count()][3][3];
        double[] g = new double[3];
        double[] quadrants = new double[4];
        double area = TestInstruments.DEMO_CUP.cup().effectiveAreaM2();
        for (PlasmaState plasma : plasmas) {
            IonPopulation p = ProtonInformation.protons(plasma);
            double[] amps = new double[plasma.populations().size()];
            for (int w = 0; w < windows.count(); w++) {
                info.gradient(plasma, p, windows.lowVolts(w), windows.highVolts(w), g);
                for (int i = 0; i < amps.length; i++) {
                    IonPopulation pi = plasma.populations().get(i);
                    double q = pi.species().chargeCoulomb();
                    double m = pi.species().massKg();
                    amps[i] = pi == p ? g[0] : ConvectedMaxwellian.windowCurrent(q, pi.densityPerM3(), area,
                            pi.vzMetresPerSecond(), plasma.normalThermalSpeed(pi),
                            ConvectedMaxwellian.speedForVoltage(windows.lowVolts(w), m, q),
                            ConvectedMaxwellian.speedForVoltage(windows.highVolts(w), m, q));
                }
                cup.splitCurrents(plasma, amps, quadrants);
                double total = quadrants[0] + quadrants[1] + quadrants[2] + quadrants[3];
                double maxQ = Math.max(Math.max(quadrants[0], quadrants[1]), Math.max(quadrants[2], quadrants[3]));
                int range = DOptimalDesign.rangeFor(TestInstruments.DEMO_CUP.preamp(), maxQ);
                ProtonInformation.accumulate(expected[w], g, info.variance(total, range, STEP_SECONDS) * STEP_SECONDS, 1.0);
            }
        }
        for (int w = 0; w < windows.count(); w++) {
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    assertEquals(Double.doubleToRawLongBits(expected[w][r][c] / plasmas.size()),
                            Double.doubleToRawLongBits(got[w][r][c]), "window " + w + ", element " + r + c);
                }
            }
        }
    }

    /** The information of {@code seconds} shared as {@code share/sum} over the windows, in steps of 8 ms. */
    private double[][] allocate(double[] share, double sum, double seconds) {
        double[][] f = new double[3][3];
        double[] g = new double[3];
        double[] quadrants = new double[4];
        IonPopulation p = ProtonInformation.protons(REFERENCE);
        for (int w = 0; w < share.length; w++) {
            if (share[w] == 0) {
                continue;
            }
            cup.quadrantCurrents(REFERENCE, windows.lowVolts(w), windows.highVolts(w), quadrants);
            double total = quadrants[0] + quadrants[1] + quadrants[2] + quadrants[3];
            double maxQ = Math.max(Math.max(quadrants[0], quadrants[1]), Math.max(quadrants[2], quadrants[3]));
            info.gradient(REFERENCE, p, windows.lowVolts(w), windows.highVolts(w), g);
            double steps = seconds * share[w] / sum / STEP_SECONDS;
            ProtonInformation.accumulate(f, g, info.variance(total, DOptimalDesign.rangeFor(TestInstruments.DEMO_CUP.preamp(), maxQ), STEP_SECONDS),
                    steps);
        }
        return f;
    }
}
