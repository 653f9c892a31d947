package org.cellwright.sim;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.Metal;

/** Sums up a finished run into its {@link RunSummary}. */
final class SummaryBuilder {

    private final Scenario sc;
    private final ReactionNetwork net;
    private final StateLayout layout;
    private final List<TracePoint> trace;
    private final double[] y;
    private final double endS;
    private String stopReason = "end";
    private Double shortS;
    private Double forecastS;

    SummaryBuilder(Scenario sc, ReactionNetwork net, StateLayout layout, List<TracePoint> trace, double[] y,
                   double endS) {
        this.sc = sc;
        this.net = net;
        this.layout = layout;
        this.trace = trace;
        this.y = y;
        this.endS = endS;
    }

    SummaryBuilder stopReason(String reason) {
        this.stopReason = reason;
        return this;
    }

    /**
     * @param shortTimeS time a dendrite shorted the cell (s), or null
     * @param forecast when one would if the end conditions held (s), or null
     */
    SummaryBuilder shortCircuit(Double shortTimeS, Double forecast) {
        this.shortS = shortTimeS;
        this.forecastS = forecast;
        return this;
    }

    RunSummary build() {
        Map<String, Double> deposit = new LinkedHashMap<>();
        double total = 0;
        for (int m = 0; m < net.depositMetals().size(); m++) {
            Metal metal = net.depositMetals().get(m);
            double kg = Math.max(0, y[layout.deposit0 + m]) * metal.molarMassKgPerMol();
            deposit.put(metal.symbol(), kg);
            total += kg;
        }
        Map<String, Double> corroded = new LinkedHashMap<>();
        for (int m = 0; m < net.depositMetals().size(); m++) {
            Metal metal = net.depositMetals().get(m);
            corroded.put(metal.symbol(), Math.max(0, y[layout.corroded0 + m]) * metal.molarMassKgPerMol());
        }
        Map<String, Double> purity = new LinkedHashMap<>();
        for (var e : deposit.entrySet()) {
            purity.put(e.getKey(), total > 0 ? e.getValue() / total : 0.0);
        }
        double charge = y[layout.charge];
        double energy = y[layout.energy];
        String target = net.targetMetal() == null ? null : net.targetMetal().symbol();
        double targetKg = target == null ? 0 : deposit.get(target);
        double efficiency = TraceRecorder.cumulativeEfficiency(net, layout, y);
        double specific = targetKg > 0 ? energy / targetKg : Double.NaN;
        Map<String, Double> conc = new LinkedHashMap<>();
        TracePoint last = trace.get(trace.size() - 1);
        Map<String, Double> anolyte = new LinkedHashMap<>();
        for (int j = 0; j < net.species().size(); j++) {
            conc.put(net.species().get(j).name(), last.state().concentrationsMolPerM3()[j]);
            if (last.state().anolyteConcentrationsMolPerM3() != null) {
                anolyte.put(net.species().get(j).name(), last.state().anolyteConcentrationsMolPerM3()[j]);
            }
        }
        String morphology = null;
        for (int i = trace.size() - 1; i >= 0 && morphology == null; i--) {
            morphology = trace.get(i).state().morphology();
        }
        Map<String, Double> gas = new LinkedHashMap<>();
        for (int g = 0; g < StateLayout.GASES.length; g++) {
            gas.put(StateLayout.GASES[g], Math.max(0, y[layout.gas0 + g]));
        }
        Map<String, Double> reactionCharge = new LinkedHashMap<>();
        int nc = net.cathodeSlots.size();
        for (int k = 0; k < nc + net.anodeSlots.size(); k++) {
            ReactionSlot s = k < nc ? net.cathodeSlots.get(k) : net.anodeSlots.get(k - nc);
            reactionCharge.put(s.label(), y[layout.reactionCharge0 + k]);
        }
        double vMax = Double.NEGATIVE_INFINITY;
        double tMax = Double.NEGATIVE_INFINITY;
        for (TracePoint p : trace) {
            vMax = Math.max(vMax, p.state().cellVoltageV());
            tMax = Math.max(tMax, p.state().temperatureK());
        }
        double vMean = endS > 0 ? y[layout.voltageTime] / endS : trace.get(0).state().cellVoltageV();
        List<String> warnings = new RunWarnings(sc, net, trace, gas).shortCircuit(shortS, forecastS, endS)
                .list();
        return new RunSummary(stopReason, endS, charge, deposit, purity, target, efficiency, energy, specific,
                trace.get(0).state().cellVoltageV(), last.state().cellVoltageV(), vMean, vMax, conc, gas,
                shortS, forecastS, morphology, trace.get(0).state().temperatureK(), last.state().temperatureK(), tMax,
                reactionCharge, warnings, corroded, anolyte);
    }
}
