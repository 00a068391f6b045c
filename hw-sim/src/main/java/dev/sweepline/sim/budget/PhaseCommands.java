package dev.sweepline.sim.budget;

import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.fsw.host.script.ScriptException;
import java.util.List;

/**
 * The telecommands that put the flight software into a phase's mode at the start of a closed loop,
 * as the ground would send them, signed and counted like any other (commands.md §1, §2):
 * <ul>
 * <li>adaptive: none, the start-up table surveys and then focuses;</li>
 * <li>survey: the start-up table with focus disabled ({@code focusEnabled} 0, commands.md §4.1),
 *     loaded, verified and committed (§4.2); in force from the first sweep boundary;</li>
 * <li>safe: SET_MODE SAFE, which also switches the HV interlock off (§2, §2.3).</li>
 * </ul>
 */
final class PhaseCommands {
    private PhaseCommands() {
    }

    /** The script for {@code mode}, sent at the loop's start to a flight software configured as {@code flight}. */
    static CommandScript of(Phase.Mode mode, FlightConfig flight) {
        switch (mode) {
            case ADAPTIVE:
                return parse("");
            case SURVEY:
                return CommandScript.tableUplink(0, surveyOnly(flight));
            case SAFE:
                return parse("0 SET_MODE SAFE");
            default:
                throw new IllegalStateException("unknown phase mode " + mode);
        }
    }

    /** The table {@code flight} starts with ({@link FlightConfig#startUpTable()}), with focus disabled. */
    static ParameterTable surveyOnly(FlightConfig flight) {
        ParameterTable t = flight.startUpTable();
        t.sweep.focusEnabled = 0;
        return t;
    }

    private static CommandScript parse(String line) {
        try {
            return CommandScript.parse(List.of(line));
        } catch (ScriptException e) {
            throw new IllegalStateException("a built-in phase command does not parse: " + line, e);
        }
    }
}
