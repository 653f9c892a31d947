package org.cellwright.sim;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.validation.ValidationCase;

/**
 * The engine's checks against analytic laws and textbook worked numbers, for the validation report
 * (docs/validation.md): Faraday, Nernst, Tafel, Ohm, Sand, the batch reactor under mass-transfer control, the
 * galvanostatic change of regime, co-deposition of a noble impurity and hydrogen overpotentials. Each case is
 * computed freshly with the engine on the fixtures of the engine's own tests ({@link ElectrodeLawsTest},
 * {@link MassTransferTest}, {@link SandTimeTest}, {@link CoDepositionTest}, {@link CathodeCoverageTest}).
 */
public final class EngineValidation {

    private static final double F = 96485.33212331001;
    private static final double D_CU = 0.714e-9;

    private EngineValidation() {
    }

    /** @return the engine's cases, freshly computed */
    public static List<ValidationCase> cases() {
        List<ValidationCase> out = new ArrayList<>();
        faraday(out);
        nernstAndTafel(out);
        ohm(out);
        sand(out);
        batchReactor(out);
        galvanostatic(out);
        coDeposition(out);
        corrosion(out);
        hydrogen(out);
        return out;
    }

    private static void faraday(List<ValidationCase> out) {
        RunResult r = CellSimulation.withDefaults().run(ElectrodeLawsTest.refiningCell(1000, 10, 0.02, null, 36000),
                TestChemistry.library(10), null);
        // source: Faraday's law m = I t M / (z F), CODATA 2018 F, IUPAC M(Cu) = 63.546 g/mol: 10 A for 10 h (the
        // charge of 100 A for 1 h) gives 118.55 g (physics reference check case 1). Tolerance 1e-9 (model brief).
        double exact = 10 * 36000 * 63.546 / (2 * F);
        out.add(ValidationCase.relative("Faraday", "copper deposited by 36 000 C at 100 % efficiency",
                "Faraday's law with CODATA 2018 F and IUPAC M(Cu)", "g", exact,
                1000 * r.summary().depositKg().get("Cu"), 1e-9, 6));
    }

    private static void nernstAndTafel(List<ValidationCase> out) {
        ChemLibrary lib = TestChemistry.library(10);
        OperatingPoint a = ElectrodeLawsTest.prepared(ElectrodeLawsTest.refiningCell(1000, 1, 0.02, null, 60), lib, 1);
        OperatingPoint b = ElectrodeLawsTest.prepared(ElectrodeLawsTest.refiningCell(100, 1, 0.02, null, 60), lib, 1);
        OperatingPoint c = ElectrodeLawsTest.prepared(ElectrodeLawsTest.refiningCell(10, 1, 0.02, null, 60), lib, 1);
        int k = ElectrodeLawsTest.slot(a, "Cu2+/Cu");
        // source: (ln 10) RT / (nF) = 59.159 / 2 mV per decade at 298.15 K (CODATA 2018 R, F); 1 uV
        out.add(ValidationCase.absolute("Nernst", "slope of Cu2+/Cu, 1 to 0.1 mol/L at 25 C",
                "Nernst equation, (ln 10) RT/(2F) with CODATA 2018 R and F", "mV/decade", 29.5797,
                1000 * (a.cathode.eEq[k] - b.cathode.eEq[k]), 1e-3, 6));
        // source: E = E0 + (RT/2F) ln a(Cu2+) with E0 = 0.3419 V (CRC Electrochemical Series): a = 0.01 gives
        // 0.2827 V (physics reference check case 3); 0.1 mV, the rounding of the quoted value
        out.add(ValidationCase.absolute("Nernst", "Cu2+/Cu at a(Cu2+) = 0.01, 25 C",
                "CRC Handbook, Electrochemical Series (E0 0.3419 V); physics reference check case 3", "V", 0.2827,
                c.cathode.eEq[k], 1e-4, 4));
        OperatingPoint op = ElectrodeLawsTest.prepared(ElectrodeLawsTest.refiningCell(1000, 1, 0.02, null, 60),
                TestChemistry.library(1e-3), 1e4);
        int m = ElectrodeLawsTest.slot(op, "Cu2+/Cu");
        double e1 = op.cathode.eEq[m] - 0.15;
        double e2 = op.cathode.eEq[m] - 0.25;
        double i1 = -op.cathode.current(m, e1, null);
        double i2 = -op.cathode.current(m, e2, null);
        // source: b = 2.303 RT / (alpha_c F) = 118.3 mV/decade for alpha_c = 0.5 at 25 C (Bard & Faulkner,
        // Electrochemical Methods, 2nd ed. 2001, eq. 3.4.15); 0.1 %: mass transfer 4 decades away bends it less
        out.add(ValidationCase.relative("Kinetics", "cathodic Tafel slope, alpha_c = 0.5, 25 C",
                "Bard & Faulkner 2001, eq. 3.4.15", "mV/decade", 118.32,
                1000 * (e1 - e2) / (Math.log10(i2) - Math.log10(i1)), 1e-3, 4));
    }

    private static void ohm(List<ValidationCase> out) {
        ChemLibrary lib = TestChemistry.library(10);
        double kappa = 3.22;
        double[] u = new double[2];
        double[] gaps = {0.01, 0.04};
        for (int g = 0; g < 2; g++) {
            OperatingPoint op = ElectrodeLawsTest.prepared(ElectrodeLawsTest.refiningCell(500, 1.0, gaps[g], kappa, 60),
                    lib, 30);
            op.solve(30);
            u[g] = op.cellVoltageV;
        }
        // source: R = gap / (kappa A) (Ohm's law for a uniform gap): dU/dgap = I / (kappa A) = 31.06 V/m at 1 A,
        // 1 dm2, kappa 3.22 S/m (10 wt % CuSO4 at 20 C, CRC); a refining cell makes no gas. 1e-9 relative.
        out.add(ValidationCase.relative("Ohmic drop", "cell voltage against the gap, 10 to 40 mm",
                "Ohm's law, R = gap/(kappa A)", "V/m", 1.0 / (kappa * 0.01), (u[1] - u[0]) / (gaps[1] - gaps[0]),
                1e-9, 5));
    }

    private static void sand(List<ValidationCase> out) {
        // source: tau = pi D (n F c)^2 / (4 i^2), 0.10 M Cu2+ in excess acid, D = 7.14e-10 m2/s (Bard & Faulkner
        // 2001, section 8.2; physics reference check case 7): 20.9 s at 100 A/m2, 83.5 s at 50 A/m2. 5 %: the
        // transition is read on an output grid of tau/2000 as efficiency falling below 99 %.
        for (double i : new double[] {100, 50}) {
            double exact = Math.PI * D_CU * Math.pow(2 * F * 100, 2) / (4 * i * i);
            out.add(ValidationCase.relative("Mass transfer", "Sand transition time, 0.10 M Cu2+, still, "
                            + (int) i + " A/m2", "Sand 1901; Bard & Faulkner 2001, section 8.2", "s", exact,
                    SandTimeTest.transitionTime(i, exact), 0.05, 3));
        }
    }

    private static void batchReactor(List<ValidationCase> out) {
        double km = 1.0e-5;
        Scenario sc = TestScenarios.copperBatch(0.010, 0.10, D_CU / km, 1.0, 10.0, 4 * 3600, 600);
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        // source: c(t) = c0 exp(-km A t / V), V 10 L, A 0.1 m2, km 1e-5 m/s, c0 1 mol/m3 (Trinidad, Walsh &
        // Gilroy, Int. J. Engng Ed. 14 (1998) 431; physics reference check case 8): 0.6977 and 0.2369 mol/m3.
        // 0.5 % (model brief)
        for (double h : new double[] {1, 4}) {
            out.add(ValidationCase.relative("Mass transfer", "batch reactor at the limiting current, c after "
                            + (int) h + " h", "Trinidad, Walsh & Gilroy 1998; Pletcher & Walsh 1990, ch. 2", "mol/m3",
                    Math.exp(-km * 0.10 * h * 3600 / 0.010), MassTransferTest.concentrationAt(r, h * 3600), 0.005, 4));
        }
    }

    private static void galvanostatic(List<ValidationCase> out) {
        double km = 2.0e-5;
        double tCrit = 91485;
        Scenario sc = TestScenarios.copperBatch(0.100, 1.0, D_CU / km, 50.0, 10.0, tCrit + 7200, 45);
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        double cCrit = 10.0 / (2 * F * km * 1.0);
        String source = "Pletcher & Walsh 1990; Walsh 1993; physics reference check case 9";
        // source: linear depletion at I/(nF V) with CE 1 until c* = I/(n F km A) = 2.591 mol/m3 at t* = 91 485 s,
        // then c = c* exp(-km A (t - t*)/V) and CE = c/c*: c = 1.261 mol/m3 and CE 0.487 at t* + 1 h, 0.614 and
        // 0.237 at t* + 2 h. 1 % (the change of regime is smoothed over a few per cent of c*).
        double half = tCrit / 2;
        out.add(ValidationCase.relative("Mass transfer", "galvanostatic, below the limit: c at t*/2",
                source, "mol/m3", 50.0 - 10.0 * half / (2 * F * 0.100), MassTransferTest.interpolate(r, half), 0.01, 4));
        for (int h = 1; h <= 2; h++) {
            double t = tCrit + 3600 * h;
            double c = cCrit * Math.exp(-km * 3600 * h / 0.1);
            out.add(ValidationCase.relative("Mass transfer", "galvanostatic, above the limit: c at t* + " + h + " h",
                    source, "mol/m3", c, MassTransferTest.interpolate(r, t), 0.01, 4));
            out.add(ValidationCase.relative("Mass transfer", "galvanostatic, above the limit: efficiency at t* + "
                    + h + " h", source, "", c / cCrit, MassTransferTest.efficiencyNear(r, t), 0.01, 3));
        }
    }

    private static void coDeposition(List<ValidationCase> out) {
        double volume = 0.001;
        double area = 0.01;
        double delta = 50e-6;
        Scenario sc = DepositScenarios.cell(CoDepositionTest.tinSulfate("Ag+", 0.5), volume, "stainless", "tin", area,
                0.03, delta, 1.0, 4 * 3600, 600, "Sn");
        RunResult r = DepositScenarios.run(sc);
        double km = DepositScenarios.LIB.findSpecies("Ag+").orElseThrow().diffusionM2PerS() / delta;
        int ag = r.speciesNames().indexOf("Ag+");
        // source: the noble impurity deposits at its limiting current, c = c0 exp(-km A t / V) (Pletcher & Walsh
        // 1990, ch. 2; Trinidad, Walsh & Gilroy 1998). 0.5 % (physics reference check case 8)
        out.add(ValidationCase.relative("Co-deposition", "Ag+ impurity (54 mg/L) in a tin refining bath after 4 h",
                "Trinidad, Walsh & Gilroy 1998 (batch reactor at the mass-transfer limit)", "mol/m3",
                0.5 * Math.exp(-km * area * 4 * 3600 / volume),
                DepositScenarios.at(r, 4 * 3600).state().concentrationsMolPerM3()[ag], 0.005, 4));
    }

    private static void corrosion(List<ValidationCase> out) {
        RunResult r = CellSimulation.withDefaults().run(DepositCorrosionTest.tinThen(0.0), TestChemistry.library(10),
                null);
        int sn4 = r.speciesNames().indexOf("Sn4+");
        double c1 = DepositScenarios.at(r, 2100).state().concentrationsMolPerM3()[sn4];
        // source: at open circuit Sn4+ + Sn = 2 Sn2+ at the mass-transfer limit of Sn4+ (mixed-potential theory,
        // Wagner & Traud, Z. Elektrochem. 44 (1938) 391), so Sn4+ follows c1 exp(-km A t / V) (Trinidad, Walsh &
        // Gilroy 1998): km 1.2e-5 m/s, A 1 dm2, V 0.5 L, 40 min after the supply stops. 0.5 % (DepositCorrosionTest)
        out.add(ValidationCase.relative("Corrosion", "Sn4+ dissolving a tin deposit at open circuit, 40 min",
                "Wagner & Traud 1938 with the batch-reactor law (Trinidad, Walsh & Gilroy 1998)", "mol/m3",
                c1 * Math.exp(-0.6e-9 / 50e-6 * 0.01 * 2400 / 0.0005),
                DepositScenarios.at(r, 4500).state().concentrationsMolPerM3()[sn4], 0.005, 4));
    }

    private static void hydrogen(List<ValidationCase> out) {
        // source: Tafel constants for hydrogen in 1 N acid, eta = a + b log10(i / 1 A/cm2) (Antropov, Theoretical
        // Electrochemistry, 1972, from memory; physics reference 3a): iron a 0.70, b 0.12 -> 0.544 V at 500 A/m2;
        // tin a 1.20, b 0.13 -> 1.031 V. 1 mV, the rounding of a and b in the library.
        String source = "Antropov, Theoretical Electrochemistry (1972), Tafel constants (from memory)";
        out.add(ValidationCase.absolute("Kinetics", "hydrogen overpotential on stainless (iron) at 500 A/m2",
                source, "V", 0.70 + 0.12 * Math.log10(0.05), CathodeCoverageTest.hydrogenOverpotential(0), 1e-3, 3));
        out.add(ValidationCase.absolute("Kinetics", "hydrogen overpotential on a tin deposit at 500 A/m2",
                source, "V", 1.20 + 0.13 * Math.log10(0.05), CathodeCoverageTest.hydrogenOverpotential(1), 1e-3, 4));
        // source: physics reference check case R1, the same table (section 3a): zinc a 1.24, b 0.118 -> 1.086 V;
        // copper a 0.80, b 0.115 -> 0.650 V; lead a 1.56, b 0.11 -> 1.417 V; nickel a 0.63, b 0.11 -> 0.487 V at
        // 500 A/m2. 2 mV (R1's own tolerance: the rounding of a and b)
        String[] metals = {"zinc", "copper", "lead", "nickel"};
        double[] expected = {1.086, 0.650, 1.417, 0.487};
        for (int m = 0; m < metals.length; m++) {
            out.add(ValidationCase.absolute("Kinetics", "hydrogen overpotential on bare " + metals[m]
                    + " at 500 A/m2", source + "; physics reference R1", "V", expected[m],
                    CathodeCoverageTest.hydrogenOverpotential(metals[m], 0), 2e-3, 4));
        }
    }
}
