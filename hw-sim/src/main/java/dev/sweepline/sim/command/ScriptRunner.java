package dev.sweepline.sim.command;

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
 * handed to the flight software; each due injection sets a fault of the simulated instrument, or
 * (OVERRUN) the cycle work the bench reports to the flight software from then on. Also sets the
 * flight configuration's authentication switch and non-volatile store.
 */
public final class ScriptRunner implements ClosedLoopBench.CycleHook {
    /** What the flight software answered to one telecommand of the script. */
    public record Sent(long atMicros, int line, int code, int reason) {
    }

    private final List<ScriptEntry> entries;
    private final boolean authenticate;
    private final NonVolatileStore store;
    private final List<Sent> sent = new ArrayList<>();
    private TelecommandEncoder encoder;
    private InstrumentFaults faults;
    private long overrunTicks;
    private int next;

    /**
     * @param script       the script
     * @param authenticate command authentication on (the flight default) or off (quick runs)
     * @param store        the flight software's non-volatile memory (null: none)
     */
    public ScriptRunner(CommandScript script, boolean authenticate, NonVolatileStore store) {
        this.entries = script.entries();
        this.authenticate = authenticate;
        this.store = store;
    }

    @Override
    public void configure(FlightConfig flight, SimulatedInstrument instrument) {
        flight.authenticateCommands = authenticate;
        if (store != null) {
            flight.nonVolatileStore = store;
        }
        encoder = new TelecommandEncoder(flight.commandKey);
        faults = instrument.faults();
    }

    @Override
    public void beforeCycle(FlightSoftware fsw, long nowMicros) {
        while (next < entries.size() && entries.get(next).atMicros() <= nowMicros) {
            ScriptEntry e = entries.get(next++);
            if (e.isCommand()) {
                byte[] packet = encoder.encode(e.code(), e.args());
                sent.add(new Sent(nowMicros, e.line(), e.code(), fsw.acceptTelecommand(packet, 0, packet.length, nowMicros)));
            } else {
                inject(e);
            }
        }
        if (overrunTicks > 0) {
            fsw.reportCycleWork(overrunTicks);
        }
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
