package dev.sweepline.sim.command;

import dev.sweepline.fsw.host.script.ScriptException;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.instrument.InstrumentModel;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A scripted table above the demo cup's 6000 V rating (its description: modulator 50-6000 V, 0.1 V
 * per DAC code) is sent, refused by the flight software at verify with its reason in the command
 * reports, and no step of the run commands a level above the limit; the same table to 3000 V flies.
 */
class UnsafeTableRunTest {
    private static int maxLevel(String tableLine, List<dev.sweepline.fsw.host.script.ScriptPlayer.Sent> sent) throws ScriptException {
        CommandScript script = CommandScript.parse(List.of(tableLine));
        ScriptRunner runner = new ScriptRunner(script, true, null);
        int[] max = {0};
        ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 3, 12),
                ClosedLoopBench.Progress.NONE, ClosedLoopBench.Hooks.NONE.withCycle(runner)
                        .withObserver(new SweepListener() {
                            @Override
                            public void onStep(StepCommand step, long nowMicros) {
                                max[0] = Math.max(max[0], Math.max(step.dacLow, step.dacHigh));
                            }
                        }));
        sent.addAll(runner.sent());
        return max[0];
    }

    @Test
    void shouldRefuseTheTableAndFlyNoStepAboveTheLimit() throws ScriptException {
        List<dev.sweepline.fsw.host.script.ScriptPlayer.Sent> sent = new java.util.ArrayList<>();
        CommandScript parsed = CommandScript.parse(List.of("3.0 TABLE_LOGSPACED 64 100 6400 4"));
        assertEquals(1, parsed.warnings().size(), "the script says the table is above the limit");
        int max = maxLevel("3.0 TABLE_LOGSPACED 64 100 6400 4", sent);
        assertTrue(max <= TestInstruments.DEMO_CUP.flight().limits().maxLevelCode, "highest level flown: code " + max);
        dev.sweepline.fsw.host.script.ScriptPlayer.Sent commit = sent.get(sent.size() - 1);
        assertEquals(CommandCode.TABLE_COMMIT, commit.code());
        assertEquals(CommandReason.TABLE_NOT_VERIFIED, commit.reason());
    }

    @Test
    void shouldCommitAndFlyTheTableBelowTheLimit() throws ScriptException {
        List<dev.sweepline.fsw.host.script.ScriptPlayer.Sent> sent = new java.util.ArrayList<>();
        int max = maxLevel("3.0 TABLE_LOGSPACED 64 100 3000 4", sent);
        assertEquals(CommandCode.TABLE_COMMIT, sent.get(sent.size() - 1).code());
        assertEquals(CommandReason.OK, sent.get(sent.size() - 1).reason());
        // the default table (to 6000 V = code 60000) flies until the commit, then the new one (to 3000 V)
        assertTrue(max <= TestInstruments.DEMO_CUP.flight().limits().maxLevelCode, "highest level flown: code " + max);
    }
}
