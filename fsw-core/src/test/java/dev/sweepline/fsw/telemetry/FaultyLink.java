package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SyntheticInstrument;

/**
 * A link to a {@link SyntheticInstrument} that loses every {@code dropEvery}-th reply (the executive
 * times out and re-sends) and, before every {@code staleEvery}-th reply, delivers a reply with a
 * sequence number of no step in flight (a sequence error), so that every housekeeping counter moves.
 * Replies arrive 100 µs after the step's duration.
 */
public final class FaultyLink implements InstrumentLink {
    private static final long LATENCY_MICROS = 100;

    private final SyntheticInstrument instrument;
    private final int dropEvery;
    private final int staleEvery;
    private final SampleReply pending = new SampleReply();
    private boolean hasPending;
    private boolean staleFirst;
    private long dueMicros;
    private long sends;

    /** A link that loses nothing and delivers no stray reply: every step answered as commanded. */
    public static FaultyLink faultless(SyntheticInstrument instrument) {
        return new FaultyLink(instrument, Integer.MAX_VALUE, Integer.MAX_VALUE);
    }

    FaultyLink(SyntheticInstrument instrument, int dropEvery, int staleEvery) {
        this.instrument = instrument;
        this.dropEvery = dropEvery;
        this.staleEvery = staleEvery;
    }

    @Override
    public boolean send(StepCommand step, long nowMicros) {
        sends++;
        hasPending = sends % dropEvery != 0 && instrument.answer(step, pending);
        staleFirst = hasPending && sends % staleEvery == 0;
        dueMicros = nowMicros + step.durationMicros(DemoCup.MODULATION_PERIOD_MICROS) + LATENCY_MICROS;
        return true;
    }

    @Override
    public boolean poll(SampleReply into, long nowMicros) {
        if (!hasPending || nowMicros - dueMicros < 0) {
            return false;
        }
        into.copyFrom(pending);
        if (staleFirst) {
            into.sequence = (pending.sequence + 0x8000) & 0xFFFF; // half the sequence space away: no step in flight
            staleFirst = false;
            return true;
        }
        hasPending = false;
        return true;
    }
}
