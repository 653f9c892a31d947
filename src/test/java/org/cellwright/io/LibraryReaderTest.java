package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Phase;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.chem.Species;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The built-in library: completeness and its numbers against the handbooks. */
class LibraryReaderTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    static final List<String> SPECIES = List.of("H+", "OH-", "Cl-", "SO4^2-", "HSO4-", "NO3-", "Na+", "K+", "Sn2+",
            "Sn4+", "Cu2+", "Cu+", "Zn2+", "Ni2+", "Fe2+", "Fe3+", "Ag+", "Pb2+", "Al3+", "Cl2");
    static final List<String> COUPLES = List.of("Sn2+/Sn", "Sn4+/Sn2+", "Cu2+/Cu", "Cu2+/Cu+", "Cu+/Cu", "Zn2+/Zn",
            "Ni2+/Ni", "Ag+/Ag", "Pb2+/Pb", "Fe2+/Fe", "Fe3+/Fe2+", "H+/H2", "H2O/H2", "O2/H2O", "Cl2/Cl-");
    static final List<String> MATERIALS = List.of("lead", "lead-silver", "lead-calcium", "tin", "copper", "zinc",
            "nickel", "iron", "stainless", "aluminium", "titanium", "graphite", "platinum", "mmo", "silver");

    @Test
    void everySpeciesMetalCoupleAndMaterialIsThereWithSources() {
        assertTrue(LibraryReader.builtIn() == LIB, "the built-in library is cached");
        for (String name : SPECIES) {
            Species s = LIB.findSpecies(name).orElseThrow(() -> new AssertionError(name));
            for (String key : List.of("molar_mass", "diffusion", "conductivity")) {
                assertFalse(s.sources().getOrDefault(key, "").isBlank(), name + " " + key);
            }
        }
        for (String symbol : List.of("Sn", "Cu", "Zn", "Ni", "Fe", "Ag", "Pb", "Al")) {
            Metal m = LIB.findMetal(symbol).orElseThrow(() -> new AssertionError(symbol));
            assertFalse(m.sources().getOrDefault("density", "").isBlank(), symbol);
        }
        for (String couple : COUPLES) {
            ElectrodeReaction r = LIB.findReaction(couple).orElseThrow(() -> new AssertionError(couple));
            assertFalse(r.sources().getOrDefault("e0", "").isBlank(), couple);
            assertFalse(r.kinetics().source().isBlank(), couple);
        }
        for (String couple : List.of("H+/H2", "H2O/H2", "O2/H2O", "Cl2/Cl-")) {
            ElectrodeReaction r = LIB.findReaction(couple).orElseThrow();
            for (String material : MATERIALS) {
                Kinetics k = r.kineticsByMaterial().get(material);
                assertNotNull(k, couple + " on " + material);
                assertFalse(k.source().isBlank(), couple + " on " + material);
            }
        }
        assertEquals(3, LIB.homogeneousReactions().size());
    }

    @ParameterizedTest
    @CsvSource({
        // source: CRC Handbook 92nd ed., Electrochemical series (Vanysek), Table 1 (from memory; the 54th-ed.
        // table seen gives the same to 1 mV except Ni, Fe2+/Fe and Cu2+/Cu+)
        "Sn2+/Sn, -0.1375", "Sn4+/Sn2+, 0.151", "Cu2+/Cu, 0.3419", "Cu2+/Cu+, 0.153", "Cu+/Cu, 0.521",
        "Zn2+/Zn, -0.7618", "Ni2+/Ni, -0.257", "Ag+/Ag, 0.7996", "Pb2+/Pb, -0.1262", "Fe2+/Fe, -0.447",
        "Fe3+/Fe2+, 0.771", "H+/H2, 0", "H2O/H2, -0.8277", "O2/H2O, 1.229", "Cl2/Cl-, 1.35827"
    })
    void standardPotentials(String couple, double e0) {
        assertEquals(e0, LIB.findReaction(couple).orElseThrow().e0V(), 1e-9, couple);
    }

    @Test
    void waterReductionPotentialFollowsTheIonProductOfWater() {
        // source: CRC Handbook, ion product of water, pKw = 13.995 at 25 C (from memory):
        // E0(H2O/H2) = -(RT ln 10 / F) pKw = -0.8279 V; 1 mV tolerance = rounding of the tabulated E0
        double slope = Math.log(10) * PhysicalConstants.GAS_CONSTANT * 298.15 / PhysicalConstants.FARADAY;
        assertEquals(-slope * 13.995, LIB.findReaction("H2O/H2").orElseThrow().e0V(), 1e-3);
    }

    @Test
    void copperTemperatureCoefficientsAreConsistent() {
        // source: thermodynamics (Luther's rule for the entropies): 2 dE0(Cu2+/Cu) = dE0(Cu2+/Cu+) + dE0(Cu+/Cu)
        double two = 2 * LIB.findReaction("Cu2+/Cu").orElseThrow().dE0dTVPerK();
        double sum = LIB.findReaction("Cu2+/Cu+").orElseThrow().dE0dTVPerK()
                + LIB.findReaction("Cu+/Cu").orElseThrow().dE0dTVPerK();
        assertEquals(two, sum, 2e-6);
        // source: Bratsch 1989 (from memory), dE0/dT(Ag+/Ag) = -0.989 mV/K
        assertEquals(-0.989e-3, LIB.findReaction("Ag+/Ag").orElseThrow().dE0dTVPerK(), 1e-9);
    }

    @ParameterizedTest
    @CsvSource({
        // source: physics-data section 1 table, e = M/(zF) in g/(A h), from IUPAC atomic weights and F/3600
        "Sn, 2, 2.2146", "Cu, 2, 1.1855", "Zn, 2, 1.2197", "Ni, 2, 1.0950", "Ag, 1, 4.0247", "Pb, 2, 3.8655"
    })
    void faradayElectrochemicalEquivalents(String metal, int z, double gramsPerAmpHour) {
        double molarMassG = LIB.findMetal(metal).orElseThrow().molarMassKgPerMol() * 1000;
        double e = molarMassG / (z * PhysicalConstants.FARADAY / 3600.0);
        assertEquals(gramsPerAmpHour, e, gramsPerAmpHour * 1e-4, metal);
    }

    @Test
    void molarMassesAreTheSumOfStandardAtomicWeights() {
        // source: IUPAC (CIAAW) abridged standard atomic weights, 2021
        Map<String, Double> weights = Map.ofEntries(Map.entry("H", 1.008), Map.entry("O", 15.999),
                Map.entry("S", 32.06), Map.entry("Cl", 35.45), Map.entry("N", 14.007), Map.entry("Na", 22.990),
                Map.entry("K", 39.098), Map.entry("Al", 26.982), Map.entry("Fe", 55.845), Map.entry("Ni", 58.693),
                Map.entry("Cu", 63.546), Map.entry("Zn", 65.38), Map.entry("Ag", 107.87), Map.entry("Sn", 118.71),
                Map.entry("Pb", 207.2));
        for (Species s : LIB.species()) {
            assertFalse(s.elements().isEmpty(), s.name());
            double sum = s.elements().entrySet().stream().mapToDouble(e -> weights.get(e.getKey()) * e.getValue()).sum();
            assertEquals(sum, s.molarMassKgPerMol() * 1000, sum * 1e-9, s.name());
        }
        for (Metal m : LIB.metals()) {
            assertEquals(weights.get(m.symbol()), m.molarMassKgPerMol() * 1000, 1e-9, m.symbol());
        }
    }

    @Test
    void ionicConductivitiesAgreeWithDiffusionCoefficients() {
        // source: CRC Handbook, Ionic conductivity and diffusion at infinite dilution: its lambda and D columns obey
        // lambda = z^2 F^2 D / (R T) (Nernst-Einstein) to about 0.1 unit; 1 % tolerance catches a typing slip
        double f2rt = PhysicalConstants.FARADAY * PhysicalConstants.FARADAY
                / (PhysicalConstants.GAS_CONSTANT * PhysicalConstants.REFERENCE_TEMPERATURE_K);
        for (Species s : LIB.species()) {
            double expected = s.charge() * s.charge() * f2rt * s.diffusionM2PerS();
            assertEquals(expected, s.conductivitySM2PerMol(), 0.01 * Math.max(expected, 1e-12), s.name());
        }
    }

    @Test
    void unitsAreConvertedToSi() {
        // 1e-3 A/cm2 in the file = 10 A/m2
        assertEquals(10.0, LIB.findReaction("Cu2+/Cu").orElseThrow().kinetics().i0APerM2(), 1e-9);
        // 0.714e-9 m2/s and 107.2 S cm2/mol = 0.01072 S m2/mol
        Species cu = LIB.findSpecies("Cu2+").orElseThrow();
        assertEquals(0.714e-9, cu.diffusionM2PerS(), 1e-21);
        assertEquals(0.01072, cu.conductivitySM2PerMol(), 1e-12);
        // 8.96 g/cm3 = 8960 kg/m3; -0.32 mV/K
        assertEquals(8960, LIB.findMetal("Cu").orElseThrow().densityKgPerM3(), 1e-9);
        assertEquals(-0.32e-3, LIB.findReaction("Sn2+/Sn").orElseThrow().dE0dTVPerK(), 1e-12);
        // 1e6 L/mol/s = 1e3 m3/(mol s)
        HomogeneousReaction chlorineTin = LIB.homogeneousReactions().stream()
                .filter(h -> h.name().equals("Cl2 + Sn2+")).findFirst().orElseThrow();
        assertEquals(1e3, chlorineTin.rateConstant(), 1e-6);
        assertEquals(Map.of("Cl2", 1.0, "Sn2+", 1.0), chlorineTin.orders());
        assertEquals(Phase.DISSOLVED, chlorineTin.participants().stream()
                .filter(p -> p.name().equals("Cl2")).findFirst().orElseThrow().phase());
    }

    /** Overpotential (V) of a cathodic Tafel line through the library kinetics at {@code i} (A/m2), 25 C. */
    private static double cathodicOverpotential(Kinetics k, double i) {
        return k.cathodicTafelSlope(298.15) * Math.log10(i / k.i0APerM2());
    }

    private static double anodicOverpotential(Kinetics k, double i) {
        double b = Math.log(10) * PhysicalConstants.GAS_CONSTANT * 298.15 / (k.alphaA() * PhysicalConstants.FARADAY);
        return b * Math.log10(i / k.i0APerM2());
    }

    @ParameterizedTest
    @CsvSource({
        // source: physics-data check case R1, hydrogen overpotential at 500 A/m2 from the Tafel constants a, b
        // (Antropov's table, from memory); 2 mV tolerance = rounding of a, b and of i0 to three figures
        "zinc, 1.086", "copper, 0.650", "lead, 1.417", "nickel, 0.487"
    })
    void hydrogenOverpotentials(String material, double eta) {
        Kinetics k = LIB.findReaction("H+/H2").orElseThrow().kineticsOn(material);
        assertEquals(eta, cathodicOverpotential(k, 500), 0.002, material);
    }

    @Test
    void anodeOverpotentialsFallInTheQuotedPlantRanges() {
        ElectrodeReaction oxygen = LIB.findReaction("O2/H2O").orElseThrow();
        ElectrodeReaction chlorine = LIB.findReaction("Cl2/Cl-").orElseThrow();
        // source: Sinclair, Extractive Metallurgy of Zinc (2005), from memory: lead-silver 0.7-0.9 V at 400-600 A/m2
        assertInRange(anodicOverpotential(oxygen.kineticsOn("lead-silver"), 500), 0.7, 0.9);
        // source: from memory (physics-data 3c): IrO2-Ta2O5 0.3-0.45 V at 300-500 A/m2
        assertInRange(anodicOverpotential(oxygen.kineticsOn("mmo"), 300), 0.3, 0.45);
        assertInRange(anodicOverpotential(oxygen.kineticsOn("mmo"), 500), 0.3, 0.45);
        // source: from memory (physics-data 3c): graphite 0.8-1.1 V at 100-500 A/m2
        assertInRange(anodicOverpotential(oxygen.kineticsOn("graphite"), 100), 0.8, 1.1);
        assertInRange(anodicOverpotential(oxygen.kineticsOn("graphite"), 500), 0.8, 1.1);
        // source: Trasatti, Electrochim. Acta 45 (2000) 2377, from memory: chlorine on RuO2-TiO2 0.03-0.1 V at 1-3 kA/m2
        assertInRange(anodicOverpotential(chlorine.kineticsOn("mmo"), 1000), 0.03, 0.1);
        assertInRange(anodicOverpotential(chlorine.kineticsOn("mmo"), 3000), 0.03, 0.1);
        // source: Pletcher & Walsh 1990, from memory: chlorine on graphite 0.25-0.5 V at 1-2 kA/m2
        assertInRange(anodicOverpotential(chlorine.kineticsOn("graphite"), 1000), 0.25, 0.5);
        assertInRange(anodicOverpotential(chlorine.kineticsOn("graphite"), 2000), 0.25, 0.5);
        // source: Sinclair 2005 (from memory): zinc deposition overpotential 0.05-0.15 V at 400-600 A/m2
        assertInRange(cathodicOverpotential(LIB.findReaction("Zn2+/Zn").orElseThrow().kinetics(), 500), 0.05, 0.15);
    }

    private static void assertInRange(double value, double low, double high) {
        assertTrue(value >= low && value <= high, value + " not in [" + low + ", " + high + "]");
    }

    @Test
    void materialsAliasesAndAnodeBehaviour() {
        // source: interface brief: tin, copper, zinc, nickel and silver dissolve as anodes; lead and its alloys,
        // graphite, platinum, mmo and titanium are inert
        for (String soluble : List.of("tin", "copper", "zinc", "nickel", "silver")) {
            assertTrue(LIB.findMaterial(soluble).orElseThrow().isSoluble(), soluble);
        }
        for (String inert : List.of("lead", "lead-silver", "lead-calcium", "graphite", "platinum", "mmo", "titanium",
                "stainless")) {
            assertFalse(LIB.findMaterial(inert).orElseThrow().isSoluble(), inert);
        }
        assertEquals("Fe", LIB.findMaterial("iron").orElseThrow().solubleMetal());
        assertEquals("aluminium", LIB.findMaterial("Aluminum").orElseThrow().name());
        assertEquals("stainless", LIB.findMaterial("stainless-steel").orElseThrow().name());
        assertEquals("stainless", LIB.findMaterial("SS").orElseThrow().name());
        assertEquals("mmo", LIB.findMaterial("mixed-metal oxide").orElseThrow().name());
        assertEquals("lead-silver", LIB.findMaterial("Pb-Ag").orElseThrow().name());
        assertNull(LIB.findMaterial("graphite").orElseThrow().surfaceMetal());
        assertEquals("tin", LIB.materialOfMetal("Sn").map(ElectrodeMaterial::name).orElseThrow());
        assertEquals("lead", LIB.materialOfMetal("Pb").map(ElectrodeMaterial::name).orElseThrow());
        assertEquals("iron", LIB.materialOfMetal("Fe").map(ElectrodeMaterial::name).orElseThrow());
        for (Metal m : LIB.metals()) {
            assertTrue(LIB.materialOfMetal(m.symbol()).isPresent(), m.symbol());
        }
    }

    @Test
    void reactionsCarryTheirParticipants() {
        ElectrodeReaction water = LIB.findReaction("H2O/H2").orElseThrow();
        assertEquals(2, water.n());
        assertEquals("H2", water.gas().orElseThrow().name());
        assertEquals("Sn", LIB.findReaction("Sn2+/Sn").orElseThrow().depositedMetal().orElseThrow());
        assertTrue(LIB.findReaction("Sn4+/Sn2+").orElseThrow().depositedMetal().isEmpty());
        ElectrodeReaction dissolvedChlorine = LIB.findReaction("Cl2(aq)/Cl-").orElseThrow();
        assertTrue(dissolvedChlorine.gas().isEmpty());
    }
}
