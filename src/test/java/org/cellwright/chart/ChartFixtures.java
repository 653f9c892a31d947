package org.cellwright.chart;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.DepositClass;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.Species;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

/**
 * Real runs for the chart tests: an invented copper sulfate batch cell (a stainless blank, a platinum
 * anode) run at a current near the copper's limiting current, so that copper depletes, the efficiency
 * falls as hydrogen takes over, gas loads the gap and the bath warms. Chemistry reduced from the engine's
 * test fixture (org.cellwright.sim.TestChemistry): CRC Handbook values where they matter (D of Cu2+
 * 0.714e-9 m2/s, E0 of Cu2+/Cu 0.3419 V), kinetics chosen for the fixture.
 */
final class ChartFixtures {

    /** Electrolyte volume (m3): 1 L. */
    static final double VOLUME_M3 = 1e-3;
    /** Electrode area (m2): 100 cm2. */
    static final double AREA_M2 = 0.01;
    /** Start copper concentration (mol/m3): 0.2 mol/L. */
    static final double COPPER_MOL_PER_M3 = 200;
    /** Anode-cathode gap (m): 30 mm. */
    static final double GAP_M = 0.03;

    private ChartFixtures() {
    }

    private static Species ion(String name, int z, double gPerMol, double d, Map<String, Integer> elements) {
        // Nernst-Einstein molar conductivity from D at 25 C (the engine fixture's rule).
        double lambda = d * z * z * 96485.33212 * 96485.33212 / (8.314462618 * 298.15);
        return new Species(name, z, gPerMol / 1000, d, lambda, elements, Map.of("all", "test fixture"));
    }

    private static Participant p(String name, double nu, Phase phase) {
        return new Participant(name, nu, phase);
    }

    private static ElectrodeReaction reaction(String name, int n, double e0, Kinetics k, Participant... ps) {
        return new ElectrodeReaction(name, name, n, List.of(ps), e0, 0, k, Map.of(), Map.of());
    }

    static ChemLibrary library() {
        List<Species> species = List.of(
                ion("H+", 1, 1.008, 9.311e-9, Map.of("H", 1)),
                ion("OH-", -1, 17.007, 5.273e-9, Map.of("O", 1, "H", 1)),
                ion("Cu2+", 2, 63.546, 0.714e-9, Map.of("Cu", 1)),
                ion("SO4^2-", -2, 96.06, 1.065e-9, Map.of("S", 1, "O", 4)));
        Kinetics metal = new Kinetics(10, 1.5, 0.5, "test");
        Kinetics hydrogen = new Kinetics(1e-3, 0.5, 0.5, "test");
        Kinetics water = new Kinetics(1e-6, 0.5, 0.5, "test");
        Kinetics oxygen = new Kinetics(1e-5, 0.5, 3.5, "test");
        List<ElectrodeReaction> r = List.of(
                reaction("Cu2+/Cu", 2, 0.3419, metal, p("Cu2+", -1, Phase.DISSOLVED), p("Cu", 1, Phase.SOLID)),
                reaction("H+/H2", 2, 0, hydrogen, p("H+", -2, Phase.DISSOLVED), p("H2", 1, Phase.GAS)),
                reaction("H2O/H2", 2, -0.828, water, p("H2O", -2, Phase.WATER), p("H2", 1, Phase.GAS),
                        p("OH-", 2, Phase.DISSOLVED)),
                reaction("O2/H2O", 4, 1.229, oxygen, p("O2", -1, Phase.GAS), p("H+", -4, Phase.DISSOLVED),
                        p("H2O", 2, Phase.WATER)));
        List<Metal> metals = List.of(new Metal("Cu", 0.063546, 8960, DepositClass.INTERMEDIATE, Map.of()));
        List<ElectrodeMaterial> materials = List.of(
                new ElectrodeMaterial("stainless", List.of(), null, "Fe", "stainless steel"),
                new ElectrodeMaterial("platinum", List.of(), null, "Pt", "platinum"));
        return new ChemLibrary(species, metals, r, List.of(), materials);
    }

    /**
     * @param amps constant current (A)
     * @param durationS run duration (s)
     * @param outputS output interval (s)
     * @return the copper batch scenario
     */
    static Scenario copperBatch(double amps, double durationS, double outputS) {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Cu2+", COPPER_MOL_PER_M3);
        comp.put("H+", 1000.0);
        comp.put("SO4^2-", COPPER_MOL_PER_M3 + 500.0);
        return new Scenario("Copper recovery from an etchant bleed (test)", "", new Electrolyte(VOLUME_M3, 298.15, comp, null),
                new Electrode("stainless", AREA_M2), new Electrode("platinum", AREA_M2),
                new CellSetup(GAP_M, Agitation.ofLayer(1e-4), 298.15, 0.02, 1.5),
                PowerSupply.constantCurrent(amps), new RunSettings(durationS, outputS, List.of(), "Cu"),
                List.of(), List.of());
    }

    /**
     * @param amps constant current (A)
     * @param durationS run duration (s)
     * @return a finished run of the copper batch, sampled every 30 s
     */
    static RunResult run(double amps, double durationS) {
        return CellSimulation.withDefaults().run(copperBatch(amps, durationS, 30), library(), null);
    }

    /**
     * @param amps set current (A)
     * @param voltageLimitV the supply's voltage limit (V)
     * @param durationS run duration (s)
     * @return a finished run in which the supply may reach its voltage limit and let the current fall
     */
    static RunResult runWithVoltageLimit(double amps, double voltageLimitV, double durationS) {
        Scenario sc = copperBatch(amps, durationS, 30);
        sc = sc.withSupply(new PowerSupply(ControlMode.CURRENT, amps, 0, voltageLimitV, Double.POSITIVE_INFINITY,
                List.of()));
        return CellSimulation.withDefaults().run(sc, library(), null);
    }
}
