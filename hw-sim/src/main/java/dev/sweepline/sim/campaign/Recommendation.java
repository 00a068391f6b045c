package dev.sweepline.sim.campaign;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The recommended set, with the noise of a finite ensemble taken into account.
 *
 * <p>Rule (stated in campaigns/FORMAT.md): (1) the leader is the set {@link ParetoFront#recommend}
 * picks: on the Pareto front, sound and within the allocation, best accuracy, then fewest bits.
 * (2) Every set that qualifies (sound and within the allocation, on the front or not) is compared with
 * the leader, member by member ({@link PairedInterval}, 95 %) on accuracy, telemetry rate and cadence;
 * it is indistinguishable from the leader when it is not distinguishably worse on any of the three
 * (accuracy and bits: interval not wholly above zero; cadence: not wholly below zero). (3) Among the
 * indistinguishable sets the one closest to the instrument's default table is recommended (distance:
 * the sum over the grid axes of |value - default| / the axis's span); equal distances go to the better
 * accuracy, then the fewer bits, then the lower set index.
 *
 * @param leader            the set of step (1); null when no set qualifies
 * @param chosen            the recommended set of step (3); null when no set qualifies
 * @param indistinguishable the sets of step (2), in set order (the leader among them)
 * @param versusLeader      per set index, its paired intervals against the leader (empty without a leader)
 */
public record Recommendation(SetResult leader, SetResult chosen, List<SetResult> indistinguishable,
        Map<Integer, Versus> versusLeader) {

    /**
     * One set against the leader: paired differences set - leader, 95 % intervals.
     *
     * @param accuracy mean median relative error (lower better)
     * @param bits     telemetry bits per second (lower better)
     * @param cadence  spectra per second (higher better)
     * @param tied     not distinguishably worse than the leader on any of the three, and qualifying
     */
    public record Versus(PairedInterval accuracy, PairedInterval bits, PairedInterval cadence, boolean tied) {
    }

    /** True when more than one set could not be told apart from the leader. */
    public boolean withinNoise() {
        return indistinguishable.size() > 1;
    }

    /** The recommendation over {@code sets} (in set order) from their runs {@code rows}. */
    public static Recommendation of(CampaignSpec spec, List<SetResult> sets, List<SetResult> front, List<RunRow> rows) {
        SetResult leader = ParetoFront.recommend(front, spec.allocationBitsPerSecond());
        if (leader == null) {
            return new Recommendation(null, null, List.of(), Map.of());
        }
        double[][][] objectives = objectives(spec, sets.size(), rows); // [set][objective][member]
        Map<Integer, Versus> versus = new LinkedHashMap<>();
        List<SetResult> tied = new ArrayList<>();
        double[][] ref = objectives[leader.set()];
        for (SetResult s : sets) {
            double[][] o = objectives[s.set()];
            PairedInterval acc = PairedInterval.of(o[0], ref[0]);
            PairedInterval bits = PairedInterval.of(o[1], ref[1]);
            PairedInterval cadence = PairedInterval.of(o[2], ref[2]);
            boolean same = ParetoFront.qualifies(s, spec.allocationBitsPerSecond()) && !acc.above() && !bits.above()
                    && !cadence.below();
            versus.put(s.set(), new Versus(acc, bits, cadence, same));
            if (same) {
                tied.add(s);
            }
        }
        SetResult chosen = leader;
        double best = distanceToDefault(spec, leader);
        for (SetResult s : tied) {
            double d = distanceToDefault(spec, s);
            if (d < best || (d == best && better(s, chosen))) {
                chosen = s;
                best = d;
            }
        }
        return new Recommendation(leader, chosen, tied, versus);
    }

    private static boolean better(SetResult a, SetResult b) {
        if (a.accuracy() != b.accuracy()) {
            return a.accuracy() < b.accuracy();
        }
        if (a.bitsPerSecondMean() != b.bitsPerSecondMean()) {
            return a.bitsPerSecondMean() < b.bitsPerSecondMean();
        }
        return a.set() < b.set();
    }

    /** Sum over the grid axes of |value - default| / (largest - smallest value of the axis; 1 if one value). */
    static double distanceToDefault(CampaignSpec spec, SetResult s) {
        double[] defaults = defaults(spec);
        double d = 0;
        for (int a = 0; a < spec.grid().size(); a++) {
            List<Double> values = spec.grid().get(a).values();
            double span = values.stream().mapToDouble(Double::doubleValue).max().orElse(0)
                    - values.stream().mapToDouble(Double::doubleValue).min().orElse(0);
            d += Math.abs(s.values()[a] - defaults[a]) / (span > 0 ? span : 1);
        }
        return d;
    }

    /** The instrument's default value of each grid axis, plain units. */
    static double[] defaults(CampaignSpec spec) {
        var p = spec.instrument().flight().defaultParameters();
        double[] v = new double[spec.grid().size()];
        for (int a = 0; a < v.length; a++) {
            v[a] = spec.grid().get(a).parameter().read(p);
        }
        return v;
    }

    /** Per set, per objective (accuracy, bits per second, spectra per second), per member. */
    private static double[][][] objectives(CampaignSpec spec, int setCount, List<RunRow> rows) {
        double[][][] o = new double[setCount][3][spec.runsPerSet()];
        for (double[][] set : o) {
            for (double[] objective : set) {
                java.util.Arrays.fill(objective, Double.NaN);
            }
        }
        for (RunRow r : rows) {
            o[r.set()][0][r.run()] = r.accuracy();
            o[r.set()][1][r.run()] = r.bitsPerSecond();
            o[r.set()][2][r.run()] = r.spectraPerSecond();
        }
        return o;
    }
}
