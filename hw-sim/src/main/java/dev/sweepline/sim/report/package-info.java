/**
 * One-file HTML reports (well-formed XHTML, inline styles, PNG images embedded as data URIs, no
 * scripts or network) and XChart PNG charts for the bench's reports: {@link
 * dev.sweepline.sim.report.DecisionChart} (a run's sweep decisions against the true peaks, with mode
 * changes and events), {@link dev.sweepline.sim.report.ParetoChart} (a campaign's sets, front,
 * recommendation and allocation), {@link dev.sweepline.sim.report.BudgetChart} (an orbit plan's rate
 * against allocation by phase, the store and the downlink passes). A chart with nothing to show says so
 * instead of drawing a point at the origin. Verified by decoding each PNG and finding the colours of
 * what it must draw ({@code DecisionChartTest}, {@code ParetoChartTest}, {@code BudgetChartTest},
 * {@code CampaignReportTest}, {@code RunReportFiguresTest}: the reports parsed with the JDK's XML parser).
 */
package dev.sweepline.sim.report;
