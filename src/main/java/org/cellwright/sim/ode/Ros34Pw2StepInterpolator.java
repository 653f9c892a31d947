package org.cellwright.sim.ode;

import java.io.IOException;
import java.io.ObjectInput;
import java.io.ObjectOutput;
import org.apache.commons.math3.ode.EquationsMapper;
import org.apache.commons.math3.ode.sampling.AbstractStepInterpolator;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Dense output of one {@link Ros34Pw2Integrator} step, handed by Commons Math to event handlers and step
 * handlers (including {@code StepNormalizer}).
 *
 * <p>The state inside the step is the continuous extension of ROS34PW2 (see {@link Ros34Pw2Tableau}):
 * {@code y(t0 + theta h) = y0 + sum_i m_i(theta) u_i + theta d}, built from the stage vectors u_i the step has
 * already computed, so it costs no right-hand-side evaluation. It has order 3.
 * Being a combination of stages, each damped by the linear solves, it stays bounded on stiff components (its
 * stiff limit R(theta, infinity) falls from 1 at theta = 0 to 0 at theta = 1, dipping to -0.73), unlike a cubic
 * Hermite interpolant through f(y0) and f(y1), whose end slopes carry the stiff components' errors multiplied
 * by h * lambda. The small term theta d makes the extension end exactly on the accepted y1, which may differ from
 * y0 + sum m_i u_i by the non-negativity projection (at most one absolute tolerance) and by rounding. Components
 * flagged non-negative are clipped at zero; since the exact solution is non-negative, clipping can only bring the
 * value closer to it.
 */
public class Ros34Pw2StepInterpolator extends AbstractStepInterpolator {

    private static final long serialVersionUID = 20250601L;

    private double[] previousState;
    private double[][] stages;
    private double[] endCorrection;
    private boolean[] nonNegative;
    private final double[] weight = new double[Ros34Pw2Tableau.STAGES];
    private final double[] slope = new double[Ros34Pw2Tableau.STAGES];

    /** Empty interpolator for externalization only; the integrator builds usable ones. */
    public Ros34Pw2StepInterpolator() {
        super();
        previousState = null;
        stages = null;
        endCorrection = null;
        nonNegative = new boolean[0];
    }

    /** Deep copy, so that a copy kept by a step handler survives the following steps. */
    Ros34Pw2StepInterpolator(Ros34Pw2StepInterpolator other) {
        super(other);
        previousState = other.previousState == null ? null : other.previousState.clone();
        endCorrection = other.endCorrection == null ? null : other.endCorrection.clone();
        nonNegative = other.nonNegative.clone();
        if (other.stages == null) {
            stages = null;
        } else {
            stages = new double[other.stages.length][];
            for (int i = 0; i < stages.length; i++) {
                stages[i] = other.stages[i].clone();
            }
        }
    }

    /**
     * Prepares the interpolator for an integration.
     *
     * @param y           array that holds the state at the end of each step (shared with the integrator)
     * @param forward     integration direction
     * @param primary     mapper of the primary equations
     * @param secondary   mappers of secondary equations
     * @param nonNegative flags of the primary components to clip at zero (may be shorter than y)
     */
    void reinitialize(double[] y, boolean forward, EquationsMapper primary, EquationsMapper[] secondary,
                      boolean[] nonNegative) {
        reinitialize(y, forward, primary, secondary);
        int n = y.length;
        previousState = new double[n];
        endCorrection = new double[n];
        stages = new double[Ros34Pw2Tableau.STAGES][n];
        this.nonNegative = nonNegative.clone();
    }

    /**
     * Records the data of an accepted step; the end state must already be in the shared array.
     *
     * @param y0 state at the start of the step
     * @param u  transformed stage vectors of the step
     */
    void storeStep(double[] y0, double[][] u) {
        int n = previousState.length;
        System.arraycopy(y0, 0, previousState, 0, n);
        for (int i = 0; i < Ros34Pw2Tableau.STAGES; i++) {
            System.arraycopy(u[i], 0, stages[i], 0, n);
        }
        Ros34Pw2Tableau.denseWeights(1.0, weight, slope);
        for (int k = 0; k < n; k++) {
            double s = previousState[k];
            for (int i = 0; i < Ros34Pw2Tableau.STAGES; i++) {
                s += weight[i] * stages[i][k];
            }
            endCorrection[k] = currentState[k] - s;
        }
    }

    @Override
    protected StepInterpolator doCopy() {
        return new Ros34Pw2StepInterpolator(this);
    }

    @Override
    protected void computeInterpolatedStateAndDerivatives(double theta, double oneMinusThetaH) {
        int n = previousState.length;
        if (h == 0.0) {
            System.arraycopy(currentState, 0, interpolatedState, 0, n);
            return;
        }
        Ros34Pw2Tableau.denseWeights(theta, weight, slope);
        for (int k = 0; k < n; k++) {
            double value = previousState[k] + theta * endCorrection[k];
            double rate = endCorrection[k];
            for (int i = 0; i < Ros34Pw2Tableau.STAGES; i++) {
                value += weight[i] * stages[i][k];
                rate += slope[i] * stages[i][k];
            }
            if (k < nonNegative.length && nonNegative[k] && value < 0.0) {
                value = 0.0;
            }
            interpolatedState[k] = value;
            interpolatedDerivatives[k] = rate / h;
        }
    }

    @Override
    public void writeExternal(ObjectOutput out) throws IOException {
        writeBaseExternal(out);
        int n = previousState == null ? -1 : previousState.length;
        out.writeInt(n);
        for (int k = 0; k < n; k++) {
            out.writeDouble(previousState[k]);
            out.writeDouble(endCorrection[k]);
            for (int i = 0; i < Ros34Pw2Tableau.STAGES; i++) {
                out.writeDouble(stages[i][k]);
            }
        }
        out.writeInt(nonNegative.length);
        for (boolean flag : nonNegative) {
            out.writeBoolean(flag);
        }
    }

    @Override
    public void readExternal(ObjectInput in) throws IOException, ClassNotFoundException {
        double t = readBaseExternal(in);
        int n = in.readInt();
        if (n < 0) {
            previousState = null;
            endCorrection = null;
            stages = null;
        } else {
            previousState = new double[n];
            endCorrection = new double[n];
            stages = new double[Ros34Pw2Tableau.STAGES][n];
            for (int k = 0; k < n; k++) {
                previousState[k] = in.readDouble();
                endCorrection[k] = in.readDouble();
                for (int i = 0; i < Ros34Pw2Tableau.STAGES; i++) {
                    stages[i][k] = in.readDouble();
                }
            }
        }
        nonNegative = new boolean[in.readInt()];
        for (int k = 0; k < nonNegative.length; k++) {
            nonNegative[k] = in.readBoolean();
        }
        setInterpolatedTime(t);
    }
}
