package dev.sweepline.fsw.command;

import org.junit.jupiter.api.Test;

import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;
import java.nio.charset.StandardCharsets;
import java.util.HexFormat;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

class HmacSha256Test {
    private static byte[] mac(byte[] key, byte[] data) {
        byte[] out = new byte[32];
        new HmacSha256(key).compute(data, 0, data.length, out, 0);
        return out;
    }

    @Test
    void shouldMatchRfc4231TestCase2() {
        // RFC 4231 §4.3 test case 2: key "Jefe", data "what do ya want for nothing?"
        byte[] out = mac("Jefe".getBytes(StandardCharsets.US_ASCII),
                "what do ya want for nothing?".getBytes(StandardCharsets.US_ASCII));
        assertEquals("5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843", HexFormat.of().formatHex(out));
    }

    @Test
    void shouldMatchRfc4231TestCase6WithKeyLongerThanBlock() {
        // RFC 4231 §4.7 test case 6: 131 octets of 0xaa, "Test Using Larger Than Block-Size Key - Hash Key First"
        byte[] key = new byte[131];
        java.util.Arrays.fill(key, (byte) 0xaa);
        byte[] out = mac(key, "Test Using Larger Than Block-Size Key - Hash Key First".getBytes(StandardCharsets.US_ASCII));
        assertEquals("60e431591ee0b67f0d8a26aacbf5b77f8e0bc6213728c5140546040f0ee37f54", HexFormat.of().formatHex(out));
    }

    @Test
    void shouldAgreeWithJdkMacOnRandomInputs() throws Exception {
        // reference library: javax.crypto.Mac "HmacSHA256" (JDK); exact agreement, 500 seeded cases
        SplittableRandom rng = new SplittableRandom(20261201L);
        for (int i = 0; i < 500; i++) {
            byte[] key = new byte[1 + rng.nextInt(100)];
            byte[] data = new byte[rng.nextInt(300)];
            rng.nextBytes(key);
            rng.nextBytes(data);
            Mac jdk = Mac.getInstance("HmacSHA256");
            jdk.init(new SecretKeySpec(key, "HmacSHA256"));
            assertArrayEquals(jdk.doFinal(data), mac(key, data), "case " + i);
        }
    }
}
