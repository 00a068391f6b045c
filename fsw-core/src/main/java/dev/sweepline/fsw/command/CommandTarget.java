package dev.sweepline.fsw.command;

/** What the command processor asks of the rest of the flight software (implemented in the executive's facade). */
public interface CommandTarget {
    /** Reset-counters mask bit: command counters (done by the processor itself). */
    int RESET_COMMAND_COUNTERS = 1;
    /** Reset-counters mask bit: fault trip counters. */
    int RESET_FAULT_COUNTERS = 2;
    /** Reset-counters mask bit: sweep counters (survey, focus sweeps, lock losses). */
    int RESET_SWEEP_COUNTERS = 4;

    /** Clears the counters of {@code mask} other than the command counters. */
    void resetCounters(int mask);

    /**
     * Puts a committed, validated table in force (scheduler at its next sweep boundary, fault
     * protection and telemetry allocation now).
     *
     * @return {@link CommandReason#OK}, or {@link CommandReason#TABLE_INVALID} if a part refused it
     */
    int applyTable(ParameterTable table, int tableId, long nowMicros);
}
