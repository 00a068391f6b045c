package dev.sweepline.ground.packet;

/**
 * Why the packet layer dropped a frame that passed the synchroniser's checks, judged by its VC count
 * against the last frame accepted on its VC (telemetry ICD §10). A dropped frame feeds no packet,
 * starts no gap and leaves the VC's state as it was; each is counted, none throws.
 */
public enum FrameDrop {
    /** The VC count of the last frame accepted on its VC: the same frame again. */
    DUPLICATE,
    /** A VC count 1..127 behind the last accepted one: a replayed or delayed old frame. */
    STALE
}
