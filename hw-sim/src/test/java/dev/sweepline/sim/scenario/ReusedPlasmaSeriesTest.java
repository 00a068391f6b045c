package dev.sweepline.sim.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.plasma.ReusablePlasma;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The bench's per-step plasma refilled in place is the freshly built plasma to the bit. */
class ReusedPlasmaSeriesTest {

    @Test
    void reusedPlasmaIsTheBuiltPlasmaToTheBitInEveryBuiltInScenario() {
        for (String name : ScenarioLoader.builtInNames()) {
            Scenario s = ScenarioLoader.builtIn(name);
            // two series over two timelines of the same seed: one builds, one refills
            PlasmaStates.Series built = new PlasmaStates.Series(s.timeline(7), s.alphaDriftDirection());
            PlasmaStates.Series reused = new PlasmaStates.Series(s.timeline(7), s.alphaDriftDirection());
            PlasmaState first = reused.reused(0.0);
            for (double t = 0.0; t < 900.0; t += 0.37) {
                PlasmaState fresh = built.at(t);
                PlasmaState again = reused.reused(t);
                assertSame(first, again, name + ": one plasma refilled");
                // equals compares every double by Double.compare, i.e. bit for bit (NaN aside)
                assertEquals(fresh, again, name + " at " + t + " s");
                assertEquals(fresh.hashCode(), again.hashCode(), name + " at " + t + " s");
            }
        }
    }

    @Test
    void reusablePlasmaDropsTheAlphasWhenAskedAndNormalisesTheFieldAsTheConstructor() {
        ReusablePlasma reusable = new ReusablePlasma();
        // arbitrary valid values (SI); the field (1, 2, 2) has norm 3, closed form
        PlasmaState p = reusable.protons(5e6, 1e4, -2e4, 4e5, 4e4, 3e4).alphas(2e5, 1e4, -2e4, 4.3e5, 4e4, 3e4)
                .set(true, 1, 2, 2);
        PlasmaState expected = new PlasmaState(List.of(
                new IonPopulation(IonSpecies.PROTON, 5e6, 1e4, -2e4, 4e5, 4e4, 3e4),
                new IonPopulation(IonSpecies.ALPHA, 2e5, 1e4, -2e4, 4.3e5, 4e4, 3e4)), 1, 2, 2);
        assertEquals(expected, p);
        assertEquals(2.0 / 3.0, p.by(), 1e-15); // closed form: 2 / 3
        PlasmaState protonsOnly = reusable.set(false, 0, 0, 1);
        assertEquals(1, protonsOnly.populations().size());
        assertEquals(IonSpecies.PROTON, protonsOnly.populations().get(0).species());
    }
}
