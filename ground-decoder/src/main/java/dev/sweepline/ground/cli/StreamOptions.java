package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.FrameSynchroniser;
import dev.sweepline.ground.instrument.InstrumentFileException;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/** Options shared by the commands: frame length, spacecraft id and the instrument descriptions. */
final class StreamOptions {
    @Option(names = "--frame-length", defaultValue = "auto", paramLabel = "OCTETS|auto",
            description = "Frame length L in octets (128..2048, ICD §1), or auto to detect it "
                    + "(falling back to 1024). Default: ${DEFAULT-VALUE}.")
    String frameLength;

    @Option(names = "--scid", defaultValue = "0x2C5", paramLabel = "ID",
            description = "Spacecraft id the frames must carry (ICD §1). Default: ${DEFAULT-VALUE}.")
    String scid;

    @Option(names = "--instrument", paramLabel = "NAME|FILE",
            description = "An instrument description: a built-in name (see 'instruments') or a description file "
                    + "(FORMAT.md; a built-in name wins, write ./NAME for a file of that name); repeatable. "
                    + "Default: every built-in.")
    List<String> instruments = new ArrayList<>();

    /**
     * The configuration the options give, or null after writing to {@code err} why there is none (a broken
     * or missing description, two descriptions of one id, a bad frame length).
     */
    DecoderConfig configOrNull(PrintWriter err) {
        try {
            return config();
        } catch (InstrumentFileException | IllegalArgumentException e) {
            err.println(e.getMessage());
            return null;
        }
    }

    /**
     * The configuration the options give.
     *
     * @throws dev.sweepline.ground.instrument.InstrumentFileException for a broken description
     * @throws IllegalArgumentException for a bad frame length or two descriptions of one id
     */
    DecoderConfig config() {
        int l = "auto".equalsIgnoreCase(frameLength) ? FrameSynchroniser.AUTO_LENGTH : Integer.decode(frameLength);
        if (l != FrameSynchroniser.AUTO_LENGTH
                && (l < FrameConstants.MIN_FRAME_OCTETS || l > FrameConstants.MAX_FRAME_OCTETS)) {
            throw new IllegalArgumentException("--frame-length must be 128..2048 or auto: " + frameLength);
        }
        return new DecoderConfig(l, Integer.decode(scid), InstrumentSet.resolve(instruments));
    }
}
