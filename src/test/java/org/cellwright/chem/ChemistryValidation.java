package org.cellwright.chem;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.validation.ValidationCase;

/**
 * The bath model's checks for the validation report (docs/validation.md): every handbook point of
 * {@link ConductivityTest} (CRC tables, NIST KCl standards), the conductivity's temperature coefficients, the
 * worked ohmic drop with Bruggeman's gas correction, the plant ranges of industrial sulfate baths, and water's
 * viscosity with the Stokes-Einstein scaling of diffusion ({@link WaterViscosityTest}).
 */
public final class ChemistryValidation {

    private ChemistryValidation() {
    }

    /** @return the conductivity cases, freshly computed */
    public static List<ValidationCase> cases() {
        List<ValidationCase> out = new ArrayList<>();
        for (ConductivityTest.Point p : ConductivityTest.handbookPoints()) {
            String source = p.solution().equals("KCl") ? "NIST primary KCl standards (Wu, Koch & Pratt 1991), CRC"
                    : p.label().contains("%") ? "CRC Handbook, Electrical conductivity of aqueous solutions (20 C)"
                    : "CRC Handbook, Equivalent conductivity of electrolytes (25 C)";
            // source: as named per point in ConductivityTest.handbookPoints(); 10 % per point (ConductivityTest)
            out.add(ValidationCase.relative("Conductivity", p.solution() + " " + p.label(), source, "mS/cm",
                    p.mSPerCm(), ConductivityTest.modelMSPerCm(p), 0.10, 4));
        }
        // source: temperature-coefficient table of a laboratory conductivity-meter manual (about 10 wt %, reference
        // 25 C): HCl 1.56, NaCl 2.14, KCl 1.88, H2SO4 1.28 %/K; 0.2 %/K (ConductivityTest)
        String[] solutions = {"HCl", "NaCl", "KCl", "H2SO4"};
        double[][] coefficients = {{2.87, 1.56}, {1.83, 2.14}, {1.43, 1.88}, {1.09, 1.28}};
        for (int i = 0; i < solutions.length; i++) {
            out.add(ValidationCase.absolute("Conductivity", "temperature coefficient at 25 C, " + solutions[i] + " "
                            + coefficients[i][0] + " mol/L (about 10 wt %)",
                    "conductivity-meter manual, table of temperature coefficients", "%/K", coefficients[i][1],
                    ConductivityTest.percentPerK(solutions[i], coefficients[i][0]), 0.2, 3));
        }
        // source: physics reference check case 4: 10 wt % CuSO4 at 20 C (CRC, 32.2 mS/cm), 20 mm, 100 A/m2 with
        // 10 % gas (Bruggeman, Ann. Phys. 24 (1935) 636; Tobias 1959): 0.727 V. 0.5 %, the rounding of the quote
        out.add(ValidationCase.relative("Ohmic drop", "10 wt % CuSO4, 20 mm, 100 A/m2, 10 % gas (Bruggeman)",
                "Bruggeman 1935; Tobias 1959; physics reference check case 4", "V", 0.727,
                100 * 0.020 / Conductivity.bruggeman(3.22, 0.10), 0.005, 3));
        // source: Price & Davenport, Metall. Trans. B 11 (1980) 159 (from memory): copper winning electrolyte,
        // 45 g/L Cu, 180 g/L H2SO4, 45 C: 0.55-0.70 S/cm
        out.add(ValidationCase.range("Conductivity", "Cu EW bath, 45 g/L Cu, 180 g/L H2SO4, 45 C",
                "Price & Davenport, Metall. Trans. B 11 (1980) 159 (from memory)", "S/cm", 0.55, 0.70,
                ConductivityTest.sulfateBath("Cu2+", 0.708, 1.835, 45), 3));
        // source: zinc winning, 55 g/L Zn, 170 g/L H2SO4, 38 C: 0.40-0.55 S/cm (physics reference 5d, from memory)
        out.add(ValidationCase.range("Conductivity", "Zn EW bath, 55 g/L Zn, 170 g/L H2SO4, 38 C",
                "physics reference 5d, plant range (from memory)", "S/cm", 0.40, 0.55,
                ConductivityTest.sulfateBath("Zn2+", 0.841, 1.733, 38), 3));
        // source: Price & Davenport 1980 (from memory), as above, at 60 C: within 10 % of the range's upper end
        out.add(ValidationCase.range("Conductivity", "Cu EW bath at 60 C (range's top end + 10 %)",
                "Price & Davenport, Metall. Trans. B 11 (1980) 159 (from memory)", "S/cm", 0.55, 0.77,
                ConductivityTest.sulfateBath("Cu2+", 0.708, 1.835, 60), 3));
        // source: tin refining sulfate bath, 30 g/L Sn, 100 g/L H2SO4, 35 C: 0.25-0.40 S/cm (physics reference 5d,
        // from memory)
        out.add(ValidationCase.range("Conductivity", "Sn ER bath, 30 g/L Sn2+, 100 g/L H2SO4, 35 C",
                "physics reference 5d, plant range (from memory)", "S/cm", 0.25, 0.40,
                ConductivityTest.sulfateBath("Sn2+", 0.253, 1.020, 35), 3));
        // source: nickel sulfate catholyte, 80 g/L Ni, pH 3, 60 C: 0.10-0.20 S/cm (from memory; plant catholytes
        // also hold sodium sulfate and boric acid): within 10 % of the low end
        out.add(ValidationCase.range("Conductivity", "Ni catholyte, 80 g/L Ni, pH 3, 60 C (range's low end - 10 %)",
                "physics reference 5d, plant range (from memory)", "S/cm", 0.09, 0.20,
                ConductivityTest.sulfateBath("Ni2+", 1.363, 0.0005, 60), 3));
        // source: CRC 20 C table interpolated (16 wt % H2SO4 = 0.565 S/cm) times 1 + 0.0128 x 25 K: about
        // 0.75 S/cm for 180 g/L H2SO4 at 45 C (physics reference 5d); 10 %
        out.add(ValidationCase.relative("Conductivity", "180 g/L H2SO4 at 45 C",
                "CRC 20 C table with the manual's temperature coefficient (physics reference 5d)", "S/cm", 0.75,
                ConductivityTest.sulfateBath("Cu2+", 0.0, 1.835, 45), 0.10, 3));
        // source: CRC Handbook, viscosity of water, 1.0530 mPa s at 18 C (from memory); interpolation within 0.2 %
        out.add(ValidationCase.relative("Transport", "viscosity of water at 18 C (interpolated)",
                "CRC Handbook, viscosity of water (from memory)", "mPa s", 1.0530, 1e3 * WaterViscosity.of(291.15),
                0.002, 4));
        // source: physics reference section 4: D45/D25 = (318.15/298.15)(0.8900/0.5963) = 1.59 (Stokes-Einstein
        // with CRC water viscosities); 0.5 %, the rounding of the quoted ratio
        out.add(ValidationCase.relative("Transport", "diffusion coefficient at 45 C over 25 C (Stokes-Einstein)",
                "Stokes-Einstein with CRC viscosities of water; physics reference section 4", "", 1.59,
                Conductivity.diffusionAt(0.714e-9, 318.15) / 0.714e-9, 0.005, 3));
        return out;
    }

}
