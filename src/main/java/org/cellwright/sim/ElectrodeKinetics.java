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
 *   i   = (i_a' - i_c') / (1 + i_a' / iL_a + i_c' / iL_c),  i_a' = i_a / (1 + X_R),  i_c' = i_c / (1 + X_O)
 * </pre>
 * with {@code iL = n F km c / nu} of the limiting dissolved species on each side, and {@code X_j} the share of
 * species j's mass-transfer flux that the other reactions' branches draw ({@code sum of i_branch / iL}). For
 * one reaction ({@code X = 0}) this is {@code (i_a - i_c) / (1 + i_a / iL_a + i_c / iL_c)} (Bard &amp;
 * Faulkner, <i>Electrochemical Methods</i>, 2nd ed., eqs. 3.4.10 and 1.4.x, first-order kinetics with a linear
 * diffusion layer). When several branches draw on the same species (Cu2+ to Cu and to Cu+; Cu+ made by one
 * and taken by the next) they share its one flux to the electrode: the expression is the exact solution of
 * the surface balances of O and R when the other consumers are first order in them, so the flux is never
 * counted twice and their total never exceeds {@code km c}. Exponentials are formed in log space so that no depleted species gives NaN; a missing
 * direction (gas or solid absent) has a zero branch. On the cathode, kinetics are a mix of the substrate's
 * and the deposit's by the fraction of the surface the deposit covers, and each deposited metal may
 * dissolve again from the share of the surface it covers (mixed-potential corrosion, Wagner &amp; Traud,
 * Z. Elektrochem. 44 (1938) 391): an oxidant whose reduction current exceeds the applied current takes its
 * electrons from the deposit. Anodic current densities are positive.
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
    /**
     * Smallest activity of a dissolved species in the equilibrium potentials the voltage breakdown shows
     * (relative to 1 mol/L): 1e-6, the activity Pourbaix takes as the edge of a species' existence (Pourbaix,
     * Atlas of Electrochemical Equilibria in Aqueous Solutions, 1966, ch. 1). Below it a product absent from
     * the bulk (Sn4+ in a fresh tin bath) would put the Nernst potential volts away and the split would say
     * little; the kinetics keep {@link #MIN_ACTIVITY}.
     */
    static final double SHOWN_MIN_ACTIVITY = 1e-6;

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
    /**
     * Of a metal's deposition at the cathode, the share of the surface its deposit covers (1 for other
     * reactions): the metal dissolves only from there, and above its equilibrium potential nothing deposits
     * on the rest (see {@link #evaluate}).
     */
    private final double[] metalWeight;
    /** Limiting dissolved species of each side of each reaction (state index), or -1. */
    private final int[] limitOx;
    private final int[] limitRed;
    private final double[] ia;
    private final double[] ic;
    private final double[] dia;
    private final double[] dic;
    private final double[] cur;
    private final double[] dcur;
    private final double[] share;
    private final double[] dShare;
    /**
     * Per reaction, whether the deposit has kinetics of its own (a second branch weighted by the coverage):
     * fixed for the run, so the records are compared once here, not in every evaluation of the rates.
     */
    private final boolean[] depositBranch;
    private double f;
    private double[] lastFree;
    private double lastTempK;
    private double hint;
    private final double[] scratch = new double[1];

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
        metalWeight = new double[count];
        limitOx = new int[count];
        limitRed = new int[count];
        ia = new double[count];
        ic = new double[count];

        dia = new double[count];
        dic = new double[count];
        cur = new double[count];
        dcur = new double[count];
        depositBranch = new boolean[count];
        for (int k = 0; k < count; k++) {
            Kinetics k2 = slots.get(k).depositKinetics();
            depositBranch[k] = k2 != null && !k2.equals(slots.get(k).substrateKinetics());
        }
        int species = 0;
        for (ReactionSlot s : slots) {
            for (int j : s.oxIndex()) {
                species = Math.max(species, j + 1);
            }
            for (int j : s.redIndex()) {
                species = Math.max(species, j + 1);
            }
        }
        share = new double[species];
        dShare = new double[species];
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
     * @param metalShare for each deposited metal, the fraction of the surface it covers (0..1), from which
     *     it may dissolve again; null at the anode
     */
    void prepare(double[] c, double[] free, double[] km, double tempK, double coverage, double[] metalShare) {
        f = PhysicalConstants.FARADAY / (PhysicalConstants.GAS_CONSTANT * tempK);
        lastFree = free;
        lastTempK = tempK;
        for (int k = 0; k < count; k++) {
            ReactionSlot s = slots.get(k);
            double lnAo = 0;
            double lnAr = 0;
            double nF = s.n() * PhysicalConstants.FARADAY;
            double ilC = Double.POSITIVE_INFINITY;
            double ilA = Double.POSITIVE_INFINITY;
            limitOx[k] = -1;
            limitRed[k] = -1;
            for (int j = 0; j < s.oxIndex().length; j++) {
                int idx = s.oxIndex()[j];
                lnAo += s.oxNu()[j] * Math.log(Math.max(free[idx] * 1e-3, MIN_ACTIVITY));
                double il = nF * km[idx] * Math.max(c[idx], MIN_CONCENTRATION) / s.oxNu()[j];
                if (il < ilC) {
                    ilC = il;
                    limitOx[k] = idx;
                }
            }
            for (int j = 0; j < s.redIndex().length; j++) {
                int idx = s.redIndex()[j];
                lnAr += s.redNu()[j] * Math.log(Math.max(free[idx] * 1e-3, MIN_ACTIVITY));
                double il = nF * km[idx] * Math.max(c[idx], MIN_CONCENTRATION) / s.redNu()[j];
                if (il < ilA) {
                    ilA = il;
                    limitRed[k] = idx;
                }
            }
            double e = s.reaction().e0At(tempK) + (lnAo - lnAr) / (s.n() * f);
            eEq[k] = e;
            invIlA[k] = 1 / ilA;
            invIlC[k] = 1 / ilC;
            Kinetics k1 = s.substrateKinetics();
            Kinetics k2 = s.depositKinetics();
            double theta = depositBranch[k] ? coverage : 0;
            boolean redissolves = metalShare != null && s.depositMetalIndex() >= 0;
            metalWeight[k] = redissolves ? metalShare[s.depositMetalIndex()] : 1;
            setBranch(k, k1, lnAo, lnAr, e, 1 - theta, 1 - theta, true, s, redissolves);
            w2[k] = theta;
            if (theta > 0) {
                setBranch(k, k2, lnAo, lnAr, e, theta, theta, false, s, redissolves);
            }
        }
    }

    private void setBranch(int k, Kinetics kin, double lnAo, double lnAr, double e, double anodicWeight,
                           double cathodicWeight, boolean first, ReactionSlot s, boolean redissolves) {
        double beta = kin.alphaC() / (kin.alphaA() + kin.alphaC());
        double lnI0 = Math.log(kin.i0APerM2()) + (1 - beta) * lnAo + beta * lnAr;
        double lnKa = (s.anodicAllowed() || redissolves) && anodicWeight > 0
                ? lnI0 + Math.log(anodicWeight) - kin.alphaA() * f * e : Double.NEGATIVE_INFINITY;
        double lnKc = s.cathodicAllowed() && cathodicWeight > 0
                ? lnI0 + Math.log(cathodicWeight) + kin.alphaC() * f * e : Double.NEGATIVE_INFINITY;
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
     * Evaluates every reaction at potential {@code e}: the kinetic branches, the shares of each species'
     * flux, the currents and (when asked) their derivatives.
     */
    private void evaluate(double e, boolean derivatives) {
        java.util.Arrays.fill(share, 0);
        if (derivatives) {
            java.util.Arrays.fill(dShare, 0);
        }
        for (int k = 0; k < count; k++) {
            double a1 = branch(lnKa1[k], aA1[k], e);
            double c1 = branch(lnKc1[k], -aC1[k], e);
            double a = a1;
            double cc = c1;
            double da = aA1[k] * a1;
            double dc = -aC1[k] * c1;
            if (w2[k] > 0) {
                double a2 = branch(lnKa2[k], aA2[k], e);
                double c2 = branch(lnKc2[k], -aC2[k], e);
                a += a2;
                cc += c2;
                da += aA2[k] * a2;
                dc += -aC2[k] * c2;
            }
            if (metalWeight[k] < 1 && a > cc) {
                // above the metal's equilibrium potential: only the deposit dissolves, from the share of the
                // surface it covers; the bare rest neither dissolves nor takes metal (no deposition above the
                // Nernst potential). At equilibrium both sides give zero, so the current stays continuous.
                double w = metalWeight[k];
                a *= w;
                cc *= w;
                da *= w;
                dc *= w;
            }
            ia[k] = a;
            ic[k] = cc;
            dia[k] = da;
            dic[k] = dc;
            if (limitOx[k] >= 0) {
                share[limitOx[k]] += cc * invIlC[k];
                if (derivatives) {
                    dShare[limitOx[k]] += dc * invIlC[k];
                }
            }
            if (limitRed[k] >= 0) {
                share[limitRed[k]] += a * invIlA[k];
                if (derivatives) {
                    dShare[limitRed[k]] += da * invIlA[k];
                }
            }
        }
        for (int k = 0; k < count; k++) {
            double xo = 0;
            double dxo = 0;
            double xr = 0;
            double dxr = 0;
            if (limitOx[k] >= 0) {
                xo = Math.max(share[limitOx[k]] - ic[k] * invIlC[k], 0);
                dxo = derivatives ? dShare[limitOx[k]] - dic[k] * invIlC[k] : 0;
            }
            if (limitRed[k] >= 0) {
                xr = Math.max(share[limitRed[k]] - ia[k] * invIlA[k], 0);
                dxr = derivatives ? dShare[limitRed[k]] - dia[k] * invIlA[k] : 0;
            }
            double a = ia[k] / (1 + xr);
            double c = ic[k] / (1 + xo);
            double den = 1 + a * invIlA[k] + c * invIlC[k];
            double num = a - c;
            cur[k] = num / den;
            if (derivatives) {
                double da = (dia[k] * (1 + xr) - ia[k] * dxr) / ((1 + xr) * (1 + xr));
                double dc = (dic[k] * (1 + xo) - ic[k] * dxo) / ((1 + xo) * (1 + xo));
                double dDen = da * invIlA[k] + dc * invIlC[k];
                dcur[k] = ((da - dc) * den - num * dDen) / (den * den);
            }
        }
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
        evaluate(e, deriv != null);
        if (deriv != null) {
            deriv[0] = dcur[k];
        }
        return cur[k];
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
            if (!bracketed && next == e) {
                // the Newton step is below half the spacing of doubles at e and no bracket is known to bisect:
                // the iteration would stand still (a target of zero has a tolerance of 1e-16 A/m2, finer than
                // di/dE times one ulp of E); e is the answer it would give after its last iteration
                break;
            }
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
        evaluate(e, d != null);
        double sum = 0;
        double dsum = 0;
        for (int k = 0; k < count; k++) {
            sum += cur[k];
            dsum += dcur[k];
        }
        if (d != null) {
            d[0] = dsum;
        }
        return sum;
    }

    /** Fills {@code out} with each reaction's current density at {@code e} (A/m2). */
    void currents(double e, double[] out) {
        evaluate(e, false);
        System.arraycopy(cur, 0, out, 0, count);
    }

    /**
     * The cathodic kinetic current density of reaction {@code k} at the potential of the last
     * {@link #currents} call: its cathodic branch with no mass-transfer loss (A/m2, positive).
     */
    double lastCathodicKinetic(int k) {
        return ic[k];
    }

    /**
     * The surface over bulk concentration of reaction {@code k}'s limiting oxidised species at the potential
     * of the last {@link #currents} call, {@code 1 / (1 + S_O)} (1 when it has none).
     */
    double lastSurfaceRatioOx(int k) {
        return limitOx[k] < 0 ? 1 : 1 / (1 + share[limitOx[k]]);
    }

    /**
     * Equilibrium potential of reaction {@code k} as the voltage breakdown shows it: the Nernst potential at
     * the free activities of the last {@link #prepare}, each at least {@link #SHOWN_MIN_ACTIVITY}.
     *
     * @param k reaction slot
     * @return equilibrium potential (V vs SHE)
     */
    double shownEquilibrium(int k) {
        ReactionSlot s = slots.get(k);
        double ln = 0;
        for (int j = 0; j < s.oxIndex().length; j++) {
            ln += s.oxNu()[j] * Math.log(Math.max(lastFree[s.oxIndex()[j]] * 1e-3, SHOWN_MIN_ACTIVITY));
        }
        for (int j = 0; j < s.redIndex().length; j++) {
            ln -= s.redNu()[j] * Math.log(Math.max(lastFree[s.redIndex()[j]] * 1e-3, SHOWN_MIN_ACTIVITY));
        }
        return s.reaction().e0At(lastTempK) + ln / (s.n() * f);
    }
}
