package org.cellwright.sim;

/** The two electrodes of the cell. */
public enum Electrodes {
    /** The negative electrode, where reduction runs. */
    CATHODE("cathode"),
    /** The positive electrode, where oxidation runs. */
    ANODE("anode");

    private final String key;

    Electrodes(String key) {
        this.key = key;
    }

    /** @return the lower-case name used in labels and columns */
    public String key() {
        return key;
    }
}
