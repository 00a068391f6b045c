package dev.sweepline.ground.frame;

/** Finds the attached sync marker 1A CF FC 1D (ICD §1) in a byte array. */
final class AsmSearch {
    private AsmSearch() {
    }

    /** True when the four octets at {@code i} (all before {@code end}) are the ASM. */
    static boolean isAsm(byte[] b, int i, int end) {
        return i + 4 <= end && b[i] == (byte) 0x1A && b[i + 1] == (byte) 0xCF
                && b[i + 2] == (byte) 0xFC && b[i + 3] == (byte) 0x1D;
    }

    /** First index {@code >= from} where a whole ASM lies before {@code end}, or -1. */
    static int find(byte[] b, int from, int end) {
        final int last = end - 4;
        for (int i = from; i <= last; i++) {
            if (b[i] == (byte) 0x1A && b[i + 1] == (byte) 0xCF && b[i + 2] == (byte) 0xFC
                    && b[i + 3] == (byte) 0x1D) {
                return i;
            }
        }
        return -1;
    }
}
