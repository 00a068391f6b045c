package dev.sweepline.fsw.science;

import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.telemetry.Apid;
import dev.sweepline.fsw.telemetry.TelemetryWriter;

/**
 * Sends completed sweeps as spectrum packets (telemetry ICD §3.3, §4): packs them in place into the
 * telemetry writer's buffer, on the APID of their mode, on the science virtual channel, stamped with
 * the sweep's start; counts the packet octets per mode (ICD §7). Allocation-free after construction.
 * Threading: one thread, the executive's.
 */
public final class SpectrumTelemetry {
    private final SpectrumPacker packer;
    private final TelemetryWriter telemetry;
    private final long[] octetsByMode = new long[SweepMode.values().length];

    /** Spectra packed by {@code packer} into {@code telemetry} (whose buffer must hold the packer's longest). */
    public SpectrumTelemetry(SpectrumPacker packer, TelemetryWriter telemetry) {
        if (telemetry.maxUserDataLength() < packer.maxUserDataLength()) {
            throw new IllegalArgumentException("telemetry buffer below the longest spectrum");
        }
        this.packer = packer;
        this.telemetry = telemetry;
    }

    /** The APID of spectra of {@code mode} (ICD §3.3); safe makes none. */
    public static int apid(SweepMode mode) {
        return switch (mode) {
            case SURVEY -> Apid.SURVEY_SPECTRUM;
            case FOCUS -> Apid.FOCUS_SPECTRUM;
            case SAFE -> throw new IllegalArgumentException("no spectrum is made in safe");
        };
    }

    /** Writes the spectrum packet of {@code s}; {@code flags} as {@link SpectrumPacker#write}. */
    public void write(Spectrum s, int integrationPeriods, int tableId, int flags, long nowMicros) {
        int n = packer.write(s, integrationPeriods, tableId, flags, telemetry.buffer(), telemetry.userDataOffset());
        int total = telemetry.send(apid(s.mode()), Apid.VC_SCIENCE, n, s.startMicros(), nowMicros);
        octetsByMode[s.mode().ordinal()] += total;
    }

    /** Spectrum packet octets generated in {@code mode}. */
    public long octets(SweepMode mode) {
        return octetsByMode[mode.ordinal()];
    }
}
