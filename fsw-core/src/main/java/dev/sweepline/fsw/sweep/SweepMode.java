package dev.sweepline.fsw.sweep;

/** The scheduler's modes (architecture.md, naming). */
public enum SweepMode {
    /** Every window of the table, alternating direction. */
    SURVEY,
    /** A band of windows around the proton peak. */
    FOCUS,
    /** High voltage off, nothing stepped; left only by a commanded mode. */
    SAFE
}
