package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.product.GroundProcessing;
import dev.sweepline.ground.product.GroundProducts;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code decode FILE --out DIR [--instrument NAME|FILE]... [--table IMAGE]... [--allocation BITS_PER_S]}:
 * writes DIR/spectra.csv, summary.json, moments.csv, moments.json, the plots and report.html
 * ({@link GroundProcessing}), each spectrum with the description of the instrument it names.
 */
@Command(name = "decode", mixinStandardHelpOptions = true,
        description = "Decodes a file of ASM + TM frames, fits every spectrum and writes DIR/spectra.csv, "
                + "summary.json, moments.csv, moments.json, spectrogram.png, moments.png, spectrum-fit.png "
                + "and report.html.")
final class DecodeCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "FILE", description = "File of ASM + TM frames.")
    Path input;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output directory (created).")
    Path out;

    @Option(names = "--table", paramLabel = "IMAGE",
            description = "An uplinked table image (commands.md §4.1), so its spectra get window edges; repeatable.")
    List<Path> tables = new ArrayList<>();

    @Option(names = "--allocation", paramLabel = "BITS_PER_S", converter = OptionValues.Positive.class,
            description = "Downlink allocation to compare the frame bit rate with in report.html.")
    Double allocation;

    @Option(names = "--follow", description = "Follow a growing FILE, or a TCP stream given as FILE = tcp://HOST:PORT, "
            + "rewriting the products and a self-reloading report.html every " + FollowLoop.REFRESH_SECONDS
            + " s as frames arrive (a file is followed until Ctrl-C; a TCP stream until the server closes it).")
    boolean follow;

    @Mixin
    StreamOptions options = new StreamOptions();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (follow) {
            return FollowCommand.follow(spec.positionalParameters().get(0).originalStringValues().get(0), out, tables,
                    allocation, options, spec.commandLine());
        }
        Inputs.readable(input);
        DecoderConfig config = options.config();
        WindowCatalogue windows = new WindowCatalogue();
        for (Path t : tables) {
            if (windows.add(Inputs.read("--table", t)) < 0) {
                throw new GroundFailure(ExitCodes.INPUT, "--table " + t + ": not an intact table image (CRC or length)");
            }
        }
        if (Files.exists(out) && !Files.isDirectory(out)) {
            throw new GroundFailure(ExitCodes.IO, "--out " + out + ": exists and is not a folder");
        }
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw new GroundFailure(ExitCodes.IO, "--out " + out + ": cannot create the folder (" + Inputs.reason(e) + ")");
        }
        GroundProducts p;
        try {
            p = GroundProcessing.process(input, out,
                    allocation == null ? OptionalDouble.empty() : OptionalDouble.of(allocation), config,
                    windows);
        } catch (NoSuchFileException e) {
            throw new GroundFailure(ExitCodes.INPUT, input + ": " + Inputs.reason(e));
        } catch (IOException e) {
            throw new GroundFailure(ExitCodes.IO, "--out " + out + ": cannot write the products (" + Inputs.reason(e) + ")");
        }
        spec.commandLine().getOut().printf("%d good frames, %d bad, %d survey + %d focus spectra, %d fitted -> %s%n",
                p.stats().framesGood(),
                p.stats().framesBad().values().stream().mapToLong(Long::longValue).sum(),
                p.stats().spectraSurvey(), p.stats().spectraFocus(), p.fits().fitted(), out);
        return ExitCodes.OK;
    }
}
