package dev.sweepline.sim.scenario;

import dev.sweepline.sim.seed.SeedTree;
import java.util.ArrayList;
import java.util.List;

/**
 * A loaded, checked scenario: the plasma the probe starts in, the slow fluctuations over it and the
 * timed events that change it. Immutable; {@link #timeline(long)} gives the plasma as a function of
 * time for one run seed.
 */
public final class Scenario {
    private final String name;
    private final String description;
    private final double distanceAu;
    private final double durationSeconds;
    private final PlasmaConditions start;
    private final AlphaDriftDirection alphaDriftDirection;
    private final Fluctuations fluctuations;
    private final List<ScenarioEvent> events;
    private final List<Jump> jumps;
    private final ParameterTrack[] tracks;

    /** A change the loader marked as a jump: the bench times reacquisition after it. */
    public record Jump(double atSeconds, double rampSeconds, String label) {
    }

    Scenario(String name, String description, double distanceAu, double durationSeconds, PlasmaConditions start,
            AlphaDriftDirection alphaDriftDirection, Fluctuations fluctuations, List<ScenarioEvent> events) {
        this.name = name;
        this.description = description;
        this.distanceAu = distanceAu;
        this.durationSeconds = durationSeconds;
        this.start = start;
        this.alphaDriftDirection = alphaDriftDirection;
        this.fluctuations = fluctuations;
        this.events = List.copyOf(events);
        List<Jump> j = new ArrayList<>();
        for (ScenarioEvent e : events) {
            if (e.jump()) {
                j.add(new Jump(e.atSeconds(), e.rampSeconds(), e.label()));
            }
        }
        this.jumps = List.copyOf(j);
        PlasmaParameter[] params = PlasmaParameter.values();
        this.tracks = new ParameterTrack[params.length];
        for (PlasmaParameter p : params) {
            tracks[p.ordinal()] = ParameterTrack.of(p, start.get(p), this.events);
        }
    }

    /**
     * This scenario from another starting plasma, under another name and duration: the events,
     * fluctuations and drift direction stay (campaign draws, orbit-plan scaling). Events given as
     * factors apply to the new start; events with absolute values keep them.
     */
    public Scenario withStart(String newName, PlasmaConditions newStart, double newDistanceAu, double newDurationSeconds) {
        List<ScenarioEvent> kept = new ArrayList<>();
        for (ScenarioEvent e : events) {
            if (e.endSeconds() <= newDurationSeconds) {
                kept.add(e);
            }
        }
        return new Scenario(newName, description, newDistanceAu, newDurationSeconds, newStart, alphaDriftDirection,
                fluctuations, kept);
    }

    /**
     * This scenario with every event moved by {@code seconds} (campaign draws of when the shocks come),
     * clipped so that no event starts before 0 or ends after the duration.
     */
    public Scenario withEventsShifted(double seconds) {
        if (events.isEmpty()) {
            return this;
        }
        double first = events.get(0).atSeconds();
        double last = 0;
        for (ScenarioEvent e : events) {
            last = Math.max(last, e.endSeconds());
        }
        double shift = Math.max(-first, Math.min(durationSeconds - last, seconds));
        List<ScenarioEvent> moved = new ArrayList<>();
        for (ScenarioEvent e : events) {
            moved.add(new ScenarioEvent(e.atSeconds() + shift, e.rampSeconds(), e.label(), e.jump(), e.set(), e.scale()));
        }
        return new Scenario(name, description, distanceAu, durationSeconds, start, alphaDriftDirection, fluctuations,
                moved);
    }

    /**
     * The calm variant of this scenario: the same starting plasma held still (no fluctuations, no
     * events), named {@code NAME-calm}: the steady wind in which the ground's scatter is the
     * measurement's alone.
     */
    public Scenario calm() {
        return new Scenario(name + "-calm", description, distanceAu, durationSeconds, start, alphaDriftDirection,
                Fluctuations.NONE, List.of());
    }

    /** Short name, e.g. {@code quiet-perihelion}. */
    public String name() {
        return name;
    }

    /** One or a few sentences on what the scenario exercises. */
    public String description() {
        return description;
    }

    /** Distance of the probe from the Sun, AU. */
    public double distanceAu() {
        return distanceAu;
    }

    /**
     * Default run length, s. The bench may run shorter or longer: past the end the events stay as they
     * ended and the fluctuations go on.
     */
    public double durationSeconds() {
        return durationSeconds;
    }

    /** The events marked as jumps, in time order. */
    public List<Jump> jumps() {
        return jumps;
    }

    /** Every event, in time order. */
    public List<ScenarioEvent> events() {
        return events;
    }

    /** The plasma at time 0 before any fluctuation. */
    public PlasmaConditions start() {
        return start;
    }

    /** Direction of the alpha drift given by {@link PlasmaConditions#alphaDriftKmPerS()}. */
    public AlphaDriftDirection alphaDriftDirection() {
        return alphaDriftDirection;
    }

    /** The seeded fluctuations ({@link Fluctuations#NONE} when the file has none). */
    public Fluctuations fluctuations() {
        return fluctuations;
    }

    /** The plasma of a run with {@code seed}; each call gives a new, independent timeline object. */
    public ScenarioTimeline timeline(long seed) {
        return new ScenarioTimeline(tracks, fluctuations, SeedTree.of(seed));
    }

    @Override
    public String toString() {
        return "Scenario[" + name + ", " + distanceAu + " AU, " + durationSeconds + " s, " + events.size() + " events]";
    }
}
