package org.cellwright.study;

import org.cellwright.sim.TracePoint;

/**
 * A quantity a measured run log may hold, with its column name and unit as written in the log, and how to
 * read the same quantity off the engine's time series.
 */
public enum LoggedQuantity {
    /** Current through the cell, column {@code current_A}. */
    CURRENT("A"),
    /** Voltage at the supply terminals, column {@code cell_voltage_V}. */
    CELL_VOLTAGE("V"),
    /** Deposit of all metals so far, column {@code deposit_g}. */
    DEPOSIT("g"),
    /** A dissolved species by mass, column {@code c_<species>_g_per_L}. */
    CONCENTRATION_G_PER_L("g/L"),
    /** A dissolved species by amount, column {@code c_<species>_mol_per_L} (as the run CSV writes it). */
    CONCENTRATION_MOL_PER_L("mol/L"),
    /** Bath temperature, column {@code temperature_C}. */
    TEMPERATURE("C");

    /** Kelvin at 0 degrees C (source: SI Brochure, 9th ed., 2.3.1). */
    private static final double ZERO_CELSIUS_K = 273.15;

    private final String unit;

    LoggedQuantity(String unit) {
        this.unit = unit;
    }

    /** @return the unit the log gives it in, as a symbol ("A", "g/L", "C") */
    public String unit() {
        return unit;
    }

    /** @return true for a concentration of a named species */
    public boolean isConcentration() {
        return this == CONCENTRATION_G_PER_L || this == CONCENTRATION_MOL_PER_L;
    }

    /**
     * @param p a point of the engine's time series
     * @param speciesIndex the species' index in the run's species list (concentrations only)
     * @param molarMassKgPerMol the species' molar mass (kg/mol; concentrations by mass only)
     * @return the quantity at that point, in the log's unit
     */
    public double read(TracePoint p, int speciesIndex, double molarMassKgPerMol) {
        return switch (this) {
            case CURRENT -> p.state().currentA();
            case CELL_VOLTAGE -> p.state().cellVoltageV();
            case DEPOSIT -> p.depositTotalKg() * 1000;
            // mol/m3 times kg/mol is kg/m3, numerically g/L
            case CONCENTRATION_G_PER_L -> p.state().concentrationsMolPerM3()[speciesIndex] * molarMassKgPerMol;
            case CONCENTRATION_MOL_PER_L -> p.state().concentrationsMolPerM3()[speciesIndex] / 1000;
            case TEMPERATURE -> p.state().temperatureK() - ZERO_CELSIUS_K;
        };
    }
}
