/**
 * Telecommands, parameter tables and the HV interlock: design note (interface: fsw-core/docs/commands.md).
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.command.CommandProcessor} takes one TC space packet at a time, checks it in a
 * fixed order (length, header, MAC, sequence, code, argument length, range, state) and either rejects
 * it with the first failing reason ({@link dev.sweepline.fsw.command.CommandReason}) or executes it;
 * every command gets an acceptance report, every accepted one an execution report (APID 0x130).
 * {@link dev.sweepline.fsw.command.CommandAuthenticator} checks the truncated HMAC-SHA256
 * ({@link dev.sweepline.fsw.command.HmacSha256}, allocation-free over MessageDigest) and the replay rule.
 * {@link dev.sweepline.fsw.command.TableManager} keeps the active and pending images
 * ({@link dev.sweepline.fsw.command.TableImage}) and persists commits through a
 * {@link dev.sweepline.fsw.command.NonVolatileStore}; {@link dev.sweepline.fsw.command.HvInterlock} is the
 * arm-then-enable interlock.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>C1</b> Every malformed command is rejected with its own reason, changes nothing but the
 *     counters, is counted and gets one acceptance report. <i>CommandRejectionTest.</i></li>
 * <li><b>C2</b> Over 100,000 seeded random and mutated packets the processor gives exactly the reason a
 *     model of commands.md (with javax.crypto.Mac) predicts, and no exception escapes. <i>CommandFuzzTest.</i></li>
 * <li><b>C3</b> The MAC is HMAC-SHA256: RFC 4231 cases 2 and 6, and agreement with javax.crypto.Mac.
 *     <i>HmacSha256Test.</i></li>
 * <li><b>C4</b> A table becomes active only after a verify of its image and a commit naming its id; a
 *     corrupt or invalid image never does; a commit survives a restart through the store; a corrupt stored
 *     image is ignored. <i>TableCommandingTest; hw-sim CommandedRunTest.</i></li>
 * <li><b>C5</b> HV enable is refused unless armed within the time-out (T valid, T+1 not); SURVEY/FOCUS need
 *     the HV enabled. <i>CommandRejectionTest.shouldRefuseEnableWithoutArmAndModeWithoutHv,
 *     shouldAcceptEnableAtArmTimeOutThenLeaveSafe.</i></li>
 * <li><b>C6</b> Commands allocate nothing after start-up. <i>FlightSoftwareAllocationTest.</i></li>
 * </ol>
 * The package may use java.security.MessageDigest besides java.lang (ArchitectureTest says why).
 */
package dev.sweepline.fsw.command;
