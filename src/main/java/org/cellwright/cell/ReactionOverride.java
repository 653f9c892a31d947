package org.cellwright.cell;

/**
 * A scenario's override or addition of an electrode reaction; null fields keep the library value.
 *
 * @param name the couple, "Ox/Red", canonical
 * @param equation the reduction written out, needed only for a new reaction
 * @param e0V standard potential vs SHE at 25 C (V), or null
 * @param i0APerM2 exchange current density at unit activities (A/m2), or null
 * @param alphaA anodic transfer coefficient, or null
 * @param alphaC cathodic transfer coefficient, or null
 * @param material electrode material the kinetics apply to, or null for the default kinetics
 */
public record ReactionOverride(String name, String equation, Double e0V, Double i0APerM2, Double alphaA,
                               Double alphaC, String material) {
}
