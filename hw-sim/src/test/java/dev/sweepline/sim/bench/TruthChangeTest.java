package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.List;
import java.util.function.LongFunction;
import org.junit.jupiter.api.Test;

/**
 * The within-sweep change of the truth written to decisions.csv, on a plasma that changes linearly over
 * a one-second sweep; expected values from |x(end) - x(start)| / x(mid) worked out beside them.
 */
class TruthChangeTest {
    @Test
    void shouldGiveTheRelativeChangeOverTheSweepAgainstMidSweep() {
        // n 100 -> 110 cm^-3, U 400 km/s held, w 50 -> 55 km/s, linear in time over 0..1 s
        LongFunction<PlasmaState> truthAt = micros -> {
            double f = micros / 1e6;
            IonPopulation p = IonPopulation.isotropic(IonSpecies.PROTON, (100 + 10 * f) * 1e6, 0, 0, 400e3,
                    (50 + 5 * f) * 1e3);
            return new PlasmaState(List.of(p), 0, 0, 1);
        };
        SweepRecord sweep = new SweepRecord(1, SweepMode.FOCUS, 0, 1_000_000, 10, 40, 25, 25, 25, -1, 0);
        double[] change = TruthChange.of(sweep, truthAt);
        assertEquals(10.0 / 105, change[0], 1e-12); // n: (110 - 100) / 105 at mid-sweep
        assertEquals(0.0, change[1], 1e-12); // U held
        assertEquals((55.0 * 55 - 50 * 50) / (52.5 * 52.5), change[2], 1e-12); // T ~ w^2: 525 / 2756.25
    }
}
