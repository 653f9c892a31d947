package org.cellwright.chem;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.validation.ValidationCase;

/**
 * The conductivity model's checks for the validation report (docs/validation.md): every handbook point of
 * {@link ConductivityTest} (CRC tables, NIST KCl standards), the worked ohmic drop with Bruggeman's gas
 * correction, and the plant ranges of industrial sulfate baths.
 */
public final class ConductivityValidation {

    private ConductivityValidation() {
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
        return out;
    }

}
