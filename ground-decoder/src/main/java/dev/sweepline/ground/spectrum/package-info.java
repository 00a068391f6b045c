/**
 * Spectrum packets (APIDs 0x100 survey, 0x101 focus) of telemetry ICD §4: fields, quadrant sample
 * streams, ADC counts to amperes, window edges of the default table.
 *
 * <h2>Design note</h2>
 * <p>{@link dev.sweepline.ground.spectrum.SpectrumPacketDecoder} walks the packet once, checking every
 * length against the packet's end, and hands each quadrant's stream to a {@link
 * dev.sweepline.ground.spectrum.QuadrantDecompressor}: {@link dev.sweepline.ground.spectrum.RawQuadrantDecoder}
 * for compression 0x00, and {@link dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder} (the
 * module's CCSDS 121.0-B decoder, {@code dev.sweepline.ground.rice}) for 0x01.
 *
 * <p>Requirements and how each is verified:
 * <ol>
 *   <li>S1 every field of ICD §4 decodes: golden spectrum frames ({@code GoldenFrameDecodeTest}) and
 *       field-by-field checks ({@code SpectrumPacketDecoderTest}).</li>
 *   <li>S2 currents follow ICD §4 "Converting to current" (values computed independently with python3,
 *       {@code QuadrantCurrentTest}).</li>
 *   <li>S3 window edges follow the ICD formula, DAC rounding and the HV calibration of ICD §8 ({@code DefaultWindowTableTest}).</li>
 *   <li>S4 every malformed packet gives a {@link dev.sweepline.ground.spectrum.SpectrumError}, never an
 *       exception ({@code SpectrumPacketDecoderTest}, the fuzz test).</li>
 * </ol>
 *
 * <p>Choices: the window edges reported are the calibrated voltages of the DAC-rounded codes the table
 * holds (ICD §8: 0.100150 V × code − 0.8 V), what the fit needs for its thresholds; edges of windows outside the default table, or of
 * any other table id, are NaN (the table image is issue 6). A mode that disagrees with the APID, a gain
 * tag of 3, or octets after the fourth quadrant reject the spectrum: under a good CRC they mean the two
 * sides disagree on the layout, which must be seen rather than guessed around.
 */
package dev.sweepline.ground.spectrum;
