package org.cellwright.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.Test;

/** The sulfate equilibria conserve matter and satisfy their own equilibrium constants. */
class ElectrolyteSpeciationTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    @Test
    void copperInSulfuricAcidConservesHydrogenSulfateAndCopper() {
        // a copper-winning electrolyte: 0.7 mol/L CuSO4 in 1.8 mol/L H2SO4
        Map<String, Double> totals = Map.of("Cu2+", 700.0, "SO4^2-", 2500.0, "H+", 3600.0);
        ElectrolyteSpeciation s = ElectrolyteSpeciation.of(LIB, totals);
        double h = s.free().get("H+") + s.free().get("HSO4-");
        double sulfate = s.free().get("SO4^2-") + s.free().get("HSO4-") + s.pairedMolPerM3();
        double copper = s.free().get("Cu2+") + s.pairedMolPerM3();
        assertEquals(3600.0, h, 1e-6);
        assertEquals(2500.0, sulfate, 1e-6);
        assertEquals(700.0, copper, 1e-6);
        // the solution satisfies its equilibria at the final ionic strength
        double i = s.ionicStrengthMolPerL();
        double k2 = s.free().get("H+") / 1000 * s.free().get("SO4^2-") / 1000 / (s.free().get("HSO4-") / 1000);
        assertEquals(ElectrolyteSpeciation.bisulfateConstant(i), k2, 1e-6 * k2);
        double kPair = s.pairedMolPerM3() / 1000 / (s.free().get("Cu2+") / 1000 * s.free().get("SO4^2-") / 1000);
        assertEquals(ElectrolyteSpeciation.pairConstant(i), kPair, 1e-6 * kPair);
    }

    @Test
    void dilutePairingFollowsTheThermodynamicConstant() {
        // source: Smith & Martell (from memory), log K(CuSO4 ion pair) = 2.36 at I -> 0
        assertEquals(Math.pow(10, 2.36), ElectrolyteSpeciation.pairConstant(0), 1e-9);
        // source: CRC dissociation constants (from memory), pK2(H2SO4) = 1.99 at I -> 0
        assertEquals(Math.pow(10, -1.99), ElectrolyteSpeciation.bisulfateConstant(0), 1e-12);
        ElectrolyteSpeciation s = ElectrolyteSpeciation.of(LIB, Map.of("Cu2+", 0.01, "SO4^2-", 0.01));
        assertTrue(s.pairedMolPerM3() < 0.01 * 0.01, "10 umol/L CuSO4 is practically unpaired");
    }

    @Test
    void chlorideBathsAreLeftAlone() {
        Map<String, Double> totals = Map.of("Sn2+", 337.0, "H+", 1500.0, "Cl-", 2174.0);
        ElectrolyteSpeciation s = ElectrolyteSpeciation.of(LIB, totals);
        assertEquals(1500.0, s.free().get("H+"), 1e-12);
        // source: definition I = 1/2 sum c z^2 = 0.5 (0.337*4 + 1.5 + 2.174) = 2.511 mol/L
        assertEquals(2.511, s.ionicStrengthMolPerL(), 1e-9);
    }

    @Test
    void badCompositionsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> ElectrolyteSpeciation.of(LIB, Map.of("Xy+", 1.0)));
        assertThrows(IllegalArgumentException.class, () -> ElectrolyteSpeciation.of(LIB, Map.of("H+", -1.0)));
    }
}
