package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.instrument.InstrumentFileException;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/** Options shared by the commands: frame length, spacecraft id and the instrument descriptions. */
final class StreamOptions {
    @Option(names = "--frame-length", defaultValue = "auto", paramLabel = "OCTETS|auto",
            converter = OptionValues.FrameLength.class,
            description = "Frame length L in octets (128..2048, ICD §1), or auto to detect it "
                    + "(falling back to 1024). Default: ${DEFAULT-VALUE}.")
    int frameLength;

    @Option(names = "--scid", defaultValue = "0x2C5", paramLabel = "ID", converter = OptionValues.Scid.class,
            description = "Spacecraft id the frames must carry (ICD §1). Default: ${DEFAULT-VALUE}.")
    int scid;

    @Option(names = "--instrument", paramLabel = "NAME|FILE",
            description = "An instrument description: a built-in name (see 'instruments') or a description file "
                    + "(FORMAT.md; a built-in name wins, write ./NAME for a file of that name); repeatable. "
                    + "Default: every built-in.")
    List<String> instruments = new ArrayList<>();

    /**
     * The configuration the options give.
     *
     * @throws GroundFailure (an input error) for a broken or missing description or two descriptions of one id
     */
    DecoderConfig config() {
        try {
            return new DecoderConfig(frameLength, scid, InstrumentSet.resolve(instruments));
        } catch (InstrumentFileException | IllegalArgumentException e) {
            throw new GroundFailure(ExitCodes.INPUT, "--instrument: " + e.getMessage());
        }
    }
}
