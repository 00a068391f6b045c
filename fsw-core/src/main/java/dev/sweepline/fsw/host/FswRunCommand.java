package dev.sweepline.fsw.host;

import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.fsw.host.script.GroundCommandCounter;
import dev.sweepline.fsw.host.script.ScriptException;
import dev.sweepline.fsw.host.script.ScriptPlayer;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.LinkWatchdog;
import dev.sweepline.fsw.nvm.FileNonVolatileStore;
import dev.sweepline.fsw.sweep.SweepListener;
import java.io.IOException;
import java.io.PrintStream;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.function.LongSupplier;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code run}: the flight software in a loop on a link, writing telemetry frames. The link and the
 * telemetry output are opened first, then the operator arms and fires, then the run's time starts;
 * every way out (planned end, signal, exception, link loss) goes through one {@link HvShutdown}.
 */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Run the flight software against electronics (real or 'sweepline-bench serve') on a serial "
            + "port or TCP, writing TM frames to a file or socket ('sweepline-ground.jar decode' reads them).",
            "",
            HvText.CAUTION,
            "",
            HvText.END_OF_RUN})
final class FswRunCommand implements Callable<Integer> {
    /** What every error line of the command starts with: the command it comes from. */
    static final String PREFIX = "sweepline-fsw run: ";
    /** Time the shutdown hook leaves the run's thread to start the HV shutdown itself, milliseconds (design value). */
    static final long HOOK_GRACE_MILLIS = 1_000;
    /** Time the shutdown hook then leaves the run's thread to print its summary, milliseconds (design value). */
    static final long HOOK_SUMMARY_MILLIS = 1_000;

    /**
     * Largest {@code --timeout-margin}, ms: the electronics' 2 s link watchdog (hardware ICD §4.1); a
     * longer wait for a reply would let the watchdog switch the HV off before the retry.
     */
    static final long MAX_TIMEOUT_MARGIN_MILLIS = LinkWatchdog.TIMEOUT_MICROS / 1_000;

    /** HV choices. */
    enum Hv { off, arm }

    /** Clock choices. */
    enum Clock { realtime, link }

    @Option(names = "--link", required = true, paramLabel = "PATH|tcp:HOST:PORT",
            description = "Serial device (8N1) or TCP address of the electronics.")
    String link;

    @Option(names = "--tm", required = true, paramLabel = "FILE|tcp:HOST:PORT",
            description = "Where the telemetry frames go: a file, or a ground listener to connect to.")
    String tm;

    @Option(names = "--force",
            description = "Overwrite an existing --tm file (without it, an existing file is refused).")
    boolean force;

    @Option(names = "--instrument", paramLabel = "NAME|FILE",
            description = "The instrument description: a built-in name or a file (default: ${DEFAULT-VALUE}; "
                + "instruments/FORMAT.md).")
    String instrument = Instruments.defaultName();

    @Option(names = "--minutes", paramLabel = "M", converter = Ranges.Positive.class,
            description = "Minutes to run, counted from the start of the run, after the HV prompt "
                + "(default: until interrupted).")
    Double minutes;

    @Option(names = "--baud", paramLabel = "B", converter = Ranges.PositiveInt.class,
            description = "Serial line rate (default: ${DEFAULT-VALUE}).")
    int baud = SerialTransport.DEFAULT_BAUD;

    @Option(names = "--clock", paramLabel = "realtime|link",
            description = "realtime: the PC's monotonic clock (default). link: simulated time driven by link "
                + "events, for a simulator serving as fast as possible (same time line as the in-process bench).")
    Clock clock = Clock.realtime;

    @Option(names = "--reply-wait-ms", paramLabel = "MS", converter = Ranges.PositiveLong.class,
            description = "With --clock link: wall-clock wait for a reply before letting its time-out run "
                + "(default: ${DEFAULT-VALUE}; keep two of them below the electronics' 2 s link watchdog).")
    long replyWaitMillis = 500;

    @Option(names = "--hv", paramLabel = "off|arm",
            description = "HV permission: off (default: every step with HV disabled) or arm (then fire within the "
                + "time-out, at the prompt or with --hv-confirm).")
    Hv hv = Hv.off;

    @Option(names = "--hv-confirm", paramLabel = "WORD",
            description = "Second flag that fires an armed HV without the prompt: must be FIRE (ignored without --hv arm).")
    String hvConfirm;

    @Option(names = "--hv-timeout-s", paramLabel = "S", converter = Ranges.PositiveLong.class,
            description = "Arm-to-fire time-out (default: ${DEFAULT-VALUE} s).")
    long hvTimeoutSeconds = HvArming.DEFAULT_TIMEOUT_MICROS / 1_000_000L;

    @Option(names = "--commands", paramLabel = "SCRIPT",
            description = "Time-tagged telecommands to send during the run, signed with the flight key "
                + "(commands.md §7; TABLE_IMAGE uplinks a campaign's recommended.table). Times count from the start of the run.")
    java.nio.file.Path commands;

    @Option(names = "--nvm", paramLabel = "FILE",
            description = "File standing for the flight software's non-volatile memory: a committed table survives "
                + "restarts, and the command counter is kept beside it (commands.md §4.3, §7.3).")
    java.nio.file.Path nvm;

    @Option(names = "--timeout-margin", paramLabel = "MS", converter = Ranges.NonNegativeLong.class,
            description = "Reply time-out margin beyond each step's own duration, milliseconds (default: "
                + "${DEFAULT-VALUE}; hardware ICD §4; at most " + MAX_TIMEOUT_MARGIN_MILLIS + ").")
    long timeoutMarginMillis = Executive.DEFAULT_TIMEOUT_MARGIN_MICROS / 1_000;

    /** The sender's command counter of {@code --commands} (set once the script is read). */
    private GroundCommandCounter counter;

    /** Where the operator types FIRE (tests give their own). */
    HvPrompt.Console console = HvPrompt.stdin(System.in);
    /** The clock of the arm-to-fire time-out, microseconds (tests give a fake one). */
    LongSupplier promptClock = new MonotonicClock()::nowMicros;
    /** Console output. */
    PrintStream out = System.out;
    /** Console errors. */
    PrintStream err = System.err;

    @Override
    public Integer call() {
        LinkAddress address;
        try {
            address = LinkAddress.parse(link);
        } catch (IllegalArgumentException e) {
            err.println(PREFIX + "--link: " + e.getMessage());
            return ExitStatus.USAGE;
        }
        InstrumentDescription described;
        try {
            described = Instruments.resolve(instrument).flight();
        } catch (FileFormatException e) {
            err.println(PREFIX + "--instrument: " + e.getMessage());
            return ExitStatus.INPUT;
        }
        if (timeoutMarginMillis > MAX_TIMEOUT_MARGIN_MILLIS) {
            err.println(PREFIX + "--timeout-margin: must be at most " + MAX_TIMEOUT_MARGIN_MILLIS
                    + " ms (the electronics' link "
                    + "watchdog, hardware ICD §4.1), got " + timeoutMarginMillis);
            return ExitStatus.USAGE;
        }
        CommandScript script = null;
        if (commands != null) {
            try {
                script = CommandScript.read(commands, described);
                ScriptPlayer.refuseInjections(script);
                // the sender's counter is kept beside the NVM file, as the bench keeps it (commands.md §7.3)
                counter = nvm == null ? GroundCommandCounter.inMemory() : GroundCommandCounter.beside(nvm);
            } catch (ScriptException e) {
                err.println(PREFIX + "--commands " + commands + ":" + e.getMessage());
                return ExitStatus.INPUT;
            } catch (IOException e) {
                err.println(PREFIX + "--commands " + commands + ": " + CommandLines.reason(e));
                return ExitStatus.INPUT;
            }
            for (String w : script.warnings()) {
                out.println("warning: " + commands + ": " + w);
            }
        }
        if (hvConfirm != null && hv != Hv.arm) {
            out.println("--hv-confirm ignored: it confirms only an armed HV (--hv arm); running with HV off");
        }
        if (clock == Clock.link && 2 * replyWaitMillis * 1_000 >= LinkWatchdog.TIMEOUT_MICROS) {
            out.println("warning: two --reply-wait-ms of " + replyWaitMillis + " ms reach the electronics' link "
                    + "watchdog (hardware ICD §4.1): a lost reply will switch their HV off");
        }
        HostTransport transport;
        try {
            transport = address.open(baud);
        } catch (IOException | RuntimeException e) {
            err.println(PREFIX + "--link " + address + ": cannot open the link (" + CommandLines.reason(e) + ")");
            return ExitStatus.IO;
        }
        StreamFrameSink sink;
        try {
            sink = StreamFrameSink.open(tm, force);
        } catch (java.nio.file.FileAlreadyExistsException e) {
            transport.close();
            err.println(PREFIX + "--tm " + tm + ": exists; give --force to overwrite it");
            return ExitStatus.IO;
        } catch (IOException | RuntimeException e) {
            transport.close();
            err.println(PREFIX + "--tm " + tm + ": cannot open the telemetry output (" + CommandLines.reason(e) + ")");
            return ExitStatus.IO;
        }
        try {
            return run(described, address, transport, sink, script);
        } finally {
            try {
                sink.close();
            } catch (IOException | RuntimeException e) {
                err.println("--tm " + tm + ": telemetry output not closed cleanly: " + e.getMessage());
            }
            transport.close();
        }
    }

    /** The run on an open link and telemetry output: prompt, then the flight software on its loop. */
    private int run(InstrumentDescription described, LinkAddress address, HostTransport transport,
            StreamFrameSink sink, CommandScript script) {
        HvArming arming = new HvArming(hvTimeoutSeconds * 1_000_000L);
        boolean fired = hv == Hv.arm && fire(arming);
        FramedInstrumentLink framed = new FramedInstrumentLink(transport, described);
        HvGuardLink guard = new HvGuardLink(framed, arming);
        FlightConfig flight = FlightConfig.of(described);
        flight.hvPermitted = false; // the core interlock starts OFF too; the operator's fire below enables both
        // this boot's authentication-recovery challenge (commands.md §1.4): unpredictable to an eavesdropper
        flight.bootChallenge = new java.security.SecureRandom().nextInt() & 0xFFFF_FFFFL;
        flight.timeoutMarginMicros = (int) (timeoutMarginMillis * 1_000);
        if (nvm != null) {
            flight.nonVolatileStore = new FileNonVolatileStore(nvm);
        }
        FlightSoftware fsw = new FlightSoftware(flight, guard, sink, SweepListener.NONE);
        // the run's time starts here, after the prompt: --minutes is run time, whenever FIRE was typed
        MonotonicClock runClock = new MonotonicClock();
        HostLoop loop = clock == Clock.link
                ? new LinkClockLoop(fsw, framed, LinkClockLoop.wallClockWait(replyWaitMillis))
                : new RealTimeLoop(fsw, framed, runClock);
        if (fired) {
            fsw.operatorFireHv(clock == Clock.link ? 0 : runClock.nowMicros());
        }
        ScriptPlayer player = null;
        if (script != null) {
            player = new ScriptPlayer(script, flight.commandKey, counter);
            ScriptPlayer playing = player;
            long startMicros = clock == Clock.link ? 0 : runClock.nowMicros();
            loop.beforeEachCycle(now -> playing.play(fsw, now - startMicros, e -> { }));
        }
        MonotonicClock wall = new MonotonicClock();
        HvShutdown shutdown = new HvShutdown(fsw, arming, framed, wall::nowMicros, HvShutdown.parking(), out);
        out.println("link " + address + ", HV " + arming.state() + ", clock " + clock + ", run "
                + (minutes == null ? "until interrupted" : minutes + " min"));
        CountDownLatch reported = new CountDownLatch(1);
        Runnable removeHook = transport.onShutdown(shutdownHook(loop, shutdown, reported));
        try {
            int status = fly(fsw, loop, shutdown, guard, framed, sink);
            if (player != null) {
                printCommandOutcome(player);
            }
            return status;
        } finally {
            reported.countDown();
            removeHook.run();
        }
    }

    /** Commands sent and refused, with the count of each refusal reason. */
    private void printCommandOutcome(ScriptPlayer player) {
        java.util.Map<String, Long> refusals = new java.util.TreeMap<>();
        player.sent().stream().filter(x -> x.reason() != 0)
                .forEach(x -> refusals.merge(CommandReason.name(x.reason()), 1L, Long::sum));
        long refused = refusals.values().stream().mapToLong(Long::longValue).sum();
        out.println("commands: " + player.sent().size() + " sent, " + refused + " refused"
                + (refusals.isEmpty() ? "" : " " + refusals));
    }

    /** The operator's arm-then-fire; says why when the HV was not fired. */
    private boolean fire(HvArming arming) {
        HvPrompt.Answer answer = new HvPrompt(console, promptClock, out).fire(arming, hvConfirm, hvTimeoutSeconds);
        if (!answer.fired()) {
            out.println(answer.why());
        }
        return answer.fired();
    }

    /** The loop until its end, whatever it is, then the HV shutdown, the telemetry's end and the report. */
    private int fly(FlightSoftware fsw, HostLoop loop, HvShutdown shutdown, HvGuardLink guard,
            FramedInstrumentLink framed, StreamFrameSink sink) {
        long endMicros = minutes == null ? Long.MAX_VALUE : Math.round(minutes * 60e6);
        String failure = null;
        HvShutdown.Result off;
        try {
            loop.run(endMicros);
        } catch (RuntimeException e) {
            failure = "exception in the loop: " + e;
            err.println("run stopped: " + e + (e.getCause() == null ? "" : " (" + e.getCause().getMessage() + ")"));
        } finally {
            off = shutdown.run(failure != null ? failure : loop.end().text()); // an Error still passes here
        }
        // the run ends at its planned end, like the bench's, even when the last reply overshot it
        closeTelemetry(fsw, Math.min(loop.lastMicros(), endMicros));
        RunReport.print(fsw, framed, guard, sink, out);
        RunReport.printElectronics(framed, out);
        if (!off.confirmed()) {
            return ExitStatus.HV_NOT_CONFIRMED;
        }
        boolean planned = loop.end() == LoopEnd.END_TIME || loop.end() == LoopEnd.STOPPED;
        return failure == null && planned ? ExitStatus.OK : ExitStatus.FAILED;
    }

    /**
     * The hook of SIGINT and SIGTERM: stops the loop, lets the run's thread run the HV shutdown (or runs
     * it when that thread does not come to it), then leaves that thread a moment to print.
     */
    private static Runnable shutdownHook(HostLoop loop, HvShutdown shutdown, CountDownLatch reported) {
        return () -> {
            loop.stop();
            shutdown.awaitOrRun(HOOK_GRACE_MILLIS, "stopped by a signal (shutdown hook)");
            try {
                reported.await(HOOK_SUMMARY_MILLIS, TimeUnit.MILLISECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        };
    }

    /** Ends the telemetry (last housekeeping, open frames flushed); a failing output is one line. */
    private void closeTelemetry(FlightSoftware fsw, long nowMicros) {
        try {
            fsw.close(nowMicros);
        } catch (RuntimeException e) {
            err.println("--tm " + tm + ": telemetry not completed: " + e.getMessage());
        }
    }
}
