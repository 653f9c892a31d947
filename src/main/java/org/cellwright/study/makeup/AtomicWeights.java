package org.cellwright.study.makeup;

import java.util.Map;

/**
 * Standard atomic weights of the elements a bath make-up uses (g/mol): IUPAC (CIAAW) abridged standard
 * atomic weights, 2021, the values the chemistry library's molar masses are summed from; for the elements
 * with an interval (H, C, N, O, S, Cl) the abridged conventional value.
 */
public final class AtomicWeights {

    private static final Map<String, Double> G_PER_MOL = Map.ofEntries(
            Map.entry("H", 1.008), Map.entry("C", 12.011), Map.entry("N", 14.007), Map.entry("O", 15.999),
            Map.entry("Na", 22.990), Map.entry("S", 32.06), Map.entry("Cl", 35.45), Map.entry("K", 39.098),
            Map.entry("Fe", 55.845), Map.entry("Ni", 58.693), Map.entry("Cu", 63.546), Map.entry("Zn", 65.38),
            Map.entry("Ag", 107.87), Map.entry("Sn", 118.71), Map.entry("Pb", 207.2));

    private AtomicWeights() {
    }

    /**
     * @param element an element symbol
     * @return its molar mass (kg/mol)
     * @throws IllegalArgumentException for an element not in the table
     */
    public static double kgPerMol(String element) {
        Double g = G_PER_MOL.get(element);
        if (g == null) {
            throw new IllegalArgumentException("no atomic weight for element '" + element + "'");
        }
        return g * 1e-3;
    }

    /**
     * @param elements atoms per formula unit
     * @return the formula's molar mass (kg/mol)
     */
    public static double kgPerMol(Map<String, Integer> elements) {
        double sum = 0;
        for (Map.Entry<String, Integer> e : elements.entrySet()) {
            sum += kgPerMol(e.getKey()) * e.getValue();
        }
        return sum;
    }
}
