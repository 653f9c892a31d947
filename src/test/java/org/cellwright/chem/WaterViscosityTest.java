package org.cellwright.chem;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Water viscosity table, its interpolation, and Stokes-Einstein scaling of diffusion coefficients. */
class WaterViscosityTest {

    @Test
    void tablePointsAndInterpolation() {
        // source: CRC Handbook, viscosity of water: 0.8900 mPa s at 25 C, 1.0016 at 20 C, 0.6527 at 40 C
        assertEquals(0.8900e-3, WaterViscosity.of(298.15), 1e-9);
        assertEquals(1.0016e-3, WaterViscosity.of(293.15), 1e-9);
        assertEquals(0.6527e-3, WaterViscosity.of(313.15), 1e-9);
        // source: CRC Handbook, 1.0530 mPa s at 18 C (from memory); linear interpolation of ln(mu) between 15 and
        // 20 C must come within 0.2 %
        assertEquals(1.0530e-3, WaterViscosity.of(291.15), 1.0530e-3 * 0.002);
    }

    @Test
    void diffusionAt45CelsiusIsAboutOnePointSixTimesThatAt25() {
        // source: physics-data section 4: D45/D25 = (318.15/298.15)(0.8900/0.5963) = 1.59 (Stokes-Einstein, CRC
        // water viscosities); 0.5 % tolerance = the rounding of the quoted ratio
        double d25 = 0.714e-9;
        assertEquals(1.59, Conductivity.diffusionAt(d25, 318.15) / d25, 1.59 * 0.005);
        assertEquals(d25, Conductivity.diffusionAt(d25, 298.15), 1e-24);
    }

    @Test
    void outsideTheTableIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> WaterViscosity.of(273.15 + 130));
        assertThrows(IllegalArgumentException.class, () -> WaterViscosity.of(Double.NaN));
    }
}
