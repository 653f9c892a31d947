package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;

import org.cellwright.chem.ChemLibrary;
import org.junit.jupiter.api.Test;

/** A library file with mistakes: each is refused with file, line, column, key and a plain reason. */
class LibraryFileErrorsTest {

    private static final String GOOD = """
            [species."Cu2+"]
            charge = 2
            elements = { Cu = 1 }
            molar_mass = "63.546 g/mol"
            molar_mass_source = "IUPAC"
            diffusion = "0.714e-9 m2/s"
            diffusion_source = "CRC"
            conductivity = "107.2 S cm2/mol"
            conductivity_source = "CRC"

            [species."Cl2"]
            charge = 0
            elements = { Cl = 2 }
            molar_mass = "70.9 g/mol"
            molar_mass_source = "IUPAC"
            diffusion = "1.25e-9 m2/s"
            diffusion_source = "CRC"

            [species."Cl-"]
            charge = -1
            elements = { Cl = 1 }
            molar_mass = "35.45 g/mol"
            molar_mass_source = "IUPAC"
            diffusion = "2.032e-9 m2/s"
            diffusion_source = "CRC"
            conductivity = "76.31 S cm2/mol"
            conductivity_source = "CRC"

            [metal.Cu]
            molar_mass = "63.546 g/mol"
            molar_mass_source = "IUPAC"
            density = "8.96 g/cm3"
            density_source = "CRC"
            deposit_class = "intermediate"
            deposit_class_source = "Winand"

            [material.copper]
            aliases = ["cu"]
            soluble_metal = "Cu"
            surface_metal = "Cu"

            [reaction."Cu2+/Cu"]
            equation = "Cu2+ + 2e- = Cu"
            e0 = "0.3419 V"
            e0_source = "CRC"
            i0 = "1e-3 A/cm2"
            i0_source = "Mattsson and Bockris"
            alpha_a = 1.5
            alpha_a_source = "Mattsson and Bockris"
            alpha_c = 0.5
            alpha_c_source = "Mattsson and Bockris"

            [reaction."Cu2+/Cu".on.cu]
            i0 = "20 A/m2"
            i0_source = "test value"
            alpha_a = 1.5
            alpha_a_source = "test value"
            alpha_c = 0.5
            alpha_c_source = "test value"

            [homogeneous."chlorine attack"]
            equation = "Cl2 + Cu -> Cu2+ + 2Cl-"
            rate_constant = "2 s-1"
            rate_constant_source = "test value"
            orders = { "Cl2" = 1 }
            orders_source = "test value"
            """;

    private static ChemLibrary read(String text) throws Exception {
        return LibraryReader.read(new StringReader(text), "test.toml");
    }

    private static int lineOf(String text, String fragment) {
        int at = text.indexOf(fragment);
        assertTrue(at >= 0, fragment);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    private static LibraryFormatException refused(String text) {
        return assertThrows(LibraryFormatException.class, () -> read(text));
    }

    @Test
    void theGoodFileReads() throws Exception {
        ChemLibrary lib = read(GOOD);
        assertEquals(10.0, lib.findReaction("Cu++/Cu").orElseThrow().kinetics().i0APerM2(), 1e-12);
        assertEquals(20.0, lib.findReaction("Cu2+/Cu").orElseThrow().kineticsOn("copper").i0APerM2(), 1e-12);
        assertEquals(0.0, lib.findSpecies("Cl2").orElseThrow().conductivitySM2PerMol());
        // first order in the one dissolved reactant: 2 s-1 stays 2 s-1
        assertEquals(2.0, lib.homogeneousReactions().get(0).rateConstant(), 1e-15);
    }

    @Test
    void aNumberWithoutSourceIsRefused() {
        String text = GOOD.replace("diffusion_source = \"CRC\"\nconductivity = \"107.2", "conductivity = \"107.2");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "diffusion = \"0.714e-9"), e.line());
        assertEquals(1, e.column());
        assertEquals("species.\"Cu2+\".diffusion", e.key());
        assertTrue(e.getMessage().startsWith("test.toml:6:1: species.\"Cu2+\".diffusion: has no source"), e.getMessage());
    }

    @Test
    void kineticsOnAMaterialNeedSourcesToo() {
        String text = GOOD.replace("i0 = \"20 A/m2\"\ni0_source = \"test value\"\n", "i0 = \"20 A/m2\"\n");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "i0 = \"20 A/m2\""), e.line());
        assertTrue(e.getMessage().contains("has no source"), e.getMessage());
    }

    @Test
    void aRequiredSpeciesIsReadAndMustBeKnownAndSourced() throws Exception {
        String with = GOOD.replace("alpha_c_source = \"Mattsson and Bockris\"\n",
                "alpha_c_source = \"Mattsson and Bockris\"\nrequires = [\"Cl-\"]\nrequires_source = \"test value\"\n");
        assertEquals(java.util.List.of("Cl-"), read(with).findReaction("Cu2+/Cu").orElseThrow().requires());
        assertEquals(java.util.List.of(), read(GOOD).findReaction("Cu2+/Cu").orElseThrow().requires());
        String unknown = with.replace("requires = [\"Cl-\"]", "requires = [\"Br-\"]");
        LibraryFormatException e = refused(unknown);
        assertEquals(lineOf(unknown, "requires = "), e.line());
        assertTrue(e.getMessage().contains("unknown species 'Br-'"), e.getMessage());
        LibraryFormatException unsourced = refused(with.replace("requires_source = \"test value\"\n", ""));
        assertTrue(unsourced.getMessage().contains("requires: has no source"), unsourced.getMessage());
    }

    @Test
    void aWrongUnitIsRefused() {
        String text = GOOD.replace("\"0.714e-9 m2/s\"", "\"0.714e-9 m2\"");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "diffusion = "), e.line());
        assertTrue(e.getMessage().contains("wrong unit"), e.getMessage());
        LibraryFormatException unknown = refused(GOOD.replace("\"8.96 g/cm3\"", "\"8.96 g/furlong3\""));
        assertTrue(unknown.getMessage().contains("unknown unit 'furlong3'"), unknown.getMessage());
    }

    @Test
    void aMisspeltKeyIsRefused() {
        String text = GOOD.replace("e0 = \"0.3419 V\"\ne0_source", "eo = \"0.3419 V\"\ne0_source");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "eo = "), e.line());
        assertEquals("reaction.\"Cu2+/Cu\".eo", e.key());
        assertTrue(e.problem().startsWith("unknown key"), e.getMessage());
    }

    @Test
    void anUnbalancedEquationIsRefusedAtItsKey() {
        String text = GOOD.replace("\"Cu2+ + 2e- = Cu\"", "\"Cu2+ + e- = Cu\"");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "equation = \"Cu2+ + e-"), e.line());
        assertEquals("reaction.\"Cu2+/Cu\".equation", e.key());
        assertTrue(e.problem().contains("charge does not balance"), e.getMessage());
    }

    @Test
    void aCoupleThatDoesNotMatchItsEquationIsRefused() {
        LibraryFormatException e = refused(GOOD.replace("[reaction.\"Cu2+/Cu\"]", "[reaction.\"Cl-/Cu\"]")
                .replace("[reaction.\"Cu2+/Cu\".on.cu]", "[reaction.\"Cl-/Cu\".on.cu]"));
        assertTrue(e.problem().contains("oxidised form 'Cl-'"), e.getMessage());
    }

    @Test
    void kineticsOnAnUnknownMaterialIsRefused() {
        String text = GOOD.replace("[reaction.\"Cu2+/Cu\".on.cu]", "[reaction.\"Cu2+/Cu\".on.unobtainium]");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "[reaction.\"Cu2+/Cu\".on.unobtainium]"), e.line());
        assertTrue(e.problem().contains("unknown electrode material"), e.getMessage());
    }

    @Test
    void brokenTomlIsRefusedWithItsPosition() {
        String text = GOOD.replace("charge = 2", "charge = = 2");
        LibraryFormatException e = refused(text);
        assertEquals(lineOf(text, "charge = = 2"), e.line());
        assertTrue(e.problem().startsWith("not valid TOML"), e.getMessage());
    }

    @Test
    void otherContentMistakes() {
        assertTrue(refused(GOOD.replace("charge = 2", "charge = -2")).problem().contains("does not match the name"));
        assertTrue(refused(GOOD.replace("deposit_class = \"intermediate\"", "deposit_class = \"noble\""))
                .problem().contains("not normal, intermediate or inert"));
        assertTrue(refused(GOOD.replace("soluble_metal = \"Cu\"", "soluble_metal = \"Sn\""))
                .problem().contains("not a metal of the library"));
        assertTrue(refused(GOOD.replace("molar_mass = \"63.546 g/mol\"\nmolar_mass_source = \"IUPAC\"\ndiffusion",
                "diffusion")).problem().startsWith("missing"));
        assertTrue(refused(GOOD + "\n[isotope.U235]\nmass = 1\n").problem().startsWith("unknown section"));
        assertTrue(refused(GOOD.replace("alpha_c = 0.5\nalpha_c_source = \"Mattsson and Bockris\"",
                "alpha_c = -0.5\nalpha_c_source = \"Mattsson and Bockris\"")).problem().contains("transfer coefficients"));
        assertTrue(refused(GOOD.replace("\"Cl2 + Cu -> Cu2+ + 2Cl-\"", "\"Cl2 + Cu -> Cu2+ + Cl-\""))
                .problem().contains("does not balance"));
        assertTrue(refused(GOOD.replace("rate_constant = \"2 s-1\"", "rate_constant = \"2 L/mol/s\""))
                .problem().contains("wrong unit"));
        assertTrue(refused(GOOD.replace("orders = { \"Cl2\" = 1 }", "orders = { \"Cl-\" = 1 }"))
                .problem().contains("not a dissolved reactant"));
    }
}
