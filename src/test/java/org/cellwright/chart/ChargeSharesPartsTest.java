package org.cellwright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
import org.cellwright.sim.CellSimulation;
import org.cellwright.sim.RunResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * Where the charge went, split by reaction: each electrode's parts sum to the charge passed (Kirchhoff at
 * each electrode), the metal's part agrees with the deposit by Faraday's law, the deposit redissolved by the
 * bath's oxidants is a part of its own, and after a dendrite short the bypassed charge is the current times
 * the time since the short.
 */
class ChargeSharesPartsTest {

    /** source: CODATA 2018, F = N_A e, exact. */
    private static final double FARADAY = 96485.33212;
    /** source: IUPAC (CIAAW 2013) standard atomic weights: Sn 118.710, Cu 63.546 g/mol. */
    private static final double SN_KG = 0.118710;
    private static final double CU_KG = 0.063546;

    private static ChemLibrary lib;

    @BeforeAll
    static void load() {
        lib = LibraryReader.builtIn();
    }

    private static RunResult run(String name, String... sets) throws Exception {
        var s = new ScenarioReader(lib).load(Path.of("scenarios", name + ".toml"), List.of(sets)).scenario();
        return CellSimulation.withDefaults().run(s, lib, null);
    }

    private static double sum(List<ChargeShares.Part> parts, String electrode) {
        return parts.stream().filter(p -> p.electrode().equals(electrode)).mapToDouble(ChargeShares.Part::chargeC)
                .sum();
    }

    @ParameterizedTest
    @ValueSource(strings = {"copper-etchant-bleed", "silver-nitrate-refining", "tin-shuttle-efficiency",
        "tin-stripping-liquor", "tin-dilute-sponge", "tin-divided-cell", "tin-narrow-gap-dendrites"})
    void eachElectrodesPartsSumToTheChargePassed(String name) throws Exception {
        RunResult r = run(name);
        List<ChargeShares.Part> parts = ChargeShares.parts(r, lib);
        double q = r.summary().chargeC();
        for (String electrode : List.of("cathode", "anode")) {
            // source: Kirchhoff's current law at each electrode; the engine solves the electrode potentials to
            // far below 1e-6 of the current, so 1e-6 of the charge bounds the integrated mismatch
            assertEquals(q, sum(parts, electrode), 1e-6 * q, name + " " + electrode);
            double shares = parts.stream().filter(p -> p.electrode().equals(electrode))
                    .mapToDouble(ChargeShares.Part::share).sum();
            assertEquals(1, shares, 1e-6, name + " " + electrode + " shares");
        }
        boolean shorted = r.summary().shortCircuitS() != null;
        assertEquals(shorted, parts.stream().anyMatch(p -> p.words().equals(ChargeShares.SHORT)), name);
    }

    @Test
    void theCopperPartAgreesWithTheDepositByFaradaysLaw() throws Exception {
        RunResult r = run("copper-etchant-bleed");
        double cu = ChargeShares.parts(r, lib).stream().filter(p -> p.words().equals("depositing Cu"))
                .mapToDouble(ChargeShares.Part::chargeC).sum();
        // Cu2+/Cu takes 2 electrons per atom and Cu+/Cu one (when the scenario's chemistry has it); the
        // summary gives each reaction's charge
        double viaCu1 = -r.summary().reactionChargeC().getOrDefault("cathode:Cu+/Cu", 0.0);
        double viaCu2 = -r.summary().reactionChargeC().get("cathode:Cu2+/Cu");
        assertEquals(viaCu1 + viaCu2, cu, 1e-9 * cu);
        // source: Faraday's law, m = Q M / (n F); 1e-4 covers the library's molar mass of Cu against IUPAC's
        double kg = (viaCu2 / 2 + viaCu1) / FARADAY * CU_KG;
        assertEquals(kg, r.summary().depositKg().get("Cu"), kg * 1e-4);
    }

    @Test
    void theDepositRedissolvedIsAPartOfItsOwn() throws Exception {
        // tin deposited at 1.5 A for 2 h, then 0.05 A: the Sn4+ the anode makes takes tin back from the deposit
        RunResult r = run("tin-shuttle-efficiency",
                "supply.schedule=[{at=\"0 h\", current=\"1.5 A\"}, {at=\"2 h\", current=\"0.05 A\"}]",
                "run.duration=\"4 h\"", "run.stop=[]");
        List<ChargeShares.Part> parts = ChargeShares.parts(r, lib);
        ChargeShares.Part back = parts.stream().filter(ChargeShares.Part::corrosion).findFirst().orElseThrow();
        assertEquals("redissolving the Sn deposit", back.words());
        assertTrue(back.chargeC() < 0, "against the cathode's direction");
        double corroded = r.summary().corrodedKg().get("Sn");
        assertTrue(corroded > 1e-4, "a tenth of a gram or more redissolves: " + corroded);
        // source: Faraday's law with Sn -> Sn2+ + 2 e-, M(Sn) from IUPAC; 1e-4 for the library's molar mass
        assertEquals(-corroded / SN_KG * 2 * FARADAY, back.chargeC(), Math.abs(back.chargeC()) * 1e-4);
        ChargeShares.Part tin = parts.stream().filter(p -> p.words().equals("depositing Sn")).findFirst().orElseThrow();
        double net = (r.summary().depositKg().get("Sn")) / SN_KG * 2 * FARADAY;
        assertEquals(net, tin.chargeC() + back.chargeC(), net * 1e-4, "gross deposition less what went back is the"
                + " deposit left");
        assertTrue(tin.share() > 0.8 && tin.share() + back.share() < 0.7, tin + " " + back);
        assertEquals(r.summary().chargeC(), sum(parts, "cathode"), 1e-6 * r.summary().chargeC());
    }

    @Test
    void aShortsBypassIsTheCurrentTimesTheTimeSinceTheShort() throws Exception {
        RunResult r = run("tin-narrow-gap-dendrites");
        Double ts = r.summary().shortCircuitS();
        assertTrue(ts != null, "this scenario shorts");
        ChargeShares.Part bypass = ChargeShares.parts(r, lib).stream()
                .filter(p -> p.electrode().equals("anode") && p.words().equals(ChargeShares.SHORT)).findFirst()
                .orElseThrow();
        // source: the scenario holds 2 A; after the short no reaction runs, so the bypass is 2 A (T - ts);
        // 1e-6 relative: the short's time is located by the engine's event search to far better
        assertEquals(2.0 * (r.summary().durationS() - ts), bypass.chargeC(), 1e-6 * bypass.chargeC());
        assertFalse(bypass.corrosion());
    }
}
