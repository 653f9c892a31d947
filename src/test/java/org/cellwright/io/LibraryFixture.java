package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.DepositClass;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.chem.Species;

/**
 * A small chemistry library for the reader's tests: the species, metals, reactions and materials that the
 * test scenarios name. Molar masses follow the IUPAC standard atomic weights and diffusion coefficients the
 * CRC Handbook table of ionic conductivity and diffusion at infinite dilution (as copied in the project's
 * reference sheet); Sn2+, Sn4+ and Cu+ are rough estimates. The reader only uses names, charges, molar
 * masses and elements, so these values are not under test here.
 */
public final class LibraryFixture {

    private LibraryFixture() {
    }

    /** @return the fixture library */
    public static ChemLibrary library() {
        List<Species> species = new ArrayList<>();
        species.add(ion("H+", 1, 1.008, 9.311, Map.of("H", 1)));
        species.add(ion("OH-", -1, 17.007, 5.273, Map.of("O", 1, "H", 1)));
        species.add(ion("Cl-", -1, 35.45, 2.032, Map.of("Cl", 1)));
        species.add(ion("SO4^2-", -2, 96.06, 1.065, Map.of("S", 1, "O", 4)));
        species.add(ion("HSO4-", -1, 97.07, 1.385, Map.of("H", 1, "S", 1, "O", 4)));
        species.add(ion("NO3-", -1, 62.004, 1.902, Map.of("N", 1, "O", 3)));
        species.add(ion("Na+", 1, 22.990, 1.334, Map.of("Na", 1)));
        species.add(ion("K+", 1, 39.098, 1.957, Map.of("K", 1)));
        species.add(ion("Sn2+", 2, 118.71, 0.75, Map.of("Sn", 1)));
        species.add(ion("Sn4+", 4, 118.71, 0.5, Map.of("Sn", 1)));
        species.add(ion("Cu2+", 2, 63.546, 0.714, Map.of("Cu", 1)));
        species.add(ion("Cu+", 1, 63.546, 1.0, Map.of("Cu", 1)));
        species.add(ion("Zn2+", 2, 65.38, 0.703, Map.of("Zn", 1)));
        species.add(ion("Ni2+", 2, 58.693, 0.661, Map.of("Ni", 1)));
        species.add(ion("Fe2+", 2, 55.845, 0.719, Map.of("Fe", 1)));
        species.add(ion("Fe3+", 3, 55.845, 0.604, Map.of("Fe", 1)));
        species.add(ion("Ag+", 1, 107.868, 1.648, Map.of("Ag", 1)));
        species.add(ion("Pb2+", 2, 207.2, 0.945, Map.of("Pb", 1)));
        species.add(ion("Al3+", 3, 26.982, 0.541, Map.of("Al", 1)));

        List<Metal> metals = List.of(
                metal("Sn", 118.71, 7287, DepositClass.NORMAL), metal("Cu", 63.546, 8960, DepositClass.INTERMEDIATE),
                metal("Zn", 65.38, 7140, DepositClass.NORMAL), metal("Ni", 58.693, 8908, DepositClass.INERT),
                metal("Fe", 55.845, 7874, DepositClass.INERT), metal("Ag", 107.868, 10490, DepositClass.NORMAL),
                metal("Pb", 207.2, 11340, DepositClass.NORMAL), metal("Al", 26.982, 2700, DepositClass.INERT));

        List<ElectrodeReaction> reactions = List.of(
                deposit("Cu2+", "Cu", 2, 0.3419), deposit("Sn2+", "Sn", 2, -0.1375),
                deposit("Zn2+", "Zn", 2, -0.7618), deposit("Ni2+", "Ni", 2, -0.257),
                deposit("Ag+", "Ag", 1, 0.7996), deposit("Pb2+", "Pb", 2, -0.1262),
                redox("Sn4+", "Sn2+", 2, 0.151), redox("Fe3+", "Fe2+", 1, 0.771),
                reaction("H+/H2", "2H+ + 2e- = H2", 2, 0.0,
                        List.of(p("H+", -2, Phase.DISSOLVED), p("H2", 1, Phase.GAS))),
                reaction("O2/H2O", "O2 + 4H+ + 4e- = 2H2O", 4, 1.229,
                        List.of(p("O2", -1, Phase.GAS), p("H+", -4, Phase.DISSOLVED), p("H2O", 2, Phase.WATER))),
                reaction("Cl2/Cl-", "Cl2 + 2e- = 2Cl-", 2, 1.35827,
                        List.of(p("Cl2", -1, Phase.GAS), p("Cl-", 2, Phase.DISSOLVED))));

        List<ElectrodeMaterial> materials = List.of(
                material("lead", "Pb"), material("lead-silver", "Pb"), material("lead-calcium", "Pb"),
                material("tin", "Sn"), material("copper", "Cu"), material("zinc", "Zn"), material("nickel", "Ni"),
                material("iron", "Fe"), material("stainless", null), material("aluminium", null, "aluminum"),
                material("titanium", null), material("graphite", null), material("platinum", null),
                material("mmo", null), material("silver", "Ag"));
        return new ChemLibrary(species, metals, reactions, List.of(), materials);
    }

    private static Species ion(String name, int z, double gPerMol, double d1e9, Map<String, Integer> elements) {
        double d = d1e9 * 1.0e-9;
        double f = PhysicalConstants.FARADAY;
        double lambda = z * z * f * f * d / (PhysicalConstants.GAS_CONSTANT * PhysicalConstants.REFERENCE_TEMPERATURE_K);
        return new Species(name, z, gPerMol / 1000, d, lambda, elements, Map.of("all", "test fixture"));
    }

    private static Metal metal(String symbol, double gPerMol, double density, DepositClass c) {
        return new Metal(symbol, gPerMol / 1000, density, c, Map.of("all", "test fixture"));
    }

    private static Participant p(String name, double coefficient, Phase phase) {
        return new Participant(name, coefficient, phase);
    }

    private static ElectrodeReaction deposit(String ion, String metal, int n, double e0) {
        return reaction(ion + "/" + metal, ion + " + " + n + "e- = " + metal, n, e0,
                List.of(p(ion, -1, Phase.DISSOLVED), p(metal, 1, Phase.SOLID)));
    }

    private static ElectrodeReaction redox(String ox, String red, int n, double e0) {
        return reaction(ox + "/" + red, ox + " + " + n + "e- = " + red, n, e0,
                List.of(p(ox, -1, Phase.DISSOLVED), p(red, 1, Phase.DISSOLVED)));
    }

    private static ElectrodeReaction reaction(String name, String equation, int n, double e0, List<Participant> ps) {
        return new ElectrodeReaction(name, equation, n, ps, e0, 0.0, new Kinetics(1.0, 0.5, 0.5, "test fixture"),
                Map.of(), Map.of("all", "test fixture"));
    }

    private static ElectrodeMaterial material(String name, String metal, String... aliases) {
        return new ElectrodeMaterial(name, List.of(aliases), isSoluble(name) ? metal : null, metal, name);
    }

    private static boolean isSoluble(String name) {
        return List.of("tin", "copper", "zinc", "nickel", "silver").contains(name);
    }
}
