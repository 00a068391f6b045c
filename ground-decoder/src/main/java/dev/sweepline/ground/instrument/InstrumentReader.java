package dev.sweepline.ground.instrument;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Reads an instrument description, format {@code sweepline-instrument/1}, from the text of FORMAT.md:
 * every key of every section is checked (kind, range, and the values that must agree with each
 * other), unknown keys are refused, and the derived values are computed as FORMAT.md gives them. A
 * broken file fails with an {@link InstrumentFileException} naming file, line and field. Stateless.
 */
public final class InstrumentReader {
    /** The format this reader reads. */
    public static final String FORMAT = "sweepline-instrument/1";
    /** Names: lower-case letters, digits and '-', 1..32 (FORMAT.md). */
    static final Pattern NAME = Pattern.compile("[a-z0-9-]{1,32}");
    /** Largest full scale of any range, A: 1 mA (FORMAT.md, preamp). */
    static final double MAX_FULL_SCALE_AMPS = 1e-3;
    /** Amperes per picoampere. */
    static final double A_PER_PA = 1e-12;

    /** The keys of each mapping (FORMAT.md, "Keys"). */
    static final List<String> TOP = List.of("format", "name", "id", "description", "geometry", "modulator", "windows",
            "preamp", "adc", "cadence", "sweep");
    static final List<String> GEOMETRY = List.of("effectiveAreaCm2", "apertureRadiusMm", "apertureToCollectorMm",
            "collectorRadiusMm", "collector", "grids", "gridTransparency");
    static final List<String> MODULATOR = List.of("minVolts", "maxVolts", "dacBits", "nominalMillivoltsPerCode",
            "gainError", "offsetVolts", "slewVoltsPerMs", "settleTauMicros", "monitorNoiseVoltsRms",
            "settledToleranceCodes", "modulationPeriodMicros");
    static final List<String> WINDOWS = List.of("count", "spacing", "lowVolts", "highVolts");
    static final List<String> PREAMP = List.of("ranges", "rangeRatio", "fullScaleRange0PicoAmps",
            "outputFullScaleVolts", "bandwidthHz", "temperatureK", "noiseCountsPerQuadrant");
    static final List<String> ADC = List.of("bits", "pedestalCounts");
    static final List<String> CADENCE = List.of("integrationPeriods", "fixedSettleMicros", "settleMicrosPerCode");

    private InstrumentReader() {
    }

    /** Reads the description in {@code file}; errors name the file as given. */
    public static GroundInstrument readFile(Path file) {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(file.toString(), file.toString(), in);
        } catch (IOException e) {
            throw new InstrumentFileException(file.toString(), 0, "", "cannot read: " + e.getMessage(), e);
        }
    }

    /**
     * Reads one description.
     *
     * @param file   the name used in errors
     * @param source recorded as the instrument's source
     */
    public static GroundInstrument read(String file, String source, Reader in) {
        DescriptionSection top = DescriptionSection.top(file, LocatedYaml.read(file, in), TOP);
        top.choice("format", List.of(FORMAT));
        String name = top.text("name");
        if (!NAME.matcher(name).matches()) {
            throw top.fail("name", "must be lower-case letters, digits and '-', 1..32 of them, got '" + name + "'");
        }
        int id = top.whole("id", 1, 65535);
        String description = top.text("description");
        Geometry geometry = geometry(top.section("geometry", GEOMETRY));
        DescriptionSection m = top.section("modulator", MODULATOR);
        Modulator modulator = modulator(m);
        double slewVoltsPerMs = m.number("slewVoltsPerMs", NumberRange.above(0));
        double settleTauMicros = m.number("settleTauMicros", NumberRange.above(0));
        m.number("monitorNoiseVoltsRms", NumberRange.atLeast(0));
        m.whole("settledToleranceCodes", 0, Integer.MAX_VALUE);
        DefaultWindowTable windows = windows(top.section("windows", WINDOWS), modulator);
        GainRanges gains = preamp(top.section("preamp", PREAMP), modulator);
        AdcFormat adc = adc(top.section("adc", ADC));
        cadence(top.section("cadence", CADENCE), modulator, slewVoltsPerMs, settleTauMicros);
        if (top.has("sweep")) {
            SweepDefaults.check(top.section("sweep", SweepDefaults.KEYS), windows.windows(), modulator, slewVoltsPerMs,
                    settleTauMicros);
        }
        return new GroundInstrument(id, name, description, source, geometry, modulator, windows, gains, adc);
    }

    private static Geometry geometry(DescriptionSection g) {
        boolean area = g.has("effectiveAreaCm2");
        boolean radius = g.has("apertureRadiusMm");
        if (area == radius) {
            throw g.fail(area ? "apertureRadiusMm" : "effectiveAreaCm2",
                    "give effectiveAreaCm2 or apertureRadiusMm, exactly one of them");
        }
        double size = area ? g.number("effectiveAreaCm2", NumberRange.above(0))
                : g.number("apertureRadiusMm", NumberRange.above(0));
        double distanceMm = g.number("apertureToCollectorMm", NumberRange.above(0));
        double collectorMm = g.number("collectorRadiusMm", NumberRange.above(0));
        g.choice("collector", List.of("quadrants"));
        int grids = g.whole("grids", 0, 8);
        double transparency = g.number("gridTransparency", new NumberRange(0, true, 1, false));
        Geometry geo = area ? Geometry.fromArea(size, distanceMm, collectorMm, grids, transparency)
                : Geometry.fromRadius(size, distanceMm, collectorMm, grids, transparency);
        if (geo.collectorRadiusM() < geo.apertureRadiusM()) {
            throw g.fail("collectorRadiusMm", "must be >= the aperture radius R = " + String.format("%.4f",
                    geo.apertureRadiusM() / Geometry.M_PER_MM) + " mm, got " + NumberRange.number(collectorMm));
        }
        return geo;
    }

    private static Modulator modulator(DescriptionSection m) {
        double min = m.number("minVolts", NumberRange.above(0));
        double max = m.number("maxVolts", NumberRange.above(min));
        int dacBits = m.whole("dacBits", 8, 16);
        int scale = m.whole("nominalMillivoltsPerCode", 1, 10000);
        double gainError = m.number("gainError", NumberRange.closed(-0.05, 0.05));
        double offset = m.number("offsetVolts", NumberRange.closed(-50, 50));
        int period = m.whole("modulationPeriodMicros", 10, 100000);
        Modulator mod = new Modulator(min, max, dacBits, new HvCalibration(scale, gainError, offset), period);
        if (max > mod.reachVolts()) {
            throw m.fail("maxVolts", "above the DAC's reach: (2^" + dacBits + " - 1) x " + scale + " mV = "
                    + NumberRange.number(mod.reachVolts()) + " V, got " + NumberRange.number(max));
        }
        return mod;
    }

    private static DefaultWindowTable windows(DescriptionSection w, Modulator mod) {
        int count = w.whole("count", 1, 256);
        w.choice("spacing", List.of("log"));
        double low = w.number("lowVolts", NumberRange.closed(mod.minVolts(), mod.maxVolts()));
        double high = w.number("highVolts", NumberRange.closed(mod.minVolts(), mod.maxVolts()));
        if (!(high > low)) {
            throw w.fail("highVolts", "must be above lowVolts " + NumberRange.number(low) + ", got "
                    + NumberRange.number(high));
        }
        DefaultWindowTable t = new DefaultWindowTable(count, low, high, mod.calibration());
        for (int k = 0; k < count; k++) {
            if (t.edgeCode(k + 1) <= t.edgeCode(k)) {
                throw w.fail("count", "window " + k + " rounds to no width: edges " + k + " and " + (k + 1)
                        + " are both DAC code " + t.edgeCode(k)
                        + " (a table must rise, commands.md §4.2 NOT_MONOTONIC)");
            }
        }
        return t;
    }

    private static GainRanges preamp(DescriptionSection p, Modulator mod) {
        int ranges = p.whole("ranges", 1, 4);
        int ratio = p.whole("rangeRatio", 2, 1024);
        if (Integer.bitCount(ratio) != 1) {
            throw p.fail("rangeRatio", "must be a power of two 2..1024, got " + ratio);
        }
        double fs0 = p.number("fullScaleRange0PicoAmps", NumberRange.above(0)) * A_PER_PA;
        double outVolts = p.number("outputFullScaleVolts", NumberRange.above(0));
        double minBandwidth = 2 / mod.modulationPeriodSeconds();
        double bandwidth = p.number("bandwidthHz", NumberRange.above(minBandwidth));
        double temperature = p.number("temperatureK", NumberRange.atLeast(0));
        int noise = p.whole("noiseCountsPerQuadrant", 1, Integer.MAX_VALUE);
        GainRanges g = new GainRanges(ranges, ratio, fs0, outVolts, bandwidth, temperature, noise);
        if (g.fullScaleAmps(ranges - 1) > MAX_FULL_SCALE_AMPS) {
            throw p.fail("fullScaleRange0PicoAmps", "range " + (ranges - 1) + " would have a full scale of "
                    + g.fullScaleAmps(ranges - 1) + " A, above 1 mA");
        }
        return g;
    }

    private static AdcFormat adc(DescriptionSection a) {
        int bits = a.whole("bits", 8, 24);
        int pedestal = a.whole("pedestalCounts", 0, (1L << bits) / 4);
        return new AdcFormat(bits, pedestal);
    }

    private static void cadence(DescriptionSection c, Modulator mod, double slewVoltsPerMs, double tauMicros) {
        c.whole("integrationPeriods", 1, 1000);
        c.number("fixedSettleMicros", SweepDefaults.fixedSettle(tauMicros));
        c.number("settleMicrosPerCode", SweepDefaults.settlePerCode(mod, slewVoltsPerMs));
    }
}
