package dev.sweepline.ground.decode;

import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.FrameSynchroniser;
import dev.sweepline.ground.instrument.InstrumentSet;

/**
 * How to decode a stream.
 *
 * @param frameOctets frame length L (128..2048) or {@link FrameSynchroniser#AUTO_LENGTH}
 * @param scid        spacecraft id the frames must carry
 * @param instruments the instrument descriptions spectra are decoded with, by the id they carry
 */
public record DecoderConfig(int frameOctets, int scid, InstrumentSet instruments) {
    /** With every built-in instrument description (the default). */
    public DecoderConfig(int frameOctets, int scid) {
        this(frameOctets, scid, InstrumentSet.builtIns());
    }

    /** ICD defaults: L = 1024, SCID 0x2C5 (ICD §1); every built-in instrument. */
    public static DecoderConfig icdDefaults() {
        return new DecoderConfig(FrameConstants.DEFAULT_FRAME_OCTETS, FrameConstants.CINDER_SCID);
    }

    /** Frame length detected from the stream, SCID 0x2C5; every built-in instrument. */
    public static DecoderConfig autoLength() {
        return new DecoderConfig(FrameSynchroniser.AUTO_LENGTH, FrameConstants.CINDER_SCID);
    }

    /** The same with another frame length. */
    public DecoderConfig withFrameOctets(int l) {
        return new DecoderConfig(l, scid, instruments);
    }

    /** The same with other instrument descriptions. */
    public DecoderConfig withInstruments(InstrumentSet set) {
        return new DecoderConfig(frameOctets, scid, set);
    }
}
