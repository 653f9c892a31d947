package org.cellwright.sim.ode;

import java.util.Locale;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.exception.util.LocalizedFormats;

/**
 * Thrown when the integrator would need a step shorter than its minimum step to meet the tolerances: the
 * equations are usually discontinuous or singular near that time, or the tolerances are tighter than the
 * right-hand side's own accuracy.
 */
public class StepSizeUnderflowException extends MathIllegalStateException {

    private static final long serialVersionUID = 20250601L;

    private final double time;
    private final double stepSize;
    private final double minStep;

    /**
     * @param time     time at the start of the failing step (s)
     * @param stepSize step that would be needed (s, magnitude)
     * @param minStep  minimum step allowed (s)
     * @param reason   what made the last attempt fail
     */
    public StepSizeUnderflowException(double time, double stepSize, double minStep, String reason) {
        super(LocalizedFormats.SIMPLE_MESSAGE, String.format(Locale.ROOT,
                "ODE step size %.3g s at t = %.6g s fell below the minimum step %.3g s (%s); the equations may be "
                        + "discontinuous or singular there, or the tolerances are too tight",
                stepSize, time, minStep, reason));
        this.time = time;
        this.stepSize = stepSize;
        this.minStep = minStep;
    }

    /** Time at the start of the failing step (s). */
    public double getTime() {
        return time;
    }

    /** Step size that would be needed (s, magnitude). */
    public double getStepSize() {
        return stepSize;
    }

    /** Minimum step allowed (s). */
    public double getMinStep() {
        return minStep;
    }
}
