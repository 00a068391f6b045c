package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.DecodeStats;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code inspect FILE [--instrument NAME|FILE]...}: a per-frame / per-packet listing on standard output;
 * spectrum lines show the layout, instrument id and sample width.
 */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = "Lists every frame, reject, packet and decoded record of a file of ASM + TM frames.")
final class InspectCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "FILE", description = "File of ASM + TM frames.")
    Path input;

    @Mixin
    StreamOptions options = new StreamOptions();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        Inputs.readable(input);
        DecoderConfig config = options.config();
        TelemetryDecoder d = new TelemetryDecoder(config, new Ccsds121QuadrantDecoder(), new InspectListing(out));
        try {
            StreamReader.feed(input, d);
        } catch (IOException e) {
            throw new GroundFailure(ExitCodes.INPUT, input + ": cannot read it (" + Inputs.reason(e) + ")");
        }
        DecodeStats s = d.stats();
        out.printf("frame length %d%s; %d good frames (%d idle), bad %s, dropped %s, %d VC restarts, "
                        + "%d garbage octets; %d survey + %d focus spectra, %d housekeeping, %d events, "
                        + "spectrum errors %s%n",
                d.frameOctets(), d.frameLengthDetected() ? " (detected)" : "", s.framesGood(), s.framesIdle(),
                s.framesBad(), s.framesDropped(), s.vcRestarts(), s.garbageOctets(), s.spectraSurvey(),
                s.spectraFocus(), s.housekeeping(), s.events(), s.spectrumErrors());
        out.flush();
        return ExitCodes.OK;
    }
}
