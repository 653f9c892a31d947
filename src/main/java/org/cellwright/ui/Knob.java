package org.cellwright.ui;

/** The five what-if sliders beside the charts. */
enum Knob {
    /** The supply's set value: current density, current or voltage, as the scenario gives it. */
    SUPPLY("Supply"),
    /** Anode-cathode gap. */
    GAP("Gap"),
    /** Start concentration of one chosen species. */
    CONCENTRATION("Concentration"),
    /** Start temperature of the bath. */
    TEMPERATURE("Bath temperature"),
    /** Agitation, as the steady diffusion-layer thickness (thinner is more vigorous). */
    AGITATION("Agitation");

    private final String label;

    Knob(String label) {
        this.label = label;
    }

    /** @return the slider's caption */
    String label() {
        return label;
    }
}
