package org.cellwright.sim.deposit;

/**
 * Despic and Popov's amplification of a protrusion inside the diffusion layer of a flat cathode at its
 * limiting current (Despic &amp; Popov, in Modern Aspects of Electrochemistry 7, 1972; Diggle, Despic &amp;
 * Bockris, J. Electrochem. Soc. 116 (1969) 1503): the protrusion of height h sees a diffusion layer thinner
 * by h, so it grows faster than the flat by {@code dh/dt = V_m D c0 [1/(delta - h) - 1/delta]}, which for
 * {@code h << delta} is {@code V_m D c0 h / delta^2}: {@code h = h0 exp(t V_m D c0 / delta^2)}, and the tip
 * reaches the edge of the layer (dendrites start) after the induction time
 * {@code t_i = delta^2 / (V_m D c0) ln(delta / h0)}. The delta-squared dependence is why stirring delays
 * dendrites. SI units.
 */
public final class ProtrusionAmplification {

    private ProtrusionAmplification() {
    }

    /**
     * @param layerM diffusion-layer thickness delta (m)
     * @param heightM protrusion height h, below delta (m)
     * @return dh/dt relative to the flat (m/s), planar protrusion at the limiting current
     */
    public static double growthRate(double layerM, double heightM, double molarVolumeM3PerMol, double diffusionM2PerS,
                                    double bulkMolPerM3) {
        return molarVolumeM3PerMol * diffusionM2PerS * bulkMolPerM3 * (1 / (layerM - heightM) - 1 / layerM);
    }

    /**
     * @param layerM diffusion-layer thickness delta (m)
     * @param initialHeightM h0 (m)
     * @return the induction time {@code delta^2 / (V_m D c0) ln(delta / h0)} (s)
     */
    public static double inductionTimeS(double layerM, double initialHeightM, double molarVolumeM3PerMol,
                                        double diffusionM2PerS, double bulkMolPerM3) {
        return layerM * layerM / (molarVolumeM3PerMol * diffusionM2PerS * bulkMolPerM3)
                * Math.log(layerM / initialHeightM);
    }
}
