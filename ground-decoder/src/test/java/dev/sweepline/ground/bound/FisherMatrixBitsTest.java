package dev.sweepline.ground.bound;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;
import org.junit.jupiter.api.Test;

/**
 * {@link FisherMatrix#bound(double[][])} against the path it shortens, to the bit: the reference is
 * Hipparchus itself, its SingularValueDecomposition of the unit-diagonal scaled F and its solver's inverse
 * (svd.getSolver().getInverse(), as the bound took it before), with the same condition number and singular
 * decision. The matrices: random symmetric positive-definite F of sizes 3 to 7 with eigenvalues spread to
 * condition numbers from 1 to past {@link FisherMatrix#SINGULAR_CONDITION}, and diagonals spread over 40
 * decades as the parameters' units spread them (m⁻³ against m/s). {@link FisherMatrix#information} against
 * the sum over every element that it mirrors.
 */
class FisherMatrixBitsTest {
    /** Recorded seed (common practice: a failure repeats). */
    private static final long SEED = 4_2026_1202L;

    @Test
    void shouldGiveTheSolversBitsForEverySize() {
        Random r = new Random(SEED);
        int singular = 0;
        int regular = 0;
        for (int t = 0; t < 6000; t++) {
            int n = 3 + t % 5;
            // log10 of the scaled condition: 0 to 13, a third of them within a decade of SINGULAR_CONDITION
            double decades = t % 3 == 0 ? 11 + 2 * r.nextDouble() : 13 * r.nextDouble();
            double[][] f = randomFisher(r, n, decades);
            CramerRaoBound b = FisherMatrix.bound(f);
            Reference ref = reference(f);
            assertEquals(ref.singular, b.singular(), "singular, n = " + n + ", cond " + ref.cond);
            assertEquals(Double.doubleToLongBits(ref.cond), Double.doubleToLongBits(b.conditionNumber()), "cond");
            for (int a = 0; a < n; a++) {
                assertEquals(Double.doubleToLongBits(ref.sigma[a]), Double.doubleToLongBits(b.sigma()[a]),
                        "sigma " + a + " of n = " + n + ", cond " + ref.cond + ": " + ref.sigma[a] + " vs " + b.sigma()[a]);
            }
            if (ref.singular) {
                singular++;
            } else {
                regular++;
            }
        }
        // both sides of the threshold were met (a check on the generator, not on the bound)
        assertEquals(true, singular > 300 && regular > 3000, singular + " singular, " + regular + " regular");
    }

    @Test
    void informationShouldBeTheFullSum() {
        // the reference: Σ_j J_ja J_jb / σ_j² over every (a, b), as information() summed it before it mirrored
        Random r = new Random(SEED + 1);
        for (int t = 0; t < 500; t++) {
            int n = 3 + t % 5;
            int windows = 5 + r.nextInt(120);
            double[][] jac = new double[windows][n];
            double[] sigma = new double[windows];
            for (int j = 0; j < windows; j++) {
                sigma[j] = Math.pow(10, -14 + 4 * r.nextDouble());
                for (int a = 0; a < n; a++) {
                    jac[j][a] = r.nextGaussian() * Math.pow(10, -30 + 20 * r.nextDouble());
                }
            }
            double[][] full = new double[n][n];
            for (int j = 0; j < windows; j++) {
                double w = 1 / (sigma[j] * sigma[j]);
                for (int a = 0; a < n; a++) {
                    for (int b = 0; b < n; b++) {
                        full[a][b] += jac[j][a] * jac[j][b] * w;
                    }
                }
            }
            double[][] f = FisherMatrix.information(jac, sigma);
            for (int a = 0; a < n; a++) {
                for (int b = 0; b < n; b++) {
                    assertEquals(Double.doubleToLongBits(full[a][b]), Double.doubleToLongBits(f[a][b]), "F " + a + b);
                }
            }
        }
    }

    /** The bound as it was computed before: Hipparchus' SVD and its solver's inverse. */
    private static Reference reference(double[][] f) {
        int n = f.length;
        double[] scale = new double[n];
        for (int a = 0; a < n; a++) {
            scale[a] = 1 / Math.sqrt(f[a][a]);
        }
        double[][] s = new double[n][n];
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                s[a][b] = f[a][b] * scale[a] * scale[b];
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(s, false));
        double cond = svd.getConditionNumber();
        double[] sigma = new double[n];
        if (!(cond < FisherMatrix.SINGULAR_CONDITION)) {
            java.util.Arrays.fill(sigma, Double.NaN);
            return new Reference(sigma, true, cond);
        }
        RealMatrix inv = svd.getSolver().getInverse();
        for (int a = 0; a < n; a++) {
            sigma[a] = Math.sqrt(inv.getEntry(a, a)) * scale[a];
        }
        return new Reference(sigma, false, cond);
    }

    private record Reference(double[] sigma, boolean singular, double cond) {
    }

    /** Q Λ Qᵀ, Q orthogonal from the QR of a Gaussian matrix, λ log-spaced over {@code decades}, then D F D. */
    static double[][] randomFisher(Random r, int n, double decades) {
        double[][] g = new double[n][n];
        for (double[] row : g) {
            for (int j = 0; j < n; j++) {
                row[j] = r.nextGaussian();
            }
        }
        RealMatrix q = new QRDecomposition(new Array2DRowRealMatrix(g)).getQ();
        double[] lambda = new double[n];
        for (int k = 0; k < n; k++) {
            lambda[k] = Math.pow(10, -decades * k / (n - 1));
        }
        double[] d = new double[n];
        for (int a = 0; a < n; a++) {
            d[a] = Math.pow(10, 20 * (2 * r.nextDouble() - 1));
        }
        double[][] f = new double[n][n];
        for (int a = 0; a < n; a++) {
            for (int b = 0; b <= a; b++) {
                double s = 0;
                for (int k = 0; k < n; k++) {
                    s += q.getEntry(a, k) * lambda[k] * q.getEntry(b, k);
                }
                f[a][b] = s * d[a] * d[b];
                f[b][a] = f[a][b];
            }
        }
        return f;
    }
}
