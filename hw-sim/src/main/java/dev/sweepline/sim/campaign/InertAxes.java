package dev.sweepline.sim.campaign;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The grid axes that changed nothing: an axis is inert when, for every combination of the other axes
 * and every ensemble member, all of its values gave the same run row (every metric of {@link RunRow}
 * alike, only the set index differing). Such an axis spends runs without telling the team anything;
 * usually the parameter never comes into play on the campaign's scenario (an edge search that no lock
 * loss triggers, a band width clamped by {@code maxBandWindows}).
 */
final class InertAxes {
    private InertAxes() {
    }

    /** Keys of the inert axes with two or more values, in grid order. */
    static List<String> of(CampaignSpec spec, List<RunRow> rows) {
        List<String> inert = new ArrayList<>();
        for (int a = 0; a < spec.grid().size(); a++) {
            if (spec.grid().get(a).values().size() > 1 && inert(spec, rows, a)) {
                inert.add(spec.grid().get(a).parameter().key());
            }
        }
        return inert;
    }

    private static boolean inert(CampaignSpec spec, List<RunRow> rows, int axis) {
        // one reference row per (other axes' values, member): every value of the axis must match it
        Map<String, String> reference = new HashMap<>();
        for (RunRow r : rows) {
            double[] v = spec.setValues(r.set());
            StringBuilder key = new StringBuilder().append(r.run());
            for (int a = 0; a < v.length; a++) {
                // a linked axis moves with the others linked to it: they are not "the other axes"
                if (a != axis && !(spec.grid().get(axis).linked() && spec.grid().get(a).linked())) {
                    key.append(',').append(v[a]);
                }
            }
            String metrics = r.toCsv().substring(r.toCsv().indexOf(',') + 1);
            String before = reference.putIfAbsent(key.toString(), metrics);
            if (before != null && !before.equals(metrics)) {
                return false;
            }
        }
        return !rows.isEmpty();
    }
}
