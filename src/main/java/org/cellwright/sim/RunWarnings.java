package org.cellwright.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.PhysicalConstants;

/**
 * The cautions a run triggers (chlorine, hydrogen, acid, lead, electrical) and notes on the validity of the
 * data and on hydrolysis or precipitation risk. Each caution defers to local codes, safety data sheets and
 * licensed practice.
 */
final class RunWarnings {

    /** Molar volume of an ideal gas at 0 C and 1 atm (L/mol); CODATA 2018: 22.413 969 54 L/mol. */
    static final double STP_L_PER_MOL = 22.41396954;
    /** Solubility product of PbSO4 at 25 C ((mol/L)^2); CRC Handbook, Solubility product constants: 2.53e-8. */
    static final double KSP_PBSO4 = 2.53e-8;
    /**
     * Bath temperature from which a run is cautioned as a hot bath (C): scalds and hot acid splashes (common
     * practice: above about 50 C hot water scalds skin within seconds).
     */
    static final double HOT_BATH_C = 50;
    /** Free acid from which a bath counts as acid (mol/L H+, pH below about 1.3), as the acid caution. */
    static final double ACID_MOL_PER_L = 0.05;
    /** Nitrate from which a bath counts as a nitrate bath (mol/L): about 0.6 g/L of NO3- (common practice). */
    static final double NITRATE_MOL_PER_L = 0.01;
    /** Solubility product of PbCl2 at 25 C ((mol/L)^3); CRC Handbook, Solubility product constants: 1.70e-5. */
    static final double KSP_PBCL2 = 1.70e-5;

    private final Scenario sc;
    private final ReactionNetwork net;
    private final List<TracePoint> trace;
    private final Map<String, Double> gasMol;
    private final List<String> out = new ArrayList<>();
    private Double shortS;
    private Double forecastS;
    private double endS;

    RunWarnings(Scenario sc, ReactionNetwork net, List<TracePoint> trace, Map<String, Double> gasMol) {
        this.sc = sc;
        this.net = net;
        this.trace = trace;
        this.gasMol = gasMol;
    }

    /**
     * @param shortTimeS time a dendrite shorted the cell (s), or null
     * @param forecast when one would at the end conditions (s), or null
     * @param runEndS when the run ended (s)
     */
    RunWarnings shortCircuit(Double shortTimeS, Double forecast, double runEndS) {
        this.shortS = shortTimeS;
        this.forecastS = forecast;
        this.endS = runEndS;
        return this;
    }

    List<String> list() {
        dendrites();
        depositForm();
        chlorine();
        hydrogen();
        acid();
        hotBath();
        nitrate();
        lead();
        electrical();
        validity();
        tinChemistry();
        return out;
    }

    private double litres(String gas) {
        return gasMol.getOrDefault(gas, 0.0) * STP_L_PER_MOL;
    }

    private double maxConcentration(String species) {
        int j = net.indexOf(species);
        if (j < 0) {
            return 0;
        }
        double max = 0;
        for (TracePoint p : trace) {
            max = Math.max(max, p.state().concentrationsMolPerM3()[j]);
        }
        return max / 1000;
    }

    private double minConcentration(String species) {
        int j = net.indexOf(species);
        double min = Double.POSITIVE_INFINITY;
        for (TracePoint p : trace) {
            min = Math.min(min, p.state().concentrationsMolPerM3()[j]);
        }
        return min / 1000;
    }

    private void dendrites() {
        String metal = net.targetMetal() == null ? "metal" : net.targetMetal().symbol();
        double gapMm = sc.cell().gapM() * 1000;
        if (shortS != null) {
            boolean stopped = sc.run().stopsOnShort();
            out.add(String.format(Locale.ROOT, "Short circuit: at %s a %s dendrite bridged the %.3g mm gap. %s"
                    + " Widen the gap, stir the bath, or lower the current to keep the deposit away from its"
                    + " limiting current%s.", RunClock.format(shortS), metal, gapMm, stopped
                    ? "The run stopped there, as run.stop asks."
                    : "From then on the supply's current flowed through the short: the cell voltage collapsed,"
                    + " no more " + metal + " was won and the leads and the short carried the whole current.",
                    stopped ? "" : "; add \"short\" to run.stop to end a run there"));
        } else if (forecastS != null) {
            TracePoint last = trace.get(trace.size() - 1);
            out.add(String.format(Locale.ROOT, "Dendrites: at the end the tallest %s dendrite stands %.3g mm high"
                    + " in the %.3g mm gap; at the end conditions it would reach the anode %s later and short"
                    + " the cell.", metal, last.state().dendriteHeightM() * 1000, gapMm,
                    RunClock.format(forecastS - endS)));
        }
    }

    private void depositForm() {
        String form = null;
        for (int i = trace.size() - 1; i >= 0 && form == null; i--) {
            form = trace.get(i).state().morphology();
        }
        if (form == null || net.targetMetal() == null) {
            return;
        }
        String metal = net.targetMetal().symbol();
        if (form.equals("powdery")) {
            out.add(String.format(Locale.ROOT, "Deposit form: the last %s deposited is powdery or spongy: the %s supply"
                    + " to the cathode is at its limit. A sponge sheds, traps electrolyte and redissolves; lower the"
                    + " current, stir, or keep the bath richer.", metal, metal));
        } else if (form.equals("dendritic")) {
            out.add(String.format(Locale.ROOT, "Deposit form: the last %s deposited is dendritic (near its limiting"
                    + " current): loose crystals that grow toward the anode. Lower the current or stir%s.", metal,
                    sc.deposit().additives() ? "" : ", or use additives"));
        }
    }

    private void chlorine() {
        double l = litres("Cl2");
        if (l > 1e-4) {
            out.add(String.format(Locale.ROOT, "Chlorine: the inert %s anode in a chloride bath gives off about %.3g L"
                    + " of chlorine (0 C, 1 atm). Chlorine is a toxic gas: run under fume extraction and follow"
                    + " local codes and the safety data sheets.", sc.anode().material(), l));
        }
    }

    /**
     * Hydrogen worth a caution: more than 0.1 mL and more than 0.1 % of the charge passed. A cell that passes
     * 7200 A h with a few millilitres of hydrogen (a copper tankhouse cell) is not cautioned; a bench cell
     * losing a tenth of a percent of its charge to hydrogen is (common practice: hydrogen is a hazard where it
     * collects under lids and hoods, so small cells are cautioned early).
     */
    private void hydrogen() {
        double l = litres("H2");
        double charge = trace.isEmpty() ? 0 : trace.get(trace.size() - 1).chargeC();
        double share = charge > 0 ? gasMol.getOrDefault("H2", 0.0) * 2 * PhysicalConstants.FARADAY / charge : 0;
        if (l > 1e-4 && share > 1e-3) {
            out.add(String.format(Locale.ROOT, "Hydrogen: the cathode gives off about %.3g L of hydrogen (0 C, 1 atm),"
                    + " which forms explosive mixtures with air (4 to 75 %% by volume). Ventilate; keep sparks and"
                    + " flames away from the cell.", l));
        }
    }

    private void acid() {
        double h = maxConcentration("H+");
        if (h >= ACID_MOL_PER_L) {
            out.add(String.format(Locale.ROOT, "Acid: the bath holds %.2g mol/L of acid, which burns skin and eyes."
                    + " Wear eye protection, gloves and an apron; keep water and a neutraliser at hand.", h));
        }
    }

    /** A bath at or above {@link #HOT_BATH_C} at any time of the run (common practice). */
    private void hotBath() {
        double tMax = trace.stream().mapToDouble(p -> p.state().temperatureK()).max().orElse(298.15) - 273.15;
        if (tMax >= HOT_BATH_C) {
            out.add(String.format(Locale.ROOT, "Hot bath: the bath reaches %.0f C. Hot electrolyte scalds, and hot"
                    + " acid splashes burn deeper and fume more than cold: keep the tank covered, wear heat-resistant"
                    + " gloves and a face shield, and follow local codes and the safety data sheets.", tMax));
        }
    }

    /**
     * Nitrate with free acid (common practice: nitric acid and acid nitrate baths give off nitrogen oxides, NO
     * turning to brown NO2 in air, when hot, concentrated or dissolving metal). The engine has no nitrate
     * reduction, so it cannot give the volume: the caution is raised by the bath alone.
     */
    private void nitrate() {
        double no3 = maxConcentration("NO3-");
        if (no3 >= NITRATE_MOL_PER_L && maxConcentration("H+") >= ACID_MOL_PER_L) {
            out.add(String.format(Locale.ROOT, "Nitrate: the bath holds %.2g mol/L of nitrate with acid. Nitric acid"
                    + " and nitrate baths can give off nitrogen oxides (toxic brown fumes), the more so when hot,"
                    + " concentrated or when metal dissolves in them: run under fume extraction and follow local"
                    + " codes and the safety data sheets.", no3));
        }
    }

    private void lead() {
        boolean leadInBath = net.indexOf("Pb2+") >= 0 && maxConcentration("Pb2+") > 0;
        boolean leadAnode = sc.anode().material().startsWith("lead") || sc.cathode().material().startsWith("lead");
        if (leadInBath || leadAnode) {
            out.add("Lead: lead and its salts are toxic. Keep the bath, sludge and rinse water out of drains,"
                    + " wash hands, and follow local rules for lead-bearing waste.");
        }
        if (leadInBath) {
            double pb = maxConcentration("Pb2+");
            double so4 = maxConcentration("SO4^2-");
            double cl = maxConcentration("Cl-");
            if (pb * so4 > KSP_PBSO4) {
                out.add("Precipitation: lead sulfate exceeds its solubility product here and will settle as sludge.");
            }
            if (pb * cl * cl > KSP_PBCL2) {
                out.add("Precipitation: lead chloride exceeds its solubility product (about 10 g/L at 20 C) and may crystallise.");
            }
        }
    }

    private void electrical() {
        double maxA = trace.stream().mapToDouble(p -> p.state().currentA()).max().orElse(0);
        if (maxA >= 5) {
            out.add(String.format(Locale.ROOT, "Electrical: up to %.3g A flows; a short between the electrodes can"
                    + " overheat leads and the supply. Fuse the circuit and insulate the bus bars.", maxA));
        }
    }

    private void validity() {
        double tMin = trace.stream().mapToDouble(p -> p.state().temperatureK()).min().orElse(298.15) - 273.15;
        double tMax = trace.stream().mapToDouble(p -> p.state().temperatureK()).max().orElse(298.15) - 273.15;
        if (tMin < 10 || tMax > 70) {
            out.add(String.format(Locale.ROOT, "Data validity: the bath runs at %.0f to %.0f C; the library's kinetic"
                    + " and transport data are for about 10 to 70 C.", tMin, tMax));
        }
        double ionic = 0;
        double[] c = trace.get(0).state().concentrationsMolPerM3();
        for (int j = 0; j < c.length; j++) {
            int z = net.species().get(j).charge();
            ionic += 0.5 * z * z * c[j] / 1000;
        }
        if (ionic > 3) {
            out.add(String.format(Locale.ROOT, "Data validity: the ionic strength (%.1f mol/L) is above that of the"
                    + " single-salt tables the conductivity model was checked against (about 2 mol/L); in sulfate"
                    + " tankhouse baths it stays within about 10 %% of plant figures (docs/validation.md). Read the"
                    + " ohmic drop with that margin.", ionic));
        }
    }

    private void tinChemistry() {
        if (net.indexOf("Sn2+") >= 0 && maxConcentration("Sn2+") > 0) {
            double acid = net.indexOf("H+") >= 0 ? minConcentration("H+") : 0;
            boolean chloride = maxConcentration("Cl-") > 0.1;
            double needed = chloride ? 0.3 : 0.03;
            if (acid < needed) {
                out.add(String.format(Locale.ROOT, "Hydrolysis: with %.2g mol/L of free acid, tin(II) may hydrolyse"
                        + " to basic salts (turbidity, sludge); keep at least %.2g mol/L in a %s bath.", acid, needed,
                        chloride ? "chloride" : "sulfate"));
            }
        }
        if (net.indexOf("Sn4+") >= 0) {
            double sn4 = maxConcentration("Sn4+") * 118.71;
            if (sn4 > 1) {
                out.add(String.format(Locale.ROOT, "Tin(IV) builds up to %.2g g/L: it steals cathode current (reduced"
                        + " back to tin(II)) and hydrolyses to a stannic sludge.", sn4));
            }
        }
    }
}
