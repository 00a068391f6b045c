package dev.sweepline.fsw.host;

import dev.sweepline.fsw.exec.Executive;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.FramedInstrumentLink;
import dev.sweepline.fsw.link.HousekeepingReply;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.fsw.sweep.SweepListener;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code run}: the flight software in a loop on a link, writing telemetry frames. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Run the flight software against electronics (real or 'sweepline-bench serve') on a serial "
            + "port or TCP, writing TM frames to a file or socket ('sweepline-ground.jar decode' reads them).",
            "",
            HvText.CAUTION})
final class FswRunCommand implements Callable<Integer> {
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

    @Option(names = "--minutes", paramLabel = "M", description = "Minutes to run (default: until interrupted).")
    Double minutes;

    @Option(names = "--baud", paramLabel = "B", description = "Serial line rate (default: ${DEFAULT-VALUE}).")
    int baud = SerialTransport.DEFAULT_BAUD;

    @Option(names = "--clock", paramLabel = "realtime|link",
            description = "realtime: the PC's monotonic clock (default). link: simulated time driven by link "
                + "events, for a simulator serving as fast as possible (same time line as the in-process bench).")
    Clock clock = Clock.realtime;

    @Option(names = "--reply-wait-ms", paramLabel = "MS",
            description = "With --clock link: wall-clock wait for a reply before letting its time-out run "
                + "(default: ${DEFAULT-VALUE}).")
    long replyWaitMillis = 500;

    @Option(names = "--hv", paramLabel = "off|arm",
            description = "HV permission: off (default: every step with HV disabled) or arm (then fire within the "
                + "time-out, at the prompt or with --hv-confirm).")
    Hv hv = Hv.off;

    @Option(names = "--hv-confirm", paramLabel = "WORD",
            description = "Second flag that fires an armed HV without the prompt: must be FIRE.")
    String hvConfirm;

    @Option(names = "--hv-timeout-s", paramLabel = "S", description = "Arm-to-fire time-out (default: ${DEFAULT-VALUE} s).")
    long hvTimeoutSeconds = HvArming.DEFAULT_TIMEOUT_MICROS / 1_000_000L;

    @Override
    public Integer call() throws Exception {
        LinkAddress address;
        try {
            address = LinkAddress.parse(link);
        } catch (IllegalArgumentException e) {
            System.err.println(e.getMessage());
            return 2;
        }
        MonotonicClock wall = new MonotonicClock();
        HvArming arming = new HvArming(hvTimeoutSeconds * 1_000_000L);
        if (hv == Hv.arm && !fire(arming, wall)) {
            System.err.println("HV not fired: running with HV off");
        }
        long endMicros = minutes == null ? Long.MAX_VALUE : Math.round(minutes * 60e6);
        try (HostTransport transport = address.open(baud); StreamFrameSink sink = StreamFrameSink.open(tm)) {
            FramedInstrumentLink framed = new FramedInstrumentLink(transport);
            HvGuardLink guard = new HvGuardLink(framed, arming);
            FlightConfig flight = new FlightConfig();
            // the core knows the permission too, so its HV monitors expect no HV and housekeeping says so;
            // the guard on the wire stays as a second, independent barrier
            flight.hvPermitted = arming.state() == HvArming.State.ENABLED;
            FlightSoftware fsw = new FlightSoftware(flight, guard, sink, SweepListener.NONE);
            System.out.println("link " + address + ", HV " + arming.state() + ", clock " + clock);
            long end;
            if (clock == Clock.link) {
                end = new LinkClockLoop(fsw, framed, LinkClockLoop.wallClockWait(replyWaitMillis)).run(endMicros);
            } else {
                RealTimeLoop loop = new RealTimeLoop(fsw, framed, wall);
                Thread main = Thread.currentThread();
                Thread hook = new Thread(() -> {
                    loop.stop();
                    try {
                        main.join(2_000);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                });
                Runtime.getRuntime().addShutdownHook(hook);
                end = loop.run(endMicros);
            }
            // the run ends at its planned end, like the bench's, even when the last reply overshot it
            fsw.close(Math.min(end, endMicros));
            print(fsw, framed, guard, sink, System.out);
            printElectronics(framed, System.out);
        }
        return 0;
    }

    private boolean fire(HvArming arming, MonotonicClock wall) throws IOException {
        System.out.println(HvText.CAUTION);
        arming.arm(wall.nowMicros());
        String word = hvConfirm;
        if (word == null) {
            System.out.println("HV ARMED. Type " + HvArming.CONFIRM_WORD + " within " + hvTimeoutSeconds
                    + " s to enable the high voltage; anything else keeps it off.");
            word = readLine(hvTimeoutSeconds);
        }
        return arming.confirm(word, wall.nowMicros()) == HvArming.State.ENABLED;
    }

    private static String readLine(long timeoutSeconds) {
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8));
        CompletableFuture<String> line = CompletableFuture.supplyAsync(() -> {
            try {
                String s = in.readLine();
                return s == null ? "" : s.trim();
            } catch (IOException e) {
                return "";
            }
        });
        try {
            return line.get(timeoutSeconds, TimeUnit.SECONDS);
        } catch (TimeoutException | java.util.concurrent.ExecutionException e) {
            return "";
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return "";
        }
    }

    /**
     * Asks the electronics for their housekeeping (hardware ICD §3.3) and prints their side of the link:
     * what they received good and bad, their last step, HV monitors and temperature. Waits at most
     * about half a second; electronics that do not answer are reported as such.
     */
    static void printElectronics(FramedInstrumentLink framed, PrintStream out) {
        long before = framed.housekeepingReplies();
        boolean sent = false;
        dev.sweepline.fsw.link.SampleReply late = new dev.sweepline.fsw.link.SampleReply();
        for (int i = 0; i < 50 && framed.housekeepingReplies() == before; i++) {
            sent = sent || framed.requestHousekeeping(0xFFFF);
            framed.pump();
            framed.poll(late, Long.MAX_VALUE); // a sample reply still held would stop the reading
            try {
                Thread.sleep(10);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
        }
        if (framed.housekeepingReplies() == before) {
            out.println("electronics: no housekeeping reply");
            return;
        }
        HousekeepingReply h = framed.housekeeping();
        out.printf("electronics: frames good %d, bad %d; last step %d; HV monitors %d / %d codes; %.2f degC%n",
                h.framesGood, h.framesBad, h.lastStepSequence, h.hvMonitorLowCode, h.hvMonitorHighCode,
                h.temperatureCentiCelsius / 100.0);
    }

    static void print(FlightSoftware fsw, FramedInstrumentLink framed, HvGuardLink guard, StreamFrameSink sink,
            PrintStream out) {
        Executive e = fsw.executive();
        LinkCounters c = framed.counters();
        out.printf("mode %s; steps sent %d, replies %d, sequence errors %d, time-outs %d, retries %d, safe entries %d%n",
                fsw.scheduler().mode(), e.stepsSent(), e.repliesAccepted(), e.sequenceErrors(), e.timeouts(),
                e.retries(), e.safeEntries());
        out.printf("link frames good %d, bad %d (CRC %d, COBS %d, length %d, type %d, wrong length %d), empty %d%n",
                c.framesGood, c.framesBad(), c.badCrc, c.badCobs, c.badLength, c.unknownType, c.wrongLength,
                c.emptyChunks);
        out.printf("steps sent with HV cleared (not fired): %d; telemetry frames written: %d%n",
                guard.stepsWithHvCleared(), sink.frames());
    }
}
