package dev.sweepline.ground.decode;

import java.io.ByteArrayOutputStream;

/** Hex strings to octets and ASM framing, for tests. */
public final class Hex {
    /** The attached sync marker (ICD §1). */
    public static final byte[] ASM = {0x1A, (byte) 0xCF, (byte) 0xFC, 0x1D};

    private Hex() {
    }

    /** Parses hex (spaces allowed). */
    public static byte[] bytes(String hex) {
        String h = hex.replace(" ", "");
        byte[] b = new byte[h.length() / 2];
        for (int i = 0; i < b.length; i++) {
            b[i] = (byte) Integer.parseInt(h.substring(2 * i, 2 * i + 2), 16);
        }
        return b;
    }

    /** ASM + frame for each hex frame, concatenated. */
    public static byte[] stream(String... frames) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        for (String f : frames) {
            o.writeBytes(ASM);
            o.writeBytes(bytes(f));
        }
        return o.toByteArray();
    }
}
