package org.cellwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** The {@code library} command: its JSON contract (interface brief) and the human listing. */
class LibraryCommandTest {

    private static final List<String> SPECIES = List.of("H+", "OH-", "Cl-", "SO4^2-", "HSO4-", "NO3-", "Na+", "K+",
            "Sn2+", "Sn4+", "Cu2+", "Cu+", "Zn2+", "Ni2+", "Fe2+", "Fe3+", "Ag+", "Pb2+", "Al3+", "Cl2");
    private static final List<String> COUPLES = List.of("Sn2+/Sn", "Sn4+/Sn2+", "Cu2+/Cu", "Cu2+/Cu+", "Cu+/Cu",
            "Zn2+/Zn", "Ni2+/Ni", "Ag+/Ag", "Pb2+/Pb", "Fe2+/Fe", "Fe3+/Fe2+", "H+/H2", "H2O/H2", "O2/H2O", "Cl2/Cl-");

    private static String run(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        cl.setOut(new PrintWriter(out));
        int code = cl.execute(args);
        assertEquals(0, code);
        return out.toString();
    }

    @Test
    void jsonContract() throws Exception {
        JsonNode root = new ObjectMapper().readTree(run("library", "--json"));
        Set<String> species = new HashSet<>();
        for (JsonNode s : root.get("species")) {
            for (String key : List.of("name", "charge", "molar_mass_g_per_mol", "diffusion_m2_per_s",
                    "conductivity_S_m2_per_mol", "source")) {
                assertTrue(s.has(key), s.get("name") + " lacks " + key);
            }
            assertFalse(s.get("source").asText().isBlank(), s.get("name").asText());
            species.add(s.get("name").asText());
        }
        assertTrue(species.containsAll(SPECIES), "missing species: " + SPECIES.stream().filter(x -> !species.contains(x)).toList());
        Set<String> couples = new HashSet<>();
        Set<String> withMaterial = new HashSet<>();
        for (JsonNode r : root.get("reactions")) {
            for (String key : List.of("name", "equation", "n", "e0_V", "i0_A_per_m2", "alpha_a", "alpha_c",
                    "material", "source")) {
                assertTrue(r.has(key), r.get("name") + " lacks " + key);
            }
            assertFalse(r.get("source").asText().isBlank(), r.get("name").asText());
            if (r.get("material").isNull()) {
                couples.add(r.get("name").asText());
            } else {
                withMaterial.add(r.get("name").asText() + " on " + r.get("material").asText());
            }
        }
        assertTrue(couples.containsAll(COUPLES), "missing couples: " + COUPLES.stream().filter(x -> !couples.contains(x)).toList());
        assertTrue(withMaterial.contains("H+/H2 on lead-silver"));
        assertTrue(withMaterial.contains("O2/H2O on mmo"));
        assertTrue(withMaterial.contains("Cl2/Cl- on graphite"));
        // SI in the JSON: Cu2+ D = 0.714e-9 m2/s (CRC), Cu2+/Cu i0 = 10 A/m2, Cu2+ lambda = 0.01072 S m2/mol
        JsonNode cu = null;
        for (JsonNode s : root.get("species")) {
            if (s.get("name").asText().equals("Cu2+")) {
                cu = s;
            }
        }
        assertEquals(0.714e-9, cu.get("diffusion_m2_per_s").asDouble(), 1e-21);
        assertEquals(0.01072, cu.get("conductivity_S_m2_per_mol").asDouble(), 1e-12);
        assertEquals(63.546, cu.get("molar_mass_g_per_mol").asDouble(), 1e-9);
        assertTrue(root.get("metals").size() >= 8);
        assertTrue(root.get("materials").size() >= 15);
        assertEquals(3, root.get("homogeneous").size());
    }

    @Test
    void humanListing() {
        String text = run("library");
        for (String heading : List.of("Species", "Metals", "Electrode reactions", "Electrode materials",
                "Bulk (homogeneous) reactions", "Sources:")) {
            assertTrue(text.contains(heading), heading);
        }
        assertTrue(text.contains("Cu2+/Cu"));
        assertTrue(text.contains("on lead-silver"));
        assertTrue(text.contains("Mattsson & Bockris"));
    }
}
