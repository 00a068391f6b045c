package dev.sweepline.sim.command;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.instrument.InstrumentFaults;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import java.util.ArrayList;
import java.util.List;

/**
 * Plays a {@link CommandScript} into a closed-loop run: each due telecommand is encoded, signed and
 * handed to the flight software (a recorded one is handed over unchanged); each due injection sets
 * a fault of the simulated instrument, or (OVERRUN) the cycle work the bench reports to the flight
 * software from then on. Also sets the flight configuration's authentication switch and
 * non-volatile store, and records every packet it sends to an optional {@link UplinkLog}.
 */
public final class ScriptRunner implements ClosedLoopBench.CycleHook {
    /** What the flight software answered to one telecommand of the script. */
    public record Sent(long atMicros, int line, int code, int reason) {
    }

    private final List<ScriptEntry> entries;
    private final boolean authenticate;
    private final NonVolatileStore store;
    private final GroundCommandCounter counter;
    private final List<Sent> sent = new ArrayList<>();
    private UplinkLog log;
    private TelecommandEncoder encoder;
    private InstrumentFaults faults;
    private long overrunTicks;
    private int next;

    /**
     * A runner numbering its commands from 1 (a ground counter kept in memory).
     *
     * @param script       the script
     * @param authenticate command authentication on (the flight default) or off (quick runs)
     * @param store        the flight software's non-volatile memory (null: none)
     */
    public ScriptRunner(CommandScript script, boolean authenticate, NonVolatileStore store) {
        this(script, authenticate, store, GroundCommandCounter.inMemory());
    }

    /** As above, numbering its commands from {@code counter} (kept across runs beside the NVM file). */
    public ScriptRunner(CommandScript script, boolean authenticate, NonVolatileStore store,
            GroundCommandCounter counter) {
        this.entries = script.entries();
        this.authenticate = authenticate;
        this.store = store;
        this.counter = counter;
    }

    /** Records every packet sent from now on to {@code uplink} (the caller closes it). */
    public ScriptRunner recordingTo(UplinkLog uplink) {
        this.log = uplink;
        return this;
    }

    @Override
    public void configure(FlightConfig flight, SimulatedInstrument instrument) {
        flight.authenticateCommands = authenticate;
        if (store != null) {
            flight.nonVolatileStore = store;
        }
        encoder = new TelecommandEncoder(flight.commandKey, counter);
        faults = instrument.faults();
    }

    @Override
    public void beforeCycle(FlightSoftware fsw, long nowMicros) {
        while (next < entries.size() && entries.get(next).atMicros() <= nowMicros) {
            ScriptEntry e = entries.get(next++);
            if (e.isCommand()) {
                byte[] packet = e.isRecorded() ? e.packet() : encoder.encode(e.code(), arguments(e, fsw));
                if (log != null) {
                    log.record(nowMicros, packet);
                }
                sent.add(new Sent(nowMicros, e.line(), e.code(), fsw.acceptTelecommand(packet, 0, packet.length, nowMicros)));
            } else {
                inject(e);
            }
        }
        if (overrunTicks > 0) {
            fsw.reportCycleWork(overrunTicks);
        }
    }

    /**
     * The arguments to sign. AUTH_RECOVER names this boot's challenge, which the ground reads from
     * the AUTH_LOCKED event (telemetry ICD §6, event 7); the bench takes it from the flight software
     * directly, which is the same number.
     */
    private static byte[] arguments(ScriptEntry e, FlightSoftware fsw) {
        if (e.code() != CommandCode.AUTH_RECOVER) {
            return e.args();
        }
        long c = fsw.authenticator().bootChallenge();
        return new byte[] {(byte) (c >>> 24), (byte) (c >>> 16), (byte) (c >>> 8), (byte) c};
    }

    private void inject(ScriptEntry e) {
        int[] v = e.values();
        switch (e.inject()) {
            case "HV_READBACK" -> faults.hvReadbackOffsetCodes = v[0];
            case "SATURATE" -> faults.saturateAdc = v[0] != 0;
            case "STUCK" -> {
                faults.stuckQuadrant = v[0];
                faults.stuckCode = v[1];
            }
            case "DEAD" -> faults.deadCollector = v[0] != 0;
            case "SEQUENCE" -> faults.corruptSequence = v[0] != 0;
            case "OVERRUN" -> overrunTicks = v[0];
            case "CLEAR" -> {
                faults.clear();
                overrunTicks = 0;
            }
            default -> throw new IllegalStateException("unknown injection " + e.inject());
        }
    }

    /** The telecommands sent so far, with the acceptance reason of each. */
    public List<Sent> sent() {
        return List.copyOf(sent);
    }
}
