package org.cellwright.sim.deposit;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.validation.ValidationCase;

/**
 * The published dendrite formulas against the worked numbers of the physics reference (reserve cases R4 to
 * R6), as in {@link DendriteFormulasTest}, for the validation report (docs/validation.md). Each tolerance is
 * the rounding of the printed figure.
 */
public final class DendriteValidation {

    private static final double VM_CU = 7.09e-6;
    private static final double D_CU = 7.14e-10;

    private DendriteValidation() {
    }

    /** @return the dendrite cases, freshly computed */
    public static List<ValidationCase> cases() {
        List<ValidationCase> out = new ArrayList<>();
        // source: physics reference R6 (Barton & Bockris, Proc. R. Soc. A 268 (1962) 485, linearised): Cu,
        // c0 0.1 M, D 7.14e-10 m2/s, gamma 1 J/m2, eta 10 mV -> v_max 1.34e-5 m/s, r_opt 14.7 nm; 0.4 %
        String bb = "Barton & Bockris, Proc. R. Soc. A 268 (1962) 485; physics reference R6";
        out.add(ValidationCase.relative("Dendrites", "fastest tip speed, Cu 0.1 M, eta 10 mV", bb, "m/s", 1.34e-5,
                TipGrowth.maxVelocity(2, D_CU, 100, 0.010, 1.0, 298.15), 0.004, 3));
        out.add(ValidationCase.relative("Dendrites", "fastest tip radius, Cu, eta 10 mV", bb, "nm", 14.7,
                1e9 * TipGrowth.optimumRadiusM(1.0, VM_CU, 2, 0.010), 0.004, 3));
        // source: physics reference R5 (Despic & Popov protrusion amplification): delta 100 um, h0 0.1 um, Cu
        // 0.1 M -> t_i = 1.365e5 s; 0.05 %
        out.add(ValidationCase.relative("Dendrites", "induction time of a 0.1 um protrusion, delta 100 um",
                "Despic & Popov (protrusion amplification); physics reference R5", "s", 1.365e5,
                ProtrusionAmplification.inductionTimeS(100e-6, 0.1e-6, VM_CU, D_CU, 100), 5e-4, 4));
        // source: physics reference R4 (Chazalviel, Phys. Rev. A 42 (1990) 7355): 0.05 M CuSO4 unsupported,
        // 100 A/m2, t_a 0.6, D_s 0.855e-9 m2/s -> tau_s 17.4 s (0.4 %), front 6.22 um/s (0.2 %)
        String ch = "Chazalviel, Phys. Rev. A 42 (1990) 7355; physics reference R4";
        out.add(ValidationCase.relative("Dendrites", "space-charge Sand time, 0.05 M CuSO4, 100 A/m2", ch, "s", 17.4,
                SpaceChargeFront.sandTimeS(0.855e-9, 2, 50, 100, 0.6), 0.004, 3));
        out.add(ValidationCase.relative("Dendrites", "space-charge front speed, same", ch, "um/s", 6.22,
                1e6 * SpaceChargeFront.frontVelocity(100, 0.6, 2, 50), 0.002, 3));
        return out;
    }
}
