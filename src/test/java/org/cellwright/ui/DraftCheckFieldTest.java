package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Each field checked as it is typed, through the unit parser and the library's names. */
class DraftCheckFieldTest {

    static ChemLibrary lib;

    @BeforeAll
    static void library() {
        lib = LibraryReader.builtIn();
    }

    private static DraftCheck.FieldError error(String key, String text, SupplyKind kind) {
        return DraftCheck.field(key, text, kind, lib).orElseThrow(() -> new AssertionError("no error for " + text));
    }

    @Test
    void goodValuesPass() {
        assertTrue(DraftCheck.field("cell.gap", "35 mm", SupplyKind.CURRENT, lib).isEmpty());
        assertTrue(DraftCheck.field(FormFields.SUPPLY_VALUE, "20 ASF", SupplyKind.CURRENT_DENSITY, lib).isEmpty());
        assertTrue(DraftCheck.field("electrolyte.conductivity", "", SupplyKind.CURRENT, lib).isEmpty(),
                "an optional field may stay empty");
        assertTrue(DraftCheck.field("cathode.material", "Stainless", SupplyKind.CURRENT, lib).isEmpty());
    }

    @Test
    void aMistypedUnitSaysWhereAndSuggests() {
        DraftCheck.FieldError e = error(FormFields.SUPPLY_VALUE, "2.5 A/dm", SupplyKind.CURRENT_DENSITY);
        assertTrue(e.message().contains("did you mean 'A/dm2'"), e.message());
        // "2.5 A/dm": the unit starts at the fifth character
        assertEquals(5, e.column());
        assertTrue(e.text().contains("at character 5"), e.text());
    }

    @Test
    void theSetValueFollowsTheSupplyKind() {
        DraftCheck.FieldError e = error(FormFields.SUPPLY_VALUE, "3 A", SupplyKind.VOLTAGE);
        assertTrue(e.message().contains("expected a voltage"), e.message());
    }

    @Test
    void textThatIsNotANumber() {
        DraftCheck.FieldError e = error("cell.gap", "wide", SupplyKind.CURRENT);
        assertEquals(1, e.column());
    }

    @Test
    void requiredFieldsMayNotStayEmpty() {
        DraftCheck.FieldError e = error("run.duration", " ", SupplyKind.CURRENT);
        assertTrue(e.message().startsWith("needed, e.g. 6 h"), e.message());
    }

    @Test
    void namesAreCheckedAgainstTheLibrary() {
        assertTrue(error("anode.material", "grafite", SupplyKind.CURRENT).message().contains("'graphite'"));
        assertTrue(error("run.target", "Snn", SupplyKind.CURRENT).message().contains("no metal 'Snn'"));
        assertTrue(DraftCheck.species("Sn++", lib).isEmpty());
        assertTrue(DraftCheck.species("Sn5+", lib).isPresent());
        assertTrue(DraftCheck.concentration("Sn2+", "25 g/L", lib).isEmpty(), "g/L converts with the molar mass");
        assertTrue(DraftCheck.concentration("Sn2+", "25 g/l/x", lib).isPresent());
    }
}
