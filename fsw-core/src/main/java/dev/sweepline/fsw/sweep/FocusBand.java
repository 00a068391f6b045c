package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/**
 * The focus band and the reference peak it was chosen from (sweep design note, R6 and R10).
 * Band = refined peak window +/- max(minHalfWidth, FWHM * halfWidthPerFwhm), at most maxBandWindows
 * wide, clipped (not shifted) to the table; in the design style the band reaches the design's multiples of
 * the measured low and high half-widths either side, plus the robustness margin (R21, {@link FocusDesign}), and in
 * the alpha-clear style not beyond alphas clear of the protons (R24). Loss of lock compares each focus spectrum with the
 * reference peak: no peak, current collapse, peak on an unclipped edge, peak jump (including a jump
 * to about the alpha ratio). A peak on an edge first turns the band into an edge search (R18).
 */
final class FocusBand {
    private final int[] centreCode;
    private final SweepParameters params;

    private boolean valid;
    private int first;
    private int last;
    private int referencePeakQ8;
    private long referencePeakUnits;
    private int referenceLowHalfQ8;
    private int referenceHighHalfQ8;
    private boolean searching;

    /**
     * @param centreCode the active table's centre codes (owned and kept current by the scheduler)
     * @param params     the active parameters (owned and kept current by the scheduler)
     */
    FocusBand(int[] centreCode, SweepParameters params) {
        this.centreCode = centreCode;
        this.params = params;
    }

    /** Forgets the band (new table, or no lock). */
    void invalidate() {
        valid = false;
    }

    /** True when a band has been chosen since the last invalidation. */
    boolean valid() {
        return valid;
    }

    /** First window of the band. */
    int first() {
        return first;
    }

    /** Last window of the band. */
    int last() {
        return last;
    }

    /** Chooses the band from an analysed spectrum with a valid peak, in a table of {@code windowCount}. */
    void choose(Spectrum s, int windowCount) {
        int centre = (s.peakWindowQ8() + 128) >> 8;
        int above;
        int below;
        if (params.designBand()) {
            int highHalfQ8 = s.fwhmWindowsQ8() - s.lowHalfWindowsQ8();
            int alphaWindow = windowAtOrAbove(((long) codeAtQ8(s.peakWindowQ8(), windowCount) * params.alphaRatioQ16) >> 16,
                    windowCount);
            // alpha-clear (R24): clear by this spectrum's half-width and by that of the spectrum the last
            // band was chosen from, so that one spectrum mixing two winds (a front during the sweep) does
            // not cut the band short of a peak that moved up
            int clearHalfQ8 = valid ? Math.max(highHalfQ8, referenceHighHalfQ8) : highHalfQ8;
            above = FocusDesign.reachAbove(highHalfQ8, clearHalfQ8, alphaWindow - centre, params);
            below = FocusDesign.reachBelow(s.lowHalfWindowsQ8(), above, params);
        } else {
            above = bandHalfWidth(s.fwhmWindowsQ8());
            below = above;
        }
        first = Math.max(0, centre - below);
        last = Math.min(windowCount - 1, centre + above);
        referencePeakQ8 = s.peakWindowQ8();
        referencePeakUnits = s.peakCurrentUnits();
        referenceLowHalfQ8 = s.lowHalfWindowsQ8();
        referenceHighHalfQ8 = s.fwhmWindowsQ8() - s.lowHalfWindowsQ8();
        valid = true;
        searching = false;
    }

    /** Refined peak of the spectrum the band was chosen from, Q8 windows. */
    int referencePeakQ8() {
        return referencePeakQ8;
    }

    /** Low half-width at half maximum of the spectrum the band was chosen from, Q8 windows. */
    int referenceLowHalfQ8() {
        return referenceLowHalfQ8;
    }

    /** High half-width at half maximum of the spectrum the band was chosen from, Q8 windows. */
    int referenceHighHalfQ8() {
        return referenceHighHalfQ8;
    }

    /** The band style's half-width: FWHM * halfWidthPerFwhm, within the band limits. */
    private int bandHalfWidth(int fwhmWindowsQ8) {
        long fromFwhm = ((long) fwhmWindowsQ8 * params.halfWidthPerFwhmQ8 + (1 << 15)) >> 16;
        int half = (int) Math.max(params.minHalfWidthWindows, Math.min(fromFwhm, WindowTable.CAPACITY));
        return Math.min(half, (params.maxBandWindows - 1) / 2);
    }

    /** True while the band is an edge search (the peak ran out of the last band). */
    boolean searching() {
        return searching;
    }

    /**
     * Turns the band into an edge search after the peak of {@code s} ran onto one of its edges: the new
     * band keeps the half-width on the inner side of that peak and reaches {@code edgeSearchWindows}
     * beyond the edge, so a peak that moved out (a shock, a fast stream) is caught by the next focus
     * sweep instead of a full survey. The reference peak is kept for the collapse check.
     */
    void searchBeyondEdge(Spectrum s, int windowCount) {
        int p = s.window(s.peakIndex());
        int half = Math.max(params.minHalfWidthWindows, (last - first) / 2);
        if (last - p < p - first) { // upper edge
            first = Math.max(0, p - half);
            last = Math.min(windowCount - 1, last + params.edgeSearchWindows);
        } else {
            last = Math.min(windowCount - 1, p + half);
            first = Math.max(0, first - params.edgeSearchWindows);
        }
        searching = true;
    }

    /**
     * Loss-of-lock check of a focus spectrum against the reference peak.
     *
     * @return {@link ModeChangeReason#NONE} when the lock holds, else the reason to survey
     */
    int lossOfLock(Spectrum s, int windowCount) {
        if (!s.peakValid()) {
            return ModeChangeReason.NO_PEAK;
        }
        int p = s.window(s.peakIndex());
        boolean lowEdge = first > 0 && p - first < params.edgeWindows;
        boolean highEdge = last < windowCount - 1 && last - p < params.edgeWindows;
        if (lowEdge || highEdge) {
            // before the collapse test: a peak that ran out of the band leaves only its flank inside
            return ModeChangeReason.PEAK_ON_EDGE;
        }
        if (s.peakCurrentUnits() * 256 < referencePeakUnits * params.collapseFractionQ8) {
            return ModeChangeReason.CURRENT_COLLAPSE;
        }
        if (searching) {
            // the peak is expected to have moved, possibly by about the alpha ratio (a strong shock);
            // the search band starts at the old peak, so were the protons still there the peak
            // finder's own alpha test would have kept them
            return ModeChangeReason.NONE;
        }
        if (Math.abs(s.peakWindowQ8() - referencePeakQ8) > (params.jumpWindows << 8)
            || atAlphaRatio(s.peakWindowQ8(), referencePeakQ8, windowCount)) {
            return ModeChangeReason.PEAK_JUMP;
        }
        return ModeChangeReason.NONE;
    }

    /** True when the peak of {@code s} lies at about the alpha ratio from the reference peak. */
    boolean jumpedToAlphaRatio(Spectrum s, int windowCount) {
        return atAlphaRatio(s.peakWindowQ8(), referencePeakQ8, windowCount);
    }

    /** True when the code at {@code peakQ8} is about alphaRatio times the code at {@code referenceQ8}. */
    boolean atAlphaRatio(int peakQ8, int referenceQ8, int windowCount) {
        long reference = codeAtQ8(referenceQ8, windowCount);
        if (reference <= 0) {
            return false;
        }
        long ratioQ16 = (codeAtQ8(peakQ8, windowCount) << 16) / reference;
        long tolerance = ((long) params.alphaRatioQ16 * params.alphaToleranceQ16) >> 16;
        return Math.abs(ratioQ16 - params.alphaRatioQ16) <= tolerance;
    }

    /** The first window whose centre code is at least {@code code}; the last window when none is. */
    int windowAtOrAbove(long code, int windowCount) {
        int w = 0;
        while (w < windowCount - 1 && centreCode[w] < code) {
            w++;
        }
        return w;
    }

    /** Centre code at a fractional window index (Q8), linear between window centres, clamped to the table. */
    long codeAtQ8(int windowQ8, int windowCount) {
        int w = windowQ8 >> 8;
        if (w < 0) {
            return centreCode[0];
        }
        if (w >= windowCount - 1) {
            return centreCode[windowCount - 1];
        }
        int frac = windowQ8 & 0xFF;
        return centreCode[w] + (((long) (centreCode[w + 1] - centreCode[w]) * frac) >> 8);
    }
}
