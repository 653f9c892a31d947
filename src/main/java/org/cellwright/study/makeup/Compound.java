package org.cellwright.study.makeup;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * A salt, acid or sparingly soluble solid of a bath make-up, as the ions it gives in solution (fully
 * dissociated: sulfuric acid as 2 H+ + SO4^2-, the convention of scenario files, whose engine then splits
 * off HSO4- itself).
 *
 * @param base the anhydrous formula ("CuSO4", "Pb(NO3)2", "HCl")
 * @param kind what it is
 * @param cation the cation it gives (library notation, "Cu2+")
 * @param cations cations per formula unit
 * @param anion the anion it gives ("SO4^2-")
 * @param anions anions per formula unit
 * @param water molecules of water of crystallisation per formula unit
 */
public record Compound(String base, Kind kind, String cation, int cations, String anion, int anions, int water) {

    /** What a compound is in a make-up. */
    public enum Kind {
        /** A salt dissolved by mass. */
        SALT,
        /** An acid, added by volume of a grade or by mass. */
        ACID,
        /** A sparingly soluble solid: flagged when its solubility product is exceeded, or filtered off. */
        SOLID
    }

    public Compound {
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(kind, "kind");
        if (Ions.charge(cation) * cations + Ions.charge(anion) * anions != 0) {
            throw new IllegalArgumentException(base + ": the ions do not balance");
        }
    }

    /** @return the compound with its water of crystallisation ("CuSO4·5H2O") */
    public String name() {
        return water == 0 ? base : base + "·" + (water == 1 ? "" : Integer.toString(water)) + "H2O";
    }

    /** @return atoms per formula unit, water included */
    public Map<String, Integer> elements() {
        Map<String, Integer> e = new LinkedHashMap<>(Formula.elements(base));
        if (water > 0) {
            e.merge("H", 2 * water, Integer::sum);
            e.merge("O", water, Integer::sum);
        }
        return e;
    }

    /** @return the molar mass (kg/mol), water of crystallisation included */
    public double molarMassKgPerMol() {
        return AtomicWeights.kgPerMol(elements());
    }

    /** @return the ions one formula unit gives (ion to count) */
    public Map<String, Integer> ions() {
        Map<String, Integer> m = new LinkedHashMap<>();
        m.put(cation, cations);
        m.put(anion, anions);
        return m;
    }

    /** @return a copy with another water of crystallisation */
    public Compound withWater(int molecules) {
        return new Compound(base, kind, cation, cations, anion, anions, molecules);
    }
}
