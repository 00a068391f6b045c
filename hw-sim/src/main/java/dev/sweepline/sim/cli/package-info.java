/**
 * The bench's command line ({@code sweepline-bench.jar}, picocli): {@code run}, {@code scenarios},
 * {@code serve}, {@code tune}, {@code merge}, {@code budget}, {@code instruments}, {@code help}.
 * Exit statuses are fsw-core's {@code host.ExitStatus} (README.md lists them): 0 done, 2 a usage error
 * (an option out of range, such as {@code --threads} below 1), 4 an input error (a broken file, named
 * with its line and field; a missing script or scenario), 5 an I/O error ({@code --out} that cannot be
 * a folder, a port that does not open), 6 warnings (a run over its allocation or its serial line rate,
 * a budget that does not fit). Every error is one line on stderr. Verified: BenchCommandLineTest,
 * BenchCommandLineErrorTest, ExitStatusAgreementTest, ConsoleProgressTest (plain progress lines when
 * standard output is not a terminal), ServeOverTcpTest (a TCP server serves one client after another).
 * {@code tune} runs with the JIT's quick compiler alone unless {@code --jit tiered} ({@link
 * dev.sweepline.sim.cli.JitPolicy}: in a second JVM at tier 1, {@link dev.sweepline.sim.cli.QuickCompilerProcess};
 * verified in JVMs of their own by JitPolicyTest).
 */
package dev.sweepline.sim.cli;
