package org.cellwright.io;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * Densities of the commercial grades of the make-up acids at 20 C, so that a feed may give an acid by volume
 * and mass fraction alone. Source: CRC Handbook of Chemistry and Physics, "Concentrative properties of
 * aqueous solutions", 20 C (from memory; HCl 37 % interpolated between 36 and 38 %). A bottle's label or
 * safety data sheet gives its own density: write it as {@code density} when it differs.
 */
final class AcidGrades {

    /** Acid to (mass fraction to density, kg/m3). */
    private static final Map<String, Map<Double, Double>> GRADES = Map.of(
            "HCl", Map.of(0.30, 1149.0, 0.32, 1159.0, 0.36, 1179.0, 0.37, 1184.0),
            "H2SO4", Map.of(0.96, 1835.5, 0.98, 1836.1),
            "HNO3", Map.of(0.65, 1391.0, 0.68, 1405.0, 0.70, 1413.0));

    private AcidGrades() {
    }

    /**
     * @param acid the acid's formula
     * @param massFraction its mass fraction, 0-1
     * @return the grade's density (kg/m3), if listed (matched to 0.1 %)
     */
    static Optional<Double> densityKgPerM3(String acid, double massFraction) {
        return GRADES.getOrDefault(acid, Map.of()).entrySet().stream()
                .filter(e -> Math.abs(e.getKey() - massFraction) < 1e-3).map(Map.Entry::getValue).findFirst();
    }

    /** @return the listed grades of an acid, for messages ("30 %, 32 %, 36 %, 37 %") */
    static String grades(String acid) {
        List<Double> w = GRADES.getOrDefault(acid, Map.of()).keySet().stream().sorted().toList();
        return w.isEmpty() ? "none" : w.stream().map(x -> QuantityFormat.number(100 * x, 3) + " %")
                .collect(Collectors.joining(", "));
    }
}
