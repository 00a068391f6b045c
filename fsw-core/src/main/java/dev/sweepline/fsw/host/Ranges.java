package dev.sweepline.fsw.host;

import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * picocli converters that refuse numbers outside an option's range, so that a bad value is a usage
 * error naming the option ({@link ExitStatus#USAGE}) before the command runs.
 */
public final class Ranges {
    private Ranges() {
    }

    private static double decimal(String s) {
        try {
            double v = Double.parseDouble(s);
            if (!Double.isFinite(v)) {
                throw new TypeConversionException("'" + s + "' is not a finite number");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new TypeConversionException("'" + s + "' is not a number");
        }
    }

    private static long integer(String s) {
        try {
            return Long.decode(s);
        } catch (NumberFormatException e) {
            throw new TypeConversionException("'" + s + "' is not a whole number");
        }
    }

    /** A number above zero. */
    public static final class Positive implements ITypeConverter<Double> {
        @Override
        public Double convert(String s) {
            double v = decimal(s);
            if (!(v > 0)) {
                throw new TypeConversionException("must be above 0, got " + s);
            }
            return v;
        }
    }

    /** A number of zero or more. */
    public static final class NonNegative implements ITypeConverter<Double> {
        @Override
        public Double convert(String s) {
            double v = decimal(s);
            if (!(v >= 0)) {
                throw new TypeConversionException("must be 0 or more, got " + s);
            }
            return v;
        }
    }

    /** A probability, 0 to 1. */
    public static final class Probability implements ITypeConverter<Double> {
        @Override
        public Double convert(String s) {
            double v = decimal(s);
            if (!(v >= 0 && v <= 1)) {
                throw new TypeConversionException("must be a probability, 0 to 1, got " + s);
            }
            return v;
        }
    }

    /** A whole number of 1 or more (an int). */
    public static final class PositiveInt implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String s) {
            long v = integer(s);
            if (v < 1 || v > Integer.MAX_VALUE) {
                throw new TypeConversionException("must be 1 to " + Integer.MAX_VALUE + ", got " + s);
            }
            return (int) v;
        }
    }

    /** A whole number of 1 or more (a long). */
    public static final class PositiveLong implements ITypeConverter<Long> {
        @Override
        public Long convert(String s) {
            long v = integer(s);
            if (v < 1) {
                throw new TypeConversionException("must be 1 or more, got " + s);
            }
            return v;
        }
    }

    /** A whole number of 0 or more (a long). */
    public static final class NonNegativeLong implements ITypeConverter<Long> {
        @Override
        public Long convert(String s) {
            long v = integer(s);
            if (v < 0) {
                throw new TypeConversionException("must be 0 or more, got " + s);
            }
            return v;
        }
    }
}
