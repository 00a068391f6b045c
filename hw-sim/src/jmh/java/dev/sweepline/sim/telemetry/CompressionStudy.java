package dev.sweepline.sim.telemetry;

import java.io.ByteArrayOutputStream;
import java.util.List;
import java.util.Locale;

/**
 * The size half of the compression study, reproducible without JMH: bits per 16-bit sample of each coder on
 * the simulated spectra of {@link SpectrumCorpus}, per scenario and overall, against the order-0 entropy of
 * the CCSDS 121 mapped residuals. Speeds come from {@link CompressionStudyBenchmark}.
 *
 * <p>Run: {@code mvn -q -pl hw-sim -am test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=dev.sweepline.sim.telemetry.CompressionStudy}.
 */
public final class CompressionStudy {
    /** The coders of the study: ours, java.util.zip deflate at levels 1, 6, 9, zstd at 1, 3, 19. */
    public static final List<String> CODECS =
            List.of("rice", "deflate-1", "deflate-6", "deflate-9", "zstd-1", "zstd-3", "zstd-19");

    private CompressionStudy() {
    }

    /** Prints the table. */
    public static void main(String[] args) {
        System.out.print(table(SpectrumCorpus.simulate()));
    }

    /** Bits per sample of {@code codec} over the spectra of {@code scenario} (null: all). */
    public static double bitsPerSample(SpectrumCorpus corpus, String codec, String scenario) {
        SpectrumCodec c = SpectrumCodec.named(codec);
        long octets = 0;
        long samples = 0;
        for (int k = 0; k < corpus.size(); k++) {
            if (scenario == null || scenario.equals(corpus.scenario(k))) {
                octets += c.compress(corpus.quadrants(k), corpus.raw(k));
                samples += corpus.samples(k);
            }
        }
        return 8.0 * octets / samples;
    }

    /** The entropy of the mapped residuals of {@code scenario}'s quadrant streams (null: all). */
    public static ResidualEntropy entropy(SpectrumCorpus corpus, String scenario) {
        ResidualEntropy h = new ResidualEntropy();
        for (int k = 0; k < corpus.size(); k++) {
            if (scenario == null || scenario.equals(corpus.scenario(k))) {
                for (int[] stream : corpus.quadrants(k)) {
                    h.add(stream);
                }
            }
        }
        return h;
    }

    /** The whole table as text. */
    public static String table(SpectrumCorpus corpus) {
        StringBuilder b = new StringBuilder();
        List<String> scenarios = SpectrumCorpus.SCENARIOS;
        b.append(String.format(Locale.ROOT, "Compression study: %d spectra, %d samples (%d raw octets), seed %d%n",
                corpus.size(), corpus.samples(), 2 * corpus.samples(), SpectrumCorpus.SEED));
        b.append(String.format(Locale.ROOT, "%-34s", "bits per 16-bit sample"));
        for (String s : scenarios) {
            b.append(String.format(Locale.ROOT, " %17s", s));
        }
        b.append(String.format(Locale.ROOT, " %9s%n", "all"));
        for (String codec : CODECS) {
            b.append(String.format(Locale.ROOT, "%-34s", codec + " (one call per spectrum)"));
            for (String s : scenarios) {
                b.append(String.format(Locale.ROOT, " %17.3f", bitsPerSample(corpus, codec, s)));
            }
            b.append(String.format(Locale.ROOT, " %9.3f%n", bitsPerSample(corpus, codec, null)));
        }
        row(b, corpus, "entropy H0 of mapped residuals", false);
        row(b, corpus, "bound: refs 16 b + H0 residuals", true);
        b.append(String.format(Locale.ROOT, "%-34s", "rice / bound (target <= 1.08)"));
        for (String s : scenarios) {
            b.append(String.format(Locale.ROOT, " %17.3f", riceOverBound(corpus, s)));
        }
        b.append(String.format(Locale.ROOT, " %9.3f%n", riceOverBound(corpus, null)));
        b.append(String.format(Locale.ROOT, "whole corpus in one call (no packet boundaries): deflate-9 %.3f, "
                + "zstd-19 %.3f bits/sample%n", wholeCorpus(corpus, "deflate-9"), wholeCorpus(corpus, "zstd-19")));
        ResidualEntropy pooled = entropy(corpus, null);
        b.append(String.format(Locale.ROOT, "H0 over %d residuals, %d distinct values: first-order finite-sample "
                + "bias of the plug-in H0 about +%.3f bits%n", pooled.residuals(), pooled.occupiedSymbols(),
                pooled.finiteSampleBiasBits()));
        double rice = bitsPerSample(corpus, "rice", null);
        double bound = entropy(corpus, null).bitsPerSampleWithReferences();
        b.append(String.format(Locale.ROOT, "targets: rice/deflate-9 size %.3f (<= 1), rice/bound %.3f (<= 1.08), "
                + "rice/H0 %.3f%n", rice / bitsPerSample(corpus, "deflate-9", null), rice / bound,
                rice / entropy(corpus, null).bitsPerResidual()));
        return b.toString();
    }

    /** Rice bits per sample over the entropy bound (16-bit references + H0 of the residuals), one scenario or all. */
    public static double riceOverBound(SpectrumCorpus corpus, String scenario) {
        return bitsPerSample(corpus, "rice", scenario) / entropy(corpus, scenario).bitsPerSampleWithReferences();
    }

    private static void row(StringBuilder b, SpectrumCorpus corpus, String label, boolean withReferences) {
        b.append(String.format(Locale.ROOT, "%-34s", label));
        for (String s : SpectrumCorpus.SCENARIOS) {
            ResidualEntropy h = entropy(corpus, s);
            b.append(String.format(Locale.ROOT, " %17.3f",
                    withReferences ? h.bitsPerSampleWithReferences() : h.bitsPerResidual()));
        }
        ResidualEntropy all = entropy(corpus, null);
        b.append(String.format(Locale.ROOT, " %9.3f%n",
                withReferences ? all.bitsPerSampleWithReferences() : all.bitsPerResidual()));
    }

    /** A general-purpose coder given the whole corpus at once: what packet boundaries cost it. */
    private static double wholeCorpus(SpectrumCorpus corpus, String codec) {
        ByteArrayOutputStream all = new ByteArrayOutputStream();
        for (int k = 0; k < corpus.size(); k++) {
            all.writeBytes(corpus.raw(k));
        }
        byte[] raw = all.toByteArray();
        long octets;
        if (codec.startsWith("zstd")) {
            octets = com.github.luben.zstd.Zstd.compress(raw, Integer.parseInt(codec.substring(5))).length;
        } else {
            java.util.zip.Deflater d = new java.util.zip.Deflater(Integer.parseInt(codec.substring(8)), true);
            d.setInput(raw);
            d.finish();
            byte[] out = new byte[raw.length + 1024];
            octets = 0;
            while (!d.finished()) {
                octets += d.deflate(out);
            }
            d.end();
        }
        return 8.0 * octets / corpus.samples();
    }
}
