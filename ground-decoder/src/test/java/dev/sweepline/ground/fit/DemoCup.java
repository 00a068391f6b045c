package dev.sweepline.ground.fit;

import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.DefaultWindowTable;
import dev.sweepline.ground.instrument.GroundInstrument;

/** The demo cup (built-in demo-cup.yaml) as the fit tests use it: its geometry, noise and default table. */
public final class DemoCup {
    /** The description. */
    public static final GroundInstrument INSTRUMENT = BuiltInInstruments.demoCup();
    /** Its geometry. */
    public static final CupGeometry CUP = CupGeometry.of(INSTRUMENT);
    /** Its noise model (ICD §8). */
    public static final NoiseModel NOISE = new NoiseModel(INSTRUMENT);
    /** Its default window table. */
    public static final DefaultWindowTable TABLE = INSTRUMENT.windows();

    private DemoCup() {
    }
}
