/**
 * Octet-level helpers shared by the link (hardware ICD) and the telemetry (telemetry ICD) and the
 * command tables: {@link dev.sweepline.fsw.octets.BigEndian} field access and
 * {@link dev.sweepline.fsw.octets.Crc16} (CRC-16/IBM-3740). It depends on nothing else of the flight
 * software, so that the link and the telemetry never depend on each other for them.
 *
 * <p>Requirements: O1 every multi-octet field of every ICD is written and read through
 * {@code BigEndian} (verified by the golden-byte tests of each codec: {@code MessageCodecTest},
 * {@code GoldenFramesTest}, {@code TableImageFieldsTest}, and by {@code BigEndianTest}); O2 the CRC
 * gives the catalogue check value 0x29B1 and the standards.md frame example 0x0A32
 * ({@code Crc16Test}). Allocation-free, JDK-only ({@code ArchitectureTest}).
 */
package dev.sweepline.fsw.octets;
