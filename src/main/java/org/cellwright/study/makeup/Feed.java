package org.cellwright.study.makeup;

import java.util.List;
import java.util.Objects;

/**
 * What goes into a bath, in order, and the volume it is made up to with water; SI units (the reader of the
 * feed file converts grades and volumes of acid to moles).
 *
 * @param title a name for the bath
 * @param volumeM3 the final volume after topping up with water (m3)
 * @param temperatureK the bath temperature written into the block (K)
 * @param steps what is done, in order
 */
public record Feed(String title, double volumeM3, double temperatureK, List<Step> steps) {

    public Feed {
        title = title == null ? "" : title;
        if (!(volumeM3 > 0)) {
            throw new IllegalArgumentException("the final volume must be above zero, got " + volumeM3 + " m3");
        }
        steps = List.copyOf(steps);
    }

    /** One thing done to the bath. */
    public sealed interface Step permits Dissolve, Add, Filter {
        /** @return where it is written (e.g. "add[2] (line 14)"), for messages */
        String label();
    }

    /**
     * A metal dissolved in an acid already in the bath.
     *
     * @param label where it is written
     * @param metal the metal symbol
     * @param kg the mass dissolved (kg)
     * @param acid the acid that dissolves it, or null for the only acid added so far
     * @param oxidant "H2O2" or "air" where the acid alone does not dissolve the metal, else null
     */
    public record Dissolve(String label, String metal, double kg, String acid, String oxidant) implements Step {
        public Dissolve {
            Objects.requireNonNull(metal, "metal");
        }
    }

    /**
     * A salt or acid added.
     *
     * @param label where it is written
     * @param compound what is added
     * @param mol how much (mol of formula units)
     * @param described how it was given, for the log ("150 mL of 32 % HCl at 1.159 g/mL")
     */
    public record Add(String label, Compound compound, double mol, String described) implements Step {
        public Add {
            Objects.requireNonNull(compound, "compound");
        }
    }

    /**
     * A solid filtered off (its ions leave the solution).
     *
     * @param label where it is written
     * @param compound the solid
     * @param kg its dry mass (kg)
     */
    public record Filter(String label, Compound compound, double kg) implements Step {
        public Filter {
            Objects.requireNonNull(compound, "compound");
        }
    }
}
