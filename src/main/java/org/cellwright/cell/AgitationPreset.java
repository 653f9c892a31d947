package org.cellwright.cell;

import java.util.Arrays;
import java.util.Optional;

/**
 * Named agitation levels and their steady Nernst diffusion-layer thickness.
 *
 * <p>Source: Pletcher &amp; Walsh, <i>Industrial Electrochemistry</i>, 2nd ed. (1990), and Bard &amp;
 * Faulkner, <i>Electrochemical Methods</i>, 2nd ed. (2001), ch. 1 and 9 (from memory): 100-500 um for
 * natural convection, 20-100 um gas-stirred or moderately stirred, 5-30 um vigorous stirring. The
 * air-sparged value matches about 32 A/m2 of limiting current per g/L of Cu2+ (Skarbo and Harvey, as cited
 * in nickel electrowinning practice), i.e. km near 1.0e-5 m/s for D = 7.1e-10 m2/s.
 */
public enum AgitationPreset {
    /** Still bath, no stirring, no gassing: natural convection only. */
    STILL("still", 300e-6),
    /** Natural convection helped by warmth or light gassing at the electrodes. */
    NATURAL("natural", 200e-6),
    /** A gently stirred bath (slow paddle or slow recirculation). */
    GENTLE("gentle", 100e-6),
    /** A well stirred bath (magnetic bar, propeller). */
    STIRRED("stirred", 30e-6),
    /** Air sparged between the electrodes. */
    SPARGED("sparged", 70e-6);

    private final String key;
    private final double diffusionLayerM;

    AgitationPreset(String key, double diffusionLayerM) {
        this.key = key;
        this.diffusionLayerM = diffusionLayerM;
    }

    /** @return the name used in scenario files */
    public String key() {
        return key;
    }

    /** @return the steady diffusion-layer thickness (m) */
    public double diffusionLayerM() {
        return diffusionLayerM;
    }

    /** @return the preset of this name (case-insensitive) */
    public static Optional<AgitationPreset> find(String name) {
        return Arrays.stream(values()).filter(p -> p.key.equalsIgnoreCase(name.strip())).findFirst();
    }
}
