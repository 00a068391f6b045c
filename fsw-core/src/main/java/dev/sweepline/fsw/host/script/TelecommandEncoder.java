package dev.sweepline.fsw.host.script;

import dev.sweepline.fsw.command.CommandAuthenticator;
import dev.sweepline.fsw.command.HmacSha256;
import dev.sweepline.fsw.command.Telecommand;

/**
 * The ground side of commanding for the bench: encodes telecommands as commands.md §1 lays them out
 * and signs them with the shared key, numbering them with its own packet count and the
 * authentication numbers of a {@link GroundCommandCounter}.
 */
public final class TelecommandEncoder {
    private final HmacSha256 mac;
    private final GroundCommandCounter counter;
    private final byte[] scratch = new byte[HmacSha256.MAC_OCTETS];
    private int packetSequence;

    /** An encoder signing with {@code key}, numbering from 1 in memory. */
    public TelecommandEncoder(byte[] key) {
        this(key, GroundCommandCounter.inMemory());
    }

    /** An encoder signing with {@code key}, numbering from {@code counter}. */
    public TelecommandEncoder(byte[] key, GroundCommandCounter counter) {
        this.mac = new HmacSha256(key);
        this.counter = counter;
    }

    /** A signed telecommand with the next sequence numbers. */
    public byte[] encode(int code, byte[] args) {
        byte[] b = new byte[Telecommand.MIN_OCTETS + args.length];
        int n = Telecommand.writeUnsigned(b, 0, packetSequence, counter.take(), code, args, 0, args.length);
        packetSequence = (packetSequence + 1) & 0x3FFF;
        CommandAuthenticator.sign(mac, b, 0, n, scratch);
        return b;
    }
}
