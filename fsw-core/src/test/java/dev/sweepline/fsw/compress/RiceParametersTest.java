package dev.sweepline.fsw.compress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RiceParametersTest {

    @ParameterizedTest(name = "n={0} J={1} r={2} restricted={3} -> {4}")
    @CsvSource({
        // limits of CCSDS 121.0-B as standards.md gives them: n 1..32, J in {8,16,32,64}, r <= 4096
        "1, 8, 1, false, OK",
        "32, 64, 4096, false, OK",
        "0, 16, 1, false, BITS_PER_SAMPLE_OUT_OF_RANGE",
        "33, 16, 1, false, BITS_PER_SAMPLE_OUT_OF_RANGE",
        "16, 12, 1, false, BLOCK_SIZE_NOT_ALLOWED",
        "16, 128, 1, false, BLOCK_SIZE_NOT_ALLOWED",
        "16, 16, 0, false, REFERENCE_INTERVAL_OUT_OF_RANGE",
        "16, 16, 4097, false, REFERENCE_INTERVAL_OUT_OF_RANGE",
        // the restricted set exists for n <= 4 only (standards.md; the official test set has it for n <= 4)
        "4, 16, 16, true, OK",
        "5, 16, 16, true, RESTRICTED_SET_NEEDS_AT_MOST_4_BITS",
    })
    void shouldGiveTheReasonASetIsRefused(int n, int j, int r, boolean restricted, RiceParameterCheck expected) {
        assertEquals(expected, RiceParameters.check(n, j, r, true, restricted, false));
    }

    @ParameterizedTest(name = "n={0} restricted={1}: ID {2} bits, k <= {3}")
    @CsvSource({
        // ID widths of standards.md: 3 bits for n <= 8, 4 for 8 < n <= 16, 5 for n > 16
        "1, false, 3, -1", "2, false, 3, 0", "5, false, 3, 3", "8, false, 3, 5",
        "9, false, 4, 7", "16, false, 4, 13", "17, false, 5, 15", "32, false, 5, 29",
        // restricted set: 1-bit ID for n <= 2, 2-bit for n = 3, 4 (matches the official test data,
        // which the ground decoder reads with these widths; libaec 1.0.6 uses the same)
        "1, true, 1, -1", "2, true, 1, -1", "3, true, 2, 1", "4, true, 2, 1",
    })
    void shouldDeriveIdWidthAndLargestSplit(int n, boolean restricted, int idBits, int maxK) {
        RiceParameters p = RiceParameters.of(n, 16, 16, true, restricted, false);
        assertEquals(idBits, p.idBits());
        // k <= min(2^ID - 3, n - 2): the ID space (split IDs end below all-ones) and the point past
        // which split-sample is never shorter than no compression (k + 1 bits a sample >= n);
        // a 1-bit ID has no split options at all (2^1 - 3 = -1)
        assertEquals(maxK, p.maxSplitK());
    }

    @ParameterizedTest(name = "n={0} J={1} r={2} restricted={3} pre={4} -> {5}")
    @CsvSource({
        // interval padding (libaec "pad RSI") has no invalid value and no combination it is refused
        // with (RiceParameters.check): a set is accepted or refused the same with padding on or off
        "1, 8, 1, false, true, OK",
        "32, 64, 4096, false, false, OK",
        "4, 16, 16, true, true, OK",
        "0, 16, 1, false, true, BITS_PER_SAMPLE_OUT_OF_RANGE",
        "16, 16, 4097, false, true, REFERENCE_INTERVAL_OUT_OF_RANGE",
        "5, 16, 16, true, true, RESTRICTED_SET_NEEDS_AT_MOST_4_BITS",
    })
    void shouldCheckASetTheSameWithPaddingOnOrOff(int n, int j, int r, boolean restricted, boolean preprocessed,
                                                  RiceParameterCheck expected) {
        assertEquals(expected, RiceParameters.check(n, j, r, preprocessed, restricted, true));
        assertEquals(expected, RiceParameters.check(n, j, r, preprocessed, restricted, false));
    }

    @Test
    void shouldCarryThePaddingFlag() {
        // the flag is stored as given (RiceParameters.of: there is no default, every construction names it)
        assertTrue(RiceParameters.of(16, 8, 32, true, false, true).padIntervalsToOctet());
        assertFalse(RiceParameters.of(16, 8, 32, true, false, false).padIntervalsToOctet());
    }

    @ParameterizedTest
    @CsvSource({"0, 16, 1", "16, 7, 1"})
    void shouldRefuseToBuildAnInvalidSet(int n, int j, int r) {
        // of() is for sets already checked; a refused set there is a programming error
        assertThrows(IllegalArgumentException.class, () -> RiceParameters.of(n, j, r, true, false, false));
    }
}
