package dev.sweepline.fsw.command;

/**
 * Authentication of telecommands (commands.md §1.2, §1.3): the truncated HMAC-SHA256 over header
 * and data, and the anti-replay rule. Constant-time MAC comparison. Can be switched off for quick
 * bench runs (default on); then neither MAC nor sequence is checked.
 *
 * <p>Anti-replay: a command is fresh when its sequence number s satisfies
 * {@code last < s <= last + MAX_ADVANCE} and {@code s <= MAX_SEQUENCE}. Every command whose MAC
 * verifies and that is fresh consumes its number at once, whatever its fate afterwards (common
 * practice for authenticated telecommand: a signed command refused for its state cannot be kept and
 * replayed later). The number is written to non-volatile memory before the command is executed, so a
 * restart (or a power loss) never reopens it. At start-up the record is restored; a missing (when the
 * memory holds other records), empty or corrupt record LOCKS the authenticator: every command is
 * refused with {@link CommandReason#AUTH_LOCKED} until a signed {@link CommandCode#AUTH_RECOVER} names
 * this boot's challenge (commands.md §1.4). Allocation-free after construction.
 */
public final class CommandAuthenticator {
    /** Largest usable sequence number; 0xFFFFFFFF is never accepted, so the space ends without a lock-out by one command. */
    public static final long MAX_SEQUENCE = 0xFFFF_FFFEL;
    /**
     * Largest step forward over the last accepted number (2^24): a mistyped or hostile huge number is
     * refused instead of burning the sequence space (design value: at one command a second the
     * ground needs 194 days to send that many).
     */
    public static final long MAX_ADVANCE = 1L << 24;

    /** {@link #restore} result: the record was intact and is in force. */
    public static final int RESTORED = 0;
    /** {@link #restore} result: a new memory (no record at all); counting starts at 0 and is written. */
    public static final int NEW_MEMORY = 1;
    /** {@link #restore} result: the record is missing, empty or corrupt; locked until AUTH_RECOVER. */
    public static final int LOCKED = 2;
    /** {@link #restore} result: the store keeps nothing across restarts; anti-replay holds within this run only. */
    public static final int VOLATILE = 3;

    private final HmacSha256 mac;
    private final boolean enabled;
    private final NonVolatileStore store;
    private final long bootChallenge;
    private final byte[] expected = new byte[HmacSha256.MAC_OCTETS];
    private final byte[] record = new byte[AuthRecord.OCTETS];
    private long lastAccepted;
    private boolean locked;
    private long recoveries;

    /** An authenticator without persistence (tests, quick runs): anti-replay within the run only. */
    public CommandAuthenticator(byte[] key, boolean enabled) {
        this(key, enabled, NonVolatileStore.NONE, 0);
    }

    /**
     * @param key           the shared key (from the configuration)
     * @param enabled       false switches authentication off (bench quick runs)
     * @param store         where the last accepted number is kept ({@link NonVolatileStore#RECORD_AUTH})
     * @param bootChallenge this boot's recovery challenge (32 bits), supplied by the host from a
     *                      random source; reported in the AUTH_LOCKED event
     */
    public CommandAuthenticator(byte[] key, boolean enabled, NonVolatileStore store, long bootChallenge) {
        this.mac = new HmacSha256(key);
        this.enabled = enabled;
        this.store = store;
        this.bootChallenge = bootChallenge & 0xFFFF_FFFFL;
    }

    /**
     * Restores the anti-replay state at start-up.
     *
     * @param memoryHoldsOtherRecords whether the store held any other record (then a missing auth
     *                                record is not a new memory but a loss)
     * @return {@link #RESTORED}, {@link #NEW_MEMORY}, {@link #LOCKED} or {@link #VOLATILE}
     */
    public int restore(boolean memoryHoldsOtherRecords) {
        if (store.volatileOnly()) {
            return VOLATILE;
        }
        int n = store.read(NonVolatileStore.RECORD_AUTH, record);
        if (n == NonVolatileStore.ABSENT && !memoryHoldsOtherRecords) {
            lastAccepted = 0;
            if (persist(0) != CommandReason.OK) {
                locked = true;
                return LOCKED;
            }
            return NEW_MEMORY;
        }
        long last = n > 0 ? AuthRecord.decode(record, n) : AuthRecord.CORRUPT;
        if (last == AuthRecord.CORRUPT) {
            locked = true;
            return LOCKED;
        }
        lastAccepted = last;
        return RESTORED;
    }

    /** True when MACs and sequences are checked. */
    public boolean enabled() {
        return enabled;
    }

    /**
     * Checks the MAC and the sequence of a packet whose header was already checked, and consumes the
     * sequence number of an authentic, fresh command (written to non-volatile memory first).
     *
     * @return {@link CommandReason#OK}, {@link CommandReason#BAD_MAC}, {@link CommandReason#REPLAY},
     *         {@link CommandReason#SEQUENCE_RANGE}, {@link CommandReason#AUTH_LOCKED} or
     *         {@link CommandReason#NVM_WRITE_FAILED}
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
        long sequence = Telecommand.authSequence(b, off);
        if (locked) {
            return recover(b, off, length, sequence);
        }
        if (sequence <= lastAccepted) {
            return CommandReason.REPLAY;
        }
        if (sequence > MAX_SEQUENCE || sequence - lastAccepted > MAX_ADVANCE) {
            return CommandReason.SEQUENCE_RANGE;
        }
        lastAccepted = sequence; // consumed even if the store fails: this run never takes it again
        return persist(sequence);
    }

    /** While locked: only AUTH_RECOVER naming this boot's challenge passes; its sequence becomes the floor. */
    private int recover(byte[] b, int off, int length, long sequence) {
        boolean recovery = (b[off + Telecommand.CODE_AT] & 0xFF) == CommandCode.AUTH_RECOVER
            && Telecommand.argumentOctets(length) == 4
            && Telecommand.u32(b, off + Telecommand.ARGUMENTS_AT) == bootChallenge;
        if (!recovery) {
            return CommandReason.AUTH_LOCKED;
        }
        if (sequence == 0 || sequence > MAX_SEQUENCE) {
            return CommandReason.SEQUENCE_RANGE;
        }
        int stored = persist(sequence);
        if (stored != CommandReason.OK) {
            return stored; // stays locked: the floor is not durable
        }
        lastAccepted = sequence;
        locked = false;
        recoveries++;
        return CommandReason.OK;
    }

    private int persist(long sequence) {
        if (store.volatileOnly()) {
            return CommandReason.OK;
        }
        int n = AuthRecord.encode(sequence, record);
        return store.write(NonVolatileStore.RECORD_AUTH, record, n) == NonVolatileStore.OK
            ? CommandReason.OK : CommandReason.NVM_WRITE_FAILED;
    }

    /** The last accepted (consumed) sequence number, 0 before the first. */
    public long lastAccepted() {
        return lastAccepted;
    }

    /** True while locked (commands.md §1.4). */
    public boolean locked() {
        return locked;
    }

    /** This boot's recovery challenge. */
    public long bootChallenge() {
        return bootChallenge;
    }

    /** Successful recoveries since start-up. */
    public long recoveries() {
        return recoveries;
    }

    /** Signs a packet written by {@link Telecommand#writeUnsigned}: writes its MAC (ground and bench helper). */
    public static void sign(HmacSha256 mac, byte[] b, int off, int length, byte[] scratch) {
        int signed = length - Telecommand.MAC_OCTETS;
        mac.compute(b, off, signed, scratch, 0);
        System.arraycopy(scratch, 0, b, off + signed, Telecommand.MAC_OCTETS);
    }
}
