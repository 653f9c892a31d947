package org.cellwright.io;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.Compartments;
import org.cellwright.cell.Separator;

/**
 * Reads the compartment keys of {@code [cell]}: {@code compartments} ("undivided", the default; "divided";
 * "zones"), {@code anolyte_volume} (default half the electrolyte), for a divided cell {@code separator}
 * ("diaphragm", "cation-membrane", "anion-membrane"; required) with {@code separator_thickness},
 * {@code separator_porosity}, {@code separator_area} and (membranes) {@code separator_conductivity}, for
 * zones {@code zone_exchange} (a volume flow; required); and {@code [electrolyte.anolyte]}, the anolyte's
 * starting composition (default: the bath's). A key that does not apply to the chosen arrangement is an
 * error at that key.
 */
final class CompartmentReader {

    static final List<String> SEPARATOR_KEYS = List.of("separator", "separator_thickness", "separator_porosity",
            "separator_area", "separator_conductivity");
    static final Set<String> KEYS = Set.of("compartments", "anolyte_volume", "separator", "separator_thickness",
            "separator_porosity", "separator_area", "separator_conductivity", "zone_exchange");

    private CompartmentReader() {
    }

    /**
     * @param c the {@code [cell]} table
     * @param root the document, for {@code [electrolyte.anolyte]}
     * @param gapM the gap (m), NaN when it could not be read
     * @param volumeM3 the electrolyte's volume (m3), NaN when it could not be read
     * @param anolyte the anolyte's composition when given and valid
     * @return the compartments, or empty when something is wrong (reported)
     */
    static Optional<Compartments> read(SectionReader c, SectionReader root, double gapM, double volumeM3,
                                       Optional<Map<String, Double>> anolyte) {
        Optional<Compartments.Kind> kind = kind(c);
        if (kind.isEmpty()) {
            return Optional.empty();
        }
        boolean ok = true;
        Compartments.Kind k = kind.get();
        if (k != Compartments.Kind.DIVIDED) {
            for (String key : SEPARATOR_KEYS) {
                ok &= notHere(c, key, "applies only to compartments = \"divided\"");
            }
        }
        if (k != Compartments.Kind.ZONES) {
            ok &= notHere(c, "zone_exchange", "applies only to compartments = \"zones\"");
        }
        boolean anolyteGiven = ElectrolyteReader.anolyteGiven(root);
        if (k == Compartments.Kind.UNDIVIDED) {
            ok &= notHere(c, "anolyte_volume", "applies only to a \"divided\" or \"zones\" cell");
            if (anolyteGiven) {
                SectionReader e = root.table("electrolyte").orElseThrow();
                e.log().error(e.at("anolyte"), e.key("anolyte"), "an anolyte of its own needs [cell] compartments ="
                        + " \"divided\" or \"zones\"");
                ok = false;
            }
            return ok ? Optional.of(Compartments.undivided()) : Optional.empty();
        }
        Double anolyteVolume = null;
        if (c.has("anolyte_volume")) {
            anolyteVolume = c.quantity("anolyte_volume", Dimension.VOLUME, Range.POSITIVE).orElse(null);
            ok &= anolyteVolume != null;
            if (anolyteVolume != null && !(anolyteVolume < volumeM3) && !Double.isNaN(volumeM3)) {
                c.log().error(CellReader.valueAt(c, "anolyte_volume"), c.key("anolyte_volume"),
                        "must be less than electrolyte.volume (the rest is the catholyte)");
                ok = false;
            }
        }
        Map<String, Double> anolyteComposition = anolyte.orElse(null);
        ok &= !anolyteGiven || anolyte.isPresent();
        Separator separator = null;
        double zoneFlow = 0;
        if (k == Compartments.Kind.DIVIDED) {
            Optional<Separator> s = separator(c, gapM);
            ok &= s.isPresent();
            separator = s.orElse(null);
        } else {
            if (!c.has("zone_exchange")) {
                c.missing("zone_exchange", "\"0.1 L/min\"");
                ok = false;
            } else {
                Optional<Double> q = c.quantity("zone_exchange", Dimension.VOLUME_FLOW, Range.NON_NEGATIVE);
                ok &= q.isPresent();
                zoneFlow = q.orElse(0.0);
            }
        }
        if (!ok) {
            return Optional.empty();
        }
        return Optional.of(new Compartments(k, anolyteVolume, anolyteComposition, separator, zoneFlow));
    }

    private static Optional<Compartments.Kind> kind(SectionReader c) {
        if (!c.has("compartments")) {
            return Optional.of(Compartments.Kind.UNDIVIDED);
        }
        return c.string("compartments").flatMap(name -> {
            Optional<Compartments.Kind> k = Compartments.Kind.find(name);
            if (k.isEmpty()) {
                List<String> names = Arrays.stream(Compartments.Kind.values()).map(Compartments.Kind::key).toList();
                c.log().error(CellReader.valueAt(c, "compartments"), c.key("compartments"), "unknown arrangement '"
                        + name + "'" + Spelling.closest(name, names).map(s -> "; did you mean '" + s + "'?")
                        .orElse("; use one of " + String.join(", ", names)));
            }
            return k;
        });
    }

    private static Optional<Separator> separator(SectionReader c, double gapM) {
        if (!c.has("separator")) {
            c.missing("separator", "\"diaphragm\" (or \"cation-membrane\", \"anion-membrane\")");
            return Optional.empty();
        }
        Optional<Separator.Kind> kind = c.string("separator").flatMap(name -> {
            Optional<Separator.Kind> k = Separator.Kind.find(name);
            if (k.isEmpty()) {
                List<String> names = Arrays.stream(Separator.Kind.values()).map(Separator.Kind::key).toList();
                c.log().error(CellReader.valueAt(c, "separator"), c.key("separator"), "unknown separator '" + name
                        + "'" + Spelling.closest(name, names).map(s -> "; did you mean '" + s + "'?")
                        .orElse("; use one of " + String.join(", ", names)));
            }
            return k;
        });
        if (kind.isEmpty()) {
            return Optional.empty();
        }
        Separator.Kind k = kind.get();
        boolean ok = true;
        double thickness = k.thicknessM();
        if (c.has("separator_thickness")) {
            Optional<Double> t = c.quantity("separator_thickness", Dimension.LENGTH, Range.POSITIVE);
            ok &= t.isPresent();
            thickness = t.orElse(thickness);
            if (t.isPresent() && !Double.isNaN(gapM) && !(t.get() < gapM)) {
                c.log().error(CellReader.valueAt(c, "separator_thickness"), c.key("separator_thickness"),
                        "must be less than cell.gap");
                ok = false;
            }
        }
        double porosity = k.porosity();
        if (c.has("separator_porosity")) {
            Optional<Double> p = c.number("separator_porosity", Range.FRACTION);
            ok &= p.isPresent();
            porosity = p.orElse(porosity);
        }
        Double area = null;
        if (c.has("separator_area")) {
            area = c.quantity("separator_area", Dimension.AREA, Range.POSITIVE).orElse(null);
            ok &= area != null;
        }
        Double conductivity = null;
        if (c.has("separator_conductivity")) {
            if (!k.isMembrane()) {
                c.log().error(c.at("separator_conductivity"), c.key("separator_conductivity"), "applies only to a"
                        + " membrane; a diaphragm conducts through its pores (the bath's conductivity times"
                        + " porosity^1.5)");
                ok = false;
            } else {
                conductivity = c.quantity("separator_conductivity", Dimension.CONDUCTIVITY, Range.POSITIVE)
                        .orElse(null);
                ok &= conductivity != null;
            }
        }
        return ok ? Optional.of(new Separator(k, thickness, porosity, area, conductivity)) : Optional.empty();
    }

    private static boolean notHere(SectionReader c, String key, String why) {
        if (!c.has(key)) {
            return true;
        }
        c.log().error(c.at(key), c.key(key), why);
        return false;
    }
}
