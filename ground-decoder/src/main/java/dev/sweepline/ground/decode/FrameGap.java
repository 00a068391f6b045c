package dev.sweepline.ground.decode;

/**
 * Frames of one VC lost between two good frames (VC count jump, ICD §2).
 *
 * @param vcid          virtual channel
 * @param expectedCount VC count expected
 * @param actualCount   VC count received
 * @param missing       frames missing, (actual − expected) mod 256
 */
public record FrameGap(int vcid, int expectedCount, int actualCount, int missing) {
}
