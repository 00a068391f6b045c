package dev.sweepline.fsw.link;

/**
 * What a framed link knows of its own health, for housekeeping (telemetry ICD §5): links with no
 * framing (in process) do not implement it.
 */
public interface LinkHealth {
    /** Frames received bad (CRC, COBS, length or type errors) since start. */
    long framesBad();
}
