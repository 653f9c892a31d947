package org.cellwright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;

/**
 * Nonlinear least squares by Levenberg-Marquardt (Commons Math {@code fitting.leastsquares}) over free
 * parameters on their own scales, with a central-difference Jacobian whose columns are evaluated in
 * parallel, and linearised 95 % confidence intervals from {@code s^2 (J^T J)^-1} with Student's t quantile
 * (see {@link ParameterCovariance}).
 *
 * <p>The model is any function from parameter values (SI) to a residual vector (model minus measurement,
 * weighted); a point the model rejects (it throws {@link IllegalArgumentException} or
 * {@link ArithmeticException}) counts as a very poor point, so the optimiser steps back from it.
 */
public final class LeastSquaresFit {

    /** A weighted residual vector as a function of the parameters' values. */
    @FunctionalInterface
    public interface Residuals {
        /**
         * @param values the parameters' values (SI), in parameter order
         * @return the weighted residuals, always of the same length
         * @throws IllegalArgumentException when the model cannot be evaluated there
         */
        double[] at(double[] values);
    }

    /**
     * How the fit proceeds.
     *
     * @param relativeStep finite-difference step: on a log scale, the step of ln(value); on a linear scale, the
     *     step relative to max(|value|, typical)
     * @param maxIterations iteration limit of the optimiser
     * @param costTolerance relative reduction of the sum of squares below which the fit has converged
     * @param parameterTolerance relative size of the trust region below which the fit has converged
     * @param threads threads for the Jacobian's columns (1 for none)
     */
    public record Options(double relativeStep, int maxIterations, double costTolerance, double parameterTolerance,
                          int threads) {

        public Options {
            if (!(relativeStep > 0 && relativeStep < 1)) {
                throw new IllegalArgumentException("relative step must lie in (0, 1), got " + relativeStep);
            }
            if (maxIterations < 1 || threads < 1) {
                throw new IllegalArgumentException("iterations and threads must be at least 1");
            }
        }

        /**
         * For a model with smooth, exactly computed values (a formula): steps of 1e-6, which balances the
         * central difference's truncation error (step^2) against rounding (1e-16 / step) (common practice:
         * Press et al., Numerical Recipes, 3rd ed., section 5.7).
         *
         * @return options for a formula model
         */
        public static Options forFormula() {
            return new Options(1e-6, 200, 1e-12, 1e-12, 1);
        }

        /**
         * For the engine, whose results carry the integrator's error control (relative 1e-4): steps of 1 %
         * of a value keep that noise small against the difference, and a sum of squares that no longer falls
         * by 1e-7 of itself is converged, being at the noise level of the runs (measured: see the fit tests).
         *
         * @return options for fits that run the engine
         */
        public static Options forEngine() {
            return new Options(1e-2, 60, 1e-7, 1e-6, Math.max(1, Runtime.getRuntime().availableProcessors()));
        }
    }

    private final List<FreeParameter> parameters;
    private final Residuals residuals;
    private final Options options;
    private final FitMonitor monitor;
    private final AtomicLong evaluations = new AtomicLong();
    private final AtomicInteger iterations = new AtomicInteger();
    private final ResidualCache cache;
    private double penalty = 1e6;
    private int size;
    private double[] bestInternal;
    private double[] lastJacobianAt;
    private double[][] lastJacobian;
    private double bestCost = Double.POSITIVE_INFINITY;

    /**
     * @param parameters the free parameters, in the order the model takes them
     * @param residuals the model
     * @param options how to proceed
     * @param monitor receives progress and may cancel, or {@link FitMonitor#NONE}
     */
    public LeastSquaresFit(List<FreeParameter> parameters, Residuals residuals, Options options, FitMonitor monitor) {
        if (parameters.isEmpty()) {
            throw new IllegalArgumentException("a fit needs at least one free parameter");
        }
        this.parameters = List.copyOf(parameters);
        this.residuals = residuals;
        this.options = options;
        this.monitor = monitor == null ? FitMonitor.NONE : monitor;
        this.cache = new ResidualCache(2 * parameters.size() + 4);
    }

    /**
     * Fits the parameters.
     *
     * @return the values, their intervals and the goodness of fit
     * @throws IllegalArgumentException when the model fails at the start, there are no more residuals than
     *     parameters, or a parameter does not change the residuals at all (the message names it)
     * @throws FitCancelledException when the monitor cancelled the fit
     */
    public FitOutcome fit() {
        double[] u0 = new double[parameters.size()];
        for (int j = 0; j < u0.length; j++) {
            u0[j] = parameters.get(j).scale().toInternal(parameters.get(j).start());
        }
        double[] r0 = evaluate(u0, false);
        int n = r0.length;
        size = n;
        if (n <= parameters.size()) {
            throw new IllegalArgumentException("the fit has " + n + " measured values for " + parameters.size()
                    + " free parameters; it needs more values than parameters");
        }
        penalty = 1e3 * (Math.sqrt(sumOfSquares(r0) / n) + 1);
        ExecutorService pool = options.threads() > 1 ? Executors.newFixedThreadPool(options.threads(), r -> {
            Thread t = new Thread(r, "cellwright-fit");
            t.setDaemon(true);
            return t;
        }) : null;
        try {
            double[][] j0 = jacobian(u0, pool);
            ParameterCovariance.requireSensitive(parameters, j0);
            boolean converged = true;
            double[] uBest;
            int iters;
            try {
                LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer()
                        .withCostRelativeTolerance(options.costTolerance())
                        .withParameterRelativeTolerance(options.parameterTolerance())
                        .optimize(new LeastSquaresBuilder()
                                .start(u0)
                                .target(new double[n])
                                .model(u -> negated(evaluateOrPenalty(u)), u -> negated(jacobian(u, pool)))
                                .lazyEvaluation(true)
                                .parameterValidator(p -> {
                                    for (int j = 0; j < parameters.size(); j++) {
                                        if (parameters.get(j).scale() == ParameterScale.NON_NEGATIVE
                                                && p.getEntry(j) < 0) {
                                            p.setEntry(j, 0.0);
                                        }
                                    }
                                    return p;
                                })
                                .maxIterations(options.maxIterations())
                                .maxEvaluations(Integer.MAX_VALUE)
                                .build());
                uBest = opt.getPoint().toArray();
                iters = opt.getIterations();
            } catch (TooManyIterationsException | TooManyEvaluationsException e) {
                converged = false;
                uBest = bestInternal.clone();
                iters = options.maxIterations();
            }
            double[] r = evaluate(uBest, false);
            double[][] jac = jacobian(uBest, pool);
            return ParameterCovariance.outcome(parameters, uBest, r, jac, iters, evaluations.get(), converged);
        } finally {
            if (pool != null) {
                pool.shutdownNow();
            }
        }
    }

    /** @return model evaluations so far */
    public long evaluations() {
        return evaluations.get();
    }

    private static double[] negated(double[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = -v[i];
        }
        return out;
    }

    private static double[][] negated(double[][] m) {
        double[][] out = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            out[i] = negated(m[i]);
        }
        return out;
    }

    static double sumOfSquares(double[] r) {
        double s = 0;
        for (double v : r) {
            s += v * v;
        }
        return s;
    }

    private double[] values(double[] u) {
        double[] v = new double[u.length];
        for (int j = 0; j < u.length; j++) {
            v[j] = parameters.get(j).scale().toValue(u[j]);
        }
        return v;
    }

    /**
     * The residuals at an internal point, from the cache when it was evaluated before. With {@code tolerant},
     * a point the model rejects gives a vector of large residuals instead of an exception.
     */
    private double[] evaluate(double[] u, boolean tolerant) {
        double[] cached = cache.get(u);
        if (cached != null) {
            return cached;
        }
        if (monitor.cancelled()) {
            throw new FitCancelledException();
        }
        double[] r;
        try {
            evaluations.incrementAndGet();
            r = residuals.at(values(u));
            for (double x : r) {
                if (!Double.isFinite(x)) {
                    throw new ArithmeticException("the model gave a value that is not a finite number");
                }
            }
        } catch (IllegalArgumentException | ArithmeticException e) {
            if (!tolerant) {
                throw new IllegalArgumentException("the model cannot be evaluated at " + describe(u) + ": "
                        + e.getMessage(), e);
            }
            return null;
        }
        cache.put(u, r);
        synchronized (this) {
            double cost = sumOfSquares(r);
            if (cost < bestCost) {
                bestCost = cost;
                bestInternal = u.clone();
            }
        }
        return r;
    }

    private double[] evaluateOrPenalty(double[] u) {
        double[] r = evaluate(u, true);
        if (r == null) {
            r = new double[size];
            java.util.Arrays.fill(r, penalty);
        }
        return r;
    }

    private String describe(double[] u) {
        double[] v = values(u);
        List<String> parts = new ArrayList<>();
        for (int j = 0; j < v.length; j++) {
            parts.add(parameters.get(j).key() + " = " + v[j]);
        }
        return String.join(", ", parts);
    }

    /** The step of parameter j at internal point u. */
    private double step(int j, double[] u) {
        FreeParameter p = parameters.get(j);
        if (p.scale().isRelative()) {
            return options.relativeStep();
        }
        return options.relativeStep() * Math.max(Math.abs(u[j]), p.typical());
    }

    /**
     * The Jacobian of the residuals by central differences, one-sided at a bound or where one side cannot be
     * evaluated. Columns are evaluated in parallel when a pool is given.
     */
    private double[][] jacobian(double[] u, ExecutorService pool) {
        if (lastJacobianAt != null && java.util.Arrays.equals(u, lastJacobianAt)) {
            return lastJacobian;
        }
        double[] center = evaluateOrPenalty(u);
        int n = center.length;
        int p = parameters.size();
        double[][] plus = new double[p][];
        double[][] minus = new double[p][];
        double[] hPlus = new double[p];
        double[] hMinus = new double[p];
        List<Runnable> tasks = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            final int col = j;
            double h = step(j, u);
            double[] up = u.clone();
            up[j] += h;
            hPlus[j] = up[j] - u[j];
            double[] down = u.clone();
            down[j] -= h;
            boolean below = parameters.get(j).scale() == ParameterScale.NON_NEGATIVE && down[j] < 0;
            hMinus[j] = below ? 0 : u[j] - down[j];
            tasks.add(() -> plus[col] = evaluate(up, true));
            if (!below) {
                tasks.add(() -> minus[col] = evaluate(down, true));
            }
        }
        run(tasks, pool);
        double[][] jac = new double[n][p];
        for (int j = 0; j < p; j++) {
            double[] a = plus[j] != null ? plus[j] : center;
            double[] b = minus[j] != null ? minus[j] : center;
            double span = (plus[j] != null ? hPlus[j] : 0) + (minus[j] != null ? hMinus[j] : 0);
            if (span == 0) {
                throw new IllegalArgumentException("the model cannot be evaluated on either side of "
                        + parameters.get(j).key() + " = " + values(u)[j]);
            }
            for (int i = 0; i < n; i++) {
                jac[i][j] = (a[i] - b[i]) / span;
            }
        }
        lastJacobianAt = u.clone();
        lastJacobian = jac;
        int it = iterations.incrementAndGet();
        monitor.progress(new FitProgress(it, evaluations.get(), sumOfSquares(center),
                parameters.stream().map(FreeParameter::key).toList(), values(u)));
        return jac;
    }

    private static void run(List<Runnable> tasks, ExecutorService pool) {
        if (pool == null) {
            tasks.forEach(Runnable::run);
            return;
        }
        List<Future<?>> futures = new ArrayList<>();
        tasks.forEach(t -> futures.add(pool.submit(t)));
        try {
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            futures.forEach(f -> f.cancel(true));
            Thread.currentThread().interrupt();
            throw new FitCancelledException();
        } catch (ExecutionException e) {
            futures.forEach(f -> f.cancel(true));
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(e.getCause());
        }
    }
}
