package org.cellwright.study.makeup;

import java.util.List;
import java.util.Map;

/**
 * The dissolved ions a make-up deals in, named as the chemistry library names them, with their charge and
 * formula (molar mass from {@link AtomicWeights}; the electron mass is neglected, as in the library).
 */
public final class Ions {

    private record Ion(int charge, String formula, boolean metal) {
    }

    private static final Map<String, Ion> IONS = Map.ofEntries(
            Map.entry("H+", new Ion(1, "H", false)), Map.entry("Na+", new Ion(1, "Na", false)),
            Map.entry("K+", new Ion(1, "K", false)), Map.entry("Ag+", new Ion(1, "Ag", true)),
            Map.entry("Cu2+", new Ion(2, "Cu", true)), Map.entry("Zn2+", new Ion(2, "Zn", true)),
            Map.entry("Ni2+", new Ion(2, "Ni", true)), Map.entry("Fe2+", new Ion(2, "Fe", true)),
            Map.entry("Fe3+", new Ion(3, "Fe", true)), Map.entry("Sn2+", new Ion(2, "Sn", true)),
            Map.entry("Pb2+", new Ion(2, "Pb", true)), Map.entry("Cl-", new Ion(-1, "Cl", false)),
            Map.entry("SO4^2-", new Ion(-2, "SO4", false)), Map.entry("NO3-", new Ion(-1, "NO3", false)));

    /** The order ions are listed in: metal ions, then the other cations, then the anions. */
    static final List<String> ORDER = List.of("Sn2+", "Cu2+", "Zn2+", "Ni2+", "Fe2+", "Fe3+", "Ag+", "Pb2+", "H+",
            "Na+", "K+", "Cl-", "SO4^2-", "NO3-");

    private Ions() {
    }

    /** @return the charge number of an ion */
    public static int charge(String ion) {
        return ion(ion).charge();
    }

    /** @return the ion's molar mass (kg/mol) */
    public static double molarMassKgPerMol(String ion) {
        return AtomicWeights.kgPerMol(Formula.elements(ion(ion).formula()));
    }

    /** @return true for a metal ion (written in g/L in a scenario) */
    public static boolean isMetal(String ion) {
        return ion(ion).metal();
    }

    private static Ion ion(String name) {
        Ion i = IONS.get(name);
        if (i == null) {
            throw new IllegalArgumentException("unknown ion " + name);
        }
        return i;
    }
}
