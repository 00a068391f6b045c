/**
 * The one-file HTML quick-look report ({@code report.html}).
 *
 * <h2>Design note</h2>
 * <p>{@link dev.sweepline.ground.report.QuickLookReport} knows nothing of telemetry: the product layer
 * fills it with tables and PNGs. Requirements and how each is verified ({@code GroundProcessingTest},
 * {@code QuickLookReportTest}):
 * <ol>
 *   <li>R1 one self-contained file: images as base64 data URIs, inline CSS, no script, no URL to fetch
 *       (the test scans for {@code http}, {@code src=} other than data URIs).</li>
 *   <li>R2 well-formed XHTML: parsed with the JDK's XML parser; every image decodes with ImageIO.</li>
 *   <li>R3 it renders: where {@code /usr/bin/chromium} exists, a headless screenshot is not blank
 *       (skipped with a message elsewhere).</li>
 *   <li>R4 a live report reloads itself by an HTML meta refresh, never a script ({@code FollowTest}).</li>
 * </ol>
 */
package dev.sweepline.ground.report;
