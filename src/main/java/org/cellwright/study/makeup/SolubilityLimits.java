package org.cellwright.study.makeup;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The solubility and hydrolysis limits a make-up is checked against (20-25 C), with their sources.
 *
 * <p>Solubility products at 25 C, CRC Handbook of Chemistry and Physics, "Solubility product constants"
 * (from memory; physics-data section 13 quotes PbCl2 1.7e-5 and PbSO4 1.6-2.5e-8): PbSO4 2.53e-8,
 * PbCl2 1.70e-5, AgCl 1.77e-10 (mol/L)^n. Concentrations stand in for activities (activity coefficients 1):
 * in real baths of ionic strength 1-5 mol/L the salts dissolve somewhat more, so a flagged precipitate is an
 * estimate on the safe side, except that PbCl2 dissolves again as chloro-complexes above about 1 mol/L of
 * chloride (CRC; Clever &amp; Johnston, J. Phys. Chem. Ref. Data 9 (1980) 751), which the flag says.
 *
 * <p>Stannous hydrolysis (physics-data section 13): basic tin(II) sulfate Sn3(OH)2OSO4 comes down from
 * pH 1.5-2.4 (J. Chem. Soc. A 1967, 1790), so a sulfate bath with tin(II) is flagged below 30 g/L of free
 * sulfuric acid; a chloride bath below 0.5 mol/L of HCl (Sn(OH)Cl turbidity on dilution).
 */
final class SolubilityLimits {

    static final double KSP_PBSO4 = 2.53e-8;
    static final double KSP_PBCL2 = 1.70e-5;
    static final double KSP_AGCL = 1.77e-10;
    /** Free sulfuric acid below which a tin(II) sulfate bath is flagged (g/L). */
    static final double MIN_FREE_H2SO4_G_PER_L = 30;
    /** HCl below which a tin(II) chloride bath is flagged (mol/L). */
    static final double MIN_HCL_MOL_PER_L = 0.5;
    /** Chloride above which PbCl2 dissolves again as chloro-complexes (mol/L). */
    static final double CHLORO_COMPLEX_CL_MOL_PER_L = 1.0;

    private SolubilityLimits() {
    }

    /**
     * Takes the expected precipitates out of a composition (mol/L, changed in place), least soluble first.
     *
     * @param molPerL ion to concentration (mol/L)
     * @param volumeL the volume (L)
     * @param flags where the cautions go
     * @return the precipitates
     */
    static List<MakeupResult.Precipitate> precipitate(Map<String, Double> molPerL, double volumeL, List<String> flags) {
        List<MakeupResult.Precipitate> out = new ArrayList<>();
        oneToOne("AgCl", "Ag+", "Cl-", KSP_AGCL, molPerL, volumeL, flags, out);
        oneToOne("PbSO4", "Pb2+", "SO4^2-", KSP_PBSO4, molPerL, volumeL, flags, out);
        double pb = molPerL.getOrDefault("Pb2+", 0.0);
        double cl = molPerL.getOrDefault("Cl-", 0.0);
        double q = pb * cl * cl;
        if (q > KSP_PBCL2) {
            double x = oneToTwo(pb, cl, KSP_PBCL2);
            remove(molPerL, "Pb2+", x);
            remove(molPerL, "Cl-", 2 * x);
            Compound c = CompoundTable.solid("PbCl2");
            out.add(new MakeupResult.Precipitate(c, x * volumeL * c.molarMassKgPerMol(), q / KSP_PBCL2));
            flags.add(String.format(Locale.ROOT, "lead chloride: [Pb2+][Cl-]^2 = %.3g is %.3g times its solubility "
                    + "product (%.3g): about %.3g g of PbCl2 comes down; filter it off%s", q, q / KSP_PBCL2, KSP_PBCL2,
                    x * volumeL * c.molarMassKgPerMol() * 1000, cl > CHLORO_COMPLEX_CL_MOL_PER_L
                    ? " (above about 1 mol/L of chloride PbCl2 dissolves again as chloro-complexes: less may come down)"
                    : ""));
        }
        return out;
    }

    private static void oneToOne(String solid, String cation, String anion, double ksp, Map<String, Double> molPerL,
                                 double volumeL, List<String> flags, List<MakeupResult.Precipitate> out) {
        double a = molPerL.getOrDefault(cation, 0.0);
        double b = molPerL.getOrDefault(anion, 0.0);
        double q = a * b;
        if (q <= ksp) {
            return;
        }
        // (a - x)(b - x) = Ksp, the smaller root
        double x = ((a + b) - Math.sqrt((a - b) * (a - b) + 4 * ksp)) / 2;
        remove(molPerL, cation, x);
        remove(molPerL, anion, x);
        Compound c = CompoundTable.solid(solid);
        double kg = x * volumeL * c.molarMassKgPerMol();
        out.add(new MakeupResult.Precipitate(c, kg, q / ksp));
        flags.add(String.format(Locale.ROOT, "%s: [%s][%s] = %.3g is %.3g times its solubility product (%.3g): "
                + "about %.3g g of %s comes down; filter it off", solid.equals("AgCl") ? "silver chloride"
                : "lead sulfate", cation, anion, q, q / ksp, ksp, kg * 1000, solid));
    }

    /** Solves (a - x)(b - 2x)^2 = Ksp for x in (0, min(a, b/2)) by bisection; the left side falls with x. */
    static double oneToTwo(double a, double b, double ksp) {
        double lo = 0;
        double hi = Math.min(a, b / 2);
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            double f = (a - mid) * (b - 2 * mid) * (b - 2 * mid) - ksp;
            if (f > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static void remove(Map<String, Double> molPerL, String ion, double x) {
        molPerL.put(ion, Math.max(0, molPerL.get(ion) - x));
    }

    /**
     * Adds the hydrolysis and redox cautions of a finished composition.
     *
     * @param molPerL ion to concentration (mol/L)
     * @param flags where they go
     */
    static void hydrolysis(Map<String, Double> molPerL, List<String> flags) {
        double sn = molPerL.getOrDefault("Sn2+", 0.0);
        double h = molPerL.getOrDefault("H+", 0.0);
        double cl = molPerL.getOrDefault("Cl-", 0.0);
        double so4 = molPerL.getOrDefault("SO4^2-", 0.0);
        if (sn > 0) {
            if (cl >= 2 * so4) {
                if (h < MIN_HCL_MOL_PER_L) {
                    flags.add(String.format(Locale.ROOT, "stannous hydrolysis: %.3g mol/L of acid in a chloride bath "
                            + "is below %.1f mol/L: tin(II) hydrolyses to Sn(OH)Cl turbidity, worst on dilution; add "
                            + "HCl", h, MIN_HCL_MOL_PER_L));
                }
            } else {
                // free H2SO4 (g/L) = H+ / 2 x 98.07 g/mol
                double freeAcid = h / 2 * AtomicWeights.kgPerMol(Formula.elements("H2SO4")) * 1000;
                if (freeAcid < MIN_FREE_H2SO4_G_PER_L) {
                    flags.add(String.format(Locale.ROOT, "stannous hydrolysis: %.3g g/L of free sulfuric acid is "
                            + "below %.0f g/L (pH above about 1.5): basic tin(II) sulfate comes down; add H2SO4",
                            freeAcid, MIN_FREE_H2SO4_G_PER_L));
                }
            }
        }
        double fe3 = molPerL.getOrDefault("Fe3+", 0.0);
        if (sn > 0 && fe3 > 0) {
            flags.add(String.format(Locale.ROOT, "Fe3+ oxidises Sn2+ (2 Fe3+ + Sn2+ -> 2 Fe2+ + Sn4+): up to %.3g mol/L "
                    + "of tin(IV), which hydrolyses to a stannic sludge; the run starts from the block as written and "
                    + "reacts it", Math.min(sn, fe3 / 2)));
        }
    }
}
