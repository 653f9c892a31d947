package org.cellwright.sim;

/**
 * Everything the cell is doing at one instant, as computed from the state: the supply's current and
 * voltage, the electrode potentials, the cell voltage broken down, every reaction's partial current, and
 * the bath.
 *
 * @param timeS time from the start (s)
 * @param currentA current through the cell (A)
 * @param cellVoltageV voltage at the supply terminals (V)
 * @param cathodePotentialV cathode potential vs SHE (V)
 * @param anodePotentialV anode potential vs SHE (V)
 * @param equilibriumVoltageV equilibrium voltage of the dominant anode and cathode reactions (V)
 * @param anodeOverpotentialV anode potential minus its dominant reaction's equilibrium potential (V)
 * @param cathodeOverpotentialV cathode potential minus its dominant reaction's equilibrium potential (V, negative)
 * @param ohmicSolutionV ohmic drop across the gap without gas (V)
 * @param ohmicBubblesV extra ohmic drop caused by gas bubbles in the gap (V)
 * @param ohmicContactsV drop across contacts and leads (V)
 * @param cathodeCurrentsA partial current of each cathode reaction (A, anodic positive)
 * @param anodeCurrentsA partial current of each anode reaction (A, anodic positive)
 * @param concentrationsMolPerM3 bulk concentration of each tracked species (mol/m3)
 * @param temperatureK bath temperature (K)
 * @param conductivitySPerM bath conductivity without gas (S/m)
 * @param voidFraction gas fraction in the gap
 * @param targetEfficiency the share of the current that deposits the target metal (0..1)
 * @param targetLimitRatio the target metal's partial current over its limiting current (0..1)
 * @param supplyLimited true when the supply holds its limit instead of its set value
 * @param dendriteHeightM dendrite tip height above the cathode (m)
 */
public record InstantState(double timeS, double currentA, double cellVoltageV, double cathodePotentialV,
                           double anodePotentialV, double equilibriumVoltageV, double anodeOverpotentialV,
                           double cathodeOverpotentialV, double ohmicSolutionV, double ohmicBubblesV,
                           double ohmicContactsV, double[] cathodeCurrentsA, double[] anodeCurrentsA,
                           double[] concentrationsMolPerM3, double temperatureK, double conductivitySPerM,
                           double voidFraction, double targetEfficiency, double targetLimitRatio,
                           boolean supplyLimited, double dendriteHeightM) {

    /** @return the total ohmic drop (V) */
    public double ohmicDropV() {
        return ohmicSolutionV + ohmicBubblesV + ohmicContactsV;
    }
}
