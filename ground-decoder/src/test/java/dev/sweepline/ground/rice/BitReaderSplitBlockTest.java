package dev.sweepline.ground.rice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The block read of split-sample data ({@link BitReader#readSplitBlock}) against the field-by-field reads it
 * stands for: where those succeed it gives the same values and position or declines, where any of them fails
 * it declines with the position unchanged, so the decoder's field-by-field path finds the same error.
 */
class BitReaderSplitBlockTest {
    /** Seed of the random streams, recorded so a failure can be replayed. */
    private static final long SEED = 0x5B11_7B10L;
    /** Streams tried. */
    private static final int CASES = 20_000;

    /** What the field-by-field reads give: values and end position, or null values where one of them fails. */
    private record Reference(long[] values, long position) {
    }

    private static Reference fieldByField(byte[] data, int offset, int length, int skip, int count, int k,
            long maxHigh) {
        BitReader r = at(data, offset, length, skip);
        long[] values = new long[count];
        for (int i = 0; i < count; i++) {
            long high = r.readFundamentalSequence(maxHigh);
            if (high < 0) {
                return new Reference(null, -1);
            }
            values[i] = high << k;
        }
        for (int i = 0; k > 0 && i < count; i++) {
            long low = r.read(k);
            if (low < 0) {
                return new Reference(null, -1);
            }
            values[i] |= low;
        }
        return new Reference(values, r.position());
    }

    private static BitReader at(byte[] data, int offset, int length, int skip) {
        BitReader r = new BitReader(data, offset, length);
        for (int left = skip; left > 0; left -= Math.min(left, 24)) {
            r.read(Math.min(left, 24));
        }
        return r;
    }

    /** Octets whose bits are each one with probability {@code ones}: sparse ones give long codewords. */
    private static byte[] bits(Random rnd, int octets, double ones) {
        byte[] b = new byte[octets];
        for (int i = 0; i < octets * 8; i++) {
            if (rnd.nextDouble() < ones) {
                b[i >> 3] |= (byte) (0x80 >>> (i & 7));
            }
        }
        return b;
    }

    @Test
    void shouldAgreeWithTheFieldByFieldReadsOrDeclineWithoutMoving() {
        Random rnd = new Random(SEED);
        int taken = 0;
        int failing = 0;
        for (int c = 0; c < CASES; c++) {
            int octets = 1 + rnd.nextInt(48);
            byte[] data = bits(rnd, octets, new double[] {0.5, 0.2, 0.05, 0.01}[rnd.nextInt(4)]);
            int offset = rnd.nextInt(octets);
            int length = rnd.nextInt(octets - offset + 1);
            int skip = rnd.nextInt(Math.min(length * 8, 40) + 1);
            int n = new int[] {8, 12, 16, 24, 32}[rnd.nextInt(5)];
            int k = rnd.nextInt(n);
            long maxHigh = ((1L << n) - 1) >>> k; // x_max >> k, the decoder's limit (rice package note)
            int count = rnd.nextBoolean() ? 8 : 7; // J = 8, with and without the reference slot
            Reference expected = fieldByField(data, offset, length, skip, count, k, maxHigh);

            BitReader fast = at(data, offset, length, skip);
            long before = fast.position();
            long[] values = new long[8];
            boolean ok = fast.readSplitBlock(values, 8 - count, 8, k, maxHigh);
            String where = "case " + c + ": n " + n + " k " + k + " octets " + octets + " offset " + offset
                    + " length " + length + " skip " + skip;
            if (ok) {
                taken++;
                assertTrue(expected.values() != null, where + ": read a block the fields refuse");
                assertArrayEquals(expected.values(), Arrays.copyOfRange(values, 8 - count, 8), where);
                assertEquals(expected.position(), fast.position(), where);
            } else {
                assertEquals(before, fast.position(), where + ": declined but moved");
            }
            if (expected.values() == null) {
                failing++;
                assertFalse(ok, where);
            }
        }
        // both sides must be exercised for the comparison to mean anything
        assertTrue(taken > CASES / 20, "block reads taken: " + taken);
        assertTrue(failing > CASES / 20, "streams the fields refuse: " + failing);
    }

    @Test
    void shouldReadATypicalBlockAtOnce() {
        // n = 16, k = 2: FS(0), FS(1), ..., FS(7) then eight 2-bit fields 00 01 10 11 00 01 10 11 (CCSDS
        // 121.0-B-3 §3.4.3.4: the fundamental sequences of the block, then its k low bits per sample)
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < 8; i++) {
            s.append("0".repeat(i)).append('1');
        }
        s.append("0001101100011011");
        byte[] data = new byte[(s.length() + 7) / 8 + 8];
        for (int i = 0; i < s.length(); i++) {
            if (s.charAt(i) == '1') {
                data[i >> 3] |= (byte) (0x80 >>> (i & 7));
            }
        }
        BitReader r = new BitReader(data, 0, data.length);
        long[] values = new long[8];
        assertTrue(r.readSplitBlock(values, 0, 8, 2, 0xFFFF >>> 2));
        // value i = (i << 2) | (i mod 4), by the layout above
        assertArrayEquals(new long[] {0, 5, 10, 15, 16, 21, 26, 31}, values);
        assertEquals(s.length(), r.position());
    }
}
