package dev.sweepline.ground.instrument;

import java.util.List;

/**
 * The optional {@code sweep} section of a description: sweep-parameter defaults of the flight software
 * in the table's window units, with the keys of a campaign grid plus {@code edgeWindows},
 * {@code gainUpFraction} and {@code gainDownFraction} (FORMAT.md). The ground uses none of them; it
 * checks that every key is one of these and that each value is of its kind: window counts whole and
 * within the table, periods and intervals whole and positive, fractions in (0, 1), settle times within
 * the instrument's limits as {@code cadence} has them. The flight software's own, finer ranges are its
 * table validation's (commands.md §4.2), not repeated here.
 */
final class SweepDefaults {
    /** The keys of {@code sweep} (FORMAT.md; the campaign grid keys of hw-sim's campaigns FORMAT.md and three more). */
    static final List<String> KEYS = List.of("integrationPeriods", "halfWidthPerFwhm", "minHalfWidthWindows",
            "maxBandWindows", "resurveyEvery", "collapseFraction", "jumpWindows", "edgeSearchWindows",
            "fixedSettleMicros", "settleMicrosPerCode", "edgeWindows", "gainUpFraction", "gainDownFraction");

    /** The shortest fixed settle the flight software accepts: 5 × settleTauMicros (FORMAT.md, derived values). */
    static NumberRange fixedSettle(double tauMicros) {
        return NumberRange.atLeast(5 * tauMicros);
    }

    /** The shortest settle per code of rail change: nominal scale / slew, µs (FORMAT.md, derived values). */
    static NumberRange settlePerCode(Modulator mod, double slewVoltsPerMs) {
        return NumberRange.atLeast(mod.calibration().nominalMillivoltsPerCode() / slewVoltsPerMs);
    }

    private SweepDefaults() {
    }

    static void check(DescriptionSection s, int windows, Modulator mod, double slewVoltsPerMs, double tauMicros) {
        for (String key : new String[] {"minHalfWidthWindows", "maxBandWindows", "jumpWindows", "edgeWindows",
            "edgeSearchWindows"}) {
            if (s.has(key)) {
                s.whole(key, 0, windows);
            }
        }
        if (s.has("integrationPeriods")) {
            s.whole("integrationPeriods", 1, 1000);
        }
        if (s.has("resurveyEvery")) {
            s.whole("resurveyEvery", 1, Integer.MAX_VALUE);
        }
        if (s.has("halfWidthPerFwhm")) {
            s.number("halfWidthPerFwhm", NumberRange.above(0));
        }
        for (String key : new String[] {"collapseFraction", "gainUpFraction", "gainDownFraction"}) {
            if (s.has(key)) {
                s.number(key, new NumberRange(0, true, 1, true));
            }
        }
        if (s.has("fixedSettleMicros")) {
            s.number("fixedSettleMicros", fixedSettle(tauMicros));
        }
        if (s.has("settleMicrosPerCode")) {
            s.number("settleMicrosPerCode", settlePerCode(mod, slewVoltsPerMs));
        }
    }
}
