package dev.sweepline.sim.serve;

/**
 * How often the link is damaged, in each direction, from one seed.
 *
 * @param bitErrorRate   probability that a bit is flipped
 * @param dropPerOctet   probability that an octet is lost
 * @param dupPerOctet    probability that an octet arrives twice
 * @param stallPerOctet  probability that the stream stops after an octet
 * @param stallMicros    how long a stall holds the stream back
 * @param seed           root of the damage's seed tree: each kind in each direction its own stream
 *                       ({@code SeedTree.linkFaults})
 */
public record FaultPlan(double bitErrorRate, double dropPerOctet, double dupPerOctet, double stallPerOctet,
        long stallMicros, long seed) {
    /** No faults. */
    public static final FaultPlan NONE = new FaultPlan(0, 0, 0, 0, 0, 0);

    /** Checks every rate lies in [0, 1) and the stall is not negative. */
    public FaultPlan {
        for (double p : new double[] {bitErrorRate, dropPerOctet, dupPerOctet, stallPerOctet}) {
            if (!(p >= 0 && p < 1)) {
                throw new IllegalArgumentException("fault rates must lie in [0, 1)");
            }
        }
        if (stallMicros < 0) {
            throw new IllegalArgumentException("stall must be >= 0");
        }
    }

    /** True when no fault can happen. */
    public boolean none() {
        return bitErrorRate == 0 && dropPerOctet == 0 && dupPerOctet == 0 && stallPerOctet == 0;
    }
}
