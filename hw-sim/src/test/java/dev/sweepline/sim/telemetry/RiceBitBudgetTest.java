package dev.sweepline.sim.telemetry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.IntStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The compression study's bit budget: its parts add up to what fsw-core's encoder writes, the per-block oracle
 * is no longer than the ICD coder, and it is no shorter than the entropy bound of its own option classes.
 */
class RiceBitBudgetTest {
    /** Simulated seconds per scenario of the small corpus: a few dozen spectra of each, survey and focus. */
    private static final double SMALL_CORPUS_SECONDS = 120;

    private static SpectrumCorpus corpus;

    @BeforeAll
    static void simulate() {
        corpus = SpectrumCorpus.simulate(SMALL_CORPUS_SECONDS);
    }

    @Test
    void shouldSplitStandardsSmallVectorTwoIntoItsParts() {
        // standards.md small vector 2 (n = 16, J = 16, r = 1): 1000, 1001, ..., 1015 -> 103e82492492492480, 9 octets
        RiceBitBudget b = new RiceBitBudget(16, 1);
        assertEquals(9, b.add(IntStream.range(1000, 1016).toArray()));
        assertEquals(4, b.idBits()); // ID 0001, fundamental sequence (first nibble of 0x10)
        assertEquals(16, b.referenceBits()); // 1000 = 0x03e8 raw after the ID
        assertEquals(15 * 3, b.residualDataBits()); // 15 residuals of mapped value 2, FS(2) = 001: 3 bits each
        assertEquals(7, b.fillBits()); // 4 + 16 + 45 = 65 bits, zero-filled to 72
        assertEquals(72, b.bits());
    }

    @Test
    void shouldCountAZeroBlockRunAsIdExtensionBitReferenceAndRunCodeword() {
        // standards.md small vector 1 (n = 16, J = 16, r = 1): 16 x 0x1234 -> 0091a4, 3 octets:
        // ID 0000 + '0' (zero block), reference 0x1234, FS(0) = '1' for a run of one block, 2 fill bits
        RiceBitBudget v = new RiceBitBudget(16, 1);
        int[] same = new int[16];
        java.util.Arrays.fill(same, 0x1234);
        assertEquals(3, v.add(same));
        assertEquals(5, v.idBits());
        assertEquals(16, v.referenceBits());
        assertEquals(1, v.zeroRunBits());
        assertEquals(2, v.fillBits());
        assertEquals(1, v.zeroBlocks());
    }

    @Test
    void shouldAddUpToTheFlightEncodersOctetsOnEveryScenario() {
        for (String scenario : SpectrumCorpus.SCENARIOS) {
            // budget() throws unless every stream's octets equal fsw-core's RiceEncoder with the same J and r
            RiceBitBudget b = CompressionStudy.budget(corpus, scenario, CompressionStudy.ICD_BLOCK_SIZE,
                    CompressionStudy.ICD_INTERVAL_BLOCKS);
            long parts = b.idBits() + b.referenceBits() + b.residualDataBits() + b.paddingDataBits()
                    + b.zeroRunBits() + b.fillBits();
            // the study's Rice codec (fsw-core's encoder with the ICD parameters), measured independently
            double measured = CompressionStudy.bitsPerSample(corpus, "rice", scenario) * b.samples();
            assertEquals(measured, parts, 1e-6, scenario);
            assertEquals(parts, b.bits(), scenario);
            assertTrue(b.fillBits() <= 7 * b.streams(), scenario); // at most 7 fill bits per stream (octet fill)
            assertEquals(16 * b.streams(), b.referenceBits(), scenario); // one reference a quadrant stream (ICD §4)
        }
    }

    @Test
    void shouldPoolTheSameResidualsAsTheEntropyBound() {
        for (String scenario : SpectrumCorpus.SCENARIOS) {
            RiceBitBudget b = CompressionStudy.budget(corpus, scenario, 8, 32);
            ResidualEntropy h = CompressionStudy.entropy(corpus, scenario);
            // two routes to N H0: the budget's class histograms pooled, and ResidualEntropy written apart
            assertEquals(h.bitsPerResidual() * h.residuals(), RiceBitBudget.empiricalBits(b.residualHistogram()),
                    1e-6 * h.residuals(), scenario);
            assertEquals(h.residuals(), b.residuals(), scenario);
            double excess = 0;
            for (int c = 0; c < RiceBitBudget.CLASSES; c++) {
                excess += b.excessOverIdeal(c, b.residualHistogram());
            }
            // the per-class excesses over the ideal lengths sum to the residual data bits minus N H0
            assertEquals(b.residualDataBits() - h.bitsPerResidual() * h.residuals(), excess, 1e-6 * h.residuals());
        }
    }

    @Test
    void shouldPutTheOracleBetweenTheEntropyBoundOfItsClassesAndTheIcdCoder() {
        for (String scenario : SpectrumCorpus.SCENARIOS) {
            long icd = CompressionStudy.budget(corpus, scenario, 8, 32).bits();
            long best = Long.MAX_VALUE;
            for (int j : CompressionStudy.BLOCK_SIZES) {
                for (int r = 256 / j; r >= 1; r /= 2) {
                    RiceBitBudget b = CompressionStudy.budget(corpus, scenario, j, r);
                    // Kraft + Gibbs (Cover & Thomas Thm 5.3.1): each class's data bits >= N_c H(p_c)
                    double lower = b.referenceBits() + b.idBits() + b.conditionalIdealBits();
                    assertTrue(lower <= b.bits(), scenario + " J " + j + " r " + r);
                    assertTrue(b.conditionalIdealBits() <= b.residualDataBits(), scenario + " J " + j + " r " + r);
                    best = Math.min(best, b.bits());
                }
            }
            assertTrue(best <= icd, scenario);
        }
    }

    @Test
    void shouldBracketTheEntropyBetweenPlugInAndBinnedEstimates() {
        ResidualEntropy h = CompressionStudy.entropy(corpus, null);
        // plug-in (lower estimate) <= binned (spread evenly in each bin: an upper estimate), finer bins lower
        assertTrue(h.bitsPerResidual() <= h.binnedBitsPerResidual(64));
        assertTrue(h.binnedBitsPerResidual(64) <= h.binnedBitsPerResidual(16));
        assertTrue(h.binnedBitsPerResidual(16) <= h.binnedBitsPerResidual(4));
        assertThrows(IllegalArgumentException.class, () -> h.binnedBitsPerResidual(3));
    }

    @Test
    void shouldRefuseBadParametersAndSamplesWithOneLineErrors() {
        assertThrows(IllegalArgumentException.class, () -> new RiceBitBudget(12, 1)); // J in {8,16,32,64} (standards.md)
        assertThrows(IllegalArgumentException.class, () -> new RiceBitBudget(8, 0)); // r in 1..4096 (standards.md)
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new RiceBitBudget(8, 1).add(new int[] {1, 65536}));
        assertTrue(e.getMessage().startsWith("sample 1 is 65536"), e.getMessage());
    }
}
