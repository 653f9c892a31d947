package org.cellwright.io;

import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.DepositSettings;

/**
 * Reads {@code [deposit]} (optional): {@code additives} (true or false, default false), {@code tip_radius}
 * (default 1 um), {@code initial_protrusion} (default 5 um, at least the tip radius) and
 * {@code short_resistance} (default 50 mohm). See docs/deposit-model.md for what they mean.
 */
final class DepositReader {

    static final Set<String> KEYS = Set.of("additives", "tip_radius", "initial_protrusion", "short_resistance");

    private DepositReader() {
    }

    /** @return the deposit settings (defaults when the section is absent), or empty when wrong (reported) */
    static Optional<DepositSettings> read(SectionReader root) {
        if (!root.has("deposit")) {
            return Optional.of(DepositSettings.defaults());
        }
        Optional<SectionReader> section = root.table("deposit");
        if (section.isEmpty()) {
            return Optional.empty();
        }
        SectionReader d = section.get();
        d.allowOnly(KEYS);
        boolean ok = true;
        boolean additives = false;
        if (d.has("additives")) {
            Optional<Boolean> a = d.bool("additives");
            ok &= a.isPresent();
            additives = a.orElse(false);
        }
        double radius = length(d, "tip_radius", DepositSettings.DEFAULT_TIP_RADIUS_M, 1e-8, 1e-4);
        double protrusion = length(d, "initial_protrusion", DepositSettings.DEFAULT_INITIAL_PROTRUSION_M, 1e-7, 1e-3);
        double shortOhm = DepositSettings.DEFAULT_SHORT_RESISTANCE_OHM;
        if (d.has("short_resistance")) {
            shortOhm = d.quantity("short_resistance", Dimension.RESISTANCE, Range.POSITIVE).orElse(Double.NaN);
        }
        if (Double.isNaN(radius) || Double.isNaN(protrusion) || Double.isNaN(shortOhm) || !ok) {
            return Optional.empty();
        }
        if (protrusion < radius) {
            d.log().error(d.has("initial_protrusion") ? CellReader.valueAt(d, "initial_protrusion") : d.at("tip_radius"),
                    d.key("initial_protrusion"), "the protrusion must stand at least as high as its tip radius ("
                            + QuantityFormat.format(radius, Dimension.LENGTH, java.util.List.of("um", "mm")) + ")");
            return Optional.empty();
        }
        return Optional.of(new DepositSettings(additives, radius, protrusion, shortOhm));
    }

    /** A length with its default; a warning outside [lo, hi]; NaN when wrong (reported). */
    private static double length(SectionReader d, String key, double fallback, double lo, double hi) {
        if (!d.has(key)) {
            return fallback;
        }
        Optional<Double> v = d.quantity(key, Dimension.LENGTH, Range.POSITIVE);
        v.filter(x -> x < lo || x > hi).ifPresent(x -> d.log().warning(CellReader.valueAt(d, key), d.key(key),
                "a value outside " + QuantityFormat.format(lo, Dimension.LENGTH, java.util.List.of("um", "mm"))
                        + " to " + QuantityFormat.format(hi, Dimension.LENGTH, java.util.List.of("um", "mm"))
                        + " is unusual; check the unit"));
        return v.orElse(Double.NaN);
    }
}
