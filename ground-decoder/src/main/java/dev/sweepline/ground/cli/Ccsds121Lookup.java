package dev.sweepline.ground.cli;

import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import java.util.ServiceLoader;

/**
 * Finds the CCSDS 121 quadrant decoder: the first {@link QuadrantDecompressor} registered under
 * {@code META-INF/services}, else {@link QuadrantDecompressor#UNAVAILABLE}. The CCSDS 121 decoder is
 * built separately and plugged in this way.
 */
final class Ccsds121Lookup {
    private Ccsds121Lookup() {
    }

    static QuadrantDecompressor find() {
        for (QuadrantDecompressor d : ServiceLoader.load(QuadrantDecompressor.class)) {
            return d;
        }
        return QuadrantDecompressor.UNAVAILABLE;
    }
}
