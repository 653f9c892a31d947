package org.cellwright.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** The equation parser on good and bad equations, with a small hand-made library (no file I/O). */
class ReactionEquationTest {

    private static Species ion(String name, int z, Map<String, Integer> elements) {
        return new Species(name, z, 0.001, 1e-9, 0.0, elements, Map.of());
    }

    private static final ChemLibrary LIB = new ChemLibrary(
            List.of(ion("H+", 1, Map.of("H", 1)), ion("OH-", -1, Map.of("O", 1, "H", 1)),
                    ion("Cl-", -1, Map.of("Cl", 1)), ion("Cu2+", 2, Map.of("Cu", 1)),
                    ion("Sn2+", 2, Map.of("Sn", 1)), ion("Sn4+", 4, Map.of("Sn", 1)),
                    ion("Fe2+", 2, Map.of("Fe", 1)), ion("Fe3+", 3, Map.of("Fe", 1)),
                    ion("SO4^2-", -2, Map.of("S", 1, "O", 4)), ion("Cl2", 0, Map.of("Cl", 2)),
                    ion("X+", 1, Map.of())),
            List.of(new Metal("Cu", 0.063546, 8960, DepositClass.INTERMEDIATE, Map.of()),
                    new Metal("Sn", 0.11871, 7287, DepositClass.NORMAL, Map.of())),
            List.of(), List.of(), List.of());

    private static Participant find(ReactionEquation eq, String name) {
        return eq.participants().stream().filter(p -> p.name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void metalDeposition() {
        ReactionEquation eq = ReactionEquation.parseElectrode("Cu2+ + 2e- = Cu", LIB);
        assertEquals(2, eq.electrons());
        assertEquals(2, eq.participants().size());
        assertEquals(new Participant("Cu2+", -1, Phase.DISSOLVED), find(eq, "Cu2+"));
        assertEquals(new Participant("Cu", 1, Phase.SOLID), find(eq, "Cu"));
    }

    @Test
    void oxygenWithWaterAndGas() {
        ReactionEquation eq = ReactionEquation.parseElectrode("O2 + 4H+ + 4e- = 2H2O", LIB);
        assertEquals(4, eq.electrons());
        assertEquals(new Participant("O2", -1, Phase.GAS), find(eq, "O2"));
        assertEquals(new Participant("H+", -4, Phase.DISSOLVED), find(eq, "H+"));
        assertEquals(new Participant("H2O", 2, Phase.WATER), find(eq, "H2O"));
    }

    @Test
    void waterReduction() {
        ReactionEquation eq = ReactionEquation.parseElectrode("2H2O + 2e- = H2 + 2OH-", LIB);
        assertEquals(2, eq.electrons());
        assertEquals(-2, eq.coefficientOf("H2O"));
        assertEquals(new Participant("H2", 1, Phase.GAS), find(eq, "H2"));
        assertEquals(2, eq.coefficientOf("OH-"));
    }

    @Test
    void chlorineGasOnTheElectrodeButDissolvedInTheBulk() {
        ReactionEquation gas = ReactionEquation.parseElectrode("Cl2 + 2e- = 2Cl-", LIB);
        assertEquals(Phase.GAS, find(gas, "Cl2").phase());
        assertEquals(2, gas.coefficientOf("Cl-"));
        ReactionEquation dissolved = ReactionEquation.parseElectrode("Cl2(aq) + 2e- = 2Cl-", LIB);
        assertEquals(Phase.DISSOLVED, find(dissolved, "Cl2").phase());
        ReactionEquation bulk = ReactionEquation.parseHomogeneous("Cl2 + Sn2+ -> Sn4+ + 2Cl-", LIB);
        assertEquals(0, bulk.electrons());
        assertEquals(Phase.DISSOLVED, find(bulk, "Cl2").phase());
        assertEquals(-1, bulk.coefficientOf("Sn2+"));
        assertEquals(1, bulk.coefficientOf("Sn4+"));
    }

    @Test
    void redoxCoupleAndVariantNotation() {
        ReactionEquation eq = ReactionEquation.parseElectrode("Sn++++ + 2e- = Sn++", LIB);
        assertEquals(-1, eq.coefficientOf("Sn4+"));
        assertEquals(1, eq.coefficientOf("Sn2+"));
        ReactionEquation spaced = ReactionEquation.parseElectrode("Cu^2+ +2 e- = Cu", LIB);
        assertEquals(2, spaced.electrons());
        ReactionEquation bulk = ReactionEquation.parseHomogeneous("2 Fe3+ + Sn2+ \u2192 2 Fe2+ + Sn4+", LIB);
        assertEquals(-2, bulk.coefficientOf("Fe3+"));
        assertEquals(2, bulk.coefficientOf("Fe2+"));
    }

    @Test
    void chargeImbalanceIsNamed() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> ReactionEquation.parseElectrode("Cu2+ + e- = Cu", LIB));
        assertTrue(e.getMessage().contains("charge does not balance"), e.getMessage());
        assertTrue(e.getMessage().contains("+1 on the left"), e.getMessage());
    }

    @Test
    void elementImbalanceIsNamed() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> ReactionEquation.parseElectrode("O2 + 4H+ + 4e- = H2O", LIB));
        assertTrue(e.getMessage().contains("elements do not balance"), e.getMessage());
        assertTrue(e.getMessage().contains("O 2 on the left, 1 on the right"), e.getMessage());
    }

    @Test
    void elementBalanceIsSkippedWhenACompositionIsUnknown() {
        // X+ has no elemental composition: only the charge can be checked
        ReactionEquation eq = ReactionEquation.parseElectrode("X+ + e- = H2", LIB);
        assertEquals(1, eq.electrons());
    }

    @Test
    void otherMistakes() {
        assertMessage("Cu = Cu2+ + 2e-", true, "electrons on the right");
        assertMessage("Cu2+ + 2e- Cu", true, "no '='");
        assertMessage("Cu2+ + 2e- -> Cu", true, "written with '='");
        assertMessage("Zn2+ + 2e- = Zn", true, "unknown species 'Zn2+'");
        assertMessage("Cu2+ + 2e- = ", true, "right side is empty");
        assertMessage("Cu2+ + + 2e- = Cu", true, "term is missing");
        assertMessage("Fe3+ = Fe2+", true, "no electrons");
        assertMessage("Fe3+ + e- -> Fe2+", false, "electrons in a homogeneous reaction");
        assertMessage("Cu2+ + 2.5e- = Cu", true, "whole number");
        assertMessage("H+ + e- = H+", true, "both sides");
        assertMessage("", true, "empty");
    }

    private static void assertMessage(String text, boolean electrode, String fragment) {
        var e = assertThrows(IllegalArgumentException.class, () -> {
            if (electrode) {
                ReactionEquation.parseElectrode(text, LIB);
            } else {
                ReactionEquation.parseHomogeneous(text, LIB);
            }
        });
        assertTrue(e.getMessage().contains(fragment), "'" + text + "' -> " + e.getMessage());
    }
}
