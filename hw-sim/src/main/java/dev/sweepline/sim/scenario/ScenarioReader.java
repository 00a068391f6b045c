package dev.sweepline.sim.scenario;

import dev.sweepline.fsw.host.yaml.Section;
import dev.sweepline.fsw.host.yaml.YamlNode;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Turns the YAML tree of one scenario file into a checked {@link Scenario}. Every rule of FORMAT.md
 * is enforced here, and every failure names the file, the line and the dotted field.
 */
final class ScenarioReader {
    /** The value of the {@code format} key this reader understands. */
    static final String FORMAT = "sweepline-scenario/1";

    /** Largest distance from the Sun a scenario may give, AU (well past any orbit the probe flies). */
    static final double MAX_DISTANCE_AU = 10.0;

    /** Longest default duration, s (about 11.6 days; a longer run is a campaign, not a scenario). */
    static final double MAX_DURATION_SECONDS = 1e6;

    private static final Pattern NAME = Pattern.compile("[a-z0-9][a-z0-9-]*");
    private static final List<String> TOP_KEYS = List.of("format", "name", "description", "distanceAu", "durationS",
            "protons", "alphas", "flow", "field", "fluctuations", "events");
    private static final List<String> FLUCTUATION_KEYS = List.of("correlationS", "densityRms", "speedRms",
            "temperatureRms", "flowAngleRmsDeg");
    private static final List<String> EVENT_KEYS = List.of("label", "atS", "rampS", "jump", "set", "scale");
    private static final String DRIFT_ALONG = "driftAlong";

    private final String file;

    private ScenarioReader(String file) {
        this.file = file;
    }

    /** Reads and checks the scenario in {@code root}, which came from {@code file}. */
    static Scenario read(YamlNode.Mapping root, String file) {
        return new ScenarioReader(file).read(root);
    }

    private Scenario read(YamlNode.Mapping root) {
        Section top = Section.of(file, root, TOP_KEYS);
        String format = top.text("format");
        if (!FORMAT.equals(format)) {
            throw new ScenarioException(file, top.required("format").line(), "format",
                    "expected '" + FORMAT + "', got '" + format + "'");
        }
        String name = top.text("name");
        if (!NAME.matcher(name).matches()) {
            throw new ScenarioException(file, top.required("name").line(), "name",
                    "must be lower-case letters, digits and '-', got '" + name + "'");
        }
        String description = top.text("description").strip();
        double distanceAu = top.number("distanceAu");
        if (!(distanceAu > 0 && distanceAu <= MAX_DISTANCE_AU)) {
            throw top.invalid(top.required("distanceAu"), "must be within 0..10 AU, 0 excluded", distanceAu);
        }
        double durationS = top.number("durationS");
        if (!(durationS > 0 && durationS <= MAX_DURATION_SECONDS)) {
            throw top.invalid(top.required("durationS"), "must be positive and at most 1e6 s", durationS);
        }
        double[] start = new double[PlasmaParameter.values().length];
        AlphaDriftDirection drift = readStart(top, start);
        Fluctuations fluctuations = top.has("fluctuations") ? readFluctuations(top.required("fluctuations"))
                : Fluctuations.NONE;
        List<ScenarioEvent> events = top.has("events") ? readEvents(top.required("events"), durationS, start)
                : List.of();
        return new Scenario(name, description, distanceAu, durationS, PlasmaConditions.of(start), drift,
                fluctuations, events);
    }

    /** Fills {@code start} from the four plasma sections; returns the alpha drift direction. */
    private AlphaDriftDirection readStart(Section top, double[] start) {
        AlphaDriftDirection drift = AlphaDriftDirection.FIELD;
        for (String sectionName : List.of("protons", "alphas", "flow", "field")) {
            List<String> allowed = new ArrayList<>();
            for (PlasmaParameter p : PlasmaParameter.values()) {
                if (p.section().equals(sectionName)) {
                    allowed.add(p.baseKey());
                }
            }
            if (sectionName.equals("alphas")) {
                allowed.add(DRIFT_ALONG);
            }
            Section s = Section.of(file, top.required(sectionName), allowed);
            for (PlasmaParameter p : PlasmaParameter.values()) {
                if (!p.section().equals(sectionName)) {
                    continue;
                }
                boolean optional = p == PlasmaParameter.TEMPERATURE_ANISOTROPY;
                double v = optional ? s.number(p.baseKey(), 1.0) : s.number(p.baseKey());
                String violation = p.violation(v);
                if (violation != null) {
                    throw s.invalid(s.required(p.baseKey()), violation, v);
                }
                start[p.ordinal()] = v;
            }
            if (s.has(DRIFT_ALONG)) {
                drift = readDriftDirection(s);
            }
        }
        return drift;
    }

    private AlphaDriftDirection readDriftDirection(Section alphas) {
        String text = alphas.text(DRIFT_ALONG);
        for (AlphaDriftDirection d : AlphaDriftDirection.values()) {
            if (d.key().equals(text)) {
                return d;
            }
        }
        YamlNode node = alphas.required(DRIFT_ALONG);
        throw new ScenarioException(file, node.line(), node.path(), "expected 'field' or 'radial', got '" + text + "'");
    }

    private Fluctuations readFluctuations(YamlNode node) {
        Section s = Section.of(file, node, FLUCTUATION_KEYS);
        double tau = s.number("correlationS");
        if (!(tau >= Fluctuations.MIN_CORRELATION_SECONDS && tau <= MAX_DURATION_SECONDS)) {
            throw s.invalid(s.required("correlationS"), "must be within 0.1..1e6 s", tau);
        }
        double[] rel = new double[3];
        String[] relKeys = {"densityRms", "speedRms", "temperatureRms"};
        for (int i = 0; i < rel.length; i++) {
            rel[i] = s.number(relKeys[i], 0.0);
            if (!(rel[i] >= 0 && rel[i] <= Fluctuations.MAX_RELATIVE_RMS)) {
                throw s.invalid(s.required(relKeys[i]), "must be within 0..0.3 (a relative rms)", rel[i]);
            }
        }
        double angle = s.number("flowAngleRmsDeg", 0.0);
        if (!(angle >= 0 && angle <= Fluctuations.MAX_ANGLE_RMS_DEG)) {
            throw s.invalid(s.required("flowAngleRmsDeg"), "must be within 0..10 deg", angle);
        }
        return new Fluctuations(tau, rel[0], rel[1], rel[2], angle);
    }

    private List<ScenarioEvent> readEvents(YamlNode node, double durationS, double[] start) {
        if (!(node instanceof YamlNode.Sequence list)) {
            throw new ScenarioException(file, node.line(), node.path(), "expected a list of events, got " + node.kind());
        }
        double[] level = start.clone();
        double[] rampEnd = new double[level.length];
        int[] lastEvent = new int[level.length];
        List<ScenarioEvent> events = new ArrayList<>();
        double previousAt = 0;
        for (int i = 0; i < list.items().size(); i++) {
            Section s = Section.of(file, list.items().get(i), EVENT_KEYS);
            double at = s.number("atS");
            if (!(at >= 0 && at <= durationS)) {
                throw s.invalid(s.required("atS"), "must be within the duration 0.." + ScenarioException.number(durationS)
                        + " s", at);
            }
            if (at < previousAt) {
                throw s.invalid(s.required("atS"), "events must be in time order: earlier than events[" + (i - 1)
                        + "] at " + ScenarioException.number(previousAt) + " s", at);
            }
            previousAt = at;
            double ramp = s.number("rampS", 0.0);
            if (!(ramp >= 0)) {
                throw s.invalid(s.required("rampS"), "must not be negative", ramp);
            }
            if (at + ramp > durationS) {
                throw s.invalid(s.required("rampS"), "the ramp ends at " + ScenarioException.number(at + ramp)
                        + " s, after the duration " + ScenarioException.number(durationS) + " s", ramp);
            }
            String label = s.text("label", "event " + i);
            boolean jump = s.bool("jump", false);
            Map<PlasmaParameter, Double> set = readChanges(s, "set", false);
            Map<PlasmaParameter, Double> scale = readChanges(s, "scale", true);
            if (set.isEmpty() && scale.isEmpty()) {
                throw new ScenarioException(file, s.line(), s.path(), "an event must change something: give 'set' or 'scale'");
            }
            ScenarioEvent event = new ScenarioEvent(at, ramp, label, jump, set, scale);
            for (PlasmaParameter p : PlasmaParameter.values()) {
                if (!event.changes(p)) {
                    continue;
                }
                String group = set.containsKey(p) ? "set" : "scale";
                YamlNode key = Section.of(file, s.required(group), eventKeys()).required(p.eventKey());
                if (set.containsKey(p) && scale.containsKey(p)) {
                    throw new ScenarioException(file, key.line(), key.path(), "given in both 'set' and 'scale'");
                }
                if (at < rampEnd[p.ordinal()]) {
                    throw new ScenarioException(file, key.line(), key.path(), "starts at " + ScenarioException.number(at)
                            + " s, inside the ramp of events[" + lastEvent[p.ordinal()] + "], which ends at "
                            + ScenarioException.number(rampEnd[p.ordinal()]) + " s");
                }
                double target = event.target(p, level[p.ordinal()]);
                String violation = p.violation(target);
                if (violation != null) {
                    throw new ScenarioException(file, key.line(), key.path(), group.equals("set")
                            ? violation + ", got " + ScenarioException.number(target)
                            : "gives " + ScenarioException.number(target) + " after the event; " + violation);
                }
                level[p.ordinal()] = target;
                rampEnd[p.ordinal()] = at + ramp;
                lastEvent[p.ordinal()] = i;
            }
            events.add(event);
        }
        return events;
    }

    /** The changes under {@code group} ({@code set} or {@code scale}) of one event. */
    private Map<PlasmaParameter, Double> readChanges(Section event, String group, boolean factors) {
        Map<PlasmaParameter, Double> changes = new EnumMap<>(PlasmaParameter.class);
        if (!event.has(group)) {
            return changes;
        }
        Section s = Section.of(file, event.required(group), eventKeys());
        for (PlasmaParameter p : PlasmaParameter.values()) {
            if (!s.has(p.eventKey())) {
                continue;
            }
            double v = s.number(p.eventKey());
            if (factors && !(v > 0)) {
                throw s.invalid(s.required(p.eventKey()), "a factor must be positive", v);
            }
            changes.put(p, v);
        }
        return changes;
    }

    private static List<String> eventKeys() {
        List<String> keys = new ArrayList<>();
        for (PlasmaParameter p : PlasmaParameter.values()) {
            keys.add(p.eventKey());
        }
        return keys;
    }
}
