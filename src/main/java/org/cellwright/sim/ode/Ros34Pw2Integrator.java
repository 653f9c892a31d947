package org.cellwright.sim.ode;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.analysis.solvers.UnivariateSolver;
import org.apache.commons.math3.exception.DimensionMismatchException;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.NumberIsTooSmallException;
import org.apache.commons.math3.exception.OutOfRangeException;
import org.apache.commons.math3.ode.AbstractIntegrator;
import org.apache.commons.math3.ode.EquationsMapper;
import org.apache.commons.math3.ode.ExpandableStatefulODE;
import org.apache.commons.math3.ode.events.EventHandler;

/**
 * Adaptive, L-stable Rosenbrock-W integrator for stiff equations, plugged into the Commons Math 3.6.1 ODE
 * framework: event handlers (located by root finding through the dense output), step handlers and
 * {@code StepNormalizer} work exactly as with Commons Math's own integrators.
 *
 * <p>Method: ROS34PW2 of J. Rang and L. Angermann, BIT 45 (2005) 761-787: four stages, order 3 with an embedded
 * order-2 solution for the error estimate, L-stable and stiffly accurate; coefficients in
 * {@link Ros34Pw2Tableau}. Each step solves four linear systems with one LU factorisation of
 * {@code (1/(h gamma)) I - J} and costs three right-hand-side (RHS) evaluations plus one at the new point, which
 * is also the first stage of the next step. Dense output: {@link Ros34Pw2StepInterpolator}.
 *
 * <p>Jacobian: {@link AnalyticJacobian} if the equations implement it, otherwise forward differences (n RHS
 * evaluations, plus one for df/dt unless {@link #setAutonomous(boolean)}). Because ROS34PW2 is a W-method, its
 * order does not depend on the Jacobian being exact, so a Jacobian is kept for up to
 * {@link #setMaxJacobianAge(int) maxJacobianAge} accepted steps. When a step that used an older Jacobian is
 * rejected, the Jacobian is formed afresh at the step start and the same step size is tried once more before
 * the controller reduces it; the Jacobian is also formed again after an event handler resets the state or the
 * derivatives. The LU factors are reused while neither h nor the Jacobian changes.
 *
 * <p>Error control: see {@link StepSizeControl} (scalar or per-component absolute and relative tolerances,
 * safety factor, growth bounds, maximum step). A step whose required size falls below the minimum step throws
 * {@link StepSizeUnderflowException}. An attempt whose stages are not finite (e.g. the RHS returned NaN) is
 * rejected and retried with a step five times smaller.
 *
 * <p>Non-negativity ({@link #setNonNegative(int...)}): an otherwise acceptable step that leaves a flagged
 * component below {@code -absTol_i} is rejected and retried with at most half the step (the controller is fed the
 * ratio of the excursion to absTol_i as its error); a flagged component between {@code -absTol_i} and 0 is set to
 * 0 (a change within the tolerance), in the spirit of Shampine, Thompson, Kierzenka and Byrne, "Non-negative
 * solutions of ODEs", Appl. Math. Comput. 170 (2005) 556-569 (from memory). The RHS may still be evaluated at
 * intermediate stage states slightly below zero, so it must tolerate small negative values (for example by
 * clipping before a logarithm).
 *
 * <p>Events: handlers are registered through Commons Math's {@code addEventHandler} and run by its
 * {@code acceptStep}; each is wrapped in a {@link ResetConsistentEvent} so that a {@code RESET_STATE} that moves
 * some handler's g across zero does not break the next root search, a Commons Math 3.6.1 defect. As in all of
 * Commons Math 3.x, an event at the end of a step is handled before the step handlers see that step: record
 * events in a list rather than deriving them from step output.
 *
 * <p>Counters of RHS evaluations, Jacobians, factorisations and steps are in {@link #getStatistics()}.
 */
public class Ros34Pw2Integrator extends AbstractIntegrator {

    /** Method name reported by {@link #getName()}. */
    public static final String METHOD_NAME = "ROS34PW2";

    /**
     * Default number of accepted steps a Jacobian may serve: with 10, Robertson, Van der Pol and the stiff bath test
     * needed about four times fewer Jacobians than with 1 at comparable accuracy (docs/numerics.md).
     */
    public static final int DEFAULT_MAX_JACOBIAN_AGE = 10;

    private static final double NON_FINITE_REDUCTION = 0.2;
    private static final double NEGATIVITY_REDUCTION = 0.5;

    private final StepSizeControl control;
    private int[] nonNegativeIndices = new int[0];
    private boolean clipWithinTolerance = true;
    private boolean autonomous;
    private int maxJacobianAge = DEFAULT_MAX_JACOBIAN_AGE;
    private double initialStep = Double.NaN;
    private RosenbrockStatistics statistics = new RosenbrockStatistics(0, 0, 0, 0, 0, 0, 0);
    private final List<ResetConsistentEvent> events = new ArrayList<>();

    /**
     * Integrator with scalar tolerances.
     *
     * @param minStep minimum step magnitude (s), may be 0; the last step before the end time may be shorter
     * @param maxStep maximum step magnitude (s)
     * @param absTol  absolute tolerance (units of the state)
     * @param relTol  relative tolerance (dimensionless)
     */
    public Ros34Pw2Integrator(double minStep, double maxStep, double absTol, double relTol) {
        super(METHOD_NAME);
        control = new StepSizeControl(minStep, maxStep, absTol, relTol);
    }

    /**
     * Integrator with one tolerance per primary state component (concentrations spanning decades need their own
     * absolute tolerances).
     *
     * @param minStep minimum step magnitude (s)
     * @param maxStep maximum step magnitude (s)
     * @param absTol  absolute tolerances, one per primary component
     * @param relTol  relative tolerances, same length
     */
    public Ros34Pw2Integrator(double minStep, double maxStep, double[] absTol, double[] relTol) {
        super(METHOD_NAME);
        control = new StepSizeControl(minStep, maxStep, absTol, relTol);
    }

    /** Flags primary components (by index) that must stay non-negative; replaces earlier flags. */
    public void setNonNegative(int... indices) {
        for (int index : indices) {
            if (index < 0) {
                throw new OutOfRangeException(index, 0, Integer.MAX_VALUE);
            }
        }
        nonNegativeIndices = indices.clone();
    }

    /**
     * Whether a flagged component that ends an accepted step between {@code -absTol_i} and 0 is set to 0, and
     * the dense output clipped at 0 likewise (default true). Equations with conserved linear invariants (mass, charge) should turn this off: the
     * clipping adds a little of the component, while the small excursion is harmless when the RHS clips its
     * inputs itself.
     */
    public void setClipWithinTolerance(boolean clip) {
        this.clipWithinTolerance = clip;
    }

    /** Declares that f does not depend on t explicitly, saving the df/dt difference (one RHS call per Jacobian). */
    public void setAutonomous(boolean autonomous) {
        this.autonomous = autonomous;
    }

    /** Accepted steps a Jacobian may serve before it is formed again (1 = every step). */
    public void setMaxJacobianAge(int steps) {
        if (steps < 1) {
            throw new NumberIsTooSmallException(steps, 1, true);
        }
        this.maxJacobianAge = steps;
    }

    /** First step magnitude (s); NaN (the default) lets the integrator choose it. */
    public void setInitialStepSize(double step) {
        this.initialStep = step;
    }

    /**
     * Step-size controller settings.
     *
     * @param safety       safety factor, in (0, 1]
     * @param minReduction smallest factor a rejected step is multiplied by, in (0, 1)
     * @param maxGrowth    largest growth factor between steps, &gt; 1
     */
    public void setStepSizeControl(double safety, double minReduction, double maxGrowth) {
        if (!(safety > 0.0 && safety <= 1.0) || !(minReduction > 0.0 && minReduction < 1.0) || !(maxGrowth > 1.0)) {
            throw new IllegalArgumentException("need 0 < safety <= 1, 0 < minReduction < 1, maxGrowth > 1; got "
                    + safety + ", " + minReduction + ", " + maxGrowth);
        }
        control.safety = safety;
        control.minReduction = minReduction;
        control.maxGrowth = maxGrowth;
    }

    /** Registers the handler behind a {@link ResetConsistentEvent} wrapper (see the class javadoc). */
    @Override
    public void addEventHandler(EventHandler handler, double maxCheckInterval, double convergence,
                                int maxIterationCount, UnivariateSolver solver) {
        ResetConsistentEvent wrapped = new ResetConsistentEvent(handler);
        events.add(wrapped);
        super.addEventHandler(wrapped, maxCheckInterval, convergence, maxIterationCount, solver);
    }

    /** The handlers as the user registered them. */
    @Override
    public Collection<EventHandler> getEventHandlers() {
        List<EventHandler> list = new ArrayList<>(events.size());
        for (ResetConsistentEvent event : events) {
            list.add(event.user());
        }
        return Collections.unmodifiableCollection(list);
    }

    @Override
    public void clearEventHandlers() {
        super.clearEventHandlers();
        events.clear();
    }

    /** Work counters of the last integration. */
    public RosenbrockStatistics getStatistics() {
        return statistics;
    }

    @Override
    public void integrate(ExpandableStatefulODE equations, double t) throws NumberIsTooSmallException,
            DimensionMismatchException, MaxCountExceededException, NoBracketingException {
        sanityChecks(equations, t);
        setEquations(equations);
        int primary = equations.getPrimaryMapper().getDimension();
        control.checkDimension(primary);
        boolean[] flags = nonNegativeFlags(primary);
        boolean forward = t > equations.getTime();
        int n = equations.getTotalDimension();

        double[] y = equations.getCompleteState();
        double[] yDot = new double[n];
        double[] yEnd = new double[n];
        Ros34Pw2Step step = new Ros34Pw2Step(n);
        DenseLu lu = new DenseLu(n);
        double[][] jacobian = new double[n][n];
        double[] dfdt = autonomous ? null : new double[n];
        AnalyticJacobian analytic = equations.getSecondaryMappers().length == 0
                && equations.getPrimary() instanceof AnalyticJacobian a ? a : null;
        JacobianEvaluator jacobians = new JacobianEvaluator(n, analytic, control.incrementFloors(primary, n));
        RightHandSide rhs = this::computeDerivatives;
        Ros34Pw2StepInterpolator interpolator = new Ros34Pw2StepInterpolator();
        interpolator.reinitialize(yEnd, forward, equations.getPrimaryMapper(), equations.getSecondaryMappers(),
                clipWithinTolerance ? flags : new boolean[0]);
        interpolator.storeTime(equations.getTime());

        stepStart = equations.getTime();
        setStateInitialized(false);
        initIntegration(stepStart, y, t);
        int jacobianCount = 0;
        int jacobianRhs = 0;
        int decompositions = 0;
        int accepted = 0;
        int rejected = 0;
        int negativityRejections = 0;

        computeDerivatives(stepStart, y, yDot);
        double hAbs = Math.max(control.minStep, Double.isNaN(initialStep)
                ? control.startingStep(rhs, stepStart, y, yDot, t, primary, flags)
                : control.limit(Math.abs(initialStep)));
        boolean needJacobian = true;
        boolean jacobianAtStepStart = false;
        int jacobianAge = 0;
        double factoredStep = Double.NaN;
        isLastStep = false;
        do {
            interpolator.shift();
            boolean rejectedThisStep = false;
            double error;
            while (true) {
                double remaining = t - stepStart;
                boolean reachesEnd = hAbs >= Math.abs(remaining);
                stepSize = reachesEnd ? remaining : (forward ? hAbs : -hAbs);
                if (needJacobian) {
                    int before = getEvaluations();
                    jacobians.evaluate(rhs, stepStart, y, yDot, stepSize, jacobian, dfdt);
                    jacobianRhs += getEvaluations() - before;
                    jacobianCount++;
                    needJacobian = false;
                    jacobianAtStepStart = true;
                    jacobianAge = 0;
                    factoredStep = Double.NaN;
                }
                boolean factored = true;
                if (stepSize != factoredStep) {
                    factored = factor(lu, jacobian, stepSize);
                    decompositions++;
                    factoredStep = factored ? stepSize : Double.NaN;
                }
                String failure;
                double reduction;
                if (!factored || !step.attempt(rhs, stepStart, y, yDot, stepSize, dfdt, lu)) {
                    error = Double.POSITIVE_INFINITY;
                    failure = factored ? "a stage value was not finite" : "the iteration matrix was singular";
                    reduction = NON_FINITE_REDUCTION;
                } else {
                    error = control.errorNorm(step.error, y, step.solution, primary);
                    double excursion = negativeExcursion(y, step.solution, flags);
                    if (!(error <= 1.0)) {
                        failure = String.format(Locale.ROOT, "local error test failed, scaled error %.3g", error);
                        reduction = control.factor(error, false);
                    } else if (excursion > 1.0) {
                        failure = "a non-negative component fell below minus its absolute tolerance";
                        reduction = Math.min(NEGATIVITY_REDUCTION, control.factor(excursion, false));
                        negativityRejections++;
                    } else {
                        break;
                    }
                }
                rejected++;
                rejectedThisStep = true;
                if (!jacobianAtStepStart) {
                    // the failure may be the old Jacobian's doing: retry the same step with a fresh one first
                    needJacobian = true;
                    if (Double.isFinite(error)) {
                        reduction = 1.0;
                    }
                }
                double retry = Math.abs(stepSize) * reduction;
                if (retry < control.minStep) {
                    throw new StepSizeUnderflowException(stepStart, retry, control.minStep, failure);
                }
                hAbs = retry;
            }

            accepted++;
            double[] solution = step.solution;
            for (int i = 0; clipWithinTolerance && i < flags.length; i++) {
                if (flags[i] && solution[i] < 0.0) {
                    solution[i] = 0.0;
                }
            }
            double stepEnd = stepSize == t - stepStart ? t : stepStart + stepSize;
            System.arraycopy(solution, 0, yEnd, 0, n);
            interpolator.storeStep(y, step.stages);
            interpolator.storeTime(stepEnd);
            System.arraycopy(yEnd, 0, y, 0, n);
            computeDerivatives(stepEnd, y, yDot);
            jacobianAtStepStart = false;
            jacobianAge++;
            if (jacobianAge >= maxJacobianAge) {
                needJacobian = true;
            }

            // Commons Math 3.6.1 sets resetOccurred when a handler resets but never clears it again: clear it
            // here so that only a reset during this step forces a fresh Jacobian
            resetOccurred = false;
            stepStart = acceptStep(interpolator, y, yDot, t);
            if (!isLastStep && stepStart == t) {
                // an event located at the end time itself (within its convergence) ends the step there without
                // ending the integration: nothing is left to integrate, and a step of length zero would make
                // the iteration matrix infinite
                isLastStep = true;
            }

            if (!isLastStep) {
                if (resetOccurred) {
                    needJacobian = true;
                    realignEvents(interpolator, y, forward, equations);
                }
                interpolator.storeTime(stepStart);
                // a proposal below minStep is raised to it: if that step fails, the rejection throws
                hAbs = Math.max(control.minStep,
                        control.limit(Math.abs(stepSize) * control.factor(error, !rejectedThisStep)));
            }
        } while (!isLastStep);

        equations.setTime(stepStart);
        equations.setCompleteState(y);
        statistics = new RosenbrockStatistics(getEvaluations(), jacobianRhs, jacobianCount, decompositions,
                accepted, rejected, negativityRejections);
    }

    /** Builds (1/(h gamma)) I - J into the LU workspace and factors it. */
    private static boolean factor(DenseLu lu, double[][] jacobian, double h) {
        double[][] m = lu.matrix();
        double diagonal = 1.0 / (h * Ros34Pw2Tableau.GAMMA);
        int n = jacobian.length;
        for (int i = 0; i < n; i++) {
            double[] row = m[i];
            double[] source = jacobian[i];
            for (int j = 0; j < n; j++) {
                row[j] = -source[j];
            }
            row[i] += diagonal;
        }
        return lu.factor();
    }

    /**
     * Largest excursion {@code (min(y0_i, 0) - y1_i) / absTol_i} over flagged components (0 if none went down
     * below zero): how far the step took a component below zero, or below where it already was if it started
     * below zero. A step may start a little below zero (the dense output at an event time can undershoot where
     * the step ends did not); counting from zero there would refuse every step, however short, that merely
     * keeps the component where it is, down to the minimum step.
     */
    private double negativeExcursion(double[] y0, double[] y1, boolean[] flags) {
        double worst = 0.0;
        for (int i = 0; i < flags.length; i++) {
            if (flags[i] && y1[i] < 0.0) {
                worst = Math.max(worst, (Math.min(y0[i], 0.0) - y1[i]) / control.absTol(i));
            }
        }
        return worst;
    }

    private boolean[] nonNegativeFlags(int primary) {
        boolean[] flags = new boolean[primary];
        for (int index : nonNegativeIndices) {
            if (index >= primary) {
                throw new OutOfRangeException(index, 0, primary - 1);
            }
            flags[index] = true;
        }
        return flags;
    }

    /** After an event reset at stepStart, lets every wrapped handler re-align its sign (ResetConsistentEvent). */
    private void realignEvents(Ros34Pw2StepInterpolator interpolator, double[] y, boolean forward,
                               ExpandableStatefulODE equations) {
        interpolator.setInterpolatedTime(stepStart);
        double[] before = new double[y.length];
        equations.getPrimaryMapper().insertEquationData(interpolator.getInterpolatedState(), before);
        EquationsMapper[] secondary = equations.getSecondaryMappers();
        for (int i = 0; i < secondary.length; i++) {
            secondary[i].insertEquationData(interpolator.getInterpolatedSecondaryState(i), before);
        }
        if (java.util.Arrays.equals(before, y)) {
            return;
        }
        for (ResetConsistentEvent event : events) {
            event.afterReset(stepStart, before, y, forward);
        }
    }
}
