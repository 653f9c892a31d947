package org.cellwright.study.makeup;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Works out the electrolyte a feed makes, by stoichiometry: every salt and acid gives its ions (acids fully
 * dissociated, the convention of scenario files), a metal dissolving takes the H+ (and, in nitric acid, the
 * nitrate) its reaction consumes ({@link DissolutionRoute}), a solid filtered off takes its ions with it;
 * then the solids whose solubility product is exceeded come down ({@link SolubilityLimits}) and the
 * hydrolysis limits are checked. The result is electroneutral by construction: each addition and each
 * removal is neutral.
 */
public final class BathMakeup {

    /** Ideal-gas molar volume at 0 C and 1 atm (L/mol), CODATA 2018. */
    static final double STP_L_PER_MOL = 22.41396954;

    private BathMakeup() {
    }

    /**
     * @param feed what goes in
     * @return the electrolyte
     * @throws IllegalArgumentException when a step cannot be done (not enough acid, a metal that does not
     *     dissolve so, more filtered off than there is); the message starts with the step's label
     */
    public static MakeupResult compute(Feed feed) {
        Map<String, Double> mol = new LinkedHashMap<>();
        Map<String, Double> gas = new LinkedHashMap<>();
        Set<String> acids = new LinkedHashSet<>();
        List<String> log = new ArrayList<>();
        for (Feed.Step step : feed.steps()) {
            if (step instanceof Feed.Add a) {
                add(a, mol, acids, log);
            } else if (step instanceof Feed.Dissolve d) {
                dissolve(d, mol, gas, acids, log);
            } else if (step instanceof Feed.Filter f) {
                filter(f, mol, log);
            }
        }
        double litres = feed.volumeM3() * 1000;
        Map<String, Double> molPerL = new LinkedHashMap<>();
        mol.forEach((ion, n) -> molPerL.put(ion, n / litres));
        List<String> flags = new ArrayList<>();
        List<MakeupResult.Precipitate> solids = SolubilityLimits.precipitate(molPerL, litres, flags);
        SolubilityLimits.hydrolysis(molPerL, flags);
        if (Math.abs(feed.temperatureK() - 298.15) > 5) {
            flags.add(String.format(Locale.ROOT, "the limits are for 20-25 C; the bath is at %.0f C",
                    feed.temperatureK() - 273.15));
        }
        Map<String, Double> composition = new LinkedHashMap<>();
        double positive = 0;
        double net = 0;
        for (String ion : Ions.ORDER) {
            double c = molPerL.getOrDefault(ion, 0.0);
            if (c > 0) {
                composition.put(ion, c * 1000);
                positive += Math.max(0, Ions.charge(ion)) * c * 1000;
                net += Ions.charge(ion) * c * 1000;
            }
        }
        if (Math.abs(net) > 1e-9 * Math.max(positive, 1)) {
            throw new IllegalStateException("make-up lost its charge balance: " + net + " mol/m3");
        }
        return new MakeupResult(feed.title(), feed.volumeM3(), feed.temperatureK(), composition, log, solids, flags,
                gas, positive);
    }

    private static void add(Feed.Add a, Map<String, Double> mol, Set<String> acids, List<String> log) {
        if (!(a.mol() > 0)) {
            throw new IllegalArgumentException(a.label() + ": the amount must be above zero");
        }
        a.compound().ions().forEach((ion, n) -> mol.merge(ion, n * a.mol(), Double::sum));
        if (a.compound().kind() == Compound.Kind.ACID) {
            acids.add(a.compound().base());
        }
        log.add(String.format(Locale.ROOT, "%s: %.4g mol %s", a.described(), a.mol(), a.compound().name()));
    }

    private static void dissolve(Feed.Dissolve d, Map<String, Double> mol, Map<String, Double> gas, Set<String> acids,
                                 List<String> log) {
        String acid = d.acid();
        if (acid == null) {
            if (acids.size() != 1) {
                throw new IllegalArgumentException(d.label() + ": say which acid dissolves the " + d.metal()
                        + (acids.isEmpty() ? " (no acid was added before it)" : " (acid = one of " + acids + ")"));
            }
            acid = acids.iterator().next();
        } else if (!acids.contains(acid)) {
            throw new IllegalArgumentException(d.label() + ": no " + acid + " was added before the " + d.metal()
                    + " is dissolved in it");
        }
        DissolutionRoute route;
        try {
            route = DissolutionRoute.of(d.metal(), acid, d.oxidant());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(d.label() + ": " + e.getMessage(), e);
        }
        double n = d.kg() / AtomicWeights.kgPerMol(d.metal());
        double needH = route.protons() * n;
        double haveH = mol.getOrDefault("H+", 0.0);
        if (needH > haveH * (1 + 1e-12)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: dissolving %.4g g of %s takes %.4g mol "
                    + "of H+ but the bath holds only %.4g mol at that point; add more acid first", d.label(),
                    d.kg() * 1000, d.metal(), needH, haveH));
        }
        double needNo3 = route.nitrate() * n;
        if (needNo3 > mol.getOrDefault("NO3-", 0.0) * (1 + 1e-12)) {
            throw new IllegalArgumentException(d.label() + ": not enough nitrate for " + route.equation());
        }
        mol.put("H+", Math.max(0, haveH - needH));
        if (needNo3 > 0) {
            mol.put("NO3-", Math.max(0, mol.get("NO3-") - needNo3));
        }
        mol.merge(route.ion(), n, Double::sum);
        StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%.4g g %s dissolved: %s; %.4g mol %s, "
                + "%.4g mol H+ used", d.kg() * 1000, d.metal(), route.equation(), n, route.ion(), needH));
        if (route.gas() != null) {
            double g = route.gasPerMetal() * n;
            gas.merge(route.gas(), g, Double::sum);
            line.append(String.format(Locale.ROOT, ", %.3g L of %s given off (0 C, 1 atm)", g * STP_L_PER_MOL,
                    route.gas()));
        }
        log.add(line.toString());
    }

    private static void filter(Feed.Filter f, Map<String, Double> mol, List<String> log) {
        double n = f.kg() / f.compound().molarMassKgPerMol();
        for (Map.Entry<String, Integer> e : f.compound().ions().entrySet()) {
            double have = mol.getOrDefault(e.getKey(), 0.0);
            if (n * e.getValue() > have * (1 + 1e-9)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: %.4g g of %s holds %.4g mol of %s "
                        + "but the bath has only %.4g mol", f.label(), f.kg() * 1000, f.compound().name(),
                        n * e.getValue(), e.getKey(), have));
            }
        }
        f.compound().ions().forEach((ion, k) -> mol.put(ion, Math.max(0, mol.get(ion) - k * n)));
        log.add(String.format(Locale.ROOT, "%.4g g %s filtered off: %.4g mol", f.kg() * 1000, f.compound().name(), n));
    }
}
