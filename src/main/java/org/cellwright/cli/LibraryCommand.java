package org.cellwright.cli;

import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Species;
import org.cellwright.io.LibraryReader;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The {@code library} command: lists the built-in chemistry (species, metals, electrode reactions with their
 * kinetics per electrode material, materials, homogeneous reactions) with the source of every number, as a
 * table for people or, with {@code --json}, as JSON (keys in docs/library.md and the interface brief).
 */
@Command(name = "library", mixinStandardHelpOptions = true,
        description = "Lists the built-in species, metals, electrode reactions, electrode materials and bulk"
                + " reactions with the source of every number.")
public final class LibraryCommand implements Callable<Integer> {

    @Option(names = "--json", description = "Print the library as JSON on stdout.")
    boolean json;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return CommandRun.of("library", "output").call(spec, this::print);
    }

    private int print(PrintWriter out, PrintWriter err) {
        ChemLibrary library;
        try {
            library = LibraryReader.builtIn();
        } catch (IllegalStateException e) {
            err.println("cellwright library: " + e.getMessage());
            return Main.INTERNAL_FAILURE;
        }
        if (json) {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            try {
                out.println(mapper.writeValueAsString(toJson(library)));
            } catch (JsonProcessingException e) {
                throw new UncheckedIOException(e);
            }
        } else {
            new LibraryTable(out).print(library);
        }
        return 0;
    }

    /** @return the library as nested maps and lists in the JSON contract of the {@code library} command */
    static Map<String, Object> toJson(ChemLibrary library) {
        Map<String, Object> root = new LinkedHashMap<>();
        List<Object> species = new ArrayList<>();
        for (Species s : library.species()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", s.name());
            m.put("charge", s.charge());
            m.put("molar_mass_g_per_mol", s.molarMassKgPerMol() * 1000.0);
            m.put("diffusion_m2_per_s", s.diffusionM2PerS());
            m.put("conductivity_S_m2_per_mol", s.conductivitySM2PerMol());
            m.put("elements", new java.util.TreeMap<>(s.elements()));
            m.put("source", joinSources(s.sources()));
            m.put("sources", orderedSources(s.sources()));
            species.add(m);
        }
        root.put("species", species);
        List<Object> reactions = new ArrayList<>();
        for (ElectrodeReaction r : library.reactions()) {
            reactions.add(reactionJson(r, null, r.kinetics()));
            r.kineticsByMaterial().entrySet().stream()
                    .sorted(Map.Entry.comparingByKey(materialOrder(library)))
                    .forEach(e -> reactions.add(reactionJson(r, e.getKey(), e.getValue())));
        }
        root.put("reactions", reactions);
        List<Object> metals = new ArrayList<>();
        for (Metal metal : library.metals()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("symbol", metal.symbol());
            m.put("molar_mass_g_per_mol", metal.molarMassKgPerMol() * 1000.0);
            m.put("density_kg_per_m3", metal.densityKgPerM3());
            m.put("molar_volume_m3_per_mol", metal.molarVolumeM3PerMol());
            m.put("deposit_class", metal.depositClass().name().toLowerCase(Locale.ROOT));
            m.put("source", joinSources(metal.sources()));
            metals.add(m);
        }
        root.put("metals", metals);
        List<Object> materials = new ArrayList<>();
        for (ElectrodeMaterial mat : library.materials()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", mat.name());
            m.put("aliases", mat.aliases());
            m.put("soluble_metal", mat.solubleMetal());
            m.put("surface_metal", mat.surfaceMetal());
            m.put("description", mat.description());
            materials.add(m);
        }
        root.put("materials", materials);
        List<Object> homogeneous = new ArrayList<>();
        for (HomogeneousReaction h : library.homogeneousReactions()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", h.name());
            m.put("equation", h.equation());
            m.put("rate_constant_SI", h.rateConstant());
            m.put("orders", h.orders());
            m.put("source", h.source());
            homogeneous.add(m);
        }
        root.put("homogeneous", homogeneous);
        return root;
    }

    private static java.util.Comparator<String> materialOrder(ChemLibrary library) {
        List<String> order = library.materials().stream().map(ElectrodeMaterial::name).toList();
        return java.util.Comparator.comparingInt(order::indexOf);
    }

    private static Map<String, Object> reactionJson(ElectrodeReaction r, String material, Kinetics k) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", r.name());
        m.put("equation", r.equation());
        m.put("n", r.n());
        m.put("e0_V", r.e0V());
        m.put("de0dt_V_per_K", r.dE0dTVPerK());
        m.put("i0_A_per_m2", k.i0APerM2());
        m.put("alpha_a", k.alphaA());
        m.put("alpha_c", k.alphaC());
        m.put("material", material);
        m.put("source", "e0: " + r.sources().get("e0") + "; de0dt: " + r.sources().get("de0dt") + "; kinetics: "
                + k.source());
        return m;
    }

    private static final List<String> SOURCE_ORDER = List.of("molar_mass", "diffusion", "conductivity", "density",
            "deposit_class", "e0", "de0dt", "i0", "alpha_a", "alpha_c", "note");

    /** @return the sources as one line, "molar mass: ...; diffusion: ...", in a fixed key order */
    static String joinSources(Map<String, String> sources) {
        List<String> keys = new ArrayList<>(sources.keySet());
        keys.sort(java.util.Comparator.comparingInt((String k) -> SOURCE_ORDER.indexOf(k) < 0 ? 99 : SOURCE_ORDER.indexOf(k))
                .thenComparing(k -> k));
        List<String> parts = new ArrayList<>();
        for (String k : keys) {
            parts.add(k.replace('_', ' ') + ": " + sources.get(k));
        }
        return String.join("; ", parts);
    }

    /** @return the sources as an ordered map (fixed key order) */
    static Map<String, String> orderedSources(Map<String, String> sources) {
        Map<String, String> out = new LinkedHashMap<>();
        SOURCE_ORDER.stream().filter(sources::containsKey).forEach(k -> out.put(k, sources.get(k)));
        sources.keySet().stream().filter(k -> !out.containsKey(k)).sorted().forEach(k -> out.put(k, sources.get(k)));
        return out;
    }
}
