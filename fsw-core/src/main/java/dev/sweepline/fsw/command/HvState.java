package dev.sweepline.fsw.command;

/** States of the HV interlock (commands.md §2.3); codes as in housekeeping (telemetry ICD §5). */
public enum HvState {
    /** HV may not be on: SAFE only. Code 0. */
    OFF,
    /** Armed: an HV enable within the arm time-out is accepted. Code 1. */
    ARMED,
    /** HV may be on: SURVEY and FOCUS allowed. Code 2. */
    ENABLED
}
