package dev.sweepline.ground.product;

/** Lets tests of other packages build the {@link SyntheticTelemetry} stream. */
public final class SyntheticTelemetryAccess {
    private SyntheticTelemetryAccess() {
    }

    /** The stream of {@link SyntheticTelemetry#stream(long)}. */
    public static byte[] stream(long seed) {
        return SyntheticTelemetry.stream(seed);
    }
}
