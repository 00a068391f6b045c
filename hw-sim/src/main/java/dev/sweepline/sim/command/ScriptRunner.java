package dev.sweepline.sim.command;

import dev.sweepline.fsw.host.script.UplinkLog;
import dev.sweepline.fsw.host.script.GroundCommandCounter;
import dev.sweepline.fsw.host.script.ScriptPlayer;
import dev.sweepline.fsw.host.script.ScriptEntry;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.instrument.InstrumentFaults;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import java.util.List;

/**
 * Plays a {@link CommandScript} into a closed-loop run: each due telecommand is encoded, signed and
 * handed to the flight software (a recorded one is handed over unchanged); each due injection sets
 * a fault of the simulated instrument, or (OVERRUN) the cycle work the bench reports to the flight
 * software from then on. Also sets the flight configuration's authentication switch and
 * non-volatile store, and records every packet it sends to an optional {@link UplinkLog}.
 */
public final class ScriptRunner implements ClosedLoopBench.CycleHook {
    private final CommandScript script;
    private final boolean authenticate;
    private final NonVolatileStore store;
    private final GroundCommandCounter counter;
    private UplinkLog log;
    private ScriptPlayer player;
    private InstrumentFaults faults;
    private long overrunTicks;

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
        this.script = script;
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
        player = new ScriptPlayer(script, flight.commandKey, counter);
        if (log != null) {
            player.recordingTo(log);
        }
        faults = instrument.faults();
    }

    @Override
    public void beforeCycle(FlightSoftware fsw, long nowMicros) {
        player.play(fsw, nowMicros, this::inject);
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
                faults.stuckQuadrant = v[0] - 1; // the script counts quadrants 1..4 (commands.md §7)
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
    public List<ScriptPlayer.Sent> sent() {
        return player == null ? List.of() : player.sent();
    }
}
