package org.cellwright.chem;

import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A reaction in the bulk electrolyte with a mass-action rate law:
 * {@code r = k * prod_j c_j^order_j} (mol/(m3 s)), concentrations in mol/m3.
 *
 * @param name short name, e.g. "Cl2 + Sn2+"
 * @param equation the reaction written out
 * @param participants signed stoichiometry (reactants negative, products positive)
 * @param rateConstant rate constant in (m3/mol)^(order-1)/s
 * @param orders reaction order per dissolved reactant
 * @param source where the rate constant comes from
 */
public record HomogeneousReaction(String name, String equation, List<Participant> participants,
                                  double rateConstant, Map<String, Double> orders, String source) {

    public HomogeneousReaction {
        Objects.requireNonNull(name, "name");
        if (!(rateConstant >= 0) || !Double.isFinite(rateConstant)) {
            throw new IllegalArgumentException(name + ": rate constant must be finite and >= 0");
        }
        participants = List.copyOf(participants);
        orders = Map.copyOf(orders);
    }
}
