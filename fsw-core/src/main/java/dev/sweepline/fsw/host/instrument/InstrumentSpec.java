package dev.sweepline.fsw.host.instrument;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import java.util.Map;

/**
 * One instrument description file ({@code instruments/FORMAT.md}, format {@code sweepline-instrument/1})
 * as read, every section with its plain units (doubles where the file has them): what the simulator
 * builds its cup, HV supply and preamplifier from, and what {@link #flight()} turns into the flight
 * software's integer {@link InstrumentDescription}. Checked by {@link InstrumentFileReader}.
 *
 * @param file        where it was read from ({@code instruments/NAME.yaml} for a built-in, else the path)
 * @param name        the instrument's name
 * @param id          the instrument id telemetry carries (telemetry ICD §4)
 * @param description one or two sentences
 * @param geometry    the cup
 * @param modulator   the modulator, its DAC and its HV supply
 * @param windows     the default window table
 * @param preamp      the preamplifier
 * @param adc         the ADC
 * @param cadence     the default dwell and settle
 * @param sweep       the optional sweep-parameter overrides, key to value as written (FORMAT.md, sweep)
 */
public record InstrumentSpec(String file, String name, int id, String description, Geometry geometry,
        Modulator modulator, Windows windows, Preamp preamp, Adc adc, Cadence cadence, Map<String, Double> sweep) {

    /** Copies the override map. */
    public InstrumentSpec {
        sweep = Map.copyOf(sweep);
    }

    /**
     * The cup (FORMAT.md, geometry).
     *
     * @param effectiveAreaCm2      aperture area × grid transmission at normal incidence, cm²
     * @param apertureRadiusMm      radius R of the aperture, mm (given, or derived from the area)
     * @param apertureToCollectorMm distance d from the aperture to the collector plane, mm
     * @param collectorRadiusMm     collector radius, mm
     * @param grids                 grids the ions cross
     * @param gridTransparency      geometric transparency of one grid
     */
    public record Geometry(double effectiveAreaCm2, double apertureRadiusMm, double apertureToCollectorMm,
            double collectorRadiusMm, int grids, double gridTransparency) {
        /** Transmission of all grids: transparency^grids. */
        public double transmission() {
            return Math.pow(gridTransparency, grids);
        }
    }

    /**
     * The modulator and its HV supply (FORMAT.md, modulator).
     *
     * @param minVolts                 lowest level of the default table, V
     * @param maxVolts                 the rating, V
     * @param dacBits                  HV DAC width
     * @param nominalMillivoltsPerCode nominal DAC scale, mV per code
     * @param gainError                the real unit's scale against nominal
     * @param offsetVolts              the real unit's output at code 0, V
     * @param slewVoltsPerMs           slew limit of either rail, V/ms
     * @param settleTauMicros          first-order settling time constant, µs
     * @param monitorNoiseVoltsRms     noise of the HV monitor, V
     * @param settledToleranceCodes    largest |monitor − command| still counted as settled, codes
     * @param modulationPeriodMicros   period of the square-wave modulation, µs
     */
    public record Modulator(double minVolts, double maxVolts, int dacBits, int nominalMillivoltsPerCode,
            double gainError, double offsetVolts, double slewVoltsPerMs, double settleTauMicros,
            double monitorNoiseVoltsRms, int settledToleranceCodes, int modulationPeriodMicros) {
        /** Highest DAC code any table may command: ⌊maxVolts × 1000 / scale⌋ (FORMAT.md, derived values). */
        public int maxLevelCode() {
            return (int) Math.floor(maxVolts * 1000 / nominalMillivoltsPerCode + 1e-9);
        }

        /** The DAC's top code, 2^dacBits − 1. */
        public int dacTopCode() {
            return (1 << dacBits) - 1;
        }

        /** Shortest fixed settle the flight software accepts, µs: 5 × tau (FORMAT.md, derived values). */
        public double minFixedSettleMicros() {
            return 5 * settleTauMicros;
        }

        /** Shortest settle per code of rail change, µs: scale / slew (FORMAT.md, derived values). */
        public double minSettleMicrosPerCode() {
            return nominalMillivoltsPerCode / slewVoltsPerMs;
        }
    }

    /**
     * The default window table (FORMAT.md, windows).
     *
     * @param count     windows
     * @param lowVolts  low edge, V
     * @param highVolts high edge, V
     */
    public record Windows(int count, double lowVolts, double highVolts) {
    }

    /**
     * The preamplifier (FORMAT.md, preamp).
     *
     * @param ranges                  gain ranges
     * @param rangeRatio              full scale of range r+1 over range r (a power of two)
     * @param fullScaleRange0PicoAmps full scale of the most sensitive range, pA
     * @param outputFullScaleVolts    amplifier output at full scale, V
     * @param bandwidthHz             analog bandwidth, Hz
     * @param temperatureK            feedback-resistor temperature, K
     * @param noiseCountsPerQuadrant  the flight software's noise estimate, counts
     */
    public record Preamp(int ranges, int rangeRatio, double fullScaleRange0PicoAmps, double outputFullScaleVolts,
            double bandwidthHz, double temperatureK, int noiseCountsPerQuadrant) {
        /** Full scale of range {@code r}, amperes: FS₀ × ratio^r. */
        public double fullScaleAmps(int r) {
            return fullScaleRange0PicoAmps * 1e-12 * Math.pow(rangeRatio, r);
        }

        /** Feedback resistor of range {@code r}, ohms: output full scale / FS_r. */
        public double feedbackOhms(int r) {
            return outputFullScaleVolts / fullScaleAmps(r);
        }
    }

    /**
     * The ADC (FORMAT.md, adc).
     *
     * @param bits           width
     * @param pedestalCounts code of zero current
     */
    public record Adc(int bits, int pedestalCounts) {
        /** Top code, 2^bits − 1: a sample at it is saturated. */
        public int topCode() {
            return (1 << bits) - 1;
        }
    }

    /**
     * The default cadence (FORMAT.md, cadence).
     *
     * @param integrationPeriods  modulation periods per window
     * @param fixedSettleMicros   settle after every level change, µs
     * @param settleMicrosPerCode extra settle per DAC code of rail change, µs
     */
    public record Cadence(int integrationPeriods, double fixedSettleMicros, double settleMicrosPerCode) {
    }

    /** The flight software's integer description of this instrument (FORMAT.md, derived values). */
    public InstrumentDescription flight() {
        return FlightDescription.of(this);
    }

    /** The default sweep parameters: the flight defaults, this file's cadence and noise, then its overrides. */
    public SweepParameters defaultParameters() {
        return FlightDescription.parameters(this);
    }
}
