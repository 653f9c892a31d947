package org.cellwright.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.cellwright.cell.Agitation;
import org.cellwright.cell.AgitationPreset;
import org.cellwright.cell.CellSetup;
import org.cellwright.cell.Compartments;
import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Electrode;
import org.cellwright.cell.Electrolyte;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.RunSettings;
import org.cellwright.cell.DepositSettings;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.Separator;
import org.cellwright.cell.StopCondition;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.Species;
import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.Test;

/**
 * Charge and every element are conserved, and nothing is ever NaN or negative, over 200 seeded random
 * valid scenarios with the built-in library: undivided, divided by each kind of separator (with or without
 * an anolyte of its own) and two-zone cells; runs that short and go on, or stop at the short. Conservation is
 * exact in the model (each partial current moves atoms by Faraday's law, the compartments exchange what one
 * loses and the other gains, a short carries the current past the electrodes), so the tolerance, 1e-9
 * relative, only covers round-off.
 */
class ConservationTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();
    private static final String[] CATIONS = {"Cu2+", "Sn2+", "Zn2+", "Ni2+", "Fe2+", "Fe3+", "Ag+", "Pb2+", "Sn4+", "Na+"};
    private static final String[] ANODES = {"graphite", "platinum", "mmo", "lead", "lead-silver", "copper", "tin",
            "nickel", "zinc", "silver", "titanium"};
    private static final String[] CATHODES = {"stainless", "titanium", "copper", "aluminium", "graphite"};

    @Test
    void chargeAndElementsAreConservedOverRandomScenarios() {
        long seed = Long.getLong("cellwright.seed", 7_2026_1201L);
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int n = 0; n < 200; n++) {
            Scenario sc = randomScenario(rnd);
            try {
                check(sc);
            } catch (AssertionError | RuntimeException e) {
                fail("seed " + seed + ", scenario " + n + " (" + sc + "): " + e.getMessage(), e);
            }
        }
    }

    private static Scenario randomScenario(SplittableRandom rnd) {
        Map<String, Double> comp = new LinkedHashMap<>();
        double positive = 0;
        int metals = 1 + rnd.nextInt(3);
        for (int i = 0; i < metals; i++) {
            String ion = CATIONS[rnd.nextInt(CATIONS.length)];
            double c = Math.pow(10, rnd.nextDouble(0, 2.7));
            comp.merge(ion, c, Double::sum);
        }
        if (rnd.nextDouble() < 0.8) {
            comp.put("H+", Math.pow(10, rnd.nextDouble(1, 3.3)));
        }
        for (var e : comp.entrySet()) {
            positive += e.getValue() * LIB.findSpecies(e.getKey()).orElseThrow().charge();
        }
        String anion = new String[] {"SO4^2-", "Cl-", "NO3-"}[rnd.nextInt(3)];
        int z = -LIB.findSpecies(anion).orElseThrow().charge();
        comp.put(anion, positive / z);
        double area = rnd.nextDouble(0.002, 0.03);
        double amps = area * rnd.nextDouble(20, 600);
        boolean voltageControl = rnd.nextDouble() < 0.2;
        PowerSupply supply = voltageControl
                ? new PowerSupply(ControlMode.VOLTAGE, 0, rnd.nextDouble(1.0, 4.0), Double.POSITIVE_INFINITY,
                        rnd.nextDouble() < 0.5 ? amps : Double.POSITIVE_INFINITY, List.of())
                : new PowerSupply(ControlMode.CURRENT, amps, 0,
                        rnd.nextDouble() < 0.5 ? rnd.nextDouble(2.0, 6.0) : Double.POSITIVE_INFINITY,
                        Double.POSITIVE_INFINITY, List.of());
        AgitationPreset preset = AgitationPreset.values()[rnd.nextInt(AgitationPreset.values().length)];
        double tempK = 288.15 + rnd.nextDouble(0, 45);
        double volume = rnd.nextDouble(0.0005, 0.005);
        double gap = rnd.nextDouble(0.005, 0.08);
        Compartments compartments = compartments(rnd, comp, volume);
        List<StopCondition> stops = rnd.nextDouble() < 0.3 ? List.of(new StopCondition.ShortCircuit()) : List.of();
        DepositSettings deposit = new DepositSettings(rnd.nextBoolean(), rnd.nextDouble(0.1e-6, 3e-6),
                rnd.nextDouble(3e-6, 20e-6), rnd.nextDouble(0.01, 1));
        return new Scenario("random", "", new Electrolyte(volume, tempK, comp, null),
                new Electrode(CATHODES[rnd.nextInt(CATHODES.length)], area),
                new Electrode(ANODES[rnd.nextInt(ANODES.length)], area * rnd.nextDouble(0.5, 2)),
                new CellSetup(gap, Agitation.of(preset), tempK - rnd.nextDouble(0, 5),
                        rnd.nextDouble(0, 0.05), null, compartments),
                supply, new RunSettings(rnd.nextDouble(600, 4 * 3600), 300, stops, null), List.of(), List.of(),
                deposit);
    }

    /** Half the scenarios undivided; the rest divided by each separator kind, or in two zones. */
    private static Compartments compartments(SplittableRandom rnd, Map<String, Double> comp, double volume) {
        double u = rnd.nextDouble();
        if (u < 0.5) {
            return Compartments.undivided();
        }
        Double anolyteVolume = rnd.nextBoolean() ? volume * rnd.nextDouble(0.2, 0.8) : null;
        Map<String, Double> anolyte = null;
        if (rnd.nextBoolean()) {
            anolyte = new LinkedHashMap<>();
            for (var e : comp.entrySet()) {
                anolyte.put(e.getKey(), e.getValue() * rnd.nextDouble(0, 2));
            }
        }
        if (u < 0.8) {
            Separator.Kind kind = Separator.Kind.values()[rnd.nextInt(Separator.Kind.values().length)];
            return new Compartments(Compartments.Kind.DIVIDED, anolyteVolume, anolyte, Separator.of(kind), 0);
        }
        return new Compartments(Compartments.Kind.ZONES, anolyteVolume, anolyte, null,
                Math.pow(10, rnd.nextDouble(-9, -6)));
    }

    private static void check(Scenario sc) {
        RunResult r = CellSimulation.withDefaults().run(sc, LIB, null);
        ReactionNetwork net = ReactionNetwork.of(LIB, sc);
        StateLayout layout = new CellRates(sc, net).layout();
        double[] y = r.finalState();
        for (TracePoint p : r.trace()) {
            for (double c : p.state().concentrationsMolPerM3()) {
                assertTrue(Double.isFinite(c) && c >= -1e-9, "concentration " + c + " at t = " + p.timeS());
            }
            if (p.state().anolyteConcentrationsMolPerM3() != null) {
                for (double c : p.state().anolyteConcentrationsMolPerM3()) {
                    assertTrue(Double.isFinite(c) && c >= -1e-9, "anolyte " + c + " at t = " + p.timeS());
                }
            }
            assertTrue(Double.isFinite(p.state().cellVoltageV()), "cell voltage NaN at t = " + p.timeS());
            assertTrue(Double.isFinite(p.state().temperatureK()), "temperature NaN at t = " + p.timeS());
        }
        double charge = y[layout.charge] - y[layout.shortCharge];
        double cathode = 0;
        double anode = 0;
        int nc = net.cathodeSlots.size();
        for (int k = 0; k < layout.slots; k++) {
            if (k < nc) {
                cathode += y[layout.reactionCharge0 + k];
            } else {
                anode += y[layout.reactionCharge0 + k];
            }
        }
        double scale = Math.max(Math.abs(y[layout.charge]), 1e-12);
        if (r.summary().shortCircuitS() == null) {
            assertEquals(0, y[layout.shortCharge], 1e-9 * scale, "no short, no charge through one");
        }
        assertEquals(-charge, cathode, 1e-9 * scale, "cathode partial charges");
        assertEquals(charge, anode, 1e-9 * scale, "anode partial charges");
        // each compartment stays electroneutral: what the electrodes take, migration brings back. Not one of the
        // projected invariants, so the finite-difference Jacobian leaves it at the 1e-8 level: tolerance 1e-7
        InstantState first = r.trace().get(0).state();
        InstantState last = r.trace().get(r.trace().size() - 1).state();
        double ions = ionic(net, first.concentrationsMolPerM3(), true);
        assertEquals(ionic(net, first.concentrationsMolPerM3(), false), ionic(net, last.concentrationsMolPerM3(), false),
                1e-7 * ions, "charge of the bath or catholyte");
        if (first.anolyteConcentrationsMolPerM3() != null) {
            assertEquals(ionic(net, first.anolyteConcentrationsMolPerM3(), false),
                    ionic(net, last.anolyteConcentrationsMolPerM3(), false),
                    1e-7 * Math.max(ions, ionic(net, first.anolyteConcentrationsMolPerM3(), true)), "charge of the anolyte");
        }
        double total = sc.electrolyte().volumeM3();
        double anolyte = sc.cell().compartments().twoCompartments()
                ? sc.cell().compartments().anolyteVolumeM3(total) : 0;
        double[] volumes = {total - anolyte, anolyte};
        Map<String, Double> before = inventory(net, layout, initial(sc, net, layout), volumes, null);
        Map<String, Double> after = inventory(net, layout, y, volumes, before);
        if (Boolean.getBoolean("debugFe")) {
            CellRates rr = new CellRates(sc, net);
            double[] y0 = rr.initialState();
            double[] f = new double[y0.length];
            rr.computeDerivatives(100, y0, f);
            double fe = 0;
            for (int j = 0; j < net.species().size(); j++) {
                fe += f[j] * sc.electrolyte().volumeM3() * net.species().get(j).elements().getOrDefault("Fe", 0);
            }
            for (int m = 0; m < layout.metals; m++) {
                if (net.depositMetals().get(m).symbol().equals("Fe")) fe += f[layout.deposit0 + m];
            }
            System.out.println("dFe/dt = " + fe + " species " + net.species() + " cath " + net.cathodeSlots.stream().map(q -> q.reaction().name()).toList() + " an " + net.anodeSlots.stream().map(q -> q.reaction().name()).toList() + " anodeMetal " + net.anodeMetal + " metals " + net.depositMetals());
        }
        for (String element : before.keySet()) {
            double b = before.get(element);
            double a = after.getOrDefault(element, 0.0);
            // scale: the element's inventory, or the moles of charge moved when the element came in from outside
            double moved = Math.abs(y[layout.charge]) / 96485.33212;
            assertEquals(b, a, 1e-9 * Math.max(Math.abs(b), moved), "element " + element);
        }
    }

    /** Sum of z c over the species (mol/m3 of charge), or of |z| c. */
    private static double ionic(ReactionNetwork net, double[] c, boolean absolute) {
        double sum = 0;
        for (int j = 0; j < c.length; j++) {
            int z = net.species().get(j).charge();
            sum += (absolute ? Math.abs(z) : z) * c[j];
        }
        return sum;
    }

    private static double[] initial(Scenario sc, ReactionNetwork net, StateLayout layout) {
        return new CellRates(sc, net).initialState();
    }

    /**
     * Atoms of each element in the bath, the deposits and the gases, less what came in from outside (the
     * soluble anode's metal, water consumed by reactions) and plus the water neutralisation made.
     */
    private static Map<String, Double> inventory(ReactionNetwork net, StateLayout layout, double[] y,
                                                 double[] volumes, Map<String, Double> reference) {
        Map<String, Double> atoms = new HashMap<>();
        List<Species> species = net.species();
        double hPlusOh = 0;
        int[] offsets = layout.twoCompartments ? new int[] {0, layout.anolyte0} : new int[] {0};
        for (int b = 0; b < offsets.length; b++) {
            double volume = layout.twoCompartments ? volumes[b] : volumes[0] + volumes[1];
            double[] c = concentrations(net, y, offsets[b]);
            for (int j = 0; j < species.size(); j++) {
                for (var e : species.get(j).elements().entrySet()) {
                    atoms.merge(e.getKey(), c[j] * volume * e.getValue(), Double::sum);
                }
            }
            if (net.waterEquilibrium()) {
                hPlusOh += (c[net.hIndex] + c[net.ohIndex]) * volume;
            }
        }
        for (int m = 0; m < layout.metals; m++) {
            atoms.merge(net.depositMetals().get(m).symbol(), y[layout.deposit0 + m], Double::sum);
        }
        String[][] gasAtoms = {{"H"}, {"O"}, {"Cl"}};
        for (int g = 0; g < StateLayout.GASES.length; g++) {
            atoms.merge(gasAtoms[g][0], 2 * y[layout.gas0 + g], Double::sum);
        }
        if (net.anodeMetal != null) {
            atoms.merge(net.anodeMetal.symbol(), -y[layout.anodeDissolved], Double::sum);
        }
        double water = y[layout.water];
        if (net.waterEquilibrium() && reference != null) {
            double turnover = y[layout.protonTurnover];
            double start = START.get();
            water -= (turnover - hPlusOh + start) / 2;
        } else if (net.waterEquilibrium()) {
            START.set(hPlusOh);
        }
        atoms.merge("H", -2 * water, Double::sum);
        atoms.merge("O", -water, Double::sum);
        return atoms;
    }

    private static final ThreadLocal<Double> START = ThreadLocal.withInitial(() -> 0.0);

    private static double[] concentrations(ReactionNetwork net, double[] y, int offset) {
        double[] c = new double[net.species().size()];
        for (int j = 0; j < c.length; j++) {
            c[j] = y[offset + j];
        }
        if (net.waterEquilibrium()) {
            double h = y[offset + net.hIndex];
            double kw = OperatingPoint.WATER_ION_PRODUCT;
            double hPlus = h >= 0 ? 0.5 * (h + Math.sqrt(h * h + 4 * kw)) : 2 * kw / (-h + Math.sqrt(h * h + 4 * kw));
            c[net.hIndex] = hPlus;
            c[net.ohIndex] = kw / hPlus;
        }
        return c;
    }
}
