package org.cellwright.chem;

import java.util.LinkedHashMap;
import java.util.Map;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The free-ion composition of an electrolyte after the two sulfate equilibria that dominate the conductivity
 * of metal-sulfate and sulfuric-acid baths, and its ionic strength.
 *
 * <ul>
 *   <li>Bisulfate: {@code HSO4- = H+ + SO4^2-}, effective constant
 *       {@code log K2 = min(log K2° + 4 A sqrt(I) / (1 + sqrt(I)) + b I, -0.5)}, with {@code K2° = 10^-1.99}
 *       (CRC Handbook, "Dissociation constants of inorganic acids and bases", H2SO4 second step at 25 C, from
 *       memory), A = 0.509 (L/mol)^1/2 (Debye-Hückel constant of water at 25 C; Robinson &amp; Stokes,
 *       Electrolyte Solutions, 2nd ed. 1959, from memory) and b = 1.5 L/mol fitted to the CRC conductivities of
 *       sulfuric acid (docs/conductivity.md). K2 rises from 0.010 at infinite dilution to its cap 0.32 at
 *       I of about 0.6 mol/L; the cap is of the order of the stoichiometric constants that Raman studies of
 *       concentrated sulfuric acid give (from memory). It is an <em>effective</em> constant: fitted to
 *       conductivity, not to spectra.</li>
 *   <li>Ion pairs of every divalent cation with sulfate, {@code M2+ + SO4^2- = MSO4(aq)}, with
 *       {@code log K = 2.36 - 8 A sqrt(I) / (1 + sqrt(I))} (CuSO4 association constant; Smith &amp; Martell,
 *       Critical Stability Constants, from memory; the first-row divalent sulfates lie at 2.2-2.4).</li>
 * </ul>
 * Other complexes (chloro-complexes of Sn(II), Cu(I), Fe(III)) are not taken into account.
 *
 * @param free free concentrations (mol/m3) of the species, by canonical name; ion pairs are left out
 * @param pairedMolPerM3 concentration of neutral MSO4 ion pairs (mol/m3), all metals together
 * @param ionicStrengthMolPerL ionic strength of the free ions (mol/L)
 */
public record ElectrolyteSpeciation(Map<String, Double> free, double pairedMolPerM3, double ionicStrengthMolPerL) {

    static final String HYDROGEN = "H+";
    static final String BISULFATE = "HSO4-";
    static final String SULFATE = "SO4^2-";
    /** Debye-Hückel A of water at 25 C, (L/mol)^1/2, natural-log form divided by ln 10. */
    static final double DEBYE_HUCKEL_A = 0.509;
    static final double LOG_K2_STANDARD = -1.99;
    static final double K2_IONIC_STRENGTH_SLOPE = 1.5;
    static final double LOG_K2_CAP = -0.5;
    static final double LOG_K_PAIR_STANDARD = 2.36;

    public ElectrolyteSpeciation {
        free = Map.copyOf(free);
    }

    /**
     * Speciates a composition given as totals: H+ and HSO4- count toward total acid hydrogen, SO4^2- and
     * HSO4- toward total sulfate; the result redistributes them.
     *
     * @param library where the charges come from
     * @param molPerM3 concentrations by species name (any accepted notation), mol/m3, >= 0
     * @return the free-ion composition
     */
    public static ElectrolyteSpeciation of(ChemLibrary library, Map<String, Double> molPerM3) {
        Map<String, Double> total = new LinkedHashMap<>();
        Map<String, Integer> charge = new LinkedHashMap<>();
        molPerM3.forEach((name, c) -> {
            Species s = library.findSpecies(name).orElseThrow(() ->
                    new IllegalArgumentException("unknown species '" + name + "' in the composition"));
            if (!(c >= 0) || !Double.isFinite(c)) {
                throw new IllegalArgumentException(name + ": concentration must be finite and >= 0, got " + c);
            }
            total.merge(s.name(), c / 1000.0, Double::sum);
            charge.put(s.name(), s.charge());
        });
        double hydrogen = total.getOrDefault(HYDROGEN, 0.0) + total.getOrDefault(BISULFATE, 0.0);
        double sulfate = total.getOrDefault(SULFATE, 0.0) + total.getOrDefault(BISULFATE, 0.0);
        boolean sulfateKnown = library.findSpecies(SULFATE).isPresent();
        boolean bisulfateKnown = library.findSpecies(BISULFATE).isPresent();
        Map<String, Double> freeMolPerL = new LinkedHashMap<>(total);
        double paired = 0;
        double ionic = ionicStrength(freeMolPerL, charge);
        if (sulfate > 0 && sulfateKnown) {
            charge.put(SULFATE, -2);
            charge.put(HYDROGEN, 1);
            charge.put(BISULFATE, -1);
            for (int iteration = 0; iteration < 200; iteration++) {
                double k2 = bisulfateKnown ? bisulfateConstant(ionic) : Double.POSITIVE_INFINITY;
                double kPair = pairConstant(ionic);
                double freeSulfate = solveFreeSulfate(sulfate, hydrogen, k2, kPair, total, charge);
                double bisulfate = Double.isInfinite(k2) ? 0 : hydrogen * freeSulfate / (k2 + freeSulfate);
                paired = 0;
                for (var e : total.entrySet()) {
                    if (charge.get(e.getKey()) == 2) {
                        double pair = e.getValue() * kPair * freeSulfate / (1 + kPair * freeSulfate);
                        freeMolPerL.put(e.getKey(), e.getValue() - pair);
                        paired += pair;
                    }
                }
                freeMolPerL.put(SULFATE, freeSulfate);
                if (hydrogen > 0 || total.containsKey(HYDROGEN)) {
                    freeMolPerL.put(HYDROGEN, hydrogen - bisulfate);
                }
                if (bisulfateKnown) {
                    freeMolPerL.put(BISULFATE, bisulfate);
                }
                double next = ionicStrength(freeMolPerL, charge);
                boolean converged = Math.abs(next - ionic) <= 1e-12 * (1 + ionic);
                ionic = 0.5 * (ionic + next);
                if (converged) {
                    break;
                }
            }
        }
        Map<String, Double> free = new LinkedHashMap<>();
        freeMolPerL.forEach((k, v) -> free.put(k, Math.max(0, v) * 1000.0));
        return new ElectrolyteSpeciation(free, paired * 1000.0, ionic);
    }

    /** @return the effective bisulfate dissociation constant (mol/L) at ionic strength {@code ionic} (mol/L) */
    public static double bisulfateConstant(double ionic) {
        double s = Math.sqrt(ionic);
        double log = LOG_K2_STANDARD + 4 * DEBYE_HUCKEL_A * s / (1 + s) + K2_IONIC_STRENGTH_SLOPE * ionic;
        return Math.pow(10, Math.min(LOG_K2_CAP, log));
    }

    /** @return the association constant (L/mol) of a divalent metal-sulfate ion pair at ionic strength (mol/L) */
    public static double pairConstant(double ionic) {
        double s = Math.sqrt(ionic);
        return Math.pow(10, LOG_K_PAIR_STANDARD - 8 * DEBYE_HUCKEL_A * s / (1 + s));
    }

    private static double solveFreeSulfate(double sulfate, double hydrogen, double k2, double kPair,
                                           Map<String, Double> total, Map<String, Integer> charge) {
        double divalent = 0;
        for (var e : total.entrySet()) {
            if (charge.get(e.getKey()) == 2) {
                divalent += e.getValue();
            }
        }
        double metals = divalent;
        // total sulfate = free + bisulfate + ion pairs, increasing in the free sulfate s
        org.apache.commons.math3.analysis.UnivariateFunction balance = s -> s
                + (Double.isInfinite(k2) ? 0 : hydrogen * s / (k2 + s))
                + metals * kPair * s / (1 + kPair * s) - sulfate;
        if (balance.value(sulfate) <= 0) {
            return sulfate;
        }
        return new BrentSolver(1e-15, 1e-13).solve(500, balance, 0, sulfate);
    }

    private static double ionicStrength(Map<String, Double> molPerL, Map<String, Integer> charge) {
        double sum = 0;
        for (var e : molPerL.entrySet()) {
            int z = charge.getOrDefault(e.getKey(), 0);
            sum += Math.max(0, e.getValue()) * z * z;
        }
        return 0.5 * sum;
    }
}
