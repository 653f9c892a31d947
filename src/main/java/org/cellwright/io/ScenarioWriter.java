package org.cellwright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Compartments;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Separator;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.tomlj.Toml;

/**
 * Writes a {@link Scenario} as scenario TOML with readable units ("0.8 L", "35 mm", "25 C"), such that
 * {@link ScenarioReader} reads it back to an equal scenario: every number is written with the digits it
 * needs to come back as the same double (see {@link QuantityFormat}). Concentrations are written in mol/L,
 * or, given the chemistry library for molar masses, in g/L when that is the shorter number (a bath made up
 * as "40 g/L" is written back so).
 */
public final class ScenarioWriter {

    private final StringBuilder out = new StringBuilder();
    private final Map<String, Double> molarMassKgPerMol = new HashMap<>();

    private ScenarioWriter() {
    }

    /** @return the scenario as TOML text, concentrations in amount units */
    public static String write(Scenario s) {
        return write(s, null);
    }

    /**
     * @param s the scenario
     * @param library the chemistry for molar masses (so that concentrations can be written in g/L), or null
     * @return the scenario as TOML text
     */
    public static String write(Scenario s, ChemLibrary library) {
        ScenarioWriter w = new ScenarioWriter();
        if (library != null) {
            library.species().forEach(sp -> w.molarMassKgPerMol.put(sp.name(), sp.molarMassKgPerMol()));
        }
        s.speciesOverrides().stream().filter(o -> o.molarMassKgPerMol() != null)
                .forEach(o -> w.molarMassKgPerMol.put(o.name(), o.molarMassKgPerMol()));
        w.all(s);
        return w.out.toString();
    }

    /**
     * Writes the scenario to a file (UTF-8, through a temporary sibling), concentrations in g/L where the
     * library allows.
     */
    public static void write(Scenario s, ChemLibrary library, Path file) throws IOException {
        byte[] bytes = write(s, library).getBytes(StandardCharsets.UTF_8);
        AtomicFile.write(file, out -> out.write(bytes));
    }

    private String concentration(String species, double molPerM3) {
        return QuantityFormat.concentration(molPerM3, molarMassKgPerMol.getOrDefault(species, Double.NaN));
    }

    private void all(Scenario s) {
        if (!s.title().isEmpty()) {
            line("title", str(s.title()));
        }
        if (!s.notes().isEmpty()) {
            line("notes", str(s.notes()));
        }
        electrolyte(s.electrolyte());
        if (s.cell().compartments().anolyteCompositionMolPerM3() != null) {
            header("electrolyte.anolyte");
            s.cell().compartments().anolyteCompositionMolPerM3()
                    .forEach((name, c) -> line(str(name), str(concentration(name, c))));
        }
        electrode("cathode", s.cathode());
        electrode("anode", s.anode());
        cell(s.cell());
        supply(s.supply());
        run(s.run());
        deposit(s.deposit());
        for (SpeciesOverride o : s.speciesOverrides()) {
            species(o);
        }
        for (ReactionOverride o : s.reactionOverrides()) {
            reaction(o);
        }
    }

    private void electrolyte(Electrolyte e) {
        header("electrolyte");
        line("volume", q(e.volumeM3(), Dimension.VOLUME, e.volumeM3() < 10 ? List.of("L", "mL") : List.of("m3")));
        line("temperature", q(e.temperatureK(), Dimension.TEMPERATURE, List.of("C", "K")));
        if (e.conductivitySPerM() != null) {
            line("conductivity", q(e.conductivitySPerM(), Dimension.CONDUCTIVITY, List.of("mS/cm", "S/m")));
        }
        header("electrolyte.composition");
        e.compositionMolPerM3().forEach((name, c) -> line(str(name), str(concentration(name, c))));
    }

    private void electrode(String which, Electrode e) {
        header(which);
        line("material", str(e.material()));
        line("area", q(e.areaM2(), Dimension.AREA, List.of(e.areaM2() < 1.0e-2 ? "cm2" : "dm2", "m2")));
    }

    private void cell(CellSetup c) {
        header("cell");
        line("gap", q(c.gapM(), Dimension.LENGTH, List.of("mm", "cm", "m")));
        if (c.agitation().preset() != null) {
            line("agitation", str(c.agitation().preset()));
        } else {
            line("diffusion_layer", q(c.agitation().diffusionLayerM(), Dimension.LENGTH, List.of("um", "mm")));
        }
        line("ambient", q(c.ambientK(), Dimension.TEMPERATURE, List.of("C", "K")));
        if (c.contactResistanceOhm() != 0) {
            line("contact_resistance", q(c.contactResistanceOhm(), Dimension.RESISTANCE,
                    List.of(c.contactResistanceOhm() < 1 ? "mohm" : "ohm")));
        }
        if (c.heatLossWPerK() != null) {
            line("heat_loss", q(c.heatLossWPerK(), Dimension.HEAT_CONDUCTANCE, List.of("W/K")));
        }
        compartments(c.compartments());
    }

    private void compartments(Compartments c) {
        if (!c.twoCompartments()) {
            return;
        }
        line("compartments", str(c.kind().key()));
        if (c.anolyteVolumeM3() != null) {
            line("anolyte_volume", q(c.anolyteVolumeM3(), Dimension.VOLUME,
                    c.anolyteVolumeM3() < 10 ? List.of("L", "mL") : List.of("m3")));
        }
        Separator s = c.separator();
        if (s != null) {
            line("separator", str(s.kind().key()));
            line("separator_thickness", q(s.thicknessM(), Dimension.LENGTH, List.of("mm", "um", "cm")));
            line("separator_porosity", QuantityFormat.plain(s.porosity()));
            if (s.areaM2() != null) {
                line("separator_area", q(s.areaM2(), Dimension.AREA, List.of(s.areaM2() < 1.0e-2 ? "cm2" : "dm2", "m2")));
            }
            if (s.conductivitySPerM() != null) {
                line("separator_conductivity", q(s.conductivitySPerM(), Dimension.CONDUCTIVITY, List.of("S/m", "mS/cm")));
            }
        }
        if (c.kind() == Compartments.Kind.ZONES) {
            line("zone_exchange", q(c.zoneExchangeM3PerS(), Dimension.VOLUME_FLOW, List.of("L/min", "L/h", "m3/s")));
        }
    }

    private void deposit(DepositSettings d) {
        if (d.equals(DepositSettings.defaults())) {
            return;
        }
        header("deposit");
        line("additives", Boolean.toString(d.additives()));
        line("tip_radius", q(d.tipRadiusM(), Dimension.LENGTH, List.of("um", "mm")));
        line("initial_protrusion", q(d.initialProtrusionM(), Dimension.LENGTH, List.of("um", "mm")));
        line("short_resistance", q(d.shortResistanceOhm(), Dimension.RESISTANCE,
                List.of(d.shortResistanceOhm() < 1 ? "mohm" : "ohm")));
    }

    private void supply(PowerSupply p) {
        header("supply");
        boolean current = p.mode() == ControlMode.CURRENT;
        if (p.schedule().isEmpty()) {
            line(current ? "current" : "voltage", current ? amps(p.currentA()) : volts(p.voltageV()));
        } else {
            out.append("schedule = [\n");
            for (SetPoint point : p.schedule()) {
                out.append("  { at = ").append(time(point.atS())).append(", ")
                        .append(current ? "current" : "voltage").append(" = ")
                        .append(current ? amps(point.value()) : volts(point.value()))
                        .append(point.ramp() ? ", ramp = true" : "").append(" },\n");
            }
            out.append("]\n");
        }
        if (Double.isFinite(p.voltageLimitV())) {
            line("voltage_limit", volts(p.voltageLimitV()));
        }
        if (Double.isFinite(p.currentLimitA())) {
            line("current_limit", amps(p.currentLimitA()));
        }
    }

    private void run(RunSettings r) {
        header("run");
        line("duration", time(r.durationS()));
        line("output_interval", time(r.outputIntervalS()));
        if (!r.stops().isEmpty()) {
            out.append("stop = [");
            for (int i = 0; i < r.stops().size(); i++) {
                out.append(i == 0 ? "" : ", ").append(str(stop(r.stops().get(i))));
            }
            out.append("]\n");
        }
        if (r.targetMetal() != null) {
            line("target", str(r.targetMetal()));
        }
    }

    /** @return a stop condition in the form {@link StopConditionParser} reads */
    private String stop(StopCondition c) {
        if (c instanceof StopCondition.ShortCircuit) {
            return "short";
        }
        if (c instanceof StopCondition.SpeciesBelow s) {
            return s.species() + " < " + concentration(s.species(), s.molPerM3());
        }
        if (c instanceof StopCondition.TemperatureAbove t) {
            return "T > " + QuantityFormat.format(t.kelvin(), Dimension.TEMPERATURE, List.of("C", "K"));
        }
        if (c instanceof StopCondition.VoltageAbove v) {
            return "U > " + QuantityFormat.format(v.volts(), Dimension.VOLTAGE, List.of("V", "mV"));
        }
        StopCondition.DepositAbove d = (StopCondition.DepositAbove) c;
        return d.metal() + " > " + QuantityFormat.format(d.kg(), Dimension.MASS, List.of("g", "kg"));
    }

    private void species(SpeciesOverride o) {
        header("species." + str(o.name()));
        if (o.charge() != null) {
            line("charge", Integer.toString(o.charge()));
        }
        if (o.molarMassKgPerMol() != null) {
            line("molar_mass", q(o.molarMassKgPerMol(), Dimension.MOLAR_MASS, List.of("g/mol")));
        }
        if (o.diffusionM2PerS() != null) {
            line("diffusion", q(o.diffusionM2PerS(), Dimension.DIFFUSIVITY, List.of("m2/s", "cm2/s")));
        }
        if (o.conductivitySM2PerMol() != null) {
            line("conductivity", q(o.conductivitySM2PerMol(), Dimension.MOLAR_CONDUCTIVITY, List.of("S cm2/mol")));
        }
    }

    private void reaction(ReactionOverride o) {
        header("reaction." + str(o.name()));
        if (o.equation() != null) {
            line("equation", str(o.equation()));
        }
        if (o.e0V() != null) {
            line("e0", volts(o.e0V()));
        }
        if (o.i0APerM2() != null) {
            line("i0", q(o.i0APerM2(), Dimension.CURRENT_DENSITY, List.of("A/m2")));
        }
        if (o.alphaA() != null) {
            line("alpha_a", QuantityFormat.plain(o.alphaA()));
        }
        if (o.alphaC() != null) {
            line("alpha_c", QuantityFormat.plain(o.alphaC()));
        }
        if (o.material() != null) {
            line("material", str(o.material()));
        }
    }

    private static String amps(double a) {
        return q(a, Dimension.CURRENT, List.of("A", "mA"));
    }

    private static String volts(double v) {
        return q(v, Dimension.VOLTAGE, List.of("V", "mV"));
    }

    private static String time(double s) {
        List<String> units = s >= 3600 ? List.of("h", "min", "s") : s >= 60 ? List.of("min", "s") : List.of("s");
        return q(s, Dimension.TIME, units);
    }

    private static String q(double si, Dimension d, List<String> units) {
        return str(QuantityFormat.format(si, d, units));
    }

    private void header(String name) {
        out.append(out.length() == 0 ? "" : "\n").append('[').append(name).append("]\n");
    }

    private void line(String key, String value) {
        out.append(key).append(" = ").append(value).append('\n');
    }

    private static String str(String s) {
        return "\"" + Toml.tomlEscape(s) + "\"";
    }
}
