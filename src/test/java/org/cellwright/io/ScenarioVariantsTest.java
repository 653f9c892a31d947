package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.study.AxisValue;
import org.cellwright.study.GridPoint;
import org.cellwright.study.Sweep;
import org.cellwright.study.SweepAxis;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The scenarios of a sweep: the values go in as --set options and are checked like the file's own. */
class ScenarioVariantsTest {

    private static final Path COPPER = Path.of("scenarios", "copper-etchant-bleed.toml");
    private static ChemLibrary lib;

    @BeforeAll
    static void library() {
        lib = LibraryReader.builtIn();
    }

    private static GridPoint point(List<SweepAxis> axes, int... idx) {
        Sweep s = new Sweep(axes, p -> null, sc -> null);
        return s.grid().stream().filter(g -> java.util.Arrays.equals(g.indices(), idx)).findFirst().orElseThrow();
    }

    @Test
    void eachPointSetsItsValuesAfterTheUsersOwn() throws Exception {
        List<SweepAxis> axes = List.of(SweepAxisParser.parse("cell.gap=20mm:60mm:3"),
                SweepAxisParser.parse("electrolyte.composition.\"Cu2+\"=10:30 g/L:3"));
        ScenarioVariants v = ScenarioVariants.of(lib, COPPER, List.of("run.duration=\"1 h\""), axes);
        Scenario sc = v.scenarioAt(point(axes, 2, 1));
        assertEquals(0.060, sc.cell().gapM(), 1e-12);
        // source: 20 g/L over the IUPAC molar mass of copper, 63.546 g/mol, is 314.7 mol/m3
        assertEquals(20.0 / 63.546e-3, sc.electrolyte().compositionMolPerM3().get("Cu2+"), 0.2);
        assertEquals(3600.0, sc.run().durationS(), 1e-9);
        assertEquals(List.of("cell.gap=\"60 mm\"", "electrolyte.composition.\"Cu2+\"=\"20 g/L\""),
                v.setsOf(point(axes, 2, 1)));
    }

    @Test
    void wordsAndBareNumbersAreSetAsTomlValues() {
        assertEquals("\"stirred\"", ScenarioVariants.tomlValue(new AxisValue("stirred", 0, Double.NaN)));
        assertEquals("0.02", ScenarioVariants.tomlValue(new AxisValue("0.02", 0.02, 0.02)));
        assertEquals("\"2 A/dm2\"", ScenarioVariants.tomlValue(new AxisValue("2 A/dm2", 2, 200)));
        assertEquals("[\"short\"]", ScenarioVariants.tomlValue(new AxisValue("[\"short\"]", 0, Double.NaN)));
    }

    @Test
    void aPointThatMakesTheScenarioInvalidSaysWhichKeyAndWhy() throws Exception {
        List<SweepAxis> axes = List.of(SweepAxisParser.parse("cell.gap=-10mm:10mm:3"));
        ScenarioVariants v = ScenarioVariants.of(lib, COPPER, List.of(), axes);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> v.scenarioAt(point(axes, 0)));
        assertTrue(e.getMessage().startsWith("cell.gap: "), e.getMessage());
        assertEquals(0.010, v.scenarioAt(point(axes, 2)).cell().gapM(), 1e-12);
    }

    @Test
    void aBadBaseFileIsBadInputBeforeAnyPointRuns(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.toml");
        Files.writeString(bad, Files.readString(COPPER).replace("area = \"2 dm2\"", "area = \"2 V\""));
        List<SweepAxis> axes = List.of(SweepAxisParser.parse("cell.gap=20mm:60mm:3"));
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioVariants.of(lib, bad, List.of(), axes));
        assertTrue(e.getMessage().contains("bad.toml:"), e.getMessage());
        assertThrows(ScenarioException.class, () -> ScenarioVariants.of(lib, dir.resolve("none.toml"), List.of(), axes));
    }
}
