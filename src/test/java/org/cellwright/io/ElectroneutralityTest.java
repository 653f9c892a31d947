package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;

/** The electroneutrality warning: threshold, net charge and the ions it advises adding. */
class ElectroneutralityTest {

    private final SpeciesResolver species = new SpeciesResolver(LibraryFixture.library(), List.of());

    private static Map<String, Double> bath(Object... nameAndMolPerL) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < nameAndMolPerL.length; i += 2) {
            m.put((String) nameAndMolPerL[i], ((Number) nameAndMolPerL[i + 1]).doubleValue() * 1000);
        }
        return m;
    }

    @Test
    void balancedBathsPass() {
        // CuSO4 + H2SO4 written as ions: 2(0.5) + 1.0 - 2(1.0) = 0
        assertEquals(Optional.empty(), Electroneutrality.check(bath("Cu2+", 0.5, "H+", 1.0, "SO4^2-", 1.0), species));
        // 9 % off (0.09 / 1.0 of the total charge) is within the 10 % tolerance
        assertEquals(Optional.empty(), Electroneutrality.check(bath("Na+", 0.545, "Cl-", 0.455), species));
    }

    @Test
    void excessCationsAskForAnionsAlreadyInTheBathFirst() {
        // net charge: 2 x 0.3 + 1.5 - 1.0 = 1.1 mol/L of 3.1 mol/L total (35 %); 1.1 mol/L Cl- or 0.55 mol/L SO4^2-
        String msg = Electroneutrality.check(bath("Sn2+", 0.3, "H+", 1.5, "Cl-", 1.0), species).orElseThrow();
        assertEquals("the composition is not electroneutral: the ions carry a net positive charge of 1.10 mol/L "
                + "(35 % of the total ionic charge); add anions, e.g. 1.10 mol/L Cl- or 0.550 mol/L SO4^2-", msg);
    }

    @Test
    void excessAnionsAskForCations() {
        // net charge: 2 x 1.0 - 2 x 1.5 = -1.0 mol/L of 5.0 mol/L total (20 %); Cu2+ is in the bath: 0.5 mol/L of it
        String msg = Electroneutrality.check(bath("Cu2+", 1.0, "SO4^2-", 1.5), species).orElseThrow();
        assertTrue(msg.contains("net negative charge of 1.00 mol/L (20 % of the total ionic charge); add cations, "
                + "e.g. 0.500 mol/L Cu2+ or 1.00 mol/L H+"), msg);
    }
}
