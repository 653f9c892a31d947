package org.cellwright.study.makeup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Formulas, hydrates and molar masses against hand sums of the IUPAC abridged atomic weights. */
class CompoundTest {

    /**
     * source: IUPAC (CIAAW) abridged standard atomic weights 2021 - H 1.008, N 14.007, O 15.999, Na 22.990,
     * S 32.06, Cl 35.45, Fe 55.845, Ni 58.693, Cu 63.546, Zn 65.38, Ag 107.87, Sn 118.71, Pb 207.2 - summed by
     * hand (H2O = 18.015, SO4 = 96.056, NO3 = 62.004). Tolerance: rounding of the last written digit.
     */
    @ParameterizedTest
    @CsvSource({
        "SnCl2·2H2O, 225.640", "SnSO4, 214.766", "CuSO4·5H2O, 249.677", "ZnSO4·7H2O, 287.541",
        "NiSO4·6H2O, 262.839", "NiCl2·6H2O, 237.683", "FeSO4·7H2O, 278.006", "FeCl3·6H2O, 270.285",
        "AgNO3, 169.874", "Pb(NO3)2, 331.208", "NaCl, 58.440", "Na2SO4, 142.036", "HCl, 36.458",
        "H2SO4, 98.072", "HNO3, 63.012", "PbSO4, 303.256", "PbCl2, 278.100", "AgCl, 143.320"})
    void molarMassesAreTheSumsOfTheAtomicWeights(String formula, double gPerMol) {
        Compound c = CompoundTable.find(formula).orElseThrow();
        assertEquals(gPerMol, c.molarMassKgPerMol() * 1000, 6e-4, formula);
    }

    @Test
    void hydratesMayBeWrittenWithADotAStarOrNothing() {
        assertEquals(5, CompoundTable.find("CuSO4.5H2O").orElseThrow().water());
        assertEquals(5, CompoundTable.find("CuSO4*5H2O").orElseThrow().water());
        assertEquals(0, CompoundTable.find("CuSO4").orElseThrow().water());
        assertEquals("CuSO4·5H2O", CompoundTable.find("CuSO4 · 5H2O").orElseThrow().name());
        assertEquals(Map.of("Fe3+", 1, "Cl-", 3), CompoundTable.find("FeCl3·6H2O").orElseThrow().ions());
        assertEquals(Map.of("H+", 2, "SO4^2-", 1), CompoundTable.find("H2SO4").orElseThrow().ions());
        assertTrue(CompoundTable.find("H2SO4·2H2O").isEmpty(), "acids have no water of crystallisation");
        assertTrue(CompoundTable.find("CuSO4·5H20").isEmpty(), "a zero is not an O");
        assertTrue(CompoundTable.find("KMnO4").isEmpty());
    }

    @Test
    void formulasWithParenthesesAndHydrates() {
        assertEquals(Map.of("Pb", 1, "N", 2, "O", 6), Formula.elements("Pb(NO3)2"));
        assertEquals(Map.of("Cu", 1, "S", 1, "O", 9, "H", 10), Formula.elements("CuSO4·5H2O"));
        assertThrows(IllegalArgumentException.class, () -> Formula.elements("Pb(NO3"));
        assertThrows(IllegalArgumentException.class, () -> Formula.elements("cuso4"));
        assertThrows(IllegalArgumentException.class, () -> AtomicWeights.kgPerMol("Xx"));
    }

    @Test
    void everyDissolutionRouteConservesAtomsAndCharge() {
        String[][] routes = {{"Sn", "HCl"}, {"Sn", "H2SO4"}, {"Zn", "HCl"}, {"Zn", "H2SO4"}, {"Fe", "HCl"},
            {"Ni", "H2SO4"}, {"Pb", "HCl"}, {"Pb", "HNO3"}, {"Cu", "HNO3"}, {"Ag", "HNO3"}};
        for (String[] r : routes) {
            DissolutionRoute d = DissolutionRoute.of(r[0], r[1], null);
            // charge: the ion's charge comes from the H+ used less the nitrate reduced
            assertEquals(Ions.charge(d.ion()), d.protons() - d.nitrate(), 1e-12, d.toString());
            if ("HNO3".equals(r[1])) {
                // N: each NO3- reduced leaves as NO; O: 3 per NO3- = 1 per NO + 2 in water; H: 2 per water
                assertEquals(d.nitrate(), d.gasPerMetal(), 1e-12, d.toString());
                assertEquals(2 * (2 * d.nitrate()), d.protons(), 1e-12, d.toString());
            } else {
                // H: the H+ used leave as H2
                assertEquals(d.protons(), 2 * d.gasPerMetal(), 1e-12, d.toString());
            }
        }
        DissolutionRoute cu = DissolutionRoute.of("Cu", "H2SO4", "H2O2");
        assertEquals(2, cu.protons(), 0.0);
        assertEquals(null, cu.gas());
    }

    @Test
    void metalsThatDoNotDissolveSoAreRefusedWithTheReason() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DissolutionRoute.of("Cu", "HCl", null))
                .getMessage().contains("oxidant"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DissolutionRoute.of("Sn", "HNO3", null))
                .getMessage().contains("metastannic"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DissolutionRoute.of("Pb", "H2SO4", null))
                .getMessage().contains("PbSO4"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> DissolutionRoute.of("Ag", "HCl", null))
                .getMessage().contains("HNO3"));
        assertThrows(IllegalArgumentException.class, () -> DissolutionRoute.of("Zn", "HCl", "H2O2"));
        assertThrows(IllegalArgumentException.class, () -> DissolutionRoute.of("Au", "HCl", null));
    }
}
