package dev.sweepline.ground.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.Hex;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DecodeCommandTest {
    @TempDir
    Path dir;

    private JsonNode summary(Path out) throws IOException {
        return new ObjectMapper().readTree(out.resolve("summary.json").toFile());
    }

    private List<CSVRecord> csv(Path out) throws IOException {
        try (Reader r = Files.newBufferedReader(out.resolve("spectra.csv"))) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }

    @Test
    void shouldWriteOneCsvRowPerWindowOfTheGoldenSpectrum() throws IOException {
        Path in = Files.write(dir.resolve("golden.tm"), Hex.stream(GoldenFrames.STREAM));
        Path out = dir.resolve("out");
        // exit 0: input read (GroundMain doc)
        assertEquals(0, GroundMain.run("decode", in.toString(), "--out", out.toString()));
        List<CSVRecord> rows = csv(out);
        // one spectrum of 16 windows (GoldenFrames.SPECTRUM_PACKET)
        assertEquals(16, rows.size());
        CSVRecord w45 = rows.get(5);
        assertEquals("45", w45.get("window"));
        assertEquals("survey", w45.get("mode"));
        assertEquals("0x100", w45.get("apid"));
        assertEquals("2026-01-01T00:00:10.500000", w45.get("time_tai"));
        assertEquals("1", w45.get("gain_range"));
        // python3 (756-256) * 40e-12*32/65279 (ICD §4); printed with Double.toString, so 1e-12 relative
        assertEquals(9.804071753550145e-12, Double.parseDouble(w45.get("q1_amps")), 9.8e-24);
        assertEquals(1.6235542823879043e-11, Double.parseDouble(w45.get("total_amps")), 1.6e-23);
        assertEquals("1", rows.get(8).get("saturated")); // window 48 (GoldenFrames)
        JsonNode s = summary(out);
        // detected L = 128 (the golden frames), 6 good frames, 1 spectrum, 4 housekeeping (GoldenFrames)
        assertEquals(128, s.get("frameLength").asInt());
        assertTrue(s.get("frameLengthDetected").asBoolean());
        assertEquals(6, s.get("framesGood").asInt());
        assertEquals(1, s.get("spectra").get("survey").asInt());
        assertEquals(0, s.get("spectra").get("focus").asInt());
        assertEquals(169 * 8, s.get("bits").get("0x100").asInt());
        assertEquals(4, s.get("packets").get("0x110").asInt());
        // earliest T0 + 0.25 s (HK seq 42), latest T0 + 12.25 s (HK seq 45): 12 s span
        assertEquals("2026-01-01T00:00:00.250000", s.get("timeSpan").get("firstTai").asText());
        assertEquals("2025-12-31T23:59:23.250000Z", s.get("timeSpan").get("firstUtc").asText());
        assertEquals(12.0, s.get("timeSpan").get("seconds").asDouble(), 0.0);
    }

    @Test
    void shouldCountEveryFaultInSummaryJsonAndStillExitZero() throws IOException {
        BadInputStream b = new BadInputStream();
        Path in = Files.write(dir.resolve("bad.tm"), b.bytes);
        Path out = dir.resolve("bad");
        assertEquals(0, GroundMain.run("decode", in.toString(), "--out", out.toString(), "--frame-length", "1024"));
        JsonNode s = summary(out);
        JsonNode bad = s.get("framesBad");
        // one bit flip, one truncated last frame, one garbage run of 17 octets (BadInputStream)
        assertEquals(1, bad.get("BAD_CRC").asInt());
        assertEquals(1, bad.get("TRUNCATED").asInt());
        assertEquals(1, bad.get("GARBAGE_BEFORE_SYNC").asInt());
        assertEquals(BadInputStream.GARBAGE, s.get("garbageOctets").asInt());
        // every other frame decodes: all but flipped, removed, truncated
        assertEquals(b.frameCount() - 3, s.get("framesGood").asInt());
        // the flipped and the removed frame are missing from the MC count; one VC gap each (ICD §2)
        JsonNode gaps = s.get("gaps");
        assertEquals(2, gaps.get("masterChannelFramesMissing").asInt());
        assertEquals(2, gaps.get("frameGapCount").asInt());
        assertEquals(2, gaps.get("framesMissing").asInt());
        assertEquals(b.flippedVc, gaps.get("frameGaps").get(0).get("vc").asInt());
        assertEquals(b.removedVc, gaps.get("frameGaps").get(1).get("vc").asInt());
        // the command report claiming 1000 octets too many: flagged once
        assertEquals(1, s.get("packetAnomalies").get("LENGTH_BEYOND_DATA").asInt());
        // spectra and housekeeping on surviving frames all come out; the lost ones show as sequence gaps
        assertEquals(b.survivingSpectra, s.get("spectra").get("survey").asInt());
        assertEquals(b.survivingSpectra, s.get("packets").get("0x100").asInt());
        assertEquals(b.survivingHousekeeping, s.get("housekeeping").asInt());
        assertEquals(b.spectraLostBeforeLastSurvivor, sequenceGapsOf(gaps, "0x100"));
        assertTrue(b.spectraLostBeforeLastSurvivor > 0 && b.survivingSpectra < 24, "the faults must cost spectra");
        assertEquals(b.survivingSpectra * 128, csv(out).size());
    }

    private static int sequenceGapsOf(JsonNode gaps, String apid) {
        int n = 0;
        for (JsonNode g : gaps.get("packetSequenceGaps")) {
            n += g.get("apid").asText().equals(apid) ? g.get("missing").asInt() : 0;
        }
        return n;
    }

    @Test
    void shouldDetectTheDefaultLengthOfTheBadStream() throws IOException {
        BadInputStream b = new BadInputStream();
        Path in = Files.write(dir.resolve("bad.tm"), b.bytes);
        Path out = dir.resolve("auto");
        assertEquals(0, GroundMain.run("decode", in.toString(), "--out", out.toString()));
        // built with L = 1024 (ICD §1 default), found despite the faults
        assertEquals(1024, summary(out).get("frameLength").asInt());
        assertEquals(b.frameCount() - 3, summary(out).get("framesGood").asInt());
    }

    @Test
    void shouldExitNonZeroOnlyForUnreadableInput() throws IOException {
        // exit 4, an input error, for a missing file (ExitCodes), no exception
        assertEquals(ExitCodes.INPUT, GroundMain.run("decode", dir.resolve("missing.tm").toString(), "--out",
                dir.toString()));
        assertEquals(ExitCodes.INPUT, GroundMain.run("inspect", dir.toString()));
        // an empty or all-garbage file is readable: exit 0, counted as garbage
        Path junk = Files.write(dir.resolve("junk.tm"), new byte[] {1, 2, 3, 4, 5});
        assertEquals(0, GroundMain.run("decode", junk.toString(), "--out", dir.resolve("j").toString()));
        assertEquals(5, summary(dir.resolve("j")).get("garbageOctets").asInt());
    }

    @Test
    void shouldCountRepeatedStaleAndForeignFramesInSummaryJsonWithoutDuplicateRows() throws IOException {
        // 8 survey spectra of 128 windows: 6 + 6 + 14 + 32 + 16 + 1 + 4 × (2 + 256) = 1107 octets (ICD §3, §4),
        // so each spans two frames of 1016 data octets (ICD §1 default L = 1024)
        dev.sweepline.ground.decode.FrameStreamBuilder b = new dev.sweepline.ground.decode.FrameStreamBuilder(1024);
        int c = 128;
        for (int s = 0; s < 8; s++) {
            int[][] adc = new int[4][c];
            for (int q = 0; q < 4; q++) {
                java.util.Arrays.fill(adc[q], 300 + s + q);
            }
            b.add(0, dev.sweepline.ground.decode.TestPackets.spectrum(0x100, s, BadInputStream.T0 + s, 0, s, 0,
                    new int[c], new boolean[c], adc));
        }
        b.flush(0);
        List<byte[]> frames = new java.util.ArrayList<>(b.frames());
        frames.add(3, frames.get(2).clone()); // a repeat (ICD §10: DUPLICATE)
        frames.add(6, frames.get(1).clone()); // a copy four counts behind (STALE)
        frames.add(8, dev.sweepline.ground.decode.FrameStreamBuilder.withVcid(frames.get(7), 4)); // VCID 4 unused (ICD §2)
        Path in = Files.write(dir.resolve("repeats.tm"), dev.sweepline.ground.decode.FrameStreamBuilder.stream(frames));
        Path out = dir.resolve("repeats");
        assertEquals(0, GroundMain.run("decode", in.toString(), "--out", out.toString(), "--frame-length", "1024"));
        JsonNode s = summary(out);
        assertEquals(1, s.get("framesDropped").get("DUPLICATE").asInt());
        assertEquals(1, s.get("framesDropped").get("STALE").asInt());
        assertEquals(1, s.get("framesBad").get("UNKNOWN_VCID").asInt());
        assertEquals(0, s.get("vcRestarts").asInt());
        assertEquals(0, s.get("gaps").get("frameGapCount").asInt());
        assertEquals(0, s.get("gaps").get("packetsMissing").asInt());
        assertEquals(0, s.get("gaps").get("masterChannelFramesMissing").asInt());
        // every spectrum once: 8 × 128 rows, one per window
        assertEquals(8, s.get("spectra").get("survey").asInt());
        assertEquals(8 * c, csv(out).size());
    }
}
