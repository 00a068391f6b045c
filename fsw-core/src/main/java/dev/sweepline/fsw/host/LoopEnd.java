package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.sweep.SweepMode;

/** Why a host loop ({@link RealTimeLoop}, {@link LinkClockLoop}) returned. */
public enum LoopEnd {
    /** Still running, or never run. */
    RUNNING("running"),
    /** The planned end ({@code --minutes}) was reached. */
    END_TIME("planned end reached"),
    /** {@link HostLoop#stop()} was called (the shutdown hook of a signal). */
    STOPPED("stopped by a signal (shutdown hook)"),
    /** The link's stream ended: the peer or the port is gone. */
    PEER_GONE("link lost: the transport ended"),
    /**
     * The executive declared a link time-out (no reply to a step and its re-sends, hardware ICD §4) and
     * the flight software stayed in SAFE, which only a telecommand leaves; a PC host takes none.
     */
    LINK_TIMEOUT("link lost: no replies (link time-out, SAFE)"),
    /** SAFE for a fault response other than the link's (commands.md §6). */
    SAFE("SAFE (fault response)");

    private final String text;

    LoopEnd(String text) {
        this.text = text;
    }

    /**
     * Whether a loop goes on ({@link #RUNNING}) or why it ends: a stop first, then a link loss, then
     * SAFE (on a PC host nothing commands the flight software out of it), then the planned end.
     *
     * @param safeAtStart the executive's link time-out SAFE entries when the loop started
     */
    static LoopEnd check(long nowMicros, long endMicros, boolean stopped, FramedInstrumentLink link,
            FlightSoftware fsw, long safeAtStart) {
        if (stopped) {
            return STOPPED;
        }
        if (link.ended()) {
            return PEER_GONE;
        }
        // the fault protection may resume SURVEY after a link time-out (commands.md §6, RETRY) in the
        // same cycle; SAFE still holding after the cycle, with nothing in flight, is for good
        if (fsw.scheduler().mode() == SweepMode.SAFE && !fsw.executive().outstanding()) {
            return fsw.executive().safeEntries() != safeAtStart ? LINK_TIMEOUT : SAFE;
        }
        return nowMicros >= endMicros ? END_TIME : RUNNING;
    }

    /** True for the two link losses. */
    public boolean linkLost() {
        return this == PEER_GONE || this == LINK_TIMEOUT;
    }

    /** What happened, for the console. */
    public String text() {
        return text;
    }
}
