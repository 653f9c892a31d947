package org.cellwright.cell;

import java.util.Objects;

/**
 * The tank and the space between the electrodes.
 *
 * @param gapM anode-cathode gap, face to face (m), > 0
 * @param agitation how the electrolyte moves at the electrodes
 * @param ambientK ambient temperature around the tank (K)
 * @param contactResistanceOhm contact and lead resistance in series with the cell (ohm), >= 0
 * @param heatLossWPerK lumped heat-transfer conductance from bath to ambient (W/K), or null to estimate it
 *     from the volume (see the engine's heat balance)
 */
public record CellSetup(double gapM, Agitation agitation, double ambientK, double contactResistanceOhm,
                        Double heatLossWPerK) {

    public CellSetup {
        Checks.positive("cell.gap", gapM, "m");
        Objects.requireNonNull(agitation, "agitation");
        Checks.within("cell.ambient", ambientK, 223.15, 333.15, "K");
        Checks.nonNegative("cell.contact_resistance", contactResistanceOhm, "ohm");
        if (heatLossWPerK != null) {
            Checks.positive("cell.heat_loss", heatLossWPerK, "W/K");
        }
    }

    /** @return a copy with another gap (m) */
    public CellSetup withGap(double g) {
        return new CellSetup(g, agitation, ambientK, contactResistanceOhm, heatLossWPerK);
    }

    /** @return a copy with another agitation */
    public CellSetup withAgitation(Agitation a) {
        return new CellSetup(gapM, a, ambientK, contactResistanceOhm, heatLossWPerK);
    }
}
