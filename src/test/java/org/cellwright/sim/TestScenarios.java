package org.cellwright.sim;

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

/** Builds scenarios for the engine's tests, SI units throughout. */
public final class TestScenarios {

    private TestScenarios() {
    }

    /** An isothermal copper batch cell: stainless cathode, platinum anode, sulfate bath with acid. */
    public static Scenario copperBatch(double volumeM3, double areaM2, double deltaM, double cuMolPerM3, double amps,
                                double durationS, double outputS) {
        Map<String, Double> comp = new LinkedHashMap<>();
        comp.put("Cu2+", cuMolPerM3);
        comp.put("H+", 1000.0);
        comp.put("SO4^2-", cuMolPerM3 + 500.0);
        return new Scenario("copper batch", "", new Electrolyte(volumeM3, 298.15, comp, null),
                new Electrode("stainless", areaM2), new Electrode("platinum", areaM2),
                new CellSetup(0.03, Agitation.ofLayer(deltaM), 298.15, 0, 1e5 * volumeM3),
                PowerSupply.constantCurrent(amps), new RunSettings(durationS, outputS, List.of(), "Cu"),
                List.of(), List.of());
    }
}
