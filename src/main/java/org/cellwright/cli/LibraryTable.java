package org.cellwright.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Species;

/**
 * The human-readable listing of the {@code library} command: one group per kind of entry, numbers in the
 * units of the trade, and the sources of each group as a numbered list below it.
 */
final class LibraryTable {

    private final PrintWriter out;

    LibraryTable(PrintWriter out) {
        this.out = out;
    }

    void print(ChemLibrary library) {
        out.println("Cellwright built-in chemistry library (values at 25 C)");
        printSpecies(library);
        printMetals(library);
        printReactions(library);
        printMaterials(library);
        printHomogeneous(library);
    }

    private void printSpecies(ChemLibrary library) {
        References refs = new References();
        heading("Species (dissolved; D and lambda at infinite dilution)");
        out.printf(Locale.ROOT, "  %-8s %3s %10s %14s %18s  %s%n", "name", "z", "M g/mol", "D 1e-9 m2/s",
                "lambda S cm2/mol", "sources: M, D, lambda");
        for (Species s : library.species()) {
            out.printf(Locale.ROOT, "  %-8s %+3d %10.4f %14.4g %18.2f  %s%n", s.name(), s.charge(),
                    s.molarMassKgPerMol() * 1000, s.diffusionM2PerS() * 1e9, s.conductivitySM2PerMol() * 1e4,
                    refs.cite(s.sources().get("molar_mass"), s.sources().get("diffusion"),
                            s.sources().get("conductivity")));
        }
        refs.print();
    }

    private void printMetals(ChemLibrary library) {
        References refs = new References();
        heading("Metals");
        out.printf(Locale.ROOT, "  %-6s %10s %12s %14s %-13s  %s%n", "metal", "M g/mol", "rho g/cm3",
                "Vm cm3/mol", "Winand class", "sources: M, rho, class");
        for (Metal m : library.metals()) {
            out.printf(Locale.ROOT, "  %-6s %10.4f %12.4g %14.4g %-13s  %s%n", m.symbol(), m.molarMassKgPerMol() * 1000,
                    m.densityKgPerM3() / 1000, m.molarVolumeM3PerMol() * 1e6,
                    m.depositClass().name().toLowerCase(Locale.ROOT),
                    refs.cite(m.sources().get("molar_mass"), m.sources().get("density"), m.sources().get("deposit_class")));
        }
        refs.print();
    }

    private void printReactions(ChemLibrary library) {
        References refs = new References();
        heading("Electrode reactions (reductions; E0 vs SHE) and kinetics (i0 at 1 mol/L)");
        for (ElectrodeReaction r : library.reactions()) {
            out.printf(Locale.ROOT, "  %-12s %-26s n=%d  E0 %+.4f V  dE0/dT %+.3f mV/K  %s%n", r.name(), r.equation(),
                    r.n(), r.e0V(), r.dE0dTVPerK() * 1000, refs.cite(r.sources().get("e0"), r.sources().get("de0dt")));
            kineticsRow(refs, "(default)", r.kinetics());
            for (ElectrodeMaterial m : library.materials()) {
                Kinetics k = r.kineticsByMaterial().get(m.name());
                if (k != null) {
                    kineticsRow(refs, "on " + m.name(), k);
                }
            }
        }
        refs.print();
    }

    private void kineticsRow(References refs, String label, Kinetics k) {
        out.printf(Locale.ROOT, "      %-16s i0 %10.3e A/m2  alpha_a %.3f  alpha_c %.3f  %s%n", label, k.i0APerM2(),
                k.alphaA(), k.alphaC(), refs.cite(k.source()));
    }

    private void printMaterials(ChemLibrary library) {
        heading("Electrode materials");
        out.printf(Locale.ROOT, "  %-13s %-9s %-8s %s%n", "material", "as anode", "surface", "aliases; description");
        for (ElectrodeMaterial m : library.materials()) {
            out.printf(Locale.ROOT, "  %-13s %-9s %-8s %s; %s%n", m.name(),
                    m.isSoluble() ? "-> " + m.solubleMetal() : "inert", m.surfaceMetal() == null ? "-" : m.surfaceMetal(),
                    m.aliases().isEmpty() ? "-" : String.join(", ", m.aliases()), m.description());
        }
    }

    private void printHomogeneous(ChemLibrary library) {
        References refs = new References();
        heading("Bulk (homogeneous) reactions; rate = k prod c^order");
        for (HomogeneousReaction h : library.homogeneousReactions()) {
            double order = h.orders().values().stream().mapToDouble(Double::doubleValue).sum();
            double kPerLiter = h.rateConstant() * Math.pow(1000.0, order - 1);
            String unit = order == 1 ? "1/s" : order == 2 ? "L/mol/s" : "(L/mol)^" + (order - 1) + "/s";
            out.printf(Locale.ROOT, "  %-30s k %.3g %s  orders %s  %s%n", h.equation(), kPerLiter, unit,
                    new java.util.TreeMap<>(h.orders()), refs.cite(h.source()));
        }
        refs.print();
    }

    private void heading(String title) {
        out.println();
        out.println(title);
    }

    /** Numbers the distinct source texts of a group. */
    private final class References {
        private final Map<String, Integer> numbers = new LinkedHashMap<>();

        String cite(String... sources) {
            List<String> cited = new ArrayList<>();
            for (String s : sources) {
                if (s == null) {
                    cited.add("-");
                    continue;
                }
                cited.add("[" + numbers.computeIfAbsent(s, k -> numbers.size() + 1) + "]");
            }
            return String.join(" ", cited);
        }

        void print() {
            out.println("  Sources:");
            numbers.forEach((text, n) -> out.printf(Locale.ROOT, "  [%d] %s%n", n, text));
        }
    }
}
