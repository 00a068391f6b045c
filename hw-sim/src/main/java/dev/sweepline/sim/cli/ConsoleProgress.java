package dev.sweepline.sim.cli;

import dev.sweepline.sim.bench.ClosedLoopBench;
import java.io.PrintStream;
import java.util.Locale;
import java.util.function.LongSupplier;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * Progress on the console for work that takes more than a few seconds of wall time: short work prints
 * nothing. On a terminal it is a bar redrawn in place; otherwise (a CI log, {@code > run.log}) it is
 * a plain line at every tenth of the work, so that a file gets about ten lines and no carriage returns.
 */
final class ConsoleProgress implements ClosedLoopBench.Progress, AutoCloseable {
    /** Wall time before anything is shown, ns: work shorter than this prints nothing (design value). */
    static final long SHOW_AFTER_NANOS = 2_000_000_000L;
    /** Plain lines per piece of work at most: one at every tenth of it. */
    static final int PLAIN_LINES = 10;
    private final String task;
    private final String unit;
    private final boolean terminal;
    private final PrintStream out;
    private final LongSupplier nanos;
    private final long startNanos;
    private ProgressBar bar;
    private long lastTenth;

    ConsoleProgress(String task, String unit, boolean terminal, PrintStream out, LongSupplier nanos) {
        this.task = task;
        this.unit = unit;
        this.terminal = terminal;
        this.out = out;
        this.nanos = nanos;
        this.startNanos = nanos.getAsLong();
    }

    /** Simulated seconds of a run, on the real console. */
    ConsoleProgress(String task) {
        this(task, " s", onTerminal(), System.out, System::nanoTime);
    }

    /** Runs of a campaign, on the real console. */
    static ConsoleProgress ofRuns(String task) {
        return new ConsoleProgress(task, " runs", onTerminal(), System.out, System::nanoTime);
    }

    /** True when standard output is a terminal (no console: redirected to a file or a pipe). */
    static boolean onTerminal() {
        return System.console() != null;
    }

    @Override
    public void update(long doneMicros, long totalMicros) {
        step(doneMicros / 1_000_000, totalMicros / 1_000_000);
    }

    /** {@code done} of {@code total} units; campaign workers call it from their threads. */
    synchronized void step(long done, long total) {
        if (total <= 0 || nanos.getAsLong() - startNanos < SHOW_AFTER_NANOS) {
            return;
        }
        if (!terminal) {
            long tenth = done * PLAIN_LINES / total;
            if (tenth > lastTenth) {
                lastTenth = tenth;
                out.printf(Locale.ROOT, "%s: %d of %d%s (%d %%), %.0f s%n", task, done, total, unit,
                        100 * done / total, (nanos.getAsLong() - startNanos) / 1e9);
            }
            return;
        }
        if (bar == null) {
            if (done >= total) {
                return;
            }
            bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(total).setUnit(unit, 1)
                    .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(500)
                    .startsFrom(done, java.time.Duration.ofNanos(nanos.getAsLong() - startNanos)).build();
        }
        bar.maxHint(total);
        bar.stepTo(done);
    }

    @Override
    public void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
