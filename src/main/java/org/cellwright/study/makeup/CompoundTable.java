package org.cellwright.study.makeup;

import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.cellwright.study.makeup.Compound.Kind;

/**
 * The salts, acids and sparingly soluble solids a make-up knows. A salt may be written with any water of
 * crystallisation ({@code CuSO4·5H2O}, {@code CuSO4.5H2O}, or anhydrous {@code CuSO4}); the formula sets the
 * molar mass, so the hydrate the bottle holds must be the one written.
 */
public final class CompoundTable {

    private static final List<Compound> BASES = List.of(
            salt("SnCl2", "Sn2+", 1, "Cl-", 2), salt("SnSO4", "Sn2+", 1, "SO4^2-", 1),
            salt("CuSO4", "Cu2+", 1, "SO4^2-", 1), salt("CuCl2", "Cu2+", 1, "Cl-", 2),
            salt("Cu(NO3)2", "Cu2+", 1, "NO3-", 2), salt("ZnSO4", "Zn2+", 1, "SO4^2-", 1),
            salt("ZnCl2", "Zn2+", 1, "Cl-", 2), salt("NiSO4", "Ni2+", 1, "SO4^2-", 1),
            salt("NiCl2", "Ni2+", 1, "Cl-", 2), salt("FeSO4", "Fe2+", 1, "SO4^2-", 1),
            salt("FeCl2", "Fe2+", 1, "Cl-", 2), salt("FeCl3", "Fe3+", 1, "Cl-", 3),
            salt("AgNO3", "Ag+", 1, "NO3-", 1), salt("Pb(NO3)2", "Pb2+", 1, "NO3-", 2),
            salt("NaCl", "Na+", 1, "Cl-", 1), salt("Na2SO4", "Na+", 2, "SO4^2-", 1),
            salt("NaNO3", "Na+", 1, "NO3-", 1), salt("KCl", "K+", 1, "Cl-", 1), salt("K2SO4", "K+", 2, "SO4^2-", 1),
            new Compound("HCl", Kind.ACID, "H+", 1, "Cl-", 1, 0),
            new Compound("H2SO4", Kind.ACID, "H+", 2, "SO4^2-", 1, 0),
            new Compound("HNO3", Kind.ACID, "H+", 1, "NO3-", 1, 0),
            new Compound("PbSO4", Kind.SOLID, "Pb2+", 1, "SO4^2-", 1, 0),
            new Compound("PbCl2", Kind.SOLID, "Pb2+", 1, "Cl-", 2, 0),
            new Compound("AgCl", Kind.SOLID, "Ag+", 1, "Cl-", 1, 0));

    private static final Pattern HYDRATE = Pattern.compile("^(.+?)(?:\\.(\\d*)H2O)?$");

    private CompoundTable() {
    }

    private static Compound salt(String base, String cation, int nc, String anion, int na) {
        return new Compound(base, Kind.SALT, cation, nc, anion, na, 0);
    }

    /**
     * @param written a formula as written, with or without water of crystallisation
     * @return the compound, if known
     */
    public static Optional<Compound> find(String written) {
        String s = written.strip().replace('·', '.').replace('*', '.').replace("•", ".").replace(" ", "");
        Matcher m = HYDRATE.matcher(s);
        if (!m.matches()) {
            return Optional.empty();
        }
        String base = m.group(1);
        int water = m.group(2) == null ? 0 : m.group(2).isEmpty() ? 1 : Integer.parseInt(m.group(2));
        for (Compound c : BASES) {
            if (c.base().equals(base)) {
                if (water > 0 && c.kind() != Kind.SALT) {
                    return Optional.empty();
                }
                return Optional.of(c.withWater(water));
            }
        }
        return Optional.empty();
    }

    /** @return every known anhydrous formula, for messages */
    public static List<String> names() {
        return BASES.stream().map(Compound::base).toList();
    }

    /** @return the sparingly soluble solid of this formula */
    static Compound solid(String base) {
        return BASES.stream().filter(c -> c.base().equals(base) && c.kind() == Kind.SOLID).findFirst().orElseThrow();
    }
}
