package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.cellwright.cell.Compartments;
import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.Separator;
import org.junit.jupiter.api.Test;

/**
 * The compartment keys of [cell], [electrolyte.anolyte] and [deposit]: read into SI, written back by
 * {@link ScenarioWriter} to an equal scenario, changed by --set. Malformed cases are in the malformed corpus.
 */
class DepositKeysTest {

    private final ScenarioReader reader = new ScenarioReader(LibraryReader.builtIn());

    private static final String HEAD = """
            title = "divided tin cell"
            [electrolyte]
            volume = "1.6 L"
            [electrolyte.composition]
            "Sn2+" = "25 g/L"
            "H+" = "1.5 mol/L"
            "Cl-" = "1.921 mol/L"
            """;
    private static final String ELECTRODES = """
            [cathode]
            material = "stainless"
            area = "1 dm2"
            [anode]
            material = "graphite"
            area = "1 dm2"
            """;
    private static final String TAIL = """
            [supply]
            current_density = "1.5 A/dm2"
            [run]
            duration = "8 h"
            stop = ["short"]
            """;

    private Scenario read(String text, String... sets) throws ScenarioException {
        ScenarioReader.Result r = reader.parse(text, "t.toml", List.of(sets));
        assertEquals(List.of(), r.warnings());
        return r.scenario();
    }

    private void roundTrips(Scenario s) throws ScenarioException {
        assertEquals(s, read(ScenarioWriter.write(s, LibraryReader.builtIn())));
        assertEquals(s, read(ScenarioWriter.write(s)));
    }

    @Test
    void aDividedCellWithItsOwnAnolyteReadsInSiAndRoundTrips() throws ScenarioException {
        Scenario s = read(HEAD + """
                [electrolyte.anolyte]
                "Fe2+" = "45 g/L"
                "H+" = "1 mol/L"
                "Cl-" = "2.612 mol/L"
                """ + ELECTRODES + """
                [cell]
                gap = "40 mm"
                agitation = "gentle"
                compartments = "divided"
                anolyte_volume = "0.4 L"
                separator = "anion-membrane"
                separator_thickness = "0.2 mm"
                separator_porosity = 0.25
                separator_area = "1.2 dm2"
                separator_conductivity = "30 mS/cm"
                """ + TAIL + """
                [deposit]
                additives = true
                tip_radius = "0.5 um"
                initial_protrusion = "8 um"
                short_resistance = "20 mohm"
                """);
        Compartments c = s.cell().compartments();
        assertEquals(Compartments.Kind.DIVIDED, c.kind());
        assertEquals(0.4e-3, c.anolyteVolumeM3(), 1e-15);
        assertEquals(45 / 55.845 * 1000, c.anolyteCompositionMolPerM3().get("Fe2+"), 1e-9);
        Separator sep = c.separator();
        assertEquals(Separator.Kind.ANION_MEMBRANE, sep.kind());
        assertEquals(0.2e-3, sep.thicknessM(), 1e-15);
        assertEquals(0.25, sep.porosity(), 0);
        assertEquals(0.012, sep.areaM2(), 1e-15);
        assertEquals(3.0, sep.conductivitySPerM(), 1e-12);
        assertEquals(new DepositSettings(true, 0.5e-6, 8e-6, 0.02), s.deposit());
        roundTrips(s);
    }

    @Test
    void defaultsFillWhatIsLeftOut() throws ScenarioException {
        Scenario undivided = read(HEAD + ELECTRODES + "[cell]\ngap = \"40 mm\"\n" + TAIL);
        assertEquals(Compartments.undivided(), undivided.cell().compartments());
        assertEquals(DepositSettings.defaults(), undivided.deposit());
        String written = ScenarioWriter.write(undivided);
        assertFalse(written.contains("compartments") || written.contains("[deposit]"), written);
        Scenario diaphragm = read(HEAD + ELECTRODES + """
                [cell]
                gap = "40 mm"
                compartments = "divided"
                separator = "diaphragm"
                """ + TAIL);
        // source: the documented defaults of a diaphragm (3 mm, porosity 0.5), half the electrolyte each side
        assertEquals(Separator.of(Separator.Kind.DIAPHRAGM), diaphragm.cell().compartments().separator());
        assertNull(diaphragm.cell().compartments().anolyteVolumeM3());
        assertEquals(0.8e-3, diaphragm.cell().compartments().anolyteVolumeM3(1.6e-3), 1e-15);
        roundTrips(diaphragm);
        Scenario zones = read(HEAD + ELECTRODES + """
                [cell]
                gap = "40 mm"
                compartments = "zones"
                zone_exchange = "0.05 L/min"
                """ + TAIL);
        assertEquals(0.05e-3 / 60, zones.cell().compartments().zoneExchangeM3PerS(), 1e-18);
        roundTrips(zones);
    }

    @Test
    void setOptionsReachTheNewKeys() throws ScenarioException {
        String base = HEAD + ELECTRODES + "[cell]\ngap = \"40 mm\"\n" + TAIL;
        Scenario s = read(base, "cell.compartments=zones", "cell.zone_exchange=0.2 L/min", "deposit.tip_radius=2 um",
                "deposit.initial_protrusion=10 um");
        assertEquals(Compartments.Kind.ZONES, s.cell().compartments().kind());
        assertEquals(2e-6, s.deposit().tipRadiusM(), 1e-18);
        ScenarioException e = org.junit.jupiter.api.Assertions.assertThrows(ScenarioException.class,
                () -> reader.parse(base, "t.toml", List.of("cell.separator=diaphragm")));
        assertTrue(e.getMessage().contains("cell.separator: applies only to compartments = \"divided\""),
                e.getMessage());
    }
}
