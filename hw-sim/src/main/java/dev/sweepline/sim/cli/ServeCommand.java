package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.CommandLines;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.fsw.host.HostTransport;
import dev.sweepline.fsw.host.Ranges;
import dev.sweepline.fsw.host.HvText;
import dev.sweepline.fsw.host.LinkAddress;
import dev.sweepline.fsw.host.SerialTransport;
import dev.sweepline.fsw.host.TcpTransport;
import dev.sweepline.fsw.link.ByteTransport;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import dev.sweepline.sim.serve.FaultLedger;
import dev.sweepline.sim.serve.FaultPlan;
import dev.sweepline.sim.serve.FaultyTransport;
import dev.sweepline.sim.serve.InstrumentServer;
import dev.sweepline.sim.serve.ScenarioInstrument;
import java.nio.channels.ServerSocketChannel;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code serve}: the simulated instrument on a serial port or TCP, for the flight software on a PC. */
@Command(name = "serve", mixinStandardHelpOptions = true,
        description = {"Serve the simulated instrument (hardware ICD) on a serial port or TCP: executes each step "
            + "frame against the scenario and replies, paced in real time, sped up, or at once.",
            "",
            "This simulator produces no high voltage. " + HvText.CAUTION})
final class ServeCommand implements Callable<Integer> {
    @Option(names = "--port", required = true, paramLabel = "PATH|tcp:HOST:PORT",
            description = "Serial device to serve on, or a TCP address to listen on (tcp::PORT is loopback).")
    String port;

    @Option(names = "--scenario", paramLabel = "NAME|FILE",
            description = "Built-in scenario name or a scenario file (default: ${DEFAULT-VALUE}).")
    String scenario = ScenarioLoader.defaultName();

    @Option(names = "--seed", paramLabel = "S", description = "Run seed, as for 'run' (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--speed", converter = Ranges.NonNegative.class, paramLabel = "X",
            description = "Simulated seconds per wall second (default: ${DEFAULT-VALUE}); 0 replies at once.")
    double speed = 1.0;

    @Option(names = "--as-fast-as-possible", description = "Reply at once (same as --speed 0).")
    boolean asFastAsPossible;

    @Option(names = "--baud", converter = Ranges.PositiveInt.class,
            paramLabel = "B", description = "Serial line rate, 8N1 (default: ${DEFAULT-VALUE}).")
    int baud = SerialTransport.DEFAULT_BAUD;

    @Option(names = "--ber", converter = Ranges.Probability.class,
            paramLabel = "P", description = "Injected bit-error rate, both directions (default: 0).")
    double ber;

    @Option(names = "--drop", converter = Ranges.Probability.class,
            paramLabel = "P", description = "Probability an octet is lost (default: 0).")
    double drop;

    @Option(names = "--dup", converter = Ranges.Probability.class,
            paramLabel = "P", description = "Probability an octet is duplicated (default: 0).")
    double dup;

    @Option(names = "--stall", converter = Ranges.Probability.class,
            paramLabel = "P", description = "Probability the stream stalls after an octet (default: 0).")
    double stall;

    @Option(names = "--stall-ms", converter = Ranges.NonNegativeLong.class,
            paramLabel = "MS", description = "Length of a stall (default: ${DEFAULT-VALUE} ms).")
    long stallMillis = 30;

    @Option(names = "--fault-seed", paramLabel = "S", description = "Seed of the faults (default: ${DEFAULT-VALUE}).")
    long faultSeed = 1;

    @Option(names = "--clients", paramLabel = "N", converter = Ranges.PositiveInt.class,
            description = "With a TCP --port: end after serving N clients one after the other (default: serve "
                + "until interrupted; each client gets the instrument fresh from the scenario and seed).")
    Integer clients;

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    /** The connection being served, for the shutdown hook. */
    private volatile InstrumentServer current;
    /** Set by the shutdown hook. */
    private volatile boolean stopping;
    /** The TCP listener, for the shutdown hook to close. */
    private volatile ServerSocketChannel listener;

    @Override
    public Integer call() throws Exception {
        instrument.resolve();
        InstrumentModel model = instrument.model();
        Scenario sc = RunCommand.scenario(scenario);
        LinkAddress address;
        FaultPlan plan;
        try {
            address = LinkAddress.parse(port);
        } catch (IllegalArgumentException e) {
            throw new CliException(ExitStatus.USAGE, "--port: " + e.getMessage());
        }
        try {
            plan = new FaultPlan(ber, drop, dup, stall, stallMillis * 1_000, faultSeed);
        } catch (IllegalArgumentException e) {
            throw new CliException(ExitStatus.USAGE, "--ber, --drop, --dup, --stall: " + e.getMessage());
        }
        double pace = asFastAsPossible ? 0 : speed;
        System.out.println("serving " + model.name() + " in " + sc.name() + " (seed " + seed + ") on " + address + ", speed "
                + (pace == 0 ? "as fast as possible" : pace));
        Thread main = Thread.currentThread();
        Thread hook = new Thread(() -> {
            stopping = true;
            InstrumentServer s = current;
            if (s != null) {
                s.stop();
            }
            closeQuietly(listener);
            try {
                main.join(2_000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
        Runtime.getRuntime().addShutdownHook(hook);
        try {
            if (!address.tcp()) {
                try (HostTransport transport = openOrSay(address)) {
                    serve(transport, sc, model, plan, pace);
                }
                return ExitStatus.OK;
            }
            listener = listenOrSay(address);
            System.out.println("listening on " + listener.getLocalAddress());
            // each client gets the instrument fresh from the scenario and seed, so that every run against
            // the server is the same as the first; the server ends after --clients of them, or on a signal
            for (int served = 0; (clients == null || served < clients) && !stopping; served++) {
                HostTransport transport;
                try {
                    transport = TcpTransport.accept(listener);
                } catch (java.nio.channels.ClosedChannelException e) {
                    break; // closed by the shutdown hook
                }
                try (transport) {
                    serve(transport, sc, model, plan, pace);
                }
                if (!stopping && (clients == null || served + 1 < clients)) {
                    System.out.println("client left; serving the next one on " + address);
                }
            }
            return ExitStatus.OK;
        } finally {
            closeQuietly(listener);
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException e) {
                // the JVM is shutting down: the hook is running
            }
        }
    }

    /** Serves one connection until it ends or the server is stopped, then prints its counters. */
    private void serve(HostTransport transport, Scenario sc, InstrumentModel model, FaultPlan plan, double pace) {
        ByteTransport wire = transport;
        FaultyTransport faulty = null;
        if (!plan.none()) {
            faulty = new FaultyTransport(transport, plan, () -> System.nanoTime() / 1_000);
            wire = faulty;
        }
        InstrumentServer server = new InstrumentServer(new ScenarioInstrument(sc, seed, model), wire, pace);
        current = server;
        if (stopping) {
            server.stop();
        }
        server.run();
        current = null;
        print(server, faulty);
    }

    private static void closeQuietly(ServerSocketChannel listener) {
        if (listener != null) {
            try {
                listener.close();
            } catch (java.io.IOException e) {
                // closing to end the accept: nothing more to do
            }
        }
    }

    /** Binds the TCP listener; an address that cannot be bound is one line naming it (an I/O error). */
    private static ServerSocketChannel listenOrSay(LinkAddress address) {
        try {
            return TcpTransport.listen(address.host(), address.port());
        } catch (java.io.IOException | RuntimeException e) {
            throw CliException.io("--port " + address + ": cannot listen there (" + CommandLines.reason(e) + ")");
        }
    }

    /** Opens the port; one that does not open is one line naming it (an I/O error). */
    private HostTransport openOrSay(LinkAddress address) {
        try {
            return open(address);
        } catch (java.io.IOException | RuntimeException e) {
            throw CliException.io("--port " + address + ": cannot open it (" + CommandLines.reason(e) + ")");
        }
    }

    private HostTransport open(LinkAddress address) throws java.io.IOException {
        return SerialTransport.open(address.device(), baud);
    }

    private static void print(InstrumentServer server, FaultyTransport faulty) {
        LinkCounters c = server.counters();
        System.out.printf("steps executed %d, repeats answered %d, levels refused %d, housekeeping %d, "
                + "link watchdog trips %d, clock %.3f s%n", server.stepsExecuted(), server.repeatsAnswered(),
                server.levelRefusals(), server.housekeepingAnswered(), server.watchdogTrips(),
                server.clockMicros() / 1e6);
        System.out.printf("frames good %d, bad %d (CRC %d, COBS %d, length %d, type %d, wrong length %d), empty %d%n",
                c.framesGood, c.framesBad(), c.badCrc, c.badCobs, c.badLength, c.unknownType, c.wrongLength,
                c.emptyChunks);
        if (faulty != null) {
            for (FaultLedger l : new FaultLedger[] {faulty.inbound(), faulty.outbound()}) {
                System.out.printf("%s: faults %d (bit flips %d, drops %d, duplicates %d, stalls %d), frames %d, "
                        + "damaged %d%n", l == faulty.inbound() ? "inbound " : "outbound", l.faults(), l.bitFlips,
                        l.drops, l.duplicates, l.stalls, l.frames, l.damagedFrames);
            }
        }
    }
}
