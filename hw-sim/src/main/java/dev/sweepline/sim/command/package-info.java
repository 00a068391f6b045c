/**
 * Command scripts for the closed-loop bench: design note.
 *
 * <h2>What it does</h2>
 * {@link dev.sweepline.fsw.host.script.CommandScript} reads time-tagged telecommands and fault injections
 * (format in its class comment and fsw-core/docs/commands.md §7); {@link dev.sweepline.sim.command.ScriptRunner}
 * is a {@code ClosedLoopBench.CycleHook} that encodes each due command as a signed TC packet
 * ({@link dev.sweepline.fsw.host.script.TelecommandEncoder}) and hands it to the flight software, and sets
 * each due fault in the simulated instrument.
 *
 * <h2>Requirements and how each is verified</h2>
 * <ol>
 * <li><b>CS1</b> A table loaded by script changes the sweep and survives a restart from the NVM file.
 *     <i>CommandedRunTest.shouldChangeSweepWithScriptedTableAndRestoreItAfterRestart.</i></li>
 * <li><b>CS2</b> Each fault monitor is tripped by an injected fault and its event and response are in the
 *     telemetry the ground decodes. <i>FaultInjectionRunTest.</i></li>
 * <li><b>CS3</b> A bad script fails with its line named. <i>CommandScriptTest.</i></li>
 * </ol>
 */
package dev.sweepline.sim.command;
