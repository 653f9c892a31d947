package org.cellwright.sim;

/**
 * Where each quantity sits in the state vector of a run.
 *
 * <p>Order: the bulk concentration of every tracked species (mol/m3; the H+ slot holds the net acidity
 * [H+] - [OH-] when water's ion product ties them, and the OH- slot is then unused) in the catholyte (the
 * whole bath when the cell is undivided), the temperature (K), moles deposited per metal, moles of anode
 * dissolved, moles of H2, O2 and Cl2 given off, moles of water consumed, the gross proton turnover (mol, for
 * the water balance), charge (C), electrical energy (J), the time integral of the cell voltage (V s), the
 * natural logarithm of the dendrite tip's height above the flat deposit (ln m: the tip grows exponentially
 * inside the diffusion layer, which the logarithm turns into a straight line for the integrator), the
 * charge passed through a short (C), moles of each metal redissolved from the deposit (corrosion), the
 * charge passed by each electrode reaction (C, anodic positive): cathode reactions first, then anode
 * reactions; and last, in a two-compartment cell only, the anolyte's concentrations in the same order as the
 * catholyte's.
 */
final class StateLayout {

    final int species;
    final int temperature;
    final int deposit0;
    final int metals;
    final int anodeDissolved;
    final int gas0;
    final int water;
    final int protonTurnover;
    final int charge;
    final int energy;
    final int voltageTime;
    final int dendrite;
    final int shortCharge;
    final int corroded0;
    final int reactionCharge0;
    final int slots;
    /** First anolyte concentration; 0 (the catholyte's block) when the cell is undivided. */
    final int anolyte0;
    final boolean twoCompartments;
    final int size;

    /** Gas order in the state: hydrogen, oxygen, chlorine. */
    static final String[] GASES = {"H2", "O2", "Cl2"};

    StateLayout(int species, int metals, int slots) {
        this(species, metals, slots, false);
    }

    StateLayout(int species, int metals, int slots, boolean twoCompartments) {
        this.species = species;
        this.metals = metals;
        this.slots = slots;
        this.twoCompartments = twoCompartments;
        int i = species;
        temperature = i++;
        deposit0 = i;
        i += metals;
        anodeDissolved = i++;
        gas0 = i;
        i += GASES.length;
        water = i++;
        protonTurnover = i++;
        charge = i++;
        energy = i++;
        voltageTime = i++;
        dendrite = i++;
        shortCharge = i++;
        corroded0 = i;
        i += metals;
        reactionCharge0 = i;
        i += slots;
        if (twoCompartments) {
            anolyte0 = i;
            i += species;
        } else {
            anolyte0 = 0;
        }
        size = i;
    }

    /**
     * Which components feed back into the rates. The others are running totals that nothing depends on,
     * so a Jacobian need not perturb them.
     *
     * @param unusedSpecies index of a species slot the integrator ignores, or -1
     * @return a flag per component
     */
    boolean[] active(int unusedSpecies) {
        boolean[] a = new boolean[size];
        for (int j = 0; j < species; j++) {
            a[j] = j != unusedSpecies;
            if (twoCompartments) {
                a[anolyte0 + j] = j != unusedSpecies;
            }
        }
        a[temperature] = true;
        for (int m = 0; m < metals; m++) {
            a[deposit0 + m] = true;
        }
        a[dendrite] = true;
        return a;
    }
}
