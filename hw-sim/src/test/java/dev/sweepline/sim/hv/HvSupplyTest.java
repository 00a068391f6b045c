package dev.sweepline.sim.hv;

import dev.sweepline.sim.instrument.TestInstruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class HvSupplyTest {
    private static final HvSupplyParameters DEMO = TestInstruments.DEMO_CUP.hv();
    private static final HvCalibration CAL = TestInstruments.DEMO_CUP.calibration();
    /** Recorded seed of the monitor-noise test. */
    private static final long SEED = 20261201L;
    private static final long T0 = 1_000_000L;

    @Test
    void shouldSlewLinearlyThenSettle() {
        // dV/dt = clamp((target - V)/tau, -S, S): slew for (dV - S tau)/S = (1000 - 15 V)/(1e5 V/s) = 9.85 ms
        // [computed from the demo parameters]; values exact to rounding
        HvRail rail = new HvRail(DEMO);
        rail.command(1000, T0);
        assertEquals(9.85e-3, rail.slewSeconds(), 1e-15);
        assertEquals(100.0, rail.voltsAt(T0 + 1000), 1e-9); // 1 ms at 100 V/ms
        assertEquals(984.9, rail.voltsAt(T0 + 9849), 1e-9); // still linear 1 us before the switch
        assertEquals(1000 - 15, rail.voltsAt(T0 + 9850), 1e-9); // the switch point: S tau from the target
        assertEquals(1000 - 15 * Math.exp(-1), rail.voltsAt(T0 + 9850 + 150), 1e-9); // one tau later
    }

    @Test
    void shouldSettleWithinOnePerMilleAfterSevenTau() {
        // first-order system (textbook): residual e^-t/tau; e^-7 = 9.1e-4 < 1e-3 < e^-6.9 = 1.008e-3.
        // A 10 V step is inside the 15 V slew band, so it settles purely exponentially
        HvRail rail = new HvRail(DEMO);
        rail.command(500, T0);
        rail.command(510, T0 + 100_000);
        double at7tau = Math.abs(510 - rail.voltsAt(T0 + 100_000 + 1050)) / 10;
        double at69tau = Math.abs(510 - rail.voltsAt(T0 + 100_000 + 1035)) / 10;
        assertTrue(at7tau < 1e-3, "after 7 tau: " + at7tau);
        assertTrue(at69tau > 1e-3, "after 6.9 tau: " + at69tau);
        assertEquals(Math.exp(-7), at7tau, 1e-12);
    }

    @Test
    void shouldStayContinuousAndWithinTheSlewLimit() {
        // HV-3: a first-order loop's output is continuous, and its rate never exceeds S = 100 V/ms = 0.1 V/us;
        // 1e-9 V allows for rounding. Re-commanded mid-slew, mid-settle and downward
        HvRail rail = new HvRail(DEMO);
        rail.command(3000, T0);
        long[] commandTimes = {T0 + 5000, T0 + 40_000, T0 + 40_200};
        double[] targets = {200, 2990, 50};
        int next = 0;
        double previous = rail.voltsAt(T0);
        for (long t = T0 + 1; t < T0 + 80_000; t++) {
            if (next < commandTimes.length && t == commandTimes[next]) {
                double before = rail.voltsAt(t);
                rail.command(targets[next], t);
                assertEquals(before, rail.voltsAt(t), 0.0, "continuous across a command");
                next++;
            }
            double v = rail.voltsAt(t);
            assertTrue(Math.abs(v - previous) <= 0.1 + 1e-9, "rate at " + t + ": " + (v - previous) + " V/us");
            previous = v;
        }
        assertEquals(50, previous, 1e-6); // settled at the last target
    }

    @Test
    void shouldReadTheMonitorWithTheStatedNoise() {
        // monitor model: 0.5 V rms Gaussian plus rounding to 0.10015 V codes (uniform, variance LSB^2/12). The
        // sample variance of N = 40000 has relative sd sqrt(2/(N-1)) = 0.71 % (chi-square), so 5 sd = 3.5 %;
        // the mean has sd sigma/sqrt(N) = 0.0025 V, so 5 sd = 0.0125 V = 0.125 codes
        HvSupply supply = new HvSupply(CAL, DEMO);
        supply.command(8000, 20000, T0);
        long settled = T0 + 1_000_000; // 200 ms slew + far more than 7 tau
        SplittableRandom rng = new SplittableRandom(SEED);
        int n = 40_000;
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < n; i++) {
            double volts = CAL.volts(supply.monitorCode(settled, rng));
            sum += volts;
            sumSq += volts * volts;
        }
        double mean = sum / n;
        double variance = (sumSq - n * mean * mean) / (n - 1);
        double lsb = CAL.voltsPerCode();
        double expected = 0.25 + lsb * lsb / 12;
        assertEquals(expected, variance, 0.035 * expected);
        assertEquals(CAL.volts(20000), mean, 0.0125);
    }

    @Test
    void shouldBeAtZeroWhenDisabledAndRestartFromZero() {
        // HV-5: off means 0 V on both rails (exact); switched on again, the rail starts from 0 and slews
        HvSupply supply = new HvSupply(CAL, DEMO);
        supply.command(5000, 6000, T0);
        assertTrue(supply.highVoltsAt(T0 + 100_000) > 500);
        supply.disable(T0 + 100_000);
        assertEquals(0.0, supply.lowVoltsAt(T0 + 100_001), 0.0);
        assertEquals(0.0, supply.highVoltsAt(T0 + 200_000), 0.0);
        supply.command(5000, 6000, T0 + 300_000);
        assertEquals(100.0, supply.highVoltsAt(T0 + 301_000), 1e-9); // 1 ms at 100 V/ms from 0 V
        assertEquals(0.0, new HvSupply(CAL, DEMO).highVoltsAt(T0), 0.0); // initially off
    }
}
