package org.cellwright.cell;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * How the electrolyte is shared between the electrodes.
 *
 * <ul>
 *   <li>{@link Kind#UNDIVIDED}: one well-mixed bath (the default);</li>
 *   <li>{@link Kind#DIVIDED}: a separator splits it into an anolyte and a catholyte, each well mixed, with
 *       transport across the separator;</li>
 *   <li>{@link Kind#ZONES}: an undivided but unstirred cell whose anode zone and cathode zone, each taken as
 *       well mixed, exchange electrolyte at a set volume flow (and carry the current between them).</li>
 * </ul>
 *
 * @param kind the arrangement
 * @param anolyteVolumeM3 volume on the anode side (m3), or null for half the electrolyte (two-compartment
 *     kinds only)
 * @param anolyteCompositionMolPerM3 starting composition of the anolyte (mol/m3), or null for the bath's
 * @param separator the separator (divided only), else null
 * @param zoneExchangeM3PerS volume flow exchanged between the two zones (m3/s), zones only (else 0)
 */
public record Compartments(Kind kind, Double anolyteVolumeM3, Map<String, Double> anolyteCompositionMolPerM3,
                           Separator separator, double zoneExchangeM3PerS) {

    /** The arrangements. */
    public enum Kind {
        /** One well-mixed bath. */
        UNDIVIDED("undivided"),
        /** Anolyte and catholyte on either side of a separator. */
        DIVIDED("divided"),
        /** Anode and cathode zones of an unstirred cell, exchanging at a set rate. */
        ZONES("zones");

        private final String key;

        Kind(String key) {
            this.key = key;
        }

        /** @return the name used in scenario files */
        public String key() {
            return key;
        }

        /** @return the arrangement of this name (case-insensitive) */
        public static Optional<Kind> find(String name) {
            return Arrays.stream(values()).filter(k -> k.key.equalsIgnoreCase(name.strip())).findFirst();
        }
    }

    public Compartments {
        Objects.requireNonNull(kind, "kind");
        if (kind == Kind.DIVIDED && separator == null) {
            throw new IllegalArgumentException("cell.compartments = \"divided\" needs a separator");
        }
        if (kind != Kind.DIVIDED && separator != null) {
            throw new IllegalArgumentException("cell.separator applies only to a divided cell");
        }
        if (kind == Kind.ZONES) {
            Checks.nonNegative("cell.zone_exchange", zoneExchangeM3PerS, "m3/s");
        } else if (zoneExchangeM3PerS != 0) {
            throw new IllegalArgumentException("cell.zone_exchange applies only to compartments = \"zones\"");
        }
        if (kind == Kind.UNDIVIDED && (anolyteVolumeM3 != null || anolyteCompositionMolPerM3 != null)) {
            throw new IllegalArgumentException("an anolyte needs compartments = \"divided\" or \"zones\"");
        }
        if (anolyteVolumeM3 != null) {
            Checks.positive("cell.anolyte_volume", anolyteVolumeM3, "m3");
        }
        if (anolyteCompositionMolPerM3 != null) {
            Map<String, Double> copy = new LinkedHashMap<>();
            anolyteCompositionMolPerM3.forEach((k, v) -> {
                Checks.nonNegative("electrolyte.anolyte." + k, v, "mol/m3");
                copy.put(k, v);
            });
            anolyteCompositionMolPerM3 = Collections.unmodifiableMap(copy);
        }
    }

    /** @return one well-mixed bath */
    public static Compartments undivided() {
        return new Compartments(Kind.UNDIVIDED, null, null, null, 0);
    }

    /** @return a cell divided by {@code separator}, half the electrolyte on each side, the same bath in both */
    public static Compartments divided(Separator separator) {
        return new Compartments(Kind.DIVIDED, null, null, separator, 0);
    }

    /** @return an unstirred cell with two zones exchanging {@code m3PerS}, half the electrolyte in each */
    public static Compartments zones(double m3PerS) {
        return new Compartments(Kind.ZONES, null, null, null, m3PerS);
    }

    /** @return true when the anode and the cathode see different solutions */
    public boolean twoCompartments() {
        return kind != Kind.UNDIVIDED;
    }

    /**
     * @param totalM3 the electrolyte's whole volume (m3)
     * @return the anolyte's volume (m3): the given one, or half the whole
     */
    public double anolyteVolumeM3(double totalM3) {
        return anolyteVolumeM3 != null ? anolyteVolumeM3 : 0.5 * totalM3;
    }

    /** @return a copy with another anolyte volume (m3), or null for half the electrolyte */
    public Compartments withAnolyteVolume(Double m3) {
        return new Compartments(kind, m3, anolyteCompositionMolPerM3, separator, zoneExchangeM3PerS);
    }

    /** @return a copy with another anolyte composition (mol/m3), or null for the bath's */
    public Compartments withAnolyteComposition(Map<String, Double> molPerM3) {
        return new Compartments(kind, anolyteVolumeM3, molPerM3, separator, zoneExchangeM3PerS);
    }
}
