package org.cellwright.study;

import java.util.Objects;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;

/**
 * Runs one scenario to its result: the engine, as the studies see it. Must be safe to call from several
 * threads at once; {@link #engine(ChemLibrary)} is, because it makes a new {@link CellSimulation} per run
 * (the engine keeps state during a run and is not thread-safe per instance, but instances are cheap).
 */
@FunctionalInterface
public interface ScenarioRunner {

    /**
     * @param sc the scenario
     * @return its run
     * @throws IllegalArgumentException when the scenario cannot run with the chemistry
     */
    RunResult run(Scenario sc);

    /**
     * @param library the chemistry (immutable, shared by every run)
     * @return a runner on the default engine, one new simulation per run
     */
    static ScenarioRunner engine(ChemLibrary library) {
        Objects.requireNonNull(library, "library");
        return sc -> CellSimulation.withDefaults().run(sc, library, null);
    }
}
