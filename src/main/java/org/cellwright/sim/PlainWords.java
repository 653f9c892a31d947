package org.cellwright.sim;

import org.cellwright.chem.ElectrodeReaction;

/** Names electrode reactions the way a cell operator says them ("hydrogen", "depositing Sn"). */
final class PlainWords {

    private PlainWords() {
    }

    /**
     * @param r a reaction
     * @param cathodic true for the reduction direction
     * @return what the reaction does, in plain words
     */
    static String of(ElectrodeReaction r, boolean cathodic) {
        String name = r.name();
        if (name.equals("H+/H2") || name.equals("H2O/H2")) {
            return "hydrogen";
        }
        if (name.equals("O2/H2O")) {
            return "oxygen";
        }
        if (name.equals("Cl2/Cl-")) {
            return "chlorine";
        }
        String[] sides = name.split("/", 2);
        if (r.depositedMetal().isPresent()) {
            return cathodic ? "depositing " + sides[1] : "dissolving the " + sides[1] + " anode";
        }
        if (sides.length == 2) {
            return cathodic ? "reducing " + sides[0] + " to " + sides[1] : "oxidising " + sides[1] + " to " + sides[0];
        }
        return name;
    }
}
