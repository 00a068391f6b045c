package dev.sweepline.sim.scenario;

/** Small valid scenario texts for the tests (the built-ins are tested as they are). */
final class TestScenarios {
    /** Starting values of {@link #text}: n 1000 cm^-3, U 400 km/s, T 1e5 K, He/H 0.04, flow (2, -1) deg. */
    static final double DENSITY = 1000;
    static final double SPEED = 400;
    static final double TEMPERATURE = 1e5;

    private TestScenarios() {
    }

    /** A scenario of {@code durationS} with the given YAML appended (fluctuations, events). */
    static String text(double durationS, String tail) {
        return """
                format: sweepline-scenario/1
                name: test-scenario
                description: made by the tests
                distanceAu: 0.1
                durationS: %s
                protons:
                  densityPerCc: 1000
                  speedKmPerS: 400
                  temperatureK: 1.0e5
                alphas:
                  abundance: 0.04
                  driftKmPerS: 20
                  temperatureRatio: 4
                flow:
                  thetaXDeg: 2
                  thetaYDeg: -1
                field:
                  thetaXDeg: 10
                  thetaYDeg: 0
                """.formatted(durationS) + tail;
    }

    /** {@link #text} parsed. */
    static Scenario scenario(double durationS, String tail) {
        return ScenarioLoader.parse(text(durationS, tail), "test-scenario.yaml");
    }
}
