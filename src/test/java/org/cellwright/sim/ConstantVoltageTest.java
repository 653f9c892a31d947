package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/** Under constant voltage, the current follows the metal down as it depletes. */
class ConstantVoltageTest {

    @Test
    void currentNeverRisesWhileTheMetalDepletes() {
        // pinned conductivity and a large heat-loss conductance: depletion is the only change
        Scenario base = TestScenarios.copperBatch(0.002, 0.01, 50e-6, 100.0, 1.0, 6 * 3600, 60);
        Scenario sc = base.withSupply(PowerSupply.constantVoltage(2.2))
                .withElectrolyte(base.electrolyte().withConcentration("H+", 1000.0));
        sc = sc.withElectrolyte(new org.cellwright.cell.Electrolyte(sc.electrolyte().volumeM3(),
                sc.electrolyte().temperatureK(), sc.electrolyte().compositionMolPerM3(), 30.0));
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        List<TracePoint> tr = r.trace();
        int cu = r.speciesNames().indexOf("Cu2+");
        double first = tr.get(1).state().currentA();
        double last = tr.get(tr.size() - 1).state().currentA();
        assertTrue(first > 0.05, "the cell must draw current at 2.2 V: " + first);
        assertTrue(last < 0.9 * first, "the current must fall as copper depletes: " + first + " -> " + last);
        assertTrue(tr.get(tr.size() - 1).state().concentrationsMolPerM3()[cu] < 50, "copper must deplete");
        for (int i = 2; i < tr.size(); i++) {
            double prev = tr.get(i - 1).state().currentA();
            double now = tr.get(i).state().currentA();
            // a relative 1e-9 allowance covers the root-finder's tolerance on the current
            assertTrue(now <= prev * (1 + 1e-9), "current rose at t = " + tr.get(i).timeS() + ": " + prev + " -> " + now);
        }
    }
}
