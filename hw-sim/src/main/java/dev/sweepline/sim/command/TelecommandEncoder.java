package dev.sweepline.sim.command;

import dev.sweepline.fsw.command.CommandAuthenticator;
import dev.sweepline.fsw.command.HmacSha256;
import dev.sweepline.fsw.command.Telecommand;

/**
 * The ground side of commanding for the bench: encodes telecommands as commands.md §1 lays them out
 * and signs them with the shared key, numbering them with its own packet and authentication counts.
 */
public final class TelecommandEncoder {
    private final HmacSha256 mac;
    private final byte[] scratch = new byte[HmacSha256.MAC_OCTETS];
    private int packetSequence;
    private long authSequence = 1;

    /** An encoder signing with {@code key}. */
    public TelecommandEncoder(byte[] key) {
        this.mac = new HmacSha256(key);
    }

    /** A signed telecommand with the next sequence numbers. */
    public byte[] encode(int code, byte[] args) {
        byte[] b = new byte[Telecommand.MIN_OCTETS + args.length];
        int n = Telecommand.writeUnsigned(b, 0, packetSequence, authSequence, code, args, 0, args.length);
        packetSequence = (packetSequence + 1) & 0x3FFF;
        authSequence++;
        CommandAuthenticator.sign(mac, b, 0, n, scratch);
        return b;
    }
}
