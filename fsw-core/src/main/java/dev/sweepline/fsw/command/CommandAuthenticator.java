package dev.sweepline.fsw.command;

/**
 * Authentication of telecommands (commands.md §1.2): the truncated HMAC-SHA256 over header and data,
 * and the anti-replay rule (the sequence number must exceed the last accepted one). Constant-time
 * MAC comparison. Can be switched off for quick bench runs (default on); then neither MAC nor
 * sequence is checked. Allocation-free after construction.
 */
public final class CommandAuthenticator {
    private final HmacSha256 mac;
    private final boolean enabled;
    private final byte[] expected = new byte[HmacSha256.MAC_OCTETS];
    private long lastAccepted = -1;

    /**
     * @param key     the shared key (from the configuration)
     * @param enabled false switches authentication off (bench quick runs)
     */
    public CommandAuthenticator(byte[] key, boolean enabled) {
        this.mac = new HmacSha256(key);
        this.enabled = enabled;
    }

    /** True when MACs and sequences are checked. */
    public boolean enabled() {
        return enabled;
    }

    /**
     * Checks the MAC and the sequence of a packet whose header was already checked.
     *
     * @return {@link CommandReason#OK}, {@link CommandReason#BAD_MAC} or {@link CommandReason#REPLAY}
     */
    public int check(byte[] b, int off, int length) {
        if (!enabled) {
            return CommandReason.OK;
        }
        int signed = length - Telecommand.MAC_OCTETS;
        mac.compute(b, off, signed, expected, 0);
        int diff = 0;
        for (int i = 0; i < Telecommand.MAC_OCTETS; i++) {
            diff |= expected[i] ^ b[off + signed + i];
        }
        if (diff != 0) {
            return CommandReason.BAD_MAC;
        }
        return Telecommand.authSequence(b, off) > lastAccepted ? CommandReason.OK : CommandReason.REPLAY;
    }

    /** Records the sequence of an accepted command. */
    public void accepted(long sequence) {
        if (enabled) {
            lastAccepted = sequence;
        }
    }

    /** The last accepted sequence number, -1 before the first. */
    public long lastAccepted() {
        return lastAccepted;
    }

    /** Signs a packet written by {@link Telecommand#writeUnsigned}: writes its MAC (ground and bench helper). */
    public static void sign(HmacSha256 mac, byte[] b, int off, int length, byte[] scratch) {
        int signed = length - Telecommand.MAC_OCTETS;
        mac.compute(b, off, signed, scratch, 0);
        System.arraycopy(scratch, 0, b, off + signed, Telecommand.MAC_OCTETS);
    }
}
