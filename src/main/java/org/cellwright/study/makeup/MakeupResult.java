package org.cellwright.study.makeup;

import java.util.List;
import java.util.Map;

/**
 * The electrolyte a feed makes: its composition, what happened step by step, what precipitates, and the
 * cautions.
 *
 * @param title the bath's name
 * @param volumeM3 the final volume (m3)
 * @param temperatureK its temperature (K)
 * @param compositionMolPerM3 each dissolved ion (library notation) to its concentration (mol/m3), after the
 *     precipitates have left; metal ions first, then the other cations, then the anions
 * @param log what each step did, in plain words
 * @param precipitates solids expected to come down (estimated), to be filtered off
 * @param flags solubility and hydrolysis cautions, in plain words
 * @param gasMol gases given off while dissolving metals (mol)
 * @param chargeMolPerM3 the positive charge, equal to the negative (mol of charge per m3)
 */
public record MakeupResult(String title, double volumeM3, double temperatureK, Map<String, Double> compositionMolPerM3,
                           List<String> log, List<Precipitate> precipitates, List<String> flags,
                           Map<String, Double> gasMol, double chargeMolPerM3) {

    public MakeupResult {
        compositionMolPerM3 = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(compositionMolPerM3));
        log = List.copyOf(log);
        precipitates = List.copyOf(precipitates);
        flags = List.copyOf(flags);
        gasMol = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(gasMol));
    }

    /**
     * A solid expected to precipitate.
     *
     * @param compound the solid
     * @param kg its mass (kg), from the solubility product with activity coefficients of 1 (an estimate)
     * @param saturation the ion activity product over the solubility product before it came down
     */
    public record Precipitate(Compound compound, double kg, double saturation) {
    }
}
