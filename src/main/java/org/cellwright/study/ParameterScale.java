package org.cellwright.study;

/**
 * The scale on which a fit moves a free parameter. The optimiser works on an internal value; the model sees
 * the parameter's value in SI units.
 *
 * <p>Scale-like positive quantities (exchange current densities, a diffusion-layer thickness, a gap, a
 * conductivity) move on a logarithmic scale: a step is a factor, the value can never turn negative, and the
 * confidence interval, symmetric in the logarithm, is a factor either way. Offsets (a standard potential, a
 * temperature) move linearly. Quantities that may be zero but not negative (a contact resistance) move
 * linearly and are held at zero from below.
 */
public enum ParameterScale {
    /** Internal value ln(value); value > 0. */
    LOG {
        @Override
        public double toInternal(double value) {
            return Math.log(value);
        }

        @Override
        public double toValue(double internal) {
            return Math.exp(internal);
        }
    },
    /** Internal value = value; any sign. */
    LINEAR {
        @Override
        public double toInternal(double value) {
            return value;
        }

        @Override
        public double toValue(double internal) {
            return internal;
        }
    },
    /** Internal value = value, held at zero or above. */
    NON_NEGATIVE {
        @Override
        public double toInternal(double value) {
            return value;
        }

        @Override
        public double toValue(double internal) {
            return Math.max(internal, 0.0);
        }
    };

    /**
     * @param value the parameter's value (SI)
     * @return the internal value the optimiser moves
     */
    public abstract double toInternal(double value);

    /**
     * @param internal an internal value
     * @return the parameter's value (SI)
     */
    public abstract double toValue(double internal);

    /** @return true when a step on this scale is a factor rather than an increment */
    public boolean isRelative() {
        return this == LOG;
    }
}
