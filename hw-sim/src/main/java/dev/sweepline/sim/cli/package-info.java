/**
 * The bench's command line ({@code sweepline-bench.jar}, picocli): {@code run}, {@code scenarios},
 * {@code serve}, {@code tune}, {@code merge}, {@code budget}. Exit status 0 on success, 2 for a broken
 * input file (named with its line and field), 1 for a budget that does not fit.
 */
package dev.sweepline.sim.cli;
