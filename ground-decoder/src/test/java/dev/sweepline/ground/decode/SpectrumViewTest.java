package dev.sweepline.ground.decode;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import dev.sweepline.ground.spectrum.SpectrumView;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The reused spectrum of the decoder's hot path and the owned copies listeners get by default. */
class SpectrumViewTest {
    @Test
    void shouldGiveOwnedCopiesThatTheNextSpectrumDoesNotOverwrite() {
        FrameStreamBuilder b = new FrameStreamBuilder(1024);
        int c = 16;
        for (int k = 0; k < 3; k++) {
            int[][] adc = new int[4][c];
            for (int q = 0; q < 4; q++) {
                for (int i = 0; i < c; i++) {
                    adc[q][i] = 1000 + 100 * k + 10 * q + i; // a value per spectrum, quadrant and window
                }
            }
            b.add(0, TestPackets.spectrum(0x100, k, 0x7FE81780L + k, 0, k, 0, new int[c], new boolean[c], adc));
        }
        b.flush(0);
        List<DecodedSpectrum> owned = new ArrayList<>();
        List<Double> viewed = new ArrayList<>();
        decode(b.stream(), new DecodeListener() {
            @Override
            public void onSpectrum(DecodedSpectrum s) {
                owned.add(s);
            }
        });
        decode(b.stream(), new DecodeListener() {
            @Override
            public void onSpectrumView(SpectrumView v) {
                viewed.add(v.totalAmps(c - 1));
                assertEquals(v.toDecoded().adcCounts()[3][c - 1], v.adcCount(3, c - 1));
            }
        });
        assertEquals(3, owned.size());
        for (int k = 0; k < 3; k++) {
            int[] q2 = new int[c];
            for (int i = 0; i < c; i++) {
                q2[i] = 1000 + 100 * k + 20 + i;
            }
            assertArrayEquals(q2, owned.get(k).adcCounts()[2], "spectrum " + k);
            assertEquals(owned.get(k).totalAmps()[c - 1], viewed.get(k), 0.0, "spectrum " + k);
        }
    }

    private static void decode(byte[] stream, DecodeListener listener) {
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), QuadrantDecompressor.UNAVAILABLE, listener);
        d.accept(stream, 0, stream.length);
        d.finish();
    }
}
