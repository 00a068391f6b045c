package dev.sweepline.fsw;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReplyCodec;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The demo cup of the tests: {@code instruments/demo-cup.yaml} read through the host's description
 * reader (test code may use the host), and what the flight software derives from it.
 */
public final class DemoCup {
    /** The description file as read. */
    public static final InstrumentSpec SPEC = Instruments.builtIn("demo-cup");
    /** The flight software's description of it. */
    public static final InstrumentDescription INSTRUMENT = SPEC.flight();
    /** Its sample reply codec (16-bit ADC: 2-octet samples, 15-octet replies; hardware ICD §3.2). */
    public static final SampleReplyCodec REPLIES = SampleReplyCodec.of(INSTRUMENT);
    /** Its modulation period, µs (demo-cup.yaml modulator.modulationPeriodMicros: 1000). */
    public static final int MODULATION_PERIOD_MICROS = INSTRUMENT.modulationPeriodMicros();

    private DemoCup() {
    }

    /** The default table (demo-cup.yaml windows: 128 log-spaced windows 50-6000 V at 0.1 V per code). */
    public static WindowTable table() {
        return INSTRUMENT.defaultTable();
    }

    /** The default sweep parameters (demo-cup.yaml cadence and noise, the flight defaults otherwise). */
    public static SweepParameters parameters() {
        return INSTRUMENT.defaultParameters();
    }

    /** A flight configuration for the demo cup, every other value at its default. */
    public static FlightConfig config() {
        return FlightConfig.of(INSTRUMENT);
    }
}
