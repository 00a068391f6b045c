package dev.sweepline.ground.cli;

import dev.sweepline.ground.frame.FrameConstants;
import dev.sweepline.ground.frame.FrameSynchroniser;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** picocli converters of the ground's option values: a bad value is a usage error naming the option. */
final class OptionValues {
    /** Largest spacecraft id: the TM frame's 10-bit field (CCSDS 132.0-B-3 §4.1.2.2.3). */
    static final int MAX_SCID = 0x3FF;

    private OptionValues() {
    }

    private static int integer(String s) {
        try {
            return Integer.decode(s);
        } catch (NumberFormatException e) {
            throw new TypeConversionException("'" + s + "' is not a whole number (decimal or 0x hex)");
        }
    }

    /** {@code --frame-length}: auto, or 128..2048 octets (telemetry ICD §1). */
    static final class FrameLength implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String s) {
            if ("auto".equalsIgnoreCase(s)) {
                return FrameSynchroniser.AUTO_LENGTH;
            }
            int l = integer(s);
            if (l < FrameConstants.MIN_FRAME_OCTETS || l > FrameConstants.MAX_FRAME_OCTETS) {
                throw new TypeConversionException("must be " + FrameConstants.MIN_FRAME_OCTETS + ".."
                        + FrameConstants.MAX_FRAME_OCTETS + " octets or auto, got " + s);
            }
            return l;
        }
    }

    /** {@code --scid}: 0..0x3FF. */
    static final class Scid implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String s) {
            int id = integer(s);
            if (id < 0 || id > MAX_SCID) {
                throw new TypeConversionException("must be 0..0x3FF (a 10-bit spacecraft id), got " + s);
            }
            return id;
        }
    }

    /** A rate above zero ({@code --allocation}). */
    static final class Positive implements ITypeConverter<Double> {
        @Override
        public Double convert(String s) {
            double v;
            try {
                v = Double.parseDouble(s);
            } catch (NumberFormatException e) {
                throw new TypeConversionException("'" + s + "' is not a number");
            }
            if (!(v > 0) || Double.isInfinite(v)) {
                throw new TypeConversionException("must be above 0, got " + s);
            }
            return v;
        }
    }
}
