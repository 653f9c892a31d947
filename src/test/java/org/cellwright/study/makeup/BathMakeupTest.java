package org.cellwright.study.makeup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** Bath make-up against hand-computed stoichiometry, and the solubility and hydrolysis flags. */
class BathMakeupTest {

    private static Compound c(String formula) {
        return CompoundTable.find(formula).orElseThrow();
    }

    private static Feed.Add grams(String formula, double g) {
        return new Feed.Add("add", c(formula), g * 1e-3 / c(formula).molarMassKgPerMol(), g + " g " + formula);
    }

    private static Feed.Add mol(String formula, double mol) {
        return new Feed.Add("add", c(formula), mol, mol + " mol " + formula);
    }

    private static double netCharge(MakeupResult r) {
        double net = 0;
        for (Map.Entry<String, Double> e : r.compositionMolPerM3().entrySet()) {
            net += Ions.charge(e.getKey()) * e.getValue();
        }
        return net;
    }

    @Test
    void tinAndIronDissolvedInHydrochloricAcid() {
        // 233 mL of 32 % HCl at 1.159 g/mL: 233 x 1.159 x 0.32 / 36.458 = 2.370263 mol
        double hcl = 233 * 1.159 * 0.32 / 36.458;
        Feed feed = new Feed("tin", 1.2e-3, 298.15, List.of(mol("HCl", hcl),
                new Feed.Dissolve("dissolve[1]", "Sn", 0.030, null, null),
                new Feed.Dissolve("dissolve[2]", "Fe", 0.0018, "HCl", null)));
        MakeupResult r = BathMakeup.compute(feed);
        Map<String, Double> c = r.compositionMolPerM3();
        // source: hand stoichiometry with IUPAC weights: Sn 30 / 118.71 = 0.252717 mol, Fe 1.8 / 55.845 =
        // 0.0322321 mol; each takes 2 H+ (Sn + 2 HCl -> SnCl2 + H2): H+ 2.370263 - 0.505433 - 0.064464 =
        // 1.800366 mol in 1.2 L = 1.500305 mol/L; Cl- 2.370263 / 1.2 = 1.975219 mol/L; Sn2+ 0.210597 mol/L
        assertEquals(1500.305, c.get("H+"), 0.002);
        assertEquals(1975.219, c.get("Cl-"), 0.002);
        assertEquals(210.597, c.get("Sn2+"), 0.001);
        assertEquals(26.8601, c.get("Fe2+"), 0.0001);
        // H2: one mole per mole of metal, 0.284949 mol
        assertEquals(0.284949, r.gasMol().get("H2"), 1e-6);
        assertEquals(0, netCharge(r), 1e-9);
        assertEquals(List.of("Sn2+", "Fe2+", "H+", "Cl-"), List.copyOf(c.keySet()));
        assertTrue(r.flags().isEmpty(), r.flags().toString());
    }

    @Test
    void copperInNitricAcid() {
        // 100 mL of 65 % HNO3 at 1.391 g/mL: 100 x 1.391 x 0.65 / 63.012 = 1.43490 mol
        double hno3 = 100 * 1.391 * 0.65 / 63.012;
        MakeupResult r = BathMakeup.compute(new Feed("cu", 1e-3, 298.15, List.of(mol("HNO3", hno3),
                new Feed.Dissolve("dissolve[1]", "Cu", 0.010, null, null))));
        // source: 3 Cu + 8 HNO3 -> 3 Cu(NO3)2 + 2 NO + 4 H2O; Cu 10 / 63.546 = 0.157366 mol uses 8/3 of it in H+
        // (0.419642) and reduces 2/3 of it in NO3- (0.104911) to NO
        assertEquals((hno3 - 0.419642) * 1000, r.compositionMolPerM3().get("H+"), 0.01);
        assertEquals((hno3 - 0.104911) * 1000, r.compositionMolPerM3().get("NO3-"), 0.01);
        assertEquals(157.366, r.compositionMolPerM3().get("Cu2+"), 0.001);
        assertEquals(0.104911, r.gasMol().get("NO"), 1e-6);
        assertEquals(0, netCharge(r), 1e-9);
    }

    @Test
    void leadSulfateComesDownInASulfateBath() {
        MakeupResult r = BathMakeup.compute(new Feed("pb", 1e-3, 298.15, List.of(grams("Pb(NO3)2", 0.5),
                mol("H2SO4", 0.5))));
        // source: K_sp PbSO4 2.53e-8 (CRC, 25 C); Pb 0.5 / 331.208 = 1.509625e-3 mol/L, SO4 0.5 mol/L;
        // x = ((a + b) - sqrt((a - b)^2 + 4 Ksp)) / 2 = 1.509574e-3 mol/L, x 303.256 g/mol = 0.457787 g
        assertEquals(1, r.precipitates().size());
        assertEquals("PbSO4", r.precipitates().get(0).compound().name());
        assertEquals(0.457787e-3, r.precipitates().get(0).kg(), 1e-9);
        // what stays dissolved: Ksp / SO4 = 5.1e-8 mol/L
        assertEquals(2.53e-8 / 0.498490 * 1000, r.compositionMolPerM3().get("Pb2+"), 1e-9);
        assertTrue(r.flags().get(0).startsWith("lead sulfate: "), r.flags().toString());
        assertEquals(0, netCharge(r), 1e-9);
    }

    @Test
    void leadChlorideComesDownAndItsEquilibriumHolds() {
        MakeupResult r = BathMakeup.compute(new Feed("pb", 1e-3, 298.15, List.of(grams("Pb(NO3)2", 10),
                grams("NaCl", 5.844))));
        // source: K_sp PbCl2 1.70e-5 (CRC, 25 C); a = 10 / 331.208 = 0.0301926, b = 0.1 mol/L; by hand
        // (bisection on (a - x)(b - 2x)^2 = Ksp) x = 0.02394 mol/L, 6.66 g of PbCl2 (278.10 g/mol)
        double x = r.precipitates().get(0).kg() / 0.278100;
        assertEquals(0.02394, x, 2e-5);
        double pb = r.compositionMolPerM3().get("Pb2+") / 1000;
        double cl = r.compositionMolPerM3().get("Cl-") / 1000;
        assertEquals(1.70e-5, pb * cl * cl, 1e-12);
        assertTrue(r.flags().stream().anyMatch(f -> f.startsWith("lead chloride: ")), r.flags().toString());
        assertEquals(0, netCharge(r), 1e-9);
    }

    @Test
    void silverChlorideIsFlaggedEvenFromATraceOfChloride() {
        MakeupResult r = BathMakeup.compute(new Feed("ag", 1e-3, 298.15, List.of(grams("AgNO3", 50),
                grams("NaCl", 0.01))));
        assertTrue(r.flags().get(0).startsWith("silver chloride: "), r.flags().toString());
        // source: 0.01 / 58.44 = 1.7112e-4 mol Cl-, nearly all of it leaves as AgCl (143.32 g/mol): 24.5 mg
        assertEquals(24.52e-6, r.precipitates().get(0).kg(), 0.05e-6);
    }

    @Test
    void stannousHydrolysisIsFlaggedByTheAcidity() {
        // sulfate: 30 g/L SnSO4 with 10 g/L free H2SO4 is below 30 g/L; 100 g/L is not
        MakeupResult low = BathMakeup.compute(new Feed("s", 1e-3, 298.15, List.of(grams("SnSO4", 30),
                grams("H2SO4", 10))));
        assertTrue(low.flags().stream().anyMatch(f -> f.startsWith("stannous hydrolysis: 10.0 g/L")), low.flags().toString());
        assertTrue(BathMakeup.compute(new Feed("s", 1e-3, 298.15, List.of(grams("SnSO4", 30),
                grams("H2SO4", 100)))).flags().isEmpty());
        // chloride: 0.3 mol/L HCl is below 0.5 mol/L, 1 mol/L is not
        MakeupResult cl = BathMakeup.compute(new Feed("c", 1e-3, 298.15, List.of(grams("SnCl2·2H2O", 40),
                mol("HCl", 0.3))));
        assertTrue(cl.flags().stream().anyMatch(f -> f.contains("Sn(OH)Cl")), cl.flags().toString());
        assertTrue(BathMakeup.compute(new Feed("c", 1e-3, 298.15, List.of(grams("SnCl2·2H2O", 40),
                mol("HCl", 1.0)))).flags().isEmpty());
        MakeupResult fe = BathMakeup.compute(new Feed("f", 1e-3, 298.15, List.of(grams("SnCl2·2H2O", 40),
                mol("HCl", 1.0), grams("FeCl3·6H2O", 2))));
        assertTrue(fe.flags().stream().anyMatch(f -> f.startsWith("Fe3+ oxidises Sn2+")), fe.flags().toString());
    }

    @Test
    void stepsThatCannotBeDoneSayWhy() {
        IllegalArgumentException short1 = assertThrows(IllegalArgumentException.class, () -> BathMakeup.compute(
                new Feed("t", 1e-3, 298.15, List.of(mol("HCl", 0.4), new Feed.Dissolve("dissolve[1]", "Sn", 0.030,
                        null, null)))));
        // source: 30 g Sn = 0.252717 mol takes 0.5054 mol H+
        assertTrue(short1.getMessage().startsWith("dissolve[1]: dissolving 30.00 g of Sn takes 0.5054 mol of H+"),
                short1.getMessage());
        assertThrows(IllegalArgumentException.class, () -> BathMakeup.compute(new Feed("t", 1e-3, 298.15,
                List.of(new Feed.Dissolve("dissolve[1]", "Sn", 0.01, null, null)))));
        assertThrows(IllegalArgumentException.class, () -> BathMakeup.compute(new Feed("t", 1e-3, 298.15,
                List.of(mol("HCl", 1), mol("H2SO4", 1), new Feed.Dissolve("d", "Sn", 0.01, null, null)))));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> BathMakeup.compute(new Feed("t", 1e-3, 298.15,
                List.of(mol("HCl", 1), new Feed.Dissolve("d", "Cu", 0.01, null, null))))).getMessage()
                .contains("oxidant"));
        assertThrows(IllegalArgumentException.class, () -> BathMakeup.compute(new Feed("t", 1e-3, 298.15,
                List.of(grams("NaCl", 1), new Feed.Filter("filter[1]", c("AgCl"), 0.001)))));
        // a residue declared as filtered off (the solution below its solubility product afterwards)
        MakeupResult filtered = BathMakeup.compute(new Feed("t", 1e-3, 298.15, List.of(grams("Pb(NO3)2", 1),
                mol("HCl", 0.05), new Feed.Filter("filter[1]", c("PbCl2"), 0.5e-3))));
        // source: 0.5 g PbCl2 / 278.10 g/mol = 1.7979e-3 mol leaves with 3.5958e-3 mol Cl-; Pb 1 / 331.208 =
        // 3.0193e-3 mol less 1.7979e-3
        assertEquals(50 - 3.5958, filtered.compositionMolPerM3().get("Cl-"), 1e-3);
        assertEquals(3.0193 - 1.7979, filtered.compositionMolPerM3().get("Pb2+"), 1e-3);
        assertTrue(filtered.precipitates().isEmpty());
    }
}
