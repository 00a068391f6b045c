package dev.sweepline.sim.link;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.FrameEncoder;
import dev.sweepline.fsw.link.SampleReplyCodec;
import dev.sweepline.fsw.link.StepCommandCodec;
import dev.sweepline.fsw.table.SettleTime;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The serial link's load (hardware ICD §6): octets per second each direction must carry for a sweep's
 * step rate, against what a baud rate carries with 8N1 framing (10 bits per octet: baud / 10 octets/s),
 * with a warning above {@link #WARN_FRACTION}.
 *
 * <p>The step rate of a mode comes from the table and the sweep parameters as the scheduler times
 * steps (settle = fixed + per-code slope times the larger rail change; integration = periods of
 * 1 ms): survey steps through every window, sweeps alternating in direction; focus is the busiest band of the widest focus
 * band the parameters allow (the narrowest window spacing: the shortest settle, the highest rate).
 * A step moves one step frame out and one reply frame back (each direction is its own wire).
 *
 * @param mode               "survey", "focus" or a caller's label
 * @param stepsPerSecond     step rate
 * @param octetsPerSecond    load of the busier direction, octets/s
 * @param capacityPerSecond  what the baud rate carries, octets/s
 */
public record LinkBudget(String mode, double stepsPerSecond, double octetsPerSecond, double capacityPerSecond) {
    /** Load above which a link is reported as tight (hardware ICD §6; common practice for serial links). */
    public static final double WARN_FRACTION = 0.80;
    /** Bits per octet on an 8N1 line: start + 8 data + stop. */
    public static final int BITS_PER_OCTET_8N1 = 10;
    /** Wire octets of a step frame: COBS(15 + CRC 2) + delimiter = 19 (hardware ICD §6). */
    public static final int STEP_FRAME_OCTETS = FrameEncoder.wireLength(StepCommandCodec.LENGTH);
    /** Wire octets of a sample reply frame of the instrument's samples (hardware ICD §3.2, §6; 19 for 2-octet samples). */
    public static int replyFrameOctets(InstrumentDescription d) {
        return FrameEncoder.wireLength(SampleReplyCodec.length(d.sampleOctets()));
    }

    /** The budget of {@code stepsPerSecond} at {@code baud} for the frames of instrument {@code d}. */
    public static LinkBudget of(String mode, double stepsPerSecond, int baud, InstrumentDescription d) {
        double octets = stepsPerSecond * Math.max(STEP_FRAME_OCTETS, replyFrameOctets(d));
        return new LinkBudget(mode, stepsPerSecond, octets, (double) baud / BITS_PER_OCTET_8N1);
    }

    /** Survey: every window of {@code table} in order. */
    public static LinkBudget survey(InstrumentDescription d, WindowTable table, SweepParameters p, int baud) {
        return of("survey", stepsPerSecond(d, table, p, 0, table.count()), baud, d);
    }

    /** Focus: the busiest run of the widest focus band along {@code table}. */
    public static LinkBudget focus(InstrumentDescription d, WindowTable table, SweepParameters p, int baud) {
        int width = Math.min(table.count(), p.maxBandWindows);
        double best = 0;
        for (int first = 0; first + width <= table.count(); first++) {
            best = Math.max(best, stepsPerSecond(d, table, p, first, width));
        }
        return of("focus", best, baud, d);
    }

    /** Steps per second of a sweep over {@code count} windows from {@code first}, repeated back to back. */
    static double stepsPerSecond(InstrumentDescription d, WindowTable table, SweepParameters p, int first, int count) {
        long micros = 0;
        // consecutive sweeps alternate direction (scheduler R-sweep order): the first step of a sweep
        // sits where the last one ended, so it has no rail change
        int lowBefore = table.dacLow(first);
        int highBefore = table.dacHigh(first);
        for (int w = first; w < first + count; w++) {
            micros += SettleTime.micros(p, lowBefore, highBefore, table.dacLow(w), table.dacHigh(w))
                    + (long) p.integrationPeriods * d.modulationPeriodMicros();
            lowBefore = table.dacLow(w);
            highBefore = table.dacHigh(w);
        }
        return count * 1e6 / micros;
    }

    /** Load as a fraction of the capacity. */
    public double loadFraction() {
        return octetsPerSecond / capacityPerSecond;
    }

    /** True above {@link #WARN_FRACTION}. */
    public boolean warning() {
        return loadFraction() > WARN_FRACTION;
    }

    /** One line for a summary, with the warning when there is one. */
    public String describe() {
        return String.format("link %-6s %7.1f steps/s, %8.0f of %8.0f octets/s (%5.1f %%)%s", mode, stepsPerSecond,
                octetsPerSecond, capacityPerSecond, 100 * loadFraction(),
                warning() ? "  WARNING: above " + Math.round(100 * WARN_FRACTION) + " % of the line rate" : "");
    }
}
