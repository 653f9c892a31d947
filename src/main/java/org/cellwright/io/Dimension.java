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
    CURRENT("a current", "A"),
    /** Current density, also exchange current density (A/m2). */
    CURRENT_DENSITY("a current density", "A/m2"),
    /** Electric potential difference (V). */
    VOLTAGE("a voltage", "V"),
    /** Length, gap, diffusion-layer thickness (m). */
    LENGTH("a length", "m"),
    /** Area (m2). */
    AREA("an area", "m2"),
    /** Volume (m3). */
    VOLUME("a volume", "m3"),
    /** Amount of substance per volume (mol/m3). */
    AMOUNT_CONCENTRATION("an amount concentration", "mol/m3"),
    /** Mass per volume (kg/m3, numerically g/L). */
    MASS_CONCENTRATION("a mass concentration", "kg/m3"),
    /** Thermodynamic temperature (K); Celsius is converted with its offset. */
    TEMPERATURE("a temperature", "K"),
    /** Time (s). */
    TIME("a time", "s"),
    /** Electric resistance (ohm). */
    RESISTANCE("a resistance", "ohm"),
    /** Electrolytic conductivity (S/m). */
    CONDUCTIVITY("a conductivity", "S/m"),
    /** Volume flow rate (m3/s). */
    VOLUME_FLOW("a volume flow", "m3/s"),
    /** Heat-transfer conductance (W/K). */
    HEAT_CONDUCTANCE("a heat-loss conductance", "W/K"),
    /** Diffusion coefficient (m2/s). */
    DIFFUSIVITY("a diffusion coefficient", "m2/s"),
    /** Molar (ionic) conductivity (S m2/mol). */
    MOLAR_CONDUCTIVITY("a molar conductivity", "S m2/mol"),
    /** Mass (kg). */
    MASS("a mass", "kg"),
    /** Molar mass (kg/mol). */
    MOLAR_MASS("a molar mass", "kg/mol");

    private final String description;
    private final String siUnit;

    Dimension(String description, String siUnit) {
        this.description = description;
        this.siUnit = siUnit;
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
