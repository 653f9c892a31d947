package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.cellwright.cell.Scenario;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The makeup command: its block pastes into a scenario, and a feed that cannot be made is bad input. */
class MakeupCommandTest {

    @Test
    void theBlockOfTheCopperExampleIsTheBathOfTheShippedScenario(@TempDir Path dir) throws Exception {
        CliRun r = CliRun.of("makeup", Path.of("examples", "copper-sulfate-makeup.toml").toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("[electrolyte.composition]\n\"Cu2+\" = \"20 g/L\"\n"), r.out());
        // the whole output is TOML: paste it in place of the scenario's [electrolyte] tables
        String scenario = Files.readString(Path.of("scenarios", "copper-etchant-bleed.toml"));
        int from = scenario.indexOf("[electrolyte]");
        int to = scenario.indexOf("[cathode]");
        Path pasted = dir.resolve("pasted.toml");
        Files.writeString(pasted, scenario.substring(0, from) + r.out() + "\n" + scenario.substring(to));
        Scenario sc = new ScenarioReader(LibraryReader.builtIn()).read(pasted);
        // source: the shipped scenario's bath: 20 g/L Cu2+, 1.0 mol/L H+, 0.815 mol/L SO4^2- in 2 L; the
        // example's 157.2 g CuSO4.5H2O and 55.7 mL of 96 % H2SO4 were worked out by hand to give it (4 digits)
        assertEquals(1000.0, sc.electrolyte().compositionMolPerM3().get("H+"), 1.5);
        assertEquals(815.0, sc.electrolyte().compositionMolPerM3().get("SO4^2-"), 0.5);
        assertEquals(2e-3, sc.electrolyte().volumeM3(), 1e-15);
    }

    @Test
    void theSilverExampleFlagsSilverChloride() {
        CliRun r = CliRun.of("makeup", Path.of("examples", "silver-nitrate-makeup.toml").toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("# ! silver chloride:"), r.out());
        assertTrue(r.out().contains("3 Ag + 4 HNO3 -> 3 AgNO3 + NO + 2 H2O"), r.out());
    }

    @Test
    void aStepThatCannotBeDoneIsBadInputNamingTheLine(@TempDir Path dir) throws Exception {
        Path feed = dir.resolve("feed.toml");
        Files.writeString(feed, """
                volume = "1 L"
                [[add]]
                acid = "HCl"
                mass = "10 g"
                [[dissolve]]
                metal = "Sn"
                mass = "30 g"
                """);
        CliRun r = CliRun.of("makeup", feed.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("feed.toml:5: dissolve[1]: dissolving 30.00 g of Sn takes"), r.err());
        assertEquals(2, CliRun.of("makeup", dir.resolve("none.toml").toString()).code());
    }
}
