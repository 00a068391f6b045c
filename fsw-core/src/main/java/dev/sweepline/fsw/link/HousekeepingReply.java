package dev.sweepline.fsw.link;

/**
 * The electronics' housekeeping (hardware ICD §3.3): a mutable flyweight, allocated once.
 * Threading: owned by one thread.
 */
public final class HousekeepingReply {
    /** Sequence number of the request answered. */
    public int sequence;
    /** Frames the electronics received with a good CRC, length and type (wraps 2^32). */
    public long framesGood;
    /** Frames the electronics discarded: CRC, COBS, length or unknown type (wraps 2^32). */
    public long framesBad;
    /** Sequence number of the last step executed. */
    public int lastStepSequence;
    /** HV monitor, low level, DAC code units. */
    public int hvMonitorLowCode;
    /** HV monitor, high level, DAC code units. */
    public int hvMonitorHighCode;
    /** Electronics temperature, 0.01 degC, signed. */
    public int temperatureCentiCelsius;
    /** Status flags: {@link HousekeepingCodec#STATUS_HV_ON}, {@link HousekeepingCodec#STATUS_WATCHDOG_OFF}. */
    public int status;
    /** Link watchdog trips since power-up (ICD §4.1), saturating at 65535 on the wire. */
    public int watchdogTrips;
}
