package dev.sweepline.fsw.telemetry;

/** Receives each finished transfer frame, attached sync marker first. Must not keep the array. */
public interface FrameSink {
    /** {@code length} octets of ASM + frame at {@code offset} of {@code frame}. */
    void accept(byte[] frame, int offset, int length);
}
