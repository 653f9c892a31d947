package org.cellwright.cell;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;

/**
 * The separator of a divided cell: a porous diaphragm, or an ion-exchange membrane that passes only cations
 * or only anions.
 *
 * <p>Through a diaphragm every species diffuses with {@code D porosity^1.5 / thickness} (Bruggeman's
 * tortuosity, as for the gas in the gap) and every ion migrates with the current. An ideal membrane passes
 * only its counter-ions: they migrate and diffuse through the water it holds ({@code porosity} is then the
 * membrane's water volume fraction); co-ions and neutral molecules do not cross. Defaults: see
 * {@link Kind#thicknessM()} and the engine's documentation (docs/deposit-model.md).
 *
 * @param kind diaphragm or membrane
 * @param thicknessM thickness (m), > 0
 * @param porosity open (diaphragm) or water (membrane) volume fraction, 0 < porosity <= 1
 * @param areaM2 area open to the current (m2), or null for the electrodes' area
 * @param conductivitySPerM conductivity of a membrane (S/m), or null for its default; a diaphragm's follows the
 *     bath's, {@code kappa porosity^1.5}
 */
public record Separator(Kind kind, double thicknessM, double porosity, Double areaM2, Double conductivitySPerM) {

    /** What the separator is made of, with its documented defaults. */
    public enum Kind {
        /**
         * Porous diaphragm (woven polypropylene, asbestos-free felt, porous ceramic): 3 mm, porosity 0.5; from
         * memory, 1-5 mm and 0.4-0.7 for cell diaphragms (Pletcher &amp; Walsh, Industrial Electrochemistry,
         * 2nd ed. 1990).
         */
        DIAPHRAGM("diaphragm", 3e-3, 0.5, Double.NaN),
        /**
         * Cation-exchange membrane (perfluorosulfonic type): 0.18 mm, water fraction 0.3, 5 S/m; from memory,
         * about 0.1 S/cm fully hydrated in acid at 25 C, lower in salt solutions.
         */
        CATION_MEMBRANE("cation-membrane", 0.18e-3, 0.3, 5.0),
        /**
         * Anion-exchange membrane: 0.15 mm, water fraction 0.3, 2 S/m; from memory, anion membranes conduct
         * two to five times less than cation membranes.
         */
        ANION_MEMBRANE("anion-membrane", 0.15e-3, 0.3, 2.0);

        private final String key;
        private final double thicknessM;
        private final double porosity;
        private final double conductivitySPerM;

        Kind(String key, double thicknessM, double porosity, double conductivitySPerM) {
            this.key = key;
            this.thicknessM = thicknessM;
            this.porosity = porosity;
            this.conductivitySPerM = conductivitySPerM;
        }

        /** @return the name used in scenario files */
        public String key() {
            return key;
        }

        /** @return the default thickness (m) */
        public double thicknessM() {
            return thicknessM;
        }

        /** @return the default open or water volume fraction */
        public double porosity() {
            return porosity;
        }

        /** @return the default conductivity of a membrane (S/m), NaN for a diaphragm */
        public double conductivitySPerM() {
            return conductivitySPerM;
        }

        /** @return true for an ion-exchange membrane */
        public boolean isMembrane() {
            return this != DIAPHRAGM;
        }

        /** @return the kind of this name (case-insensitive) */
        public static Optional<Kind> find(String name) {
            return Arrays.stream(values()).filter(k -> k.key.equalsIgnoreCase(name.strip())).findFirst();
        }
    }

    public Separator {
        Objects.requireNonNull(kind, "kind");
        Checks.positive("cell.separator_thickness", thicknessM, "m");
        if (!(porosity > 0 && porosity <= 1)) {
            throw new IllegalArgumentException("cell.separator_porosity must lie in (0, 1], got " + porosity);
        }
        if (areaM2 != null) {
            Checks.positive("cell.separator_area", areaM2, "m2");
        }
        if (conductivitySPerM != null) {
            Checks.positive("cell.separator_conductivity", conductivitySPerM, "S/m");
        }
    }

    /** @return a separator of this kind with its default thickness, porosity and conductivity */
    public static Separator of(Kind kind) {
        return new Separator(kind, kind.thicknessM(), kind.porosity(), null, null);
    }

    /** @return the membrane's conductivity (S/m), NaN for a diaphragm */
    public double membraneConductivitySPerM() {
        if (!kind.isMembrane()) {
            return Double.NaN;
        }
        return conductivitySPerM != null ? conductivitySPerM : kind.conductivitySPerM();
    }
}
