package org.cellwright.chem;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * An electrode reaction {@code O + n e- = R}, named by its couple ("Cu2+/Cu", "H+/H2", "O2/H2O").
 *
 * <p>The standard potential is vs SHE at 25 C and follows temperature linearly with the isothermal
 * coefficient {@code dE0/dT}. Kinetics may differ per electrode material (hydrogen, oxygen and chlorine
 * evolution); {@link #kineticsOn(String)} picks the material's set, or the default one.
 *
 * @param name the couple, "Ox/Red"
 * @param equation the reduction written out, e.g. "Cu2+ + 2e- = Cu"
 * @param n electrons transferred
 * @param participants signed stoichiometry (oxidised side negative, reduced side positive)
 * @param e0V standard potential vs SHE at 25 C (V)
 * @param dE0dTVPerK isothermal temperature coefficient of E0 (V/K)
 * @param kinetics default kinetics (any material)
 * @param kineticsByMaterial kinetics on named electrode materials
 * @param sources where each number comes from ("e0", "dE0dT", ...)
 * @param requires species that must be in the bath for the reaction to run at all: the ligand that makes a
 *     participant stable (Cu+ only as chloro complexes); empty for most reactions
 */
public record ElectrodeReaction(String name, String equation, int n, List<Participant> participants,
                                double e0V, double dE0dTVPerK, Kinetics kinetics,
                                Map<String, Kinetics> kineticsByMaterial, Map<String, String> sources,
                                List<String> requires) {

    public ElectrodeReaction {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kinetics, "kinetics");
        if (n <= 0) {
            throw new IllegalArgumentException(name + ": electrons transferred must be > 0, got " + n);
        }
        if (!Double.isFinite(e0V) || !Double.isFinite(dE0dTVPerK)) {
            throw new IllegalArgumentException(name + ": standard potential must be finite");
        }
        participants = List.copyOf(participants);
        kineticsByMaterial = Map.copyOf(kineticsByMaterial);
        sources = Map.copyOf(sources);
        requires = requires == null ? List.of() : List.copyOf(requires);
    }

    /** A reaction that runs in any bath holding its participants (no {@link #requires}). */
    public ElectrodeReaction(String name, String equation, int n, List<Participant> participants, double e0V,
                             double dE0dTVPerK, Kinetics kinetics, Map<String, Kinetics> kineticsByMaterial,
                             Map<String, String> sources) {
        this(name, equation, n, participants, e0V, dE0dTVPerK, kinetics, kineticsByMaterial, sources, List.of());
    }

    /** @return the kinetics on the given electrode material, falling back to the default set */
    public Kinetics kineticsOn(String material) {
        return material == null ? kinetics : kineticsByMaterial.getOrDefault(material, kinetics);
    }

    /** @return the standard potential (V vs SHE) at temperature {@code tempK} */
    public double e0At(double tempK) {
        return e0V + dE0dTVPerK * (tempK - PhysicalConstants.REFERENCE_TEMPERATURE_K);
    }

    /** @return the solid metal this reaction deposits (reduced side), if any */
    public Optional<String> depositedMetal() {
        return participants.stream()
                .filter(p -> p.phase() == Phase.SOLID && p.coefficient() > 0)
                .map(Participant::name).findFirst();
    }

    /** @return the gas this reaction evolves or consumes, if any */
    public Optional<Participant> gas() {
        return participants.stream().filter(p -> p.phase() == Phase.GAS).findFirst();
    }

    /** @return a copy with other standard potential (V) */
    public ElectrodeReaction withE0(double e0) {
        return new ElectrodeReaction(name, equation, n, participants, e0, dE0dTVPerK, kinetics,
                kineticsByMaterial, sources, requires);
    }

    /** @return a copy with other kinetics, on one material or (material null) the default */
    public ElectrodeReaction withKinetics(String material, Kinetics k) {
        if (material == null) {
            return new ElectrodeReaction(name, equation, n, participants, e0V, dE0dTVPerK, k,
                    kineticsByMaterial, sources, requires);
        }
        var byMaterial = new java.util.HashMap<>(kineticsByMaterial);
        byMaterial.put(material, k);
        return new ElectrodeReaction(name, equation, n, participants, e0V, dE0dTVPerK, kinetics,
                byMaterial, sources, requires);
    }
}
