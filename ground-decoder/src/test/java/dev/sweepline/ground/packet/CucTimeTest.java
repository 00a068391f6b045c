package dev.sweepline.ground.packet;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.decode.Hex;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class CucTimeTest {
    @Test
    void shouldParseTheStandardsExample() {
        CucTime t = CucTime.read(Hex.bytes("4E FF A2 00 80 00"), 0);
        // standards.md CCSDS 301.0-B-4: 2000-01-01T00:00:00.5 TAI -> 4E FF A2 00 80 00 [verified]
        assertEquals(0x4EFFA200L, t.coarseSeconds());
        assertEquals(0x8000, t.fine());
        assertEquals("2000-01-01T00:00:00.500000", t.isoTai());
        // exact: 0.5 s is 0x8000 / 2^16, representable in a double
        assertEquals(1_325_376_000.5, t.taiSeconds(), 0.0);
        // UTC = TAI - 37 s (standards.md: TAI-UTC = 37 s since 2017; applied as the ICD's fixed offset)
        assertEquals("1999-12-31T23:59:23.500000Z", t.isoUtc());
    }

    @Test
    void shouldReadTheUnsignedTopOfTheCoarseField() {
        CucTime t = CucTime.read(Hex.bytes("FF FF FF FF FF FF"), 0);
        // 4 coarse octets are unsigned (CCSDS 301.0-B-4 §3.2): 2^32 - 1 s, fine 65535
        assertEquals(4_294_967_295L, t.coarseSeconds());
        // 65535 / 65536 s = 999984741 ns, truncated (CucTime doc)
        assertEquals(999_984_741L, t.fineNanos());
    }

    @Test
    void shouldDateTheGoldenFrameEpoch() {
        // T0 of GoldenFrames: 0x7FE81780 = days(1958-01-01 .. 2026-01-01) x 86400, python3 datetime
        assertEquals("2026-01-01T00:00:00.000000", CucTime.read(Hex.bytes("7F E8 17 80 00 00"), 0).isoTai());
    }

    @Test
    void shouldLabelEveryTFieldAsJavaTimesFormatterDoes() {
        // reference: java.time's ISO calendar through the pattern the label is defined by (CucTime.isoTai)
        DateTimeFormatter reference = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSSSSS").withZone(ZoneOffset.UTC);
        // the field's ends, the Unix epoch, a leap day (2000-02-29, 1958 + 15 399 days) and the second before a
        // day's end; then 100 000 T-fields from a recorded seed
        long[] coarse = {0, 1, 4_294_967_295L, CucTime.EPOCH_1958_TO_UNIX_SECONDS, 15_399L * 86_400,
            15_399L * 86_400 - 1, 0x4EFFA200L};
        int[] fine = {0, 1, 0x8000, 65_535, 0x4189};
        for (long c : coarse) {
            for (int f : fine) {
                CucTime t = new CucTime(c, f);
                assertEquals(reference.format(t.taiLabel()), t.isoTai(), c + " " + f);
            }
        }
        SplittableRandom random = new SplittableRandom(20_261_202);
        for (int i = 0; i < 100_000; i++) {
            CucTime t = new CucTime(random.nextLong(1L << 32), random.nextInt(1 << 16));
            assertEquals(reference.format(t.taiLabel()), t.isoTai(), t.toString());
        }
        // outside the octets' ranges (a record built directly): the formatter itself
        CucTime wide = new CucTime(1L << 40, 0);
        assertEquals(reference.format(wide.taiLabel()), wide.isoTai());
    }
}
