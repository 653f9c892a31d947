package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.cell.SpeciesOverride;
import org.cellwright.cell.StopCondition;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Writing scenarios: readable units, and read, write, read gives an equal scenario (record equality). */
class ScenarioWriterTest {

    private final ScenarioReader reader = new ScenarioReader(LibraryFixture.library());

    /** Writes without and with the library (amount units only, or g/L where shorter); both must agree. */
    private Scenario roundTrip(Scenario s) {
        Scenario plain = readBack(ScenarioWriter.write(s));
        Scenario withMasses = readBack(ScenarioWriter.write(s, LibraryFixture.library()));
        assertEquals(plain, withMasses);
        return plain;
    }

    private Scenario readBack(String text) {
        try {
            return reader.parse(text, "written.toml", List.of()).scenario();
        } catch (ScenarioException e) {
            throw new AssertionError("written text does not read back:\n" + text + "\n" + e.getMessage(), e);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"tin-stripping-liquor.toml", "copper-etchant-bleed.toml", "nickel-voltage-control.toml",
        "silver-plating-shop-units.toml", "defaults.toml"})
    void readWriteReadGivesAnEqualScenario(String file) throws ScenarioException {
        Scenario first = reader.read(ScenarioFiles.path("valid/" + file));
        assertEquals(first, roundTrip(first), () -> ScenarioWriter.write(first));
    }

    @Test
    void voltageScheduleRoundTrips() throws ScenarioException {
        Scenario s = reader.read(ScenarioFiles.path("valid/nickel-voltage-control.toml"), List.of(
                "supply.schedule=[{at=\"0 s\", voltage=\"2 V\"}, {at=\"10 min\", voltage=\"2.6 V\", ramp=true}]"));
        assertEquals(ControlMode.VOLTAGE, s.supply().mode());
        assertEquals(2, s.supply().schedule().size());
        assertEquals(s, roundTrip(s));
    }

    @Test
    void unitsAreReadable() throws ScenarioException {
        String text = ScenarioWriter.write(reader.read(ScenarioFiles.path("valid/tin-stripping-liquor.toml")),
                LibraryFixture.library());
        for (String expected : List.of("volume = \"0.8 L\"", "temperature = \"25 C\"", "area = \"1.2 dm2\"",
                "gap = \"35 mm\"", "ambient = \"22 C\"", "current = \"3 A\"", "voltage_limit = \"12 V\"",
                "duration = \"4 h\"", "output_interval = \"1 min\"", "\"H+\" = \"1.5 mol/L\"",
                "\"Sn2+\" = \"40 g/L\"", "stop = [\"short\", \"Sn2+ < 2 g/L\", \"T > 60 C\", \"U > 8 V\", \"Sn > 100 g\"]",
                "target = \"Sn\"")) {
            assertTrue(text.contains(expected), () -> "missing " + expected + " in\n" + text);
        }
        String copper = ScenarioWriter.write(reader.read(ScenarioFiles.path("valid/copper-etchant-bleed.toml")));
        String silver = ScenarioWriter.write(reader.read(ScenarioFiles.path("valid/silver-plating-shop-units.toml")));
        for (String expected : List.of("volume = \"18.92705892 L\"", "area = \"9.290304 dm2\"", "gap = \"50.8 mm\"",
                "\"Ag > 907.18474 g\"", "\"NO3-\" = \"0.25 mol/L\"")) {
            assertTrue(silver.contains(expected), () -> "missing " + expected + " in\n" + silver);
        }
        for (String expected : List.of("{ at = \"1.5 h\", current = \"9 A\", ramp = true }", "[species.\"Cu2+\"]",
                "conductivity = \"107.2 S cm2/mol\"", "[reaction.\"H+/H2\"]", "i0 = \"5e-7 A/m2\"", "alpha_c = 0.5",
                "contact_resistance = \"4 mohm\"", "heat_loss = \"2.5 W/K\"", "agitation = \"sparged\"")) {
            assertTrue(copper.contains(expected), () -> "missing " + expected + " in\n" + copper);
        }
    }

    @Test
    void writesAFileThatReadsBack(@TempDir Path dir) throws Exception {
        Scenario s = reader.read(ScenarioFiles.path("valid/copper-etchant-bleed.toml"));
        Path file = dir.resolve("written.toml");
        ScenarioWriter.write(s, LibraryFixture.library(), file);
        assertEquals(s, reader.read(file));
    }

    /**
     * Random scenarios with values that have no short decimal form: each must come back bit for bit. The
     * seed is printed on failure.
     */
    @Test
    void randomScenariosRoundTripExactly() throws ScenarioException {
        long seed = 20240611L;
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int i = 0; i < 80; i++) {
            Scenario s = random(rnd);
            Scenario back = roundTrip(s);
            int n = i;
            assertEquals(s, back, () -> "seed " + seed + ", scenario " + n + ":\n" + ScenarioWriter.write(s));
        }
    }

    private static double logUniform(SplittableRandom r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    private static Scenario random(SplittableRandom r) {
        Map<String, Double> composition = new LinkedHashMap<>();
        composition.put("Cu2+", logUniform(r, 1, 2000));
        composition.put("SO4^2-", composition.get("Cu2+") * (0.95 + 0.1 * r.nextDouble()));
        if (r.nextBoolean()) {
            composition.put("Fe3+", r.nextBoolean() ? 0.0 : logUniform(r, 1e-3, 10));
        }
        Double kappa = r.nextBoolean() ? null : logUniform(r, 0.1, 80);
        Electrolyte e = new Electrolyte(logUniform(r, 1e-5, 20), 273.15 + 100 * r.nextDouble(), composition, kappa);
        Electrode cathode = new Electrode("stainless", logUniform(r, 1e-5, 3));
        Electrode anode = new Electrode("lead-calcium", logUniform(r, 1e-5, 3));
        Agitation agitation = r.nextBoolean()
                ? Agitation.of(AgitationPreset.values()[r.nextInt(AgitationPreset.values().length)])
                : Agitation.ofLayer(logUniform(r, 2e-6, 1e-3));
        CellSetup cell = new CellSetup(logUniform(r, 1e-3, 0.5), agitation, 223.15 + 110 * r.nextDouble(),
                r.nextBoolean() ? 0.0 : logUniform(r, 1e-4, 2), r.nextBoolean() ? null : logUniform(r, 0.01, 50));
        ControlMode mode = r.nextBoolean() ? ControlMode.CURRENT : ControlMode.VOLTAGE;
        List<SetPoint> schedule = new ArrayList<>();
        if (r.nextBoolean()) {
            double t = r.nextBoolean() ? 0 : logUniform(r, 1, 100);
            for (int k = 0; k < 1 + r.nextInt(4); k++) {
                schedule.add(new SetPoint(t, logUniform(r, 0.01, 50), k > 0 && r.nextBoolean()));
                t += logUniform(r, 1, 1e5);
            }
        }
        double set = schedule.isEmpty() ? logUniform(r, 0.01, 50) : schedule.get(0).value();
        PowerSupply supply = new PowerSupply(mode, mode == ControlMode.CURRENT ? set : 0,
                mode == ControlMode.VOLTAGE ? set : 0,
                mode == ControlMode.CURRENT && r.nextBoolean() ? logUniform(r, 1, 30) : Double.POSITIVE_INFINITY,
                mode == ControlMode.VOLTAGE && r.nextBoolean() ? logUniform(r, 0.1, 100) : Double.POSITIVE_INFINITY,
                schedule);
        List<StopCondition> stops = new ArrayList<>();
        if (r.nextBoolean()) {
            stops.add(new StopCondition.ShortCircuit());
        }
        if (r.nextBoolean()) {
            stops.add(new StopCondition.SpeciesBelow("Cu2+", logUniform(r, 0.01, 100)));
        }
        if (r.nextBoolean()) {
            stops.add(new StopCondition.TemperatureAbove(273.15 + 100 * r.nextDouble()));
        }
        if (r.nextBoolean()) {
            stops.add(new StopCondition.VoltageAbove(logUniform(r, 0.5, 40)));
        }
        if (r.nextBoolean()) {
            stops.add(new StopCondition.DepositAbove("Cu", logUniform(r, 1e-4, 10)));
        }
        RunSettings run = new RunSettings(logUniform(r, 10, 1e6), logUniform(r, 0.1, 600), stops,
                r.nextBoolean() ? "Cu" : null);
        List<SpeciesOverride> species = r.nextBoolean() ? List.of() : List.of(new SpeciesOverride("Cu2+",
                r.nextBoolean() ? 2 : null, r.nextBoolean() ? logUniform(r, 0.01, 0.3) : null,
                logUniform(r, 1e-10, 1e-8), r.nextBoolean() ? logUniform(r, 1e-3, 5e-2) : null));
        List<ReactionOverride> reactions = r.nextBoolean() ? List.of() : List.of(new ReactionOverride("Cu2+/Cu",
                null, r.nextDouble() - 0.5, logUniform(r, 1e-9, 100), r.nextDouble(), r.nextDouble() * 2,
                r.nextBoolean() ? "stainless" : null));
        return new Scenario("run " + r.nextInt(1000) + " \"quoted\" \\ back", r.nextBoolean() ? "" : "line one\nline two",
                e, cathode, anode, cell, supply, run, species, reactions);
    }
}
