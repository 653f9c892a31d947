package org.cellwright.sim.ode;

import org.apache.commons.math3.exception.DimensionMismatchException;
import org.apache.commons.math3.exception.NotStrictlyPositiveException;
import org.apache.commons.math3.exception.NumberIsTooLargeException;
import org.apache.commons.math3.exception.NumberIsTooSmallException;
import org.apache.commons.math3.exception.util.LocalizedFormats;

/**
 * Tolerances, scaled error norm and step-size rule of the Rosenbrock integrator.
 *
 * <p>Error norm: root mean square over the primary components of {@code err_i / (absTol_i + relTol_i *
 * max(|y0_i|, |y1_i|))}; a step is accepted when it is at most 1 (Hairer, Norsett and Wanner, <i>Solving
 * Ordinary Differential Equations I</i>, 2nd ed. (1993), Section II.4). New step:
 * {@code h * min(maxGrowth, max(minReduction, safety * err^(-1/3)))}, the exponent being 1/(q+1) for the
 * embedded order q = 2 (same section); after a rejection the retried step may not grow. Defaults safety 0.9,
 * minReduction 0.2, maxGrowth 6 (common practice; the defaults of Hairer and Wanner's RODAS code, from
 * memory).
 */
final class StepSizeControl {

    private static final double EXPONENT = -1.0 / (Ros34Pw2Tableau.EMBEDDED_ORDER + 1);

    final double minStep;
    final double maxStep;
    private final double scalarAbsTol;
    private final double scalarRelTol;
    private final double[] vecAbsTol;
    private final double[] vecRelTol;
    double safety = 0.9;
    double minReduction = 0.2;
    double maxGrowth = 6.0;

    StepSizeControl(double minStep, double maxStep, double absTol, double relTol) {
        this(minStep, maxStep, absTol, relTol, null, null);
    }

    StepSizeControl(double minStep, double maxStep, double[] absTol, double[] relTol) {
        this(minStep, maxStep, Double.NaN, Double.NaN, absTol.clone(), relTol.clone());
        if (absTol.length != relTol.length) {
            throw new DimensionMismatchException(relTol.length, absTol.length);
        }
        for (int i = 0; i < absTol.length; i++) {
            checkTolerance(absTol[i], relTol[i]);
        }
    }

    private StepSizeControl(double minStep, double maxStep, double absTol, double relTol,
                            double[] vecAbsTol, double[] vecRelTol) {
        if (!(minStep >= 0.0)) {
            throw new NumberIsTooSmallException(LocalizedFormats.MINIMAL_STEPSIZE_REACHED_DURING_INTEGRATION,
                    minStep, 0.0, true);
        }
        if (!(maxStep > 0.0)) {
            throw new NotStrictlyPositiveException(maxStep);
        }
        if (minStep > maxStep) {
            throw new NumberIsTooLargeException(minStep, maxStep, true);
        }
        this.minStep = minStep;
        this.maxStep = maxStep;
        this.scalarAbsTol = absTol;
        this.scalarRelTol = relTol;
        this.vecAbsTol = vecAbsTol;
        this.vecRelTol = vecRelTol;
        if (vecAbsTol == null) {
            checkTolerance(absTol, relTol);
        }
    }

    private static void checkTolerance(double absTol, double relTol) {
        if (!(absTol >= 0.0) || !(relTol >= 0.0) || absTol + relTol == 0.0 || Double.isInfinite(absTol + relTol)) {
            throw new IllegalArgumentException("tolerances must be finite and non-negative, not both zero: absTol "
                    + absTol + ", relTol " + relTol);
        }
    }

    /** Checks that vector tolerances, if any, have one entry per primary component. */
    void checkDimension(int primaryDimension) {
        if (vecAbsTol != null && vecAbsTol.length != primaryDimension) {
            throw new DimensionMismatchException(vecAbsTol.length, primaryDimension);
        }
    }

    double absTol(int i) {
        return vecAbsTol == null ? scalarAbsTol : vecAbsTol[i];
    }

    double relTol(int i) {
        return vecRelTol == null ? scalarRelTol : vecRelTol[i];
    }

    /** Finite-difference increment floors absTol_i / relTol_i (absTol_i when relTol_i is 0), length n. */
    double[] incrementFloors(int primaryDimension, int n) {
        double[] floor = new double[n];
        for (int i = 0; i < n; i++) {
            int k = Math.min(i, primaryDimension - 1);
            double rel = relTol(k);
            floor[i] = rel > 0.0 ? absTol(k) / rel : absTol(k);
        }
        return floor;
    }

    /** RMS of err_i / (absTol_i + relTol_i * max(|y0_i|, |y1_i|)) over the first n components. */
    double errorNorm(double[] err, double[] y0, double[] y1, int n) {
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            double scale = absTol(i) + relTol(i) * Math.max(Math.abs(y0[i]), Math.abs(y1[i]));
            double r = err[i] / scale;
            sum += r * r;
        }
        return Math.sqrt(sum / n);
    }

    /** RMS of v_i / (absTol_i + relTol_i * |y_i|), used for the starting step. */
    double norm(double[] v, double[] y, int n) {
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            double r = v[i] / (absTol(i) + relTol(i) * Math.abs(y[i]));
            sum += r * r;
        }
        return Math.sqrt(sum / n);
    }

    /**
     * Step-size factor for a scaled error.
     *
     * @param error       scaled error norm (NaN or infinite counts as a failure)
     * @param allowGrowth false right after a rejection
     */
    double factor(double error, boolean allowGrowth) {
        double upper = allowGrowth ? maxGrowth : 1.0;
        if (!Double.isFinite(error)) {
            return minReduction;
        }
        if (error == 0.0) {
            return upper;
        }
        return Math.min(upper, Math.max(minReduction, safety * Math.pow(error, EXPONENT)));
    }

    /** Clips a step magnitude to maxStep. */
    double limit(double absStep) {
        return Math.min(absStep, maxStep);
    }

    /**
     * Starting step of Hairer, Norsett and Wanner, <i>Solving ODEs I</i>, Section II.4 ("Starting step size"),
     * with the exponent 1/3 of the error estimate; one RHS evaluation. Flagged components of the trial
     * explicit Euler point are clipped at zero so that the RHS is not evaluated at negative concentrations.
     */
    double startingStep(RightHandSide rhs, double t0, double[] y0, double[] f0, double t, int primary,
                        boolean[] flags) {
        double span = Math.abs(t - t0);
        double d0 = norm(y0, y0, primary);
        double d1 = norm(f0, y0, primary);
        double h0 = (d0 < 1.0e-5 || d1 < 1.0e-5) ? 1.0e-6 : 0.01 * d0 / d1;
        h0 = Math.min(limit(h0), span);
        double direction = t > t0 ? 1.0 : -1.0;
        int n = y0.length;
        double[] y1 = new double[n];
        for (int i = 0; i < n; i++) {
            y1[i] = y0[i] + direction * h0 * f0[i];
            if (i < flags.length && flags[i] && y1[i] < 0.0) {
                y1[i] = 0.0;
            }
        }
        double[] f1 = new double[n];
        rhs.evaluate(t0 + direction * h0, y1, f1);
        for (int i = 0; i < n; i++) {
            f1[i] -= f0[i];
        }
        double d2 = norm(f1, y0, primary) / h0;
        double dMax = Math.max(d1, d2);
        double h1 = dMax <= 1.0e-15 ? Math.max(1.0e-6, h0 * 1.0e-3)
                : Math.pow(0.01 / dMax, 1.0 / (Ros34Pw2Tableau.EMBEDDED_ORDER + 1));
        return Math.min(limit(Math.min(100.0 * h0, h1)), span);
    }
}
