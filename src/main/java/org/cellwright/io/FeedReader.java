package org.cellwright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.cellwright.study.makeup.Compound;
import org.cellwright.study.makeup.CompoundTable;
import org.cellwright.study.makeup.Feed;
import org.tomlj.Toml;
import org.tomlj.TomlParseResult;

/**
 * Reads a bath make-up feed (TOML, see docs/makeup.md) into a {@link Feed}: the final volume, then
 * {@code [[add]]} (a salt or an acid), {@code [[dissolve]]} (a metal in an acid) and {@code [[filter]]} (a
 * solid taken out) tables, done in the order they are written. Acids by volume are turned into moles from
 * their mass fraction and density ({@link AcidGrades} when the density is left out) or their concentration.
 * Every problem is reported with file, line, column and key, all together.
 */
public final class FeedReader {

    static final Set<String> ROOT_KEYS = Set.of("title", "volume", "temperature", "add", "dissolve", "filter");
    static final Set<String> ADD_KEYS = Set.of("salt", "acid", "mass", "volume", "mass_fraction", "density",
            "concentration");
    static final Set<String> DISSOLVE_KEYS = Set.of("metal", "mass", "acid", "oxidant");
    static final Set<String> FILTER_KEYS = Set.of("solid", "mass");

    private FeedReader() {
    }

    /**
     * @param file the feed file
     * @return the feed
     * @throws ScenarioException with every problem found
     */
    public static Feed read(Path file) throws ScenarioException {
        String name = file.toString();
        try {
            String text = StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(Files.readAllBytes(file))).toString();
            return parse(text, name);
        } catch (NoSuchFileException e) {
            throw fileProblem(name, "no such file");
        } catch (CharacterCodingException e) {
            throw fileProblem(name, "the file is not UTF-8 text");
        } catch (IOException e) {
            throw fileProblem(name, "cannot read the file: " + e.getMessage());
        }
    }

    /**
     * @param text the feed as TOML
     * @param fileName the name used in problem locations
     * @return the feed
     * @throws ScenarioException with every problem found
     */
    public static Feed parse(String text, String fileName) throws ScenarioException {
        ProblemLog log = new ProblemLog();
        TomlParseResult parsed = Toml.parse(text.startsWith("\uFEFF") ? text.substring(1) : text);
        if (parsed.hasErrors()) {
            parsed.errors().forEach(e -> log.error(new SourceLocation(fileName, e.position() == null ? 0
                    : e.position().line(), e.position() == null ? 0 : e.position().column()), "",
                    "TOML syntax: " + e.getMessage()));
            throw new ScenarioException(log.problems());
        }
        TomlNode.Table root = TomlNode.of(parsed, new SourceLocation(fileName, 0, 0), SourceText.ofFile(fileName, text));
        SectionReader r = new SectionReader(root, "", log);
        r.allowOnly(ROOT_KEYS);
        String title = r.string("title").orElse("");
        Optional<Double> volume = r.quantity("volume", Dimension.VOLUME, Range.POSITIVE);
        if (!r.has("volume")) {
            r.missing("volume", "\"1.2 L\" (the final volume after topping up with water)");
        }
        double temp = r.quantity("temperature", Dimension.TEMPERATURE, Range.LIQUID_WATER).orElse(298.15);
        List<Placed> steps = new ArrayList<>();
        for (String kind : List.of("add", "dissolve", "filter")) {
            r.array(kind).ifPresent(a -> {
                for (int i = 0; i < a.items().size(); i++) {
                    TomlNode item = a.items().get(i);
                    String key = kind + "[" + (i + 1) + "]";
                    if (!(item instanceof TomlNode.Table t)) {
                        log.error(item.at(), key, "expected a table [[" + kind + "]], got " + item.kind());
                        continue;
                    }
                    SectionReader s = new SectionReader(t, key, log);
                    String label = fileName + ":" + t.at().line() + ": " + key;
                    Optional<Feed.Step> step = switch (kind) {
                        case "add" -> add(s, label);
                        case "dissolve" -> dissolve(s, label);
                        default -> filter(s, label);
                    };
                    step.ifPresent(st -> steps.add(new Placed(t.at().line(), t.at().column(), st)));
                }
            });
        }
        if (log.hasErrors() || volume.isEmpty()) {
            throw new ScenarioException(log.problems());
        }
        steps.sort(Comparator.comparingInt(Placed::line).thenComparingInt(Placed::column));
        return new Feed(title, volume.get(), temp, steps.stream().map(Placed::step).toList());
    }

    private record Placed(int line, int column, Feed.Step step) {
    }

    private static Optional<Feed.Step> add(SectionReader s, String label) {
        s.allowOnly(ADD_KEYS);
        boolean isSalt = s.has("salt");
        if (isSalt == s.has("acid")) {
            s.log().error(s.table().at(), s.path(), "give either salt = \"CuSO4·5H2O\" or acid = \"HCl\"");
            return Optional.empty();
        }
        String what = isSalt ? "salt" : "acid";
        Optional<Compound> compound = compound(s, what, isSalt ? Compound.Kind.SALT : Compound.Kind.ACID);
        if (compound.isEmpty()) {
            return Optional.empty();
        }
        Compound c = compound.get();
        double molarMass = c.molarMassKgPerMol();
        Optional<Double> fraction = fraction(s);
        if (s.has("mass")) {
            Optional<Double> kg = s.quantity("mass", Dimension.MASS, Range.POSITIVE);
            double w = fraction.orElse(1.0);
            return kg.map(m -> new Feed.Add(label, c, m * w / molarMass, String.format(Locale.ROOT, "%s g of %s%s",
                    num(m * 1000), fraction.isPresent() ? percent(w) + " " : "", c.name())));
        }
        if (isSalt) {
            s.missing("mass", "\"50 g\"");
            return Optional.empty();
        }
        if (!s.has("volume")) {
            s.missing("volume", "\"150 mL\" (with mass_fraction or concentration), or mass = \"98 g\"");
            return Optional.empty();
        }
        Optional<Double> m3 = s.quantity("volume", Dimension.VOLUME, Range.POSITIVE);
        if (m3.isEmpty()) {
            return Optional.empty();
        }
        double ml = m3.get() * 1e6;
        if (s.has("concentration")) {
            return s.quantity("concentration", Dimension.AMOUNT_CONCENTRATION, Range.POSITIVE).map(c3 ->
                    new Feed.Add(label, c, m3.get() * c3, String.format(Locale.ROOT, "%s mL of %s mol/L %s", num(ml),
                            num(c3 / 1000), c.name())));
        }
        if (fraction.isEmpty()) {
            if (!s.has("mass_fraction")) {
                s.missing("mass_fraction", "\"32 %\" (or concentration = \"10 mol/L\")");
            }
            return Optional.empty();
        }
        double w = fraction.get();
        Optional<Double> density = s.has("density") ? density(s) : AcidGrades.densityKgPerM3(c.base(), w);
        if (density.isEmpty()) {
            if (!s.has("density")) {
                s.log().error(s.at("mass_fraction"), s.key("mass_fraction"), "no built-in density for " + percent(w)
                        + " " + c.base() + " (known grades: " + AcidGrades.grades(c.base()) + "); add density = "
                        + "\"1.16 g/mL\" from the bottle's label");
            }
            return Optional.empty();
        }
        double rho = density.get();
        return Optional.of(new Feed.Add(label, c, m3.get() * rho * w / molarMass, String.format(Locale.ROOT,
                "%s mL of %s %s at %s g/mL", num(ml), percent(w), c.name(), num(rho / 1000))));
    }

    private static Optional<Feed.Step> dissolve(SectionReader s, String label) {
        s.allowOnly(DISSOLVE_KEYS);
        Optional<String> metal = s.string("metal");
        if (!s.has("metal")) {
            s.missing("metal", "\"Sn\"");
        }
        if (!s.has("mass")) {
            s.missing("mass", "\"30 g\"");
        }
        Optional<Double> kg = s.quantity("mass", Dimension.MASS, Range.POSITIVE);
        Optional<String> acid = s.string("acid");
        Optional<String> oxidant = s.string("oxidant");
        if (metal.isEmpty() || kg.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Feed.Dissolve(label, metal.get().strip(), kg.get(), acid.map(String::strip).orElse(null),
                oxidant.map(String::strip).orElse(null)));
    }

    private static Optional<Feed.Step> filter(SectionReader s, String label) {
        s.allowOnly(FILTER_KEYS);
        if (!s.has("solid")) {
            s.missing("solid", "\"PbCl2\"");
        }
        if (!s.has("mass")) {
            s.missing("mass", "\"2 g\" (the dry mass filtered off)");
        }
        Optional<Compound> c = s.has("solid") ? compound(s, "solid", null) : Optional.empty();
        Optional<Double> kg = s.quantity("mass", Dimension.MASS, Range.POSITIVE);
        if (c.isEmpty() || kg.isEmpty() || c.get().kind() == Compound.Kind.ACID) {
            if (c.isPresent() && c.get().kind() == Compound.Kind.ACID) {
                s.log().error(s.at("solid"), s.key("solid"), c.get().name() + " is an acid, not a solid");
            }
            return Optional.empty();
        }
        return Optional.of(new Feed.Filter(label, c.get(), kg.get()));
    }

    private static Optional<Compound> compound(SectionReader s, String key, Compound.Kind kind) {
        Optional<String> written = s.string(key);
        if (written.isEmpty()) {
            return Optional.empty();
        }
        Optional<Compound> c = CompoundTable.find(written.get());
        if (c.isEmpty() || (kind != null && c.get().kind() != kind)) {
            List<String> known = CompoundTable.names();
            String base = written.get().strip().split("[·.*• ]", 2)[0];
            String hint = c.isEmpty() && known.contains(base) && !base.equals(written.get().strip())
                    ? "; write the water of crystallisation as e.g. '" + base + "·2H2O' (H2O with the letter O)"
                    : Spelling.suggestion(base, known) + "; known: " + String.join(", ", known);
            s.log().error(s.at(key), s.key(key), "unknown " + key + " '" + written.get() + "'" + hint);
            return Optional.empty();
        }
        return c;
    }

    /** @return the mass fraction (0-1) written as "32 %" or 0.32, empty (reported) when bad or absent */
    private static Optional<Double> fraction(SectionReader s) {
        TomlNode n = s.table().get("mass_fraction");
        if (n == null) {
            return Optional.empty();
        }
        Double w = null;
        if (n instanceof TomlNode.Leaf leaf) {
            if (leaf.value() instanceof Number num) {
                w = num.doubleValue();
            } else if (leaf.value() instanceof String str) {
                String t = str.strip();
                try {
                    w = t.endsWith("%") ? Double.parseDouble(t.substring(0, t.length() - 1).strip()) / 100
                            : Double.parseDouble(t);
                } catch (NumberFormatException e) {
                    w = null;
                }
            }
        }
        if (w == null || !(w > 0 && w <= 1)) {
            s.log().error(n.at(), s.key("mass_fraction"), "expected a mass fraction such as \"32 %\" or 0.32");
            return Optional.empty();
        }
        return Optional.of(w);
    }

    /** @return a density written as "1.159 g/mL" (also g/cm3, kg/L, kg/m3), in kg/m3 */
    private static Optional<Double> density(SectionReader s) {
        TomlNode n = s.table().get("density");
        if (n instanceof TomlNode.Leaf leaf && leaf.value() instanceof String str) {
            String t = str.strip();
            String[][] units = {{"g/mL", "1000"}, {"g/cm3", "1000"}, {"kg/L", "1000"}, {"kg/m3", "1"}};
            for (String[] u : units) {
                if (t.endsWith(u[0])) {
                    try {
                        double v = Double.parseDouble(t.substring(0, t.length() - u[0].length()).strip());
                        if (v > 0) {
                            return Optional.of(v * Double.parseDouble(u[1]));
                        }
                    } catch (NumberFormatException e) {
                        break;
                    }
                }
            }
        }
        s.log().error(n.at(), s.key("density"), "expected a density such as \"1.159 g/mL\" (or g/cm3, kg/L, kg/m3)");
        return Optional.empty();
    }

    private static String num(double v) {
        return QuantityFormat.number(v, 4);
    }

    private static String percent(double w) {
        return QuantityFormat.number(100 * w, 4) + " %";
    }

    private static ScenarioException fileProblem(String file, String message) {
        return new ScenarioException(List.of(new Problem(file, 0, 0, "", message, Problem.Severity.ERROR)));
    }
}
