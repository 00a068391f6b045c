package dev.sweepline.ground.packet;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class SequenceCountTrackerTest {
    @Test
    void shouldFollowThe14BitWrap() {
        SequenceCountTracker t = new SequenceCountTracker();
        // first packet of an APID: no reference, no gap
        assertEquals(0, t.observe(0x100, 16382));
        assertEquals(0, t.observe(0x100, 16383));
        // 16383 -> 0 is in sequence: 14-bit count wraps (CCSDS 133.0-B-2 §4.1.3.4.3, ICD §3.1)
        assertEquals(0, t.observe(0x100, 0));
        // 0 -> 3: counts 1 and 2 missing
        assertEquals(2, t.observe(0x100, 3));
        assertEquals(4, t.expected(0x100));
    }

    @Test
    void shouldCountAGapAcrossTheWrap() {
        SequenceCountTracker t = new SequenceCountTracker();
        t.observe(0x110, 16380);
        // expected 16381; got 1: 16381, 16382, 16383, 0 missing (mod 2^14)
        assertEquals(4, t.observe(0x110, 1));
        // a different APID has its own count (ICD §3.1 "per APID")
        assertEquals(0, t.observe(0x120, 77));
    }

    @Test
    void shouldStartANewSequenceAtCountZeroAfterARestartOnly() {
        SequenceCountTracker t = new SequenceCountTracker();
        t.observe(0x100, 500);
        t.expectRestart(0x100);
        // ICD §2: the packet sequence counts start at 0 at start-up, so 0 after a restart is no gap
        assertEquals(0, t.observe(0x100, 0));
        assertEquals(0, t.observe(0x100, 1));
        // after an outage the counts go on: 1 -> 40 is 38 missing, restart or not (ICD §10)
        t.expectRestart(0x100);
        assertEquals(38, t.observe(0x100, 40));
        // the restart is forgotten after one packet: a later 0 is a gap again, (0 - 41 - 1) mod 2^14
        t.expectRestart(0x100);
        t.observe(0x100, 41);
        assertEquals(16342, t.observe(0x100, 0));
    }
}
