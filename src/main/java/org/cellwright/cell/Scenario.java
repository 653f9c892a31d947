package org.cellwright.cell;

import java.util.List;
import java.util.Objects;

/**
 * A complete, validated description of one electrolysis run, all values in SI units.
 *
 * @param title short title
 * @param notes free text for the user (what to look at)
 * @param electrolyte the bath
 * @param cathode the cathode (substrate material, area)
 * @param anode the anode (material, area)
 * @param cell gap, agitation, ambient, contact resistance, heat loss
 * @param supply the power supply
 * @param run duration, output interval, stop conditions, target metal
 * @param speciesOverrides the scenario's changes to the library's species
 * @param reactionOverrides the scenario's changes to the library's electrode reactions
 * @param deposit additives, dendrite tip and short resistance
 */
public record Scenario(String title, String notes, Electrolyte electrolyte, Electrode cathode, Electrode anode,
                       CellSetup cell, PowerSupply supply, RunSettings run,
                       List<SpeciesOverride> speciesOverrides, List<ReactionOverride> reactionOverrides,
                       DepositSettings deposit) {

    public Scenario {
        title = title == null ? "" : title;
        notes = notes == null ? "" : notes;
        Objects.requireNonNull(electrolyte, "electrolyte");
        Objects.requireNonNull(cathode, "cathode");
        Objects.requireNonNull(anode, "anode");
        Objects.requireNonNull(cell, "cell");
        Objects.requireNonNull(supply, "supply");
        Objects.requireNonNull(run, "run");
        speciesOverrides = List.copyOf(speciesOverrides);
        reactionOverrides = List.copyOf(reactionOverrides);
        deposit = deposit == null ? DepositSettings.defaults() : deposit;
    }

    /** A scenario with the default deposit settings. */
    public Scenario(String title, String notes, Electrolyte electrolyte, Electrode cathode, Electrode anode,
                    CellSetup cell, PowerSupply supply, RunSettings run, List<SpeciesOverride> speciesOverrides,
                    List<ReactionOverride> reactionOverrides) {
        this(title, notes, electrolyte, cathode, anode, cell, supply, run, speciesOverrides, reactionOverrides,
                DepositSettings.defaults());
    }

    /** @return a copy with another electrolyte */
    public Scenario withElectrolyte(Electrolyte e) {
        return new Scenario(title, notes, e, cathode, anode, cell, supply, run, speciesOverrides, reactionOverrides,
                deposit);
    }

    /** @return a copy with another cell setup */
    public Scenario withCell(CellSetup c) {
        return new Scenario(title, notes, electrolyte, cathode, anode, c, supply, run, speciesOverrides,
                reactionOverrides, deposit);
    }

    /** @return a copy with another supply */
    public Scenario withSupply(PowerSupply s) {
        return new Scenario(title, notes, electrolyte, cathode, anode, cell, s, run, speciesOverrides,
                reactionOverrides, deposit);
    }

    /** @return a copy with other run settings */
    public Scenario withRun(RunSettings r) {
        return new Scenario(title, notes, electrolyte, cathode, anode, cell, supply, r, speciesOverrides,
                reactionOverrides, deposit);
    }

    /** @return a copy with other electrodes */
    public Scenario withElectrodes(Electrode newCathode, Electrode newAnode) {
        return new Scenario(title, notes, electrolyte, newCathode, newAnode, cell, supply, run, speciesOverrides,
                reactionOverrides, deposit);
    }

    /** @return a copy with other deposit settings */
    public Scenario withDeposit(DepositSettings d) {
        return new Scenario(title, notes, electrolyte, cathode, anode, cell, supply, run, speciesOverrides,
                reactionOverrides, d);
    }
}
