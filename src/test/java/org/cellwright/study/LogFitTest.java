package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;

import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.RunLogReader;
import org.cellwright.io.ScenarioTemplate;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.Test;

/**
 * Logs made by the engine from known parameters, sampled at irregular times with seeded noise and blank
 * cells, are fitted back: the true values must lie inside the 95 % intervals, and each dense column's
 * residual must match the noise put in. The coverage of the intervals itself is checked on many datasets in
 * {@link ConfidenceIntervalCoverageTest}; here one seed per case, printed on failure.
 */
class LogFitTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();
    /** Mean time between log rows (s): a logger writing about every 1.5 min. */
    private static final double GAP_S = 90;

    private static String scenarioText() throws IOException {
        try (InputStream in = LogFitTest.class.getResourceAsStream("copper-rinse.toml")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /** Makes a log from the true values, reads it back through the CSV reader, fits, and returns the result. */
    private static LogFitResult fitBack(List<String> keys, double[] truth, List<SyntheticLog.Column> columns, long seed)
            throws Exception {
        ScenarioTemplate template = ScenarioTemplate.parse(scenarioText(), "copper-rinse.toml", List.of(), keys, LIB);
        Scenario truthScenario = template.at(truth);
        // the truth recorded every 5 s, finer than the fit's own model runs
        truthScenario = truthScenario.withRun(new RunSettings(truthScenario.run().durationS(), 5, List.of(),
                truthScenario.run().targetMetal()));
        RunResult truthRun = CellSimulation.withDefaults().run(truthScenario, LIB, null);
        String csv = SyntheticLog.csv(truthRun, LIB, columns, GAP_S, seed);
        MeasuredLog log = new RunLogReader(LIB).parse(csv, "synthetic-" + seed + ".csv").log();
        Map<String, Double> weights = new LinkedHashMap<>();
        for (SyntheticLog.Column c : columns) {
            // each column weighted by the inverse of its relative noise, so that all share one variance
            LogSeries s = log.column(c.series().column());
            weights.put(s.column(), s.rootMeanSquare() / c.sigma());
        }
        return new LogFit(template, LIB, log, weights).fit(LeastSquaresFit.Options.forEngine(), FitMonitor.NONE);
    }

    private static void assertRecovered(LogFitResult r, List<String> keys, double[] truth, long seed) {
        assertTrue(r.outcome().converged(), "not converged (seed " + seed + ")");
        for (int j = 0; j < truth.length; j++) {
            FittedParameter p = r.outcome().parameter(keys.get(j));
            assertTrue(p.covers(truth[j]), p.key() + " = " + p.value() + " in [" + p.low() + ", " + p.high()
                    + "] misses the true " + truth[j] + " (seed " + seed + ")");
        }
    }

    @Test
    void diffusionLayerAndHydrogenExchangeCurrentFromCurrentVoltageDepositAndCopper() throws Exception {
        long seed = 42;
        List<String> keys = List.of("cell.diffusion_layer", "reaction.H+/H2.i0");
        // invented truth: 150 um (the file says 100 um), and hydrogen on copper 4.5 times the library's value
        double[] truth = {150e-6, 5e-3};
        // common practice: a bench logger reads current to 10 mA and voltage to 5 mV; the deposit is weighed
        // every 30 min to 10 mg, the bath titrated for copper every 30 min to 0.05 g/L
        List<SyntheticLog.Column> columns = List.of(
                SyntheticLog.column("current_A", LoggedQuantity.CURRENT, null, 0.01, 0, 0.05),
                SyntheticLog.column("cell_voltage_V", LoggedQuantity.CELL_VOLTAGE, null, 0.005, 0, 0.05),
                SyntheticLog.column("deposit_g", LoggedQuantity.DEPOSIT, null, 0.01, 1800, 0),
                SyntheticLog.column("c_Cu2+_g_per_L", LoggedQuantity.CONCENTRATION_G_PER_L, "Cu2+", 0.05, 1800, 0));
        LogFitResult r = fitBack(keys, truth, columns, seed);
        assertRecovered(r, keys, truth, seed);
        // source: the noise put in; about 110 rows give the RMSE to sqrt(1 / (2 n)) = 7 %, so 25 % is 3.5 of those
        assertEquals(0.005, r.rmse().get("cell_voltage_V"), 0.25 * 0.005, "seed " + seed);
        assertEquals(0.01, r.rmse().get("current_A"), 0.25 * 0.01, "seed " + seed);
        assertEquals(2, r.outcome().parameters().size());
        assertTrue(r.outcome().iterations() < 20, "iterations " + r.outcome().iterations());
    }

    @Test
    void contactResistanceFromCellVoltageAlone() throws Exception {
        long seed = 1;
        List<String> keys = List.of("cell.contact_resistance");
        // invented truth: 25 mohm of leads and clamps; the file has none, so the fit starts at zero
        double[] truth = {0.025};
        List<SyntheticLog.Column> columns = List.of(
                SyntheticLog.column("cell_voltage_V", LoggedQuantity.CELL_VOLTAGE, null, 0.005, 0, 0.1));
        LogFitResult r = fitBack(keys, truth, columns, seed);
        assertRecovered(r, keys, truth, seed);
        FittedParameter p = r.outcome().parameter("cell.contact_resistance");
        // source: 5 mV noise on about 100 voltages at 2 A bounds R to 2.5 mohm / sqrt(100) = 0.25 mohm (one
        // standard error), so the interval is about +-0.5 mohm; 0.2 to 1 mohm accepts the spread of s
        assertTrue(p.high() - p.low() > 0.4e-3 && p.high() - p.low() < 2e-3, p.toString());
        assertEquals(ParameterScale.NON_NEGATIVE, p.scale());
    }

    @Test
    void aKeyThatMovesNothingIsNamedBeforeAnyIteration() throws Exception {
        // without a material, reaction.H+/H2.i0 changes the default hydrogen kinetics, which neither the
        // stainless substrate nor the copper deposit uses (both have their own in the library)
        String text = scenarioText().replace("[reaction.\"H+/H2\"]\nmaterial = \"copper\"", "");
        ScenarioTemplate template = ScenarioTemplate.parse(text, "no-material.toml", List.of(),
                List.of("reaction.H+/H2.i0", "cell.diffusion_layer"), LIB);
        MeasuredLog log = new MeasuredLog("two-rows.csv", new double[] {600, 1200, 1800},
                List.of(new LogSeries("cell_voltage_V", LoggedQuantity.CELL_VOLTAGE, null, new double[] {2.9, 2.9, 2.9})));
        InsensitiveParameterException e = assertThrows(InsensitiveParameterException.class,
                () -> new LogFit(template, LIB, log, Map.of()).fit(LeastSquaresFit.Options.forEngine(), FitMonitor.NONE));
        assertEquals(List.of("reaction.H+/H2.i0"), e.keys());
    }

    @Test
    void progressIsReportedAndACancelStopsTheFit() throws Exception {
        ScenarioTemplate template = ScenarioTemplate.parse(scenarioText(), "copper-rinse.toml", List.of(),
                List.of("cell.diffusion_layer"), LIB);
        MeasuredLog log = new MeasuredLog("three-rows.csv", new double[] {600, 1200, 1800},
                List.of(new LogSeries("deposit_g", LoggedQuantity.DEPOSIT, null, new double[] {0.2, 0.4, 0.6})));
        List<FitProgress> seen = new ArrayList<>();
        AtomicInteger asked = new AtomicInteger();
        FitMonitor cancelAfterFirst = new FitMonitor() {
            @Override
            public void progress(FitProgress p) {
                seen.add(p);
            }

            @Override
            public boolean cancelled() {
                return !seen.isEmpty() && asked.incrementAndGet() > 0;
            }
        };
        assertThrows(FitCancelledException.class, () -> new LogFit(template, LIB, log, Map.of())
                .fit(LeastSquaresFit.Options.forEngine(), cancelAfterFirst));
        assertEquals(1, seen.size());
        assertEquals(1, seen.get(0).iteration());
        assertEquals(List.of("cell.diffusion_layer"), seen.get(0).keys());
        // source: the file's diffusion_layer = "100 um"; the first Jacobian is formed at the start
        assertEquals(100e-6, seen.get(0).values()[0], 1e-12);
    }

    @Test
    void aWeightForAColumnTheLogDoesNotHaveIsRefused() throws Exception {
        ScenarioTemplate template = ScenarioTemplate.parse(scenarioText(), "copper-rinse.toml", List.of(),
                List.of("cell.diffusion_layer"), LIB);
        MeasuredLog log = new MeasuredLog("log.csv", new double[] {600, 1200},
                List.of(new LogSeries("deposit_g", LoggedQuantity.DEPOSIT, null, new double[] {0.2, 0.4})));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new LogFit(template, LIB, log, Map.of("cell_voltage_V", 2.0)));
        assertTrue(e.getMessage().contains("cell_voltage_V") && e.getMessage().contains("deposit_g"), e.getMessage());
    }
}
