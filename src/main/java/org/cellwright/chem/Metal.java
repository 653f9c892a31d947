package org.cellwright.chem;

import java.util.Map;
import java.util.Objects;

/**
 * A solid metal that can deposit on the cathode or dissolve from a soluble anode.
 *
 * @param symbol element symbol ("Sn", "Cu")
 * @param molarMassKgPerMol molar mass (kg/mol)
 * @param densityKgPerM3 density of the bulk metal (kg/m3)
 * @param depositClass Winand class of the metal from simple acid salts
 * @param sources where each number comes from, keyed by property name
 */
public record Metal(String symbol, double molarMassKgPerMol, double densityKgPerM3, DepositClass depositClass,
                    Map<String, String> sources) {

    public Metal {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(depositClass, "depositClass");
        if (!(molarMassKgPerMol > 0) || !(densityKgPerM3 > 0)) {
            throw new IllegalArgumentException(symbol + ": molar mass and density must be > 0");
        }
        sources = Map.copyOf(sources);
    }

    /** @return the molar volume (m3/mol) */
    public double molarVolumeM3PerMol() {
        return molarMassKgPerMol / densityKgPerM3;
    }
}
