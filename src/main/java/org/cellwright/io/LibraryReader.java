package org.cellwright.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.DepositClass;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Species;
import org.cellwright.chem.SpeciesName;
import org.tomlj.Toml;
import org.tomlj.TomlParseError;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * Reads the chemistry library file: {@code [species."X"]}, {@code [metal.X]}, {@code [material.x]},
 * {@code [reaction."Ox/Red"]} (with {@code .on.<material>} kinetics) and {@code [homogeneous."name"]} tables.
 * Every quantity is a string with a unit or a bare SI number, and every number needs a {@code <key>_source}
 * string; the reader fails otherwise, naming file, line, column and key. Format: docs/library.md.
 *
 * <p>The built-in library is the resource {@code org/cellwright/io/library.toml}, read once and cached.
 */
public final class LibraryReader {

    /** Name of the built-in library resource, next to this class. */
    public static final String BUILT_IN_RESOURCE = "library.toml";

    private static final Set<String> SECTIONS = Set.of("species", "metal", "material", "reaction", "homogeneous");
    private static final Set<String> SPECIES_KEYS = Set.of("note", "charge", "elements", "molar_mass", "diffusion",
            "conductivity");
    private static final Set<String> SPECIES_NUMBERS = Set.of("molar_mass", "diffusion", "conductivity");
    private static final Set<String> METAL_KEYS = Set.of("note", "molar_mass", "density", "deposit_class");
    private static final Set<String> METAL_NUMBERS = Set.of("molar_mass", "density", "deposit_class");
    private static final Set<String> MATERIAL_KEYS = Set.of("aliases", "soluble_metal", "surface_metal",
            "description");

    private static volatile ChemLibrary builtIn;

    private final String sourceName;

    private LibraryReader(String sourceName) {
        this.sourceName = sourceName;
    }

    /**
     * @return the built-in library, read from the resource on first use
     * @throws IllegalStateException if the resource is missing or broken (an internal failure)
     */
    public static ChemLibrary builtIn() {
        ChemLibrary lib = builtIn;
        if (lib == null) {
            synchronized (LibraryReader.class) {
                lib = builtIn;
                if (lib == null) {
                    lib = readBuiltIn();
                    builtIn = lib;
                }
            }
        }
        return lib;
    }

    private static ChemLibrary readBuiltIn() {
        try (InputStream in = LibraryReader.class.getResourceAsStream(BUILT_IN_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("built-in chemistry library resource is missing: " + BUILT_IN_RESOURCE);
            }
            return read(new InputStreamReader(in, StandardCharsets.UTF_8), BUILT_IN_RESOURCE);
        } catch (IOException | LibraryFormatException e) {
            throw new IllegalStateException("built-in chemistry library cannot be read: " + e.getMessage(), e);
        }
    }

    /**
     * Reads a library file.
     *
     * @param in the TOML text
     * @param sourceName the file name used in error messages
     * @return the library
     * @throws IOException if the text cannot be read
     * @throws LibraryFormatException if the content is wrong (with file, line, column and key)
     */
    public static ChemLibrary read(Reader in, String sourceName) throws IOException, LibraryFormatException {
        TomlParseResult toml = Toml.parse(in);
        if (toml.hasErrors()) {
            TomlParseError e = toml.errors().get(0);
            throw new LibraryFormatException(sourceName, e.position().line(), e.position().column(), null,
                    "not valid TOML: " + e.getMessage());
        }
        return new LibraryReader(sourceName).read(toml);
    }

    private ChemLibrary read(TomlTable root) throws LibraryFormatException {
        DataTable top = new DataTable(sourceName, root, "", null);
        for (String key : top.keys()) {
            if (!SECTIONS.contains(key)) {
                throw new LibraryFormatException(sourceName, root.inputPositionOf(List.of(key)).line(),
                        root.inputPositionOf(List.of(key)).column(), key,
                        "unknown section (expected species, metal, material, reaction or homogeneous)");
            }
        }
        List<Species> species = new ArrayList<>();
        for (DataTable t : entries(root, "species")) {
            species.add(species(t));
        }
        List<Metal> metals = new ArrayList<>();
        for (DataTable t : entries(root, "metal")) {
            metals.add(metal(t));
        }
        ChemLibrary vocabulary = new ChemLibrary(species, metals, List.of(), List.of(), List.of());
        List<ElectrodeMaterial> materials = new ArrayList<>();
        for (DataTable t : entries(root, "material")) {
            materials.add(material(t, vocabulary, materials));
        }
        vocabulary = new ChemLibrary(species, metals, List.of(), List.of(), materials);
        ReactionTables reactionTables = new ReactionTables(vocabulary);
        List<ElectrodeReaction> reactions = new ArrayList<>();
        for (DataTable t : entries(root, "reaction")) {
            ElectrodeReaction r = reactionTables.electrode(t, lastKey(t));
            if (reactions.stream().anyMatch(x -> x.name().equals(r.name()))) {
                throw t.error(null, "the couple " + r.name() + " is defined twice");
            }
            reactions.add(r);
        }
        List<HomogeneousReaction> homogeneous = new ArrayList<>();
        for (DataTable t : entries(root, "homogeneous")) {
            homogeneous.add(reactionTables.homogeneous(t, lastKey(t)));
        }
        return new ChemLibrary(species, metals, reactions, homogeneous, materials);
    }

    private List<DataTable> entries(TomlTable root, String section) throws LibraryFormatException {
        if (!root.contains(List.of(section))) {
            return List.of();
        }
        DataTable sectionTable = new DataTable(sourceName, root, "", null).table(section);
        List<DataTable> out = new ArrayList<>();
        for (String key : sectionTable.keys()) {
            out.add(sectionTable.table(key));
        }
        return out;
    }

    private static String lastKey(DataTable t) {
        String path = t.path();
        int dot = path.indexOf('.');
        String key = path.substring(dot + 1);
        return key.startsWith("\"") && key.endsWith("\"") ? key.substring(1, key.length() - 1) : key;
    }

    private Species species(DataTable t) throws LibraryFormatException {
        t.allowOnly(SPECIES_KEYS, SPECIES_NUMBERS);
        String written = lastKey(t);
        List<String> candidates = SpeciesName.candidates(written);
        if (candidates.isEmpty()) {
            throw t.error(null, "'" + written + "' is not a species name");
        }
        String name = candidates.contains(written) ? written : candidates.get(0);
        long charge = t.integer("charge");
        char last = name.charAt(name.length() - 1);
        boolean signOk = charge > 0 ? last == '+' : charge < 0 ? last == '-' : last != '+' && last != '-';
        if (!signOk || Math.abs(charge) > 9) {
            throw t.error("charge", "charge " + charge + " does not match the name " + name);
        }
        Map<String, Integer> elements = new LinkedHashMap<>();
        if (t.has("elements")) {
            DataTable el = t.table("elements");
            for (String symbol : el.keys()) {
                if (!symbol.matches("[A-Z][a-z]?")) {
                    throw el.error(symbol, "not an element symbol");
                }
                long count = el.integer(symbol);
                if (count <= 0) {
                    throw el.error(symbol, "count must be > 0");
                }
                elements.put(symbol, (int) count);
            }
        }
        Map<String, String> sources = new LinkedHashMap<>();
        double molarMass = t.quantity("molar_mass", LibraryUnits.MOLAR_MASS, "g/mol");
        sources.put("molar_mass", t.source("molar_mass"));
        double diffusion = t.quantity("diffusion", LibraryUnits.DIFFUSIVITY, "m2/s");
        sources.put("diffusion", t.source("diffusion"));
        double conductivity = 0;
        if (t.has("conductivity")) {
            conductivity = t.quantity("conductivity", LibraryUnits.MOLAR_CONDUCTIVITY, "S cm2/mol");
            sources.put("conductivity", t.source("conductivity"));
        } else if (charge != 0) {
            throw t.missing("conductivity");
        }
        if (t.has("note")) {
            sources.put("note", t.string("note"));
        }
        try {
            return new Species(name, (int) charge, molarMass, diffusion, conductivity, elements, sources);
        } catch (IllegalArgumentException e) {
            throw t.error(null, e.getMessage());
        }
    }

    private Metal metal(DataTable t) throws LibraryFormatException {
        t.allowOnly(METAL_KEYS, METAL_NUMBERS);
        String symbol = lastKey(t);
        if (!symbol.matches("[A-Z][a-z]?")) {
            throw t.error(null, "'" + symbol + "' is not a metal symbol (e.g. Sn, Cu)");
        }
        Map<String, String> sources = new LinkedHashMap<>();
        double molarMass = t.quantity("molar_mass", LibraryUnits.MOLAR_MASS, "g/mol");
        sources.put("molar_mass", t.source("molar_mass"));
        double density = t.quantity("density", LibraryUnits.DENSITY, "g/cm3");
        sources.put("density", t.source("density"));
        String cls = t.string("deposit_class");
        DepositClass depositClass;
        try {
            depositClass = DepositClass.valueOf(cls.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw t.error("deposit_class", "'" + cls + "' is not normal, intermediate or inert");
        }
        sources.put("deposit_class", t.source("deposit_class"));
        if (t.has("note")) {
            sources.put("note", t.string("note"));
        }
        try {
            return new Metal(symbol, molarMass, density, depositClass, sources);
        } catch (IllegalArgumentException e) {
            throw t.error(null, e.getMessage());
        }
    }

    private ElectrodeMaterial material(DataTable t, ChemLibrary vocabulary, List<ElectrodeMaterial> earlier)
            throws LibraryFormatException {
        t.allowOnly(MATERIAL_KEYS, Set.of());
        String name = lastKey(t).toLowerCase(Locale.ROOT);
        List<String> aliases = new ArrayList<>();
        for (String alias : t.strings("aliases")) {
            aliases.add(alias.toLowerCase(Locale.ROOT));
        }
        for (String n : concat(name, aliases)) {
            for (ElectrodeMaterial m : earlier) {
                if (m.name().equals(n) || m.aliases().contains(n)) {
                    throw t.error(null, "the name or alias '" + n + "' is already used by material " + m.name());
                }
            }
        }
        String soluble = t.optionalString("soluble_metal");
        if (soluble != null && vocabulary.findMetal(soluble).isEmpty()) {
            throw t.error("soluble_metal", "'" + soluble + "' is not a metal of the library");
        }
        String surface = t.optionalString("surface_metal");
        if (surface != null && !surface.matches("[A-Z][a-z]?")) {
            throw t.error("surface_metal", "'" + surface + "' is not an element symbol");
        }
        String description = t.has("description") ? t.string("description") : "";
        return new ElectrodeMaterial(name, aliases, soluble, surface, description);
    }

    private static List<String> concat(String first, List<String> rest) {
        List<String> out = new ArrayList<>();
        out.add(first);
        out.addAll(rest);
        return out;
    }
}
