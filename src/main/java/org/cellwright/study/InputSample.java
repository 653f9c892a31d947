package org.cellwright.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Species;

/**
 * One draw of the uncertain inputs ({@link UncertainInput}): a factor on the diffusion layer, one on the
 * conductivity, one per species on its diffusion coefficient and one per reaction and electrode material on
 * its exchange current density. Applied to a scenario whose overrides are already part of the chemistry
 * ({@link #apply}), it gives the scenario and chemistry of one run of a spread study.
 *
 * @param index the sample's number, from 0
 * @param layerFactor factor on the diffusion-layer thickness
 * @param conductivityFactor factor on every limiting ionic conductivity, or on a pinned conductivity
 * @param diffusionFactors factor on each species' diffusion coefficient, by species name
 * @param exchangeFactors factor on each exchange current density, by "couple" (default kinetics) or
 *     "couple@material"
 */
public record InputSample(int index, double layerFactor, double conductivityFactor,
                          Map<String, Double> diffusionFactors, Map<String, Double> exchangeFactors) {

    public InputSample {
        diffusionFactors = Map.copyOf(diffusionFactors);
        exchangeFactors = Map.copyOf(exchangeFactors);
    }

    /** The scenario and chemistry of one run. */
    public record Perturbed(Scenario scenario, ChemLibrary library) {
    }

    /**
     * Draws a sample; the same random numbers in give the same sample out (species and reactions are visited
     * in a fixed order).
     *
     * @param index the sample's number
     * @param random the sample's own random numbers
     * @param chemistry the chemistry with the scenario's overrides applied
     * @param pinnedConductivity true when the scenario pins a measured conductivity
     * @return the sample
     */
    public static InputSample draw(int index, SplittableRandom random, ChemLibrary chemistry,
                                   boolean pinnedConductivity) {
        double layer = UncertainInput.DIFFUSION_LAYER.draw(random, false);
        double kappa = UncertainInput.CONDUCTIVITY.draw(random, pinnedConductivity);
        Map<String, Double> diffusion = new LinkedHashMap<>();
        for (Species s : chemistry.species()) {
            diffusion.put(s.name(), UncertainInput.DIFFUSION_COEFFICIENT.draw(random, false));
        }
        Map<String, Double> exchange = new LinkedHashMap<>();
        for (ElectrodeReaction r : chemistry.reactions()) {
            exchange.put(r.name(), UncertainInput.EXCHANGE_CURRENT.draw(random, false));
            for (String material : new TreeMap<>(r.kineticsByMaterial()).keySet()) {
                exchange.put(r.name() + "@" + material, UncertainInput.EXCHANGE_CURRENT.draw(random, false));
            }
        }
        return new InputSample(index, layer, kappa, diffusion, exchange);
    }

    /**
     * @param sc the scenario, its overrides already in {@code chemistry}
     * @param chemistry the chemistry with the scenario's overrides applied
     * @return the scenario (overrides dropped, diffusion layer and a pinned conductivity scaled) and the
     *     chemistry (diffusion coefficients, conductivities and exchange current densities scaled)
     */
    public Perturbed apply(Scenario sc, ChemLibrary chemistry) {
        Agitation a = sc.cell().agitation();
        Electrolyte e = sc.electrolyte();
        boolean pinned = e.conductivitySPerM() != null;
        Electrolyte scaled = pinned ? new Electrolyte(e.volumeM3(), e.temperatureK(), e.compositionMolPerM3(),
                e.conductivitySPerM() * conductivityFactor) : e;
        Scenario out = new Scenario(sc.title(), sc.notes(), scaled, sc.cathode(), sc.anode(),
                sc.cell().withAgitation(new Agitation(a.preset(), a.diffusionLayerM() * layerFactor)), sc.supply(),
                sc.run(), List.of(), List.of());
        List<Species> species = new ArrayList<>();
        for (Species s : chemistry.species()) {
            Species d = s.withDiffusion(s.diffusionM2PerS() * diffusionFactors.getOrDefault(s.name(), 1.0));
            species.add(pinned ? d : d.withConductivity(d.conductivitySM2PerMol() * conductivityFactor));
        }
        List<ElectrodeReaction> reactions = new ArrayList<>();
        for (ElectrodeReaction r : chemistry.reactions()) {
            ElectrodeReaction changed = r.withKinetics(null, scaled(r.kinetics(), exchangeFactors.get(r.name())));
            for (Map.Entry<String, Kinetics> k : r.kineticsByMaterial().entrySet()) {
                changed = changed.withKinetics(k.getKey(), scaled(k.getValue(),
                        exchangeFactors.get(r.name() + "@" + k.getKey())));
            }
            reactions.add(changed);
        }
        return new Perturbed(out, new ChemLibrary(species, chemistry.metals(), reactions,
                chemistry.homogeneousReactions(), chemistry.materials()));
    }

    private static Kinetics scaled(Kinetics k, Double factor) {
        return factor == null ? k : k.withI0(k.i0APerM2() * factor);
    }
}
