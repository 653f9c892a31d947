package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.ParameterScale;
import org.junit.jupiter.api.Test;

/**
 * A scenario with free keys: the starting value of each key is the one in effect (written, set, or a
 * default), the scale suits the quantity, and a set of values gives the scenario with those values.
 */
class ScenarioTemplateTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    private static final String TEXT = """
            title = "Copper cell"
            [electrolyte]
            volume = "1 L"
            [electrolyte.composition]
            "Cu2+" = "0.1 mol/L"
            "H+" = "0.5 mol/L"
            "SO4^2-" = "0.35 mol/L"
            [cathode]
            material = "stainless"
            area = "1 dm2"
            [anode]
            material = "lead-calcium"
            area = "1 dm2"
            [cell]
            gap = "30 mm"
            agitation = "still"
            [supply]
            current = "2 A"
            [run]
            duration = "1 h"
            [reaction."H+/H2"]
            material = "copper"
            """;

    private static ScenarioTemplate template(String... keys) throws ScenarioException {
        return ScenarioTemplate.parse(TEXT, "cu.toml", List.of(), List.of(keys), LIB);
    }

    @Test
    void startingValuesAreTheValuesInEffect() throws ScenarioException {
        ScenarioTemplate t = template("cell.diffusion_layer", "reaction.H+/H2.i0", "cell.contact_resistance",
                "electrolyte.composition.\"Cu2+\"", "reaction.Cu2+/Cu.e0", "cell.gap");
        List<FreeParameter> p = t.parameters();
        // source: docs/scenario-format.md, agitation presets: still = 300 um
        assertEquals(300e-6, p.get(0).start(), 1e-18);
        assertEquals(ParameterScale.LOG, p.get(0).scale());
        // source: library.toml, [reaction."H+/H2".on.copper] i0 = 1.11e-07 A/cm2 (Antropov), = 1.11e-3 A/m2
        assertEquals(1.11e-3, p.get(1).start(), 1e-15);
        assertEquals(ParameterScale.LOG, p.get(1).scale());
        // source: docs/scenario-format.md, [cell] contact_resistance defaults to 0 ohm
        assertEquals(0.0, p.get(2).start(), 0.0);
        assertEquals(ParameterScale.NON_NEGATIVE, p.get(2).scale());
        assertEquals(ScenarioValues.TYPICAL_CONTACT_OHM, p.get(2).typical(), 0.0);
        // source: the file, 0.1 mol/L = 100 mol/m3
        assertEquals(100, p.get(3).start(), 1e-12);
        // source: library.toml, Cu2+/Cu e0 = 0.3419 V (CRC Handbook, electrochemical series)
        assertEquals(0.3419, p.get(4).start(), 1e-12);
        assertEquals(ParameterScale.LINEAR, p.get(4).scale());
        assertEquals(0.030, p.get(5).start(), 1e-15);
    }

    @Test
    void valuesGoIntoTheScenarioAsSetOptions() throws ScenarioException {
        ScenarioTemplate t = template("cell.diffusion_layer", "reaction.H+/H2.i0", "cell.contact_resistance");
        Scenario s = t.at(new double[] {150e-6, 5e-3, 0.025});
        assertEquals(150e-6, s.cell().agitation().diffusionLayerM(), 0.0);
        assertEquals(0.025, s.cell().contactResistanceOhm(), 0.0);
        assertEquals(5e-3, s.reactionOverrides().get(0).i0APerM2(), 0.0);
        assertEquals("copper", s.reactionOverrides().get(0).material());
        // the rest of the file is untouched
        assertEquals(0.030, s.cell().gapM(), 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> t.at(new double[] {-1e-6, 5e-3, 0.0}));
        assertTrue(e.getMessage().contains("cell.diffusion_layer"), e.getMessage());
    }

    @Test
    void setOptionsReadBackToTheSameDouble() {
        for (double v : new double[] {1.11e-3, 150e-6, 0.1 + 0.2, 2.5e10, 0.0, -0.761}) {
            String opt = ScenarioTemplate.setOption("x.y", v);
            assertEquals(v, Double.parseDouble(opt.substring(4)), 0.0, opt);
        }
    }

    @Test
    void aUserSetValueIsTheStart() throws ScenarioException {
        ScenarioTemplate t = ScenarioTemplate.parse(TEXT, "cu.toml", List.of("cell.contact_resistance=\"5 mohm\""),
                List.of("cell.contact_resistance"), LIB);
        // source: the --set option, 5 mohm
        assertEquals(0.005, t.parameters().get(0).start(), 1e-15);
        assertEquals(0.005, t.base().cell().contactResistanceOhm(), 1e-15);
    }

    @Test
    void badKeysAreLocatedInTheFreeList() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> template("cell.diffusion_layer", "run.duration", "cell.nonsense", "title", "cell.heat_loss"));
        List<String> lines = e.problems().stream().map(Problem::format).toList();
        assertEquals(4, lines.size(), String.join("\n", lines));
        assertTrue(lines.get(0).startsWith("(from --free):2:1: run.duration: run settings are not model parameters"),
                lines.get(0));
        assertTrue(lines.get(1).startsWith("(from --free):3:1: cell.nonsense: has no numeric value"), lines.get(1));
        assertTrue(lines.get(2).startsWith("(from --free):4:1: title: not a scenario key"), lines.get(2));
        assertTrue(lines.get(3).startsWith("(from --free):5:1: cell.heat_loss: has no numeric value"), lines.get(3));
        ScenarioException none = assertThrows(ScenarioException.class, () -> template());
        assertTrue(none.getMessage().contains("at least one key"), none.getMessage());
    }
}
