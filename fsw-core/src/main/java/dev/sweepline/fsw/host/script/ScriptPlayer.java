package dev.sweepline.fsw.host.script;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.exec.FlightSoftware;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * Plays the telecommands of a {@link CommandScript} into the flight software, before the cycle at or
 * after each one's time tag: each is encoded and signed with the flight key (a recorded packet of an
 * uplink replay is handed over unchanged), recorded to an optional {@link UplinkLog}, and the flight
 * software's answer kept. The bench's {@code ScriptRunner} and {@code sweepline-fsw.jar run --commands}
 * both play scripts with it; fault injections go to the caller (the bench's simulated instrument).
 *
 * <p>Threading: the loop's thread.
 */
public final class ScriptPlayer {
    /** What the flight software answered to one telecommand of the script. */
    public record Sent(long atMicros, int line, int code, int reason) {
    }

    private final List<ScriptEntry> entries;
    private final TelecommandEncoder encoder;
    private final List<Sent> sent = new ArrayList<>();
    private UplinkLog log;
    private int next;

    /**
     * @param script  the script
     * @param key     the command key the flight software authenticates with (commands.md §1.2)
     * @param counter where the command sequence numbers come from (kept beside the NVM file across runs)
     */
    public ScriptPlayer(CommandScript script, byte[] key, GroundCommandCounter counter) {
        this.entries = script.entries();
        this.encoder = new TelecommandEncoder(key, counter);
    }

    /** Refuses a script with fault injections, which need the bench's simulated instrument. */
    public static void refuseInjections(CommandScript script) throws ScriptException {
        for (ScriptEntry e : script.entries()) {
            if (!e.isCommand()) {
                throw new ScriptException(e.line(), "INJECT " + e.inject() + " needs the bench's simulated instrument "
                        + "(sweepline-bench.jar run); the flight software sends telecommands only");
            }
        }
    }

    /** Records every packet sent from now on to {@code uplink} (the caller closes it). */
    public ScriptPlayer recordingTo(UplinkLog uplink) {
        this.log = uplink;
        return this;
    }

    /** Sends the telecommands due at {@code nowMicros}; hands each due injection to {@code injections}. */
    public void play(FlightSoftware fsw, long nowMicros, Consumer<ScriptEntry> injections) {
        while (next < entries.size() && entries.get(next).atMicros() <= nowMicros) {
            ScriptEntry e = entries.get(next++);
            if (!e.isCommand()) {
                injections.accept(e);
                continue;
            }
            byte[] packet = e.isRecorded() ? e.packet() : encoder.encode(e.code(), arguments(e, fsw));
            if (log != null) {
                log.record(nowMicros, packet);
            }
            sent.add(new Sent(nowMicros, e.line(), e.code(), fsw.acceptTelecommand(packet, 0, packet.length, nowMicros)));
        }
    }

    /** True once every entry has been played. */
    public boolean done() {
        return next == entries.size();
    }

    /**
     * The arguments to sign. AUTH_RECOVER names this boot's challenge, which the ground reads from
     * the AUTH_LOCKED event (telemetry ICD §6, event 7); the host takes it from the flight software
     * directly, which is the same number.
     */
    private static byte[] arguments(ScriptEntry e, FlightSoftware fsw) {
        if (e.code() != CommandCode.AUTH_RECOVER) {
            return e.args();
        }
        long c = fsw.authenticator().bootChallenge();
        return new byte[] {(byte) (c >>> 24), (byte) (c >>> 16), (byte) (c >>> 8), (byte) c};
    }

    /** The telecommands sent so far, with the acceptance reason of each. */
    public List<Sent> sent() {
        return List.copyOf(sent);
    }
}
