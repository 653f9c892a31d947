package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * The hot-bath and nitrate cautions fire where the bath asks for them and nowhere else, on the shipped
 * scenarios (some with a value changed as `run --set` would).
 */
class HotBathAndNitrateCautionsTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();

    private static RunResult run(String file, String... sets) throws Exception {
        var sc = new ScenarioReader(LIB).read(Path.of("scenarios", file), List.of(sets));
        return CellSimulation.withDefaults().run(sc, LIB, null);
    }

    private static boolean has(RunResult r, String topic) {
        return r.summary().warnings().stream().anyMatch(w -> w.startsWith(topic + ":"));
    }

    private static double maxC(RunResult r) {
        return r.trace().stream().mapToDouble(p -> p.state().temperatureK()).max().orElseThrow() - 273.15;
    }

    @Test
    void aBathAt45CIsNotHotAndOneAt60CIs() throws Exception {
        // source: scenarios/copper-electrowinning.toml runs at 45 C; the threshold is 50 C (common practice)
        RunResult warm = run("copper-electrowinning.toml");
        assertTrue(maxC(warm) < 50, "the shipped run stays below 50 C: " + maxC(warm));
        assertFalse(has(warm, "Hot bath"), warm.summary().warnings().toString());
        RunResult hot = run("copper-electrowinning.toml", "electrolyte.temperature=\"60 C\"");
        assertTrue(has(hot, "Hot bath"), hot.summary().warnings().toString());
        String w = hot.summary().warnings().stream().filter(s -> s.startsWith("Hot bath")).findFirst().orElseThrow();
        // the caution names the highest temperature of the run (at least the 60 C it starts at)
        assertTrue(w.matches("Hot bath: the bath reaches (6\\d|[7-9]\\d) C\\..*"), w);
        assertTrue(w.contains("scalds") && w.contains("covered") && w.contains("heat-resistant gloves")
                && w.contains("safety data sheets"), w);
    }

    @Test
    void silverNitrateWithAcidGivesTheNitrateCaution() throws Exception {
        // source: scenarios/silver-nitrate-refining.toml: 0.521 mol/L NO3-, 0.15 mol/L H+
        RunResult r = run("silver-nitrate-refining.toml");
        assertTrue(has(r, "Nitrate"), r.summary().warnings().toString());
        String w = r.summary().warnings().stream().filter(s -> s.startsWith("Nitrate")).findFirst().orElseThrow();
        assertTrue(w.contains("nitrogen oxides") && w.contains("fume extraction"), w);
        assertFalse(has(r, "Hot bath"), "a 25 C bath is not hot");
    }

    @Test
    void aNitrateBathWithoutFreeAcidGetsNoNitrateCaution() throws Exception {
        // neutral silver nitrate: the H+ replaced by more silver (electroneutral: 0.521 mol/L of each)
        RunResult r = run("silver-nitrate-refining.toml", "electrolyte.composition.\"H+\"=\"1e-5 mol/L\"",
                "electrolyte.composition.\"Ag+\"=\"0.521 mol/L\"");
        assertFalse(has(r, "Nitrate"), r.summary().warnings().toString());
    }

    @Test
    void sulfateAndChlorideBathsGetNeither() throws Exception {
        for (String f : List.of("copper-plating-rundown.toml", "zinc-electrowinning.toml",
                "copper-etchant-bleed.toml", "tin-stripping-liquor.toml")) {
            RunResult r = run(f);
            assertFalse(has(r, "Nitrate"), f + ": " + r.summary().warnings());
            assertFalse(has(r, "Hot bath"), f + ": " + r.summary().warnings());
        }
    }
}
