package dev.sweepline.fsw.command;

/**
 * Active and pending table images (commands.md §4.2): loads write into the pending image, verify
 * checks its integrity and values, commit makes a verified image active and persists it. A corrupt
 * or invalid image never becomes active; any load after a verify needs a new verify. At start-up
 * the image in non-volatile memory is restored if it is intact and valid. Allocation-free after
 * construction; one thread.
 */
public final class TableManager {
    /** {@link #restore} result: nothing stored, the start-up table is in force. */
    public static final int RESTORE_NONE = 0;
    /** {@link #restore} result: the stored image is in force. */
    public static final int RESTORE_OK = 1;
    /** {@link #restore} result: the stored image was corrupt or invalid; the start-up table is in force. */
    public static final int RESTORE_REJECTED = 2;

    private final NonVolatileStore store;
    private final dev.sweepline.fsw.instrument.InstrumentLimits limits;
    private final byte[] pending = new byte[TableImage.MAX_OCTETS];
    private final byte[] active = new byte[TableImage.MAX_OCTETS];
    private final ParameterTable decoded = new ParameterTable();
    private final ParameterTable activeTable = new ParameterTable();
    private int activeLength;
    private int activeId;
    private boolean verified;
    private int verifiedLength;
    private int lastDetail;

    /**
     * Starts with {@code startUp} active (table id 0: the built-in table), persisting to {@code store};
     * every image is checked against {@code limits} before it can be verified or restored.
     */
    public TableManager(ParameterTable startUp, NonVolatileStore store,
                        dev.sweepline.fsw.instrument.InstrumentLimits limits) {
        this.store = store;
        this.limits = limits;
        activeTable.copyFrom(startUp);
        activeLength = TableImage.encode(activeTable, active);
        activeId = 0;
    }

    /**
     * Restores the image kept in non-volatile memory (start-up). An empty, short, unreadable,
     * corrupt, invalid or unsafe image is rejected (and reported by the caller as such), never taken
     * for "nothing stored".
     *
     * @return {@link #RESTORE_NONE}, {@link #RESTORE_OK} or {@link #RESTORE_REJECTED}
     */
    public int restore() {
        int n = store.read(NonVolatileStore.RECORD_TABLE, pending);
        if (n == NonVolatileStore.ABSENT) {
            return RESTORE_NONE;
        }
        if (n < 0 || TableImage.decode(pending, n, decoded, limits) != 0) {
            return RESTORE_REJECTED;
        }
        makeActive(n);
        return RESTORE_OK;
    }

    /** Writes {@code octets} octets of {@code src} at {@code imageOffset} of the pending image (range checked by the caller). */
    public void load(byte[] src, int srcOff, int imageOffset, int octets) {
        System.arraycopy(src, srcOff, pending, imageOffset, octets);
        verified = false;
    }

    /**
     * Verifies the first {@code length} octets of the pending image.
     *
     * @return {@link CommandReason#OK}, {@link CommandReason#TABLE_CORRUPT} or
     *         {@link CommandReason#TABLE_INVALID} (then {@link #lastDetail()} holds the value code)
     */
    public int verify(int length) {
        verified = false;
        int status = TableImage.decode(pending, length, decoded, limits);
        if (status == TableImage.CORRUPT) {
            lastDetail = 0;
            return CommandReason.TABLE_CORRUPT;
        }
        lastDetail = status;
        if (status != 0) {
            return CommandReason.TABLE_INVALID;
        }
        verified = true;
        verifiedLength = length;
        return CommandReason.OK;
    }

    /** Detail of the last verify: 0, or the value code of an invalid image (TableImage.decode). */
    public int lastDetail() {
        return lastDetail;
    }

    /**
     * Whether a commit naming {@code expectedId} may go ahead.
     *
     * @return {@link CommandReason#OK}, {@link CommandReason#TABLE_NOT_VERIFIED} or
     *         {@link CommandReason#TABLE_ID_MISMATCH}
     */
    public int checkCommit(int expectedId) {
        if (!verified) {
            return CommandReason.TABLE_NOT_VERIFIED;
        }
        return TableImage.tableId(pending, verifiedLength) == expectedId ? CommandReason.OK : CommandReason.TABLE_ID_MISMATCH;
    }

    /**
     * Makes the verified pending image active and writes it to non-volatile memory (call after
     * {@link #checkCommit} said OK).
     *
     * @return {@link CommandReason#OK} or {@link CommandReason#NVM_WRITE_FAILED} (the table is active either way)
     */
    public int commit() {
        if (!verified) {
            throw new IllegalStateException("commit of an unverified table"); // the processor checks first
        }
        verified = false;
        makeActive(verifiedLength);
        return store.write(NonVolatileStore.RECORD_TABLE, active, activeLength) == NonVolatileStore.OK
            ? CommandReason.OK : CommandReason.NVM_WRITE_FAILED;
    }

    private void makeActive(int length) {
        System.arraycopy(pending, 0, active, 0, length);
        activeLength = length;
        activeId = TableImage.tableId(active, length);
        activeTable.copyFrom(decoded);
    }

    /** The table in force. */
    public ParameterTable activeTable() {
        return activeTable;
    }

    /** Id of the table in force: the CRC of its image, 0 for the built-in start-up table. */
    public int activeId() {
        return activeId;
    }

    /** True when the pending image has been verified since its last change. */
    public boolean verified() {
        return verified;
    }

    /** The active (0) or pending (1) image buffer. */
    public byte[] image(int copy) {
        return copy == 0 ? active : pending;
    }

    /** Octets a dump of the active (0) or pending (1) image may read. */
    public int dumpableOctets(int copy) {
        return copy == 0 ? activeLength : pending.length;
    }
}
