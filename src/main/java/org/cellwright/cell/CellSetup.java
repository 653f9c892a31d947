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
 * @param compartments undivided (default), divided by a separator, or two unstirred zones
 */
public record CellSetup(double gapM, Agitation agitation, double ambientK, double contactResistanceOhm,
                        Double heatLossWPerK, Compartments compartments) {

    public CellSetup {
        Checks.positive("cell.gap", gapM, "m");
        Objects.requireNonNull(agitation, "agitation");
        Checks.within("cell.ambient", ambientK, 223.15, 333.15, "K");
        Checks.nonNegative("cell.contact_resistance", contactResistanceOhm, "ohm");
        if (heatLossWPerK != null) {
            Checks.positive("cell.heat_loss", heatLossWPerK, "W/K");
        }
        compartments = compartments == null ? Compartments.undivided() : compartments;
        if (compartments.separator() != null && compartments.separator().thicknessM() >= gapM) {
            throw new IllegalArgumentException("cell.separator_thickness (" + compartments.separator().thicknessM()
                    + " m) must be less than cell.gap (" + gapM + " m)");
        }
    }

    /** An undivided, well-mixed cell. */
    public CellSetup(double gapM, Agitation agitation, double ambientK, double contactResistanceOhm,
                     Double heatLossWPerK) {
        this(gapM, agitation, ambientK, contactResistanceOhm, heatLossWPerK, Compartments.undivided());
    }

    /** @return a copy with another gap (m) */
    public CellSetup withGap(double g) {
        return new CellSetup(g, agitation, ambientK, contactResistanceOhm, heatLossWPerK, compartments);
    }

    /** @return a copy with another agitation */
    public CellSetup withAgitation(Agitation a) {
        return new CellSetup(gapM, a, ambientK, contactResistanceOhm, heatLossWPerK, compartments);
    }

    /** @return a copy with other compartments */
    public CellSetup withCompartments(Compartments c) {
        return new CellSetup(gapM, agitation, ambientK, contactResistanceOhm, heatLossWPerK, c);
    }
}
