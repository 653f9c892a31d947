package org.cellwright.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.Test;

/**
 * Conductivity against handbook tables (HCl, H2SO4, NaCl, CuSO4; KCl standards), its temperature law, and the
 * Bruggeman correction. The error table printed by {@link #handbookTable()} is the one in docs/conductivity.md.
 *
 * <p>Tolerance per point: 10 % of the handbook value, the accuracy the model brief asks for between 0.1 and
 * 2 mol/L; it covers the three-figure handbook data, the densities used to convert mass % to mol/L (from
 * memory, about 0.2 %) and the simple form of the concentration correction (four fitted parameters for all
 * electrolytes). The mean absolute error is held to 4 %.
 */
class ConductivityTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();
    private static final double T20 = 293.15;
    private static final double T25 = 298.15;

    /** One handbook point: solute, concentration (mol/L), temperature (K), conductivity (mS/cm). */
    record Point(String solution, String label, double molPerL, double tempK, double mSPerCm) {
    }

    private static double molarMass(String... species) {
        double m = 0;
        for (String s : species) {
            m += LIB.findSpecies(s).orElseThrow().molarMassKgPerMol() * 1000;
        }
        return m;
    }

    /** mass % at 20 C to mol/L with the solution density (g/cm3). */
    private static Point massPercent(String solution, double percent, double densityGPerCm3, double mSPerCm) {
        double molarMass = switch (solution) {
            case "HCl" -> molarMass("H+", "Cl-");
            case "H2SO4" -> molarMass("H+", "HSO4-");
            case "NaCl" -> molarMass("Na+", "Cl-");
            case "CuSO4" -> molarMass("Cu2+", "SO4^2-");
            default -> throw new IllegalArgumentException(solution);
        };
        double molPerL = percent / 100 * densityGPerCm3 * 1000 / molarMass;
        return new Point(solution, String.format(Locale.ROOT, "%.1f %% at 20 C", percent), molPerL, T20, mSPerCm);
    }

    /** KCl standard given per kg of water: mol/L from the solution density (g/cm3). */
    private static Point kclStandard(double molPerKg, double tempK, double densityGPerCm3, double mSPerCm) {
        double molarMass = molarMass("K+", "Cl-") / 1000;
        double molPerL = molPerKg * densityGPerCm3 / (1 + molPerKg * molarMass);
        return new Point("KCl", String.format(Locale.ROOT, "%.2f mol/kg at %.0f C", molPerKg, tempK - 273.15),
                molPerL, tempK, mSPerCm);
    }

    private static Point at25(String solution, double molPerL, double mSPerCm) {
        return new Point(solution, String.format(Locale.ROOT, "%.3f mol/L at 25 C", molPerL), molPerL, T25, mSPerCm);
    }

    static List<Point> handbookPoints() {
        List<Point> p = new ArrayList<>();
        // Mass % points: CRC Handbook, "Electrical conductivity of aqueous solutions" (20 C; 70th ed. p. D-221,
        // after Wolf, Aqueous Solutions and Body Fluids, 1966). Densities at 20 C: CRC Handbook, "Concentrative
        // properties of aqueous solutions" (from memory).
        // source: CRC conductivity table, HCl 0.5 % = 45.1 mS/cm (seen in a copy of the table); density 1.0007
        p.add(massPercent("HCl", 0.5, 1.0007, 45.1));
        // source: CRC conductivity table, HCl 1 % = 92.9 mS/cm (seen); density 1.0031
        p.add(massPercent("HCl", 1, 1.0031, 92.9));
        // source: CRC conductivity table, HCl 2 % = 183 mS/cm (seen); density 1.0081
        p.add(massPercent("HCl", 2, 1.0081, 183));
        // source: CRC conductivity table, HCl 5 % = 394 mS/cm (from memory); density 1.0228
        p.add(massPercent("HCl", 5, 1.0228, 394));
        // source: CRC conductivity table, HCl 10 % = 630 mS/cm (from memory); density 1.0474
        p.add(massPercent("HCl", 10, 1.0474, 630));
        // source: CRC conductivity table, H2SO4 0.5 % = 24.3 mS/cm (from memory); density 1.0016
        p.add(massPercent("H2SO4", 0.5, 1.0016, 24.3));
        // source: CRC conductivity table, H2SO4 1 % = 47.8 mS/cm (from memory); density 1.0049
        p.add(massPercent("H2SO4", 1, 1.0049, 47.8));
        // source: CRC conductivity table, H2SO4 5 % = 211 mS/cm (from memory); density 1.0317
        p.add(massPercent("H2SO4", 5, 1.0317, 211));
        // source: CRC conductivity table, H2SO4 10 % = 392 mS/cm (from memory); density 1.0661
        p.add(massPercent("H2SO4", 10, 1.0661, 392));
        // source: CRC conductivity table, H2SO4 15 % = 543 mS/cm (from memory); density 1.1020
        p.add(massPercent("H2SO4", 15, 1.1020, 543));
        // source: CRC conductivity table, H2SO4 20 % = 653 mS/cm (from memory); density 1.1394
        p.add(massPercent("H2SO4", 20, 1.1394, 653));
        // source: CRC conductivity table, NaCl 0.5 % = 8.2 mS/cm (from memory); density 1.0018
        p.add(massPercent("NaCl", 0.5, 1.0018, 8.2));
        // source: CRC conductivity table, NaCl 1 % = 16.0 mS/cm (from memory); density 1.0053
        p.add(massPercent("NaCl", 1, 1.0053, 16.0));
        // source: CRC conductivity table, NaCl 2 % = 30.2 mS/cm (from memory); density 1.0125
        p.add(massPercent("NaCl", 2, 1.0125, 30.2));
        // source: CRC conductivity table, NaCl 5 % = 70.1 mS/cm (from memory); density 1.0340
        p.add(massPercent("NaCl", 5, 1.0340, 70.1));
        // source: CRC conductivity table, NaCl 10 % = 126 mS/cm (from memory); density 1.0707
        p.add(massPercent("NaCl", 10, 1.0707, 126));
        // source: CRC conductivity table, NaCl 15 % = 171 mS/cm (from memory); density 1.1085
        p.add(massPercent("NaCl", 15, 1.1085, 171));
        // source: CRC conductivity table, CuSO4 0.5 % = 2.9 mS/cm (seen); density 1.0033
        p.add(massPercent("CuSO4", 0.5, 1.0033, 2.9));
        // source: CRC conductivity table, CuSO4 1 % = 5.4 mS/cm (seen); density 1.0086
        p.add(massPercent("CuSO4", 1, 1.0086, 5.4));
        // source: CRC conductivity table, CuSO4 2 % = 9.3 mS/cm (seen); density 1.0190
        p.add(massPercent("CuSO4", 2, 1.0190, 9.3));
        // source: CRC conductivity table, CuSO4 5 % = 19.0 mS/cm (seen); density 1.0511
        p.add(massPercent("CuSO4", 5, 1.0511, 19.0));
        // source: CRC conductivity table, CuSO4 10 % = 32.2 mS/cm (seen); density 1.1073
        p.add(massPercent("CuSO4", 10, 1.1073, 32.2));
        // source: CRC conductivity table, CuSO4 15 % = 42.3 mS/cm (seen); density 1.1675
        p.add(massPercent("CuSO4", 15, 1.1675, 42.3));
        // 25 C points: CRC Handbook, "Equivalent conductivity of electrolytes in aqueous solution", kappa = Lambda c
        // (the table's concentrations are in equivalents for 2:2 salts and H2SO4: 0.1 N = 0.05 mol/L).
        // source: CRC equivalent conductivity, HCl 0.1 mol/L, Lambda 391.1 (from memory)
        p.add(at25("HCl", 0.1, 39.11));
        // source: CRC equivalent conductivity, HCl 0.01 mol/L, Lambda 411.9 (from memory)
        p.add(at25("HCl", 0.01, 4.119));
        // source: CRC equivalent conductivity, NaCl 0.1 mol/L, Lambda 106.69 (seen in a data file citing CRC)
        p.add(at25("NaCl", 0.1, 10.669));
        // source: CRC equivalent conductivity, NaCl 0.01 mol/L, Lambda 118.45 (seen)
        p.add(at25("NaCl", 0.01, 1.1845));
        // source: CRC equivalent conductivity, 1/2 H2SO4 0.1 N, Lambda 250.8 (from memory)
        p.add(at25("H2SO4", 0.05, 25.08));
        // source: CRC equivalent conductivity, 1/2 H2SO4 0.01 N, Lambda 336.4 (from memory)
        p.add(at25("H2SO4", 0.005, 3.364));
        // source: CRC equivalent conductivity, 1/2 CuSO4 0.1 N, Lambda 50.6 (from memory)
        p.add(at25("CuSO4", 0.05, 5.06));
        // source: CRC equivalent conductivity, 1/2 CuSO4 0.01 N, Lambda 83.1 (from memory)
        p.add(at25("CuSO4", 0.005, 0.831));
        // KCl primary standards (Wu, Koch & Pratt, J. Res. NIST 1991; CRC table of standard KCl solutions), seen;
        // densities of KCl solutions: CRC concentrative properties (from memory)
        // source: 0.1 mol/kg KCl at 20 C = 11.6159 mS/cm; density 1.0029
        p.add(kclStandard(0.1, T20, 1.0029, 11.6159));
        // source: 0.1 mol/kg KCl at 25 C = 12.8246 mS/cm; density 1.0017
        p.add(kclStandard(0.1, T25, 1.0017, 12.8246));
        // source: 1.0 mol/kg KCl at 20 C = 99.17 mS/cm; density 1.0431
        p.add(kclStandard(1.0, T20, 1.0431, 99.17));
        // source: 1.0 mol/kg KCl at 25 C = 108.62 mS/cm; density 1.0418
        p.add(kclStandard(1.0, T25, 1.0418, 108.62));
        return p;
    }

    static Map<String, Double> composition(String solution, double molPerL) {
        double c = molPerL * 1000;
        Map<String, Double> m = new LinkedHashMap<>();
        switch (solution) {
            case "HCl" -> { m.put("H+", c); m.put("Cl-", c); }
            case "H2SO4" -> { m.put("H+", 2 * c); m.put("SO4^2-", c); }
            case "NaCl" -> { m.put("Na+", c); m.put("Cl-", c); }
            case "CuSO4" -> { m.put("Cu2+", c); m.put("SO4^2-", c); }
            case "KCl" -> { m.put("K+", c); m.put("Cl-", c); }
            default -> throw new IllegalArgumentException(solution);
        }
        return m;
    }

    static double modelMSPerCm(Point p) {
        return Conductivity.of(LIB, composition(p.solution(), p.molPerL()), p.tempK()) * 10;
    }

    @Test
    void handbookTable() {
        StringBuilder table = new StringBuilder(
                "| solution | point | c (mol/L) | handbook kappa (mS/cm) | Cellwright kappa (mS/cm) | error |\n"
                        + "|---|---|---:|---:|---:|---:|\n");
        double sumAbs = 0;
        List<String> failures = new ArrayList<>();
        for (Point p : handbookPoints()) {
            double model = modelMSPerCm(p);
            double error = model / p.mSPerCm() - 1;
            sumAbs += Math.abs(error);
            table.append(String.format(Locale.ROOT, "| %s | %s | %.4f | %.4g | %.4g | %+.1f %% |%n", p.solution(),
                    p.label(), p.molPerL(), p.mSPerCm(), model, 100 * error));
            if (Math.abs(error) > 0.10) {
                failures.add(p + String.format(Locale.ROOT, " model %.4g, error %+.1f %%", model, 100 * error));
            }
        }
        System.out.println(table);
        assertTrue(failures.isEmpty(), "points outside 10 %: " + failures);
        double meanAbs = sumAbs / handbookPoints().size();
        assertTrue(meanAbs < 0.04, "mean absolute error " + meanAbs);
    }

    @Test
    void temperatureCoefficientsNearTenMassPercent() {
        // source: temperature-coefficient table of a laboratory conductivity-meter manual (about 10 wt %, reference
        // 25 C): HCl 1.56, NaCl 2.14, KCl 1.88, H2SO4 1.28 %/K. Tolerance 0.2 %/K: the manual rounds one value per
        // solution, and 0.2 %/K is 1 % of kappa over a 5 K span.
        double[][] cases = {{2.87, 1.56}, {1.83, 2.14}, {1.43, 1.88}, {1.09, 1.28}};
        String[] solutions = {"HCl", "NaCl", "KCl", "H2SO4"};
        for (int i = 0; i < solutions.length; i++) {
            assertEquals(cases[i][1], percentPerK(solutions[i], cases[i][0]), 0.2, solutions[i]);
        }
    }

    /** The model's temperature coefficient at 25 C (per cent of kappa(25 C) per kelvin, 20 to 30 C). */
    static double percentPerK(String solution, double molPerL) {
        Map<String, Double> comp = composition(solution, molPerL);
        double k20 = Conductivity.of(LIB, comp, T20);
        double k25 = Conductivity.of(LIB, comp, T25);
        double k30 = Conductivity.of(LIB, comp, 303.15);
        return 100 * (k30 - k20) / 10 / k25;
    }

    @Test
    void ohmicDropWithBubbles() {
        // source: physics-data check case 4 (CRC kappa of 10 wt % CuSO4 at 20 C = 32.2 mS/cm; Bruggeman 1935,
        // Tobias 1959): gap 20 mm, 100 A/m2 -> 0.621 V; with 10 % gas 0.727 V. Tolerance 0.5 % (rounding of the
        // quoted voltages).
        double kappa = 3.22;
        double drop = 100 * 0.020 / kappa;
        assertEquals(0.621, drop, 0.621 * 0.005);
        double withGas = 100 * 0.020 / Conductivity.bruggeman(kappa, 0.10);
        assertEquals(0.727, withGas, 0.727 * 0.005);
        // source: Bruggeman's law itself, (1 - 0.3)^1.5 = 0.58566
        assertEquals(0.58566, Conductivity.bruggeman(1.0, 0.3), 1e-5);
    }

    @Test
    void modelledCopperSulfateDropMatchesTheCheckCase() {
        // source: physics-data check case 4 again, now with Cellwright's own kappa for 10 wt % CuSO4 at 20 C
        // (0.694 mol/L): the drop stays within the 10 % conductivity tolerance of 0.621 V.
        double kappa = Conductivity.of(LIB, composition("CuSO4", 0.10 * 1.1073 * 1000 / 159.602), T20);
        assertEquals(0.621, 100 * 0.020 / kappa, 0.621 * 0.10);
    }

    static double sulfateBath(String metal, double metalMolPerL, double acidMolPerL, double celsius) {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(metal, metalMolPerL * 1000);
        m.put("SO4^2-", (metalMolPerL + acidMolPerL) * 1000);
        m.put("H+", 2 * acidMolPerL * 1000);
        return Conductivity.of(LIB, m, 273.15 + celsius) / 100; // S/cm
    }

    @Test
    void industrialSulfateBathsFallInTheQuotedRanges() {
        // Cross-checks outside the fit: mixed metal-sulfate / sulfuric-acid baths against the plant ranges of
        // physics-data section 5d (all from memory, low to medium confidence). Tolerance: inside the range, or
        // within 10 % of its nearer end where marked.
        // source: Price & Davenport, Metall. Trans. B 11 (1980) 159 (from memory): copper winning electrolyte,
        // 40-45 g/L Cu, 160-180 g/L H2SO4, 45-60 C: 0.55-0.70 S/cm. 45 g/L Cu = 0.708 mol/L, 180 g/L = 1.835 mol/L
        double copper45 = sulfateBath("Cu2+", 0.708, 1.835, 45);
        assertTrue(copper45 >= 0.55 && copper45 <= 0.70, "Cu EW 45 C: " + copper45);
        double copper60 = sulfateBath("Cu2+", 0.708, 1.835, 60);
        assertTrue(copper60 >= 0.55 && copper60 <= 0.70 * 1.10, "Cu EW 60 C (within 10 %): " + copper60);
        // source: zinc winning, 50-60 g/L Zn, 150-200 g/L H2SO4, 35-40 C: 0.40-0.55 S/cm (from memory).
        // 55 g/L Zn = 0.841 mol/L, 170 g/L H2SO4 = 1.733 mol/L
        double zinc = sulfateBath("Zn2+", 0.841, 1.733, 38);
        assertTrue(zinc >= 0.40 && zinc <= 0.55, "Zn EW: " + zinc);
        // source: tin refining sulfate bath, 20-40 g/L Sn2+, 50-100 g/L H2SO4, 35 C: 0.25-0.40 S/cm (from memory).
        // 30 g/L Sn = 0.253 mol/L, 100 g/L H2SO4 = 1.020 mol/L
        double tin = sulfateBath("Sn2+", 0.253, 1.020, 35);
        assertTrue(tin >= 0.25 && tin <= 0.40, "Sn ER: " + tin);
        // source: nickel sulfate catholyte, pH 3, 60-90 g/L Ni, 60 C: 0.10-0.20 S/cm (from memory; plant
        // catholytes also hold sodium sulfate and boric acid, not modelled here): within 10 % of the low end.
        double nickel = sulfateBath("Ni2+", 1.363, 0.0005, 60);
        assertTrue(nickel >= 0.10 * 0.90 && nickel <= 0.20, "Ni catholyte: " + nickel);
        // source: physics-data 5d cross-check (CRC 20 C table interpolated, 16 wt % H2SO4 = 0.565 S/cm, times
        // 1 + 0.0128 x 25 K) about 0.75 S/cm at 45 C for 180 g/L H2SO4; within 10 %
        double acid = sulfateBath("Cu2+", 0.0, 1.835, 45);
        assertEquals(0.75, acid, 0.075);
    }

    @Test
    void kappaRisesWithTemperatureAndFallsWithDissolvedMetalSulfate() {
        Map<String, Double> acid = composition("H2SO4", 1.8);
        Map<String, Double> withCopper = new LinkedHashMap<>(acid);
        withCopper.put("Cu2+", 700.0);
        withCopper.merge("SO4^2-", 700.0, Double::sum);
        // common practice: copper sulfate added to sulfuric acid lowers the conductivity (it ties up H+ as HSO4-)
        assertTrue(Conductivity.of(LIB, withCopper, 318.15) < Conductivity.of(LIB, acid, 318.15));
        assertTrue(Conductivity.of(LIB, acid, 318.15) > Conductivity.of(LIB, acid, T25));
    }
}
