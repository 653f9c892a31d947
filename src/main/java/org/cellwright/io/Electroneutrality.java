package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Checks that a bath composition is close to electroneutral: {@code |sum z c| <= 10 % of sum |z| c}.
 *
 * <p>A written composition rarely balances exactly (activity, complexes, species left out), so a small
 * mismatch is normal; the engine does not need balance. A large one usually means a counter-ion was
 * forgotten, which makes the computed conductivity and the potentials wrong. The 10 % threshold is our
 * own choice (common practice for a sanity check of a bath analysis).
 */
final class Electroneutrality {

    /** Largest accepted |sum z c| relative to sum |z| c. */
    static final double TOLERANCE = 0.10;

    private Electroneutrality() {
    }

    /**
     * @param compositionMolPerM3 canonical species to concentration (mol/m3)
     * @param species charges and names
     * @return a warning message when the composition is badly unbalanced
     */
    static Optional<String> check(Map<String, Double> compositionMolPerM3, SpeciesResolver species) {
        double net = 0;
        double total = 0;
        for (var e : compositionMolPerM3.entrySet()) {
            int z = species.charge(e.getKey());
            net += z * e.getValue();
            total += Math.abs(z) * e.getValue();
        }
        if (total <= 0 || Math.abs(net) <= TOLERANCE * total) {
            return Optional.empty();
        }
        boolean cationExcess = net > 0;
        List<String> counterIons = counterIons(compositionMolPerM3, species, cationExcess);
        List<String> advice = new ArrayList<>();
        for (String ion : counterIons) {
            double amountMolPerL = Math.abs(net) / Math.abs(species.charge(ion)) / 1000;
            advice.add(String.format(Locale.ROOT, "%.3g mol/L %s", amountMolPerL, ion));
        }
        return Optional.of(String.format(Locale.ROOT,
                "the composition is not electroneutral: the ions carry a net %s charge of %.3g mol/L "
                        + "(%.0f %% of the total ionic charge); add %s, e.g. %s",
                cationExcess ? "positive" : "negative", Math.abs(net) / 1000, 100 * Math.abs(net) / total,
                cationExcess ? "anions" : "cations", String.join(" or ", advice)));
    }

    /** The ions that would balance: those of the needed sign already in the bath, then common ones. */
    private static List<String> counterIons(Map<String, Double> composition, SpeciesResolver species,
                                            boolean needAnions) {
        List<String> out = new ArrayList<>();
        composition.entrySet().stream()
                .filter(e -> needAnions ? species.charge(e.getKey()) < 0 : species.charge(e.getKey()) > 0)
                .sorted((a, b) -> Double.compare(b.getValue(), a.getValue()))
                .forEach(e -> out.add(e.getKey()));
        List<String> common = needAnions ? List.of("Cl-", "SO4^2-", "NO3-") : List.of("H+", "Na+");
        for (String c : common) {
            species.canonical(c).filter(n -> !out.contains(n)).ifPresent(out::add);
        }
        return out.subList(0, Math.min(2, out.size()));
    }
}
