/**
 * Engineering telemetry: the housekeeping (telemetry ICD §5), event (§6) and command report (§9)
 * packets' user data, each a writer with named offsets and a bit diagram, taking the values and writing
 * them in place into the telemetry writer's buffer. The flight software, fault protection and the
 * command processor call them; nothing here decides what to report.
 *
 * <h2>Requirements</h2>
 * <ol>
 * <li>R1 Every field at its ICD offset, big-endian, counters wrapping or saturating as the ICD says.
 *     Verified: {@code GoldenFramesTest} (the golden housekeeping frames), {@code FlightSoftwareHousekeepingTest}
 *     (field by field against {@code HousekeepingImage}, the ICD §5 table), {@code TableCommandingTest}
 *     (report and dump lengths), {@code ReportWritersTest} (each offset constant against the ICD tables).</li>
 * <li>R2 Nothing is allocated per packet. Verified: {@code FlightSoftwareAllocationTest}.</li>
 * </ol>
 */
package dev.sweepline.fsw.report;
