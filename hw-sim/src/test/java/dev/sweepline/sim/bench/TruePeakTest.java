package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The pruned search for the true peak finds the window the exhaustive search finds (the reference: the scan of
 * every window, {@link TruePeak#scan}), on slowly drifting winds (the hint is the previous answer, as
 * in a run), on jumps (the hint far off), on cold and hot, dense and sparse, oblique and absent species.
 * Wind ranges: those of {@link RandomWind} (physics.md, "Solar wind"), widened to be harsher.
 */
class TruePeakTest {
    private static PlasmaState wind(SplittableRandom r, double speed, double w, double density, double alphaShare) {
        double tx = Math.toRadians(r.nextDouble(-8, 8));
        double ty = Math.toRadians(r.nextDouble(-8, 8));
        double vx = speed * Math.sin(tx);
        double vy = speed * Math.sin(ty);
        double vz = Math.sqrt(speed * speed - vx * vx - vy * vy);
        IonPopulation protons = new IonPopulation(IonSpecies.PROTON, density, vx, vy, vz, w, w * r.nextDouble(0.6, 1.5));
        if (alphaShare <= 0) {
            return new PlasmaState(List.of(protons), r.nextDouble(-0.3, 0.3), 0.1, 1);
        }
        IonPopulation alphas = IonPopulation.isotropic(IonSpecies.ALPHA, alphaShare * density, vx * 1.05, vy, vz * 1.05,
                w * r.nextDouble(0.5, 1.2));
        return new PlasmaState(List.of(protons, alphas), r.nextDouble(-0.3, 0.3), 0.1, 1);
    }

    private static void assertSameAsTheScan(InstrumentModel model, long seed) {
        FaradayCup cup = new FaradayCup(model.cup());
        WindowVolts windows = new WindowVolts(FlightConfig.of(model.flight()).table, model.calibration());
        TruePeak protons = new TruePeak(cup, IonSpecies.PROTON);
        TruePeak alphas = new TruePeak(cup, IonSpecies.ALPHA);
        SplittableRandom r = new SplittableRandom(seed);
        double speed = 300e3;
        double w = 60e3;
        double density = 1e8;
        for (int i = 0; i < 3000; i++) {
            if (r.nextInt(50) == 0) { // a jump
                speed = r.nextDouble(150e3, 900e3);
                w = speed / r.nextDouble(1.5, 20);
                density = Math.pow(10, r.nextDouble(5, 10));
            } else { // a slow drift, as from one sweep to the next
                speed *= 1 + r.nextDouble(-0.01, 0.01);
                w *= 1 + r.nextDouble(-0.02, 0.02);
            }
            PlasmaState plasma = wind(r, speed, w, density, r.nextInt(10) == 0 ? 0 : r.nextDouble(0.005, 0.2));
            for (TruePeak peak : new TruePeak[] {protons, alphas}) {
                IonSpecies species = peak == protons ? IonSpecies.PROTON : IonSpecies.ALPHA;
                int expected = -1;
                for (IonPopulation p : plasma.populations()) {
                    if (p.species().equals(species)) {
                        expected = TruePeak.scan(cup, new PlasmaState(List.of(p), plasma.bx(), plasma.by(), plasma.bz()),
                                windows);
                    }
                }
                assertEquals(expected, peak.of(plasma, windows), "seed " + seed + ", plasma " + i + ", " + species);
            }
        }
    }

    @Test
    void shouldFindTheWindowTheExhaustiveSearchFinds() {
        for (long seed = 1; seed <= 4; seed++) {
            assertSameAsTheScan(TestInstruments.DEMO_CUP, seed);
            assertSameAsTheScan(TestInstruments.FINE_CUP, seed);
        }
    }
}
