package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.octets.BigEndian;
/**
 * CCSDS 301.0-B-4 §3.2 unsegmented time code (CUC), level 1 (TAI, epoch 1958-01-01), 4 coarse and
 * 2 fine octets: P-field {@code 0x1E}, not transmitted (telemetry ICD §3.2). Converts the flight
 * software's tick (microseconds since start) with the time of tick zero.
 */
public final class CucTime {
    /** Octets of the T-field. */
    public static final int LENGTH = 6;
    /** The implicit P-field: no extension, level 1 epoch, 4 coarse octets, 2 fine octets. */
    public static final int P_FIELD = 0x1E;
    private static final long MICROS_PER_SECOND = 1_000_000L;

    private final long coarseAtTickZero;
    private final int fineAtTickZero;

    /**
     * @param coarseAtTickZero TAI seconds since 1958-01-01 at tick zero
     * @param fineAtTickZero   fraction of a second at tick zero, units of 2^-16 s
     */
    public CucTime(long coarseAtTickZero, int fineAtTickZero) {
        this.coarseAtTickZero = coarseAtTickZero;
        this.fineAtTickZero = fineAtTickZero;
    }

    /** Writes the T-field of the time {@code micros} after tick zero at {@code offset}. */
    public void write(byte[] buffer, int offset, long micros) {
        long fine = fineAtTickZero + (micros % MICROS_PER_SECOND) * 65536 / MICROS_PER_SECOND;
        long coarse = coarseAtTickZero + micros / MICROS_PER_SECOND + (fine >>> 16);
        writeFields(buffer, offset, coarse, (int) (fine & 0xFFFF));
    }

    /** Writes a T-field from its two fields: coarse seconds (32 bits) and fine (16 bits). */
    public static void writeFields(byte[] buffer, int offset, long coarseSeconds, int fine) {
        BigEndian.put32(buffer, offset, coarseSeconds);
        BigEndian.put16(buffer, offset + 4, fine);
    }
}
