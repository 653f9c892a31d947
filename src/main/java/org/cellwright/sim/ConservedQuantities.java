package org.cellwright.sim;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.chem.Species;

/**
 * The linear invariants of the rates: the atoms of each element (bath, or catholyte and anolyte, deposits,
 * gases, less the soluble anode's metal) and the charge balance of each electrode (partial charges add up to
 * the charge passed, less what passed through a short).
 *
 * <p>The rates conserve each exactly ({@code w . f = 0}), and a Rosenbrock method keeps a linear invariant
 * if its Jacobian does too ({@code w . J = 0}). A Jacobian formed by differences carries round-off divided by
 * the difference increment in every row, which breaks this at the 1e-8 level; projecting its columns onto
 * the complement of the invariants restores it to round-off (Hairer, Lubich &amp; Wanner, Geometric Numerical
 * Integration, 2nd ed. 2006, section IV.1: linear invariants and Runge-Kutta/Rosenbrock methods). H and O are
 * left out: water, the solvent, is not part of the state, and their balance is not linear in it when water's
 * ion product ties H+ and OH-.
 *
 * <p>The charge through a short stays exactly zero until a dendrite bridges the gap: its rate is 0 and its
 * Jacobian row is 0, so a Rosenbrock step leaves it at 0. Projecting onto the electrode balances, which
 * contain it, would write round-off of the total-charge row into that row (8.6e-14 C over a run that passes
 * almost no charge). Before the short it is therefore left out of the balances, which then still hold (its
 * rate is zero), and the projection never touches its row; after the short the full balances apply.
 */
final class ConservedQuantities {

    /** Balances for the open cell: the short-circuit charge left out. */
    private final double[][] openBasis;
    /** Balances for the shorted cell. */
    private final double[][] shortedBasis;

    ConservedQuantities(ReactionNetwork net, StateLayout layout, double catholyteM3, double anolyteM3) {
        List<double[]> vectors = new ArrayList<>();
        Map<String, double[]> elements = new LinkedHashMap<>();
        List<Species> species = net.species();
        for (int j = 0; j < species.size(); j++) {
            for (var e : species.get(j).elements().entrySet()) {
                double[] w = elements.computeIfAbsent(e.getKey(), k -> new double[layout.size]);
                w[j] += e.getValue() * catholyteM3;
                if (layout.twoCompartments) {
                    w[layout.anolyte0 + j] += e.getValue() * anolyteM3;
                }
            }
        }
        for (int m = 0; m < layout.metals; m++) {
            String symbol = net.depositMetals().get(m).symbol();
            elements.computeIfAbsent(symbol, k -> new double[layout.size])[layout.deposit0 + m] += 1;
        }
        if (net.anodeMetal != null) {
            elements.computeIfAbsent(net.anodeMetal.symbol(), k -> new double[layout.size])[layout.anodeDissolved] -= 1;
        }
        String[] gasElement = {"H", "O", "Cl"};
        for (int g = 0; g < gasElement.length; g++) {
            elements.computeIfAbsent(gasElement[g], k -> new double[layout.size])[layout.gas0 + g] += 2;
        }
        for (var e : elements.entrySet()) {
            boolean waterElement = e.getKey().equals("H") || e.getKey().equals("O");
            if (!waterElement) {
                vectors.add(e.getValue());
            }
        }
        int nc = net.cathodeSlots.size();
        double[] cathode = new double[layout.size];
        double[] anode = new double[layout.size];
        cathode[layout.charge] = 1;
        anode[layout.charge] = -1;
        cathode[layout.shortCharge] = -1;
        anode[layout.shortCharge] = 1;
        for (int k = 0; k < layout.slots; k++) {
            (k < nc ? cathode : anode)[layout.reactionCharge0 + k] = 1;
        }
        List<double[]> shorted = new ArrayList<>(vectors);
        shorted.add(cathode);
        shorted.add(anode);
        shortedBasis = orthonormal(shorted);
        double[] openCathode = cathode.clone();
        double[] openAnode = anode.clone();
        openCathode[layout.shortCharge] = 0;
        openAnode[layout.shortCharge] = 0;
        vectors.add(openCathode);
        vectors.add(openAnode);
        openBasis = orthonormal(vectors);
    }

    /** Modified Gram-Schmidt; vectors that depend on earlier ones are dropped. */
    private static double[][] orthonormal(List<double[]> vectors) {
        List<double[]> out = new ArrayList<>();
        for (double[] v : vectors) {
            double[] w = v.clone();
            double norm0 = Math.sqrt(dot(w, w));
            for (double[] q : out) {
                double p = dot(q, w);
                for (int i = 0; i < w.length; i++) {
                    w[i] -= p * q[i];
                }
            }
            double norm = Math.sqrt(dot(w, w));
            if (norm > 1e-10 * norm0 && norm > 0) {
                for (int i = 0; i < w.length; i++) {
                    w[i] /= norm;
                }
                out.add(w);
            }
        }
        return out.toArray(new double[0][]);
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    /**
     * Removes from every column of {@code jacobian} its components along the invariants.
     *
     * @param jacobian the matrix, changed in place
     * @param shorted true once a dendrite has shorted the cell (at the time the Jacobian was formed)
     */
    void project(double[][] jacobian, boolean shorted) {
        int n = jacobian.length;
        for (double[] q : shorted ? shortedBasis : openBasis) {
            for (int j = 0; j < n; j++) {
                double p = 0;
                for (int i = 0; i < n; i++) {
                    p += q[i] * jacobian[i][j];
                }
                if (p != 0) {
                    for (int i = 0; i < n; i++) {
                        jacobian[i][j] -= p * q[i];
                    }
                }
            }
        }
    }
}
