package org.cellwright.ui;

/** How a scenario sets its supply; each is one key of the file's [supply] table. */
enum SupplyKind {
    /** A constant current ("current"). */
    CURRENT("current", "Current"),
    /** A constant current density times the cathode area ("current_density"). */
    CURRENT_DENSITY("current_density", "Current density"),
    /** A constant voltage ("voltage"). */
    VOLTAGE("voltage", "Voltage"),
    /** A schedule of set points over time, kept as the file gives it ("schedule"). */
    SCHEDULE("schedule", "Schedule (from the file)");

    private final String key;
    private final String label;

    SupplyKind(String key, String label) {
        this.key = key;
        this.label = label;
    }

    /** @return the key under [supply] */
    String key() {
        return key;
    }

    @Override
    public String toString() {
        return label;
    }

    /**
     * @param key a key under [supply]
     * @return the kind it sets, or null when it sets none
     */
    static SupplyKind ofKey(String key) {
        for (SupplyKind k : values()) {
            if (k.key.equals(key)) {
                return k;
            }
        }
        return null;
    }
}
