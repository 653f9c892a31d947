package org.cellwright.sim.deposit;

/**
 * The form a cathode deposit takes, in the four classes of the run summary ({@code morphology_final}) and
 * the time series ({@code morphology}).
 */
public enum DepositForm {
    /** Coherent, fine to medium grain: what a refinery or a plater wants. */
    COMPACT("compact"),
    /** Nodular, coarse or isolated crystals, edge roughness: still adherent, traps electrolyte. */
    ROUGH("rough"),
    /** Dendrites and ramified, poorly adherent crystals that grow toward the anode. */
    DENDRITIC("dendritic"),
    /** Powder or sponge at and beyond the limiting current, with hydrogen; falls off and redissolves. */
    POWDERY("powdery");

    private final String key;

    DepositForm(String key) {
        this.key = key;
    }

    /** @return the contract's name ("compact", "rough", "dendritic", "powdery") */
    public String key() {
        return key;
    }
}
