package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.cellwright.sim.TracePoint;
import org.junit.jupiter.api.Test;

class ChartReadoutTest {

    @Test
    void nearestAgreesWithALinearScan() {
        long seed = 20240611L;
        SplittableRandom rnd = new SplittableRandom(seed);
        List<TracePoint> trace = new ArrayList<>();
        double t = 0;
        for (int i = 0; i < 200; i++) {
            trace.add(Traces.point(t, i));
            t += 0.5 + rnd.nextDouble(60);
        }
        for (int k = 0; k < 2000; k++) {
            double at = rnd.nextDouble(-100, t + 100);
            TracePoint best = trace.get(0);
            for (TracePoint p : trace) {
                if (Math.abs(p.timeS() - at) < Math.abs(best.timeS() - at)) {
                    best = p;
                }
            }
            assertEquals(Math.abs(best.timeS() - at), Math.abs(ChartReadout.nearest(trace, at).timeS() - at), 1e-12,
                    "seed " + seed + " at " + at);
        }
    }

    @Test
    void tooltipsGiveValuesWithUnitsAndWhereTheyComeFrom() {
        TracePoint p = TinRun.run().trace().get(60);
        String conc = ChartReadout.text(ChartReadout.Chart.COMPOSITION, p, TinRun.run().speciesNames(),
                TinRun.run().metalSymbols(), 0.03);
        assertTrue(conc.contains("at 1 h 0 min"), conc);
        assertTrue(conc.contains("Sn2+: ") && conc.contains(" mol/L"), conc);
        String volts = ChartReadout.text(ChartReadout.Chart.VOLTAGE, p, List.of(), List.of(), 0.03);
        assertTrue(volts.contains(String.format(java.util.Locale.ROOT, "cell voltage: %.3f V", p.state().cellVoltageV())));
        assertTrue(volts.contains("docs/model.md"), volts);
        String dendrite = ChartReadout.text(ChartReadout.Chart.DENDRITE, p, List.of(), List.of(), 0.03);
        assertTrue(dendrite.contains("gap: 30 mm"), dendrite);
    }
}
