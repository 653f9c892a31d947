package org.cellwright.chem;

/**
 * Physical constants used throughout the engine, SI units.
 *
 * <p>Source: CODATA 2018 recommended values (exact since the 2019 redefinition of the SI).
 */
public final class PhysicalConstants {

    /** Faraday constant (C/mol), CODATA 2018, exact: e * N_A. */
    public static final double FARADAY = 96485.33212331001;

    /** Molar gas constant (J/(mol K)), CODATA 2018, exact: k_B * N_A. */
    public static final double GAS_CONSTANT = 8.314462618153241;

    /** 0 degrees Celsius (K). */
    public static final double ZERO_CELSIUS_K = 273.15;

    /** Standard atmosphere (Pa). */
    public static final double STANDARD_ATMOSPHERE_PA = 101325.0;

    /** Reference temperature of the data library, 25 C (K). */
    public static final double REFERENCE_TEMPERATURE_K = 298.15;

    private PhysicalConstants() {
    }
}
