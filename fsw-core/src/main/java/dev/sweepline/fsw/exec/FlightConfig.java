package dev.sweepline.fsw.exec;

import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.fault.FaultSettings;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * Start-up configuration of the flight software: everything its buffers are sized from. Made for one
 * instrument ({@link #of(InstrumentDescription)}), whose description gives the default table and
 * parameters and every limit; mutable while it is being set up, read once by {@link FlightSoftware}'s
 * constructor.
 */
public final class FlightConfig {
    /** The instrument flown: sizes, limits, defaults (the description file, read at start-up by the host). */
    public final InstrumentDescription instrument;
    /** The window table in force at start (default: the description's). */
    public WindowTable table;
    /** The sweep parameters in force at start (default: the description's). */
    public SweepParameters parameters;
    /** Transfer frame length, octets. */
    public int frameLength = TelemetryWriter.DEFAULT_FRAME_LENGTH;
    /** Longest wait of a partly filled frame. */
    public long flushIntervalMicros = TelemetryWriter.DEFAULT_FLUSH_INTERVAL_MICROS;
    /** Housekeeping period (telemetry ICD §3.3). */
    public long housekeepingPeriodMicros = 16_000_000L;
    /** CCSDS 121 coding of spectra (telemetry ICD §4, compression 0x01); false sends raw samples. */
    public boolean compressSpectra = true;
    /**
     * TAI seconds since 1958-01-01 at tick zero: 2030-03-01T00:00:00 TAI for the demo runs (an
     * invented epoch: 72 years incl. 18 leap days to 2030-01-01, plus 59 days).
     */
    public long coarseTimeAtTickZero = ((72L * 365 + 18) + 59) * 86_400;
    /** Reply time-out margin beyond the step duration (hardware ICD §4: 20 ms). */
    public int timeoutMarginMicros = Executive.DEFAULT_TIMEOUT_MARGIN_MICROS;
    /** Re-sends of a step before a link time-out (hardware ICD §4: 2). */
    public int maxRetries = Executive.DEFAULT_MAX_RETRIES;
    /** Fault-protection settings in force at start (replaced by a table restored from non-volatile memory). */
    public FaultSettings faults = FaultSettings.defaults();
    /**
     * Shared key of the command MAC (commands.md §1.2). The default is the demo key: the 32 octets
     * 0x00, 0x01, ... 0x1F, for bench runs only; a real configuration supplies its own.
     */
    public byte[] commandKey = demoKey();
    /** Check command MACs and sequence numbers (default on; the bench may switch it off for quick runs). */
    public boolean authenticateCommands = true;
    /** How long an HV arm stays valid for an HV enable (commands.md §2.3): 10 s (common practice: seconds). */
    public long hvArmTimeoutMicros = 10_000_000L;
    /**
     * Where the committed table image and the anti-replay record are kept across restarts; restored
     * from at start-up. {@link NonVolatileStore#NONE} keeps nothing: anti-replay then holds within one run.
     */
    public NonVolatileStore nonVolatileStore = NonVolatileStore.NONE;
    /**
     * This boot's authentication-recovery challenge, 32 bits (commands.md §1.4). The host supplies it
     * from a random source at each start (sweepline-fsw.jar: SecureRandom; the bench: drawn from the
     * run seed, so runs stay reproducible).
     */
    public long bootChallenge;

    private FlightConfig(InstrumentDescription instrument) {
        this.instrument = instrument;
        this.table = instrument.defaultTable();
        this.parameters = instrument.defaultParameters();
    }

    /** The configuration for {@code instrument}, with its default table and parameters and every other default. */
    public static FlightConfig of(InstrumentDescription instrument) {
        if (instrument == null) {
            throw new IllegalArgumentException("no instrument description");
        }
        return new FlightConfig(instrument);
    }

    /**
     * A copy that no change to this configuration, or to the copy, reaches through the other: the
     * mutable members (sweep parameters, fault settings, command key) are copied; the immutable ones
     * (description, window table) and the non-volatile store (a service both share) are shared. A new
     * field must be added here (hw-sim's FlightConfigCopyTest checks every public field is carried).
     */
    public FlightConfig copy() {
        FlightConfig c = new FlightConfig(instrument);
        c.table = table;
        c.parameters = parameters == null ? null : parameters.copy();
        c.frameLength = frameLength;
        c.flushIntervalMicros = flushIntervalMicros;
        c.housekeepingPeriodMicros = housekeepingPeriodMicros;
        c.compressSpectra = compressSpectra;
        c.coarseTimeAtTickZero = coarseTimeAtTickZero;
        c.timeoutMarginMicros = timeoutMarginMicros;
        c.maxRetries = maxRetries;
        c.faults = new FaultSettings();
        c.faults.copyFrom(faults);
        c.commandKey = commandKey == null ? null : commandKey.clone();
        c.authenticateCommands = authenticateCommands;
        c.hvArmTimeoutMicros = hvArmTimeoutMicros;
        c.nonVolatileStore = nonVolatileStore;
        c.bootChallenge = bootChallenge;
        c.hvPermitted = hvPermitted;
        c.hvEnabledAtStart = hvEnabledAtStart;
        return c;
    }

    /**
     * The parameter table this configuration starts with: its table and parameters, held to the
     * instrument's limits, then its housekeeping period and its fault settings (the build's own, not held
     * to a table's safe ranges, commands.md §6.1).
     *
     * @throws IllegalArgumentException for a table or parameters outside the limits (a configuration error)
     */
    public ParameterTable startUpTable() {
        ParameterTable startUp = ParameterTable.of(table, parameters);
        int status = TableImage.validate(startUp, instrument.limits());
        if (status != 0) {
            throw new IllegalArgumentException("start-up table refused against the instrument's limits: code "
                    + status + " (" + TableStatus.name(status) + ")");
        }
        startUp.housekeepingSeconds = (int) Math.max(ParameterTable.MIN_HOUSEKEEPING_SECONDS,
                Math.min(ParameterTable.MAX_HOUSEKEEPING_SECONDS, housekeepingPeriodMicros / 1_000_000L));
        startUp.faults.copyFrom(faults);
        return startUp;
    }

    /** The demo command key: octets 0..31 (commands.md §1.2). */
    public static byte[] demoKey() {
        byte[] k = new byte[32];
        for (int i = 0; i < k.length; i++) {
            k[i] = (byte) i;
        }
        return k;
    }
    /**
     * Whether the flight software may ask for high voltage: the host's arm-then-fire permission on real
     * electronics (false until fired); true for the simulator.
     */
    public boolean hvPermitted = true;
    /**
     * Whether the core HV interlock (commands.md §2.3) starts ENABLED. Default false: the HV is
     * inhibited at power-up and needs HV_ARM then HV_ENABLE (or, on a PC host, the operator's
     * arm-then-fire). Only the simulator bench sets it, explicitly; {@code sweepline-fsw.jar run} never does.
     */
    public boolean hvEnabledAtStart = false;
}
