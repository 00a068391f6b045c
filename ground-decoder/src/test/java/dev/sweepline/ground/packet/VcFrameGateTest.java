package dev.sweepline.ground.packet;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.decode.FrameStreamBuilder;
import dev.sweepline.ground.frame.TmFrameHeader;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The acceptance window of the VC frame count (ICD §10), at its edges. The 8-bit count (CCSDS 132.0-B-3
 * §4.1.2.6) splits into 1..128 ahead and 1..127 behind, half the circle each way as serial number
 * arithmetic compares (RFC 1982 §3.2), the tie going forward.
 */
class VcFrameGateTest {
    private static final int L = 128;

    /** Frame number {@code i} of one VC: count i mod 256 (CCSDS 132.0-B-3 §4.1.2.6), content of its own. */
    private static byte[] frame(int i, int salt) {
        byte[] f = new byte[L];
        f[TmFrameHeader.VC_COUNT_OFFSET] = (byte) i;
        f[10] = (byte) (i >>> 8);
        f[11] = (byte) i;
        f[12] = (byte) salt; // salt 0: the frame first sent; another: new data with the same count
        return FrameStreamBuilder.withFecf(f);
    }

    private static final class Log implements VcFrameGate.Sink {
        final List<String> events = new ArrayList<>();

        @Override
        public void accept(byte[] buf, int off, int frameOctets, int missing) {
            events.add("accept " + TmFrameHeader.vcCount(buf, off) + (missing > 0 ? " after " + missing : ""));
        }

        @Override
        public void drop(int vcCount, FrameDrop why) {
            events.add(why + " " + vcCount);
        }

        @Override
        public void restart(int lastCount, int newCount) {
            events.add("restart " + lastCount + " -> " + newCount);
        }
    }

    private final Log log = new Log();
    private final VcFrameGate gate = new VcFrameGate(log);

    /** Accepts frames 0 .. n−1 and forgets the log. */
    private void acceptFirst(int n) {
        for (int i = 0; i < n; i++) {
            gate.offer(frame(i, 0), 0, L);
        }
        assertEquals(n, log.events.size());
        log.events.clear();
    }

    private void offer(int i, int salt) {
        gate.offer(frame(i, salt), 0, L);
    }

    @Test
    void shouldTakeUpTo128AheadAsForward() {
        acceptFirst(200); // last count 199
        offer(200, 0); // 1 ahead: in sequence
        offer(200 + 128, 0); // 128 ahead: 127 frames lost (the tie goes forward, ICD §10)
        assertEquals(List.of("accept 200", "accept 72 after 127"), log.events);
    }

    @Test
    void shouldDropACopyOfTheLastFrameAsDuplicate() {
        acceptFirst(200);
        offer(199, 0); // distance 0, the same frame again
        offer(200, 0);
        assertEquals(List.of("DUPLICATE 199", "accept 200"), log.events);
    }

    @Test
    void shouldDropCopiesUpTo127BehindAsStale() {
        acceptFirst(300); // counts wrapped once: last count 299 mod 256 = 43
        offer(299 - 1, 0); // 1 behind
        offer(299 - 127, 0); // 127 behind: the far edge of the stale window, across the wrap
        offer(299 - 128, 0); // 128 behind is 128 ahead: forward, 127 lost
        assertEquals(List.of("STALE 42", "STALE 172", "accept 171 after 127"), log.events);
    }

    @Test
    void shouldHoldANewFrameBehindAndDropItWhenNoneFollowsIt() {
        acceptFirst(100);
        offer(50, 1); // new data with a count 49 behind: held
        offer(100, 0); // the next frame is forward: the held one was stale after all
        offer(60, 1);
        gate.finish(); // a frame still held at the end is stale too
        assertEquals(List.of("STALE 50", "accept 100", "STALE 60"), log.events);
    }

    @Test
    void shouldTakeTwoNewFramesInSequenceBehindTheLastAsARestart() {
        acceptFirst(100); // last count 99
        offer(0, 1); // the counts start again at 0 (ICD §2: the flight software starts them at 0)
        offer(1, 1);
        offer(2, 1);
        assertEquals(List.of("restart 99 -> 0", "accept 0", "accept 1", "accept 2"), log.events);
    }

    @Test
    void shouldTakeANewFrameWithTheLastCountFollowedByTheNextAsARestart() {
        acceptFirst(1); // last count 0: a restart after a single frame repeats the count
        offer(0, 1);
        offer(1, 1);
        assertEquals(List.of("restart 0 -> 0", "accept 0", "accept 1"), log.events);
    }

    @Test
    void shouldNotTakeAReplayedRunInOrderAsARestart() {
        acceptFirst(100);
        for (int i = 10; i < 20; i++) {
            offer(i, 0); // copies of frames accepted: counts in sequence among themselves
        }
        offer(100, 0);
        List<String> expected = new ArrayList<>();
        for (int i = 10; i < 20; i++) {
            expected.add("STALE " + i);
        }
        expected.add("accept 100");
        assertEquals(expected, log.events);
    }

    @Test
    void shouldRecogniseCopiesOfFramesFromAnEarlierTurnOfTheCount() {
        acceptFirst(100); // last count 99
        offer(200, 0); // 101 ahead: 100 lost
        offer(300, 0); // count 44, 100 ahead: 99 lost, frames 201..299 among them
        // frames 30 and 31 were accepted 270 frames ago; their counts are 14 and 13 behind 44 now
        offer(30, 0);
        offer(31, 0);
        assertEquals(List.of("accept 200 after 100", "accept 44 after 99", "STALE 30", "STALE 31"), log.events);
    }
}
