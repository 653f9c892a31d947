package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.InstantState;
import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tomlj.Toml;

/**
 * The teaching scenario scenarios/gap-vs-voltage.toml shows what its notes promise: with a soluble copper
 * anode the equilibrium voltage is nil, the ohmic drop is most of the cell voltage, and the cell voltage is a
 * straight line in the gap whose slope is the current density over the conductivity; the sweep command
 * written in its notes runs as written.
 */
class GapVoltageScenarioTest {

    private static final String FILE = "scenarios/gap-vs-voltage.toml";
    private static final ChemLibrary LIB = LibraryReader.builtIn();
    private static final double CURRENT_DENSITY = 200; // A/m2, the file's 2 A/dm2

    private static RunResult run(String... sets) throws Exception {
        var sc = new ScenarioReader(LIB).read(Path.of(FILE), List.of(sets));
        return CellSimulation.withDefaults().run(sc, LIB, null);
    }

    @Test
    void theOhmicDropIsMostOfTheVoltageAndGrowsWithTheGap() throws Exception {
        InstantState s50 = run().trace().get(0).state();
        // source: Nernst equation: the same couple (Cu2+/Cu) at both electrodes in the same bath has the same
        // equilibrium potential, so the equilibrium voltage of a refining cell is zero
        assertEquals(0, s50.equilibriumVoltageV(), 1e-3);
        // the notes: about 2.6 V of 2.9 V across the 50 mm gap, about 0.3 V of overpotentials
        assertTrue(s50.ohmicDropV() > 0.85 * s50.cellVoltageV(), s50.ohmicDropV() + " of " + s50.cellVoltageV());
        double overpotentials = s50.anodeOverpotentialV() - s50.cathodeOverpotentialV();
        assertTrue(overpotentials > 0.15 && overpotentials < 0.45, "overpotentials " + overpotentials);
        // source: Ohm's law for a uniform electrolyte between parallel plates of equal area: the solution's
        // drop is j L / kappa (Newman and Thomas-Alyea, Electrochemical Systems, 3rd ed., ch. 18, primary
        // resistance). No gas forms (copper on both electrodes), so no bubble term. Tolerance: 0.2 %.
        assertEquals(CURRENT_DENSITY * 0.050 / s50.conductivitySPerM(), s50.ohmicSolutionV(),
                0.002 * s50.ohmicSolutionV());
        InstantState s20 = run("cell.gap=20mm").trace().get(0).state();
        double slope = (s50.cellVoltageV() - s20.cellVoltageV()) / 0.030;
        assertEquals(CURRENT_DENSITY / s50.conductivitySPerM(), slope, 0.002 * slope);
        // the notes: about 0.5 V per 10 mm
        assertEquals(0.5, slope * 0.010, 0.1);
        // the overpotentials do not depend on the gap (same bath, same current density)
        assertEquals(overpotentials, s20.anodeOverpotentialV() - s20.cathodeOverpotentialV(), 1e-6);
    }

    /** The sweep command line written in the notes, run as written (outputs redirected into a scratch folder). */
    @Test
    void theSweepInTheNotesGivesAStraightLine(@TempDir Path dir) throws Exception {
        String notes = Toml.parse(Files.readString(Path.of(FILE))).getString("notes");
        String line = notes.lines().map(String::strip).filter(l -> l.startsWith("java -jar target/cellwright.jar sweep ")).findFirst().orElseThrow();
        List<String> args = new ArrayList<>(Arrays.asList(line.split(" +")));
        assertEquals(List.of("java", "-jar", "target/cellwright.jar"), args.subList(0, 3));
        args = new ArrayList<>(args.subList(3, args.size()));
        args.replaceAll(a -> a.equals("gap.csv") ? dir.resolve("gap.csv").toString()
                : a.equals("gap.png") ? dir.resolve("gap.png").toString() : a);
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.size(dir.resolve("gap.png")) > 0);
        List<String> rows = Files.readAllLines(dir.resolve("gap.csv"));
        List<String> head = List.of(rows.get(0).split(","));
        int gap = head.indexOf("cell.gap_SI");
        int volts = head.indexOf("cell_voltage_start_V");
        assertEquals(11, rows.size(), "ten gaps");
        double[] x = new double[10];
        double[] y = new double[10];
        for (int i = 0; i < 10; i++) {
            String[] c = rows.get(i + 1).split(",");
            x[i] = Double.parseDouble(c[gap]);
            y[i] = Double.parseDouble(c[volts]);
        }
        // least-squares line through the ten points
        double mx = Arrays.stream(x).average().orElseThrow();
        double my = Arrays.stream(y).average().orElseThrow();
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int i = 0; i < 10; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }
        double slope = sxy / sxx;
        double intercept = my - slope * mx;
        // source: Ohm's law, as above: straight in the gap (r^2 to six nines: the start is at 25 C everywhere)
        assertTrue(sxy * sxy / (sxx * syy) > 0.999999, "straight");
        InstantState base = run().trace().get(0).state();
        assertEquals(CURRENT_DENSITY / base.conductivitySPerM(), slope, 0.002 * slope);
        // and meets zero gap at the overpotentials
        assertEquals(base.anodeOverpotentialV() - base.cathodeOverpotentialV(), intercept, 0.01);
    }
}
