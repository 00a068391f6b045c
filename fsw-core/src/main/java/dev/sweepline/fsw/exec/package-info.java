/**
 * The executive: design note.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.exec.Executive} keeps one step in flight between the sweep scheduler and the
 * {@link dev.sweepline.fsw.link.InstrumentLink}. Each {@code doWork(nowMicros)}: with a step in flight,
 * re-offer it to the link if the link refused it, poll for its reply (at most
 * {@code MAX_POLLS_PER_CYCLE}), and check its deadline; with none, take the next step from the
 * scheduler, number it and send it. Time is the argument; nothing blocks; nothing is allocated after
 * construction.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>E1</b> Sequence numbers are assigned here, 16 bits, wrapping; every transmission gets a fresh
 *     one. <i>ExecutiveTest.shouldWrapSequenceAtSixteenBits.</i></li>
 * <li><b>E2</b> A reply is ingested when its sequence is that of any transmission of the step in flight
 *     (the re-sent command is the same step, so a late first answer is good data).
 *     <i>ExecutiveTest.shouldSendOneStepAndIngestItsReply, shouldAcceptLateReplyToFirstTransmission.</i></li>
 * <li><b>E3</b> Other sequence numbers are counted (sequenceErrors) and dropped; the step keeps waiting.
 *     Replies that come while nothing is in flight (SAFE) are drained and counted the same way.
 *     <i>ExecutiveTest.shouldDropAndCountWrongSequence, shouldDrainStaleRepliesInSafeWithMockLink.</i></li>
 * <li><b>E4</b> Deadline = send time + step duration (settle + integration periods × the description's
 *     modulation period) + margin (default 20 ms, hardware ICD §4; {@code FlightConfig} takes the same
 *     default); at the deadline the
 *     reply is still in time, one microsecond later it has timed out (style.md: tested at T and T+1).
 *     <i>ExecutiveTest.shouldTimeOutOnlyAfterDeadline.</i></li>
 * <li><b>E5</b> A timed-out step is re-sent at most maxRetries times (timeouts and retries counted);
 *     then the scheduler goes to SAFE with LINK_TIMEOUT, and only a command leaves it.
 *     <i>ExecutiveTest.shouldGoSafeAfterBoundedRetries, shouldNotSendInSafeWithMockLink.</i></li>
 * <li><b>E6</b> A send the link refuses is offered again next cycle, within the same deadline.
 *     <i>ExecutiveTest.shouldRetrySendRefusedByLink.</i></li>
 * <li><b>E7</b> A step the scheduler abandoned (a mode change while it was in flight, e.g. commanded
 *     SAFE) is never re-sent: unsent, it is dropped at once; sent, its reply may still come until the
 *     deadline (the scheduler ignores it), then it is dropped (abandonedSteps). A dropped step that no
 *     transmission of reached the link, and one whose every transmission was refused up to a link time-out,
 *     is reported to the scheduler ({@code stepNotSent}): the rails never saw its levels (sweep note R13).
 *     <i>ExecutiveTest.shouldNotResendStepAbandonedBySafeCommand,
 *     shouldSettleFromTheLastSentLevelsWhenAnUnsentStepIsAbandoned.</i></li>
 * <li><b>E8</b> The cycle allocates nothing; nextWakeMicros tells the host when to call again (the
 *     expected reply time, then the first instant past the deadline, Long.MAX_VALUE when idle in SAFE).
 *     <i>ExecutiveTest.shouldAllocateNothingPerCycle, shouldRunClosedLoopWithoutErrors.</i></li>
 * <li><b>E9</b> (issue 6) {@code FlightSoftware} restores the table kept in non-volatile memory at start-up,
 *     hands telecommands to the command processor ({@code acceptTelecommand}), the host's cycle work to
 *     fault protection ({@code reportCycleWork}), takes fault responses once per cycle after the step work,
 *     and stamps each spectrum with the id of the table its sweep used.
 *     <i>TableCommandingTest, CommandRejectionTest, FlightSoftwareAllocationTest; hw-sim FaultInjectionRunTest.</i></li>
 * <li><b>E10</b> {@code FlightSoftware} is wiring: made for one instrument description
 *     ({@code FlightConfig.of(description)}: default table and parameters, limits, buffer sizes), it builds
 *     the parts and runs the cycle; {@code SweepRouting} sends the scheduler's callbacks to fault protection,
 *     the science and event telemetry and the observer, and stamps the table id and the table-changed flag
 *     when the scheduler announces a configuration applied; {@code FlightTarget} is the command processor's
 *     view; {@code HousekeepingClock} says when housekeeping is due.
 *     <i>TableChangedFlagTest, FlightSoftwareHousekeepingTest; hw-sim GoldenRunTest (decision hash and
 *     telemetry of a pinned run).</i></li>
 * </ol>
 * Threading: one thread; the host adapter owns pacing.
 */
package dev.sweepline.fsw.exec;
