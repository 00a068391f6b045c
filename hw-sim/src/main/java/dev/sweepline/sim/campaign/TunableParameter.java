package dev.sweepline.sim.campaign;

import dev.sweepline.fsw.table.SweepParameters;

/**
 * The sweep parameters a campaign grid may vary, by their campaign-file key, in plain units (the
 * flight software's fixed-point scales are applied here).
 */
public enum TunableParameter {
    /** Dwell: modulation periods integrated per window. */
    INTEGRATION_PERIODS("integrationPeriods") {
        @Override
        void apply(SweepParameters p, double v) {
            p.integrationPeriods = (int) Math.round(v);
        }
    },
    /** Focus band half-width per measured FWHM (a factor; Q8 in the flight software). */
    HALF_WIDTH_PER_FWHM("halfWidthPerFwhm") {
        @Override
        void apply(SweepParameters p, double v) {
            p.halfWidthPerFwhmQ8 = (int) Math.round(v * 256);
        }
    },
    /** Smallest focus band half-width, windows. */
    MIN_HALF_WIDTH_WINDOWS("minHalfWidthWindows") {
        @Override
        void apply(SweepParameters p, double v) {
            p.minHalfWidthWindows = (int) Math.round(v);
        }
    },
    /** Widest focus band, windows. */
    MAX_BAND_WINDOWS("maxBandWindows") {
        @Override
        void apply(SweepParameters p, double v) {
            p.maxBandWindows = (int) Math.round(v);
        }
    },
    /** Focus sweeps between forced surveys (K). */
    RESURVEY_EVERY("resurveyEvery") {
        @Override
        void apply(SweepParameters p, double v) {
            p.resurveyEveryFocusSweeps = (int) Math.round(v);
        }
    },
    /** Lock lost below this fraction of the reference peak current (Q8 in the flight software). */
    COLLAPSE_FRACTION("collapseFraction") {
        @Override
        void apply(SweepParameters p, double v) {
            p.collapseFractionQ8 = (int) Math.round(v * 256);
        }
    },
    /** Lock lost when the peak moves by more than this many windows. */
    JUMP_WINDOWS("jumpWindows") {
        @Override
        void apply(SweepParameters p, double v) {
            p.jumpWindows = (int) Math.round(v);
        }
    },
    /** Edge search reach beyond a band edge, windows (0: survey at once). */
    EDGE_SEARCH_WINDOWS("edgeSearchWindows") {
        @Override
        void apply(SweepParameters p, double v) {
            p.edgeSearchWindows = (int) Math.round(v);
        }
    };

    private final String key;

    TunableParameter(String key) {
        this.key = key;
    }

    /** Key in the campaign file. */
    public String key() {
        return key;
    }

    /** Sets this parameter of {@code p} to {@code value} (plain units). */
    abstract void apply(SweepParameters p, double value);

    /** The parameter of that key, or null. */
    static TunableParameter byKey(String key) {
        for (TunableParameter t : values()) {
            if (t.key.equals(key)) {
                return t;
            }
        }
        return null;
    }
}
