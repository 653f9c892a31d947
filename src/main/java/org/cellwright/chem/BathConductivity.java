package org.cellwright.chem;

import java.util.ArrayList;
import java.util.List;

/**
 * The conductivity model of {@link Conductivity} and the sulfate equilibria of {@link ElectrolyteSpeciation},
 * prepared once for a fixed list of species and evaluated on arrays: the form the engine calls at every
 * evaluation of its rates. Same equations and constants; the ionic-strength iteration starts from the
 * previous call's converged value (it converges to the same fixed point, to 1e-12 relative) and the free
 * sulfate is found by Newton's method (the balance is increasing and concave, so Newton from the total
 * sulfate converges monotonically).
 *
 * <p>Not thread-safe (it keeps the last ionic strength): one instance per running simulation.
 */
public final class BathConductivity {

    private final int inputs;
    private final int size;
    private final double[] charge;
    private final double[] lambda0;
    private final double[] exponent;
    private final boolean[] divalent;
    private final int hydrogen;
    private final int bisulfate;
    private final int sulfate;
    private final int chloride;
    private final double[] total;
    private final double[] free;
    private final double muRef;
    private double lastIonic = Double.NaN;
    private boolean hasHydrogen;
    private double hTotal;
    private double sTotal;
    private double metalTotal;

    /**
     * @param library species data
     * @param species the canonical names of the species, in the order of the arrays passed to {@link #of}
     */
    public BathConductivity(ChemLibrary library, List<String> species) {
        List<Species> all = new ArrayList<>();
        for (String name : species) {
            all.add(library.findSpecies(name).orElseThrow(
                    () -> new IllegalArgumentException("unknown species '" + name + "'")));
        }
        this.inputs = all.size();
        for (String extra : new String[] {ElectrolyteSpeciation.HYDROGEN, ElectrolyteSpeciation.BISULFATE,
                ElectrolyteSpeciation.SULFATE}) {
            library.findSpecies(extra).filter(s -> all.stream().noneMatch(a -> a.name().equals(s.name())))
                    .ifPresent(all::add);
        }
        size = all.size();
        charge = new double[size];
        lambda0 = new double[size];
        exponent = new double[size];
        divalent = new boolean[size];
        for (int i = 0; i < size; i++) {
            Species s = all.get(i);
            charge[i] = s.charge();
            lambda0[i] = s.conductivitySM2PerMol();
            exponent[i] = Conductivity.temperatureExponent(s.name());
            divalent[i] = s.charge() == 2;
        }
        hydrogen = indexOf(all, ElectrolyteSpeciation.HYDROGEN);
        bisulfate = indexOf(all, ElectrolyteSpeciation.BISULFATE);
        sulfate = indexOf(all, ElectrolyteSpeciation.SULFATE);
        chloride = indexOf(all, "Cl-");
        total = new double[size];
        free = new double[size];
        muRef = WaterViscosity.of(PhysicalConstants.REFERENCE_TEMPERATURE_K);
    }

    private static int indexOf(List<Species> all, String name) {
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * @param molPerM3 concentration of each species (mol/m3), in the order given at construction; H+, HSO4-
     *     and SO4^2- are totals that the sulfate equilibria redistribute
     * @param tempK temperature (K), within the range of {@link WaterViscosity}
     * @return the conductivity (S/m)
     */
    public double of(double[] molPerM3, double tempK) {
        java.util.Arrays.fill(total, 0);
        for (int i = 0; i < inputs; i++) {
            total[i] = Math.max(0, molPerM3[i]) / 1000.0;
        }
        System.arraycopy(total, 0, free, 0, size);
        double ionic = ionicStrength(total);
        double h = get(total, hydrogen) + get(total, bisulfate);
        double s = get(total, sulfate) + get(total, bisulfate);
        if (s > 0 && sulfate >= 0) {
            double metals = 0;
            for (int i = 0; i < size; i++) {
                if (divalent[i]) {
                    metals += total[i];
                }
            }
            if (!Double.isNaN(lastIonic)) {
                ionic = lastIonic;
            }
            hasHydrogen = hydrogen >= 0 && (h > 0 || total[hydrogen] > 0 || hydrogen < inputs);
            hTotal = h;
            sTotal = s;
            metalTotal = metals;
            ionic = solveIonicStrength(ionic);
            lastIonic = ionic;
        }
        double viscosityRatio = muRef / WaterViscosity.of(tempK);
        double sqrtI = Math.sqrt(ionic);
        double cl = chloride >= 0 ? Math.max(0, free[chloride]) : 0;
        double kappa = 0;
        for (int i = 0; i < size; i++) {
            double c = Math.max(0, free[i]);
            if (charge[i] == 0 || c <= 0) {
                continue;
            }
            double correction = i == hydrogen
                    ? 1 + Conductivity.PROTON_RETARDATION * sqrtI + Conductivity.PROTON_CHLORIDE * cl
                    : 1 + Conductivity.RETARDATION * charge[i] * charge[i] * sqrtI;
            kappa += c * 1000.0 * lambda0[i] * Math.pow(viscosityRatio, exponent[i]) / correction;
        }
        return kappa;
    }

    /**
     * The ionic strength at which the speciation reproduces itself: the fixed point of {@link #speciate},
     * found by secant steps on {@code speciate(I) - I} from the warm start, with the reference model's damped
     * iteration as the fallback. Leaves the free composition of the fixed point in {@code free}.
     */
    private double solveIonicStrength(double start) {
        double i0 = start;
        double r0 = speciate(i0) - i0;
        if (Math.abs(r0) <= 1e-13 * (1 + i0)) {
            return i0;
        }
        double i1 = i0 + r0;
        for (int iteration = 0; iteration < 50; iteration++) {
            double r1 = speciate(i1) - i1;
            if (Math.abs(r1) <= 1e-13 * (1 + i1)) {
                return i1;
            }
            double next = r1 != r0 ? i1 - r1 * (i1 - i0) / (r1 - r0) : i1 + r1;
            if (!(next >= 0) || !Double.isFinite(next)) {
                break;
            }
            i0 = i1;
            r0 = r1;
            i1 = next;
        }
        double ionic = start;
        for (int iteration = 0; iteration < 400; iteration++) {
            double next = speciate(ionic);
            boolean converged = Math.abs(next - ionic) <= 1e-12 * (1 + ionic);
            ionic = 0.5 * (ionic + next);
            if (converged) {
                break;
            }
        }
        speciate(ionic);
        return ionic;
    }

    /** Speciates at ionic strength {@code ionic} (mol/L), fills {@code free}, returns the free ions' ionic strength. */
    private double speciate(double ionic) {
        double k2 = bisulfate >= 0 ? ElectrolyteSpeciation.bisulfateConstant(ionic) : Double.POSITIVE_INFINITY;
        double kPair = ElectrolyteSpeciation.pairConstant(ionic);
        double freeSulfate = freeSulfate(sTotal, hTotal, k2, kPair, metalTotal);
        double bi = Double.isInfinite(k2) ? 0 : hTotal * freeSulfate / (k2 + freeSulfate);
        double pairShare = kPair * freeSulfate / (1 + kPair * freeSulfate);
        for (int i = 0; i < size; i++) {
            if (divalent[i]) {
                free[i] = total[i] - total[i] * pairShare;
            }
        }
        free[sulfate] = freeSulfate;
        if (hasHydrogen) {
            free[hydrogen] = hTotal - bi;
        }
        if (bisulfate >= 0) {
            free[bisulfate] = bi;
        }
        return ionicStrength(free);
    }

    /**
     * @param i index of a species in the order given at construction
     * @return its free concentration after the last {@link #of} call (mol/m3)
     */
    public double freeMolPerM3(int i) {
        return Math.max(0, free[i]) * 1000.0;
    }

    private static double get(double[] a, int i) {
        return i >= 0 ? a[i] : 0;
    }

    private double ionicStrength(double[] molPerL) {
        double sum = 0;
        for (int i = 0; i < size; i++) {
            sum += Math.max(0, molPerL[i]) * charge[i] * charge[i];
        }
        return 0.5 * sum;
    }

    /** Solves s + H s/(k2 + s) + M kP s/(1 + kP s) = S for the free sulfate s in [0, S] (mol/L). */
    private static double freeSulfate(double sulfate, double hydrogen, double k2, double kPair, double metals) {
        boolean bi = !Double.isInfinite(k2);
        double s = sulfate;
        for (int it = 0; it < 100; it++) {
            double f = s + (bi ? hydrogen * s / (k2 + s) : 0) + metals * kPair * s / (1 + kPair * s) - sulfate;
            double d = 1 + (bi ? hydrogen * k2 / ((k2 + s) * (k2 + s)) : 0)
                    + metals * kPair / ((1 + kPair * s) * (1 + kPair * s));
            double next = Math.max(0, s - f / d);
            if (Math.abs(next - s) <= 1e-15 + 1e-14 * s) {
                return next;
            }
            s = next;
        }
        return s;
    }
}
