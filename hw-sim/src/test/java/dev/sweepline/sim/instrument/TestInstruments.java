package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.host.instrument.Instruments;

/** The built-in instruments as simulator models, read through the host reader as the bench reads them. */
public final class TestInstruments {
    /** The demo cup (instruments/demo-cup.yaml). */
    public static final InstrumentModel DEMO_CUP = InstrumentModel.of(Instruments.builtIn("demo-cup"));
    /** The second built-in cup (instruments/fine-cup.yaml). */
    public static final InstrumentModel FINE_CUP = InstrumentModel.of(Instruments.builtIn("fine-cup"));

    private TestInstruments() {
    }
}
