package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.cellwright.study.makeup.Feed;
import org.junit.jupiter.api.Test;

/** The make-up feed format: grades, order of steps, and errors with their place in the file. */
class FeedReaderTest {

    @Test
    void theTinExampleReadsInFileOrderWithTheGradesDensity() throws Exception {
        Feed f = FeedReader.read(Path.of("examples", "tin-chloride-makeup.toml"));
        assertEquals(1.2e-3, f.volumeM3(), 1e-15);
        assertEquals(3, f.steps().size());
        Feed.Add hcl = (Feed.Add) f.steps().get(0);
        // source: 233 mL x 1.159 g/mL (32 % HCl, CRC concentrative properties, 20 C, from memory) x 0.32 /
        // 36.458 g/mol = 2.370263 mol
        assertEquals(2.370263, hcl.mol(), 1e-6);
        assertTrue(((Feed.Dissolve) f.steps().get(1)).metal().equals("Sn"));
        assertTrue(f.steps().get(2).label().matches(".*tin-chloride-makeup.toml:\\d+: dissolve\\[2\\]"),
                f.steps().get(2).label());
    }

    @Test
    void acidsByConcentrationOrByMassAndSaltsByMass() throws Exception {
        Feed f = FeedReader.parse("""
                volume = "1 L"
                [[add]]
                acid = "H2SO4"
                volume = "100 mL"
                concentration = "2 mol/L"
                [[add]]
                acid = "HNO3"
                mass = "50 g"
                mass_fraction = 0.65
                [[add]]
                salt = "CuSO4.5H2O"
                mass = "249.677 g"
                """, "f.toml");
        // source: 100 mL x 2 mol/L = 0.2 mol
        assertEquals(0.2, ((Feed.Add) f.steps().get(0)).mol(), 1e-12);
        // source: 50 g x 0.65 / 63.012 g/mol (HNO3 from the IUPAC abridged weights: 1.008 + 14.007 + 3 x 15.999);
        // 249.677 g of CuSO4.5H2O is one mole by the same weights
        assertEquals(50 * 0.65 / 63.012, ((Feed.Add) f.steps().get(1)).mol(), 1e-9);
        assertEquals(1.0, ((Feed.Add) f.steps().get(2)).mol(), 1e-9);
    }

    @Test
    void stepsFollowTheOrderOfTheFileAcrossKinds() throws Exception {
        Feed f = FeedReader.parse("""
                volume = "1 L"
                [[dissolve]]
                metal = "Zn"
                mass = "1 g"
                [[add]]
                acid = "HCl"
                mass = "36.458 g"
                """, "f.toml");
        assertTrue(f.steps().get(0) instanceof Feed.Dissolve);
    }

    @Test
    void problemsNameTheFileTheLineAndTheKey() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> FeedReader.parse("""
                title = "bad"
                [[add]]
                salt = "SnCl2.2H20"
                mass = "10 g"
                [[add]]
                salt = "CuS04"
                mass = "10 g"
                [[add]]
                acid = "HCl"
                volume = "10 mL"
                mass_fraction = "33 %"
                [[add]]
                acid = "H2SO4"
                volume = "10 mL"
                mass_fraction = "half"
                [[filter]]
                solid = "PbCl2"
                colour = "white"
                """, "bad.toml"));
        String m = e.getMessage();
        assertTrue(m.contains("bad.toml:0:0: volume: missing required value"), m);
        assertTrue(m.contains("bad.toml:3:") && m.contains("unknown salt 'SnCl2.2H20'; write the water of "
                + "crystallisation as e.g. 'SnCl2·2H2O'"), m);
        assertTrue(m.contains("no built-in density for 33 % HCl (known grades: 30 %, 32 %, 36 %, 37 %)"), m);
        assertTrue(m.contains("add[2].salt: unknown salt 'CuS04'; did you mean 'CuSO4'?"), m);
        assertTrue(m.contains("bad.toml:15:") && m.contains("add[4].mass_fraction: expected a mass fraction"), m);
        assertTrue(m.contains("filter[1].colour: unknown key"), m);
        assertTrue(m.contains("filter[1].mass: missing required value"), m);
    }
}
