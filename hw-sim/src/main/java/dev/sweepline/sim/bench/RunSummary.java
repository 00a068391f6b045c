package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The figures of one closed-loop run, from the recorder's tally of its sweeps ({@link SweepTally}).
 *
 * @param instrument          the instrument flown (its description's name)
 * @param scenario            scenario name
 * @param seed                run seed
 * @param simulatedSeconds    simulated duration
 * @param wallSeconds         wall time the loop took
 * @param steps               instrument steps executed
 * @param sweepsByMode        completed sweeps per mode
 * @param spectraPerSecond    completed sweeps per simulated second, per mode
 * @param lockFraction        focus sweeps whose band held the true proton peak, over all focus sweeps (NaN if none)
 * @param alphaLocks          focus sweeps centred on the true alpha peak
 * @param reacquisitions      one per scenario jump
 * @param integratingFraction integration time over simulated time
 * @param saturatedSamples    samples flagged saturated
 * @param unsettledSamples    samples flagged HV-unsettled
 * @param modeChanges         mode changes by reason
 * @param telemetry           bits per second generated, against the allocation
 * @param informationEfficiency D-efficiency of the run's measurements of the protons' (n, U, w) against the
 *                            D-optimal design over the same windows and integration time (NaN if undefined)
 * @param decisionHash        the flight software's running hash of its decisions (hex)
 * @param tracking            band centre and found peak against the true proton peak, windows
 * @param strictReacquisitions one per scenario jump, until the band is centred within
 *                            {@link Reacquisition#STRICT_CENTRE_WINDOWS} of the new peak
 */
public record RunSummary(String instrument, String scenario, long seed, double simulatedSeconds, double wallSeconds, long steps,
        Map<SweepMode, Integer> sweepsByMode, Map<SweepMode, Double> spectraPerSecond, double lockFraction,
        int alphaLocks, List<Reacquisition> reacquisitions, double integratingFraction, long saturatedSamples,
        long unsettledSamples, Map<String, Integer> modeChanges, TelemetryFigures telemetry, double informationEfficiency,
        String decisionHash, TrackingError tracking, List<Reacquisition> strictReacquisitions) {

    /** Largest sweep count to reacquire over all jumps (0 when the scenario has none; -1 if one never was). */
    public int reacquireSweepsMax() {
        return sweepsMax(reacquisitions);
    }

    /** As {@link #reacquireSweepsMax()}, for the strict reacquisitions. */
    public int strictReacquireSweepsMax() {
        return sweepsMax(strictReacquisitions);
    }

    /** As {@link #reacquireSecondsMax()}, for the strict reacquisitions. */
    public double strictReacquireSecondsMax() {
        return secondsMax(strictReacquisitions);
    }

    private static int sweepsMax(List<Reacquisition> reacquisitions) {
        int max = 0;
        for (Reacquisition r : reacquisitions) {
            if (!r.reacquired()) {
                return -1;
            }
            max = Math.max(max, r.sweeps());
        }
        return max;
    }

    /** Longest time to reacquire over all jumps, seconds (0 without jumps; NaN if one never was). */
    public double reacquireSecondsMax() {
        return secondsMax(reacquisitions);
    }

    private static double secondsMax(List<Reacquisition> reacquisitions) {
        double max = 0;
        for (Reacquisition r : reacquisitions) {
            if (!r.reacquired()) {
                return Double.NaN;
            }
            max = Math.max(max, r.seconds());
        }
        return max;
    }

    /** Simulated seconds per wall second. */
    public double realTimeFactor() {
        return wallSeconds > 0 ? simulatedSeconds / wallSeconds : Double.POSITIVE_INFINITY;
    }

    /** The figures of a finished run. */
    static RunSummary of(BenchConfig config, BenchRecorder recorder, TelemetryFigures telemetry,
            double informationEfficiency, double wallSeconds, String decisionHash) {
        SweepTally tally = recorder.tally();
        Map<SweepMode, Integer> byMode = tally.sweepsByMode();
        Map<SweepMode, Double> perSecond = new EnumMap<>(SweepMode.class);
        double seconds = config.durationSeconds();
        for (SweepMode m : SweepMode.values()) {
            perSecond.put(m, byMode.get(m) / seconds);
        }
        int focus = tally.focusSweeps();
        return new RunSummary(config.instrument().name(), config.scenario().name(), config.seed(), seconds, wallSeconds, recorder.steps(),
                byMode, perSecond, focus == 0 ? Double.NaN : (double) tally.lockedSweeps() / focus, tally.alphaLocks(),
                tally.reacquisitions(),
                recorder.integrationMicros() / (seconds * 1e6), recorder.saturatedSamples(),
                recorder.unsettledSamples(), recorder.modeChanges(), telemetry, informationEfficiency, decisionHash,
                tally.tracking(), tally.strictReacquisitions());
    }
}
