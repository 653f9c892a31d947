package org.cellwright.ui;

import java.util.List;
import java.util.Optional;

import org.cellwright.io.Dimension;

/**
 * The fields of the scenario form, in form order, with their tooltips. Units and ranges are those of
 * docs/scenario-format.md; sources of the defaults are named where a default comes from outside.
 */
final class FormFields {

    /** Key of the notes (a text area, not a one-line field). */
    static final String NOTES = "notes";
    /** Key of the supply's set value; written as current, current_density or voltage. */
    static final String SUPPLY_VALUE = "supply.value";
    /** Key of the agitation preset ("" when the diffusion layer is set directly). */
    static final String AGITATION = "cell.agitation";
    /** Key of the directly set diffusion-layer thickness. */
    static final String DIFFUSION_LAYER = "cell.diffusion_layer";
    /** Key of the stop conditions, written in the form separated by ';'. */
    static final String STOPS = "run.stop";
    /** Prefix of the composition rows' keys: "electrolyte.composition#3" is the fourth row. */
    static final String COMPOSITION = "electrolyte.composition#";

    static final List<FieldSpec> ALL = List.of(
            new FieldSpec("title", "Title", null, false, "short title", "A short title, shown in the window and on exports."),
            new FieldSpec("electrolyte.volume", "Volume", Dimension.VOLUME, true, "1.2 L",
                    "Electrolyte volume. Units: L, mL, dm3, m3, gal (U.S. gallon = 3.785411784 L, NIST SP 811, 2008, App. B)."),
            new FieldSpec("electrolyte.temperature", "Temperature", Dimension.TEMPERATURE, false, "25 C",
                    "Bath temperature at the start, 0 to 100 C. Units: C, K. Empty = 25 C. The library's kinetic and"
                            + " transport data hold for about 10 to 70 C (docs/library.md)."),
            new FieldSpec("electrolyte.conductivity", "Conductivity", Dimension.CONDUCTIVITY, false, "computed",
                    "Empty = computed from the composition (docs/conductivity.md); or a measured value at the start"
                            + " temperature. Units: S/m, mS/cm, S/cm, uS/cm."),
            new FieldSpec("cathode.material", "Cathode", null, true, "stainless",
                    "The substrate the metal deposits on; once covered, the deposit's own kinetics take over."
                            + " Materials of the built-in library (docs/library.md)."),
            new FieldSpec("cathode.area", "Cathode area", Dimension.AREA, true, "1 dm2",
                    "Active cathode area facing the anode. Units: dm2, cm2, mm2, m2, ft2, in2 (1 dm2 = 100 cm2)."),
            new FieldSpec("anode.material", "Anode", null, true, "graphite",
                    "Tin, copper, zinc, nickel and silver anodes dissolve (refining); the others are inert and"
                            + " oxidise the bath or water (oxygen, chlorine)."),
            new FieldSpec("anode.area", "Anode area", Dimension.AREA, true, "1 dm2",
                    "Active anode area facing the cathode. Units: dm2, cm2, mm2, m2, ft2, in2."),
            new FieldSpec("cell.gap", "Gap", Dimension.LENGTH, true, "30 mm",
                    "Anode-cathode gap, face to face. Units: mm, cm, m, um, in. Sets the ohmic drop across the"
                            + " bath and how far a dendrite must grow to short the cell."),
            new FieldSpec(AGITATION, "Agitation", null, false, "still",
                    "Presets and their steady diffusion-layer thickness: still 300 um, natural 200 um, gentle"
                            + " 100 um, stirred 30 um, sparged 70 um (Pletcher and Walsh, Industrial Electrochemistry,"
                            + " 2nd ed., 1990; Bard and Faulkner, Electrochemical Methods, 2nd ed., 2001, ch. 1 and 9;"
                            + " from memory). Empty = still."),
            new FieldSpec(DIFFUSION_LAYER, "Diffusion layer", Dimension.LENGTH, false, "150 um",
                    "Steady Nernst diffusion-layer thickness, set directly instead of a preset. Units: um, mm."
                            + " The limiting current density is n F D c / thickness."),
            new FieldSpec("cell.ambient", "Ambient", Dimension.TEMPERATURE, false, "22 C",
                    "Air temperature around the tank, -50 to 60 C. Empty = the bath's start temperature."),
            new FieldSpec("cell.contact_resistance", "Contacts", Dimension.RESISTANCE, false, "0 ohm",
                    "Contact and lead resistance in series with the cell. Units: ohm, mohm. Empty = 0."),
            new FieldSpec("cell.heat_loss", "Heat loss", Dimension.HEAT_CONDUCTANCE, false, "estimated",
                    "Heat-transfer conductance from bath to air, W/K. Empty = estimated from the volume"
                            + " (docs/model.md)."),
            new FieldSpec(SUPPLY_VALUE, "Set value", null, true, "2 A/dm2",
                    "What the supply holds: a current (A, mA), a current density (A/dm2, mA/cm2, A/m2, ASF;"
                            + " times the cathode area) or a voltage (V, mV)."),
            new FieldSpec("supply.voltage_limit", "Voltage limit", Dimension.VOLTAGE, false, "none",
                    "In current control the supply holds this voltage when the cell would need more; the"
                            + " current then falls. Units: V, mV. Empty = no limit."),
            new FieldSpec("supply.current_limit", "Current limit", Dimension.CURRENT, false, "none",
                    "In voltage control the supply holds this current when the cell would draw more. Units: A,"
                            + " mA. Empty = no limit."),
            new FieldSpec("run.duration", "Duration", Dimension.TIME, true, "6 h",
                    "How long to run. Units: s, min, h, d."),
            new FieldSpec("run.output_interval", "Output every", Dimension.TIME, false, "1 min",
                    "Spacing of the recorded points (charts, CSV). Units: s, min, h. Empty = 1 min."),
            new FieldSpec(STOPS, "Stop when", null, false, "short; Sn2+ < 3 g/L",
                    "Conditions that end the run early, separated by ';': short (a dendrite bridges the gap),"
                            + " Sn2+ < 3 g/L, T > 60 C, U > 8 V, Sn > 100 g."),
            new FieldSpec("run.target", "Target metal", null, false, "Sn",
                    "The metal that current efficiency and specific energy refer to. Empty = the depositable"
                            + " metal whose ion is most concentrated."));

    private FormFields() {
    }

    /**
     * @param key a field key
     * @return its spec, if the form has such a field
     */
    static Optional<FieldSpec> find(String key) {
        return ALL.stream().filter(f -> f.key().equals(key)).findFirst();
    }

    /**
     * @param kind how the supply is set
     * @return the dimension of the supply's set value
     */
    static Dimension supplyDimension(SupplyKind kind) {
        return switch (kind) {
            case CURRENT -> Dimension.CURRENT;
            case CURRENT_DENSITY -> Dimension.CURRENT_DENSITY;
            case VOLTAGE, SCHEDULE -> Dimension.VOLTAGE;
        };
    }
}
