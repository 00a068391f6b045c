/**
 * Command scripts on the ground side of the host (commands.md §7): {@link dev.sweepline.fsw.host.script.CommandScript}
 * reads time-tagged telecommands (and the bench's fault injections), {@link dev.sweepline.fsw.host.script.TelecommandEncoder}
 * signs them, {@link dev.sweepline.fsw.host.script.GroundCommandCounter} keeps the sequence numbers
 * across runs, {@link dev.sweepline.fsw.host.script.UplinkLog} records what was sent, and
 * {@link dev.sweepline.fsw.host.script.ScriptPlayer} hands the due commands to the flight software.
 * Used by {@code sweepline-fsw.jar run --commands} and by the bench's {@code ScriptRunner}.
 */
package dev.sweepline.fsw.host.script;
