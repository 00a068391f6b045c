package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.BigEndian;
import java.time.Instant;
import java.time.LocalDate;
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

    /** The largest coarse time (4 unsigned octets) and fine fraction (2 unsigned octets). */
    private static final long MAX_COARSE = 0xFFFF_FFFFL;
    private static final int MAX_FINE = 0xFFFF;
    private static final long SECONDS_PER_DAY = 86_400;
    /** Characters of {@code yyyy-MM-ddTHH:mm:ss.SSSSSS}. */
    private static final int ISO_MICROS_LENGTH = 26;

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

    /**
     * ISO-8601 TAI label with microseconds, no zone, e.g. {@code 2000-01-01T00:00:00.500000}: the characters
     * {@code DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSSSSS")} gives for {@link #taiLabel()}, written
     * directly for the fields a CUC T-field can hold (years 1958 to 2094, always four digits), through the
     * formatter otherwise (the ground formats every fitted spectrum's time).
     */
    public String isoTai() {
        if (coarseSeconds < 0 || coarseSeconds > MAX_COARSE || fine < 0 || fine > MAX_FINE) {
            return ISO_MICROS.format(taiLabel());
        }
        long unixSeconds = coarseSeconds - EPOCH_1958_TO_UNIX_SECONDS;
        LocalDate date = LocalDate.ofEpochDay(Math.floorDiv(unixSeconds, SECONDS_PER_DAY));
        int second = (int) Math.floorMod(unixSeconds, SECONDS_PER_DAY);
        char[] c = new char[ISO_MICROS_LENGTH];
        digits(c, 0, date.getYear(), 4);
        c[4] = '-';
        digits(c, 5, date.getMonthValue(), 2);
        c[7] = '-';
        digits(c, 8, date.getDayOfMonth(), 2);
        c[10] = 'T';
        digits(c, 11, second / 3600, 2);
        c[13] = ':';
        digits(c, 14, second / 60 % 60, 2);
        c[16] = ':';
        digits(c, 17, second % 60, 2);
        c[19] = '.';
        // SSSSSS: the fraction's first six digits, truncated, as the formatter prints the nanoseconds
        digits(c, 20, (int) (fineNanos() / 1000), 6);
        return new String(c);
    }

    /** {@code value} (non-negative, below 10^count) as {@code count} decimal digits at {@code at}. */
    private static void digits(char[] c, int at, int value, int count) {
        for (int i = at + count - 1; i >= at; i--) {
            c[i] = (char) ('0' + value % 10);
            value /= 10;
        }
    }

    /** ISO-8601 UTC with microseconds and a Z, e.g. {@code 1999-12-31T23:59:23.500000Z}. */
    public String isoUtc() {
        return ISO_MICROS.format(utc()) + "Z";
    }
}
