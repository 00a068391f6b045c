package dev.sweepline.sim.campaign;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Two parameter sets side by side, row by row: their parameters, the moment errors, the lock, the
 * tracking of the band centre, the reacquisition after jumps, the cadence and the bit rate.
 */
final class SideBySide {
    private SideBySide() {
    }

    /** The rows: a label, then the value of {@code a} and of {@code b}. */
    static List<List<String>> rows(CampaignSpec spec, SetResult a, SetResult b) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("parameters", CampaignReport.describe(spec, a), CampaignReport.describe(spec, b)));
        String[] moments = {"n", "U", "T"};
        for (int k = 0; k < 3; k++) {
            rows.add(List.of("median error " + moments[k] + " (%)", CampaignReport.pct(a.momentError()[k]),
                    CampaignReport.pct(b.momentError()[k])));
        }
        rows.add(List.of("n error / CRLB", CampaignReport.num(a.crlbRatio()[0]), CampaignReport.num(b.crlbRatio()[0])));
        rows.add(List.of("lock fraction (mean, worst run)", lock(a), lock(b)));
        rows.add(List.of("alpha locks", Integer.toString(a.alphaLocks()), Integer.toString(b.alphaLocks())));
        rows.add(List.of("band-centre error, windows (median, p95, max)", tracking(a), tracking(b)));
        if (!spec.base().jumps().isEmpty()) {
            rows.add(List.of("reacquired after a jump (worst)", reacquire(a.reacquireSweepsMax(),
                    a.reacquireSecondsMax()), reacquire(b.reacquireSweepsMax(), b.reacquireSecondsMax())));
        }
        rows.add(List.of("cadence (spectra/s)", CampaignReport.num(a.spectraPerSecond()),
                CampaignReport.num(b.spectraPerSecond())));
        rows.add(List.of("telemetry (bit/s, mean and worst run)", bits(a), bits(b)));
        return rows;
    }

    /** A reacquisition as "N sweeps, S s", or "never" when a jump was not reacquired. */
    static String reacquire(int sweeps, double seconds) {
        return sweeps < 0 ? "never" : String.format(Locale.ROOT, "%d sweeps, %.2f s", sweeps, seconds);
    }

    private static String lock(SetResult s) {
        return CampaignReport.num(s.lockFractionMean()) + ", " + CampaignReport.num(s.lockFractionMin());
    }

    private static String tracking(SetResult s) {
        return String.format(Locale.ROOT, "%.2f, %.2f, %.2f", s.centreErrorMedian(), s.centreErrorP95(),
                s.centreErrorMax());
    }

    private static String bits(SetResult s) {
        return String.format(Locale.ROOT, "%.0f, %.0f", s.bitsPerSecondMean(), s.bitsPerSecondMax());
    }
}
