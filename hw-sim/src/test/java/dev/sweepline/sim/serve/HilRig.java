package dev.sweepline.sim.serve;

import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.exec.FlightSoftware;
import dev.sweepline.fsw.link.InstrumentLink;
import dev.sweepline.fsw.sweep.SweepListener;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import java.io.ByteArrayOutputStream;
import java.io.File;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** Shared pieces of the hardware-in-the-loop tests: the in-process reference run and the ground's view. */
final class HilRig {
    private HilRig() {
    }

    /** The socat on the PATH, or null when it is not installed (the serial tests then skip). */
    static String socatPath() {
        for (String dir : System.getenv().getOrDefault("PATH", "/usr/bin").split(File.pathSeparator)) {
            File f = new File(dir, "socat");
            if (f.canExecute()) {
                return f.getPath();
            }
        }
        return null;
    }

    /** The telemetry of the in-process bench for {@code config}. */
    static byte[] inProcessTelemetry(BenchConfig config) {
        ByteArrayOutputStream tm = new ByteArrayOutputStream();
        ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE, tm::write);
        return tm.toByteArray();
    }

    /** Flight software configured as the bench configures it, on {@code link}, frames into {@code tm}. */
    static FlightSoftware flightSoftware(BenchConfig config, InstrumentLink link, ByteArrayOutputStream tm) {
        return new FlightSoftware(flightConfig(config), link, tm::write, SweepListener.NONE);
    }

    /** The flight configuration of {@code config}, as ClosedLoopBench builds it. */
    static FlightConfig flightConfig(BenchConfig config) {
        FlightConfig flight = FlightConfig.of(InstrumentModel.demo().flight());
        flight.table = config.table();
        flight.parameters = config.parameters();
        flight.frameLength = config.frameLength();
        flight.hvEnabledAtStart = true; // as the bench: the simulator, by explicit configuration
        return flight;
    }

    /**
     * Every spectrum packet as the independent ground decoder reads it: mode, sweep, first window,
     * window count, gain tag and ADC samples of every window (the fields the comparison is about).
     */
    static List<String> spectra(byte[] tm) {
        List<String> out = new ArrayList<>();
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                new DecodeListener() {
                    @Override
                    public void onSpectrum(DecodedSpectrum s) {
                        out.add(s.mode() + " sweep " + s.sweep() + " windows " + s.firstWindow() + "+" + s.windowCount()
                                + " gains " + Arrays.toString(s.gainRange()) + " adc "
                                + Arrays.deepToString(s.adcCounts()));
                    }
                });
        d.accept(tm, 0, tm.length);
        d.finish();
        return out;
    }
}
