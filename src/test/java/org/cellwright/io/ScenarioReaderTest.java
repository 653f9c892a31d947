package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.cell.StopCondition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Reading valid scenario files: every key lands in the right record field in SI units, defaults are the
 * documented ones. Expected values are the file's numbers times the unit factors checked in
 * {@link UnitParserTest}; molar masses are the IUPAC standard atomic weights of the fixture library.
 */
class ScenarioReaderTest {

    private static final double TIGHT = 1.0e-12;

    private final ScenarioReader reader = new ScenarioReader(LibraryFixture.library());

    private Scenario read(String name) throws ScenarioException {
        return reader.read(ScenarioFiles.path("valid/" + name));
    }

    @Test
    void tinScenarioFromTheInterfaceExample() throws ScenarioException {
        ScenarioReader.Result result = reader.load(ScenarioFiles.path("valid/tin-stripping-liquor.toml"), List.of());
        assertEquals(List.of(), result.warnings());
        Scenario s = result.scenario();
        assertEquals("Tin from spent stripping liquor", s.title());
        assertTrue(s.notes().startsWith("Watch the cell voltage"));
        assertEquals(0.8e-3, s.electrolyte().volumeM3(), 1e-18);
        assertEquals(298.15, s.electrolyte().temperatureK(), TIGHT);
        Map<String, Double> c = s.electrolyte().compositionMolPerM3();
        assertEquals(List.of("Sn2+", "H+", "Cl-"), List.copyOf(c.keySet()));
        // 40 g/L / 118.71 g/mol
        assertEquals(40 / 0.11871, c.get("Sn2+"), 1e-9);
        assertEquals(1500, c.get("H+"), TIGHT);
        assertEquals(2200, c.get("Cl-"), 1e-9);
        assertNull(s.electrolyte().conductivitySPerM());
        assertEquals("stainless", s.cathode().material());
        assertEquals(0.012, s.cathode().areaM2(), TIGHT);
        assertEquals("graphite", s.anode().material());
        assertEquals(0.035, s.cell().gapM(), TIGHT);
        assertEquals(AgitationPreset.STILL.key(), s.cell().agitation().preset());
        assertEquals(AgitationPreset.STILL.diffusionLayerM(), s.cell().agitation().diffusionLayerM(), 0.0);
        assertEquals(295.15, s.cell().ambientK(), TIGHT);
        assertEquals(0.0, s.cell().contactResistanceOhm(), 0.0);
        assertNull(s.cell().heatLossWPerK());
        assertEquals(ControlMode.CURRENT, s.supply().mode());
        assertEquals(3.0, s.supply().currentA(), 0.0);
        assertEquals(12.0, s.supply().voltageLimitV(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, s.supply().currentLimitA(), 0.0);
        assertEquals(14400, s.run().durationS(), 0.0);
        assertEquals(60, s.run().outputIntervalS(), 0.0);
        assertEquals("Sn", s.run().targetMetal());
        List<StopCondition> stops = s.run().stops();
        assertEquals(new StopCondition.ShortCircuit(), stops.get(0));
        assertEquals("Sn2+", ((StopCondition.SpeciesBelow) stops.get(1)).species());
        assertEquals(2 / 0.11871, ((StopCondition.SpeciesBelow) stops.get(1)).molPerM3(), 1e-9);
        assertEquals(333.15, ((StopCondition.TemperatureAbove) stops.get(2)).kelvin(), TIGHT);
        assertEquals(new StopCondition.VoltageAbove(8), stops.get(3));
        assertEquals("Sn", ((StopCondition.DepositAbove) stops.get(4)).metal());
        assertEquals(0.1, ((StopCondition.DepositAbove) stops.get(4)).kg(), TIGHT);
        assertEquals(List.of(), s.speciesOverrides());
        assertEquals(List.of(), s.reactionOverrides());
    }

    @Test
    void copperScenarioWithScheduleAndOverrides() throws ScenarioException {
        Scenario s = read("copper-etchant-bleed.toml");
        Map<String, Double> c = s.electrolyte().compositionMolPerM3();
        // "Cu++", "SO4 2-" and "1.0 M" are accepted variants
        assertEquals(List.of("Cu2+", "H+", "SO4^2-", "Fe3+"), List.copyOf(c.keySet()));
        assertEquals(30 / 0.063546, c.get("Cu2+"), 1e-9);
        assertEquals(1000, c.get("H+"), TIGHT);
        // 200 ppm = 0.2 g/L of Fe3+, 55.845 g/mol
        assertEquals(0.2 / 0.055845, c.get("Fe3+"), 1e-9);
        assertEquals("stainless", s.cathode().material());
        assertEquals("lead-calcium", s.anode().material());
        assertEquals(AgitationPreset.SPARGED.diffusionLayerM(), s.cell().agitation().diffusionLayerM(), 0.0);
        assertEquals(0.004, s.cell().contactResistanceOhm(), TIGHT);
        assertEquals(2.5, s.cell().heatLossWPerK(), 0.0);
        assertEquals(ControlMode.CURRENT, s.supply().mode());
        // the first point's 2 A/dm2 on the 6 dm2 cathode is 12 A
        assertEquals(List.of(new SetPoint(0, 12, false), new SetPoint(5400, 9, true),
                new SetPoint(10800, 6, false)), s.supply().schedule());
        assertEquals(12.0, s.supply().currentA(), 1e-12);
        // ramp from 12 A at 0 h to 9 A at 1.5 h: 10.5 A at 0.75 h
        assertEquals(10.5, s.supply().setValueAt(2700), 1e-12);
        assertEquals(30, s.run().outputIntervalS(), 0.0);
        assertNull(s.run().targetMetal());
        assertEquals(List.of(new SpeciesOverride("Cu2+", null, null, 7.2e-10, 0.01072)), s.speciesOverrides());
        List<ReactionOverride> r = s.reactionOverrides();
        assertEquals(new ReactionOverride("Cu2+/Cu", null, 0.3419, 1.0, null, 0.5, null), r.get(0));
        assertEquals(new ReactionOverride("H+/H2", null, null, 5e-7, null, null, "copper"), r.get(1));
    }

    @Test
    void voltageControlAndNewSpecies() throws ScenarioException {
        Scenario s = read("nickel-voltage-control.toml");
        assertEquals(0.002, s.electrolyte().volumeM3(), 0.0);
        assertEquals(5.2, s.electrolyte().conductivitySPerM(), TIGHT);
        assertEquals(650, s.electrolyte().compositionMolPerM3().get("H3BO3"), TIGHT);
        assertEquals(ControlMode.VOLTAGE, s.supply().mode());
        assertEquals(2.4, s.supply().voltageV(), 0.0);
        assertEquals(2.0, s.supply().currentLimitA(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, s.supply().voltageLimitV(), 0.0);
        assertNull(s.cell().agitation().preset());
        assertEquals(80e-6, s.cell().agitation().diffusionLayerM(), 1e-18);
        // ambient defaults to the bath temperature
        assertEquals(s.electrolyte().temperatureK(), s.cell().ambientK(), 0.0);
        assertEquals(2700, s.run().durationS(), 0.0);
        assertEquals(List.of(new SpeciesOverride("H3BO3", 0, 0.06183, 1.07e-9, null)), s.speciesOverrides());
    }

    @Test
    void plantUnits() throws ScenarioException {
        Scenario s = read("silver-plating-shop-units.toml");
        // 5 U.S. gallons; 1 ft2 and 20 A/ft2: 20 A exactly up to rounding
        assertEquals(5 * UnitCatalog.US_GALLON_M3, s.electrolyte().volumeM3(), 1e-18);
        assertEquals(20.0, s.supply().currentA(), 1e-12);
        assertEquals(3 * UnitCatalog.OUNCE_KG / UnitCatalog.US_GALLON_M3 / 0.107868,
                s.electrolyte().compositionMolPerM3().get("Ag+"), 1e-9);
        assertEquals(0.0508, s.cell().gapM(), TIGHT);
        assertEquals(2 * UnitCatalog.POUND_KG, ((StopCondition.DepositAbove) s.run().stops().get(1)).kg(), TIGHT);
    }

    @Test
    void defaults() throws ScenarioException {
        Scenario s = read("defaults.toml");
        assertEquals("", s.title());
        assertEquals(298.15, s.electrolyte().temperatureK(), 0.0);
        assertEquals(AgitationPreset.STILL.key(), s.cell().agitation().preset());
        assertEquals(298.15, s.cell().ambientK(), 0.0);
        assertEquals(0.0, s.cell().contactResistanceOhm(), 0.0);
        assertNull(s.cell().heatLossWPerK());
        assertEquals(Double.POSITIVE_INFINITY, s.supply().voltageLimitV(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, s.supply().currentLimitA(), 0.0);
        assertEquals(60, s.run().outputIntervalS(), 0.0);
        assertEquals(List.of(), s.run().stops());
        assertNull(s.run().targetMetal());
    }

    @Test
    void everyProblemIsReportedNotOnlyTheFirst() {
        String text = """
                [electrolyte]
                volume = "-1 L"
                composition = { "Cu2+" = "40 g/L", "Xx+" = "1 M" }
                [cathode]
                material = "stainles"
                area = "1 dm"
                [anode]
                material = "graphite"
                area = "1 dm2"
                [cell]
                gap = "3 cm"
                [supply]
                current = "2 V"
                [run]
                duraton = "1 h"
                """;
        ScenarioException e = assertThrows(ScenarioException.class, () -> reader.parse(text, "t.toml", List.of()));
        List<String> lines = e.errors().stream().map(Problem::format).toList();
        assertEquals(List.of(
                "t.toml:2:11: electrolyte.volume: must be greater than zero, got '-1 L'",
                "t.toml:3:36: electrolyte.composition.Xx+: unknown species 'Xx+'",
                "t.toml:5:13: cathode.material: unknown electrode material 'stainles'; did you mean 'stainless'?",
                "t.toml:6:11: cathode.area: unit 'dm' is not an area; did you mean 'dm2'?",
                "t.toml:13:14: supply.current: expected a current, got a voltage 'V'",
                "t.toml:14:1: run.duration: missing required value; add e.g. duration = \"4 h\" under [run]",
                "t.toml:15:1: run.duraton: unknown key 'duraton' in [run]; did you mean 'duration'?"), lines);
        assertEquals(String.join(System.lineSeparator(), lines), e.getMessage());
    }

    private static final String MINIMAL = """
            [electrolyte]
            volume = "1 L"
            temperature = "70 C"
            composition = { "Cu2+" = "0.5 mol/L", "SO4^2-" = "0.5 mol/L" }
            [cathode]
            material = "stainless"
            area = "1 dm2"
            [anode]
            material = "lead"
            area = "1 dm2"
            [cell]
            gap = "3 cm"
            """;

    @Test
    void arrayOfTablesScheduleAndWarnings() throws ScenarioException {
        String text = MINIMAL + """
                [supply]
                current_limit = "5 A"
                [[supply.schedule]]
                at = "10 min"
                current = "2 A"
                [[supply.schedule]]
                at = "1 h"
                current_density = "50 A/m2"
                ramp = true
                [run]
                duration = "30 s"
                output_interval = "1 min"
                target = "Ni"
                [reaction."Ni2+/Ni"]
                material = "stainless"
                """;
        ScenarioReader.Result r = reader.parse(text, "w.toml", List.of());
        // 50 A/m2 on 1 dm2 is 0.5 A
        assertEquals(List.of(new SetPoint(600, 2, false), new SetPoint(3600, 0.5, true)), r.scenario().supply().schedule());
        // 70 C is above the highest ambient accepted, so 60 C is used
        assertEquals(333.15, r.scenario().cell().ambientK(), 1e-12);
        assertEquals(List.of(
                "w.toml:11:1: cell.ambient: warning: not given, and the bath temperature is outside -50 C to 60 C; 60 C is used, give cell.ambient",
                "w.toml:14:1: supply.current_limit: warning: has no effect in current control; the supply holds the set current",
                "w.toml:15:1: supply.schedule: warning: the first point is after the start; until then the supply holds the first point's value",
                "w.toml:24:1: run.output_interval: warning: is longer than run.duration; only the start and end are recorded",
                "w.toml:25:1: run.target: warning: no dissolved species of Ni in the electrolyte; nothing of it can deposit unless an anode dissolves it"),
                r.warnings().stream().map(Problem::format).toList());
    }

    @Test
    void newReactionWithItsDataIsAccepted() throws ScenarioException {
        String text = MINIMAL + """
                [supply]
                voltage = "2 V"
                [run]
                duration = "1 h"
                [reaction."PbO2/PbSO4"]
                equation = "PbO2 + SO4^2- + 4H+ + 2e- = PbSO4 + 2H2O"
                e0 = "1.6913 V"
                i0 = "1e-3 A/m2"
                alpha_a = 1
                material = "lead"
                """;
        Scenario s = reader.parse(text, "n.toml", List.of()).scenario();
        assertEquals(List.of(new ReactionOverride("PbO2/PbSO4", "PbO2 + SO4^2- + 4H+ + 2e- = PbSO4 + 2H2O", 1.6913,
                1e-3, 1.0, null, "lead")), s.reactionOverrides());
    }

    @Test
    void byteOrderMarkAndWindowsLineEndingsKeepPositions() {
        String text = "\uFEFF" + MINIMAL.replace("gap = \"3 cm\"", "gap = \"3 cn\"").replace("\n", "\r\n")
                + "[supply]\r\ncurrent = \"1 A\"\r\n[run]\r\nduration = \"1 h\"\r\n";
        ScenarioException e = assertThrows(ScenarioException.class, () -> reader.parse(text, "crlf.toml", List.of()));
        assertEquals(List.of("crlf.toml:12:10: cell.gap: unit 'cn' is not a length; did you mean 'cm'?"),
                e.errors().stream().map(Problem::format).toList());
    }

    /** The project's demo scenarios (scenarios/ at the project root) read without problems. */
    @Test
    void demoScenariosReadWithoutProblems() throws Exception {
        Path dir = Path.of("scenarios");
        List<Path> demos;
        try (var files = Files.list(dir)) {
            demos = files.filter(p -> p.toString().endsWith(".toml")).sorted().toList();
        }
        assertTrue(demos.size() >= 3, "demo scenarios in " + dir.toAbsolutePath());
        for (Path demo : demos) {
            ScenarioReader.Result r = reader.load(demo, List.of());
            assertEquals(List.of(), r.warnings(), demo::toString);
            assertEquals(r.scenario(), reader.parse(ScenarioWriter.write(r.scenario()), "w", List.of()).scenario());
        }
    }

    /** The valid test scenarios also read with the built-in library (not only with the test fixture). */
    @ParameterizedTest
    @ValueSource(strings = {"tin-stripping-liquor.toml", "copper-etchant-bleed.toml", "nickel-voltage-control.toml",
        "silver-plating-shop-units.toml", "defaults.toml"})
    void validFilesReadWithTheBuiltInLibrary(String file) throws ScenarioException {
        Scenario withFixture = read(file);
        Scenario withBuiltIn = new ScenarioReader(LibraryReader.builtIn()).read(ScenarioFiles.path("valid/" + file));
        assertEquals(withFixture.electrolyte().compositionMolPerM3().keySet(),
                withBuiltIn.electrolyte().compositionMolPerM3().keySet());
        assertEquals(withFixture.supply(), withBuiltIn.supply());
    }

    @Test
    void missingFileIsABadInputProblem() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> reader.read(ScenarioFiles.path("valid").resolve("no-such.toml")));
        assertTrue(e.getMessage().endsWith("no-such.toml:0:0: no such file"), e.getMessage());
    }
}
