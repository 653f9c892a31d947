package org.cellwright.sim;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.PhysicalConstants;
import org.cellwright.sim.deposit.Morphology;

/**
 * The rates of change of the cell's state: the model, separate from any integrator.
 *
 * <p>Each partial current {@code I_k} (A, anodic positive) advances its reaction by
 * {@code xi = -I_k / (n F)} mol/s in the reduction direction; a participant with signed coefficient
 * {@code nu} is made at {@code nu * xi} (Faraday's law). Dissolved species change by that over the volume;
 * metals deposit, anodes dissolve, gases leave, water is consumed. Homogeneous reactions follow mass action.
 * H+ and OH- are tied by water's ion product (their neutralisation is taken as instantaneous). Dissolved
 * chlorine (made at the anode until the bath is saturated) oxidises reductants or slowly degasses.
 * Heat: Joule heat in the gap plus the heat of every overpotential, less a loss to ambient through a lumped
 * conductance. In a two-compartment cell the cathode's reactions change the catholyte, the anode's the
 * anolyte, bulk reactions run in each, and species cross between them ({@link CompartmentExchange}). The
 * dendrite tip of the target metal rises by {@link DendriteGrowth}; once it has shorted the cell, the current
 * passes through the short and no electrode reaction runs.
 */
public final class CellRates implements FirstOrderDifferentialEquations {

    /**
     * First-order loss of dissolved chlorine to the air (1/s): model assumption (gas sparging by the
     * electrode gases and the free surface), documented in docs/model.md.
     */
    static final double CHLORINE_DEGASSING_PER_S = 1e-3;
    /** Volumetric heat capacity of the bath (J/(m3 K)): water, 4.18 J/(g K) x 1.0 g/cm3 (CRC Handbook). */
    static final double HEAT_CAPACITY_J_PER_M3K = 4.18e6;
    /** Heat-transfer coefficient from tank walls and surface (W/(m2 K)); common practice for still air. */
    static final double WALL_HEAT_TRANSFER_W_PER_M2K = 10.0;

    private final ReactionNetwork net;
    private final StateLayout layout;
    private final OperatingPoint op;
    private final double volumeM3;
    private final double ambientK;
    private final double heatLossWPerK;
    private final double[] initial;
    private final double[][] slotNu;
    private final int[][] slotSpecies;
    private final double[] slotWater;
    private final int[] slotGas;
    private final double[] slotGasNu;
    private final double[] rate;
    private final double[] rateA;
    private final double[] flux;
    private final DendriteGrowth dendrite;
    private final double catholyteM3;
    private final double anolyteM3;
    private final boolean additives;

    /**
     * @param sc the scenario
     * @param net its reaction network
     */
    public CellRates(Scenario sc, ReactionNetwork net) {
        this.net = net;
        int slots = net.cathodeSlots.size() + net.anodeSlots.size();
        this.layout = new StateLayout(net.species().size(), net.depositMetals().size(), slots,
                sc.cell().compartments().twoCompartments());
        this.op = new OperatingPoint(sc, net, layout);
        this.volumeM3 = sc.electrolyte().volumeM3();
        this.catholyteM3 = op.compartments.catholyteM3();
        this.anolyteM3 = op.compartments.anolyteM3();
        this.dendrite = new DendriteGrowth(sc, net);
        this.additives = sc.deposit().additives();
        this.ambientK = sc.cell().ambientK();
        this.heatLossWPerK = sc.cell().heatLossWPerK() != null ? sc.cell().heatLossWPerK()
                : defaultHeatLoss(volumeM3);
        this.rate = new double[net.species().size()];
        this.rateA = layout.twoCompartments ? new double[rate.length] : rate;
        this.flux = new double[rate.length];
        slotNu = new double[slots][];
        slotSpecies = new int[slots][];
        slotWater = new double[slots];
        slotGas = new int[slots];
        slotGasNu = new double[slots];
        for (int k = 0; k < slots; k++) {
            prepareSlot(k, op.slot(k));
        }
        initial = new double[layout.size];
        fillBlock(sc.electrolyte().compositionMolPerM3(), 0);
        if (layout.twoCompartments) {
            var anolyte = sc.cell().compartments().anolyteCompositionMolPerM3();
            fillBlock(anolyte != null ? anolyte : sc.electrolyte().compositionMolPerM3(), layout.anolyte0);
        }
        initial[layout.temperature] = sc.electrolyte().temperatureK();
        initial[layout.dendrite] = Math.log(dendrite.initialHeightM());
    }

    /** Puts a composition into the concentration block at {@code offset}, H+ as the net acidity. */
    private void fillBlock(java.util.Map<String, Double> composition, int offset) {
        for (var e : composition.entrySet()) {
            int j = net.indexOf(net.species().stream().map(s -> s.name())
                    .filter(n -> org.cellwright.chem.SpeciesName.candidates(e.getKey()).contains(n))
                    .findFirst().orElse(e.getKey()));
            if (j >= 0) {
                initial[offset + j] = e.getValue();
            }
        }
        if (net.waterEquilibrium()) {
            initial[offset + net.hIndex] = initial[offset + net.hIndex] - initial[offset + net.ohIndex];
        }
    }

    /**
     * Lumped heat-loss conductance of an open cubic tank of the given volume: five faces at
     * {@link #WALL_HEAT_TRANSFER_W_PER_M2K}.
     *
     * @param volumeM3 bath volume (m3)
     * @return conductance (W/K)
     */
    static double defaultHeatLoss(double volumeM3) {
        double side = Math.cbrt(volumeM3);
        return 5 * side * side * WALL_HEAT_TRANSFER_W_PER_M2K;
    }

    private void prepareSlot(int k, ReactionSlot s) {
        var dissolved = s.reaction().participants().stream().filter(p -> p.phase() == Phase.DISSOLVED).toList();
        slotNu[k] = new double[dissolved.size()];
        slotSpecies[k] = new int[dissolved.size()];
        for (int i = 0; i < dissolved.size(); i++) {
            slotNu[k][i] = dissolved.get(i).coefficient();
            slotSpecies[k][i] = net.indexOf(dissolved.get(i).name());
        }
        slotGas[k] = -1;
        for (Participant p : s.reaction().participants()) {
            if (p.phase() == Phase.WATER) {
                slotWater[k] += p.coefficient();
            } else if (p.phase() == Phase.GAS) {
                for (int g = 0; g < StateLayout.GASES.length; g++) {
                    if (StateLayout.GASES[g].equals(p.name())) {
                        slotGas[k] = g;
                        slotGasNu[k] = p.coefficient();
                    }
                }
            }
        }
    }

    /** @return the index of a species slot the rates ignore (OH- when tied to H+ by water), or -1 */
    int unusedSpecies() {
        return net.waterEquilibrium() ? net.ohIndex : -1;
    }

    /** @return the components that must stay non-negative: concentrations (not the net acidity) and deposits */
    int[] nonNegativeComponents() {
        java.util.List<Integer> idx = new java.util.ArrayList<>();
        for (int j = 0; j < layout.species; j++) {
            if (!(net.waterEquilibrium() && j == net.hIndex)) {
                idx.add(j);
                if (layout.twoCompartments) {
                    idx.add(layout.anolyte0 + j);
                }
            }
        }
        for (int m = 0; m < layout.metals; m++) {
            idx.add(layout.deposit0 + m);
        }
        return idx.stream().mapToInt(Integer::intValue).toArray();
    }

    /** @return the state layout */
    StateLayout layout() {
        return layout;
    }

    /** @return the operating-point workspace */
    OperatingPoint operatingPoint() {
        return op;
    }

    /** @return the state at the start of the run */
    public double[] initialState() {
        return initial.clone();
    }

    @Override
    public int getDimension() {
        return layout.size;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        op.unpack(t, y);
        op.solve(t);
        fillRates(yDot);
    }

    private void fillRates(double[] yDot) {
        java.util.Arrays.fill(yDot, 0);
        java.util.Arrays.fill(rate, 0);
        if (rateA != rate) {
            java.util.Arrays.fill(rateA, 0);
        }
        int nc = op.cathodeI.length;
        int slots = nc + op.anodeI.length;
        double heat = op.currentA * op.currentA * op.rGap;
        for (int k = 0; k < slots; k++) {
            ReactionSlot s = op.slot(k);
            double amps = k < nc ? op.cathodeI[k] * op.cathodeAreaM2 : op.anodeI[k - nc] * op.anodeAreaM2;
            double e = k < nc ? op.cathodeE : op.anodeE;
            double eq = k < nc ? op.cathode.eEq[k] : op.anode.eEq[k - nc];
            heat += Math.abs(amps * (e - eq));
            yDot[layout.reactionCharge0 + k] = amps;
            double xi = -amps / (s.n() * PhysicalConstants.FARADAY);
            double[] into = k < nc ? rate : rateA;
            double volume = k < nc ? catholyteM3 : anolyteM3;
            for (int i = 0; i < slotNu[k].length; i++) {
                into[slotSpecies[k][i]] += slotNu[k][i] * xi / volume;
            }
            if (s.depositMetalIndex() >= 0 && k < nc) {
                yDot[layout.deposit0 + s.depositMetalIndex()] += xi;
            }
            if (s.dissolvesAnode()) {
                yDot[layout.anodeDissolved] -= xi;
            }
            yDot[layout.water] -= slotWater[k] * xi;
            if (slotGas[k] >= 0) {
                yDot[layout.gas0 + slotGas[k]] += slotGasNu[k] * xi;
            }
        }
        for (int m = 0; m < layout.metals; m++) {
            yDot[layout.corroded0 + m] = Math.max(0, -yDot[layout.deposit0 + m]);
        }
        bulk(op.c, op.signedC, rate, catholyteM3, yDot);
        if (layout.twoCompartments) {
            bulk(op.cA, op.signedCA, rateA, anolyteM3, yDot);
            // once shorted, the current passes through the dendrite, not through the solution
            op.compartments.fluxes(op.c, op.cA, op.shorted ? 0 : op.currentA, op.diffusionFactor, flux);
            for (int j = 0; j < flux.length; j++) {
                rate[j] += flux[j] / catholyteM3;
                rateA[j] -= flux[j] / anolyteM3;
            }
        }
        copyBlock(rate, 0, catholyteM3, yDot);
        if (layout.twoCompartments) {
            copyBlock(rateA, layout.anolyte0, anolyteM3, yDot);
        }
        double loss = heatLossWPerK * (op.tempK - ambientK);
        yDot[layout.temperature] = (heat - loss) / (HEAT_CAPACITY_J_PER_M3K * volumeM3);
        yDot[layout.charge] = op.currentA;
        yDot[layout.energy] = op.currentA * op.cellVoltageV;
        yDot[layout.voltageTime] = op.cellVoltageV;
        yDot[layout.dendrite] = dendrite.rate(op) / op.dendriteM;
        yDot[layout.shortCharge] = op.shorted ? op.currentA : 0;
    }

    /**
     * Degassing of dissolved chlorine and the homogeneous reactions of one compartment.
     *
     * @param c      the compartment's concentrations clipped at zero (mol/m3)
     * @param signed the same as the state holds them, possibly a little below zero (mol/m3)
     */
    private void bulk(double[] c, double[] signed, double[] into, double volume, double[] yDot) {
        if (net.dissolvedChlorineIndex >= 0) {
            int j = net.dissolvedChlorineIndex;
            double degas = CHLORINE_DEGASSING_PER_S * c[j];
            into[j] -= degas;
            yDot[layout.gas0 + 2] += degas * volume;
        }
        for (ReactionNetwork.PreparedHomogeneous h : net.homogeneous) {
            double r = massAction(h.reaction().rateConstant(), h.index(), h.nu(), h.order(), signed);
            for (int i = 0; i < h.index().length; i++) {
                into[h.index()[i]] += h.nu()[i] * r;
            }
        }
    }

    /**
     * Mass-action rate {@code k prod c_j^order_j} (mol/(m3 s)), extended continuously below zero. The integrator
     * may leave a depleted reactant a little below zero (within its absolute tolerance; states are never
     * clipped, so that conservation stays exact). Were the reactant clipped at zero here, the rate would be
     * flat in it there: the Jacobian would lose the reaction's restoring mode (about -k c_other, 1e5 1/s and
     * more for dissolved chlorine against Sn2+), the step would become explicit in that component and the
     * steps collapse to a hundredth of a second. So a first-order reactant x below zero enters with its sign
     * (the linear continuation of the rate, whose slope is continuous through zero): the reaction runs
     * backwards and brings x back to zero, as a linear sink would. The backward run takes its products as
     * reactants, so it is weighted by {@code p / (p + |x|)} for each product p: close to 1 while the products
     * are plentiful (slope still continuous at x = 0), and vanishing with a product, which it can therefore
     * never drive below zero. A reactant of another order below zero, or two reactants below zero at once,
     * give no rate (the slope of c^p at zero is zero for p &gt; 1).
     *
     * @param k     rate constant (SI)
     * @param index state index of each participant
     * @param nu    signed coefficient of each (products positive)
     * @param order order of each (0 for products)
     * @param c     concentrations as the state holds them (mol/m3)
     * @return the rate (mol/(m3 s)), negative when a first-order reactant is below zero
     */
    static double massAction(double k, int[] index, double[] nu, double[] order, double[] c) {
        double r = k;
        double deficit = 0;
        for (int i = 0; i < index.length; i++) {
            double p = order[i];
            if (p <= 0) {
                continue;
            }
            double x = c[index[i]];
            if (x >= 0) {
                r *= p == 1 ? x : Math.pow(x, p);
            } else if (p == 1 && deficit == 0) {
                deficit = -x;
                r *= x;
            } else {
                return 0;
            }
        }
        if (deficit > 0) {
            for (int i = 0; i < index.length; i++) {
                if (nu[i] > 0 && order[i] <= 0) {
                    double product = Math.max(c[index[i]], 0);
                    r *= product / (product + deficit);
                }
            }
        }
        return r;
    }

    /** Rates of one compartment into the state, with the net acidity and the proton turnover. */
    private void copyBlock(double[] r, int offset, double volume, double[] yDot) {
        for (int j = 0; j < r.length; j++) {
            yDot[offset + j] = r[j];
        }
        if (net.waterEquilibrium()) {
            yDot[offset + net.hIndex] = r[net.hIndex] - r[net.ohIndex];
            yDot[offset + net.ohIndex] = 0;
            yDot[layout.protonTurnover] += (r[net.hIndex] + r[net.ohIndex]) * volume;
        }
    }

    /** @return the dendrite model of this run */
    DendriteGrowth dendrite() {
        return dendrite;
    }

    /**
     * Everything the cell does at time {@code t} in state {@code y}.
     *
     * @param t time (s)
     * @param y state
     * @return the instant's operating point
     */
    public InstantState snapshot(double t, double[] y) {
        op.unpack(t, y);
        op.solve(t);
        int nc = op.cathodeI.length;
        double[] cath = new double[nc];
        double[] an = new double[op.anodeI.length];
        for (int k = 0; k < nc; k++) {
            cath[k] = op.cathodeI[k] * op.cathodeAreaM2;
        }
        for (int k = 0; k < an.length; k++) {
            an[k] = op.anodeI[k] * op.anodeAreaM2;
        }
        double eqC = chargeWeighted(cath, -1, shown(op.cathode, nc), op.cathodeE);
        double eqA = chargeWeighted(an, 1, shown(op.anode, an.length), op.anodeE);
        double eff = 0;
        double limitRatio = 0;
        if (net.targetSlot >= 0 && op.currentA > 0) {
            eff = Math.max(0, -cath[net.targetSlot] / op.currentA);
            limitRatio = op.targetLimitRatio();
        }
        double amps = op.currentA;
        String form = null;
        if (net.targetSlot >= 0 && cath[net.targetSlot] < 0) {
            form = Morphology.classify(limitRatio, net.targetMetal().depositClass(), additives).key();
        }
        return new InstantState(t, amps, op.cellVoltageV, op.cathodeE, op.anodeE, eqA - eqC, op.anodeE - eqA,
                op.cathodeE - eqC, amps * op.rGapNoGas, amps * (op.rGap - op.rGapNoGas), amps * op.contactOhm,
                cath, an, op.c.clone(), op.tempK, op.kappa, op.voidFraction, eff, limitRatio, op.limited,
                DendriteGrowth.tipHeightM(op), layout.twoCompartments ? op.cA.clone() : null, form, op.shorted,
                op.thicknessM);
    }

    /** The equilibrium potentials of an electrode's reactions as the voltage breakdown shows them (V vs SHE). */
    private static double[] shown(ElectrodeKinetics kin, int count) {
        double[] e = new double[count];
        for (int k = 0; k < count; k++) {
            e[k] = kin.shownEquilibrium(k);
        }
        return e;
    }

    /**
     * Equilibrium potential of an electrode that runs several reactions at once: the mean of the reactions'
     * equilibrium potentials weighted by their currents in the electrode's direction. Then
     * {@code E = sum w_k Eeq_k + sum w_k (E - Eeq_k)} splits the potential exactly, and the split moves
     * smoothly when one reaction takes over from another (a dominant-reaction split jumps there).
     *
     * @param amps   partial currents (A), anodic positive
     * @param sign   +1 for the anode, -1 for the cathode
     * @param eEq    equilibrium potentials (V vs SHE)
     * @param idle   what to return when nothing runs in the electrode's direction (the electrode potential)
     * @return weighted equilibrium potential (V vs SHE)
     */
    private static double chargeWeighted(double[] amps, int sign, double[] eEq, double idle) {
        double sum = 0;
        double weighted = 0;
        for (int k = 0; k < amps.length; k++) {
            double a = sign * amps[k];
            if (a > 0) {
                sum += a;
                weighted += a * eEq[k];
            }
        }
        return sum > 0 ? weighted / sum : idle;
    }
}
