package org.cellwright.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import org.cellwright.io.LibraryReader;
import org.junit.jupiter.api.Test;

/** The prepared, array-based evaluator gives the same conductivity as the reference model. */
class BathConductivityTest {

    private static final ChemLibrary LIB = LibraryReader.builtIn();
    private static final List<String> SPECIES = List.of("H+", "Cu2+", "Zn2+", "Ni2+", "Fe2+", "Fe3+", "Sn2+", "Na+",
            "SO4^2-", "HSO4-", "Cl-", "NO3-");

    @Test
    void matchesTheReferenceModelOnRandomBaths() {
        long seed = 20261201L;
        SplittableRandom rnd = new SplittableRandom(seed);
        BathConductivity prepared = new BathConductivity(LIB, SPECIES);
        for (int n = 0; n < 300; n++) {
            double[] c = new double[SPECIES.size()];
            Map<String, Double> map = new LinkedHashMap<>();
            for (int i = 0; i < c.length; i++) {
                if (rnd.nextDouble() < 0.5) {
                    c[i] = Math.pow(10, rnd.nextDouble(0, 3.3));
                    map.put(SPECIES.get(i), c[i]);
                }
            }
            double tempK = 278.15 + rnd.nextDouble(0, 70);
            double expected = map.isEmpty() ? 0 : Conductivity.of(LIB, map, tempK);
            double got = prepared.of(c, tempK);
            // the ionic-strength iteration converges to 1e-12 relative; 1e-9 leaves room for its damping
            assertEquals(expected, got, 1e-9 * Math.max(expected, 1e-12), "seed " + seed + ", case " + n + ": " + map);
        }
    }
}
