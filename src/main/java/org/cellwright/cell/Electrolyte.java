package org.cellwright.cell;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The bath at the start of a run.
 *
 * @param volumeM3 electrolyte volume (m3), > 0
 * @param temperatureK start temperature (K), within the liquid range of water
 * @param compositionMolPerM3 initial concentration of each dissolved species (canonical name to mol/m3;
 *     1 mol/L = 1000 mol/m3), in the order given
 * @param conductivitySPerM pinned conductivity at the start temperature (S/m), or null to compute it from
 *     the composition
 */
public record Electrolyte(double volumeM3, double temperatureK, Map<String, Double> compositionMolPerM3,
                          Double conductivitySPerM) {

    /** Lowest temperature accepted (K): freezing point of water, 0 C. */
    public static final double MIN_TEMPERATURE_K = 273.15;
    /** Highest temperature accepted (K): boiling point of water at 1 atm, 100 C. */
    public static final double MAX_TEMPERATURE_K = 373.15;

    public Electrolyte {
        Checks.positive("electrolyte.volume", volumeM3, "m3");
        Checks.within("electrolyte.temperature", temperatureK, MIN_TEMPERATURE_K, MAX_TEMPERATURE_K, "K");
        Map<String, Double> copy = new LinkedHashMap<>();
        compositionMolPerM3.forEach((k, v) -> {
            Checks.nonNegative("electrolyte.composition." + k, v, "mol/m3");
            copy.put(k, v);
        });
        compositionMolPerM3 = Collections.unmodifiableMap(copy);
        if (conductivitySPerM != null) {
            Checks.positive("electrolyte.conductivity", conductivitySPerM, "S/m");
        }
    }

    /** @return a copy at another start temperature (K) */
    public Electrolyte withTemperature(double tempK) {
        return new Electrolyte(volumeM3, tempK, compositionMolPerM3, conductivitySPerM);
    }

    /** @return a copy with another volume (m3) */
    public Electrolyte withVolume(double v) {
        return new Electrolyte(v, temperatureK, compositionMolPerM3, conductivitySPerM);
    }

    /** @return a copy with one species set to a concentration (mol/m3) */
    public Electrolyte withConcentration(String species, double molPerM3) {
        Map<String, Double> copy = new LinkedHashMap<>(compositionMolPerM3);
        copy.put(species, molPerM3);
        return new Electrolyte(volumeM3, temperatureK, copy, conductivitySPerM);
    }
}
