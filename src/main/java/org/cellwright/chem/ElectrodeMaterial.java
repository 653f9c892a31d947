package org.cellwright.chem;

import java.util.List;
import java.util.Objects;

/**
 * An electrode material (substrate or anode).
 *
 * @param name canonical name ("stainless", "graphite", "lead-silver", "mmo")
 * @param aliases other names accepted in scenario files
 * @param solubleMetal the metal that dissolves when the material is an anode (refining), or null for an
 *     inert anode
 * @param surfaceMetal the metal whose hydrogen kinetics the bare surface shows, or null for a non-metal
 * @param description a short plain description for people
 */
public record ElectrodeMaterial(String name, List<String> aliases, String solubleMetal, String surfaceMetal,
                                String description) {

    public ElectrodeMaterial {
        Objects.requireNonNull(name, "name");
        aliases = List.copyOf(aliases);
    }

    /** @return true when the anode made of this material dissolves instead of evolving gas */
    public boolean isSoluble() {
        return solubleMetal != null;
    }
}
