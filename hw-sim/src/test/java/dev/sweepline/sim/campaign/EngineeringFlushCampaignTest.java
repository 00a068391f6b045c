package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.TelemetryFigures;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The engineering flush as a campaign axis (campaigns/FORMAT.md; commands.md §4.1 engineeringFlushSeconds). */
class EngineeringFlushCampaignTest {
    private static final Path CAMPAIGN = Path.of("src/main/resources/campaigns/engineering-flush.yaml");

    @Test
    void shouldSendTheSameEngineeringPacketsInFewerFrameBitsAtTheLongerFlush() {
        CampaignSpec spec = CampaignReader.load(CAMPAIGN);
        assertEquals(2, spec.setCount()); // engineering-flush.yaml: engineeringFlushSeconds [10, 60]
        TelemetryFigures ten = ClosedLoopBench.run(CampaignRunner.config(spec, 0, 0), ClosedLoopBench.Progress.NONE)
                .summary().telemetry();
        TelemetryFigures minute = ClosedLoopBench.run(CampaignRunner.config(spec, 1, 0), ClosedLoopBench.Progress.NONE)
                .summary().telemetry();
        assertEquals(10.0, ten.flushIntervalSeconds()); // the grid's values, in force on VC 1
        assertEquals(60.0, minute.flushIntervalSeconds());
        TelemetryFigures.VcFill a = ten.virtualChannels().get("engineering");
        TelemetryFigures.VcFill b = minute.virtualChannels().get("engineering");
        // the packets do not depend on the flush; the frames that carry them do
        assertEquals(a.packetBitsPerSecond(), b.packetBitsPerSecond(), 1e-9);
        assertTrue(b.frameBitsPerSecond() < a.frameBitsPerSecond(),
                b.frameBitsPerSecond() + " bit/s at 60 s against " + a.frameBitsPerSecond() + " at 10 s");
        assertTrue(b.fill() > a.fill());
        assertEquals(ten.virtualChannels().get("science").frameBitsPerSecond(),
                minute.virtualChannels().get("science").frameBitsPerSecond(), 1e-9); // VC 0 keeps the build's flush
        System.out.printf("engineering VC: %.1f bit/s of frames for %.1f bit/s of packets at 10 s; %.1f at 60 s%n",
                a.frameBitsPerSecond(), a.packetBitsPerSecond(), b.frameBitsPerSecond());
    }
}
