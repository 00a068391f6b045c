package dev.sweepline.ground.decode;

/**
 * Packets of one APID lost (sequence count jump, ICD §3.1).
 *
 * @param apid          application process id
 * @param expectedCount sequence count expected
 * @param actualCount   sequence count received
 * @param missing       packets missing, (actual − expected) mod 16384
 */
public record SequenceGap(int apid, int expectedCount, int actualCount, int missing) {
}
