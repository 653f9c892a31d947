package org.cellwright.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.DepositClass;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.Species;

/**
 * A small, controlled chemistry for the engine's analytic tests: values from the CRC Handbook where they
 * matter (D of Cu2+ 0.714e-9 m2/s, E0 of Cu2+/Cu 0.3419 V), kinetics chosen so that each test isolates the
 * law it checks (fast metal kinetics for mass-transfer tests).
 */
final class TestChemistry {

    private TestChemistry() {
    }

    static Species ion(String name, int z, double gPerMol, double d, Map<String, Integer> elements) {
        double lambda = d * z * z * 96485.33212 * 96485.33212 / (8.314462618 * 298.15);
        return new Species(name, z, gPerMol / 1000, d, lambda, elements, Map.of("all", "test fixture"));
    }

    static List<Species> species() {
        return List.of(
                ion("H+", 1, 1.008, 9.311e-9, Map.of("H", 1)),
                ion("OH-", -1, 17.007, 5.273e-9, Map.of("O", 1, "H", 1)),
                ion("Cu2+", 2, 63.546, 0.714e-9, Map.of("Cu", 1)),
                ion("Sn2+", 2, 118.71, 0.75e-9, Map.of("Sn", 1)),
                ion("Sn4+", 4, 118.71, 0.6e-9, Map.of("Sn", 1)),
                ion("Fe2+", 2, 55.845, 0.719e-9, Map.of("Fe", 1)),
                ion("Fe3+", 3, 55.845, 0.604e-9, Map.of("Fe", 1)),
                ion("Cl-", -1, 35.45, 2.032e-9, Map.of("Cl", 1)),
                ion("SO4^2-", -2, 96.06, 1.065e-9, Map.of("S", 1, "O", 4)),
                ion("Na+", 1, 22.99, 1.334e-9, Map.of("Na", 1)),
                new Species("Cl2", 0, 0.0709, 1.25e-9, 0, Map.of("Cl", 2), Map.of("all", "test fixture")));
    }

    static Participant p(String name, double nu, Phase phase) {
        return new Participant(name, nu, phase);
    }

    static ElectrodeReaction reaction(String name, int n, double e0, Kinetics k, Map<String, Kinetics> byMaterial,
                                      Participant... ps) {
        return new ElectrodeReaction(name, name, n, List.of(ps), e0, 0, k, byMaterial, Map.of());
    }

    /** @return the fixture library; {@code metalI0} is the exchange current density of metal deposition (A/m2) */
    static ChemLibrary library(double metalI0) {
        Kinetics metal = new Kinetics(metalI0, 1.5, 0.5, "test");
        Kinetics hydrogen = new Kinetics(1e-3, 0.5, 0.5, "test");
        Kinetics water = new Kinetics(1e-6, 0.5, 0.5, "test");
        Kinetics oxygen = new Kinetics(1e-5, 0.5, 3.5, "test");
        Kinetics chlorine = new Kinetics(1.0, 1.5, 0.5, "test");
        Kinetics redox = new Kinetics(10.0, 0.5, 0.5, "test");
        Kinetics tinRedox = new Kinetics(1.0, 1.0, 1.0, "test");
        List<ElectrodeReaction> r = new ArrayList<>();
        r.add(reaction("Cu2+/Cu", 2, 0.3419, metal, Map.of(), p("Cu2+", -1, Phase.DISSOLVED), p("Cu", 1, Phase.SOLID)));
        r.add(reaction("Sn2+/Sn", 2, -0.1375, metal, Map.of(), p("Sn2+", -1, Phase.DISSOLVED), p("Sn", 1, Phase.SOLID)));
        r.add(reaction("Sn4+/Sn2+", 2, 0.151, tinRedox, Map.of(), p("Sn4+", -1, Phase.DISSOLVED), p("Sn2+", 1, Phase.DISSOLVED)));
        r.add(reaction("Fe3+/Fe2+", 1, 0.771, redox, Map.of(), p("Fe3+", -1, Phase.DISSOLVED), p("Fe2+", 1, Phase.DISSOLVED)));
        r.add(reaction("H+/H2", 2, 0, hydrogen, Map.of(), p("H+", -2, Phase.DISSOLVED), p("H2", 1, Phase.GAS)));
        r.add(reaction("H2O/H2", 2, -0.828, water, Map.of(), p("H2O", -2, Phase.WATER), p("H2", 1, Phase.GAS),
                p("OH-", 2, Phase.DISSOLVED)));
        r.add(reaction("O2/H2O", 4, 1.229, oxygen, Map.of(), p("O2", -1, Phase.GAS), p("H+", -4, Phase.DISSOLVED),
                p("H2O", 2, Phase.WATER)));
        r.add(reaction("Cl2/Cl-", 2, 1.35827, chlorine, Map.of(), p("Cl2", -1, Phase.GAS), p("Cl-", 2, Phase.DISSOLVED)));
        List<HomogeneousReaction> h = List.of(
                new HomogeneousReaction("Cl2 + Sn2+", "Cl2 + Sn2+ -> Sn4+ + 2Cl-",
                        List.of(p("Cl2", -1, Phase.DISSOLVED), p("Sn2+", -1, Phase.DISSOLVED),
                                p("Sn4+", 1, Phase.DISSOLVED), p("Cl-", 2, Phase.DISSOLVED)),
                        1e3, Map.of("Cl2", 1.0, "Sn2+", 1.0), "test"),
                new HomogeneousReaction("Fe3+ + Sn2+", "2Fe3+ + Sn2+ -> 2Fe2+ + Sn4+",
                        List.of(p("Fe3+", -2, Phase.DISSOLVED), p("Sn2+", -1, Phase.DISSOLVED),
                                p("Fe2+", 2, Phase.DISSOLVED), p("Sn4+", 1, Phase.DISSOLVED)),
                        1e-1, Map.of("Fe3+", 1.0, "Sn2+", 1.0), "test"));
        List<Metal> metals = List.of(
                new Metal("Cu", 0.063546, 8960, DepositClass.INTERMEDIATE, Map.of()),
                new Metal("Sn", 0.11871, 7287, DepositClass.NORMAL, Map.of()));
        List<ElectrodeMaterial> materials = List.of(
                new ElectrodeMaterial("stainless", List.of(), null, "Fe", "stainless steel"),
                new ElectrodeMaterial("graphite", List.of(), null, null, "graphite"),
                new ElectrodeMaterial("platinum", List.of(), null, "Pt", "platinum"),
                new ElectrodeMaterial("copper", List.of(), "Cu", "Cu", "copper"),
                new ElectrodeMaterial("tin", List.of(), "Sn", "Sn", "tin"));
        return new ChemLibrary(species(), metals, r, h, materials);
    }
}
