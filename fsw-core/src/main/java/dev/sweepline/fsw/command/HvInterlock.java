package dev.sweepline.fsw.command;

/**
 * The two-step HV interlock (commands.md §2.3): HV arm opens a window of the arm time-out in which
 * HV enable is accepted; enable without a live arm is refused. SAFE (commanded, or a fault
 * response) switches the interlock off, so leaving SAFE needs arm, enable and a mode command.
 * OFF at power-up: a hazardous function starts inhibited (common practice for spacecraft
 * high-voltage and actuator functions); only an explicit start-up configuration (the simulator bench)
 * may start it enabled. Time is data; one thread.
 */
public final class HvInterlock {
    private final long armTimeoutMicros;
    private HvState state;
    private long armDeadlineMicros;

    /** An interlock whose arm lasts {@code armTimeoutMicros}, OFF at start. */
    public HvInterlock(long armTimeoutMicros) {
        this(armTimeoutMicros, false);
    }

    /**
     * An interlock whose arm lasts {@code armTimeoutMicros}; {@code enabledAtStart} is for the
     * simulator bench only, by explicit configuration (FlightConfig.hvEnabledAtStart).
     */
    public HvInterlock(long armTimeoutMicros, boolean enabledAtStart) {
        this.armTimeoutMicros = armTimeoutMicros;
        this.state = enabledAtStart ? HvState.ENABLED : HvState.OFF;
    }

    /** The state at {@code nowMicros} (an arm past its time-out reads OFF). */
    public HvState state(long nowMicros) {
        switch (state) {
            case OFF:
            case ENABLED:
                return state;
            case ARMED:
                return nowMicros - armDeadlineMicros > 0 ? HvState.OFF : HvState.ARMED;
            default:
                throw new IllegalStateException("unknown HV state " + state);
        }
    }

    /** True when the HV may be on. */
    public boolean enabled() {
        return state == HvState.ENABLED;
    }

    /** True when an enable at {@code nowMicros} would be accepted. */
    public boolean canEnable(long nowMicros) {
        return state(nowMicros) != HvState.OFF;
    }

    /** Arms (no change when already enabled). */
    public void arm(long nowMicros) {
        if (state != HvState.ENABLED) {
            state = HvState.ARMED;
            armDeadlineMicros = nowMicros + armTimeoutMicros;
        }
    }

    /** Enables; call only when {@link #canEnable} said yes. */
    public void enable(long nowMicros) {
        if (!canEnable(nowMicros)) {
            throw new IllegalStateException("HV enable without arm"); // the processor checks first
        }
        state = HvState.ENABLED;
    }

    /** Switches off (SAFE). */
    public void disable() {
        state = HvState.OFF;
    }

    /** Housekeeping code of the state: 0 off, 1 armed, 2 enabled. */
    public int code(long nowMicros) {
        return state(nowMicros).ordinal();
    }
}
