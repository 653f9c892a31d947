package org.cellwright.ui;

import java.math.BigDecimal;
import java.math.MathContext;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.Dimension;
import org.cellwright.io.UnitException;
import org.cellwright.io.UnitParser;

/**
 * What the five what-if sliders do to a scenario: the unit each shows, its scale, the value it stands at,
 * and the scenario it makes. A slider position becomes text with three significant digits in the shown unit
 * ("24.5 mm"), and that text is read by the unit parser, so the scenario the slider runs is exactly the one
 * the form then shows and saves.
 *
 * <p>The scales are fixed when the scenario is loaded (so they do not move under the mouse) and always
 * include the loaded value: current density 0.05 to 30 A/dm2, gap 2 to 300 mm, temperature 5 to 95 C,
 * diffusion layer 600 um (still, left) to 5 um (vigorous, right), a current or voltage from a quarter to
 * four times the loaded value, a concentration from a thirtieth to five times the loaded value.
 */
final class WhatIf {

    /** Significant digits of a slider's value: finer than the models' accuracy, coarse enough to read. */
    static final int DIGITS = 3;

    private final SupplyKind supply;
    private final String species;
    private final double molarMassKgPerMol;
    private final KnobScale[] scales = new KnobScale[Knob.values().length];

    /**
     * @param loaded the scenario as loaded (sets the scales)
     * @param supply how the form sets the supply
     * @param species the species the concentration slider changes (canonical name), or null for none
     * @param lib the chemistry library (molar masses)
     */
    WhatIf(Scenario loaded, SupplyKind supply, String species, ChemLibrary lib) {
        this.supply = supply;
        this.species = species;
        this.molarMassKgPerMol = species == null ? Double.NaN
                : lib.findSpecies(species).map(Species::molarMassKgPerMol).orElse(Double.NaN);
        for (Knob k : Knob.values()) {
            scales[k.ordinal()] = enabled(k) ? scaleAround(k, value(k, loaded)) : null;
        }
    }

    private KnobScale scaleAround(Knob k, double v) {
        return switch (k) {
            case SUPPLY -> supply == SupplyKind.CURRENT_DENSITY
                    ? new KnobScale(Math.min(0.05, v / 4), Math.max(30, v * 4), true, false)
                    : new KnobScale(v / 4, v * 4, true, false);
            case GAP -> new KnobScale(Math.min(2, v / 2), Math.max(300, v * 2), true, false);
            case CONCENTRATION -> new KnobScale(v / 30, v * 5, true, false);
            case TEMPERATURE -> new KnobScale(Math.min(5, v), Math.max(95, v), false, false);
            case AGITATION -> new KnobScale(Math.min(5, v / 2), Math.max(600, v * 2), true, true);
        };
    }

    /** @return how the supply is set */
    SupplyKind supplyKind() {
        return supply;
    }

    /** @return the species the concentration slider changes, or null */
    String species() {
        return species;
    }

    /**
     * @param k a slider
     * @return true when it can act on this scenario (a schedule has no single set value; a concentration
     *     slider needs a species)
     */
    boolean enabled(Knob k) {
        return switch (k) {
            case SUPPLY -> supply != SupplyKind.SCHEDULE;
            case CONCENTRATION -> species != null;
            default -> true;
        };
    }

    /** @return the scale of an enabled slider, in its shown unit */
    KnobScale scale(Knob k) {
        return scales[k.ordinal()];
    }

    /** @return the unit a slider shows */
    String unit(Knob k) {
        return switch (k) {
            case SUPPLY -> switch (supply) {
                case CURRENT_DENSITY -> "A/dm2";
                case CURRENT -> "A";
                default -> "V";
            };
            case GAP -> "mm";
            case CONCENTRATION -> molarMassKgPerMol > 0 ? "g/L" : "mol/L";
            case TEMPERATURE -> "C";
            case AGITATION -> "um";
        };
    }

    /**
     * @param k an enabled slider
     * @param s a scenario
     * @return the value the scenario gives, in the slider's unit
     */
    double value(Knob k, Scenario s) {
        return switch (k) {
            case SUPPLY -> switch (supply) {
                case CURRENT_DENSITY -> s.supply().currentA() / s.cathode().areaM2() / 100;
                case CURRENT -> s.supply().currentA();
                default -> s.supply().voltageV();
            };
            case GAP -> s.cell().gapM() * 1000;
            case CONCENTRATION -> {
                double c = s.electrolyte().compositionMolPerM3().getOrDefault(species, 0.0);
                yield molarMassKgPerMol > 0 ? c * molarMassKgPerMol : c / 1000;
            }
            case TEMPERATURE -> s.electrolyte().temperatureK() - 273.15;
            case AGITATION -> s.cell().agitation().diffusionLayerM() * 1e6;
        };
    }

    /**
     * @param k a slider
     * @param shown a value in its unit
     * @return the value as the form writes it, to {@value #DIGITS} significant digits ("24.5 mm")
     */
    String text(Knob k, double shown) {
        return digits(shown) + " " + unit(k);
    }

    /**
     * @param k a slider
     * @param position its position
     * @return the text of the value there
     */
    String textAt(Knob k, int position) {
        return text(k, scale(k).valueAt(position));
    }

    /**
     * Makes the scenario a slider asks for.
     *
     * @param k the slider
     * @param s the scenario it acts on
     * @param text the value as {@link #text} writes it
     * @return the scenario with that value
     * @throws UnitException when the text does not read (cannot happen for text from {@link #text})
     * @throws IllegalArgumentException when the value is out of the scenario's range
     */
    Scenario apply(Knob k, Scenario s, String text) throws UnitException {
        return switch (k) {
            case SUPPLY -> switch (supply) {
                case CURRENT_DENSITY -> s.withSupply(s.supply().withCurrent(
                        UnitParser.parse(text, Dimension.CURRENT_DENSITY).si() * s.cathode().areaM2()));
                case CURRENT -> s.withSupply(s.supply().withCurrent(UnitParser.parse(text, Dimension.CURRENT).si()));
                case VOLTAGE -> s.withSupply(s.supply().withVoltage(UnitParser.parse(text, Dimension.VOLTAGE).si()));
                case SCHEDULE -> throw new IllegalArgumentException("a schedule has no single set value");
            };
            case GAP -> s.withCell(s.cell().withGap(UnitParser.parse(text, Dimension.LENGTH).si()));
            case CONCENTRATION -> s.withElectrolyte(s.electrolyte().withConcentration(species,
                    UnitParser.concentration(text, molarMassKgPerMol)));
            case TEMPERATURE -> s.withElectrolyte(s.electrolyte().withTemperature(
                    UnitParser.parse(text, Dimension.TEMPERATURE).si()));
            case AGITATION -> s.withCell(s.cell().withAgitation(
                    Agitation.ofLayer(UnitParser.parse(text, Dimension.LENGTH).si())));
        };
    }

    /**
     * Writes a slider's value into the form's draft, so that the form shows and saves what was run.
     *
     * @param d the draft
     * @param k the slider
     * @param text the value as {@link #text} writes it
     */
    void writeTo(ScenarioDraft d, Knob k, String text) {
        switch (k) {
            case SUPPLY -> d.set(FormFields.SUPPLY_VALUE, text);
            case GAP -> d.set("cell.gap", text);
            case CONCENTRATION -> d.setConcentration(species, text);
            case TEMPERATURE -> d.set("electrolyte.temperature", text);
            case AGITATION -> {
                d.set(FormFields.AGITATION, "");
                d.set(FormFields.DIFFUSION_LAYER, text);
            }
        }
    }

    /**
     * @param k a slider
     * @return its tooltip: what it changes, its unit and scale
     */
    String tooltip(Knob k) {
        return switch (k) {
            case SUPPLY -> supply == SupplyKind.SCHEDULE
                    ? "The supply follows a schedule from the file; edit the file to change it."
                    : "The supply's set " + (supply == SupplyKind.VOLTAGE ? "voltage" : supply == SupplyKind.CURRENT
                    ? "current" : "current density (times the cathode area)") + ", " + unit(k) + ", log scale.";
            case GAP -> "Anode-cathode gap, mm, log scale: the ohmic drop grows with it; a dendrite needs longer to bridge it.";
            case CONCENTRATION -> species == null ? "No dissolved species to change."
                    : "Start concentration of " + species + ", " + unit(k) + ", log scale. Choose the species above.";
            case TEMPERATURE -> "Bath temperature at the start, C. The air around the tank stays as set.";
            case AGITATION -> "Steady diffusion-layer thickness, um, log scale: right is more vigorous. Presets:"
                    + " still 300, natural 200, gentle 100, sparged 70, stirred 30 um (Pletcher and Walsh,"
                    + " Industrial Electrochemistry, 2nd ed., 1990; from memory).";
        };
    }

    /**
     * @param s a scenario
     * @param lib the chemistry library
     * @param species the species to name, or null
     * @return a few words naming the slider values of a run, for labels ("2 A/dm2, gap 30 mm, 25 C")
     */
    static String describe(Scenario s, ChemLibrary lib, String species) {
        StringBuilder sb = new StringBuilder();
        if (s.supply().schedule().isEmpty()) {
            sb.append(s.supply().mode() == ControlMode.CURRENT
                    ? digits(s.supply().currentA() / s.cathode().areaM2() / 100) + " A/dm2"
                    : digits(s.supply().voltageV()) + " V");
        } else {
            sb.append("schedule");
        }
        sb.append(", gap ").append(digits(s.cell().gapM() * 1000)).append(" mm");
        if (species != null) {
            double c = s.electrolyte().compositionMolPerM3().getOrDefault(species, 0.0);
            double m = lib.findSpecies(species).map(Species::molarMassKgPerMol).orElse(Double.NaN);
            sb.append(", ").append(species).append(' ')
                    .append(m > 0 ? digits(c * m) + " g/L" : digits(c / 1000) + " mol/L");
        }
        sb.append(", ").append(digits(s.electrolyte().temperatureK() - 273.15)).append(" C, layer ")
                .append(digits(s.cell().agitation().diffusionLayerM() * 1e6)).append(" um");
        return sb.toString();
    }

    /** @return a value to {@value #DIGITS} significant digits, without trailing zeros ("24.5", "300", "0.12") */
    static String digits(double v) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(DIGITS));
        return d.compareTo(BigDecimal.ZERO) == 0 ? "0" : d.stripTrailingZeros().toPlainString();
    }
}
