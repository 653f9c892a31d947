package org.cellwright.sim;

import java.util.List;

import org.cellwright.chem.Kinetics;
import org.cellwright.chem.PhysicalConstants;

/**
 * The reactions of one electrode at one instant: Butler-Volmer kinetics combined with Nernst-layer mass
 * transfer, and the electrode potential at which their currents add up to a given current density.
 *
 * <p>For each reaction k with overpotential {@code eta = E - Eeq} (Nernst at the bulk composition):
 * <pre>
 *   i_a = i0 exp( alpha_a F eta / RT),  i_c = i0 exp(-alpha_c F eta / RT)
 *   i0  = i0_ref a_O^(1-beta) a_R^beta,  beta = alpha_c / (alpha_a + alpha_c)
 *   i   = (i_a - i_c) / (1 + i_a / iL_a + i_c / iL_c),  iL = n F km c / nu
 * </pre>
 * (Bard &amp; Faulkner, <i>Electrochemical Methods</i>, 2nd ed., eqs. 3.4.10 and 1.4.x, first-order kinetics
 * with a linear diffusion layer). Exponentials are formed in log space so that no depleted species gives
 * NaN; a missing direction (gas or solid absent) has a zero branch. On the cathode, kinetics are a mix of
 * the substrate's and the deposit's by the fraction of the surface the deposit covers. Anodic current
 * densities are positive.
 *
 * <p>Not thread-safe: one instance per running simulation.
 */
final class ElectrodeKinetics {

    /** Cap on exponents (e^200 ~ 7e86 A/m2): far beyond any current, far below overflow. */
    private static final double MAX_EXP = 200;
    /** Smallest activity used in logarithms (relative to 1 mol/L). */
    static final double MIN_ACTIVITY = 1e-30;
    /** Smallest concentration used in limiting currents (mol/m3), so that no ratio is 0/0. */
    static final double MIN_CONCENTRATION = 1e-27;

    private final List<ReactionSlot> slots;
    private final int count;
    final double[] lnKa1;
    final double[] lnKc1;
    final double[] lnKa2;
    final double[] lnKc2;
    final double[] aA1;
    final double[] aC1;
    final double[] aA2;
    final double[] aC2;
    final double[] w2;
    final double[] invIlA;
    final double[] invIlC;
    final double[] eEq;
    private double f;
    private double hint;
    private final double[] scratch = new double[1];
    private final double[] derivative = new double[1];

    ElectrodeKinetics(List<ReactionSlot> slots, double initialGuessV) {
        this.slots = slots;
        this.count = slots.size();
        lnKa1 = new double[count];
        lnKc1 = new double[count];
        lnKa2 = new double[count];
        lnKc2 = new double[count];
        aA1 = new double[count];
        aC1 = new double[count];
        aA2 = new double[count];
        aC2 = new double[count];
        w2 = new double[count];
        invIlA = new double[count];
        invIlC = new double[count];
        eEq = new double[count];
        hint = initialGuessV;
    }

    /** @return the reactions of this electrode */
    List<ReactionSlot> slots() {
        return slots;
    }

    /**
     * Prepares the constants of every reaction for the present composition.
     *
     * @param c bulk concentrations (mol/m3), non-negative, for the limiting currents
     * @param free the concentrations that set activities (mol/m3): the free ions (H+ after the bisulfate
     *     equilibrium)
     * @param km mass-transfer coefficient of each species (m/s)
     * @param tempK temperature (K)
     * @param coverage fraction of the surface covered by the deposit (0..1), cathode only
     */
    void prepare(double[] c, double[] free, double[] km, double tempK, double coverage) {
        f = PhysicalConstants.FARADAY / (PhysicalConstants.GAS_CONSTANT * tempK);
        for (int k = 0; k < count; k++) {
            ReactionSlot s = slots.get(k);
            double lnAo = 0;
            double lnAr = 0;
            double nF = s.n() * PhysicalConstants.FARADAY;
            double ilC = Double.POSITIVE_INFINITY;
            double ilA = Double.POSITIVE_INFINITY;
            for (int j = 0; j < s.oxIndex().length; j++) {
                int idx = s.oxIndex()[j];
                lnAo += s.oxNu()[j] * Math.log(Math.max(free[idx] * 1e-3, MIN_ACTIVITY));
                ilC = Math.min(ilC, nF * km[idx] * Math.max(c[idx], MIN_CONCENTRATION) / s.oxNu()[j]);
            }
            for (int j = 0; j < s.redIndex().length; j++) {
                int idx = s.redIndex()[j];
                lnAr += s.redNu()[j] * Math.log(Math.max(free[idx] * 1e-3, MIN_ACTIVITY));
                ilA = Math.min(ilA, nF * km[idx] * Math.max(c[idx], MIN_CONCENTRATION) / s.redNu()[j]);
            }
            double e = s.reaction().e0At(tempK) + (lnAo - lnAr) / (s.n() * f);
            eEq[k] = e;
            invIlA[k] = 1 / ilA;
            invIlC[k] = 1 / ilC;
            Kinetics k1 = s.substrateKinetics();
            Kinetics k2 = s.depositKinetics();
            double theta = (k2 == null || k2.equals(k1)) ? 0 : coverage;
            setBranch(k, k1, lnAo, lnAr, e, 1 - theta, true, s);
            w2[k] = theta;
            if (theta > 0) {
                setBranch(k, k2, lnAo, lnAr, e, theta, false, s);
            }
        }
    }

    private void setBranch(int k, Kinetics kin, double lnAo, double lnAr, double e, double weight, boolean first,
                           ReactionSlot s) {
        double beta = kin.alphaC() / (kin.alphaA() + kin.alphaC());
        double lnI0 = Math.log(kin.i0APerM2()) + (1 - beta) * lnAo + beta * lnAr + Math.log(Math.max(weight, 1e-300));
        double lnKa = s.anodicAllowed() ? lnI0 - kin.alphaA() * f * e : Double.NEGATIVE_INFINITY;
        double lnKc = s.cathodicAllowed() ? lnI0 + kin.alphaC() * f * e : Double.NEGATIVE_INFINITY;
        if (weight <= 0) {
            lnKa = Double.NEGATIVE_INFINITY;
            lnKc = Double.NEGATIVE_INFINITY;
        }
        if (first) {
            lnKa1[k] = lnKa;
            lnKc1[k] = lnKc;
            aA1[k] = kin.alphaA() * f;
            aC1[k] = kin.alphaC() * f;
        } else {
            lnKa2[k] = lnKa;
            lnKc2[k] = lnKc;
            aA2[k] = kin.alphaA() * f;
            aC2[k] = kin.alphaC() * f;
        }
    }

    private static double branch(double lnK, double slope, double e) {
        if (lnK == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        return Math.exp(Math.min(lnK + slope * e, MAX_EXP));
    }

    /**
     * Current density of one reaction (A/m2, anodic positive) at potential {@code e}, and its derivative.
     *
     * @param k reaction index
     * @param e electrode potential (V vs SHE)
     * @param deriv if not null, receives di/dE at index 0 (A/m2/V)
     * @return the current density (A/m2)
     */
    double current(int k, double e, double[] deriv) {
        double ia = branch(lnKa1[k], aA1[k], e);
        double ic = branch(lnKc1[k], -aC1[k], e);
        double dia = aA1[k] * ia;
        double dic = -aC1[k] * ic;
        if (w2[k] > 0) {
            double ia2 = branch(lnKa2[k], aA2[k], e);
            double ic2 = branch(lnKc2[k], -aC2[k], e);
            ia += ia2;
            ic += ic2;
            dia += aA2[k] * ia2;
            dic += -aC2[k] * ic2;
        }
        double den = 1 + ia * invIlA[k] + ic * invIlC[k];
        double num = ia - ic;
        if (deriv != null) {
            double dNum = dia - dic;
            double dDen = dia * invIlA[k] + dic * invIlC[k];
            deriv[0] = (dNum * den - num * dDen) / (den * den);
        }
        return num / den;
    }

    /**
     * The electrode potential at which the reactions carry the current density {@code target}
     * (A/m2, anodic positive). The sum of currents rises monotonically with the potential, so it has one root:
     * Newton steps from the last solution, kept inside the bracket that the evaluated points establish, with
     * bisection when a step would leave it and widening steps of up to 0.3 V until both sides are known
     * (Press et al., Numerical Recipes, 3rd ed. 2007, section 9.4, "rtsafe").
     *
     * @param target net current density (A/m2)
     * @return the potential (V vs SHE), at which the currents match the target to 1e-13 relative
     */
    double potentialFor(double target) {
        double e = hint;
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        double widen = 0.05;
        double tolerance = 1e-13 * Math.max(Math.abs(target), 1e-3);
        for (int it = 0; it < 400; it++) {
            double fe = total(e, scratch) - target;
            double slope = scratch[0];
            if (Math.abs(fe) <= tolerance) {
                break;
            }
            if (fe > 0) {
                hi = e;
            } else if (fe < 0) {
                lo = e;
            } else {
                break;
            }
            double next = slope > 0 ? e - fe / slope : Double.NaN;
            boolean bracketed = lo > Double.NEGATIVE_INFINITY && hi < Double.POSITIVE_INFINITY;
            if (bracketed) {
                if (!(next > lo && next < hi)) {
                    next = 0.5 * (lo + hi);
                }
                if (hi - lo < 1e-15 * Math.max(1, Math.abs(e))) {
                    break;
                }
            } else if (!Double.isFinite(next) || Math.abs(next - e) > widen) {
                next = e + (fe > 0 ? -widen : widen);
                widen = Math.min(widen * 2, 0.3);
            }
            if (Math.abs(next) > 50) {
                throw new IllegalStateException("no reaction at the " + slots.get(0).electrode().key()
                        + " can carry " + target + " A/m2");
            }
            e = next;
        }
        hint = e;
        return e;
    }

    /** @return the sum of the reaction current densities at {@code e} (A/m2), derivative in {@code d[0]} */
    double total(double e, double[] d) {
        double sum = 0;
        double dsum = 0;
        double[] dk = d == null ? null : derivative;
        for (int k = 0; k < count; k++) {
            sum += current(k, e, dk);
            if (dk != null) {
                dsum += dk[0];
            }
        }
        if (d != null) {
            d[0] = dsum;
        }
        return sum;
    }

    /** Fills {@code out} with each reaction's current density at {@code e} (A/m2). */
    void currents(double e, double[] out) {
        for (int k = 0; k < count; k++) {
            out[k] = current(k, e, null);
        }
    }
}
