package org.cellwright.cell;

import java.util.Objects;

/**
 * One electrode (or a set of electrodes of one polarity, lumped), a parallel plate facing the other.
 *
 * @param material canonical electrode material name (see the chemistry library)
 * @param areaM2 active area facing the counter electrode (m2), > 0
 */
public record Electrode(String material, double areaM2) {

    public Electrode {
        Objects.requireNonNull(material, "material");
        Checks.positive("area", areaM2, "m2");
    }

    /** @return a copy with another area (m2) */
    public Electrode withArea(double a) {
        return new Electrode(material, a);
    }
}
