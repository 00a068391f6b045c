/**
 * One-file HTML reports (well-formed XHTML, inline styles, PNG images embedded as data URIs, no
 * scripts or network) and XChart PNG charts for the bench's campaign and budget reports.
 */
package dev.sweepline.sim.report;
