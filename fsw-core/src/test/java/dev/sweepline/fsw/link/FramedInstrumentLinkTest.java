package dev.sweepline.fsw.link;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.sweep.AllocationMeter;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FramedInstrumentLinkTest {
    @Test
    void shouldCarryAStepOutAndAReplyBackOverAPipe() {
        PipeTransport[] ends = PipeTransport.pair(256);
        FramedInstrumentLink link = new FramedInstrumentLink(ends[0], DemoCup.INSTRUMENT);
        StepCommand s = step(5);
        assertTrue(link.send(s, 1_000));
        assertEquals(1_000 + s.durationMicros(DemoCup.MODULATION_PERIOD_MICROS), link.expectedReplyMicros());

        // the far end: deframe the step, answer it
        LinkCounters far = new LinkCounters();
        FrameReceiver rx = new FrameReceiver(far, DemoCup.REPLIES);
        byte[] b = new byte[64];
        int n = ends[1].read(b, 0, b.length);
        assertEquals(19, n); // hardware ICD §6
        int type = FrameReceiver.NONE;
        for (int i = 0; i < n; i++) {
            type = rx.accept(b[i]);
        }
        assertEquals(MessageType.STEP_COMMAND, type);
        StepCommand got = new StepCommand();
        StepCommandCodec.decode(rx.payload(), 0, rx.payloadLength(), got);
        assertEquals(5, got.sequence);

        SampleReply r = new SampleReply();
        r.sequence = 5;
        r.quadrant[2] = 4242;
        FrameSender tx = new FrameSender(ends[1], far);
        byte[] p = new byte[15];
        DemoCup.REPLIES.encode(r, p, 0);
        tx.send(p, 0, 15);

        SampleReply into = new SampleReply();
        assertTrue(link.poll(into, 2_000));
        assertEquals(5, into.sequence);
        assertEquals(4242, into.quadrant[2]);
        assertFalse(link.poll(into, 2_000));
        assertEquals(1, link.repliesDelivered());
    }

    @Test
    void shouldRefuseASendWhileTheLastFrameIsStillGoingOut() {
        PipeTransport[] ends = PipeTransport.pair(32); // room for one 19-octet frame, not two
        FramedInstrumentLink link = new FramedInstrumentLink(ends[0], DemoCup.INSTRUMENT);
        assertTrue(link.send(step(1), 0));
        assertTrue(link.send(step(2), 0)); // 13 octets fit, 6 wait
        assertFalse(link.send(step(3), 0));
        ends[1].read(new byte[64], 0, 64);
        link.pump(); // the rest leaves
        assertTrue(link.send(step(3), 0));
        assertEquals(3, link.counters().framesSent);
    }

    @Test
    void shouldHoldOneReplyAndLeaveTheRestUnread() {
        PipeTransport[] ends = PipeTransport.pair(1024);
        FramedInstrumentLink link = new FramedInstrumentLink(ends[0], DemoCup.INSTRUMENT);
        FrameSender tx = new FrameSender(ends[1], new LinkCounters());
        byte[] p = new byte[15];
        SampleReply r = new SampleReply();
        for (int s = 0; s < 3; s++) {
            r.sequence = s;
            DemoCup.REPLIES.encode(r, p, 0);
            tx.send(p, 0, 15);
        }
        SampleReply into = new SampleReply();
        for (int s = 0; s < 3; s++) {
            assertTrue(link.poll(into, 0));
            assertEquals(s, into.sequence);
        }
        assertFalse(link.poll(into, 0));
    }

    @Test
    void shouldAllocateNothingPerStep() {
        PipeTransport[] ends = PipeTransport.pair(1024);
        FramedInstrumentLink link = new FramedInstrumentLink(ends[0], DemoCup.INSTRUMENT);
        FrameSender tx = new FrameSender(ends[1], new LinkCounters());
        StepCommand s = step(0);
        SampleReply r = new SampleReply();
        byte[] p = new byte[15];
        byte[] sink = new byte[256];
        // the meter's rule (AllocationMeter: 8 of 10 windows of 10k steps at exactly 0 bytes)
        AllocationMeter.assertAllocationFree(steps -> {
            for (int i = 0; i < steps; i++) {
                s.sequence = (s.sequence + 1) & 0xFFFF;
                link.send(s, 0);
                ends[1].read(sink, 0, sink.length);
                r.sequence = s.sequence;
                DemoCup.REPLIES.encode(r, p, 0);
                tx.send(p, 0, 15);
                assertTrue(link.poll(r, 0));
            }
        });
    }

    private static StepCommand step(int sequence) {
        StepCommand s = new StepCommand();
        s.sequence = sequence;
        s.dacLow = 100;
        s.dacHigh = 200;
        s.settleMicros = 1_000;
        s.integrationPeriods = 8;
        s.hvEnabled = true;
        return s;
    }
}
