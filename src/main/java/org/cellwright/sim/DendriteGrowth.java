package org.cellwright.sim;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.Metal;
import org.cellwright.sim.deposit.ShortForecast;
import org.cellwright.sim.deposit.TipGrowth;
import org.cellwright.sim.deposit.TipSupply;

/**
 * The dendrite of the target metal as the engine integrates it: what feeds its tip at the present operating
 * point ({@link TipGrowth}), how fast it rises, where its tip stands against the gap, and when it would
 * reach the anode if nothing changed ({@link ShortForecast}).
 */
final class DendriteGrowth {

    private final int slot;
    private final int ion;
    private final Metal metal;
    private final double n;
    private final double alphaC;
    private final double tipRadiusM;
    private final double initialHeightM;
    private final double gapM;

    DendriteGrowth(Scenario sc, ReactionNetwork net) {
        this.slot = net.targetSlot;
        ReactionSlot s = slot >= 0 ? net.cathodeSlots.get(slot) : null;
        this.ion = s != null && s.oxIndex().length > 0 ? s.oxIndex()[0] : -1;
        this.metal = net.targetMetal();
        this.n = s != null ? s.n() : 1;
        this.alphaC = s != null ? s.substrateKinetics().alphaC() : 0;
        this.tipRadiusM = sc.deposit().tipRadiusM();
        this.initialHeightM = sc.deposit().initialProtrusionM();
        this.gapM = sc.cell().gapM();
    }

    /** @return true when a target metal deposits from a dissolved ion, so that a dendrite can grow */
    boolean active() {
        return slot >= 0 && ion >= 0 && metal != null;
    }

    /** @return the height of the first protrusion (m), the state's starting value */
    double initialHeightM() {
        return initialHeightM;
    }

    /** @return the anode-cathode gap (m) */
    double gapM() {
        return gapM;
    }

    /**
     * What feeds the tip at the operating point last solved in {@code op} (its cathode reactions must have
     * been evaluated at the cathode potential, as {@link OperatingPoint#solve} leaves them).
     */
    TipSupply supply(OperatingPoint op) {
        double d = op.net.species().get(ion).diffusionM2PerS() * op.diffusionFactor;
        double vm = metal.molarVolumeM3PerMol();
        return new TipSupply(n, vm, d, op.c[ion], d / op.km[ion], op.cathode.lastSurfaceRatioOx(slot),
                op.cathode.lastCathodicKinetic(slot), tipRadiusM,
                TipGrowth.curvatureFactor(alphaC, n, vm, tipRadiusM, op.tempK), initialHeightM);
    }

    /** @return dh/dt of the tip above the flat deposit (m/s) at the operating point last solved in {@code op} */
    double rate(OperatingPoint op) {
        if (!active() || op.shorted || !(op.currentA > 0)) {
            return 0;
        }
        return TipGrowth.heightRate(supply(op), op.dendriteM);
    }

    /** @return the tip's height above the cathode's starting surface (m): the flat deposit plus the dendrite */
    static double tipHeightM(OperatingPoint op) {
        return op.thicknessM + op.dendriteM;
    }

    /**
     * @return seconds until the tip would reach the anode at the operating point last solved in {@code op},
     *     conditions frozen; +infinity when it does not grow
     */
    double timeToShortS(OperatingPoint op) {
        if (!active() || op.shorted || !(op.currentA > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return ShortForecast.timeToShortS(supply(op), op.dendriteM, op.thicknessM, gapM);
    }
}
