package org.cellwright.sim;

import java.util.List;

import org.cellwright.chem.PhysicalConstants;

/** Turns sampled states into time-series points and passes them on. */
final class TraceRecorder {

    private final CellRates rates;
    private final ReactionNetwork net;
    private final List<TracePoint> trace;
    private final CellSimulation.TraceListener listener;

    TraceRecorder(CellRates rates, ReactionNetwork net, List<TracePoint> trace, CellSimulation.TraceListener listener) {
        this.rates = rates;
        this.net = net;
        this.trace = trace;
        this.listener = listener;
    }

    void record(double t, double[] y) {
        StateLayout layout = rates.layout();
        InstantState s = rates.snapshot(t, y);
        double[] kg = new double[net.depositMetals().size()];
        for (int m = 0; m < kg.length; m++) {
            kg[m] = Math.max(0, y[layout.deposit0 + m]) * net.depositMetals().get(m).molarMassKgPerMol();
        }
        double charge = y[layout.charge];
        TracePoint p = new TracePoint(s, kg, charge, y[layout.energy], cumulativeEfficiency(net, layout, y));
        trace.add(p);
        if (listener != null) {
            listener.point(p);
        }
    }

    /** @return the share of the charge passed so far that deposited the target metal */
    static double cumulativeEfficiency(ReactionNetwork net, StateLayout layout, double[] y) {
        double charge = y[layout.charge];
        if (net.targetSlot < 0 || charge <= 0) {
            return 0;
        }
        ReactionSlot target = net.cathodeSlots.get(net.targetSlot);
        double mol = y[layout.deposit0 + target.depositMetalIndex()];
        return Math.max(0, mol * target.n() * PhysicalConstants.FARADAY / charge);
    }
}
