package dev.sweepline.sim.bench;

import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.util.List;

/**
 * The descriptions the bench's ground check decodes with: the ground's own built-ins for a built-in
 * instrument, else the ground's reading of the same description file (the ground parses it itself,
 * through its public API: instruments/FORMAT.md; it shares no code with the flight software).
 */
public final class GroundInstruments {
    /** The last description resolved and its set: a campaign asks for the same description run after run. */
    private record Resolved(InstrumentSpec spec, InstrumentSet set) {
    }

    private static volatile Resolved last;

    private GroundInstruments() {
    }

    /** The ground's descriptions for a run of {@code spec} (the same description object gives the same set). */
    public static InstrumentSet of(InstrumentSpec spec) {
        Resolved r = last;
        if (r != null && r.spec() == spec) {
            return r.set();
        }
        InstrumentSet set = resolve(spec);
        last = new Resolved(spec, set);
        return set;
    }

    private static InstrumentSet resolve(InstrumentSpec spec) {
        String name = spec.name();
        if (Instruments.builtInNames().contains(name) && Instruments.builtIn(name).equals(spec)) {
            return InstrumentSet.builtIns();
        }
        return InstrumentSet.resolve(List.of(spec.file()));
    }
}
