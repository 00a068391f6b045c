package dev.sweepline.fsw.host.instrument;

import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.host.yaml.Section;
import dev.sweepline.fsw.host.yaml.YamlNode;
import dev.sweepline.fsw.host.yaml.YamlTreeReader;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.instrument.InstrumentLimits;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Reads an instrument description ({@code instruments/FORMAT.md}, format {@code sweepline-instrument/1})
 * into an {@link InstrumentSpec}, checking every key's range and the values against each other. A broken
 * file is a {@link FileFormatException} with the file, the line and the field.
 */
public final class InstrumentFileReader {
    /** The format this reader reads. */
    public static final String FORMAT = "sweepline-instrument/1";
    private static final Pattern NAME = Pattern.compile("[a-z0-9-]{1,32}");
    private static final List<String> ROOT = List.of("format", "name", "id", "description", "geometry", "modulator",
            "windows", "preamp", "adc", "cadence", "sweep");
    private static final List<String> GEOMETRY = List.of("effectiveAreaCm2", "apertureRadiusMm",
            "apertureToCollectorMm", "collectorRadiusMm", "collector", "grids", "gridTransparency");
    private static final List<String> MODULATOR = List.of("minVolts", "maxVolts", "dacBits", "nominalMillivoltsPerCode",
            "gainError", "offsetVolts", "slewVoltsPerMs", "settleTauMicros", "monitorNoiseVoltsRms",
            "settledToleranceCodes", "modulationPeriodMicros");
    private static final List<String> WINDOWS = List.of("count", "spacing", "lowVolts", "highVolts");
    private static final List<String> PREAMP = List.of("ranges", "rangeRatio", "fullScaleRange0PicoAmps",
            "outputFullScaleVolts", "bandwidthHz", "temperatureK", "noiseCountsPerQuadrant");
    private static final List<String> ADC = List.of("bits", "pedestalCounts");
    private static final List<String> CADENCE = List.of("integrationPeriods", "fixedSettleMicros", "settleMicrosPerCode");
    /** Largest full scale of any range: 1 mA (FORMAT.md, preamp.fullScaleRange0PicoAmps), in pA. */
    private static final double MAX_FULL_SCALE_PICOAMPS = 1e9;

    private InstrumentFileReader() {
    }

    /**
     * Parses and checks {@code text}; {@code file} names it in errors.
     *
     * @throws FileFormatException naming the file, line and field of the first problem
     */
    public static InstrumentSpec read(String text, String file) {
        YamlNode.Mapping root = YamlTreeReader.read(text, file);
        Section s = Section.of(file, root, ROOT);
        YamlNode format = s.required("format");
        if (!FORMAT.equals(s.text("format"))) {
            throw new FileFormatException(file, format.line(), "format", "expected " + FORMAT + ", got " + s.text("format"));
        }
        String name = s.text("name");
        if (!NAME.matcher(name).matches()) {
            throw new FileFormatException(file, s.required("name").line(), "name",
                    "lower-case letters, digits and '-', 1..32 of them, got '" + name + "'");
        }
        int id = whole(s, "id", 1, 0xFFFF);
        String description = s.text("description", "");
        InstrumentSpec.Modulator modulator = modulator(section(s, "modulator", MODULATOR));
        Section preampSection = section(s, "preamp", PREAMP);
        InstrumentSpec.Preamp preamp = preamp(preampSection, modulator);
        InstrumentSpec.Adc adc = adc(section(s, "adc", ADC));
        int unitBits = 2 + adc.bits() + Integer.numberOfTrailingZeros(preamp.rangeRatio()) * (preamp.ranges() - 1);
        if (unitBits > InstrumentDescription.MAX_CURRENT_UNIT_BITS) {
            throw preampSection.invalid(preampSection.required("ranges"), "with adc.bits " + adc.bits()
                    + " and rangeRatio " + preamp.rangeRatio() + " the top range's current needs " + unitBits
                    + " bits of range-0 units, more than the flight software's "
                    + InstrumentDescription.MAX_CURRENT_UNIT_BITS, preamp.ranges());
        }
        InstrumentSpec spec = new InstrumentSpec(file, name, id, description, geometry(section(s, "geometry", GEOMETRY)),
                modulator, windows(section(s, "windows", WINDOWS), modulator), preamp,
                adc, cadence(section(s, "cadence", CADENCE), modulator),
                s.has("sweep") ? sweep(s.required("sweep"), file) : Map.of());
        checkParameters(spec, s);
        return spec;
    }

    private static Section section(Section parent, String key, List<String> allowed) {
        return Section.of(parent.file(), parent.required(key), allowed);
    }

    private static InstrumentSpec.Geometry geometry(Section g) {
        boolean area = g.has("effectiveAreaCm2");
        if (area == g.has("apertureRadiusMm")) {
            throw new FileFormatException(g.file(), g.line(), g.path(),
                    "give exactly one of effectiveAreaCm2 and apertureRadiusMm");
        }
        int grids = whole(g, "grids", 0, 8);
        double transparency = number(g, "gridTransparency", 0, false, 1, true);
        if (!"quadrants".equals(g.text("collector"))) {
            throw new FileFormatException(g.file(), g.required("collector").line(), g.path() + ".collector",
                    "expected quadrants (the only layout of " + FORMAT + "), got " + g.text("collector"));
        }
        double areaCm2;
        double radiusMm;
        if (area) {
            areaCm2 = positive(g, "effectiveAreaCm2");
            // FORMAT.md derived values: R = sqrt(area / (pi × transparency^grids)), cm² to mm² × 100
            radiusMm = Math.sqrt(areaCm2 * 100 / (Math.PI * Math.pow(transparency, grids)));
        } else {
            radiusMm = positive(g, "apertureRadiusMm");
            areaCm2 = Math.PI * radiusMm * radiusMm / 100 * Math.pow(transparency, grids);
        }
        double collector = positive(g, "collectorRadiusMm");
        if (collector < radiusMm) {
            throw g.invalid(g.required("collectorRadiusMm"), "must be at least the aperture radius "
                    + FileFormatException.number(radiusMm) + " mm", collector);
        }
        return new InstrumentSpec.Geometry(areaCm2, radiusMm, positive(g, "apertureToCollectorMm"), collector, grids,
                transparency);
    }

    private static InstrumentSpec.Modulator modulator(Section m) {
        double minVolts = positive(m, "minVolts");
        double maxVolts = positive(m, "maxVolts");
        int dacBits = whole(m, "dacBits", 8, 16);
        int scale = whole(m, "nominalMillivoltsPerCode", 1, 10_000);
        if (maxVolts <= minVolts) {
            throw m.invalid(m.required("maxVolts"), "must be above minVolts " + FileFormatException.number(minVolts), maxVolts);
        }
        double reach = ((1 << dacBits) - 1) * (double) scale / 1000;
        if (maxVolts > reach) {
            throw m.invalid(m.required("maxVolts"), "must be within the DAC's reach (2^" + dacBits + " - 1) × "
                    + scale + " mV = " + FileFormatException.number(reach) + " V", maxVolts);
        }
        return new InstrumentSpec.Modulator(minVolts, maxVolts, dacBits, scale,
                number(m, "gainError", -0.05, true, 0.05, true), number(m, "offsetVolts", -50, true, 50, true),
                positive(m, "slewVoltsPerMs"), positive(m, "settleTauMicros"),
                number(m, "monitorNoiseVoltsRms", 0, true, Double.MAX_VALUE, true),
                whole(m, "settledToleranceCodes", 0, Integer.MAX_VALUE), whole(m, "modulationPeriodMicros", 10, 100_000));
    }

    private static InstrumentSpec.Windows windows(Section w, InstrumentSpec.Modulator m) {
        int count = whole(w, "count", 1, 256);
        if (!"log".equals(w.text("spacing"))) {
            throw new FileFormatException(w.file(), w.required("spacing").line(), w.path() + ".spacing",
                    "expected log, got " + w.text("spacing"));
        }
        double low = number(w, "lowVolts", m.minVolts(), true, m.maxVolts(), false);
        double high = number(w, "highVolts", low, false, m.maxVolts(), true);
        return new InstrumentSpec.Windows(count, low, high);
    }

    private static InstrumentSpec.Preamp preamp(Section p, InstrumentSpec.Modulator m) {
        int ranges = whole(p, "ranges", 1, 4);
        int ratio = whole(p, "rangeRatio", 2, 1024);
        if (Integer.bitCount(ratio) != 1) {
            throw p.invalid(p.required("rangeRatio"), "must be a power of two, 2..1024", ratio);
        }
        double fs0 = positive(p, "fullScaleRange0PicoAmps");
        if (fs0 * Math.pow(ratio, ranges - 1) > MAX_FULL_SCALE_PICOAMPS) {
            throw p.invalid(p.required("fullScaleRange0PicoAmps"), "makes the top range's full scale above 1 mA", fs0);
        }
        double bandwidth = positive(p, "bandwidthHz");
        double leastHz = 2 / (m.modulationPeriodMicros() * 1e-6);
        if (bandwidth <= leastHz) {
            throw p.invalid(p.required("bandwidthHz"), "must be above 2 / modulation period = "
                    + FileFormatException.number(leastHz) + " Hz", bandwidth);
        }
        return new InstrumentSpec.Preamp(ranges, ratio, fs0, positive(p, "outputFullScaleVolts"), bandwidth,
                number(p, "temperatureK", 0, true, Double.MAX_VALUE, true),
                whole(p, "noiseCountsPerQuadrant", 1, 4096));
    }

    private static InstrumentSpec.Adc adc(Section a) {
        int bits = whole(a, "bits", 8, 24);
        return new InstrumentSpec.Adc(bits, whole(a, "pedestalCounts", 0, (1 << bits) / 4));
    }

    private static InstrumentSpec.Cadence cadence(Section c, InstrumentSpec.Modulator m) {
        int periods = whole(c, "integrationPeriods", 1, SweepParameters.MAX_INTEGRATION_PERIODS);
        double fixed = number(c, "fixedSettleMicros", m.minFixedSettleMicros(), true,
                SweepParameters.MAX_FIXED_SETTLE_MICROS, true);
        double perCode = number(c, "settleMicrosPerCode", m.minSettleMicrosPerCode(), true,
                SweepParameters.MAX_SETTLE_MICROS_PER_CODE_Q8 / 256.0, true);
        return new InstrumentSpec.Cadence(periods, fixed, perCode);
    }

    private static Map<String, Double> sweep(YamlNode node, String file) {
        Section s = Section.of(file, node, List.copyOf(new java.util.TreeSet<>(FlightDescription.OVERRIDES.keySet())));
        Map<String, Double> values = new LinkedHashMap<>();
        for (String key : new java.util.TreeSet<>(FlightDescription.OVERRIDES.keySet())) {
            if (s.has(key)) {
                double v = s.number(key);
                if (FlightDescription.OVERRIDES.get(key).scale() == 1 && v != Math.rint(v)) {
                    throw s.invalid(s.required(key), "must be a whole number", v);
                }
                values.put(key, v);
            }
        }
        return values;
    }

    /** The default parameters must pass the flight software's own validation against the limits. */
    private static void checkParameters(InstrumentSpec spec, Section root) {
        SweepParameters p = spec.defaultParameters();
        InstrumentSpec.Modulator m = spec.modulator();
        InstrumentLimits limits = new InstrumentLimits(FlightDescription.millivolts(m.maxVolts()),
                m.nominalMillivoltsPerCode(), m.dacTopCode(), Integer.numberOfTrailingZeros(spec.preamp().rangeRatio()),
                0, 0);
        int status = limits.validateParameters(p);
        if (status != TableStatus.OK) {
            YamlNode where = root.has("sweep") ? root.required("sweep") : root.required("cadence");
            throw new FileFormatException(root.file(), where.line(), where.path(),
                    "the sweep parameters these values give are refused by the flight software: "
                    + TableStatus.name(status) + " (commands.md §3)");
        }
    }

    private static double positive(Section s, String key) {
        return number(s, key, 0, false, Double.MAX_VALUE, true);
    }

    /** A number in [lo, hi] (or the open side where not {@code loIn} / {@code hiIn}). */
    private static double number(Section s, String key, double lo, boolean loIn, double hi, boolean hiIn) {
        double v = s.number(key);
        boolean ok = (loIn ? v >= lo : v > lo) && (hiIn ? v <= hi : v < hi);
        if (!ok) {
            throw s.invalid(s.required(key), "must be " + interval(lo, loIn, hi, hiIn), v);
        }
        return v;
    }

    private static int whole(Section s, String key, int lo, int hi) {
        double v = s.number(key);
        if (v != Math.rint(v) || v < lo || v > hi) {
            throw s.invalid(s.required(key), "must be a whole number in " + lo + ".." + hi, v);
        }
        return (int) v;
    }

    private static String interval(double lo, boolean loIn, double hi, boolean hiIn) {
        String low = (loIn ? ">= " : "> ") + FileFormatException.number(lo);
        return hi == Double.MAX_VALUE ? low : low + " and " + (hiIn ? "<= " : "< ") + FileFormatException.number(hi);
    }
}
