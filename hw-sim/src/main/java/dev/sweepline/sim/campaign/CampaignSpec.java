package dev.sweepline.sim.campaign;

import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.sim.scenario.PlasmaConditions;
import dev.sweepline.sim.scenario.PlasmaParameter;
import dev.sweepline.sim.scenario.Scenario;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import dev.sweepline.sim.seed.SeedTree;
import java.util.SplittableRandom;

/**
 * A tuning campaign: a scenario ensemble (the base scenario with its starting plasma drawn from
 * seeded distributions) crossed with a grid over the sweep parameters (some of whose axes may be linked,
 * taking their values together: whole tables side by side). Every grid point ("set") is
 * run on the same ensemble draws (common random numbers), so differences between sets come from the
 * sets, not from the luck of the draw.
 *
 * @param name             campaign name
 * @param description      what it is for
 * @param seed             seeds every draw and every run
 * @param runsPerSet       ensemble members run for each set
 * @param durationSeconds  simulated time of each run
 * @param base             the base scenario (events, fluctuations, distance)
 * @param draws            distributions of starting-plasma parameters, in file order
 * @param grid             axes of the parameter grid, in file order
 * @param allocationBitsPerSecond downlink allocation the sets are judged against; NaN for none
 * @param eventShift       distribution of the shift of the base scenario's events (when the shocks
 *                         come), seconds; null: the events stay where the scenario has them
 * @param instrument       the instrument flown (the grid's window-unit values are in its table's windows)
 */
public record CampaignSpec(String name, String description, long seed, int runsPerSet, double durationSeconds,
        Scenario base, Map<PlasmaParameter, Distribution> draws, List<GridAxis> grid,
        double allocationBitsPerSecond, Distribution eventShift, InstrumentModel instrument) {

    /**
     * One grid axis: a tunable parameter and the values it takes; a {@code linked} axis takes its i-th value
     * together with the i-th value of every other linked axis (FORMAT.md, {@code linked}), so that the linked
     * axes are one axis of the grid, at the place of the first of them.
     */
    public record GridAxis(TunableParameter parameter, List<Double> values, boolean linked) {
        /** An axis crossed with every other. */
        public GridAxis(TunableParameter parameter, List<Double> values) {
            this(parameter, values, false);
        }
    }

    /**
     * Number of grid points: the product of the axis lengths, the linked axes counting once.
     *
     * @throws ArithmeticException when it exceeds an int (the reader refuses such a grid, {@link #sets})
     */
    public int setCount() {
        return Math.toIntExact(sets(grid));
    }

    /** The grid points of {@code grid}, as {@link #setCount}, in a long held at Long.MAX_VALUE once it would overflow. */
    static long sets(List<GridAxis> grid) {
        long n = 1;
        boolean linkedSeen = false;
        for (GridAxis a : grid) {
            if (!a.linked() || !linkedSeen) {
                int size = a.values().size();
                n = n > Long.MAX_VALUE / size ? Long.MAX_VALUE : n * size;
            }
            linkedSeen |= a.linked();
        }
        return n;
    }

    /** The values of set {@code index} along each axis (the last axis varies fastest; linked axes together). */
    public double[] setValues(int index) {
        double[] v = new double[grid.size()];
        int rest = index;
        int firstLinked = -1;
        for (int a = 0; a < grid.size() && firstLinked < 0; a++) {
            firstLinked = grid.get(a).linked() ? a : -1;
        }
        int linkedIndex = 0;
        for (int a = grid.size() - 1; a >= 0; a--) {
            List<Double> values = grid.get(a).values();
            if (grid.get(a).linked() && a != firstLinked) {
                continue; // takes the first linked axis's index, below
            }
            int i = rest % values.size();
            rest /= values.size();
            v[a] = values.get(i);
            if (a == firstLinked) {
                linkedIndex = i;
            }
        }
        for (int a = 0; a < grid.size(); a++) {
            if (grid.get(a).linked()) {
                v[a] = grid.get(a).values().get(linkedIndex);
            }
        }
        return v;
    }

    /** The flight software's parameters of set {@code index}: the defaults with the set's values applied. */
    public SweepParameters parameters(int index) {
        SweepParameters p = instrument.flight().defaultParameters();
        double[] v = setValues(index);
        for (int a = 0; a < grid.size(); a++) {
            grid.get(a).parameter().apply(p, v[a]);
        }
        return p;
    }

    /** Seed of ensemble member {@code run}, the same for every set ({@link SeedTree#member}). */
    public long runSeed(int run) {
        return SeedTree.of(seed).member(run).seed();
    }

    /** Ensemble member {@code run}: the base scenario from a drawn start. */
    public Scenario member(int run) {
        SplittableRandom random = SeedTree.of(seed).member(run).ensembleDraws();
        PlasmaConditions start = base.start();
        for (Map.Entry<PlasmaParameter, Distribution> d : draws.entrySet()) {
            start = start.with(d.getKey(), Ensemble.clip(d.getKey(), d.getValue().draw(random)));
        }
        // shift the events within the base scenario first, then cut the run to the campaign's duration
        Scenario shifted = eventShift == null ? base : base.withEventsShifted(eventShift.draw(random));
        return shifted.withStart(base.name() + "-member-" + run, start, base.distanceAu(), durationSeconds);
    }

    /** The keys of the grid axes, in order. */
    public List<String> axisKeys() {
        List<String> keys = new ArrayList<>();
        grid.forEach(a -> keys.add(a.parameter().key()));
        return keys;
    }
}
