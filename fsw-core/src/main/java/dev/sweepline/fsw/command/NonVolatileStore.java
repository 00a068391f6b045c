package dev.sweepline.fsw.command;

/**
 * The memory that keeps the committed table image across a restart (commands.md §4.3). The flight
 * software sees only this; the host implements it (a file on a PC, see
 * {@code dev.sweepline.fsw.nvm.FileNonVolatileStore}).
 */
public interface NonVolatileStore {
    /** {@link #write} result: stored. */
    int OK = 0;

    /**
     * Reads the stored image into {@code into}.
     *
     * @return octets read (0 when nothing is stored), or a negative value when the store failed
     */
    int read(byte[] into);

    /**
     * Stores the first {@code length} octets of {@code from}, replacing what was stored.
     *
     * @return {@link #OK}, or a negative value when the store failed
     */
    int write(byte[] from, int length);

    /** A store that keeps nothing. */
    NonVolatileStore NONE = new NonVolatileStore() {
        @Override
        public int read(byte[] into) {
            return 0;
        }

        @Override
        public int write(byte[] from, int length) {
            return OK;
        }
    };
}
