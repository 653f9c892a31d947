package org.cellwright.cell;

/**
 * How the electrolyte moves at the electrodes, as a steady Nernst diffusion-layer thickness.
 *
 * <p>After switch-on the layer grows as {@code 2 sqrt(D t / pi)} until it reaches this steady value;
 * the engine applies that transient for every preset.
 *
 * @param preset the preset's name ("still", "natural", "gentle", "stirred", "sparged"), or null when the
 *     thickness was set directly
 * @param diffusionLayerM steady diffusion-layer thickness (m), > 0
 */
public record Agitation(String preset, double diffusionLayerM) {

    public Agitation {
        Checks.positive("cell.diffusion_layer", diffusionLayerM, "m");
    }

    /** @return the agitation of a named preset */
    public static Agitation of(AgitationPreset p) {
        return new Agitation(p.key(), p.diffusionLayerM());
    }

    /** @return an agitation set directly by its diffusion-layer thickness (m) */
    public static Agitation ofLayer(double deltaM) {
        return new Agitation(null, deltaM);
    }
}
