package dev.sweepline.sim.bench;

import dev.sweepline.fsw.table.SweepParameters;

/**
 * The focus tables the bench tests compare (docs/focus-design.md): the instrument's default (band style)
 * and the interleaved design table that the demo campaign campaigns/focus-style.yaml compares with it.
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
    };

    /** Sets this table's focus parameters in {@code p}. */
    abstract void apply(SweepParameters p);

    /** {@code config} flying this table. */
    BenchConfig on(BenchConfig config) {
        return config.withFlight(f -> apply(f.parameters));
    }
}
