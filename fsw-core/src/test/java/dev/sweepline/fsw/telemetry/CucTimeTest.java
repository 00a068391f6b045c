package dev.sweepline.fsw.telemetry;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.HexFormat;
import org.junit.jupiter.api.Test;

class CucTimeTest {
    /** TAI seconds from 1958-01-01 to 2000-01-01: 42 years with 10 leap days (calendar arithmetic). */
    private static final long COARSE_2000 = (42L * 365 + 10) * 86_400;

    @Test
    void shouldEncodeTheStandardsExample() {
        byte[] t = new byte[CucTime.LENGTH];
        new CucTime(COARSE_2000, 0).write(t, 0, 500_000);
        // standards.md, CCSDS 301.0-B-4: 2000-01-01T00:00:00.5 TAI -> 4E FF A2 00 80 00 (verified)
        assertArrayEquals(HexFormat.of().parseHex("4effa2008000"), t);
    }

    @Test
    void shouldCarryTheFineFieldIntoTheCoarseSeconds() {
        byte[] t = new byte[CucTime.LENGTH];
        // tick zero at .75 s; 0.5 s later is the next second + .25: fine 0x4000 (2^16 / 4)
        new CucTime(COARSE_2000, 0xC000).write(t, 0, 500_000);
        assertArrayEquals(HexFormat.of().parseHex("4effa2014000"), t);
    }

    @Test
    void shouldTruncateTheFineField() {
        byte[] t = new byte[CucTime.LENGTH];
        // 1 us = 65536e-6 units of 2^-16 s = 0.065..., truncated to 0 (telemetry ICD §3.2)
        new CucTime(COARSE_2000, 0).write(t, 0, 1);
        assertArrayEquals(HexFormat.of().parseHex("4effa2000000"), t);
    }
}
