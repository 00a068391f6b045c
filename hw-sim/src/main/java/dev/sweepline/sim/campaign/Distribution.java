package dev.sweepline.sim.campaign;

import java.util.SplittableRandom;

/**
 * A seeded distribution of one scenario parameter in a campaign's ensemble.
 *
 * <pre>
 * {fixed: v} | {uniform: [a, b]} | {logUniform: [a, b]} (a, b > 0) | {normal: [mean, sd]}
 * </pre>
 */
public sealed interface Distribution {
    /** One draw. */
    double draw(SplittableRandom random);

    /** Always {@code value}. */
    record Fixed(double value) implements Distribution {
        @Override
        public double draw(SplittableRandom random) {
            return value;
        }
    }

    /** Uniform on [low, high). */
    record Uniform(double low, double high) implements Distribution {
        @Override
        public double draw(SplittableRandom random) {
            return low + (high - low) * random.nextDouble();
        }
    }

    /** Uniform in the logarithm on [low, high): for densities and temperatures spanning decades. */
    record LogUniform(double low, double high) implements Distribution {
        @Override
        public double draw(SplittableRandom random) {
            return Math.exp(Math.log(low) + (Math.log(high) - Math.log(low)) * random.nextDouble());
        }
    }

    /** Gaussian (Box-Muller on the seeded stream, so the draw depends on the seed alone). */
    record Normal(double mean, double sd) implements Distribution {
        @Override
        public double draw(SplittableRandom random) {
            double u1 = 1.0 - random.nextDouble(); // (0, 1]: log is finite
            double u2 = random.nextDouble();
            return mean + sd * Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
        }
    }
}
