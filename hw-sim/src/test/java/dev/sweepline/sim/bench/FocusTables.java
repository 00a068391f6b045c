package dev.sweepline.sim.bench;

import dev.sweepline.fsw.table.SweepParameters;

/**
 * The focus tables the bench tests compare (docs/focus-design.md): the instrument's default (band style)
 * and the interleaved design table that the demo campaign campaigns/focus-style.yaml compares with it, and
 * that table with the support dwell (docs/focus-design.md, "Support dwell"), unpaired and paired, and the
 * alpha-clear design table ("Alpha-clear").
 */
enum FocusTables {
    /** The default table, unchanged. */
    DEFAULT {
        @Override
        void apply(SweepParameters p) {
        }
    },
    /** Design band, interleaved order, table dwell, quick survey of 2 periods, a survey every 64 focus sweeps. */
    INTERLEAVED_DESIGN {
        @Override
        void apply(SweepParameters p) {
            p.focusStyle = SweepParameters.FOCUS_STYLE_DESIGN | SweepParameters.FOCUS_STYLE_INTERLEAVED;
            p.focusBudgetMicros = 0;
            p.surveyIntegrationPeriods = 2;
            p.resurveyEveryFocusSweeps = 64;
        }
    },
    /**
     * The interleaved design table with the support dwell (focusStyle 7): every focus window dwells 1
     * period, three support windows share the rest of the table's dwell times the band's windows.
     */
    SUPPORT_DWELL {
        @Override
        void apply(SweepParameters p) {
            INTERLEAVED_DESIGN.apply(p);
            p.focusStyle |= SweepParameters.FOCUS_STYLE_SUPPORT_DWELL;
            p.focusFloorPeriods = 1;
        }
    },
    /**
     * The support dwell with paired support (focusStyle 15): every focus window dwells 4 periods, the
     * three support points are each two neighbouring windows read in opposite halves of the sweep
     * (docs/focus-design.md, "Paired support").
     */
    PAIRED_SUPPORT {
        @Override
        void apply(SweepParameters p) {
            SUPPORT_DWELL.apply(p);
            p.focusStyle |= SweepParameters.FOCUS_STYLE_PAIRED_SUPPORT;
            p.focusFloorPeriods = 4;
        }
    },
    /**
     * The alpha-clear design table (focusStyle 19: alpha-clear, design band, interleaved; sweep design note
     * R24): alphas 2.5 high half-widths or more above the peak are left out of the band, the dwell fills a
     * 0.35 s sweep time, margin 3, quick survey of 2 periods, a survey every 128 focus sweeps
     * (docs/focus-design.md, "Alpha-clear" and "The alpha-clear table with the drift fit": margin 3 and 0.35 s
     * halve every p95 of the ground on quiet-perihelion and fast-wind with the telemetry rate within 5 % of the
     * default table's, on independent seeds).
     */
    ALPHA_CLEAR {
        @Override
        void apply(SweepParameters p) {
            p.focusStyle = SweepParameters.FOCUS_STYLE_ALPHA_CLEAR | SweepParameters.FOCUS_STYLE_DESIGN
                | SweepParameters.FOCUS_STYLE_INTERLEAVED;
            p.focusBudgetMicros = 350_000;
            p.robustnessMarginWindows = 3;
            p.surveyIntegrationPeriods = 2;
            p.resurveyEveryFocusSweeps = 128;
        }
    };

    /** Sets this table's focus parameters in {@code p}. */
    abstract void apply(SweepParameters p);

    /** {@code config} flying this table. */
    BenchConfig on(BenchConfig config) {
        return config.withFlight(f -> apply(f.parameters));
    }
}
