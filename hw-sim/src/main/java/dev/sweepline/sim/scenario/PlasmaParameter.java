package dev.sweepline.sim.scenario;

/**
 * The eleven quantities a scenario sets and its events change, with their names in the file and the
 * range a value must lie in. The order is the component order of {@link PlasmaConditions}.
 */
public enum PlasmaParameter {
    /** Proton density, cm^-3. */
    PROTON_DENSITY("protonDensity", "protons", "densityPerCc", Range.POSITIVE),
    /** Proton bulk speed, km/s. */
    PROTON_SPEED("protonSpeed", "protons", "speedKmPerS", Range.POSITIVE),
    /** Proton scalar temperature, K. */
    PROTON_TEMPERATURE("protonTemperature", "protons", "temperatureK", Range.POSITIVE),
    /** Proton T_perp / T_par. */
    TEMPERATURE_ANISOTROPY("temperatureAnisotropy", "protons", "anisotropy", Range.POSITIVE),
    /** He/H density ratio. */
    ALPHA_ABUNDANCE("alphaAbundance", "alphas", "abundance", Range.ABUNDANCE),
    /** Alpha minus proton speed, km/s. */
    ALPHA_DRIFT("alphaDrift", "alphas", "driftKmPerS", Range.ANY),
    /** T_alpha / T_p. */
    ALPHA_TEMPERATURE_RATIO("alphaTemperatureRatio", "alphas", "temperatureRatio", Range.POSITIVE),
    /** Flow tilt in the x-z plane, degrees. */
    FLOW_THETA_X("flowThetaX", "flow", "thetaXDeg", Range.ANGLE),
    /** Flow tilt in the y-z plane, degrees. */
    FLOW_THETA_Y("flowThetaY", "flow", "thetaYDeg", Range.ANGLE),
    /** Field tilt in the x-z plane, degrees. */
    FIELD_THETA_X("fieldThetaX", "field", "thetaXDeg", Range.ANGLE),
    /** Field tilt in the y-z plane, degrees. */
    FIELD_THETA_Y("fieldThetaY", "field", "thetaYDeg", Range.ANGLE);

    /**
     * Largest angle from the cup normal a scenario may ask for, degrees: beyond it a cup of this kind
     * sees almost nothing (its acceptance cone is of that order, common practice).
     */
    public static final double MAX_ANGLE_DEG = 60.0;

    /**
     * Largest He/H ratio a scenario may ask for (scenarios/FORMAT.md: 0 .. 0.5): our limit, set above real CME
     * material, which stays below ~0.3 [memory].
     */
    public static final double MAX_ABUNDANCE = 0.5;

    private final String eventKey;
    private final String section;
    private final String baseKey;
    private final Range range;

    PlasmaParameter(String eventKey, String section, String baseKey, Range range) {
        this.eventKey = eventKey;
        this.section = section;
        this.baseKey = baseKey;
        this.range = range;
    }

    /** Name of this parameter under an event's {@code set:} or {@code scale:}. */
    public String eventKey() {
        return eventKey;
    }

    /** Top-level section holding this parameter's starting value. */
    public String section() {
        return section;
    }

    /** Key of the starting value inside {@link #section()}. */
    public String baseKey() {
        return baseKey;
    }

    /** The parameter whose event key is {@code key}, or null. */
    static PlasmaParameter byEventKey(String key) {
        for (PlasmaParameter p : values()) {
            if (p.eventKey.equals(key)) {
                return p;
            }
        }
        return null;
    }

    /** Why {@code value} is not allowed for this parameter, or null when it is. */
    String violation(double value) {
        return switch (range) {
            case POSITIVE -> value > 0 ? null : "must be positive";
            case ABUNDANCE -> value >= 0 && value <= MAX_ABUNDANCE ? null : "must be within 0.." + ScenarioException.number(MAX_ABUNDANCE);
            case ANGLE -> Math.abs(value) <= MAX_ANGLE_DEG ? null : "must be within -" + ScenarioException.number(MAX_ANGLE_DEG)
                    + ".." + ScenarioException.number(MAX_ANGLE_DEG) + " deg";
            case ANY -> null;
        };
    }

    /** The kinds of allowed range. */
    private enum Range {
        POSITIVE, ABUNDANCE, ANGLE, ANY
    }
}
