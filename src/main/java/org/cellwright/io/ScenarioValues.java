package org.cellwright.io;

import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.ReactionOverride;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Kinetics;
import org.cellwright.chem.Species;
import org.cellwright.sim.ScenarioChemistry;
import org.cellwright.study.FreeParameter;
import org.cellwright.study.ParameterScale;

/**
 * The value a scenario key has in effect (SI), whether written in the file, set with {@code --set}, or taken
 * from a default (the agitation preset's diffusion layer, the library's exchange current density), and the
 * scale a fit should move it on.
 */
final class ScenarioValues {

    /** Keys that may be zero but not negative and are fitted linearly. */
    private static final Set<String> NON_NEGATIVE = Set.of("contact_resistance");
    /** Keys that are offsets or bounded numbers and are fitted linearly. */
    private static final Set<String> LINEAR = Set.of("e0", "alpha_a", "alpha_c", "temperature", "ambient");
    /**
     * Typical contact and lead resistance of a bench cell (ohm), the step scale when the fit starts it from zero:
     * a few milliohm for clamped copper leads (common practice).
     */
    static final double TYPICAL_CONTACT_OHM = 0.01;
    /** Typical shift of a standard potential (V), the step scale of an e0 that starts at zero (common practice). */
    static final double TYPICAL_POTENTIAL_V = 0.1;

    private ScenarioValues() {
    }

    /**
     * @param path the key's segments
     * @param sc the scenario as read
     * @param library the chemistry library
     * @return the value in effect (SI), when the key is one whose value the scenario or library knows
     */
    static Optional<Double> known(List<String> path, Scenario sc, ChemLibrary library) {
        String section = path.get(0);
        String last = path.get(path.size() - 1);
        if (path.size() == 2) {
            Double v = switch (section + "." + last) {
                case "electrolyte.volume" -> sc.electrolyte().volumeM3();
                case "electrolyte.temperature" -> sc.electrolyte().temperatureK();
                case "electrolyte.conductivity" -> sc.electrolyte().conductivitySPerM();
                case "cathode.area" -> sc.cathode().areaM2();
                case "anode.area" -> sc.anode().areaM2();
                case "cell.gap" -> sc.cell().gapM();
                case "cell.diffusion_layer" -> sc.cell().agitation().diffusionLayerM();
                case "cell.ambient" -> sc.cell().ambientK();
                case "cell.contact_resistance" -> sc.cell().contactResistanceOhm();
                case "cell.heat_loss" -> sc.cell().heatLossWPerK();
                case "supply.current" -> sc.supply().mode() == ControlMode.CURRENT && sc.supply().schedule().isEmpty()
                        ? sc.supply().currentA() : null;
                case "supply.current_density" -> sc.supply().mode() == ControlMode.CURRENT
                        && sc.supply().schedule().isEmpty() ? sc.supply().currentA() / sc.cathode().areaM2() : null;
                case "supply.voltage" -> sc.supply().mode() == ControlMode.VOLTAGE && sc.supply().schedule().isEmpty()
                        ? sc.supply().voltageV() : null;
                case "supply.voltage_limit" -> finite(sc.supply().voltageLimitV());
                case "supply.current_limit" -> finite(sc.supply().currentLimitA());
                default -> null;
            };
            return Optional.ofNullable(v);
        }
        if (path.size() == 3 && section.equals("electrolyte") && path.get(1).equals("composition")) {
            return library.findSpecies(last).map(Species::name)
                    .map(n -> sc.electrolyte().compositionMolPerM3().get(n));
        }
        if (path.size() == 3 && section.equals("species")) {
            ChemLibrary chem = ScenarioChemistry.apply(library, sc);
            return chem.findSpecies(path.get(1)).map(s -> switch (last) {
                case "molar_mass" -> s.molarMassKgPerMol();
                case "diffusion" -> s.diffusionM2PerS();
                case "conductivity" -> s.conductivitySM2PerMol();
                default -> null;
            });
        }
        if (path.size() == 3 && section.equals("reaction")) {
            ChemLibrary chem = ScenarioChemistry.apply(library, sc);
            Optional<ElectrodeReaction> r = chem.findReaction(path.get(1));
            if (r.isEmpty()) {
                return Optional.empty();
            }
            String material = sc.reactionOverrides().stream().filter(o -> o.name().equals(r.get().name()))
                    .map(ReactionOverride::material).filter(m -> m != null).findFirst().orElse(null);
            Kinetics k = r.get().kineticsOn(material);
            return Optional.ofNullable(switch (last) {
                case "e0" -> r.get().e0V();
                case "i0" -> k.i0APerM2();
                case "alpha_a" -> k.alphaA();
                case "alpha_c" -> k.alphaC();
                default -> null;
            });
        }
        return Optional.empty();
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /**
     * @param key the key as the user wrote it
     * @param path its segments
     * @param start its value in effect (SI)
     * @return the free parameter, on a log scale for positive scale-like values, linear for offsets, linear
     *     and held at zero from below for a contact resistance (or any value that starts at zero)
     */
    static FreeParameter parameter(String key, List<String> path, double start) {
        String last = path.get(path.size() - 1);
        ParameterScale scale;
        if (NON_NEGATIVE.contains(last)) {
            scale = ParameterScale.NON_NEGATIVE;
        } else if (LINEAR.contains(last)) {
            scale = ParameterScale.LINEAR;
        } else {
            scale = start > 0 ? ParameterScale.LOG : start == 0 ? ParameterScale.NON_NEGATIVE : ParameterScale.LINEAR;
        }
        double typical = start != 0 ? Math.abs(start)
                : last.equals("contact_resistance") ? TYPICAL_CONTACT_OHM
                : last.equals("e0") ? TYPICAL_POTENTIAL_V : 1.0;
        return new FreeParameter(key, start, scale, typical);
    }
}
