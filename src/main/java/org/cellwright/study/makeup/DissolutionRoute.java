package org.cellwright.study.makeup;

import java.util.Locale;
import java.util.Objects;

/**
 * How a metal dissolves in an acid, per mole of metal: the ion it becomes, the H+ it consumes, the nitrate it
 * reduces (nitric acid) and the gas it gives off. Balanced equations of standard inorganic chemistry
 * (Greenwood &amp; Earnshaw, <i>Chemistry of the Elements</i>, 2nd ed., 1997, from memory); each conserves
 * atoms and charge (tested).
 *
 * @param metal the metal symbol
 * @param acid the acid ("HCl", "H2SO4", "HNO3")
 * @param oxidant "H2O2" or "air" when the acid alone does not dissolve the metal, else null
 * @param ion the ion formed
 * @param protons H+ consumed per metal atom
 * @param nitrate NO3- reduced (to NO) per metal atom
 * @param gas the gas given off ("H2", "NO"), or null
 * @param gasPerMetal moles of gas per mole of metal
 * @param equation the reaction, for the log
 */
public record DissolutionRoute(String metal, String acid, String oxidant, String ion, double protons,
                               double nitrate, String gas, double gasPerMetal, String equation) {

    public DissolutionRoute {
        Objects.requireNonNull(metal, "metal");
        Objects.requireNonNull(ion, "ion");
    }

    /**
     * @param metal a metal symbol
     * @param acid the acid it is dissolved in
     * @param oxidant "H2O2", "air" or null
     * @return the route
     * @throws IllegalArgumentException when the metal does not dissolve so, with the reason in plain words
     */
    public static DissolutionRoute of(String metal, String acid, String oxidant) {
        boolean nitric = "HNO3".equals(acid);
        boolean plain = "HCl".equals(acid) || "H2SO4".equals(acid);
        if (!nitric && !plain) {
            throw new IllegalArgumentException("metals are dissolved here in HCl, H2SO4 or HNO3, not '" + acid + "'");
        }
        if (oxidant != null && !oxidant.equals("H2O2") && !oxidant.equals("air")) {
            throw new IllegalArgumentException("the oxidant may be \"H2O2\" or \"air\", not '" + oxidant + "'");
        }
        String a = "H2SO4".equals(acid) ? "H2SO4" : "2 " + acid;
        switch (metal) {
            case "Sn", "Zn", "Fe", "Ni" -> {
                if (nitric) {
                    throw new IllegalArgumentException(metal.equals("Sn")
                            ? "nitric acid turns tin into insoluble metastannic acid (SnO2.xH2O); use HCl"
                            : "nitric acid oxidises " + metal + " to a mix of products (NO, N2O, NH4+); use HCl or H2SO4");
                }
                noOxidant(metal, oxidant);
                String salt = metal + ("HCl".equals(acid) ? "Cl2" : "SO4");
                String note = metal.equals("Ni") || metal.equals("Sn") && "H2SO4".equals(acid) ? " (slow)" : "";
                return new DissolutionRoute(metal, acid, null, metal + "2+", 2, 0, "H2", 1,
                        metal + " + " + a + " -> " + salt + " + H2" + note);
            }
            case "Pb" -> {
                if ("H2SO4".equals(acid)) {
                    throw new IllegalArgumentException("lead does not dissolve in sulfuric acid: a PbSO4 film forms "
                            + "on it and stops it; use HNO3");
                }
                noOxidant(metal, oxidant);
                return nitric ? nitric(metal, 2) : new DissolutionRoute("Pb", acid, null, "Pb2+", 2, 0, "H2", 1,
                        "Pb + 2 HCl -> PbCl2 + H2 (slow; PbCl2 is sparingly soluble)");
            }
            case "Cu", "Ag" -> {
                if (nitric) {
                    noOxidant(metal, oxidant);
                    return nitric(metal, metal.equals("Cu") ? 2 : 1);
                }
                if (metal.equals("Ag")) {
                    throw new IllegalArgumentException("silver is dissolved in HNO3 (in HCl it would turn to "
                            + "insoluble AgCl, in H2SO4 it needs hot concentrated acid)");
                }
                if (oxidant == null) {
                    throw new IllegalArgumentException("copper does not dissolve in " + acid + " alone (E0 Cu2+/Cu "
                            + "= +0.34 V, above hydrogen); add oxidant = \"H2O2\" or \"air\", or use HNO3");
                }
                String eq = oxidant.equals("H2O2") ? "Cu + 2 H+ + H2O2 -> Cu2+ + 2 H2O"
                        : "Cu + 2 H+ + 1/2 O2 -> Cu2+ + H2O";
                return new DissolutionRoute("Cu", acid, oxidant, "Cu2+", 2, 0, null, 0, eq);
            }
            default -> throw new IllegalArgumentException("no dissolution route for metal '" + metal
                    + "'; known: Sn, Zn, Fe, Ni, Pb, Cu, Ag");
        }
    }

    /** 3 M + 8 HNO3 -> 3 M(NO3)2 + 2 NO + 4 H2O (z = 2); 3 M + 4 HNO3 -> 3 MNO3 + NO + 2 H2O (z = 1). */
    private static DissolutionRoute nitric(String metal, int z) {
        double protons = z == 2 ? 8.0 / 3 : 4.0 / 3;
        double nitrate = z == 2 ? 2.0 / 3 : 1.0 / 3;
        String eq = z == 2 ? "3 " + metal + " + 8 HNO3 -> 3 " + metal + "(NO3)2 + 2 NO + 4 H2O"
                : "3 " + metal + " + 4 HNO3 -> 3 " + metal + "NO3 + NO + 2 H2O";
        return new DissolutionRoute(metal, "HNO3", null, metal + (z == 2 ? "2+" : "+"), protons, nitrate, "NO",
                nitrate, eq);
    }

    private static void noOxidant(String metal, String oxidant) {
        if (oxidant != null) {
            throw new IllegalArgumentException(metal + " dissolves in the acid itself; leave out the oxidant");
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s in %s: %s", metal, acid, equation);
    }
}
