package dev.sweepline.sim.telemetry;

import dev.sweepline.fsw.compress.RiceEncoder;
import dev.sweepline.fsw.compress.RiceParameters;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;

/**
 * The size half of the compression study, reproducible without JMH: bits per 16-bit sample of each coder on
 * the simulated spectra of {@link SpectrumCorpus}, per scenario and overall, against the order-0 entropy of
 * the CCSDS 121 mapped residuals. Speeds come from {@link CompressionStudyBenchmark}. Then, per scenario,
 * where the Rice bits go ({@link RiceBitBudget}), how fair the entropy bound is, and the best any CCSDS 121
 * block size and reference interval could do with the ICD's stream layout; docs/compression-study.md
 * explains each figure.
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
        gapTable(b, corpus);
        fairnessTable(b, corpus);
        oracleTable(b, corpus);
        return b.toString();
    }

    /** The ICD's block size J for spectra (telemetry ICD §4). */
    static final int ICD_BLOCK_SIZE = 8;
    /** The ICD's reference sample interval r, blocks (telemetry ICD §4): one interval per quadrant stream. */
    static final int ICD_INTERVAL_BLOCKS = 32;
    /** Block sizes of CCSDS 121.0-B (standards.md). */
    static final int[] BLOCK_SIZES = {8, 16, 32, 64};
    /** Sub-bins per octave of the binned entropy the fairness table quotes. */
    static final int SUB_BINS_PER_OCTAVE = 16;
    private static final int MAX_WINDOWS = 256;

    /**
     * The bit budget of {@code scenario}'s quadrant streams (null: all) with block size J and interval r, each
     * stream checked against fsw-core's encoder: the same octets, or an exception naming the spectrum.
     */
    public static RiceBitBudget budget(SpectrumCorpus corpus, String scenario, int blockSize, int intervalBlocks) {
        RiceBitBudget budget = new RiceBitBudget(blockSize, intervalBlocks);
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(RiceBitBudget.BITS, blockSize, intervalBlocks, true,
                false, false), MAX_WINDOWS);
        byte[] out = new byte[(int) encoder.maxEncodedBytes(MAX_WINDOWS)];
        for (int k = 0; k < corpus.size(); k++) {
            if (scenario == null || scenario.equals(corpus.scenario(k))) {
                int[][] quadrants = corpus.quadrants(k);
                for (int q = 0; q < quadrants.length; q++) {
                    long model = budget.add(quadrants[q]);
                    int coded = encoder.encode(quadrants[q], 0, quadrants[q].length, out, 0);
                    if (coded != model) {
                        throw new IllegalStateException("spectrum " + k + " quadrant " + (q + 1) + ", J = " + blockSize
                                + ", r = " + intervalBlocks + ": encoder " + coded + " octets, bit budget " + model);
                    }
                }
            }
        }
        return budget;
    }

    /** The budget of the whole spectra as one stream each (quadrant 1..4 back to back): not the ICD's layout. */
    static RiceBitBudget oneStreamBudget(SpectrumCorpus corpus, String scenario) {
        RiceBitBudget budget = new RiceBitBudget(ICD_BLOCK_SIZE, 4 * MAX_WINDOWS / ICD_BLOCK_SIZE);
        for (int k = 0; k < corpus.size(); k++) {
            if (scenario == null || scenario.equals(corpus.scenario(k))) {
                int[][] quadrants = corpus.quadrants(k);
                int[] all = new int[corpus.samples(k)];
                int at = 0;
                for (int[] stream : quadrants) {
                    System.arraycopy(stream, 0, all, at, stream.length);
                    at += stream.length;
                }
                budget.add(all);
            }
        }
        return budget;
    }

    /** Where the ICD coder's bits go, per scenario: the parts add up to the coded octets exactly. */
    private static void gapTable(StringBuilder b, SpectrumCorpus corpus) {
        List<RiceBitBudget> budgets = new ArrayList<>();
        for (String s : columns()) {
            budgets.add(budget(corpus, s, ICD_BLOCK_SIZE, ICD_INTERVAL_BLOCKS));
        }
        b.append(String.format(Locale.ROOT, "%nWhere the Rice bits go (ICD: J = %d, r = %d; every block's shortest "
                + "option, checked against fsw-core's encoder stream by stream), bits per sample%n", ICD_BLOCK_SIZE,
                ICD_INTERVAL_BLOCKS));
        budgetRow(b, budgets, "reference samples (16 b each)", RiceBitBudget::referenceBits);
        budgetRow(b, budgets, "option IDs (4 b a block, +1 ext.)", RiceBitBudget::idBits);
        valueRow(b, "residuals at their H0 length", budgets,
                x -> RiceBitBudget.empiricalBits(x.residualHistogram()) / x.samples());
        valueRow(b, "Rice over H0: k <= 7, 2nd ext.", budgets, x -> excess(x, 0, 7) / x.samples());
        valueRow(b, "Rice over H0: k = 8..10", budgets, x -> excess(x, 8, 10) / x.samples());
        valueRow(b, "Rice over H0: k = 11..13, no compr.", budgets, x -> excess(x, 11, 13) / x.samples());
        budgetRow(b, budgets, "padding of the last partial block", RiceBitBudget::paddingDataBits);
        budgetRow(b, budgets, "zero-block runs", RiceBitBudget::zeroRunBits);
        budgetRow(b, budgets, "fill to the octet", RiceBitBudget::fillBits);
        budgetRow(b, budgets, "sum = coded octets x 8", RiceBitBudget::bits);
        valueRow(b, "gap to the bound (rice - bound)", budgets, x -> (x.bits() - boundBits(x)) / x.samples());
        valueRow(b, "rice / bound", budgets, x -> x.bits() / boundBits(x));
    }

    /** How optimistic the plug-in bound is, per scenario, bits per residual unless the label says otherwise. */
    private static void fairnessTable(StringBuilder b, SpectrumCorpus corpus) {
        List<String> cols = columns();
        b.append(String.format(Locale.ROOT, "%nHow fair the bound is: entropy estimates of the mapped residuals, bits "
                + "per residual%n"));
        List<ResidualEntropy> pooled = new ArrayList<>();
        List<RiceBitBudget> icd = new ArrayList<>();
        for (String s : cols) {
            pooled.add(entropy(corpus, s));
            icd.add(budget(corpus, s, ICD_BLOCK_SIZE, ICD_INTERVAL_BLOCKS));
        }
        entropyRow(b, "plug-in H0 (the bound's)", pooled, ResidualEntropy::bitsPerResidual);
        entropyRow(b, "  Miller first-order bias", pooled, ResidualEntropy::finiteSampleBiasBits);
        entropyRow(b, "  distinct values / residuals, %", pooled, h -> 100.0 * h.occupiedSymbols() / h.residuals());
        for (int sub : new int[] {SUB_BINS_PER_OCTAVE, 4 * SUB_BINS_PER_OCTAVE}) {
            entropyRow(b, "binned, " + sub + " bins per octave", pooled, h -> h.binnedBitsPerResidual(sub));
        }
        double[] perSpectrum = new double[cols.size()];
        for (int c = 0; c < cols.size(); c++) {
            perSpectrum[c] = perSpectrumBits(corpus, cols.get(c));
        }
        values(b, "per-spectrum plug-in H0", perSpectrum);
        valueRow(b, "plug-in H0 given the block's option", icd, x -> x.conditionalIdealBits() / x.residuals());
        double[] binnedRatio = new double[cols.size()];
        for (int c = 0; c < cols.size(); c++) {
            ResidualEntropy h = pooled.get(c);
            double binned = (16.0 * (h.samples() - h.residuals()) + h.binnedBitsPerResidual(SUB_BINS_PER_OCTAVE)
                    * h.residuals()) / h.samples();
            binnedRatio[c] = icd.get(c).bits() / (double) icd.get(c).samples() / binned;
        }
        values(b, "rice / bound, binned " + SUB_BINS_PER_OCTAVE + "/octave H", binnedRatio);
    }

    /** The best of every J and r of CCSDS 121 with the ICD's stream layout, every option tried in every block. */
    private static void oracleTable(StringBuilder b, SpectrumCorpus corpus) {
        List<String> cols = columns();
        b.append(String.format(Locale.ROOT, "%nBest CCSDS 121 configuration (ICD layout: 4 quadrant streams, n = 16, "
                + "basic set, unit-delay predictor; every option tried in every block): bits/sample, /bound, best r%n"));
        double[] best = new double[cols.size()];
        java.util.Arrays.fill(best, Double.MAX_VALUE);
        for (int j : BLOCK_SIZES) {
            b.append(String.format(Locale.ROOT, "%-34s", "J = " + j + " (ID floor " + 4.0 / j + " b/sample)"));
            StringBuilder overhead = new StringBuilder(String.format(Locale.ROOT, "%-34s", "  IDs + padding + fill"));
            for (int c = 0; c < cols.size(); c++) {
                RiceBitBudget bestBudget = null;
                int bestR = 0;
                for (int r = MAX_WINDOWS / j; r >= 1; r /= 2) { // on a tie the longest interval (the ICD's kind)
                    RiceBitBudget x = budget(corpus, cols.get(c), j, r);
                    if (bestBudget == null || x.bits() < bestBudget.bits()) {
                        bestBudget = x;
                        bestR = r;
                    }
                }
                double bits = bestBudget.bits() / (double) bestBudget.samples();
                double ratio = bits / entropy(corpus, cols.get(c)).bitsPerSampleWithReferences();
                best[c] = Math.min(best[c], ratio);
                b.append(String.format(Locale.ROOT, " %6.3f %5.3f r%-3d", bits, ratio, bestR));
                overhead.append(String.format(Locale.ROOT, c < cols.size() - 1 ? " %17.3f" : " %9.3f", (bestBudget.idBits() + bestBudget.paddingDataBits()
                        + bestBudget.fillBits()) / (double) bestBudget.samples()));
            }
            b.append(String.format(Locale.ROOT, "%n")).append(overhead).append(String.format(Locale.ROOT, "%n"));
        }
        values(b, "best rice / bound, any J and r", best);
        double[] allowance = new double[cols.size()];
        for (int c = 0; c < cols.size(); c++) {
            allowance[c] = 0.08 * entropy(corpus, cols.get(c)).bitsPerSampleWithReferences();
        }
        values(b, "the 8 % allowance, bits/sample", allowance);
        List<RiceBitBudget> one = new ArrayList<>();
        for (String s : cols) {
            one.add(oneStreamBudget(corpus, s));
        }
        valueRow(b, "J = 8, one stream a spectrum: /bound", one, x -> x.bits() / boundBits(x));
        valueRow(b, "  its padding + fill, b/sample", one,
                x -> (x.paddingDataBits() + x.fillBits()) / (double) x.samples());
    }

    private static List<String> columns() {
        List<String> cols = new ArrayList<>(SpectrumCorpus.SCENARIOS);
        cols.add(null);
        return cols;
    }

    /** The bound's bits for the budget's streams: 16 per reference + N H0 of its own residuals. */
    private static double boundBits(RiceBitBudget x) {
        return 16.0 * (x.samples() - x.residuals()) + RiceBitBudget.empiricalBits(x.residualHistogram());
    }

    private static double excess(RiceBitBudget x, int fromClass, int toClass) {
        long[] pooled = x.residualHistogram();
        double e = 0;
        for (int c = 0; c < RiceBitBudget.CLASSES; c++) {
            int group = c == RiceBitBudget.CLASS_SECOND_EXTENSION ? 0
                    : c == RiceBitBudget.CLASS_NO_COMPRESSION ? RiceBitBudget.MAX_K : c;
            if (group >= fromClass && group <= toClass) {
                e += x.excessOverIdeal(c, pooled);
            }
        }
        return e;
    }

    /** Bits per residual if each spectrum had its own plug-in H0 (its four quadrants pooled). */
    private static double perSpectrumBits(SpectrumCorpus corpus, String scenario) {
        double bits = 0;
        long residuals = 0;
        for (int k = 0; k < corpus.size(); k++) {
            if (scenario == null || scenario.equals(corpus.scenario(k))) {
                ResidualEntropy h = new ResidualEntropy();
                for (int[] stream : corpus.quadrants(k)) {
                    h.add(stream);
                }
                bits += h.bitsPerResidual() * h.residuals();
                residuals += h.residuals();
            }
        }
        return bits / residuals;
    }

    private static void budgetRow(StringBuilder b, List<RiceBitBudget> budgets, String label,
                                  Function<RiceBitBudget, Long> bits) {
        valueRow(b, label, budgets, x -> bits.apply(x) / (double) x.samples());
    }

    private static void valueRow(StringBuilder b, String label, List<RiceBitBudget> budgets,
                                 Function<RiceBitBudget, Double> value) {
        values(b, label, budgets.stream().mapToDouble(value::apply).toArray());
    }

    private static void entropyRow(StringBuilder b, String label, List<ResidualEntropy> hs,
                                   Function<ResidualEntropy, Double> value) {
        values(b, label, hs.stream().mapToDouble(value::apply).toArray());
    }

    /** One row: the scenarios' columns, then the narrower "all" column. */
    private static void values(StringBuilder b, String label, double[] v) {
        b.append(String.format(Locale.ROOT, "%-34s", label));
        for (int c = 0; c < v.length; c++) {
            b.append(String.format(Locale.ROOT, c < v.length - 1 ? " %17.3f" : " %9.3f", v[c]));
        }
        b.append(String.format(Locale.ROOT, "%n"));
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
