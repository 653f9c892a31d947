package org.cellwright.io;

/**
 * The physical dimension a scenario value must have, with the SI unit a bare number is read in.
 *
 * <p>Concentrations come in two kinds: amount per volume (mol/m3, the engine's unit) and mass per volume
 * (kg/m3 = g/L), which needs the molar mass of the species to become mol/m3 (see
 * {@link UnitParser#concentration(String, double)}).
 */
public enum Dimension {
    /** Electric current (A). */
    CURRENT("a current", "A", "3 A"),
    /** Current density, also exchange current density (A/m2). */
    CURRENT_DENSITY("a current density", "A/m2", "2.5 A/dm2"),
    /** Electric potential difference (V). */
    VOLTAGE("a voltage", "V", "2.2 V"),
    /** Length, gap, diffusion-layer thickness (m). */
    LENGTH("a length", "m", "35 mm"),
    /** Area (m2). */
    AREA("an area", "m2", "1.2 dm2"),
    /** Volume (m3). */
    VOLUME("a volume", "m3", "0.8 L"),
    /** Amount of substance per volume (mol/m3). */
    AMOUNT_CONCENTRATION("an amount concentration", "mol/m3", "0.5 mol/L"),
    /** Mass per volume (kg/m3, numerically g/L). */
    MASS_CONCENTRATION("a mass concentration", "kg/m3", "40 g/L"),
    /** Thermodynamic temperature (K); Celsius is converted with its offset. */
    TEMPERATURE("a temperature", "K", "25 C"),
    /** Time (s). */
    TIME("a time", "s", "4 h"),
    /** Electric resistance (ohm). */
    RESISTANCE("a resistance", "ohm", "5 mohm"),
    /** Electrolytic conductivity (S/m). */
    CONDUCTIVITY("a conductivity", "S/m", "450 mS/cm"),
    /** Volume flow rate (m3/s). */
    VOLUME_FLOW("a volume flow", "m3/s", "2 L/min"),
    /** Heat-transfer conductance (W/K). */
    HEAT_CONDUCTANCE("a heat-loss conductance", "W/K", "1.5 W/K"),
    /** Diffusion coefficient (m2/s). */
    DIFFUSIVITY("a diffusion coefficient", "m2/s", "7.2e-10 m2/s"),
    /** Molar (ionic) conductivity (S m2/mol). */
    MOLAR_CONDUCTIVITY("a molar conductivity", "S m2/mol", "107.2 S cm2/mol"),
    /** Mass (kg). */
    MASS("a mass", "kg", "100 g"),
    /** Molar mass (kg/mol). */
    MOLAR_MASS("a molar mass", "kg/mol", "118.71 g/mol");

    private final String description;
    private final String siUnit;
    private final String example;

    Dimension(String description, String siUnit, String example) {
        this.description = description;
        this.siUnit = siUnit;
        this.example = example;
    }

    /** @return a typical value as written in a scenario, for messages ("2.5 A/dm2") */
    public String example() {
        return example;
    }

    /** @return the dimension with its article, for messages ("a current density") */
    public String description() {
        return description;
    }

    /** @return the SI unit a bare number is read in ("A/m2") */
    public String siUnit() {
        return siUnit;
    }
}
