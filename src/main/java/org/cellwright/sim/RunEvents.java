package org.cellwright.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.StopCondition;

/**
 * The events a scenario asks for: its stop conditions, the supply's limits, the target metal nearing
 * its limiting current (with a hysteresis band, and only when its ion is in the bath at the start; see
 * {@link #NEAR_LIMIT_BAND}), and a dendrite bridging the gap ({@code g = gap - tip height}). Each is a
 * {@link RunEventDetector} with a continuous switching function. A short stops the run when
 * {@code run.stop} contains "short"; otherwise the run goes on with the cell shorted.
 */
final class RunEvents {

    /** Share of the limiting current at which the run log says that mass transfer takes over. */
    static final double NEAR_LIMIT = 0.9;

    /**
     * Hysteresis of the near-limit event (share of the limiting current): once the target metal's deposition has
     * reached {@link #NEAR_LIMIT}, the log says it fell back only when the share drops below
     * {@code NEAR_LIMIT - NEAR_LIMIT_BAND} (85 %). Model choice. A share that wanders about 90 % (a current
     * ramped or held near the limit, a bath warming and cooling, the operating point's own tolerance) would
     * otherwise be logged at every swing, and the integrator would stop to locate each crossing. Five points of
     * the limiting current are far above what round-off and the operating point's tolerance move the share
     * (below 1e-6), and small enough that "falls back" still means the deposition is clearly off its limit.
     * The large swings of a share whose ion is made at the cathode itself are kept out otherwise (see
     * {@link #inTheBath}).
     */
    static final double NEAR_LIMIT_BAND = 0.05;

    private final Scenario sc;
    private final ReactionNetwork net;
    private final CellRates rates;
    private final OperatingPoint op;
    private final List<RunEvent> log;
    private final List<RunEventDetector> all = new ArrayList<>();
    private final List<RunEventDetector> stops = new ArrayList<>();
    private final List<String> stopReasons = new ArrayList<>();
    private Double shortTimeS;

    RunEvents(Scenario sc, ReactionNetwork net, CellRates rates, List<RunEvent> log) {
        this.sc = sc;
        this.net = net;
        this.rates = rates;
        this.op = rates.operatingPoint();
        this.log = log;
        for (StopCondition s : sc.run().stops()) {
            addStop(s);
        }
        addSupplyLimit();
        addNearLimit();
        addShortCircuit();
    }

    /** @return the time a dendrite shorted the cell (s), or null */
    Double shortTimeS() {
        return shortTimeS;
    }

    private void addShortCircuit() {
        DendriteGrowth dendrite = rates.dendrite();
        if (!dendrite.active()) {
            return;
        }
        boolean stop = sc.run().stopsOnShort();
        RunEventDetector d = new RunEventDetector((t, y) -> {
            if (shortTimeS != null) {
                return -1.0;
            }
            return dendrite.gapM() - op.tipHeightM(y);
        }, stop, (t, y, inc) -> {
            if (shortTimeS != null) {
                return null;
            }
            op.unpack(t, y);
            op.solve(t);
            double amps = op.currentA;
            op.shortCircuit(t);
            shortTimeS = t;
            return new RunEvent(t, RunEvent.Kind.SHORT_CIRCUIT, String.format(Locale.ROOT,
                    "At %s a %s dendrite reached the anode across the %.3g mm gap and shorted the cell%s",
                    RunClock.format(t), net.targetMetal().symbol(), dendrite.gapM() * 1000, stop
                            ? "; the run stops as asked."
                            : String.format(Locale.ROOT, ": the %.3g A now flows through the short and the deposit"
                                    + " no longer grows.", amps)));
        }, log);
        // first in the list: when the short occurs, the integrator advances every detector to its time in list
        // order, and the others must see the shorted cell there (their switching functions jump at the short)
        all.add(0, d);
        if (stop) {
            stops.add(d);
            stopReasons.add("short_circuit");
        }
    }

    List<RunEventDetector> all() {
        return all;
    }

    boolean stopped() {
        return stops.stream().anyMatch(RunEventDetector::fired);
    }

    String stopReason() {
        for (int i = 0; i < stops.size(); i++) {
            if (stops.get(i).fired()) {
                return stopReasons.get(i);
            }
        }
        return "end";
    }

    /** @return the stop reason when a stop condition already holds at the start, else null */
    String stopAlreadyMet(double[] y0) {
        for (int i = 0; i < stops.size(); i++) {
            if (stops.get(i).g(0, y0) < 0) {
                log.add(new RunEvent(0, RunEvent.Kind.SPECIES_TARGET,
                        "A stop condition already holds at the start; nothing was run."));
                return stopReasons.get(i);
            }
        }
        return null;
    }

    private void addStop(StopCondition s) {
        StateLayout layout = rates.layout();
        RunEventDetector d;
        String reason;
        if (s instanceof StopCondition.SpeciesBelow sb) {
            int j = net.indexOf(sb.species());
            if (j < 0) {
                throw new IllegalArgumentException("run.stop: species " + sb.species() + " is not in this bath");
            }
            d = new RunEventDetector((t, y) -> concentration(t, y, j) - sb.molPerM3(), true,
                    (t, y, inc) -> new RunEvent(t, RunEvent.Kind.SPECIES_TARGET, String.format(Locale.ROOT,
                            "At %s %s fell to %.4g mol/L; the run stops as asked.", RunClock.format(t),
                            sb.species(), sb.molPerM3() / 1000)), log);
            reason = "target";
        } else if (s instanceof StopCondition.TemperatureAbove ta) {
            d = new RunEventDetector((t, y) -> ta.kelvin() - y[layout.temperature], true,
                    (t, y, inc) -> new RunEvent(t, RunEvent.Kind.TEMPERATURE_LIMIT, String.format(Locale.ROOT,
                            "At %s the bath reached %.1f C; the run stops as asked.", RunClock.format(t),
                            ta.kelvin() - 273.15)), log);
            reason = "temperature_limit";
        } else if (s instanceof StopCondition.VoltageAbove va) {
            d = new RunEventDetector((t, y) -> va.volts() - cellVoltage(t, y), true,
                    (t, y, inc) -> new RunEvent(t, RunEvent.Kind.VOLTAGE_STOP, String.format(Locale.ROOT,
                            "At %s the cell voltage reached %.2f V; the run stops as asked.", RunClock.format(t),
                            va.volts())), log);
            reason = "voltage_limit";
        } else if (s instanceof StopCondition.DepositAbove da) {
            int m = metalIndex(da.metal());
            d = new RunEventDetector((t, y) -> da.kg() - y[layout.deposit0 + m]
                    * net.depositMetals().get(m).molarMassKgPerMol(), true,
                    (t, y, inc) -> new RunEvent(t, RunEvent.Kind.DEPOSIT_TARGET, String.format(Locale.ROOT,
                            "At %s the %s deposit reached %.4g g; the run stops as asked.", RunClock.format(t),
                            da.metal(), da.kg() * 1000)), log);
            reason = "target";
        } else {
            return;
        }
        all.add(d);
        stops.add(d);
        stopReasons.add(reason);
    }

    private int metalIndex(String symbol) {
        for (int m = 0; m < net.depositMetals().size(); m++) {
            if (net.depositMetals().get(m).symbol().equalsIgnoreCase(symbol)) {
                return m;
            }
        }
        throw new IllegalArgumentException("run.stop: metal " + symbol + " does not deposit from this bath");
    }

    private double concentration(double t, double[] y, int j) {
        op.unpack(t, y);
        return op.c[j];
    }

    private double cellVoltage(double t, double[] y) {
        op.unpack(t, y);
        op.solve(t);
        return op.cellVoltageV;
    }

    /**
     * Records what a schedule point does at time {@code t}, where the set value may jump: the step itself,
     * and the supply entering or leaving its limit because of it (a jump that the switching functions, which
     * start afresh in each integration segment, cannot see as a crossing).
     *
     * @param t the time of the schedule point (s)
     * @param y the state then
     * @param nextEndS the end of the segment that starts at {@code t} (s)
     */
    void scheduleStep(double t, double[] y, double nextEndS) {
        var supply = sc.supply();
        String unit = supply.mode() == ControlMode.CURRENT ? "A" : "V";
        double before = supply.setValueBefore(t);
        double after = supply.setValueAt(t);
        if (before != after) {
            log.add(new RunEvent(t, RunEvent.Kind.SCHEDULE_STEP, String.format(Locale.ROOT,
                    "At %s the supply's set %s steps from %.4g %s to %.4g %s.", RunClock.format(t),
                    supply.mode() == ControlMode.CURRENT ? "current" : "voltage", before, unit, after, unit)));
        }
        if (supply.mode() != ControlMode.CURRENT || !Double.isFinite(supply.voltageLimitV())) {
            return;
        }
        op.segmentEndS = t;
        op.unpack(t, y);
        boolean limitedBefore = op.voltageNeededAt(t) > supply.voltageLimitV();
        op.segmentEndS = nextEndS;
        op.unpack(t, y);
        boolean limitedAfter = op.voltageNeededAt(t) > supply.voltageLimitV();
        if (limitedBefore && !limitedAfter) {
            log.add(new RunEvent(t, RunEvent.Kind.VOLTAGE_LIMIT_LEFT, String.format(Locale.ROOT,
                    "At %s the cell again needs less than %.2f V: the supply is back to its set current.",
                    RunClock.format(t), supply.voltageLimitV())));
        } else if (!limitedBefore && limitedAfter) {
            log.add(new RunEvent(t, RunEvent.Kind.VOLTAGE_LIMIT_ENTERED, String.format(Locale.ROOT,
                    "At %s the new set current would need more than the supply's %.2f V limit: the supply holds"
                            + " %.2f V instead.", RunClock.format(t), supply.voltageLimitV(), supply.voltageLimitV())));
        }
    }

    /**
     * Hysteresis of the supply-limit events: once the cell has needed more than the voltage limit (or drawn more
     * than the current limit), the log says it is back below only when the need has fallen this far under the
     * limit: 1 mV, or 1e-4 of the current limit (model choice, below what a bench supply's meters resolve).
     * Without it a need that rises to the limit and turns back (a touch: the bath warms, or the anolyte
     * replenishes the catholyte) leaves the switching function on its old side right after the event, within
     * the integrator's error, and Commons Math 3.6.1 then searches the rest of the step for the crossing in
     * steps of the convergence time (1e-6 s), millions of solves of the operating point.
     */
    static final double VOLTAGE_LIMIT_BAND_V = 1e-3;
    static final double CURRENT_LIMIT_BAND = 1e-4;

    private void addSupplyLimit() {
        var supply = sc.supply();
        if (supply.mode() == ControlMode.CURRENT && Double.isFinite(supply.voltageLimitV())) {
            double limit = supply.voltageLimitV();
            boolean[] over = new boolean[1];
            RunEventDetector[] detector = new RunEventDetector[1];
            detector[0] = new RunEventDetector((t, y) -> {
                op.unpack(t, y);
                return limit - (over[0] ? VOLTAGE_LIMIT_BAND_V : 0) - op.voltageNeededAt(t);
            }, (t0, y0) -> {
                op.unpack(t0, y0);
                over[0] = op.voltageNeededAt(t0) > limit;
            }, false, (t, y, inc) -> {
                over[0] = !inc;
                detector[0].forgetValues();
                return inc
                        ? new RunEvent(t, RunEvent.Kind.VOLTAGE_LIMIT_LEFT, String.format(Locale.ROOT,
                        "At %s the cell again needs less than %.2f V: the supply is back to its set current.",
                        RunClock.format(t), limit))
                        : new RunEvent(t, RunEvent.Kind.VOLTAGE_LIMIT_ENTERED, String.format(Locale.ROOT,
                        "At %s the cell would need more than the supply's %.2f V limit: the supply now holds"
                                + " %.2f V and the current falls below its set value.", RunClock.format(t),
                        limit, limit));
            }, log);
            all.add(detector[0]);
        }
        if (supply.mode() == ControlMode.VOLTAGE && Double.isFinite(supply.currentLimitA())) {
            double limit = supply.currentLimitA();
            boolean[] over = new boolean[1];
            RunEventDetector[] detector = new RunEventDetector[1];
            detector[0] = new RunEventDetector((t, y) -> {
                op.unpack(t, y);
                return limit * (1 - (over[0] ? CURRENT_LIMIT_BAND : 0)) - op.currentNeededAt(t);
            }, (t0, y0) -> {
                op.unpack(t0, y0);
                over[0] = op.currentNeededAt(t0) > limit;
            }, false, (t, y, inc) -> {
                over[0] = !inc;
                detector[0].forgetValues();
                return new RunEvent(t, inc ? RunEvent.Kind.CURRENT_LIMIT_LEFT
                        : RunEvent.Kind.CURRENT_LIMIT_ENTERED, String.format(Locale.ROOT, inc
                        ? "At %s the cell draws less than the %.2f A limit again: the supply holds its set voltage."
                        : "At %s the cell would draw more than the %.2f A limit: the supply now holds that current.",
                        RunClock.format(t), limit));
            }, log);
            all.add(detector[0]);
        }
    }

    private void addNearLimit() {
        if (net.targetSlot < 0) {
            return;
        }
        ReactionSlot target = net.cathodeSlots.get(net.targetSlot);
        if (target.oxIndex().length > 0 && !inTheBath(target.oxIndex()[0])) {
            return;
        }
        String ion = target.oxIndex().length > 0 ? net.species().get(target.oxIndex()[0]).name() : "metal ion";
        boolean[] near = new boolean[1];
        RunEventDetector[] detector = new RunEventDetector[1];
        detector[0] = new RunEventDetector((t, y) -> nearLimitThreshold(near[0]) - limitRatio(t, y),
                (t0, y0) -> near[0] = limitRatio(t0, y0) >= nearLimitThreshold(near[0]),
                false, (t, y, inc) -> {
                    near[0] = !inc;
                    detector[0].forgetValues();
                    if (t <= 0 || op.shorted) {
                        return null;
                    }
                    if (inc) {
                        return new RunEvent(t, RunEvent.Kind.BELOW_LIMITING_CURRENT, String.format(Locale.ROOT,
                                "At %s the %s deposition falls back below %d %% of its limiting current.",
                                RunClock.format(t), net.targetMetal.symbol(),
                                Math.round((NEAR_LIMIT - NEAR_LIMIT_BAND) * 100)));
                    }
                    InstantState s = rates.snapshot(t, y);
                    return new RunEvent(t, RunEvent.Kind.NEAR_LIMITING_CURRENT, String.format(Locale.ROOT,
                            "At %s the %s supply to the cathode reaches %d %% of its limit (mass transfer);"
                                    + " from here more and more of the current goes to %s.",
                            RunClock.format(t), ion, Math.round(NEAR_LIMIT * 100), runnerUp(s)));
                }, log);
        all.add(detector[0]);
    }

    /**
     * @return whether species {@code j} is in the bath at the start (in either compartment). When the target
     *     metal's ion is not, it is made only at the cathode (Sn2+ from Sn4+ on a tin deposit): it deposits from
     *     where it is made, not by transport from the bulk, and its share of a "limiting current" computed from
     *     the bulk flips between 0 and above 1 each time the deposit turns from redissolving to growing. Such a
     *     share says nothing about mass transfer, so the near-limit event is not watched there.
     */
    private boolean inTheBath(int j) {
        double[] y0 = rates.initialState();
        StateLayout layout = rates.layout();
        return y0[j] > 0 || (layout.twoCompartments && y0[layout.anolyte0 + j] > 0);
    }

    /** @return the share of the limiting current the near-limit event watches for, with its hysteresis */
    private static double nearLimitThreshold(boolean near) {
        return near ? NEAR_LIMIT - NEAR_LIMIT_BAND : NEAR_LIMIT;
    }

    private double limitRatio(double t, double[] y) {
        op.unpack(t, y);
        op.solve(t);
        return op.targetLimitRatio();
    }

    private String runnerUp(InstantState s) {
        int best = -1;
        double max = 0;
        for (int k = 0; k < s.cathodeCurrentsA().length; k++) {
            if (k != net.targetSlot && -s.cathodeCurrentsA()[k] > max) {
                max = -s.cathodeCurrentsA()[k];
                best = k;
            }
        }
        return best < 0 ? "side reactions" : PlainWords.of(net.cathodeSlots.get(best).reaction(), true);
    }
}
