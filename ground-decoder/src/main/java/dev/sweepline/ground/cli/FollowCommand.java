package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.product.GroundSession;
import dev.sweepline.ground.product.ReportAdditions;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import picocli.CommandLine;

/** {@code decode --follow}: the checks of the options, then {@link FollowLoop} over the named source. */
final class FollowCommand {
    private FollowCommand() {
    }

    static int follow(String input, Path out, List<Path> tables, Double allocation, StreamOptions options,
            CommandLine cl) {
        if (!FollowLoop.isTcp(input)) {
            Inputs.readable(Path.of(input));
        }
        DecoderConfig config = options.config();
        WindowCatalogue windows = new WindowCatalogue();
        for (Path t : tables) {
            if (windows.add(Inputs.read("--table", t)) < 0) {
                throw new GroundFailure(ExitCodes.INPUT, "--table " + t + ": not an intact table image (CRC or length)");
            }
        }
        FollowLoop.Source source;
        try {
            source = FollowLoop.open(input);
        } catch (IllegalArgumentException e) {
            throw new GroundFailure(ExitCodes.INPUT, input + ": " + e.getMessage());
        } catch (IOException e) {
            throw new GroundFailure(ExitCodes.IO, input + ": cannot open it (" + Inputs.reason(e) + ")");
        }
        try (source; GroundSession session = new GroundSession(input, out,
                allocation == null ? OptionalDouble.empty() : OptionalDouble.of(allocation), config, windows,
                ReportAdditions.NONE)) {
            cl.getOut().println("following " + input + " into " + out.resolve("report.html") + " (Ctrl-C to stop)");
            cl.getOut().flush();
            FollowLoop.run(source, session, () -> Thread.currentThread().isInterrupted(), cl.getOut());
            cl.getOut().printf("stream ended: %d octets, %d spectra -> %s%n", session.octets(), session.spectra(), out);
            return ExitCodes.OK;
        } catch (IOException e) {
            throw new GroundFailure(ExitCodes.IO, "--out " + out + ": cannot write the products (" + Inputs.reason(e) + ")");
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return ExitCodes.OK;
        }
    }
}
