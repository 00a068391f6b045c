package dev.sweepline.ground.decode;

import java.nio.ByteBuffer;

/**
 * Space packets built octet by octet from the telemetry ICD §3–§6, for tests. Independent of the main
 * code (it writes, the main code reads).
 */
public final class TestPackets {
    private TestPackets() {
    }

    /** A TM packet with the given data field (secondary header + user data when secHdr). */
    public static byte[] packet(int apid, int seq, boolean secHdr, byte[] dataField) {
        ByteBuffer b = ByteBuffer.allocate(6 + dataField.length);
        b.putShort((short) ((secHdr ? 0x0800 : 0) | apid));
        b.putShort((short) (0xC000 | seq));
        b.putShort((short) (dataField.length - 1));
        b.put(dataField);
        return b.array();
    }

    /** An idle packet (APID 0x7FF, no secondary header, user data 0x55) of {@code total} octets. */
    public static byte[] idle(int seq, int total) {
        byte[] d = new byte[total - 6];
        java.util.Arrays.fill(d, (byte) 0x55);
        return packet(0x7FF, seq, false, d);
    }

    /** A housekeeping packet (ICD §5) with counters derived from {@code seq}. */
    public static byte[] housekeeping(int seq, long coarse, int fine) {
        ByteBuffer b = ByteBuffer.allocate(32);
        b.putInt((int) coarse).putShort((short) fine);
        b.put((byte) 1).put((byte) 1).putInt(seq * 100).putInt(seq * 99).putShort((short) 1).putShort((short) 2)
                .putShort((short) 3).putShort((short) seq).putShort((short) 0).putShort((short) 0).putInt(seq * 1000);
        return packet(0x110, seq, true, b.array());
    }

    /** An event packet (ICD §6): mode change a → b with a reason. */
    public static byte[] event(int seq, long coarse, int fine, int from, int to, int reason) {
        ByteBuffer b = ByteBuffer.allocate(12);
        b.putInt((int) coarse).putShort((short) fine);
        b.putShort((short) 1).put((byte) from).put((byte) to).putShort((short) reason);
        return packet(0x120, seq, true, b.array());
    }

    /**
     * A spectrum packet (ICD §4), raw compression.
     *
     * @param adc [4][c] samples
     */
    public static byte[] spectrum(int apid, int seq, long coarse, int fine, int sweep, int first, int[] gains,
            boolean[] sat, int[][] adc) {
        int c = gains.length;
        byte[][] streams = new byte[4][];
        for (int q = 0; q < 4; q++) {
            ByteBuffer s = ByteBuffer.allocate(2 * c);
            for (int i = 0; i < c; i++) {
                s.putShort((short) adc[q][i]);
            }
            streams[q] = s.array();
        }
        return spectrum(apid, seq, coarse, fine, sweep, first, gains, sat, 0x00, streams);
    }

    /**
     * A layout-2 spectrum packet (ICD §4: 0x82, instrument id, sample width w first), raw compression:
     * each sample in ⌈w/8⌉ octets, big-endian.
     *
     * @param flags the flags octet (bit 7 stepped downward, bit 6 table changed)
     * @param adc   [4][c] samples
     */
    public static byte[] spectrumV2(int instrumentId, int bits, int flags, int apid, int seq, long coarse, int fine,
            int sweep, int first, int[] gains, boolean[] sat, int[][] adc) {
        int c = gains.length;
        int each = (bits + 7) / 8;
        byte[][] streams = new byte[4][each * c];
        for (int q = 0; q < 4; q++) {
            for (int i = 0; i < c; i++) {
                for (int k = 0; k < each; k++) {
                    streams[q][each * i + k] = (byte) (adc[q][i] >>> (8 * (each - 1 - k)));
                }
            }
        }
        byte[] v1 = spectrum(apid, seq, coarse, fine, sweep, first, gains, sat, 0x00, streams);
        // layout 2 = layout 1's user data behind four octets: 0x82, id (2), w; the flags octet set
        ByteBuffer b = ByteBuffer.allocate(v1.length - 6 + 4);
        b.put(v1, 6, 6).put((byte) 0x82).putShort((short) instrumentId).put((byte) bits).put(v1, 12, v1.length - 12);
        byte[] data = b.array();
        data[6 + 4 + 1] = (byte) flags;
        return packet(apid, seq, true, data);
    }

    /**
     * A spectrum packet (ICD §4) with the given compression octet and quadrant streams; each stream's
     * Lq is its length.
     *
     * @param streams [4] the quadrant streams, in quadrant order
     */
    public static byte[] spectrum(int apid, int seq, long coarse, int fine, int sweep, int first, int[] gains,
            boolean[] sat, int compression, byte[][] streams) {
        int c = gains.length;
        int octets = 0;
        for (byte[] s : streams) {
            octets += 2 + s.length;
        }
        ByteBuffer b = ByteBuffer.allocate(6 + 14 + (c + 3) / 4 + (c + 7) / 8 + 1 + octets);
        b.putInt((int) coarse).putShort((short) fine);
        b.put((byte) (apid == 0x100 ? 1 : 2)).put((byte) 0).putShort((short) sweep).putShort((short) 0)
                .putShort((short) first).putShort((short) c).putShort((short) 0xFFFF).putShort((short) 4);
        byte[] tags = new byte[(c + 3) / 4];
        byte[] flags = new byte[(c + 7) / 8];
        for (int i = 0; i < c; i++) {
            tags[i / 4] |= (byte) (gains[i] << (6 - 2 * (i % 4)));
            if (sat[i]) {
                flags[i / 8] |= (byte) (0x80 >>> (i % 8));
            }
        }
        b.put(tags).put(flags).put((byte) compression);
        for (byte[] s : streams) {
            b.putShort((short) s.length).put(s);
        }
        return packet(apid, seq, true, b.array());
    }
}
