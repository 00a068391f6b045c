package dev.sweepline.fsw.link;

/**
 * The flight software's view of the electronics: one step out, one sample back. Implemented
 * in process by the simulator, over TCP, and over a serial port (hardware ICD).
 *
 * <p>Time is data: every call is given the executive's current time; no implementation reads a
 * clock on the flight software's behalf. Both calls return at once (no blocking) and allocate nothing.
 */
public interface InstrumentLink {
    /**
     * Hands one step to the electronics.
     *
     * @return false when the link cannot take it now (busy, or down); the caller tries again later
     */
    boolean send(StepCommand step, long nowMicros);

    /**
     * Copies the next reply that has arrived by {@code nowMicros} into {@code into}.
     *
     * @return true when a reply was copied
     */
    boolean poll(SampleReply into, long nowMicros);
}
