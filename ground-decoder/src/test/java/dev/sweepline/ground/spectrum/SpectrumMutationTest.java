package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.GoldenSpectraV2;
import dev.sweepline.ground.decode.Hex;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Damaged spectrum packets of every layout (the golden ones with random bit flips, octets overwritten,
 * truncation), from a recorded seed: every one decodes to a spectrum or a {@link SpectrumError}, never an
 * exception (ICD §10: bad input is a status), and a spectrum that decodes keeps its instrument's ranges.
 */
class SpectrumMutationTest {
    /** Recorded seed. */
    static final long SEED = 0x5EC7_2026L;
    /** Mutations per golden packet: enough to reach every field of the 73..169-octet packets many times. */
    static final int MUTATIONS = 5000;

    @Test
    void shouldTurnEveryDamagedPacketIntoAStatus() {
        Random rnd = new Random(SEED);
        SpectrumPacketDecoder decoder = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder());
        Map<SpectrumError, Integer> errors = new EnumMap<>(SpectrumError.class);
        int ok = 0;
        byte[][] golden = {Hex.bytes(GoldenFrames.SPECTRUM_PACKET), Hex.bytes(GoldenSpectraV2.FINE_RAW),
            Hex.bytes(GoldenSpectraV2.FINE_RICE), Hex.bytes(GoldenSpectraV2.DEMO_V2),
            SpectrumLayoutThreeTest.layoutThree(3, 0, 40, 1, 300, 2, 40)};
        for (byte[] clean : golden) {
            for (int m = 0; m < MUTATIONS; m++) {
                byte[] p = mutate(clean, rnd);
                SpectrumResult r = decoder.decode(p, 0, p.length);
                if (r.isOk()) {
                    ok++;
                    DecodedSpectrum s = r.spectrum();
                    for (int tag : s.gainRange()) {
                        assertTrue(s.instrument().gains().hasRange(tag));
                    }
                    for (int[] q : s.adcCounts()) {
                        assertTrue(Arrays.stream(q).allMatch(x -> x >= 0 && x <= s.instrument().adc().topCode()));
                    }
                } else {
                    errors.merge(r.error(), 1, Integer::sum);
                }
            }
        }
        System.out.printf("spectrum mutations seed %x: %d decoded, refused %s%n", SEED, ok, errors);
        int refused = errors.values().stream().mapToInt(Integer::intValue).sum();
        assertEquals(golden.length * MUTATIONS, ok + refused);
        // the layout and instrument checks are reached (first octets damaged): common practice, not a figure
        assertTrue(errors.containsKey(SpectrumError.UNKNOWN_INSTRUMENT)
                && errors.containsKey(SpectrumError.UNKNOWN_LAYOUT)
                && errors.containsKey(SpectrumError.BAD_SUPPORT_WINDOWS), errors.toString());
    }

    private static byte[] mutate(byte[] clean, Random rnd) {
        byte[] p = clean.clone();
        switch (rnd.nextInt(3)) {
            case 0 -> {
                for (int k = 1 + rnd.nextInt(3); k > 0; k--) {
                    // user data only: the headers are the packet layer's
                    int bit = 12 * 8 + rnd.nextInt((p.length - 12) * 8);
                    p[bit / 8] ^= (byte) (0x80 >>> (bit % 8));
                }
            }
            case 1 -> p[12 + rnd.nextInt(p.length - 12)] = (byte) rnd.nextInt(256);
            default -> p = Arrays.copyOf(p, 12 + rnd.nextInt(p.length - 12));
        }
        return p;
    }
}
