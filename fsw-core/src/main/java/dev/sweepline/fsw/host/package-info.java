/**
 * The host adapter: the flight software on a PC (the only fsw-core package with threads, clocks,
 * sockets, jSerialComm and picocli). {@link dev.sweepline.fsw.host.FswMain} {@code run} opens a
 * {@link dev.sweepline.fsw.host.SerialTransport} or {@link dev.sweepline.fsw.host.TcpTransport} and the
 * telemetry output, then asks for the operator's arm-then-fire ({@link dev.sweepline.fsw.host.HvPrompt},
 * {@link dev.sweepline.fsw.host.HvArming}), puts an {@link dev.sweepline.fsw.host.HvGuardLink} (HV off
 * unless fired) in front of the {@link dev.sweepline.fsw.link.FramedInstrumentLink}, and drives the
 * flight software with a {@link dev.sweepline.fsw.host.RealTimeLoop} (monotonic clock read once per
 * cycle) or a {@link dev.sweepline.fsw.host.LinkClockLoop} (simulated time driven by link events;
 * hardware ICD §7). Whatever ends the loop, one {@link dev.sweepline.fsw.host.HvShutdown} commands the
 * HV off and checks the readback (hardware ICD §4.2).
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>H1</b> The HV is off unless armed and fired within the time-out; the run says why it was not
 *     fired (wrong word, time-out, no input); {@code --hv-confirm} without {@code --hv arm} is ignored
 *     with a warning. <i>HvArmingTest, HvPromptTest, FswRunCommandTest.</i></li>
 * <li><b>H2</b> Every way out of {@code run} (planned end, signal, exception in the loop, link loss)
 *     withdraws the permission, sends HV-off steps and waits at most 3 s for a reply that says HV off
 *     with the monitor below 300 codes; it runs once, whoever calls it; not confirmed is exit status 3.
 *     <i>HvShutdownTest; hw-sim RunHvShutdownHilTest (the four ways out against the simulator).</i></li>
 * <li><b>H3</b> The link and the telemetry output open before the prompt; one that does not is one
 *     line naming the option, the address and the reason, exit status 5 ({@link dev.sweepline.fsw.host.ExitStatus});
 *     an existing {@code --tm} file is refused without {@code --force}; an option out of range is a usage
 *     error (2) before anything opens. <i>FswRunCommandTest.</i></li>
 * <li><b>H6</b> {@code --commands SCRIPT} sends the script's telecommands (signed, at their times after
 *     the start of the run) and {@code --nvm FILE} keeps the committed table across runs; a script with a
 *     fault injection is refused (the bench's only). <i>FswRunCommandTest; hw-sim RecommendedTableHilTest.</i></li>
 * <li><b>H4</b> {@code --minutes} is run time, counted after the prompt. <i>FswRunCommandTest.</i></li>
 * <li><b>H5</b> Same seed, same telemetry as the in-process bench on the link-event clock, but for the
 *     closing housekeeping's HV fields. <i>hw-sim SerialHilTest, ServeOverTcpTest.</i></li>
 * </ol>
 * Threading: each class states its rule; the loops and the shutdown on the run's thread, the
 * shutdown hook on its own (it stops the loop and takes over the shutdown only when the run's thread
 * does not come to it).
 */
package dev.sweepline.fsw.host;
