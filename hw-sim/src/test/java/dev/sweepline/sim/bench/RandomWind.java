package dev.sweepline.sim.bench;

import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Random but physically plausible solar-wind scenarios for the property tests, one per seed, written
 * in the scenario file format and parsed by the real loader.
 *
 * <p>Ranges (physics.md, "Solar wind"): U 250-750 km/s (slow wind at 1 AU to fast wind); U/w between
 * 3 (near 0.05 AU, Dakeyo et al. 2022 row) and 12 (cool 1 AU wind); n 5-4000 cm^-3 (1 AU to 0.05 AU,
 * r^-2 scaling row); T_alpha/T_p 1-6 (about 4 in the fast wind [memory]); alpha drift up to 10 % of
 * U [memory]; flow within 6 degrees of the normal.
 */
final class RandomWind {
    private static final double PROTON_MASS_KG = 1.67262192369e-27; // CODATA 2018
    private static final double BOLTZMANN = 1.380649e-23; // CODATA 2018, exact

    private RandomWind() {
    }

    /** A steady wind with He/H in [abundanceLow, abundanceHigh], lasting {@code seconds}. */
    static Scenario steady(long seed, double abundanceLow, double abundanceHigh, double seconds) {
        SplittableRandom r = new SplittableRandom(seed);
        return ScenarioLoader.parse(header(r, "steady", abundanceLow, abundanceHigh, seconds), "steady-" + seed + ".yaml");
    }

    /**
     * A wind hit by a shock at a random time 8-12 s, ramp 0-1 s (within one survey sweep of about
     * 1.2 s), with shock-sheath.yaml's shock: density x2.5, speed +35 %, temperature x3; marked as a jump.
     */
    static Scenario shocked(long seed, double secondsAfterFront) {
        SplittableRandom r = new SplittableRandom(seed);
        double at = 8 + 4 * r.nextDouble();
        double ramp = r.nextDouble();
        double duration = at + ramp + secondsAfterFront;
        String text = header(r, "shocked", 0.01, 0.08, duration) + String.format(Locale.ROOT, """
                events:
                  - label: shock front
                    atS: %.4f
                    rampS: %.4f
                    jump: true
                    scale: {protonDensity: 2.5, protonSpeed: 1.35, protonTemperature: 3}
                """, at, ramp);
        return ScenarioLoader.parse(text, "shocked-" + seed + ".yaml");
    }

    private static String header(SplittableRandom r, String kind, double abundanceLow, double abundanceHigh,
            double seconds) {
        double speed = 250 + 500 * r.nextDouble();
        double uOverW = 3 + 9 * r.nextDouble();
        double w = speed * 1e3 / uOverW;
        double temperature = PROTON_MASS_KG * w * w / (2 * BOLTZMANN);
        double density = Math.exp(Math.log(5) + (Math.log(4000) - Math.log(5)) * r.nextDouble());
        double abundance = abundanceLow + (abundanceHigh - abundanceLow) * r.nextDouble();
        double alphaRatio = 1 + 5 * r.nextDouble();
        double drift = 0.1 * speed * r.nextDouble();
        return String.format(Locale.ROOT, """
                format: sweepline-scenario/1
                name: %s
                description: random %s wind for property tests
                distanceAu: 0.2
                durationS: %.4f
                protons:
                  densityPerCc: %.4f
                  speedKmPerS: %.4f
                  temperatureK: %.2f
                alphas:
                  abundance: %.5f
                  driftKmPerS: %.3f
                  temperatureRatio: %.4f
                flow:
                  thetaXDeg: %.3f
                  thetaYDeg: %.3f
                field:
                  thetaXDeg: %.3f
                  thetaYDeg: %.3f
                fluctuations:
                  correlationS: 20
                  densityRms: 0.02
                  speedRms: 0.005
                  temperatureRms: 0.02
                  flowAngleRmsDeg: 0.2
                """, kind, kind, seconds, density, speed, temperature, abundance, drift, alphaRatio,
                -6 + 12 * r.nextDouble(), -6 + 12 * r.nextDouble(), -30 + 60 * r.nextDouble(), -10 + 20 * r.nextDouble());
    }
}
