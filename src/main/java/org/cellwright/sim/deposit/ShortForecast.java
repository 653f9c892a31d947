package org.cellwright.sim.deposit;

/**
 * When a dendrite will bridge the gap.
 *
 * <p>Formula 6 of the physics reference (from memory, after Diggle, Despic &amp; Bockris 1969 and Chazalviel
 * 1990): {@code t_short = t_onset + (gap - deposit thickness) / v_tip}. The engine's forecast integrates its
 * own tip model ({@link TipGrowth#heightRate}) at conditions frozen at the moment of the forecast: the tip
 * rises by {@code dh/dt} above a flat deposit that itself advances at its Faradaic speed, and the short comes
 * when tip and flat together span the gap. Inside the diffusion layer the quadrature steps by 1 % in h;
 * outside it the tip's speed is constant and the rest is one division.
 */
public final class ShortForecast {

    /** Relative step of the quadrature inside the diffusion layer. */
    private static final double STEP = 1.01;

    private ShortForecast() {
    }

    /**
     * Formula 6.
     *
     * @param onsetS time at which the tip starts to run (s)
     * @param gapM anode-cathode gap (m)
     * @param thicknessM deposit thickness (m)
     * @param tipVelocityMPerS tip speed (m/s)
     * @return the time of the short (s)
     */
    public static double shortCircuitTimeS(double onsetS, double gapM, double thicknessM, double tipVelocityMPerS) {
        return onsetS + (gapM - thicknessM) / tipVelocityMPerS;
    }

    /**
     * Time from now until the tip reaches the anode, conditions frozen.
     *
     * @param s what feeds the tip now
     * @param heightM the tip's height above the flat deposit now (m)
     * @param thicknessM the flat deposit's thickness now (m)
     * @param gapM the anode-cathode gap (m)
     * @return seconds from now, 0 when already there, +infinity when the tip does not grow
     */
    public static double timeToShortS(TipSupply s, double heightM, double thicknessM, double gapM) {
        double h = Math.max(heightM, 1e-12);
        double flat = TipGrowth.velocity(TipGrowth.flatCurrentDensity(s), s.molarVolumeM3PerMol(), s.n());
        double thickness = thicknessM;
        if (h + thickness >= gapM) {
            return 0;
        }
        if (!(TipGrowth.heightRate(s, h) > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        double t = 0;
        while (h < s.layerM()) {
            double next = Math.min(h * STEP, s.layerM());
            double rate = TipGrowth.heightRate(s, Math.sqrt(h * next));
            double dt = (next - h) / rate;
            double closing = rate + flat;
            double left = gapM - thickness - h;
            if (closing * dt >= left) {
                return t + left / closing;
            }
            t += dt;
            thickness += flat * dt;
            h = next;
        }
        double closing = TipGrowth.heightRate(s, h) + flat;
        return t + (gapM - thickness - h) / closing;
    }
}
