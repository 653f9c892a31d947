package org.cellwright.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince54Integrator;
import org.cellwright.cell.Scenario;
import org.cellwright.cell.SetPoint;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.sim.ode.AnalyticJacobian;
import org.cellwright.sim.ode.Ros34Pw2Integrator;

/**
 * Runs a scenario through time: builds the reaction network and the rates, integrates them with the
 * injected integrator between schedule breakpoints, lets events stop or mark the run at their root-found
 * times, samples the output interval, and sums up.
 */
public final class CellSimulation {

    /** Relative tolerance of the integration. */
    static final double REL_TOL = 1e-4;

    /** Receives the time series point by point while the run goes (for live plots). */
    @FunctionalInterface
    public interface TraceListener {
        /** @param point the next point of the time series */
        void point(TracePoint point);
    }

    private final IntegratorFactory integrators;

    /** @param integrators makes the integrator each run uses */
    public CellSimulation(IntegratorFactory integrators) {
        this.integrators = integrators;
    }

    /** @return a simulation with the default integrator */
    public static CellSimulation withDefaults() {
        return new CellSimulation(CellSimulation::defaultIntegrator);
    }

    /**
     * The default integrator: ROS34PW2, an L-stable Rosenbrock-W method (stiff homogeneous reactions beside
     * depletion over hours), with the tracked concentrations kept non-negative.
     */
    static FirstOrderIntegrator defaultIntegrator(CellRates rates, double[] absTol, double relTol, double maxStep) {
        double[] rel = new double[absTol.length];
        java.util.Arrays.fill(rel, relTol);
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(1e-12, maxStep, absTol, rel);
        integrator.setNonNegative(rates.nonNegativeComponents());
        integrator.setClipWithinTolerance(false);
        return integrator;
    }

    /** @return an explicit Dormand-Prince 5(4) integrator, for comparisons on non-stiff cases */
    static FirstOrderIntegrator explicitIntegrator(CellRates rates, double[] absTol, double relTol, double maxStep) {
        double[] rel = new double[absTol.length];
        java.util.Arrays.fill(rel, relTol);
        return new DormandPrince54Integrator(1e-9, maxStep, absTol, rel);
    }

    /**
     * The names behind the arrays of a run of this scenario, without running it.
     *
     * @param sc the scenario
     * @param lib the chemistry library
     * @return species, metals and reactions in array order
     * @throws IllegalArgumentException when the scenario cannot run with this chemistry
     */
    public static RunLayout layout(Scenario sc, ChemLibrary lib) {
        return RunLayout.of(ReactionNetwork.of(ScenarioChemistry.apply(lib, sc), sc));
    }

    /**
     * Runs a scenario.
     *
     * @param sc the scenario
     * @param lib the chemistry library (the scenario's overrides are applied here)
     * @param listener receives each output point as it is made, or null
     * @return the run's outcome
     * @throws IllegalArgumentException when the scenario cannot run with this chemistry
     */
    public RunResult run(Scenario sc, ChemLibrary lib, TraceListener listener) {
        ChemLibrary chem = ScenarioChemistry.apply(lib, sc);
        ReactionNetwork net = ReactionNetwork.of(chem, sc);
        CellRates rates = new CellRates(sc, net);
        StateLayout layout = rates.layout();
        CountingEquations counted = new CountingEquations(rates, absoluteTolerances(sc, rates.layout()),
                new ConservedQuantities(net, rates.layout(), rates.operatingPoint().compartments.catholyteM3(),
                        rates.operatingPoint().compartments.anolyteM3()));
        double duration = sc.run().durationS();
        double[] absTol = absoluteTolerances(sc, layout);
        FirstOrderIntegrator integrator = integrators.create(rates, absTol, REL_TOL,
                Math.max(duration / 20, 1.0));
        List<RunEvent> events = new ArrayList<>();
        RunEvents detectors = new RunEvents(sc, net, rates, events);
        double maxCheck = Math.min(sc.run().outputIntervalS(), duration / 200);
        for (RunEventDetector d : detectors.all()) {
            integrator.addEventHandler(d, maxCheck, 1e-6, 200);
        }
        List<TracePoint> trace = new ArrayList<>();
        TraceRecorder recorder = new TraceRecorder(rates, net, trace, listener);
        OutputSampler sampler = new OutputSampler(sc.run().outputIntervalS(), recorder::record);
        integrator.addStepHandler(sampler);

        double[] y = rates.initialState();
        double t = 0;
        String stopAtStart = detectors.stopAlreadyMet(y);
        if (stopAtStart == null) {
            for (double end : breakpoints(sc)) {
                if (t > 0) {
                    detectors.scheduleStep(t, y, end);
                }
                rates.operatingPoint().segmentEndS = end;
                t = integrator.integrate(counted, t, y, end, y);
                if (detectors.stopped() || t < end) {
                    break;
                }
            }
        } else {
            recorder.record(0.0, y);
        }
        rates.operatingPoint().segmentEndS = Double.POSITIVE_INFINITY;
        if (sampler.lastSentS() < t) {
            recorder.record(t, y);
        }
        if (!detectors.stopped() && stopAtStart == null) {
            events.add(new RunEvent(t, RunEvent.Kind.END, "The run reached its duration of " + RunClock.format(t) + "."));
        }
        events.sort(java.util.Comparator.comparingDouble(RunEvent::timeS));
        RunSummary summary = new SummaryBuilder(sc, net, layout, trace, y, t)
                .stopReason(stopAtStart != null ? stopAtStart : detectors.stopReason())
                .shortCircuit(detectors.shortTimeS(), shortForecast(rates, sc, t, y, detectors.shortTimeS()))
                .build();
        RunLayout names = RunLayout.of(net);
        return new RunResult(sc, names.speciesNames(), names.metalSymbols(), names.cathodeReactions(),
                names.anodeReactions(), List.copyOf(trace), List.copyOf(events), summary, y.clone(), counted.count);
    }

    /**
     * Longest forecast of a short reported (s): 30 days. Beyond it a forecast at frozen conditions says
     * nothing a user can act on.
     */
    static final double FORECAST_HORIZON_S = 30 * 86400.0;

    /** @return when a dendrite would short the cell if the end conditions held (s from the start), or null */
    private static Double shortForecast(CellRates rates, Scenario sc, double t, double[] y, Double shortS) {
        if (shortS != null || !rates.dendrite().active()) {
            return null;
        }
        OperatingPoint op = rates.operatingPoint();
        op.unpack(t, y);
        op.solve(t);
        double dt = rates.dendrite().timeToShortS(op);
        return Double.isFinite(dt) && dt <= FORECAST_HORIZON_S ? t + dt : null;
    }

    /** Schedule times at which the set value steps, then the end. */
    private static TreeSet<Double> breakpoints(Scenario sc) {
        TreeSet<Double> points = new TreeSet<>();
        double duration = sc.run().durationS();
        for (SetPoint p : sc.supply().schedule()) {
            if (p.atS() > 0 && p.atS() < duration) {
                points.add(p.atS());
            }
        }
        points.add(duration);
        return points;
    }

    private static double[] absoluteTolerances(Scenario sc, StateLayout layout) {
        double[] abs = new double[layout.size];
        double maxC = sc.electrolyte().compositionMolPerM3().values().stream().mapToDouble(Double::doubleValue)
                .max().orElse(1.0);
        java.util.Arrays.fill(abs, 0, layout.species, Math.max(maxC, 1.0) * 1e-8);
        abs[layout.temperature] = 1e-6;
        if (layout.twoCompartments) {
            java.util.Arrays.fill(abs, layout.anolyte0, layout.anolyte0 + layout.species, Math.max(maxC, 1.0) * 1e-8);
        }
        double molesScale = Math.max(maxC, 1.0) * sc.electrolyte().volumeM3();
        for (int i = layout.deposit0; i < layout.reactionCharge0; i++) {
            abs[i] = molesScale * 1e-9;
        }
        abs[layout.charge] = 1e-6;
        abs[layout.energy] = 1e-6;
        abs[layout.voltageTime] = 1e-6;
        abs[layout.dendrite] = 1e-6;
        abs[layout.shortCharge] = 1e-6;
        for (int i = layout.reactionCharge0; i < layout.reactionCharge0 + layout.slots; i++) {
            abs[i] = 1e-6;
        }
        return abs;
    }

    /**
     * The rates as the integrator sees them: counts evaluations (the cost of a run) and forms the Jacobian by
     * forward differences over the components that feed back into the rates only (running totals such as
     * charge, gas and energy have zero columns), which saves one evaluation per running total.
     */
    static final class CountingEquations implements FirstOrderDifferentialEquations, AnalyticJacobian {
        private final CellRates inner;
        private final boolean[] active;
        private final double[] scale;
        private final double[] f0;
        private final double[] f1;
        private final double[] work;
        long count;

        private final ConservedQuantities invariants;

        CountingEquations(CellRates inner, double[] absTol, ConservedQuantities invariants) {
            this.inner = inner;
            this.invariants = invariants;
            StateLayout layout = inner.layout();
            this.active = layout.active(inner.unusedSpecies());
            this.scale = absTol.clone();
            this.f0 = new double[layout.size];
            this.f1 = new double[layout.size];
            this.work = new double[layout.size];
        }

        @Override
        public void jacobian(double t, double[] y, double[][] dfdy) {
            computeDerivatives(t, y, f0);
            System.arraycopy(y, 0, work, 0, y.length);
            for (int j = 0; j < y.length; j++) {
                if (!active[j]) {
                    continue;
                }
                double h = 1.5e-8 * Math.max(Math.abs(y[j]), scale[j] * 1e3);
                work[j] = y[j] + h;
                h = work[j] - y[j];
                computeDerivatives(t, work, f1);
                work[j] = y[j];
                for (int i = 0; i < y.length; i++) {
                    dfdy[i][j] = (f1[i] - f0[i]) / h;
                }
            }
            invariants.project(dfdy, inner.operatingPoint().shorted);
        }

        @Override
        public int getDimension() {
            return inner.getDimension();
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            count++;
            inner.computeDerivatives(t, y, yDot);
        }
    }
}
