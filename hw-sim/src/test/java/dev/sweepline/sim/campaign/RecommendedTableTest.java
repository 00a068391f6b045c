package dev.sweepline.sim.campaign;

import dev.sweepline.ground.instrument.InstrumentSet;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.nvm.FileNonVolatileStore;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import dev.sweepline.sim.bench.GroundCheck;
import dev.sweepline.sim.bench.RunPool;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.sim.command.ScriptRunner;
import dev.sweepline.sim.instrument.SimulatedInstrument;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Campaign design note C3: the recommended table, loaded through the table commands and restored by a fresh flight
 * software from its non-volatile memory, reproduces the metrics the campaign reported for it: for a small
 * campaign, and for the demo campaign campaigns/focus-style.yaml (three linked tables: the default, the interleaved
 * design and the alpha-clear table; its recommended set is the interleaved design, focusStyle 3, a table image of
 * version 2, indistinguishable from the alpha-clear leader near perihelion).
 */
class RecommendedTableTest {
    @TempDir
    Path dir;

    @ParameterizedTest
    @ValueSource(strings = {"small.yaml", "focus-style.yaml"})
    void shouldReproduceTheReportedMetricsWhenUplinked(String campaign) throws Exception {
        String text = campaign.equals("small.yaml") ? CampaignDeterminismTest.CAMPAIGN
                : new String(RecommendedTableTest.class.getResourceAsStream("/campaigns/" + campaign).readAllBytes(),
                        java.nio.charset.StandardCharsets.UTF_8);
        CampaignSpec spec = CampaignReader.parse(text, campaign, null);
        List<RunRow> rows = CampaignRunner.run(spec, 2, Shard.ALL, RunPool.Progress.NONE);
        SetResult best = CampaignOutput.writeResults(dir, spec, rows);
        assertNotNull(best, "the small campaign recommends a set");
        Path image = dir.resolve(CampaignOutput.RECOMMENDED_IMAGE);
        byte[] bytes = Files.readAllBytes(image);
        assertTrue(TableImage.intact(bytes, bytes.length));

        // 1. uplink: load, verify and commit the image by telecommand; the commit writes the NVM file
        Path nvm = dir.resolve("table.nvm");
        ScriptRunner uplink = new ScriptRunner(CommandScript.parse(List.of("0.5 TABLE_IMAGE " + image)), true,
                new FileNonVolatileStore(nvm));
        ClosedLoopBench.run(BenchConfig.defaults(spec.member(0), 1, 3), ClosedLoopBench.Progress.NONE,
                (f, off, len) -> { }, uplink);
        assertTrue(uplink.sent().stream().allMatch(s -> s.reason() == CommandReason.OK), uplink.sent().toString());
        assertTrue(Files.exists(nvm));

        // 2. a fresh flight software with the default configuration restores the table at start-up
        List<RunRow> flown = new ArrayList<>();
        for (int run = 0; run < spec.runsPerSet(); run++) {
            BenchConfig config = BenchConfig.defaults(spec.member(run), spec.runSeed(run), spec.durationSeconds())
                    .withAllocation(spec.allocationBitsPerSecond());
            ClosedLoopBench.CycleHook restore = new ClosedLoopBench.CycleHook() {
                @Override
                public void configure(FlightConfig flight, SimulatedInstrument instrument) {
                    flight.nonVolatileStore = new FileNonVolatileStore(nvm);
                }
            };
            // the ground learns the uplinked table's windows from the same image file (by its table id)
            WindowCatalogue windows = new WindowCatalogue();
            assertEquals(TableImage.tableId(bytes, bytes.length), windows.add(bytes));
            GroundCheck ground = new GroundCheck(config.flight(), InstrumentSet.builtIns(), windows);
            ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                    ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()).withCycle(restore));
            flown.add(RunRow.of(best.set(), run, r.summary(), ground.compare(r.recorder().sweeps(),
                    r.recorder()::truthAt)));
        }
        // the same seeds and the same table: every metric of every run equals the campaign's row
        for (int run = 0; run < spec.runsPerSet(); run++) {
            RunRow reported = rows.get(best.set() * spec.runsPerSet() + run);
            assertEquals(reported, flown.get(run), "run " + run);
        }
    }
}
