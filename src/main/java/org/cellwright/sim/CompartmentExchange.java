package org.cellwright.sim;

import java.util.List;

import org.cellwright.cell.Compartments;
import org.cellwright.cell.Separator;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.chem.Species;

/**
 * Transport between the anolyte and the catholyte of a two-compartment cell, and the separator's resistance.
 *
 * <p>The molar flow of species j from the anolyte to the catholyte (mol/s) is
 * <pre>
 *   N_j = K_j (cA_j - cC_j) + (I / F - q_x) t_j / z_j,   q_x = sum_k z_k K_k (cA_k - cC_k)
 *   t_j = z_j^2 D_j c_j / sum_k z_k^2 D_k c_k      (over the ions that cross; c upstream: cations from the
 *                                                  anolyte, anions from the catholyte)
 * </pre>
 * the exchange (diffusion or mixing) and the migration in the field that carries the current, less the charge
 * the exchange already carries (the diffusion potential), with the transference numbers of dilute-solution
 * theory (Newman &amp; Thomas-Alyea, Electrochemical Systems, 3rd ed. 2004, ch. 11, with Nernst-Einstein
 * mobilities). Sum over j of {@code z_j F N_j} is the current, so each compartment stays electroneutral.
 * Exchange coefficients:
 * <ul>
 *   <li>diaphragm: {@code K_j = D_j(T) porosity^1.5 A_sep / thickness} (Bruggeman's tortuosity), every ion
 *       migrates;</li>
 *   <li>ion-exchange membrane: only counter-ions (cations for a cation membrane, anions for an anion
 *       membrane) diffuse, with the membrane's water fraction as porosity, and carry the current;</li>
 *   <li>zones: {@code K_j = Q}, the volume flow exchanged between the two zones; every ion migrates.</li>
 * </ul>
 * Resistance of the separator: {@code thickness / (kappa_sep A_sep)}, with {@code kappa_sep} the bath's
 * conductivity times {@code porosity^1.5} for a diaphragm (MacMullin number by Bruggeman), or the membrane's
 * conductivity, following temperature by Walden's rule.
 */
final class CompartmentExchange {

    private final boolean two;
    private final Compartments.Kind kind;
    private final Separator separator;
    private final double zoneFlowM3PerS;
    private final double diffusionGeometryM;
    private final double separatorAreaM2;
    private final double[] d25;
    private final int[] z;
    private final boolean[] crosses;
    private final double catholyteM3;
    private final double anolyteM3;

    CompartmentExchange(Compartments compartments, List<Species> species, double totalM3, double electrodeAreaM2) {
        this.kind = compartments.kind();
        this.two = compartments.twoCompartments();
        this.separator = compartments.separator();
        this.zoneFlowM3PerS = compartments.zoneExchangeM3PerS();
        this.anolyteM3 = two ? compartments.anolyteVolumeM3(totalM3) : totalM3;
        this.catholyteM3 = two ? totalM3 - anolyteM3 : totalM3;
        if (two && !(catholyteM3 > 0)) {
            throw new IllegalArgumentException("cell.anolyte_volume must be less than electrolyte.volume");
        }
        this.separatorAreaM2 = separator != null && separator.areaM2() != null ? separator.areaM2() : electrodeAreaM2;
        this.diffusionGeometryM = separator == null ? 0
                : Math.pow(separator.porosity(), 1.5) * separatorAreaM2 / separator.thicknessM();
        int n = species.size();
        d25 = new double[n];
        z = new int[n];
        crosses = new boolean[n];
        for (int j = 0; j < n; j++) {
            Species s = species.get(j);
            d25[j] = s.diffusionM2PerS();
            z[j] = s.charge();
            crosses[j] = separator == null || switch (separator.kind()) {
                case DIAPHRAGM -> true;
                case CATION_MEMBRANE -> z[j] > 0;
                case ANION_MEMBRANE -> z[j] < 0;
            };
        }
    }

    /** @return true when anode and cathode see different solutions */
    boolean twoCompartments() {
        return two;
    }

    /** @return the catholyte's volume (m3); the whole bath when undivided */
    double catholyteM3() {
        return catholyteM3;
    }

    /** @return the anolyte's volume (m3); the whole bath when undivided */
    double anolyteM3() {
        return anolyteM3;
    }

    /** @return the separator's thickness (m), 0 without one */
    double separatorThicknessM() {
        return separator == null ? 0 : separator.thicknessM();
    }

    /**
     * @param kappaC catholyte conductivity (S/m)
     * @param kappaA anolyte conductivity (S/m)
     * @param waldenFactor mu(25 C) / mu(T), the temperature factor of a conductivity
     * @return the separator's resistance (ohm), 0 without one
     */
    double separatorOhm(double kappaC, double kappaA, double waldenFactor) {
        if (separator == null) {
            return 0;
        }
        double kappa = separator.kind().isMembrane() ? separator.membraneConductivitySPerM() * waldenFactor
                : 0.5 * (kappaC + kappaA) * Math.pow(separator.porosity(), 1.5);
        return separator.thicknessM() / (kappa * separatorAreaM2);
    }

    /**
     * The molar flow of every species from the anolyte to the catholyte.
     *
     * @param cC catholyte concentrations (mol/m3)
     * @param cA anolyte concentrations (mol/m3)
     * @param amps the current through the cell (A), which crosses from anolyte to catholyte
     * @param diffusionFactor D(T) / D(25 C)
     * @param out receives N_j (mol/s), positive toward the catholyte
     */
    void fluxes(double[] cC, double[] cA, double amps, double diffusionFactor, double[] out) {
        double carriers = 0;
        double exchanged = 0;
        for (int j = 0; j < out.length; j++) {
            if (!crosses[j]) {
                out[j] = 0;
                continue;
            }
            double exchange = kind == Compartments.Kind.ZONES ? zoneFlowM3PerS
                    : d25[j] * diffusionFactor * diffusionGeometryM;
            out[j] = exchange * (cA[j] - cC[j]);
            if (z[j] != 0) {
                double up = z[j] > 0 ? cA[j] : cC[j];
                carriers += z[j] * z[j] * d25[j] * up;
                exchanged += z[j] * out[j];
            }
        }
        if (!(carriers > 0)) {
            return;
        }
        double perCharge = (amps / PhysicalConstants.FARADAY - exchanged) / carriers;
        for (int j = 0; j < out.length; j++) {
            if (crosses[j] && z[j] != 0) {
                double up = z[j] > 0 ? cA[j] : cC[j];
                out[j] += perCharge * z[j] * d25[j] * up;
            }
        }
    }
}
