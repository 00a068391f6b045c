package dev.sweepline.ground.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code decode FILE --out DIR}: writes DIR/spectra.csv and DIR/summary.json. */
@Command(name = "decode", mixinStandardHelpOptions = true,
        description = "Decodes a file of ASM + TM frames into DIR/spectra.csv and DIR/summary.json.")
final class DecodeCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "FILE", description = "File of ASM + TM frames.")
    Path input;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Output directory (created).")
    Path out;

    @Mixin
    StreamOptions options = new StreamOptions();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (!Files.isReadable(input) || Files.isDirectory(input)) {
            spec.commandLine().getErr().println("cannot read " + input);
            return ExitCodes.UNREADABLE_INPUT;
        }
        long octets;
        TelemetryDecoder decoder;
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            spec.commandLine().getErr().println("cannot create " + out + ": " + e.getMessage());
            return ExitCodes.OUTPUT_FAILED;
        }
        try (Writer w = Files.newBufferedWriter(out.resolve("spectra.csv"), StandardCharsets.UTF_8);
                SpectraCsvWriter csv = new SpectraCsvWriter(w)) {
            decoder = new TelemetryDecoder(options.config(), new Ccsds121QuadrantDecoder(), csv);
            try {
                octets = StreamReader.feed(input, decoder);
            } catch (IOException e) {
                spec.commandLine().getErr().println("cannot read " + input + ": " + e.getMessage());
                return ExitCodes.UNREADABLE_INPUT;
            }
        } catch (IOException e) {
            spec.commandLine().getErr().println("cannot write spectra.csv: " + e.getMessage());
            return ExitCodes.OUTPUT_FAILED;
        }
        try {
            ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            m.writeValue(out.resolve("summary.json").toFile(), SummaryJson.build(m, input.toString(), octets, decoder));
        } catch (IOException e) {
            spec.commandLine().getErr().println("cannot write summary.json: " + e.getMessage());
            return ExitCodes.OUTPUT_FAILED;
        }
        spec.commandLine().getOut().printf("%d good frames, %d bad, %d survey + %d focus spectra -> %s%n",
                decoder.stats().framesGood(),
                decoder.stats().framesBad().values().stream().mapToLong(Long::longValue).sum(),
                decoder.stats().spectraSurvey(), decoder.stats().spectraFocus(), out);
        return ExitCodes.OK;
    }
}
