package org.cellwright.chart;

import java.nio.file.Path;
import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

/** Runs of the shipped scenarios for the report tests, made once. */
final class ReportFixture {

    static final ChemLibrary LIBRARY = LibraryReader.builtIn();
    private static RunResult tin;
    private static RunResult copper;

    private ReportFixture() {
    }

    static RunResult run(String scenario, String... sets) {
        try {
            var sc = new ScenarioReader(LIBRARY).read(Path.of("scenarios", scenario), List.of(sets));
            return CellSimulation.withDefaults().run(sc, LIBRARY, null);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    /** @return the tin scenario: graphite anode in a chloride bath, 2 A for 6 h */
    static synchronized RunResult tin() {
        if (tin == null) {
            tin = run("tin-stripping-liquor.toml");
        }
        return tin;
    }

    /** @return the copper scenario: lead-calcium anode in sulfate, 4 A for 8 h */
    static synchronized RunResult copper() {
        if (copper == null) {
            copper = run("copper-etchant-bleed.toml");
        }
        return copper;
    }
}
