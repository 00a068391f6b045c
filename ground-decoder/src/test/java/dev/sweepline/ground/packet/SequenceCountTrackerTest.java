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
}
