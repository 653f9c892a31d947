package org.cellwright.sim;

import org.cellwright.chem.ElectrodeReaction;

/** Names electrode reactions the way a cell operator says them ("hydrogen", "depositing Sn"). */
public final class PlainWords {

    private PlainWords() {
    }

    /**
     * @param r a reaction
     * @param cathodic true for the reduction direction
     * @return what the reaction does, in plain words
     */
    static String of(ElectrodeReaction r, boolean cathodic) {
        return of(r.name(), cathodic);
    }

    /**
     * @param couple the couple, "Ox/Red"
     * @param cathodic true when it runs as a reduction
     * @return plain words ("hydrogen", "depositing Cu", "oxidising Sn2+ to Sn4+")
     */
    public static String of(String couple, boolean cathodic) {
        switch (couple) {
            case "H+/H2", "H2O/H2":
                return "hydrogen";
            case "O2/H2O":
                return "oxygen";
            case "Cl2/Cl-":
                return "chlorine gas";
            case "Cl2(aq)/Cl-":
                return cathodic ? "reducing dissolved chlorine" : "dissolved chlorine";
            default:
                break;
        }
        String[] sides = couple.split("/", 2);
        if (sides.length < 2) {
            return couple;
        }
        boolean metal = !sides[1].endsWith("+") && !sides[1].endsWith("-");
        if (metal) {
            return cathodic ? "depositing " + sides[1] : "dissolving the " + sides[1] + " anode";
        }
        return cathodic ? "reducing " + sides[0] + " to " + sides[1] : "oxidising " + sides[1] + " to " + sides[0];
    }
}
