package dev.sweepline.ground.frame;

/**
 * Frame synchroniser: finds ASM + fixed-length TM frames in a byte stream fed in any chunking,
 * checks each frame's FECF and primary header (version, SCID, VCID in use, data field status), and
 * reports good frames and rejects to a {@link FrameListener}. Bad input is reported, never thrown.
 *
 * <p>Lock: after a frame the next ASM is expected straight away; otherwise the octets up to the next
 * ASM are skipped and reported as {@link FrameReason#GARBAGE_BEFORE_SYNC}. A frame whose FECF fails is
 * searched for an ASM inside it; one found there means the frame was cut short ({@link
 * FrameReason#TRUNCATED}) and decoding resumes at that ASM, so a truncated frame costs only itself.
 *
 * <p>Frame length: fixed, or {@link #AUTO_LENGTH}: detected by {@link FrameLengthDetector} from the first
 * {@value #DETECT_WINDOW_OCTETS} octets (or the whole stream if shorter), falling back to
 * {@link FrameConstants#DEFAULT_FRAME_OCTETS}.
 *
 * <p>Not thread-safe: feed from one thread.
 */
public final class FrameSynchroniser {
    /** Pass as the frame length to detect it from the stream. */
    public static final int AUTO_LENGTH = 0;
    /** Octets buffered before length detection is tried: room for several of the longest frames. */
    static final int DETECT_WINDOW_OCTETS = 16 * 1024;
    /** Octets buffered at most while detection keeps failing before falling back to the default. */
    static final int DETECT_LIMIT_OCTETS = 256 * 1024;
    /** Largest garbage count reported in one event, so that the int count cannot overflow. */
    static final int MAX_GARBAGE_PER_EVENT = 1 << 30;

    private final int scid;
    private final FrameListener listener;
    private int frameOctets;
    private boolean lengthDetected;
    /**
     * Octets the buffer starts with: a few of the longest frames. Once the frame length is known, input
     * is taken in pieces of what fits, so the buffer stays this size (and in cache); while the length is
     * being detected each read is buffered whole, and the buffer grows as far as detection needs.
     */
    static final int INITIAL_BUFFER_OCTETS = 8 * (FrameConstants.ASM_OCTETS + FrameConstants.MAX_FRAME_OCTETS);

    /** The octets not yet decoded, from {@link #start} to {@link #end}. */
    private byte[] buf = new byte[INITIAL_BUFFER_OCTETS];
    private int start;
    private int end;
    /** Stream offset of buf[0]. */
    private long base;
    private long garbageFrom = -1;
    private int garbageOctets;
    private boolean finished;
    /** True when {@link #start} is just past a good frame (octets before it are still in the buffer). */
    private boolean afterGoodFrame;

    /**
     * @param frameOctets fixed frame length L in octets (128..2048), or {@link #AUTO_LENGTH}
     * @param scid        spacecraft id frames must carry (ICD §1: {@link FrameConstants#CINDER_SCID})
     * @param listener    receives frames and rejects
     */
    public FrameSynchroniser(int frameOctets, int scid, FrameListener listener) {
        if (frameOctets != AUTO_LENGTH && (frameOctets < FrameConstants.MIN_FRAME_OCTETS
                || frameOctets > FrameConstants.MAX_FRAME_OCTETS)) {
            throw new IllegalArgumentException("frame length outside the ICD range 128..2048: " + frameOctets);
        }
        this.frameOctets = frameOctets;
        this.scid = scid;
        this.listener = listener;
    }

    /** Frame length in use, or {@link #AUTO_LENGTH} while still detecting. */
    public int frameOctets() {
        return frameOctets;
    }

    /** True when the frame length was found by detection (not given, not the fallback). */
    public boolean lengthDetected() {
        return lengthDetected;
    }

    /** Feeds {@code len} octets; frames complete in them are reported before this returns. */
    public void accept(byte[] in, int off, int len) {
        if (finished || len <= 0) {
            return;
        }
        if (frameOctets == AUTO_LENGTH) {
            // detection looks at what is buffered when it runs: buffer each read whole, as it came
            ensureRoom(len);
            System.arraycopy(in, off, buf, end, len);
            end += len;
            process(false);
            return;
        }
        int at = off;
        int left = len;
        while (left > 0) {
            int take = Math.min(left, roomAtEnd());
            System.arraycopy(in, at, buf, end, take);
            end += take;
            at += take;
            left -= take;
            process(false);
        }
    }

    /** Room after {@link #end}, making some when there is none: the undecoded octets moved down, or more buffer. */
    private int roomAtEnd() {
        if (end == buf.length) {
            compactNow();
        }
        if (end == buf.length) {
            buf = java.util.Arrays.copyOf(buf, buf.length * 2);
        }
        return buf.length - end;
    }

    /** Ends the stream: a partial frame is reported TRUNCATED and trailing octets as garbage. */
    public void finish() {
        if (finished) {
            return;
        }
        process(true);
        flushGarbage();
        finished = true;
    }

    private void process(boolean eof) {
        if (frameOctets == AUTO_LENGTH && !detectLength(eof)) {
            return;
        }
        final int frameLen = frameOctets;
        while (true) {
            int avail = end - start;
            if (avail < FrameConstants.ASM_OCTETS) {
                if (eof && avail > 0) {
                    addGarbage(start, avail);
                    start = end;
                }
                break;
            }
            if (!AsmSearch.isAsm(buf, start, end)) {
                // right after a good frame, also look a few octets back: a stream that slipped by 1-3
                // octets (a short frame whose missing tail matched the next ASM's head) keeps the next frame
                int from = afterGoodFrame ? Math.max(0, start - (FrameConstants.ASM_OCTETS - 1)) : start + 1;
                int i = AsmSearch.find(buf, from, end);
                if (i < 0) {
                    afterGoodFrame = false;
                    int keep = eof ? 0 : FrameConstants.ASM_OCTETS - 1;
                    addGarbage(start, avail - keep);
                    start = end - keep;
                    break;
                }
                addGarbage(start, i - start);
                start = i;
            }
            afterGoodFrame = false;
            flushGarbage();
            int f = start + FrameConstants.ASM_OCTETS;
            if (end - f < frameLen) {
                if (!eof) {
                    break;
                }
                int j = AsmSearch.find(buf, start + 1, end);
                int got = (j < 0 ? end : j) - f;
                listener.onBadFrame(FrameReason.TRUNCATED, streamOffset(f), Math.max(got, 0));
                start = j < 0 ? end : j;
                continue;
            }
            if (Crc16Ibm3740.compute(buf, f, frameLen) != 0) {
                // look for an ASM inside the frame, up to 3 octets short of where the next one belongs
                if (!eof && end - f < frameLen + FrameConstants.ASM_OCTETS - 1) {
                    break;
                }
                int j = AsmSearch.find(buf, start + 1, Math.min(end, f + frameLen + FrameConstants.ASM_OCTETS - 1));
                if (j >= 0) {
                    listener.onBadFrame(FrameReason.TRUNCATED, streamOffset(f), Math.max(j - f, 0));
                    start = j;
                } else {
                    listener.onBadFrame(FrameReason.BAD_CRC, streamOffset(f), frameLen);
                    start = f + frameLen;
                }
                continue;
            }
            FrameReason bad = checkHeader(f);
            if (bad != null) {
                listener.onBadFrame(bad, streamOffset(f), frameLen);
            } else {
                listener.onFrame(buf, f, frameLen, streamOffset(f));
                afterGoodFrame = true;
            }
            start = f + frameLen;
        }
        compact();
    }

    private FrameReason checkHeader(int f) {
        if (TmFrameHeader.version(buf, f) != FrameConstants.TFVN_TM) {
            return FrameReason.WRONG_VERSION;
        }
        if (TmFrameHeader.scid(buf, f) != scid) {
            return FrameReason.WRONG_SCID;
        }
        if (!FrameConstants.vcidInUse(TmFrameHeader.vcid(buf, f))) {
            return FrameReason.UNKNOWN_VCID;
        }
        if (!TmFrameHeader.dataFieldStatusValid(buf, f)) {
            return FrameReason.BAD_DATA_FIELD_STATUS;
        }
        return null;
    }

    private boolean detectLength(boolean eof) {
        int avail = end - start;
        if (!eof && avail < DETECT_WINDOW_OCTETS) {
            return false;
        }
        int l = FrameLengthDetector.detect(buf, start, avail);
        if (l < 0 && !eof && avail < DETECT_LIMIT_OCTETS) {
            return false;
        }
        lengthDetected = l > 0;
        frameOctets = l > 0 ? l : FrameConstants.DEFAULT_FRAME_OCTETS;
        return true;
    }

    private void addGarbage(int from, int n) {
        if (n <= 0) {
            return;
        }
        if (garbageFrom < 0) {
            garbageFrom = streamOffset(from);
        }
        if (garbageOctets > MAX_GARBAGE_PER_EVENT) {
            flushGarbage();
            garbageFrom = streamOffset(from);
        }
        garbageOctets += n;
    }

    private void flushGarbage() {
        if (garbageOctets > 0) {
            listener.onBadFrame(FrameReason.GARBAGE_BEFORE_SYNC, garbageFrom, garbageOctets);
        }
        garbageOctets = 0;
        garbageFrom = -1;
    }

    private long streamOffset(int i) {
        return base + i;
    }

    private void ensureRoom(int len) {
        if (end + len <= buf.length) {
            return;
        }
        compactNow();
        if (end + len > buf.length) {
            byte[] bigger = new byte[Math.max(buf.length * 2, end + len)];
            System.arraycopy(buf, 0, bigger, 0, end);
            buf = bigger;
        }
    }

    private void compact() {
        if (start > buf.length / 2) {
            compactNow();
        }
    }

    private void compactNow() {
        // after a good frame keep its last 3 octets: the slip search may look back at them
        int keep = afterGoodFrame ? Math.min(start, FrameConstants.ASM_OCTETS - 1) : 0;
        int from = start - keep;
        if (from == 0) {
            return;
        }
        System.arraycopy(buf, from, buf, 0, end - from);
        base += from;
        end -= from;
        start = keep;
    }
}
