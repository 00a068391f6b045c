package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.WindowTable;

/**
 * Replies precomputed at set-up for every window and gain range of a table from a
 * {@link SyntheticInstrument}, so that a step loop can answer without allocating or computing
 * (allocation test and JMH benchmark).
 */
public final class CannedReplies {
    private final SampleReply[][] replies;

    /** Precomputes the replies of {@code table} measuring {@code plasma}. */
    public CannedReplies(WindowTable table, SyntheticInstrument plasma) {
        replies = new SampleReply[table.count()][3];
        StepCommand step = new StepCommand();
        step.hvEnabled = true;
        for (int w = 0; w < table.count(); w++) {
            for (int r = 0; r < 3; r++) {
                step.window = w;
                step.dacLow = table.dacLow(w);
                step.dacHigh = table.dacHigh(w);
                step.gainRange = r;
                replies[w][r] = new SampleReply();
                plasma.answer(step, replies[w][r]);
            }
        }
    }

    /** Copies the reply to {@code step} into {@code out} (allocation-free). */
    public void answer(StepCommand step, SampleReply out) {
        out.copyFrom(replies[step.window][step.gainRange]);
        out.sequence = step.sequence;
    }
}
