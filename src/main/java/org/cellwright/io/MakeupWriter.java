package org.cellwright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.study.makeup.Ions;
import org.cellwright.study.makeup.MakeupResult;

/**
 * Writes a make-up as TOML ready to paste into a scenario: what each step did, the cautions and the charge
 * balance as comments, then the {@code [electrolyte]} and {@code [electrolyte.composition]} tables (metal ions
 * in g/L, the other ions in mol/L, four significant digits). The whole text is valid TOML.
 */
public final class MakeupWriter {

    /** Significant digits of the concentrations written. */
    static final int DIGITS = 4;

    private MakeupWriter() {
    }

    /**
     * @param label the feed's name (file)
     * @param r the make-up
     * @return the lines
     */
    public static List<String> lines(String label, MakeupResult r) {
        List<String> out = new ArrayList<>();
        out.add("# Bath make-up: " + (r.title().isBlank() ? label : r.title() + " (" + label + ")"));
        for (String step : r.log()) {
            out.add("#   " + step);
        }
        out.add("#   water to " + QuantityFormat.format(r.volumeM3(), Dimension.VOLUME, List.of("L", "mL", "m3")));
        for (MakeupResult.Precipitate p : r.precipitates()) {
            out.add(String.format(Locale.ROOT, "#   solid left out of the solution: about %s g of %s",
                    QuantityFormat.number(p.kg() * 1000, 3), p.compound().name()));
        }
        for (String f : r.flags()) {
            out.add("# ! " + f);
        }
        out.add(String.format(Locale.ROOT, "# charge: %s mol/L positive = %s mol/L negative; balanced by construction: "
                + "each salt and acid brings its own counter-ions, a dissolved metal takes the place of the H+ it "
                + "uses, a solid leaves with both its ions", QuantityFormat.number(r.chargeMolPerM3() / 1000, DIGITS),
                QuantityFormat.number(r.chargeMolPerM3() / 1000, DIGITS)));
        out.add("");
        out.add("[electrolyte]");
        out.add("volume = \"" + QuantityFormat.format(r.volumeM3(), Dimension.VOLUME, List.of("L", "mL", "m3")) + "\"");
        out.add("temperature = \"" + QuantityFormat.number(r.temperatureK() - 273.15, DIGITS) + " C\"");
        out.add("");
        out.add("[electrolyte.composition]");
        for (Map.Entry<String, Double> e : r.compositionMolPerM3().entrySet()) {
            out.add("\"" + e.getKey() + "\" = \"" + concentration(e.getKey(), e.getValue()) + "\"");
        }
        return out;
    }

    /** @return a concentration as written in a scenario: metal ions in g/L, others in mol/L */
    static String concentration(String ion, double molPerM3) {
        if (Ions.isMetal(ion)) {
            return QuantityFormat.number(molPerM3 * Ions.molarMassKgPerMol(ion), DIGITS) + " g/L";
        }
        return QuantityFormat.number(molPerM3 / 1000, DIGITS) + " mol/L";
    }
}
