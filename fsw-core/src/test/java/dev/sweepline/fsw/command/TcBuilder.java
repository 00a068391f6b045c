package dev.sweepline.fsw.command;

import dev.sweepline.fsw.exec.FlightConfig;

/**
 * Builds signed telecommands as commands.md §1 lays them out, for tests: a ground-side helper with
 * its own packet sequence count and authentication sequence.
 */
public final class TcBuilder {
    private final HmacSha256 mac;
    private final byte[] scratch = new byte[HmacSha256.MAC_OCTETS];
    private int packetSequence;
    /** Next authentication sequence number. */
    public long nextAuth = 1;

    /** A builder signing with {@code key}. */
    public TcBuilder(byte[] key) {
        this.mac = new HmacSha256(key);
    }

    /** A builder with the demo key of {@link FlightConfig#demoKey()}. */
    public static TcBuilder demo() {
        return new TcBuilder(FlightConfig.demoKey());
    }

    /** A signed command with the next sequence numbers. */
    public byte[] command(int code, byte... args) {
        return command(nextAuth++, code, args);
    }

    /** A signed command with authentication sequence {@code auth}. */
    public byte[] command(long auth, int code, byte... args) {
        byte[] b = new byte[Telecommand.MIN_OCTETS + args.length];
        int n = Telecommand.writeUnsigned(b, 0, packetSequence++ & 0x3FFF, auth, code, args, 0, args.length);
        CommandAuthenticator.sign(mac, b, 0, n, scratch);
        return b;
    }

    /** Re-signs a (mutated) packet in place: its MAC field becomes right for its other octets. */
    public void resign(byte[] b, int length) {
        if (length >= Telecommand.MAC_OCTETS) {
            CommandAuthenticator.sign(mac, b, 0, length, scratch);
        }
    }

    /** Big-endian 16-bit argument octets. */
    public static byte[] u16(int v) {
        return new byte[] {(byte) (v >>> 8), (byte) v};
    }

    /** The table-load arguments: offset then the image octets [from, from + n). */
    public static byte[] load(byte[] image, int from, int n) {
        byte[] a = new byte[2 + n];
        a[0] = (byte) (from >>> 8);
        a[1] = (byte) from;
        System.arraycopy(image, from, a, 2, n);
        return a;
    }
}
