package dev.sweepline.sim.bench;

/**
 * Where the recorder hands each sweep as it completes ({@link BenchRecorder#recordSweeps}), with how much
 * the true protons moved within it ({@link TruthChange}): a run's {@code decisions.csv} is written this way
 * while the run goes ({@link DecisionsCsv}), so a long run keeps none of its records.
 */
public interface SweepLog {
    /** One completed sweep and its truth change (n, U, T; NaN where undefined). */
    void add(SweepRecord sweep, double[] truthChange);

    /** A log that takes nothing (the truth change is then not computed). */
    SweepLog NONE = (sweep, change) -> { };
}
