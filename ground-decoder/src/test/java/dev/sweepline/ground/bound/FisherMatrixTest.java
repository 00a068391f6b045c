package dev.sweepline.ground.bound;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.fit.ReferenceCase;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

class FisherMatrixTest {
    private static CramerRaoBound reference() {
        double[] s = new double[ReferenceCase.WINDOWS];
        Arrays.fill(s, ReferenceCase.SIGMA);
        return FisherMatrix.protons(ReferenceCase.low(), ReferenceCase.high(), s, ReferenceCase.AREA,
                ReferenceCase.DENSITY, ReferenceCase.SPEED, ReferenceCase.thermalSpeed());
    }

    @Test
    void shouldReproduceTheReferenceFiguresOfPhysicsMd() {
        CramerRaoBound b = reference();
        assertFalse(b.singular());
        // physics.md "Cramér–Rao bound": σ_n 0.0861 %, σ_U 0.0073 %, σ_w 0.1028 %; tolerance half a unit of
        // the last digit given (the figures are rounded to it)
        assertEquals(0.0861, 100 * b.sigmaDensity() / ReferenceCase.DENSITY, 0.00005);
        assertEquals(0.0073, 100 * b.sigmaSpeed() / ReferenceCase.SPEED, 0.00005);
        assertEquals(0.1028, 100 * b.sigmaThermalSpeed() / ReferenceCase.thermalSpeed(), 0.00005);
        // σ_T/T = 2σ_w/w (physics.md)
        assertEquals(2 * 0.1028e-2 * ReferenceCase.TEMPERATURE,
                b.sigmaTemperature(0, ReferenceCase.thermalSpeed(), ReferenceCase.TEMPERATURE), 0.001e-2 * 1e5);
    }

    @Test
    void shouldFlagASingularWindowSet() {
        // two windows cannot pin down three parameters: F has rank 2 (physics.md: "A singular F means the
        // window set cannot pin down (n, U, w)")
        double[] lo = {800, 870};
        double[] hi = {870, 940};
        CramerRaoBound b = FisherMatrix.protons(lo, hi, new double[] {1e-14, 1e-14}, 1e-4, 5e6, 400e3, 40.6e3);
        assertTrue(b.singular());
        assertTrue(Double.isNaN(b.sigmaDensity()));
        // three copies of one window carry one window's information: rank 1, singular
        double[] lo3 = {800, 800, 800};
        double[] hi3 = {870, 870, 870};
        assertTrue(FisherMatrix.protons(lo3, hi3, new double[] {1e-14, 1e-14, 1e-14}, 1e-4, 5e6, 400e3,
                40.6e3).singular());
    }

    @Test
    void shouldScaleAsTheNoise() {
        // F ∝ 1/σ², so the bound ∝ σ (definition of F, physics.md): doubling σ doubles every bound
        double[] s = new double[ReferenceCase.WINDOWS];
        Arrays.fill(s, 2 * ReferenceCase.SIGMA);
        CramerRaoBound b2 = FisherMatrix.protons(ReferenceCase.low(), ReferenceCase.high(), s, ReferenceCase.AREA,
                ReferenceCase.DENSITY, ReferenceCase.SPEED, ReferenceCase.thermalSpeed());
        assertEquals(2 * reference().sigmaSpeed(), b2.sigmaSpeed(), 1e-9 * b2.sigmaSpeed());
    }
}
