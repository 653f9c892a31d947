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
 * @param equilibriumVoltageV equilibrium voltage: anode minus cathode equilibrium potential, each the current-weighted mean over the electrode's reactions (V)
 * @param anodeOverpotentialV anode potential minus its current-weighted equilibrium potential (V)
 * @param cathodeOverpotentialV cathode potential minus its current-weighted equilibrium potential (V, negative)
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
 * @param targetLimitRatio the target metal's deposition (cathodic) current over its limiting current (0..1)
 * @param supplyLimited true when the supply holds its limit instead of its set value
 * @param dendriteHeightM height of the dendrite tip above the cathode's starting surface (m): the flat deposit's
 *     thickness plus the dendrite standing on it
 * @param anolyteConcentrationsMolPerM3 concentration of each tracked species in the anolyte (mol/m3), or null
 *     when the cell is undivided ({@code concentrationsMolPerM3} is then the whole bath, else the catholyte)
 * @param morphology the form of the target metal's deposit now ("compact", "rough", "dendritic", "powdery"),
 *     or null when it is not depositing
 * @param shorted true once a dendrite has bridged the gap
 * @param depositThicknessM mean thickness of the flat deposit (m)
 */
public record InstantState(double timeS, double currentA, double cellVoltageV, double cathodePotentialV,
                           double anodePotentialV, double equilibriumVoltageV, double anodeOverpotentialV,
                           double cathodeOverpotentialV, double ohmicSolutionV, double ohmicBubblesV,
                           double ohmicContactsV, double[] cathodeCurrentsA, double[] anodeCurrentsA,
                           double[] concentrationsMolPerM3, double temperatureK, double conductivitySPerM,
                           double voidFraction, double targetEfficiency, double targetLimitRatio,
                           boolean supplyLimited, double dendriteHeightM, double[] anolyteConcentrationsMolPerM3,
                           String morphology, boolean shorted, double depositThicknessM) {

    /** An instant of an undivided cell with no deposit form recorded, the tip at {@code dendriteHeightM}. */
    public InstantState(double timeS, double currentA, double cellVoltageV, double cathodePotentialV,
                        double anodePotentialV, double equilibriumVoltageV, double anodeOverpotentialV,
                        double cathodeOverpotentialV, double ohmicSolutionV, double ohmicBubblesV,
                        double ohmicContactsV, double[] cathodeCurrentsA, double[] anodeCurrentsA,
                        double[] concentrationsMolPerM3, double temperatureK, double conductivitySPerM,
                        double voidFraction, double targetEfficiency, double targetLimitRatio,
                        boolean supplyLimited, double dendriteHeightM) {
        this(timeS, currentA, cellVoltageV, cathodePotentialV, anodePotentialV, equilibriumVoltageV,
                anodeOverpotentialV, cathodeOverpotentialV, ohmicSolutionV, ohmicBubblesV, ohmicContactsV,
                cathodeCurrentsA, anodeCurrentsA, concentrationsMolPerM3, temperatureK, conductivitySPerM,
                voidFraction, targetEfficiency, targetLimitRatio, supplyLimited, dendriteHeightM, null, null, false,
                0);
    }

    /** @return the total ohmic drop (V) */
    public double ohmicDropV() {
        return ohmicSolutionV + ohmicBubblesV + ohmicContactsV;
    }
}
