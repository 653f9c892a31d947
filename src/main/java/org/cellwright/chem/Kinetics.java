package org.cellwright.chem;

/**
 * Butler-Volmer kinetic parameters of an electrode reaction.
 *
 * @param i0APerM2 exchange current density at unit activity of every dissolved participant (A/m2)
 * @param alphaA anodic transfer coefficient (dimensionless, counts the electrons of the whole reaction)
 * @param alphaC cathodic transfer coefficient (dimensionless)
 * @param source where the numbers come from
 */
public record Kinetics(double i0APerM2, double alphaA, double alphaC, String source) {

    public Kinetics {
        if (!(i0APerM2 > 0) || !Double.isFinite(i0APerM2)) {
            throw new IllegalArgumentException("exchange current density must be > 0 A/m2, got " + i0APerM2);
        }
        if (!(alphaA >= 0) || !(alphaC >= 0) || alphaA + alphaC <= 0) {
            throw new IllegalArgumentException("transfer coefficients must be >= 0 and not both zero");
        }
    }

    /** @return the cathodic Tafel slope (V per decade) at temperature {@code tempK} */
    public double cathodicTafelSlope(double tempK) {
        return Math.log(10) * PhysicalConstants.GAS_CONSTANT * tempK / (alphaC * PhysicalConstants.FARADAY);
    }

    /** @return a copy with another exchange current density (A/m2) */
    public Kinetics withI0(double i0) {
        return new Kinetics(i0, alphaA, alphaC, source);
    }
}
