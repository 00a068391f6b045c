package dev.sweepline.ground.instrument;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import org.junit.jupiter.api.Test;

class BuiltInInstrumentsTest {
    @Test
    void shouldReadEveryBuiltInOfTheIndex() {
        // instruments/index.txt lists demo-cup and fine-cup, in that order
        assertEquals(List.of("demo-cup", "fine-cup"), BuiltInInstruments.names());
        InstrumentSet all = InstrumentSet.builtIns();
        assertEquals(2, all.all().size());
        assertSame(all.byId(1), BuiltInInstruments.demoCup()); // demo-cup.yaml: id 1
        assertEquals("fine-cup", all.byId(2).name()); // fine-cup.yaml: id 2
        assertNull(all.byId(7));
        assertEquals("instruments/demo-cup.yaml", BuiltInInstruments.demoCup().source());
        // telemetry ICD §4: layout-1 spectra are the demo cup's
        assertSame(BuiltInInstruments.demoCup(), all.layoutOne());
    }

    @Test
    void shouldDeriveTheDemoCupsValuesAsFormatMdGivesThem() {
        GroundInstrument d = BuiltInInstruments.demoCup();
        // FORMAT.md derived values, telemetry ICD §8: R = sqrt(1 cm² / (π × 0.9^4)) = 6.9653 mm (python3:
        // 6.965303500589584 mm); 1e-10 m is float round-off
        assertEquals(6.965303500589584e-3, d.geometry().apertureRadiusM(), 1e-10);
        assertEquals(1.0e-4, d.geometry().effectiveAreaM2(), 0.0); // demo-cup.yaml: 1.0 cm²
        assertEquals(0.6561, d.geometry().gridTransmission(), 1e-12); // telemetry ICD §8: 0.90^4
        // telemetry ICD §8: full acceptance up to θ = 20.25° (python3: 20.25304045635847°)
        assertEquals(20.25304045635847, Math.toDegrees(Math.atan(d.geometry().fullAcceptanceTan())), 1e-9);
        // telemetry ICD §8: first window low code round(10 × 50) = 500, last high code round(10 × 6000)
        DefaultWindowTable t = d.windows();
        assertEquals(128, t.windows()); // demo-cup.yaml windows.count
        assertEquals(500, t.lowCode(0));
        assertEquals(60000, t.highCode(127));
        // python3 round(10*50*120**(1/128)) = 519, round(10*50*120**(40/128)) = 2232
        assertEquals(519, t.highCode(0));
        assertEquals(2232, t.edgeCode(40));
        // telemetry ICD §8 calibration: 0.100150 V × code − 0.8 V: 49.275 V and 6008.2 V; 1e-9 V round-off
        assertEquals(49.275, t.lowVolts(0), 1e-9);
        assertEquals(6008.2, t.highVolts(127), 1e-9);
        assertEquals(1000, d.modulator().modulationPeriodMicros()); // demo-cup.yaml modulator
        assertEquals(60000, d.modulator().highestCode()); // FORMAT.md: ⌊6000 × 1000 / 100⌋
        // telemetry ICD §4: 16-bit ADC, pedestal 256, ranges 40 pA × 32^r; 1e-12 relative round-off
        assertEquals(16, d.sampleBits());
        assertEquals(65535, d.adc().topCode());
        assertEquals(256, d.adc().pedestalCounts());
        assertEquals(3, d.gains().ranges());
        assertEquals(40e-12, d.gains().fullScaleAmps(0), 40e-24);
        assertEquals(1.28e-9, d.gains().fullScaleAmps(1), 1.28e-21);
        assertEquals(40.96e-9, d.gains().fullScaleAmps(2), 40.96e-21);
        // telemetry ICD §8: R_f = 4 V / FS: 1e11 Ω on range 0
        assertEquals(1e11, d.gains().feedbackOhms(0), 1);
    }

    @Test
    void shouldDeriveTheFineCupsValues() {
        GroundInstrument f = InstrumentSet.builtIns().byName("fine-cup");
        // fine-cup.yaml: 256 windows 100-8000 V at 0.125 V per code; python3 round(8*100*80**(k/256)):
        // 800 (k = 0), 4431 (k = 100), 64000 (k = 256)
        DefaultWindowTable t = f.windows();
        assertEquals(256, t.windows());
        assertEquals(800, t.edgeCode(0));
        assertEquals(4431, t.edgeCode(100));
        assertEquals(64000, t.edgeCode(256));
        // FORMAT.md calibration: (1 − 0.001) × 0.125 V × code + 0.5 V; python3 100.4 V and 7992.5 V
        assertEquals(100.4, t.lowVolts(0), 1e-9);
        assertEquals(7992.5, t.highVolts(255), 1e-9);
        // FORMAT.md: top code 2^20 − 1
        assertEquals(20, f.sampleBits());
        assertEquals(1048575, f.adc().topCode());
        // fine-cup.yaml: 2 ranges 256× apart from 80 pA: 80 pA and 20.48 nA
        assertEquals(2, f.gains().ranges());
        assertEquals(20.48e-9, f.gains().fullScaleAmps(1), 20.48e-21);
        // python3 80e-12/(2**20-1-1024) = 7.636859685113182e-17 A per count on range 0
        assertEquals(7.636859685113182e-17, f.lsbAmps(0), 1e-29);
        // FORMAT.md: R = sqrt(0.5 cm² / (π × 0.92^3)); python3 4.520935643505324 mm
        assertEquals(4.520935643505324e-3, f.geometry().apertureRadiusM(), 1e-10);
        assertEquals(500, f.modulator().modulationPeriodMicros());
    }
}
