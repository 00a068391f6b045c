/**
 * The bench's command line ({@code sweepline-bench.jar}, picocli): {@code run}, {@code scenarios},
 * {@code serve}, {@code tune}, {@code merge}, {@code budget}. Exit status 0 on success, 2 for a broken
 * input file (named with its line and field) or an option out of range ({@code --threads} below 1), 1 for
 * a budget that does not fit. Verified: BenchCommandLineTest.
 */
package dev.sweepline.sim.cli;
