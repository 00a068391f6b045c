package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.BigEndian;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

/**
 * A CCSDS 301.0-B-4 CUC time, level 1 (TAI, epoch 1958-01-01), 4 coarse + 2 fine octets, the packet
 * secondary header of ICD §3.2 (P-field 0x1E implicit).
 *
 * <p>Calendar conversion: the TAI scale is laid on a uniform day count (no leap seconds), so TAI labels
 * follow from the Unix-epoch offset of standards.md; UTC = TAI − 37 s, valid for dates since 2017-01-01
 * (standards.md; IERS Bulletin C [memory]). Earlier dates get the same fixed offset, which is wrong by the
 * leap seconds since then: fine for this demo, noted.
 *
 * @param coarseSeconds seconds since 1958-01-01T00:00:00 TAI (unsigned 32 bits)
 * @param fine          fraction of a second × 2^16 (unsigned 16 bits)
 */
public record CucTime(long coarseSeconds, int fine) {
    /** T-field length, octets (ICD §3.2). */
    public static final int OCTETS = 6;
    /** Seconds from 1958-01-01 TAI to 1970-01-01 on a uniform scale (standards.md, CCSDS 301.0-B-4). */
    public static final long EPOCH_1958_TO_UNIX_SECONDS = 378_691_200L;
    /** TAI − UTC since 2017-01-01, seconds (standards.md). */
    public static final long TAI_MINUS_UTC_SECONDS = 37L;

    private static final DateTimeFormatter ISO_MICROS =
            DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSSSSS").withZone(ZoneOffset.UTC);

    /** Reads the 6 octets at {@code off}. */
    public static CucTime read(byte[] b, int off) {
        long coarse = BigEndian.u32(b, off);
        int fine = BigEndian.u16(b, off + 4);
        return new CucTime(coarse, fine);
    }

    /** Seconds since 1958-01-01 TAI, as a double (resolution 2^-16 s kept up to ~2^37 s). */
    public double taiSeconds() {
        return coarseSeconds + fine / 65536.0;
    }

    /** Nanoseconds of the fraction, truncated. */
    public long fineNanos() {
        return (fine * 1_000_000_000L) >>> 16;
    }

    /** The TAI label as an Instant on a uniform scale (read its fields as a TAI calendar date). */
    public Instant taiLabel() {
        return Instant.ofEpochSecond(coarseSeconds - EPOCH_1958_TO_UNIX_SECONDS, fineNanos());
    }

    /** The UTC instant, TAI − 37 s. */
    public Instant utc() {
        return taiLabel().minusSeconds(TAI_MINUS_UTC_SECONDS);
    }

    /** ISO-8601 TAI label with microseconds, no zone, e.g. {@code 2000-01-01T00:00:00.500000}. */
    public String isoTai() {
        return ISO_MICROS.format(taiLabel());
    }

    /** ISO-8601 UTC with microseconds and a Z, e.g. {@code 1999-12-31T23:59:23.500000Z}. */
    public String isoUtc() {
        return ISO_MICROS.format(utc()) + "Z";
    }
}
