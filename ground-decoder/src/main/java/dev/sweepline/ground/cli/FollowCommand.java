package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.product.GroundSession;
import dev.sweepline.ground.product.ReportAdditions;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
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
        PrintWriter err = cl.getErr();
        if (!FollowLoop.isTcp(input) && (!Files.isReadable(Path.of(input)) || Files.isDirectory(Path.of(input)))) {
            err.println("cannot read " + input);
            return ExitCodes.UNREADABLE_INPUT;
        }
        DecoderConfig config = options.configOrNull(err);
        if (config == null) {
            return ExitCodes.UNREADABLE_INPUT;
        }
        WindowCatalogue windows = new WindowCatalogue();
        try {
            for (Path t : tables) {
                if (windows.add(Files.readAllBytes(t)) < 0) {
                    err.println(t + ": not an intact table image");
                    return ExitCodes.UNREADABLE_INPUT;
                }
            }
        } catch (IOException e) {
            err.println("cannot read the table image: " + e.getMessage());
            return ExitCodes.UNREADABLE_INPUT;
        }
        FollowLoop.Source source;
        try {
            source = FollowLoop.open(input);
        } catch (IOException | IllegalArgumentException e) {
            err.println("cannot open " + input + ": " + e.getMessage());
            return ExitCodes.UNREADABLE_INPUT;
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
            err.println("cannot write the products: " + e.getMessage());
            return ExitCodes.OUTPUT_FAILED;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return ExitCodes.OK;
        }
    }
}
