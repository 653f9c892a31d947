package org.cellwright.sim;

import java.util.List;

/**
 * The names behind a run's arrays, known before the run starts (for live plots): the tracked species in the
 * order of {@link InstantState#concentrationsMolPerM3()}, the depositable metals in the order of
 * {@link TracePoint#depositKg()}, and the reactions in the order of the partial-current arrays.
 *
 * @param speciesNames tracked species
 * @param metalSymbols depositable metals
 * @param cathodeReactions cathode reactions (couples)
 * @param anodeReactions anode reactions (couples)
 * @param targetMetal the metal the run is for, or null
 */
public record RunLayout(List<String> speciesNames, List<String> metalSymbols, List<String> cathodeReactions,
                        List<String> anodeReactions, String targetMetal) {

    public RunLayout {
        speciesNames = List.copyOf(speciesNames);
        metalSymbols = List.copyOf(metalSymbols);
        cathodeReactions = List.copyOf(cathodeReactions);
        anodeReactions = List.copyOf(anodeReactions);
    }

    static RunLayout of(ReactionNetwork net) {
        return new RunLayout(net.species().stream().map(s -> s.name()).toList(),
                net.depositMetals().stream().map(m -> m.symbol()).toList(),
                net.cathodeSlots.stream().map(s -> s.reaction().name()).toList(),
                net.anodeSlots.stream().map(s -> s.reaction().name()).toList(),
                net.targetMetal() == null ? null : net.targetMetal().symbol());
    }
}
