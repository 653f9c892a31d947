package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.StopCondition;
import org.junit.jupiter.api.Test;

/** {@code --set key=value} overrides: applied before resolution, checked alike, located "(from --set)". */
class OverrideApplierTest {

    private final ScenarioReader reader = new ScenarioReader(LibraryFixture.library());

    private Scenario tin(String... sets) throws ScenarioException {
        return reader.read(ScenarioFiles.path("valid/tin-stripping-liquor.toml"), List.of(sets));
    }

    private List<String> tinProblems(String... sets) {
        ScenarioException e = assertThrows(ScenarioException.class, () -> tin(sets));
        return e.errors().stream().map(Problem::format).toList();
    }

    @Test
    void setsValuesWithAndWithoutQuotes() throws ScenarioException {
        Scenario s = tin("supply.current=\"2.5 A\"", "cell.gap=20mm", "run.duration = 90 min",
                "electrolyte.composition.\"Sn2+\"=30g/L", "title=Another run");
        assertEquals(2.5, s.supply().currentA(), 0.0);
        assertEquals(0.020, s.cell().gapM(), 1e-15);
        assertEquals(5400, s.run().durationS(), 0.0);
        // 30 g/L / 118.71 g/mol
        assertEquals(30 / 0.11871, s.electrolyte().compositionMolPerM3().get("Sn2+"), 1e-9);
        assertEquals("Another run", s.title());
    }

    @Test
    void bareTomlValuesAreSi() throws ScenarioException {
        Scenario s = tin("supply.current=4", "run.stop=[\"short\"]");
        assertEquals(4.0, s.supply().currentA(), 0.0);
        assertEquals(List.of(new StopCondition.ShortCircuit()), s.run().stops());
    }

    @Test
    void compositionEntryReplacesTheSameSpeciesInAnyNotation() throws ScenarioException {
        Scenario s = tin("electrolyte.composition.Sn++=0.2 mol/L");
        assertEquals(200, s.electrolyte().compositionMolPerM3().get("Sn2+"), 0.0);
        assertEquals(3, s.electrolyte().compositionMolPerM3().size());
    }

    @Test
    void addsAReactionOverride() throws ScenarioException {
        Scenario s = tin("reaction.H+/H2.i0=1e-3 A/m2", "reaction.H+/H2.material=stainless");
        assertEquals(List.of(new ReactionOverride("H+/H2", null, null, 1e-3, null, null, "stainless")),
                s.reactionOverrides());
    }

    @Test
    void settingOneAlternativeDropsTheFilesOthers() throws ScenarioException {
        Scenario s = tin("supply.voltage=2.2 V");
        assertEquals(ControlMode.VOLTAGE, s.supply().mode());
        assertEquals(2.2, s.supply().voltageV(), 0.0);
        Scenario layer = tin("cell.diffusion_layer=120 um");
        assertNull(layer.cell().agitation().preset());
        assertEquals(120e-6, layer.cell().agitation().diffusionLayerM(), 1e-18);
        Scenario copper = reader.read(ScenarioFiles.path("valid/copper-etchant-bleed.toml"),
                List.of("supply.current_density=1.5 A/dm2"));
        assertEquals(List.of(), copper.supply().schedule());
        // 1.5 A/dm2 on 6 dm2
        assertEquals(9.0, copper.supply().currentA(), 1e-12);
        assertEquals(6.0, copper.supply().voltageLimitV(), 0.0);
    }

    @Test
    void twoAlternativesBothSetIsAnError() {
        assertEquals(List.of("(from --set):2:1: supply.voltage: give only one of current, current_density, voltage "
                + "or schedule; current is given on line 1"), tinProblems("supply.current=3 A", "supply.voltage=2 V"));
    }

    @Test
    void problemsArePlacedInTheOption() {
        assertEquals(List.of("(from --set):1:13: cell.gap: unit 'furlongs' is not a length; use one of m, cm, mm, um, in"),
                tinProblems("cell.gap=20 furlongs"));
        assertEquals(List.of("(from --set):1:19: supply.current: unit 'Q' is not a current; use one of A, mA, kA"),
                tinProblems("supply.current=\"3 Q\""));
        assertEquals(List.of("(from --set):1:1: cell.gapp: unknown key 'gapp' in [cell]; did you mean 'gap'?"),
                tinProblems("cell.gapp=2mm"));
        assertEquals(List.of("(from --set):2:1: gap: expected key=value, e.g. --set supply.current=\"3 A\""),
                tinProblems("cell.gap=2cm", "gap"));
        assertEquals(List.of("(from --set):1:1: cell.gap.x: 'cell.gap' is a value, not a table"),
                tinProblems("cell.gap.x=1"));
        assertEquals(List.of("(from --set):1:1: sply: unknown key 'sply'; did you mean 'supply'?"),
                tinProblems("sply.current=3 A"));
    }

    @Test
    void dottedPaths() {
        assertEquals(List.of("electrolyte", "composition", "Sn2+"), OverrideApplier.path("electrolyte.composition.\"Sn2+\""));
        assertEquals(List.of("reaction", "H+/H2", "i0"), OverrideApplier.path("reaction.H+/H2.i0"));
        assertEquals(List.of("species", "A.B", "charge"), OverrideApplier.path("species.'A.B'.charge"));
        assertEquals(List.of(), OverrideApplier.path("cell..gap"));
        assertEquals(List.of(), OverrideApplier.path("cell.\"gap"));
    }
}
