package org.cellwright.sim.deposit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.cellwright.chem.DepositClass;
import org.junit.jupiter.api.Test;

/** The Winand bands of {@link Morphology}, class by class. */
class MorphologyTest {

    @Test
    void intermediateMetalsFollowTheIndustrialCopperBands() {
        // source: industrial copper is kept at or below 0.30-0.35 of its limiting current to stay compact;
        // nodules from about 0.35, dendrites toward the limit, powder at it (Winand 1992; Ibl 1962; physics
        // reference section 9; from memory)
        assertEquals(DepositForm.COMPACT, Morphology.classify(0.30, DepositClass.INTERMEDIATE, false));
        assertEquals(DepositForm.ROUGH, Morphology.classify(0.45, DepositClass.INTERMEDIATE, false));
        assertEquals(DepositForm.DENDRITIC, Morphology.classify(0.8, DepositClass.INTERMEDIATE, false));
        assertEquals(DepositForm.POWDERY, Morphology.classify(0.99, DepositClass.INTERMEDIATE, false));
    }

    @Test
    void normalMetalsWithoutAdditivesAreNeverCompact() {
        // source: Winand's "normal" metals (Sn, Pb, Ag, Zn from simple salts) give coarse isolated crystals and
        // dendrites without inhibitors (physics reference section 9, class table; from memory)
        for (double r = 0; r < 1; r += 0.01) {
            DepositForm f = Morphology.classify(r, DepositClass.NORMAL, false);
            assertEquals(r < 0.35 ? DepositForm.ROUGH : r < 0.95 ? DepositForm.DENDRITIC : DepositForm.POWDERY, f,
                    "r = " + r);
        }
        // with additives they deposit like intermediate metals (zinc: normal in simple salts, intermediate in
        // sulfate with additives; physics reference section 9)
        assertEquals(DepositForm.COMPACT, Morphology.classify(0.2, DepositClass.NORMAL, true));
    }

    @Test
    void inertMetalsStayFineGrainedUntilSpongeAtTheLimit() {
        assertEquals(DepositForm.COMPACT, Morphology.classify(0.5, DepositClass.INERT, false));
        assertEquals(DepositForm.ROUGH, Morphology.classify(0.9, DepositClass.INERT, false));
        assertEquals(DepositForm.POWDERY, Morphology.classify(0.97, DepositClass.INERT, true));
        assertEquals(DepositForm.COMPACT, Morphology.classify(Double.NaN, DepositClass.INERT, false));
    }

    @Test
    void namesAreTheContractsNames() {
        assertEquals("compact rough dendritic powdery", String.join(" ",
                java.util.Arrays.stream(DepositForm.values()).map(DepositForm::key).toList()));
    }
}
