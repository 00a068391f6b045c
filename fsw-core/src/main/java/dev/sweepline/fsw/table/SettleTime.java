package dev.sweepline.fsw.table;

/**
 * The settle time of a step (commands.md §4.4; sweep design note R4): the fixed settle after every level
 * change plus, per DAC code of the larger rail change, the slew allowance {@code settleMicrosPerCodeQ8}
 * (Q8, truncated). The one home of this formula: the scheduler commands it, the bench's link budget
 * counts with it. Integer, allocation-free.
 */
public final class SettleTime {
    private SettleTime() {
    }

    /**
     * Settle before integrating at levels {@code (low, high)} when the rails stand at
     * {@code (lowBefore, highBefore)}, microseconds.
     */
    public static long micros(SweepParameters p, int lowBefore, int highBefore, int low, int high) {
        int railChange = Math.max(Math.abs(low - lowBefore), Math.abs(high - highBefore));
        return p.fixedSettleMicros + (((long) railChange * p.settleMicrosPerCodeQ8) >> 8);
    }
}
