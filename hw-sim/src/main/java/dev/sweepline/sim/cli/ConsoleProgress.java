package dev.sweepline.sim.cli;

import dev.sweepline.sim.bench.ClosedLoopBench;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * A progress bar on the console for runs that take more than a few seconds of wall time: short runs
 * print nothing, long ones show simulated seconds done and the time left.
 */
final class ConsoleProgress implements ClosedLoopBench.Progress, AutoCloseable {
    private static final long SHOW_AFTER_NANOS = 2_000_000_000L;
    private final String task;
    private final long startNanos = System.nanoTime();
    private ProgressBar bar;

    ConsoleProgress(String task) {
        this.task = task;
    }

    @Override
    public void update(long doneMicros, long totalMicros) {
        if (bar == null) {
            if (System.nanoTime() - startNanos < SHOW_AFTER_NANOS || doneMicros >= totalMicros) {
                return;
            }
            bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(totalMicros / 1_000_000)
                    .setUnit(" s", 1).setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(500)
                    .startsFrom(doneMicros / 1_000_000,
                            java.time.Duration.ofNanos(System.nanoTime() - startNanos)).build();
        }
        bar.stepTo(doneMicros / 1_000_000);
    }

    @Override
    public void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
