package org.cellwright.chem;

import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The chemistry a run draws on: species, metals, electrode reactions, homogeneous reactions and electrode
 * materials. Immutable; {@code with*} methods return modified copies (a scenario's overrides).
 *
 * <p>The built-in library is read from a resource file (every number with its source) by the
 * {@code io} layer; this class only holds and looks up.
 */
public final class ChemLibrary {

    private final Map<String, Species> species;
    private final Map<String, Metal> metals;
    private final Map<String, ElectrodeReaction> reactions;
    private final List<HomogeneousReaction> homogeneous;
    private final Map<String, ElectrodeMaterial> materials;

    public ChemLibrary(Collection<Species> species, Collection<Metal> metals,
                       Collection<ElectrodeReaction> reactions, Collection<HomogeneousReaction> homogeneous,
                       Collection<ElectrodeMaterial> materials) {
        this.species = index(species, Species::name);
        this.metals = index(metals, Metal::symbol);
        this.reactions = index(reactions, ElectrodeReaction::name);
        this.homogeneous = List.copyOf(homogeneous);
        this.materials = index(materials, ElectrodeMaterial::name);
    }

    private static <T> Map<String, T> index(Collection<T> items, java.util.function.Function<T, String> key) {
        Map<String, T> map = new LinkedHashMap<>();
        for (T t : items) {
            map.put(key.apply(t), t);
        }
        return java.util.Collections.unmodifiableMap(map);
    }

    /** @return all species, in library order */
    public Collection<Species> species() {
        return species.values();
    }

    /** @return all metals, in library order */
    public Collection<Metal> metals() {
        return metals.values();
    }

    /** @return all electrode reactions, in library order */
    public Collection<ElectrodeReaction> reactions() {
        return reactions.values();
    }

    /** @return all homogeneous reactions */
    public List<HomogeneousReaction> homogeneousReactions() {
        return homogeneous;
    }

    /** @return all electrode materials */
    public Collection<ElectrodeMaterial> materials() {
        return materials.values();
    }

    /** @return the species written in any accepted notation, if known */
    public Optional<Species> findSpecies(String raw) {
        for (String candidate : SpeciesName.candidates(raw)) {
            Species s = species.get(candidate);
            if (s != null) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /** @return the metal with this symbol, if known */
    public Optional<Metal> findMetal(String symbol) {
        return Optional.ofNullable(metals.get(symbol));
    }

    /** @return the electrode reaction named by its couple in any accepted notation, if known */
    public Optional<ElectrodeReaction> findReaction(String couple) {
        ElectrodeReaction direct = reactions.get(couple);
        if (direct != null) {
            return Optional.of(direct);
        }
        return canonicalCouple(couple).map(reactions::get);
    }

    /** @return the material with this name or alias (case-insensitive), if known */
    public Optional<ElectrodeMaterial> findMaterial(String raw) {
        if (raw == null) {
            return Optional.empty();
        }
        String key = raw.strip().toLowerCase(java.util.Locale.ROOT);
        for (ElectrodeMaterial m : materials.values()) {
            if (m.name().equals(key) || m.aliases().contains(key)) {
                return Optional.of(m);
            }
        }
        return Optional.empty();
    }

    /**
     * The material a cathode surface becomes once the metal covers it (for its hydrogen kinetics): the first
     * material in library order whose surface metal is {@code symbol} (pure metals come before alloys).
     *
     * @param symbol metal symbol ("Sn")
     * @return the material ("tin"), if any
     */
    public Optional<ElectrodeMaterial> materialOfMetal(String symbol) {
        return materials.values().stream().filter(m -> symbol != null && symbol.equals(m.surfaceMetal())).findFirst();
    }

    /**
     * Writes a couple "Ox/Red" with both sides in canonical notation, for those sides that name a known
     * species ("Cu++/Cu" becomes "Cu2+/Cu").
     */
    public Optional<String> canonicalCouple(String couple) {
        int slash = couple == null ? -1 : couple.indexOf('/');
        if (slash <= 0 || slash == couple.length() - 1) {
            return Optional.empty();
        }
        return Optional.of(canonicalSide(couple.substring(0, slash)) + "/" + canonicalSide(couple.substring(slash + 1)));
    }

    private String canonicalSide(String side) {
        return findSpecies(side).map(Species::name).orElse(side.strip());
    }

    /** @return a copy in which this species replaces (or adds to) the one of the same name */
    public ChemLibrary withSpecies(Species s) {
        Map<String, Species> copy = new LinkedHashMap<>(species);
        copy.put(s.name(), s);
        return new ChemLibrary(copy.values(), metals.values(), reactions.values(), homogeneous, materials.values());
    }

    /** @return a copy in which this reaction replaces (or adds to) the one of the same name */
    public ChemLibrary withReaction(ElectrodeReaction r) {
        Map<String, ElectrodeReaction> copy = new LinkedHashMap<>(reactions);
        copy.put(r.name(), r);
        return new ChemLibrary(species.values(), metals.values(), copy.values(), homogeneous, materials.values());
    }
}
