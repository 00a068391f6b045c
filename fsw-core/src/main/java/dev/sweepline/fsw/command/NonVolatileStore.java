package dev.sweepline.fsw.command;

/**
 * The memory that keeps records across a restart (commands.md §4.3): the committed table image
 * ({@link #RECORD_TABLE}) and the last accepted authentication sequence number ({@link #RECORD_AUTH}).
 * The flight software sees only this; the host implements it (a file per record on a PC, see
 * {@code dev.sweepline.fsw.nvm.FileNonVolatileStore}). A write either replaces the whole record or
 * leaves the old one: an implementation must make it durable before it returns {@link #OK}.
 */
public interface NonVolatileStore {
    /** Record: the committed parameter table image. */
    int RECORD_TABLE = 0;
    /** Record: the command authenticator's anti-replay state (commands.md §1.3). */
    int RECORD_AUTH = 1;

    /** {@link #write} result: stored durably. */
    int OK = 0;
    /** {@link #read} result: the record was never written (a new memory). */
    int ABSENT = 0;
    /** {@link #read} / {@link #write} result: the record could not be read or written. */
    int IO_ERROR = -1;
    /** {@link #read} result: the record is larger than the buffer (cannot be valid). */
    int TOO_LARGE = -2;
    /** {@link #read} result: the record exists but holds nothing (a write torn by a power loss). */
    int EMPTY = -3;

    /**
     * Reads record {@code record} into {@code into}.
     *
     * @return octets read (positive), {@link #ABSENT}, or a negative value ({@link #EMPTY},
     *         {@link #IO_ERROR}, {@link #TOO_LARGE}) when the record is unusable
     */
    int read(int record, byte[] into);

    /**
     * Stores the first {@code length} octets of {@code from} as record {@code record}, replacing it.
     *
     * @return {@link #OK}, or a negative value when the store failed (the old record is kept)
     */
    int write(int record, byte[] from, int length);

    /** True when this store keeps nothing across a restart (anti-replay then holds within one run only). */
    default boolean volatileOnly() {
        return false;
    }

    /** A store that keeps nothing (bench runs without an NVM file). */
    NonVolatileStore NONE = new NonVolatileStore() {
        @Override
        public int read(int record, byte[] into) {
            return ABSENT;
        }

        @Override
        public int write(int record, byte[] from, int length) {
            return OK;
        }

        @Override
        public boolean volatileOnly() {
            return true;
        }
    };
}
