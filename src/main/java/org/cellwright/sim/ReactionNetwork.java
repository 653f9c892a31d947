package org.cellwright.sim;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeMaterial;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.HomogeneousReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.Species;

/**
 * The reactions that can run in one scenario, and the dissolved species they touch.
 *
 * <p>Starting from the bath's species, an electrode reaction may run as a reduction at the cathode when
 * every participant on its oxidised side is present (dissolved, or water), and as an oxidation at the anode
 * when every participant on its reduced side is present (dissolved, water, or the metal of a soluble
 * anode). Gases are products only: no hydrogen oxidation without dissolved hydrogen, no oxygen or chlorine
 * reduction. What a reaction makes joins the bath, and the search repeats until nothing new appears (so a
 * graphite anode in a stannous bath makes Sn4+, which is then reduced at the cathode). A reaction that
 * requires a species ({@link ElectrodeReaction#requires()}, e.g. the chloride that makes Cu+ stable) runs
 * only when that species is in the bath or made there.
 */
public final class ReactionNetwork {

    final List<Species> species;
    final List<Metal> depositMetals;
    final List<ReactionSlot> cathodeSlots;
    final List<ReactionSlot> anodeSlots;
    final List<PreparedHomogeneous> homogeneous;
    final Metal anodeMetal;
    final Metal targetMetal;
    final int targetSlot;
    final int hIndex;
    final int ohIndex;
    final int dissolvedChlorineIndex;
    final ElectrodeMaterial cathodeMaterial;
    final ElectrodeMaterial anodeMaterial;
    final ChemLibrary chem;

    /**
     * A homogeneous reaction with state indices.
     *
     * @param reaction the library reaction
     * @param index state index of each dissolved participant
     * @param nu signed coefficient of each
     * @param order reaction order of each (0 for products)
     */
    record PreparedHomogeneous(HomogeneousReaction reaction, int[] index, double[] nu, double[] order) {
    }

    private ReactionNetwork(Builder b) {
        this.species = List.copyOf(b.species);
        this.depositMetals = List.copyOf(b.depositMetals);
        this.cathodeSlots = List.copyOf(b.cathodeSlots);
        this.anodeSlots = List.copyOf(b.anodeSlots);
        this.homogeneous = List.copyOf(b.homogeneous);
        this.anodeMetal = b.anodeMetal;
        this.targetMetal = b.targetMetal;
        this.targetSlot = b.targetSlot;
        this.hIndex = indexOf("H+");
        this.ohIndex = indexOf("OH-");
        this.dissolvedChlorineIndex = indexOf("Cl2");
        this.cathodeMaterial = b.cathodeMaterial;
        this.anodeMaterial = b.anodeMaterial;
        this.chem = b.lib;
    }

    /** @return the dissolved species tracked, in state order */
    public List<Species> species() {
        return species;
    }

    /** @return the metals that can deposit on the cathode */
    public List<Metal> depositMetals() {
        return depositMetals;
    }

    /** @return the metal the run is for (efficiency and specific energy refer to it), or null if none */
    public Metal targetMetal() {
        return targetMetal;
    }

    /** @return the reactions at the cathode */
    public List<ReactionSlot> cathodeSlots() {
        return cathodeSlots;
    }

    /** @return the reactions at the anode */
    public List<ReactionSlot> anodeSlots() {
        return anodeSlots;
    }

    /** @return the state index of a species, or -1 */
    public int indexOf(String name) {
        for (int i = 0; i < species.size(); i++) {
            if (species.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /** @return true when water's ion product ties H+ and OH- together (both tracked) */
    boolean waterEquilibrium() {
        return hIndex >= 0 && ohIndex >= 0;
    }

    /**
     * Builds the network of a scenario.
     *
     * @param lib the chemistry with the scenario's overrides applied
     * @param sc the scenario
     * @return the network
     * @throws IllegalArgumentException when a species, material or target is unknown
     */
    public static ReactionNetwork of(ChemLibrary lib, Scenario sc) {
        return new Builder(lib, sc).build();
    }

    private static final class Builder {
        final ChemLibrary lib;
        final Scenario sc;
        final List<Species> species = new ArrayList<>();
        final List<Metal> depositMetals = new ArrayList<>();
        final List<ReactionSlot> cathodeSlots = new ArrayList<>();
        final List<ReactionSlot> anodeSlots = new ArrayList<>();
        final List<PreparedHomogeneous> homogeneous = new ArrayList<>();
        final ElectrodeMaterial cathodeMaterial;
        final ElectrodeMaterial anodeMaterial;
        Metal anodeMetal;
        Metal targetMetal;
        int targetSlot = -1;

        Builder(ChemLibrary lib, Scenario sc) {
            this.lib = lib;
            this.sc = sc;
            this.cathodeMaterial = lib.findMaterial(sc.cathode().material()).orElseThrow(
                    () -> new IllegalArgumentException("unknown cathode material '" + sc.cathode().material() + "'"));
            this.anodeMaterial = lib.findMaterial(sc.anode().material()).orElseThrow(
                    () -> new IllegalArgumentException("unknown anode material '" + sc.anode().material() + "'"));
            if (anodeMaterial.isSoluble()) {
                anodeMetal = lib.findMetal(anodeMaterial.solubleMetal()).orElseThrow(
                        () -> new IllegalArgumentException("no metal data for anode metal " + anodeMaterial.solubleMetal()));
            }
        }

        ReactionNetwork build() {
            Set<String> present = new LinkedHashSet<>();
            Set<String> given = new LinkedHashSet<>(sc.electrolyte().compositionMolPerM3().keySet());
            Map<String, Double> anolyte = sc.cell().compartments().anolyteCompositionMolPerM3();
            if (anolyte != null) {
                given.addAll(anolyte.keySet());
            }
            for (String name : given) {
                present.add(lib.findSpecies(name).map(Species::name).orElseThrow(
                        () -> new IllegalArgumentException("unknown species '" + name + "'")));
            }
            if (present.contains("H+") && lib.findSpecies("OH-").isPresent()) {
                present.add("OH-");
            }
            boolean grew = true;
            while (grew) {
                grew = false;
                for (ElectrodeReaction r : lib.reactions()) {
                    if (canReduce(r, present)) {
                        grew |= addDissolved(r, true, present);
                    }
                    if (canOxidise(r, present)) {
                        grew |= addDissolved(r, false, present);
                    }
                }
                for (HomogeneousReaction h : lib.homogeneousReactions()) {
                    if (reactantsPresent(h, present)) {
                        for (Participant p : h.participants()) {
                            if (p.coefficient() > 0 && p.phase() == Phase.DISSOLVED) {
                                grew |= present.add(p.name());
                            }
                        }
                    }
                }
            }
            for (String name : present) {
                species.add(lib.findSpecies(name).orElseThrow());
            }
            for (ElectrodeReaction r : lib.reactions()) {
                boolean red = canReduce(r, present);
                boolean ox = canOxidise(r, present);
                if (red || ox) {
                    addCathodeSlot(r, red, present);
                }
                if (ox && anodeCanOxidise(r, present)) {
                    anodeSlots.add(slot(r, Electrodes.ANODE, anodeMaterial.name(), null, true,
                            canReduceAtAnode(r, present), -1, dissolvesAnode(r)));
                }
            }
            chooseTarget();
            for (HomogeneousReaction h : lib.homogeneousReactions()) {
                if (reactantsPresent(h, present)) {
                    homogeneous.add(prepare(h));
                }
            }
            return new ReactionNetwork(this);
        }

        private void addCathodeSlot(ElectrodeReaction r, boolean red, Set<String> present) {
            if (!red) {
                return;
            }
            int metalIndex = -1;
            String metal = r.depositedMetal().orElse(null);
            if (metal != null) {
                Metal m = lib.findMetal(metal).orElseThrow(
                        () -> new IllegalArgumentException("no metal data for " + metal));
                metalIndex = depositMetals.indexOf(m);
                if (metalIndex < 0) {
                    depositMetals.add(m);
                    metalIndex = depositMetals.size() - 1;
                }
            }
            boolean ox = canOxidise(r, present) && metal == null;
            cathodeSlots.add(slot(r, Electrodes.CATHODE, cathodeMaterial.name(), null, ox, true, metalIndex, false));
        }

        private void chooseTarget() {
            String wanted = sc.run().targetMetal();
            double best = -1;
            for (int i = 0; i < cathodeSlots.size(); i++) {
                ReactionSlot s = cathodeSlots.get(i);
                if (s.depositMetalIndex() < 0) {
                    continue;
                }
                Metal m = depositMetals.get(s.depositMetalIndex());
                double c = s.oxIndex().length == 0 ? 0 : initialOf(species.get(s.oxIndex()[0]).name());
                boolean pick = wanted != null ? m.symbol().equalsIgnoreCase(wanted) && c >= best : c > best;
                if (pick) {
                    best = c;
                    targetMetal = m;
                    targetSlot = i;
                }
            }
            if (wanted != null && targetMetal == null) {
                throw new IllegalArgumentException("run.target '" + wanted + "' cannot deposit from this bath");
            }
            if (targetMetal != null) {
                String depositMaterial = materialOfMetal(targetMetal.symbol());
                for (int i = 0; i < cathodeSlots.size(); i++) {
                    ReactionSlot s = cathodeSlots.get(i);
                    Kinetics dep = depositMaterial == null ? null : s.reaction().kineticsOn(depositMaterial);
                    cathodeSlots.set(i, new ReactionSlot(s.reaction(), s.electrode(), s.oxIndex(), s.oxNu(),
                            s.redIndex(), s.redNu(), s.substrateKinetics(), dep, s.anodicAllowed(),
                            s.cathodicAllowed(), s.depositMetalIndex(), s.dissolvesAnode()));
                }
            }
        }

        private double initialOf(String name) {
            for (Map.Entry<String, Double> e : sc.electrolyte().compositionMolPerM3().entrySet()) {
                if (lib.findSpecies(e.getKey()).map(Species::name).orElse("").equals(name)) {
                    return e.getValue();
                }
            }
            return 0;
        }

        private String materialOfMetal(String symbol) {
            for (ElectrodeMaterial m : lib.materials()) {
                if (symbol.equals(m.surfaceMetal()) && symbol.equals(m.solubleMetal())) {
                    return m.name();
                }
            }
            for (ElectrodeMaterial m : lib.materials()) {
                if (symbol.equals(m.surfaceMetal())) {
                    return m.name();
                }
            }
            return null;
        }

        private ReactionSlot slot(ElectrodeReaction r, Electrodes e, String material, Kinetics deposit,
                                  boolean anodic, boolean cathodic, int metalIndex, boolean dissolvesAnode) {
            List<Integer> oxI = new ArrayList<>();
            List<Double> oxN = new ArrayList<>();
            List<Integer> redI = new ArrayList<>();
            List<Double> redN = new ArrayList<>();
            for (Participant p : r.participants()) {
                if (p.phase() != Phase.DISSOLVED) {
                    continue;
                }
                int idx = indexIn(p.name());
                if (p.coefficient() < 0) {
                    oxI.add(idx);
                    oxN.add(-p.coefficient());
                } else {
                    redI.add(idx);
                    redN.add(p.coefficient());
                }
            }
            return new ReactionSlot(r, e, ints(oxI), doubles(oxN), ints(redI), doubles(redN),
                    r.kineticsOn(material), deposit, anodic, cathodic, metalIndex, dissolvesAnode);
        }

        private int indexIn(String name) {
            for (int i = 0; i < species.size(); i++) {
                if (species.get(i).name().equals(name)) {
                    return i;
                }
            }
            throw new IllegalStateException("species " + name + " not tracked");
        }

        private PreparedHomogeneous prepare(HomogeneousReaction h) {
            List<Participant> dissolved = h.participants().stream().filter(p -> p.phase() == Phase.DISSOLVED).toList();
            int[] idx = new int[dissolved.size()];
            double[] nu = new double[dissolved.size()];
            double[] order = new double[dissolved.size()];
            for (int i = 0; i < dissolved.size(); i++) {
                Participant p = dissolved.get(i);
                idx[i] = indexIn(p.name());
                nu[i] = p.coefficient();
                order[i] = p.coefficient() < 0 ? h.orders().getOrDefault(p.name(), -p.coefficient()) : 0;
            }
            return new PreparedHomogeneous(h, idx, nu, order);
        }

        private boolean canReduce(ElectrodeReaction r, Set<String> present) {
            if (!present.containsAll(r.requires())) {
                return false;
            }
            for (Participant p : r.participants()) {
                if (p.coefficient() < 0 && !available(p, present, false)) {
                    return false;
                }
            }
            return true;
        }

        private boolean canOxidise(ElectrodeReaction r, Set<String> present) {
            if (!present.containsAll(r.requires())) {
                return false;
            }
            for (Participant p : r.participants()) {
                if (p.coefficient() > 0 && !available(p, present, true)) {
                    return false;
                }
            }
            return true;
        }

        private boolean anodeCanOxidise(ElectrodeReaction r, Set<String> present) {
            String metal = r.depositedMetal().orElse(null);
            return metal == null || (anodeMetal != null && anodeMetal.symbol().equals(metal));
        }

        private boolean canReduceAtAnode(ElectrodeReaction r, Set<String> present) {
            return r.depositedMetal().isEmpty() && canReduce(r, present);
        }

        private boolean dissolvesAnode(ElectrodeReaction r) {
            return anodeMetal != null && r.depositedMetal().map(anodeMetal.symbol()::equals).orElse(false);
        }

        private boolean available(Participant p, Set<String> present, boolean oxidation) {
            return switch (p.phase()) {
                case WATER -> true;
                case DISSOLVED -> present.contains(p.name());
                case GAS -> false;
                case SOLID -> oxidation && anodeMetal != null && anodeMetal.symbol().equals(p.name());
            };
        }

        private boolean addDissolved(ElectrodeReaction r, boolean reduction, Set<String> present) {
            boolean added = false;
            for (Participant p : r.participants()) {
                boolean product = reduction ? p.coefficient() > 0 : p.coefficient() < 0;
                if (product && p.phase() == Phase.DISSOLVED && lib.findSpecies(p.name()).isPresent()) {
                    added |= present.add(p.name());
                }
            }
            return added;
        }

        private boolean reactantsPresent(HomogeneousReaction h, Set<String> present) {
            return h.participants().stream().filter(p -> p.coefficient() < 0)
                    .allMatch(p -> p.phase() != Phase.DISSOLVED || present.contains(p.name()));
        }

        private static int[] ints(List<Integer> l) {
            return l.stream().mapToInt(Integer::intValue).toArray();
        }

        private static double[] doubles(List<Double> l) {
            return l.stream().mapToDouble(Double::doubleValue).toArray();
        }
    }
}
