package dev.sweepline.sim.cli;

/** Command-line entry point (filled in by its module's work). */
public final class BenchMain {
    private BenchMain() {
    }

    public static void main(String[] args) {
        System.out.println("BenchMain: not yet wired");
    }
}
