package org.cellwright.ui;

import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioException;
import org.cellwright.io.ScenarioReader;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

/** The window's default scenario (tin from a spent tin-stripping liquor) and one run of it, made once. */
final class TinRun {

    private static ChemLibrary lib;
    private static Scenario scenario;
    private static RunResult run;

    private TinRun() {
    }

    static synchronized ChemLibrary lib() {
        if (lib == null) {
            lib = LibraryReader.builtIn();
        }
        return lib;
    }

    static synchronized Scenario scenario() {
        if (scenario == null) {
            try {
                scenario = new ScenarioReader(lib()).parse(ScenarioTemplate.defaultTemplate().text(), "tin.toml",
                        List.of()).scenario();
            } catch (ScenarioException e) {
                throw new AssertionError(e.getMessage(), e);
            }
        }
        return scenario;
    }

    static synchronized RunResult run() {
        if (run == null) {
            run = CellSimulation.withDefaults().run(scenario(), lib(), null);
        }
        return run;
    }
}
