package org.cellwright.io;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.cellwright.cell.SpeciesOverride;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.chem.SpeciesName;

/**
 * Species names as a scenario may use them: the library's species, changed or added to by the scenario's
 * {@code [species."X"]} tables. Gives canonical names, charges and molar masses.
 */
final class SpeciesResolver {

    private final ChemLibrary library;
    private final Map<String, SpeciesOverride> overrides = new LinkedHashMap<>();

    SpeciesResolver(ChemLibrary library, List<SpeciesOverride> overrides) {
        this.library = library;
        overrides.forEach(o -> this.overrides.put(o.name(), o));
    }

    /** @return the canonical name of a species written in any accepted notation, if known */
    Optional<String> canonical(String raw) {
        Optional<Species> s = library.findSpecies(raw);
        if (s.isPresent()) {
            return Optional.of(s.get().name());
        }
        return SpeciesName.candidates(raw).stream().filter(overrides::containsKey).findFirst();
    }

    /** @return the charge number of a known species (canonical name) */
    int charge(String name) {
        SpeciesOverride o = overrides.get(name);
        if (o != null && o.charge() != null) {
            return o.charge();
        }
        return library.findSpecies(name).map(Species::charge).orElse(0);
    }

    /** @return the molar mass (kg/mol) of a known species, NaN when not known */
    double molarMassKgPerMol(String name) {
        SpeciesOverride o = overrides.get(name);
        if (o != null && o.molarMassKgPerMol() != null) {
            return o.molarMassKgPerMol();
        }
        return library.findSpecies(name).map(Species::molarMassKgPerMol).orElse(Double.NaN);
    }

    /** @return true when the species contains the element (by the library's elemental composition) */
    boolean contains(String name, String element) {
        return library.findSpecies(name).map(s -> s.elements().containsKey(element)).orElse(false);
    }

    /** @return every known species name, for suggestions */
    List<String> names() {
        List<String> names = new ArrayList<>();
        library.species().forEach(s -> names.add(s.name()));
        names.addAll(overrides.keySet());
        return names;
    }

    /** @return "unknown species 'X'; did you mean 'Y'?" */
    String unknown(String raw) {
        return "unknown species '" + raw + "'" + Spelling.suggestion(raw, names());
    }
}
