package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.cellwright.cell.Scenario;
import org.junit.jupiter.api.Test;

/**
 * Depletion of a batch cell under mass-transfer control, against the analytic laws of the well-mixed batch
 * electrochemical reactor (Pletcher &amp; Walsh, Industrial Electrochemistry, 2nd ed. 1990, ch. 2;
 * Trinidad, Walsh &amp; Gilroy, Int. J. Engng Ed. 14 (1998) 431).
 */
class MassTransferTest {

    private static final double D_CU = 0.714e-9;

    static double concentrationAt(RunResult r, double t) {
        int j = r.speciesNames().indexOf("Cu2+");
        for (TracePoint p : r.trace()) {
            if (Math.abs(p.timeS() - t) < 1e-6) {
                return p.state().concentrationsMolPerM3()[j];
            }
        }
        throw new AssertionError("no trace point at " + t);
    }

    @Test
    void batchReactorAtLimitingCurrentDecaysExponentially() {
        // V = 10 L, A = 0.10 m2, km = 1.0e-5 m/s, c0 = 1.0 mol/m3; 10 A is fifty times the limiting current.
        double km = 1.0e-5;
        Scenario sc = TestScenarios.copperBatch(0.010, 0.10, D_CU / km, 1.0, 10.0, 4 * 3600, 600);
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        // source: c(t) = c0 exp(-km A t / V), Trinidad, Walsh & Gilroy (1998); physics reference check case 8:
        // c(1 h) = 0.6977 mol/m3, c(4 h) = 0.2369 mol/m3. Tolerance 0.5 % (issue); the model's only departure
        // is the first ~11 s of the growing diffusion layer.
        assertEquals(0.6977, concentrationAt(r, 3600), 0.6977 * 0.005);
        assertEquals(0.2369, concentrationAt(r, 4 * 3600), 0.2369 * 0.005);
        for (double t : new double[] {1800, 7200, 10800}) {
            double exact = Math.exp(-km * 0.10 * t / 0.010);
            assertEquals(exact, concentrationAt(r, t), exact * 0.005, "t = " + t);
        }
    }

    @Test
    void galvanostaticRunChangesFromLinearToExponentialDepletion() {
        // I = 10 A, n = 2, V = 100 L, A = 1.0 m2, km = 2.0e-5 m/s, c0 = 50 mol/m3 (3.18 g/L Cu).
        double km = 2.0e-5;
        double tCrit = 91485;
        Scenario sc = TestScenarios.copperBatch(0.100, 1.0, D_CU / km, 50.0, 10.0, tCrit + 7200, 45);
        RunResult r = CellSimulation.withDefaults().run(sc, TestChemistry.library(10), null);
        double cCrit = 10.0 / (2 * 96485.33212 * km * 1.0);
        // source: c* = I/(n F km A) = 2.591 mol/m3, t* = n F V (c0 - c*)/I = 91 485 s (Pletcher & Walsh 1990;
        // physics reference check case 9)
        assertEquals(2.591, cCrit, 0.001);
        for (double t = 900; t < tCrit - 900; t += 9000) {
            // source: linear depletion at I/(n F V) below the limiting current, CE = 1
            double linear = 50.0 - 10.0 * t / (2 * 96485.33212 * 0.100);
            assertEquals(linear, concentrationAt(r, t), linear * 0.01, "t = " + t);
            assertEquals(1.0, efficiencyAt(r, t), 0.01, "CE at t = " + t);
        }
        // source: after t*, c = c* exp(-km A (t - t*)/V), CE = c/c*: at t* + 1 h c = 1.261, CE = 0.487;
        // at t* + 2 h c = 0.614, CE = 0.237 (physics reference check case 9). Tolerance 1 % (issue).
        double t1 = tCrit + 3600;
        double t2 = tCrit + 7200;
        double c1 = cCrit * Math.exp(-km * 3600 / 0.1);
        double c2 = cCrit * Math.exp(-km * 7200 / 0.1);
        double at1 = interpolate(r, t1);
        double at2 = interpolate(r, t2);
        assertEquals(1.261, c1, 0.001);
        assertEquals(c1, at1, c1 * 0.01);
        assertEquals(c2, at2, c2 * 0.01);
        assertEquals(0.487, c1 / cCrit, 0.001);
        assertEquals(c1 / cCrit, efficiencyNear(r, t1), 0.01 * c1 / cCrit + 1e-3);
        assertEquals(c2 / cCrit, efficiencyNear(r, t2), 0.01 * c2 / cCrit + 1e-3);
    }

    private static double efficiencyAt(RunResult r, double t) {
        return r.trace().stream().filter(p -> Math.abs(p.timeS() - t) < 1e-6).findFirst().orElseThrow()
                .state().targetEfficiency();
    }

    static double efficiencyNear(RunResult r, double t) {
        List<TracePoint> tr = r.trace();
        TracePoint best = tr.get(0);
        for (TracePoint p : tr) {
            if (Math.abs(p.timeS() - t) < Math.abs(best.timeS() - t)) {
                best = p;
            }
        }
        assertEquals(t, best.timeS(), 1e-6, "output grid must hit " + t);
        return best.state().targetEfficiency();
    }

    static double interpolate(RunResult r, double t) {
        int j = r.speciesNames().indexOf("Cu2+");
        List<TracePoint> tr = r.trace();
        for (int i = 1; i < tr.size(); i++) {
            if (tr.get(i).timeS() >= t) {
                TracePoint a = tr.get(i - 1);
                TracePoint b = tr.get(i);
                double f = (t - a.timeS()) / (b.timeS() - a.timeS());
                return a.state().concentrationsMolPerM3()[j] * (1 - f) + b.state().concentrationsMolPerM3()[j] * f;
            }
        }
        throw new AssertionError("run ended before " + t);
    }
}
