package dev.sweepline.ground.frame;

/**
 * Finds the fixed frame length L of a stream: the length, within the ICD's allowed range, at which a
 * frame following an ASM has a CRC-16 residue of 0 (FECF checks) and is itself followed by an ASM.
 * A length confirmed by a second frame of the same length is preferred.
 *
 * <p>A chance residue of 0 at a wrong length happens with probability 2^-16 per length tried; also
 * requiring the next ASM (2^-32 by chance) makes a wrong pick negligible.
 */
public final class FrameLengthDetector {
    /** Most ASM candidates tried before giving up; bounds the work on a garbage stream. */
    static final int MAX_CANDIDATES = 64;

    private FrameLengthDetector() {
    }

    /**
     * Detects L from the octets {@code buf[off .. off+len)}.
     *
     * @return the frame length in octets, or -1 when no length could be found
     */
    public static int detect(byte[] buf, int off, int len) {
        final int end = off + len;
        int fallback = -1;
        int tried = 0;
        for (int p = AsmSearch.find(buf, off, end); p >= 0 && tried < MAX_CANDIDATES;
                p = AsmSearch.find(buf, p + 1, end)) {
            tried++;
            int f = p + FrameConstants.ASM_OCTETS;
            int crc = Crc16Ibm3740.INIT;
            int maxN = Math.min(FrameConstants.MAX_FRAME_OCTETS, end - f);
            for (int n = 1; n <= maxN; n++) {
                crc = Crc16Ibm3740.update(crc, buf[f + n - 1]);
                if (crc != 0 || n < FrameConstants.MIN_FRAME_OCTETS || !AsmSearch.isAsm(buf, f + n, end)) {
                    continue;
                }
                int g = f + n + FrameConstants.ASM_OCTETS;
                if (g + n <= end && Crc16Ibm3740.compute(buf, g, n) == 0) {
                    return n;
                }
                if (fallback < 0) {
                    fallback = n;
                }
            }
        }
        return fallback;
    }
}
