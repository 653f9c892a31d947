package org.cellwright.study;

/**
 * The inputs a spread study samples, each with the spread it is given and why. Factors multiply the value
 * the run would otherwise use (library value, or the scenario's override). Each draw is independent: one per
 * run for the diffusion layer and the conductivity, one per species for diffusion coefficients, one per
 * reaction and electrode material for exchange current densities.
 */
public enum UncertainInput {

    /**
     * Diffusion-layer thickness: log-normal factor, geometric standard deviation 1.3 (about -23 %/+30 % for
     * one standard deviation). An agitation preset stands for a band of conditions (100-500 um in a still bath,
     * 20-100 um when stirred or gassed: Pletcher &amp; Walsh 1990, Bard &amp; Faulkner 2001, from memory), and
     * mass-transfer correlations for natural convection carry about +-25 % (Wilke, Eisenberg &amp; Tobias 1953,
     * physics-data section 14 case 10).
     */
    DIFFUSION_LAYER("diffusion layer", "log-normal, geometric sd 1.3", 1.3),

    /**
     * Exchange current densities: log-uniform factor between 0.1 and 10 (one decade either way). Compilations
     * of i0 for the same couple disagree by one to two decades (physics-data section 3: Trasatti 1972 against
     * the Tafel-constant tables of Antropov and of Fontana &amp; Greene, "use them as bands").
     */
    EXCHANGE_CURRENT("exchange current densities", "log-uniform, 0.1x to 10x", 1.0),

    /**
     * Conductivity: normal factor, standard deviation 4 % (+-8 % for 95 %), on every ion's limiting molar
     * conductivity together (the model is linear in them, so the bath conductivity takes the same factor).
     * docs/conductivity.md: largest error against the CRC tables +8.3 % between 0.1 and 2 mol/L, mean
     * absolute error 2.8 % (a normal with sd 3.5 % has that mean absolute error). A pinned conductivity (a
     * measured value) takes sd 2 % instead, the accuracy of a calibrated conductivity meter (common practice).
     */
    CONDUCTIVITY("conductivity", "normal, sd 4 % (2 % when pinned)", 0.04),

    /**
     * Diffusion coefficients: normal factor, standard deviation 5 % (+-10 % for 95 %), per species. The CRC
     * values are for infinite dilution at 25 C; concentrated baths and complexation move them (physics-data
     * section 4: Cu2+ in 1.5-2 M sulfuric acid 5-6e-10 m2/s against 7.14e-10 at infinite dilution).
     */
    DIFFUSION_COEFFICIENT("diffusion coefficients", "normal, sd 5 %", 0.05);

    /** Standard deviation of a pinned (measured) conductivity, as a fraction. */
    public static final double PINNED_CONDUCTIVITY_SD = 0.02;
    /** Smallest factor a normal draw may give: keeps every value positive far out in the tail. */
    static final double MIN_FACTOR = 0.5;

    private final String description;
    private final String distribution;
    private final double parameter;

    UncertainInput(String description, String distribution, double parameter) {
        this.description = description;
        this.distribution = distribution;
        this.parameter = parameter;
    }

    /** @return what is sampled, in words */
    public String description() {
        return description;
    }

    /** @return the distribution and its width, in words */
    public String distribution() {
        return distribution;
    }

    /**
     * @return the width: geometric sd (diffusion layer), decades either way (exchange currents), relative sd
     *     (conductivity, diffusion coefficients)
     */
    public double parameter() {
        return parameter;
    }

    /**
     * Draws one factor.
     *
     * @param random the sample's random numbers
     * @param pinned for the conductivity: true when the scenario pins a measured value
     * @return the factor that multiplies the nominal value
     */
    double draw(java.util.SplittableRandom random, boolean pinned) {
        return switch (this) {
            case DIFFUSION_LAYER -> Math.exp(Math.log(parameter) * gaussian(random));
            case EXCHANGE_CURRENT -> Math.pow(10, parameter * (2 * random.nextDouble() - 1));
            case CONDUCTIVITY -> Math.max(MIN_FACTOR, 1 + (pinned ? PINNED_CONDUCTIVITY_SD : parameter) * gaussian(random));
            case DIFFUSION_COEFFICIENT -> Math.max(MIN_FACTOR, 1 + parameter * gaussian(random));
        };
    }

    /** A standard normal draw (Box-Muller: Box &amp; Muller, Ann. Math. Stat. 29 (1958) 610). */
    static double gaussian(java.util.SplittableRandom random) {
        double u1 = 1 - random.nextDouble();
        double u2 = random.nextDouble();
        return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    }
}
