package dev.sweepline.sim.cli;

import dev.sweepline.sim.campaign.CampaignIdentity;
import dev.sweepline.sim.campaign.CampaignOutput;
import dev.sweepline.sim.campaign.CampaignReader;
import dev.sweepline.sim.campaign.CampaignSpec;
import dev.sweepline.sim.campaign.RunRow;
import dev.sweepline.sim.campaign.Shard;
import dev.sweepline.sim.campaign.ShardSet;
import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.CommandLines;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code merge}: joins the shards of a campaign; the result equals the unsharded run. */
@Command(name = "merge", mixinStandardHelpOptions = true,
        description = {"Merge the shard folders of a campaign into its full results.",
            "Every shard of one split must be there once, run from this campaign file on this code version."})
final class MergeCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "CAMPAIGN.yaml", description = "The campaign file the shards ran.")
    Path campaign;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "SHARD_DIR", description = "The shards' output folders.")
    List<Path> shards;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "Output folder.")
    Path out;

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    @Option(names = "--compare", paramLabel = "A,B", description = "Put sets A and B side by side in the report "
            + "(as tune --compare).")
    String compare;

    @Override
    public Integer call() throws IOException {
        instrument.resolve();
        if (Files.exists(out.resolve(CampaignIdentity.FILE))) {
            // a shard's folder (this campaign's or another's): the merged runs.csv would replace the shard's own
            throw CliException.io("--out " + out + ": a shard folder of tune (it holds " + CampaignIdentity.FILE
                    + "), whose runs.csv the merged one would replace; use another folder");
        }
        CampaignSpec spec;
        List<RunRow> rows;
        try {
            spec = CampaignReader.load(campaign, instrument.given());
            TuneCommand.comparePair(compare, spec);
            ShardSet.check(shards, CampaignIdentity.of(spec, TuneCommand.campaignOctets(campaign, instrument.given()),
                    TuneCommand.codeVersion(), Shard.ALL));
            rows = CampaignOutput.readShards(spec, shards);
        } catch (FileFormatException e) {
            throw CliException.input("merge error: " + e.getMessage());
        } catch (IOException e) {
            throw CliException.input("merge error: " + CommandLines.located(e));
        }
        OutputFolder.create(out);
        CampaignOutput.writeRuns(out, rows);
        TuneCommand.report(CampaignOutput.writeResults(out, spec, rows, TuneCommand.comparePair(compare, spec)), out,
                CampaignOutput.inertAxes(spec, rows));
        return 0;
    }
}
