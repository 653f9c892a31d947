package org.cellwright.study;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.function.ToDoubleFunction;

import org.cellwright.sim.RunSummary;

/**
 * The figures of a run's summary that a sweep can chart and a spread study can give ranges of. Each gives
 * its value in SI ({@link #si}) and, for tables and axes, in the unit people read it in ({@link #display}).
 *
 * <p>Conversions: 1 kWh = 3.6e6 J and 1 W h = 3600 J (SI Brochure, 9th ed., table 8); 0 C = 273.15 K
 * (SI Brochure, 2.3.1).
 */
public enum SummaryFigure {
    /** Energy per mass of the target metal deposited; NaN when none deposited. */
    SPECIFIC_ENERGY("specific-energy", "specific energy", "kWh/kg", 1 / 3.6e6, 0, RunSummary::specificEnergyJPerKg),
    /** Share of the charge that deposited the target metal, whole run. */
    EFFICIENCY("efficiency", "current efficiency", "%", 100, 0, RunSummary::currentEfficiency),
    /** Deposit of the target metal. */
    DEPOSIT("deposit", "target metal deposit", "g", 1000, 0, SummaryFigure::targetKg),
    /** Mass fraction of the target metal in the deposit; NaN when nothing deposited. */
    PURITY("purity", "target metal purity", "%", 100, 0, SummaryFigure::targetPurity),
    /** Time-averaged cell voltage. */
    VOLTAGE_MEAN("voltage-mean", "mean cell voltage", "V", 1, 0, RunSummary::cellVoltageMeanV),
    /** Highest cell voltage. */
    VOLTAGE_MAX("voltage-max", "highest cell voltage", "V", 1, 0, RunSummary::cellVoltageMaxV),
    /** Electrical energy drawn. */
    ENERGY("energy", "energy", "W h", 1 / 3600.0, 0, RunSummary::energyJ),
    /** How long the run lasted (shorter than set when a stop condition ended it). */
    DURATION("duration", "duration", "h", 1 / 3600.0, 0, RunSummary::durationS),
    /** Highest bath temperature. */
    TEMPERATURE_MAX("temperature-max", "highest bath temperature", "C", 1, -273.15, RunSummary::temperatureMaxK);

    private final String key;
    private final String description;
    private final String displayUnit;
    private final double scale;
    private final double offset;
    private final ToDoubleFunction<RunSummary> value;

    SummaryFigure(String key, String description, String displayUnit, double scale, double offset,
                  ToDoubleFunction<RunSummary> value) {
        this.key = key;
        this.description = description;
        this.displayUnit = displayUnit;
        this.scale = scale;
        this.offset = offset;
        this.value = value;
    }

    /** @return the name used on the command line ("specific-energy") */
    public String key() {
        return key;
    }

    /** @return what it is, in words ("specific energy") */
    public String description() {
        return description;
    }

    /** @return the unit of {@link #display} ("kWh/kg") */
    public String displayUnit() {
        return displayUnit;
    }

    /** @return the axis or column title: description and unit ("specific energy (kWh/kg)") */
    public String label() {
        return description + " (" + displayUnit + ")";
    }

    /**
     * @param s a run's summary
     * @return the figure in SI (J/kg, fraction, kg, V, J, s, K); NaN when it has no value for this run
     */
    public double si(RunSummary s) {
        return value.applyAsDouble(s);
    }

    /**
     * @param s a run's summary
     * @return the figure in {@link #displayUnit()}
     */
    public double display(RunSummary s) {
        return toDisplay(si(s));
    }

    /**
     * @param si a value of this figure in SI
     * @return the same value in {@link #displayUnit()}
     */
    public double toDisplay(double si) {
        return si * scale + offset;
    }

    /**
     * @param name a command-line name, any case
     * @return the figure of that name
     */
    public static Optional<SummaryFigure> find(String name) {
        String n = name.strip().toLowerCase(Locale.ROOT).replace('_', '-');
        return Arrays.stream(values()).filter(f -> f.key.equals(n)).findFirst();
    }

    private static double targetKg(RunSummary s) {
        return s.targetMetal() == null ? Double.NaN : s.depositKg().getOrDefault(s.targetMetal(), 0.0);
    }

    private static double targetPurity(RunSummary s) {
        return s.targetMetal() == null || !(s.depositTotalKg() > 0) ? Double.NaN
                : s.purity().getOrDefault(s.targetMetal(), 0.0);
    }
}
