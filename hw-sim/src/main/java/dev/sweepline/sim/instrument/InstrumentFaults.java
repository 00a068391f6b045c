package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.SampleReply;

/**
 * Faults injected into the simulated electronics (fault-protection tests, command scripts). Each one
 * alters the reply after the instrument has computed it, so the noise stream, the truth and every
 * run without a fault stay exactly as they were. All off by default; set the fields between steps.
 */
public final class InstrumentFaults {
    /** No stuck quadrant. */
    public static final int NONE = -1;

    /** HV readback fault: added to the monitor code (DAC codes), as from a drifted monitor divider. */
    public int hvReadbackOffsetCodes;
    /** ADC saturation: every quadrant reads the top code (a railed preamplifier). */
    public boolean saturateAdc;
    /** Stuck channel: index 0..3 of the quadrant that reads {@link #stuckCode}, or {@link #NONE}. */
    public int stuckQuadrant = NONE;
    /** Stuck channel: the code the stuck quadrant reads. */
    public int stuckCode = 1000;
    /** Dead collector: every quadrant reads the pedestal (no signal at all: the peak is lost). */
    public boolean deadCollector;
    /** Link fault: the reply carries a wrong sequence number (bit 15 flipped), so the executive drops it. */
    public boolean corruptSequence;

    private final int dacTopCode;
    private final int pedestalCounts;
    private final int adcTopCode;

    /** The faults of an instrument of description {@code d} (its DAC and ADC codes), all off. */
    public InstrumentFaults(InstrumentDescription d) {
        this.dacTopCode = d.dacTopCode();
        this.pedestalCounts = d.pedestalCounts();
        this.adcTopCode = d.adcTopCode();
    }

    /** Clears every fault. */
    public void clear() {
        hvReadbackOffsetCodes = 0;
        saturateAdc = false;
        stuckQuadrant = NONE;
        deadCollector = false;
        corruptSequence = false;
    }

    /** True when any fault is set. */
    public boolean any() {
        return hvReadbackOffsetCodes != 0 || saturateAdc || stuckQuadrant != NONE || deadCollector || corruptSequence;
    }

    /** Applies the faults to a computed reply. */
    void apply(SampleReply reply) {
        if (hvReadbackOffsetCodes != 0) {
            reply.hvMonitorCode = Math.max(0, Math.min(dacTopCode,
                    reply.hvMonitorCode + hvReadbackOffsetCodes));
        }
        if (deadCollector) {
            for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
                reply.quadrant[q] = pedestalCounts;
            }
            reply.status &= ~SampleReply.STATUS_SATURATED;
        }
        if (saturateAdc) {
            for (int q = 0; q < InstrumentDescription.QUADRANTS; q++) {
                reply.quadrant[q] = adcTopCode;
            }
            reply.status |= SampleReply.STATUS_SATURATED;
        }
        if (stuckQuadrant >= 0 && stuckQuadrant < InstrumentDescription.QUADRANTS) {
            reply.quadrant[stuckQuadrant] = stuckCode;
        }
        if (corruptSequence) {
            reply.sequence ^= 0x8000;
        }
    }
}
