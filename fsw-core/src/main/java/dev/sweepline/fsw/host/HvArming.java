package dev.sweepline.fsw.host;

/**
 * The host's high-voltage permission: arm, then fire within a time-out (hardware ICD, high-voltage
 * note). Until fired, every step goes out with the HV disabled. A wrong confirmation word, a late
 * one, or {@link #disarm()} return to {@link State#OFF}. This is a software permission only: it does
 * not replace the bench's hardware interlock or the laboratory's procedures.
 *
 * <p>Threading: one thread arms and confirms; {@link #disarm()} may come from any thread (the
 * shutdown hook's {@link HvShutdown}), so the state is volatile and a step sent after a disarm goes
 * out with the HV cleared.
 */
public final class HvArming {
    /** The word that fires an armed HV. */
    public static final String CONFIRM_WORD = "FIRE";
    /** Default time from arm to fire, microseconds (30 s: long enough to read the prompt; design value). */
    public static final long DEFAULT_TIMEOUT_MICROS = 30_000_000L;

    /** Permission states. */
    public enum State {
        /** HV off: steps go out with the HV disabled. */
        OFF,
        /** Armed: waiting for the confirmation. */
        ARMED,
        /** Fired: steps go out with the HV as the flight software commands it. */
        ENABLED
    }

    private final long timeoutMicros;
    private volatile State state = State.OFF;
    private long armedMicros;

    /** Arming with {@code timeoutMicros} between arm and fire. */
    public HvArming(long timeoutMicros) {
        this.timeoutMicros = timeoutMicros;
    }

    /** Arms at {@code nowMicros} (from OFF; a second arm restarts the time-out). */
    public void arm(long nowMicros) {
        switch (state) {
            case OFF:
            case ARMED:
                state = State.ARMED;
                armedMicros = nowMicros;
                break;
            case ENABLED:
                break;
            default:
                throw new IllegalStateException("unknown HV state " + state);
        }
    }

    /**
     * Confirms with {@code word} at {@code nowMicros}: fires when armed, in time and the word is
     * {@link #CONFIRM_WORD}; anything else disarms.
     *
     * @return the new state
     */
    public State confirm(String word, long nowMicros) {
        switch (state) {
            case ARMED:
                boolean inTime = nowMicros - armedMicros <= timeoutMicros;
                state = inTime && CONFIRM_WORD.equals(word) ? State.ENABLED : State.OFF;
                break;
            case OFF:
            case ENABLED:
                break;
            default:
                throw new IllegalStateException("unknown HV state " + state);
        }
        return state;
    }

    /** Back to OFF. */
    public void disarm() {
        state = State.OFF;
    }

    /** The current state. */
    public State state() {
        return state;
    }

    /** True when steps may carry HV enabled. */
    public boolean hvAllowed() {
        return state == State.ENABLED;
    }
}
