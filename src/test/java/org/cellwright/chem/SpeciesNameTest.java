package org.cellwright.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cellwright.io.LibraryReader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The common ways of writing an ion resolve to the library's species (notation of the interface brief). */
class SpeciesNameTest {

    @ParameterizedTest
    @CsvSource({
        "Cu2+, Cu2+", "Cu++, Cu2+", "Cu^2+, Cu2+", "Cu 2+, Cu2+",
        "SO4^2-, SO4^2-", "SO4--, SO4^2-", "SO4 2-, SO4^2-", "SO42-, SO4^2-",
        "Fe+++, Fe3+", "Fe3+, Fe3+", "H+, H+", "Cl-, Cl-", "NO3-, NO3-", "HSO4-, HSO4-",
        "Sn++++, Sn4+", "Cl2, Cl2"
    })
    void variantsResolve(String written, String canonical) {
        var found = LibraryReader.builtIn().findSpecies(written);
        assertTrue(found.isPresent(), written + " not found");
        assertEquals(canonical, found.get().name());
    }

    @ParameterizedTest
    @CsvSource({"Cu++/Cu, Cu2+/Cu", "Fe+++/Fe++, Fe3+/Fe2+", "Sn^4+/Sn^2+, Sn4+/Sn2+"})
    void couplesResolve(String written, String canonical) {
        var reaction = LibraryReader.builtIn().findReaction(written);
        assertTrue(reaction.isPresent(), written + " not found");
        assertEquals(canonical, reaction.get().name());
    }
}
