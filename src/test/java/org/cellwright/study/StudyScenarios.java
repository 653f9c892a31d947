package org.cellwright.study;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.sim.TestScenarios;

/** Scenarios and the chemistry for the study tests, SI units throughout. */
final class StudyScenarios {

    /** Faraday constant (C/mol), exact since the 2019 SI (CODATA 2018). */
    static final double F = 96485.33212;
    /** Molar mass of copper (kg/mol), IUPAC standard atomic weight 63.546. */
    static final double CU_KG_PER_MOL = 63.546e-3;
    /** Molar mass of silver (kg/mol), IUPAC standard atomic weight 107.8682. */
    static final double AG_KG_PER_MOL = 107.8682e-3;

    private static ChemLibrary library;

    private StudyScenarios() {
    }

    /** @return the built-in chemistry, read once */
    static synchronized ChemLibrary library() {
        if (library == null) {
            library = LibraryReader.builtIn();
        }
        return library;
    }

    /**
     * An isothermal copper winning batch: stainless cathode, platinum anode, sulfate bath with acid, a set
     * diffusion layer.
     */
    static Scenario copperBatch(double volumeM3, double areaM2, double deltaM, double cuMolPerM3, double amps,
                                double durationS, double outputS) {
        return TestScenarios.copperBatch(volumeM3, areaM2, deltaM, cuMolPerM3, amps, durationS, outputS);
    }

    /**
     * An isothermal silver refining cell: silver anode, stainless cathode, nitrate bath; the anode supplies
     * what the cathode takes, so the bath does not deplete.
     */
    static Scenario silverRefining(double amps, double durationS) {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Ag+", 370.0);
        comp.put("H+", 150.0);
        comp.put("NO3-", 520.0);
        return new Scenario("silver refining", "", new Electrolyte(0.003, 298.15, comp, null),
                new Electrode("stainless", 0.03), new Electrode("silver", 0.03),
                new CellSetup(0.05, Agitation.ofLayer(100e-6), 298.15, 0, 300.0),
                PowerSupply.constantCurrent(amps), new RunSettings(durationS, 60, List.of(), "Ag"),
                List.of(), List.of());
    }

    /**
     * An isothermal silver winning batch: stainless cathode, platinum anode (oxygen), nitrate bath with nitric
     * acid, a set diffusion layer. Silver deposits with hardly any hydrogen at half its limiting current,
     * so the bath follows the textbook batch law.
     */
    static Scenario silverWinning(double volumeM3, double areaM2, double deltaM, double agMolPerM3, double durationS) {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Ag+", agMolPerM3);
        comp.put("H+", 500.0);
        comp.put("NO3-", agMolPerM3 + 500.0);
        return new Scenario("silver winning", "", new Electrolyte(volumeM3, 298.15, comp, null),
                new Electrode("stainless", areaM2), new Electrode("platinum", areaM2),
                new CellSetup(0.03, Agitation.ofLayer(deltaM), 298.15, 0, 1e5 * volumeM3),
                PowerSupply.constantCurrent(1.0), new RunSettings(durationS, 60, List.of(), "Ag"),
                List.of(), List.of());
    }
}
