package org.cellwright.sim;

import org.cellwright.chem.ElectrodeReaction;
import org.cellwright.chem.Kinetics;

/**
 * One electrode reaction as it runs on one electrode, prepared for fast evaluation: the indices of its
 * dissolved participants in the state vector, their coefficients, its kinetics on the electrode's surface
 * and the directions in which it may run.
 *
 * @param reaction the library reaction
 * @param electrode which electrode it runs on
 * @param oxIndex state indices of the dissolved participants on the oxidised side
 * @param oxNu their stoichiometric magnitudes (positive)
 * @param redIndex state indices of the dissolved participants on the reduced side
 * @param redNu their stoichiometric magnitudes (positive)
 * @param substrateKinetics kinetics on the bare electrode material
 * @param depositKinetics kinetics on the cathode deposit's metal (null when the same as the substrate)
 * @param anodicAllowed whether the oxidation may run (false when a reduced-side gas or solid is absent)
 * @param cathodicAllowed whether the reduction may run (false when an oxidised-side gas is absent)
 * @param depositMetalIndex index of the deposited metal (cathode slots making a solid), or -1
 * @param dissolvesAnode true when the oxidation dissolves the soluble anode metal
 */
record ReactionSlot(ElectrodeReaction reaction, Electrodes electrode, int[] oxIndex, double[] oxNu,
                    int[] redIndex, double[] redNu, Kinetics substrateKinetics, Kinetics depositKinetics,
                    boolean anodicAllowed, boolean cathodicAllowed, int depositMetalIndex,
                    boolean dissolvesAnode) {

    /** @return electrons transferred */
    int n() {
        return reaction.n();
    }

    /** @return the column label of the partial current, e.g. "cathode:Sn2+/Sn" */
    String label() {
        return electrode.key() + ":" + reaction.name();
    }
}
