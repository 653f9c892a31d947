package org.cellwright.sim;

import java.util.List;
import java.util.Map;

/**
 * What a run yields in figures, SI units unless the name says otherwise.
 *
 * @param stopReason "end", "short_circuit", "target", "voltage_limit" or "temperature_limit"
 * @param durationS how long the run lasted (s)
 * @param chargeC charge passed (C)
 * @param depositKg deposit per metal (metal symbol to kg)
 * @param purity mass fraction of each metal in the deposit
 * @param targetMetal the metal the run is for, or null
 * @param currentEfficiency share of the charge that deposited the target metal (0..1)
 * @param energyJ electrical energy drawn (J)
 * @param specificEnergyJPerKg energy per mass of target metal deposited (J/kg), NaN when none deposited
 * @param cellVoltageStartV cell voltage at the start (V)
 * @param cellVoltageEndV at the end (V)
 * @param cellVoltageMeanV time-averaged (V)
 * @param cellVoltageMaxV highest (V)
 * @param finalConcentrationMolPerM3 each species at the end (mol/m3)
 * @param gasMol moles of H2, O2 and Cl2 given off
 * @param shortCircuitS time of a short circuit (s), or null
 * @param shortCircuitForecastS forecast time of a short (s), or null when none is foreseen
 * @param morphologyFinal the deposit's form at the end ("compact", "rough", "dendritic", "powdery"), or null
 * @param temperatureStartK bath temperature at the start (K)
 * @param temperatureEndK at the end (K)
 * @param temperatureMaxK highest (K)
 * @param reactionChargeC charge passed by each electrode reaction ("cathode:Sn2+/Sn" to C, anodic positive)
 * @param warnings cautions and data-validity notes in plain words
 * @param corrodedKg mass of each metal that redissolved from the deposit (metal symbol to kg): oxidants whose
 *     reduction took more electrons than the supply gave took the rest from the deposit
 * @param finalAnolyteConcentrationMolPerM3 each species in the anolyte at the end (mol/m3); empty when the
 *     cell is undivided ({@code finalConcentrationMolPerM3} is then the bath, else the catholyte)
 */
public record RunSummary(String stopReason, double durationS, double chargeC, Map<String, Double> depositKg,
                         Map<String, Double> purity, String targetMetal, double currentEfficiency, double energyJ,
                         double specificEnergyJPerKg, double cellVoltageStartV, double cellVoltageEndV,
                         double cellVoltageMeanV, double cellVoltageMaxV,
                         Map<String, Double> finalConcentrationMolPerM3, Map<String, Double> gasMol,
                         Double shortCircuitS, Double shortCircuitForecastS, String morphologyFinal,
                         double temperatureStartK, double temperatureEndK, double temperatureMaxK,
                         Map<String, Double> reactionChargeC, List<String> warnings, Map<String, Double> corrodedKg,
                         Map<String, Double> finalAnolyteConcentrationMolPerM3) {

    /** A summary with nothing redissolved and no anolyte (an undivided cell). */
    public RunSummary(String stopReason, double durationS, double chargeC, Map<String, Double> depositKg,
                      Map<String, Double> purity, String targetMetal, double currentEfficiency, double energyJ,
                      double specificEnergyJPerKg, double cellVoltageStartV, double cellVoltageEndV,
                      double cellVoltageMeanV, double cellVoltageMaxV,
                      Map<String, Double> finalConcentrationMolPerM3, Map<String, Double> gasMol,
                      Double shortCircuitS, Double shortCircuitForecastS, String morphologyFinal,
                      double temperatureStartK, double temperatureEndK, double temperatureMaxK,
                      Map<String, Double> reactionChargeC, List<String> warnings) {
        this(stopReason, durationS, chargeC, depositKg, purity, targetMetal, currentEfficiency, energyJ,
                specificEnergyJPerKg, cellVoltageStartV, cellVoltageEndV, cellVoltageMeanV, cellVoltageMaxV,
                finalConcentrationMolPerM3, gasMol, shortCircuitS, shortCircuitForecastS, morphologyFinal,
                temperatureStartK, temperatureEndK, temperatureMaxK, reactionChargeC, warnings, Map.of(), Map.of());
    }

    /** @return the total deposit (kg) */
    public double depositTotalKg() {
        return depositKg.values().stream().mapToDouble(Double::doubleValue).sum();
    }
}
