package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.HostTransport;
import dev.sweepline.fsw.host.HvText;
import dev.sweepline.fsw.host.LinkAddress;
import dev.sweepline.fsw.host.SerialTransport;
import dev.sweepline.fsw.host.TcpTransport;
import dev.sweepline.fsw.link.ByteTransport;
import dev.sweepline.fsw.link.LinkCounters;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioException;
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

    @Option(names = "--speed", paramLabel = "X",
            description = "Simulated seconds per wall second (default: ${DEFAULT-VALUE}); 0 replies at once.")
    double speed = 1.0;

    @Option(names = "--as-fast-as-possible", description = "Reply at once (same as --speed 0).")
    boolean asFastAsPossible;

    @Option(names = "--baud", paramLabel = "B", description = "Serial line rate, 8N1 (default: ${DEFAULT-VALUE}).")
    int baud = SerialTransport.DEFAULT_BAUD;

    @Option(names = "--ber", paramLabel = "P", description = "Injected bit-error rate, both directions (default: 0).")
    double ber;

    @Option(names = "--drop", paramLabel = "P", description = "Probability an octet is lost (default: 0).")
    double drop;

    @Option(names = "--dup", paramLabel = "P", description = "Probability an octet is duplicated (default: 0).")
    double dup;

    @Option(names = "--stall", paramLabel = "P", description = "Probability the stream stalls after an octet (default: 0).")
    double stall;

    @Option(names = "--stall-ms", paramLabel = "MS", description = "Length of a stall (default: ${DEFAULT-VALUE} ms).")
    long stallMillis = 30;

    @Option(names = "--fault-seed", paramLabel = "S", description = "Seed of the faults (default: ${DEFAULT-VALUE}).")
    long faultSeed = 1;

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    @Override
    public Integer call() throws Exception {
        if (!instrument.resolve()) {
            return 2;
        }
        InstrumentModel model = instrument.model();
        Scenario sc;
        LinkAddress address;
        FaultPlan plan;
        try {
            sc = ScenarioLoader.resolve(scenario);
            address = LinkAddress.parse(port);
            plan = new FaultPlan(ber, drop, dup, stall, stallMillis * 1_000, faultSeed);
        } catch (ScenarioException | IllegalArgumentException e) {
            System.err.println(e.getMessage());
            return 2;
        }
        double pace = asFastAsPossible ? 0 : speed;
        if (!(pace >= 0)) {
            System.err.println("--speed must be >= 0");
            return 2;
        }
        try (HostTransport transport = open(address)) {
            ByteTransport wire = transport;
            FaultyTransport faulty = null;
            if (!plan.none()) {
                faulty = new FaultyTransport(transport, plan, () -> System.nanoTime() / 1_000);
                wire = faulty;
            }
            InstrumentServer server = new InstrumentServer(new ScenarioInstrument(sc, seed, model), wire, pace);
            Thread main = Thread.currentThread();
            Runtime.getRuntime().addShutdownHook(new Thread(() -> {
                server.stop();
                try {
                    main.join(2_000);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }));
            System.out.println("serving " + model.name() + " in " + sc.name() + " (seed " + seed + ") on " + address + ", speed "
                    + (pace == 0 ? "as fast as possible" : pace));
            server.run();
            print(server, faulty);
        }
        return 0;
    }

    private HostTransport open(LinkAddress address) throws java.io.IOException {
        if (!address.tcp()) {
            return SerialTransport.open(address.device(), baud);
        }
        try (ServerSocketChannel listener = TcpTransport.listen(address.host(), address.port())) {
            System.out.println("listening on " + listener.getLocalAddress());
            return TcpTransport.accept(listener);
        }
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
