package org.cellwright.sim;

import java.util.List;

import org.cellwright.cell.ControlMode;
import org.cellwright.cell.PowerSupply;
import org.cellwright.cell.Scenario;
import org.cellwright.chem.Metal;
import org.cellwright.chem.Participant;
import org.cellwright.chem.Phase;
import org.cellwright.chem.PhysicalConstants;

/**
 * The algebraic part of the model: for a given state, the current the supply drives, the electrode
 * potentials, every partial current and the cell voltage.
 *
 * <p>Cell voltage {@code U = E_a - E_c + I (R_gap + R_contacts)} with
 * {@code R_gap = gap / (kappa (1 - eps)^1.5 A)} (Bruggeman 1935, applied to gas-evolving cells by Tobias,
 * J. Electrochem. Soc. 106 (1959) 833). The gas void fraction follows the gas made:
 * {@code eps = Qg / (Qg + u_rise * gap * w)}, with Qg the volume rate of gas (m3/s), u_rise the rise speed
 * of bubbles and w the electrode width (square electrodes). A bench supply in current control holds its
 * set current unless the cell would need more than its voltage limit; then the current solves
 * {@code U(I) = U_limit} (U rises monotonically with I). In voltage control the current solves
 * {@code U(I) = U_set}, capped by the current limit. In a two-compartment cell the cathode works in the
 * catholyte and the anode in the anolyte; the solution path is split evenly between them and the separator
 * adds its own resistance ({@link CompartmentExchange}). Once a dendrite has bridged the gap the cell is a
 * resistor: {@code U = I (R_short + R_contacts)}, no electrode reaction runs, and both electrodes stay at the
 * cathode's potential at the moment of the short.
 *
 * <p>Mutable workspace, one per running simulation.
 */
final class OperatingPoint {

    /** Bubble rise speed in the gap (m/s); physics reference: 1-10 cm/s (from memory, low confidence). */
    static final double BUBBLE_RISE_M_PER_S = 0.05;
    /** Deposit thickness over which the deposit covers the substrate (m); common practice: about 1 um. */
    static final double COVERAGE_THICKNESS_M = 1e-6;
    /** Ion product of water at 25 C ((mol/m3)^2); CRC Handbook, ionization constant of water, 1.008e-14 (mol/L)^2. */
    static final double WATER_ION_PRODUCT = 1.008e-8;

    /**
     * Temperatures handed to the physics are kept within these bounds (K): a trial stage of the integrator
     * may step outside, and the step is then rejected by its error control rather than by a failure here.
     */
    static final double PHYSICS_MIN_K = 253.15;
    static final double PHYSICS_MAX_K = 393.15;

    /**
     * The diffusion layer is not thinner than it is one second after switch-on (s): at t = 0 it would be
     * zero and mass transfer unlimited, a state no meter reads; from one second on the layer follows the
     * planar-diffusion growth exactly, so Sand's transition times of a second and more are reproduced.
     */
    static final double FIRST_LAYER_S = 1.0;

    final ReactionNetwork net;
    final StateLayout layout;
    final ElectrodeKinetics cathode;
    final ElectrodeKinetics anode;
    final BathProperties props;
    private final PowerSupply supply;
    final double cathodeAreaM2;
    final double anodeAreaM2;
    final double ohmicAreaM2;
    final double gapM;
    final double contactOhm;
    private final double steadyLayerM;
    private final double electrodeWidthM;
    private final double[] gasPerCharge;

    final CompartmentExchange compartments;
    private final double limitFloorMolPerM3;
    final double shortOhm;
    final double[] c;
    final double[] cA;
    /**
     * The concentrations as the state holds them (mol/m3), not clipped at zero: the integrator may leave a
     * depleted species a little below zero, within its absolute tolerance, and the homogeneous rates extend
     * through zero on these (see {@link CellRates}). H+ and OH- as recovered from the net acidity.
     */
    final double[] signedC;
    /** The anolyte's, as {@link #signedC} (the same array when the cell is undivided). */
    final double[] signedCA;
    /** Concentrations that set activities (mol/m3): as {@link #c}, with H+ free of bisulfate. */
    final double[] free;
    /** The anolyte's, as {@link #free} (the same array when the cell is undivided). */
    final double[] freeA;
    final double[] km;
    final double[] metalShare;
    final double[] cathodeI;
    final double[] anodeI;
    double tempK;
    double kappa;
    double currentA;
    double cellVoltageV;
    double cathodeE;
    double anodeE;
    double voidFraction;
    double rGap;
    double rGapNoGas;
    boolean limited;
    double coverage;
    double dendriteM;
    double thicknessM;
    double kappaA;
    double waldenFactor;
    double diffusionFactor;
    boolean shorted;
    private double shortAtS = Double.POSITIVE_INFINITY;
    private double shortPotentialV;

    OperatingPoint(Scenario sc, ReactionNetwork net, StateLayout layout) {
        this.net = net;
        this.layout = layout;
        this.supply = sc.supply();
        this.cathodeAreaM2 = sc.cathode().areaM2();
        this.anodeAreaM2 = sc.anode().areaM2();
        this.ohmicAreaM2 = Math.sqrt(cathodeAreaM2 * anodeAreaM2);
        this.gapM = sc.cell().gapM();
        this.contactOhm = sc.cell().contactResistanceOhm();
        this.steadyLayerM = sc.cell().agitation().diffusionLayerM();
        this.electrodeWidthM = Math.sqrt(ohmicAreaM2);
        this.props = new BathProperties(net.chem, net.species(), sc.electrolyte().conductivitySPerM(),
                sc.electrolyte().temperatureK());
        this.cathode = new ElectrodeKinetics(net.cathodeSlots, -0.2);
        this.anode = new ElectrodeKinetics(net.anodeSlots, 1.0);
        this.compartments = new CompartmentExchange(sc.cell().compartments(), net.species(),
                sc.electrolyte().volumeM3(), ohmicAreaM2);
        this.shortOhm = sc.deposit().shortResistanceOhm();
        this.limitFloorMolPerM3 = LIMIT_FLOOR_SHARE * Math.max(1e-3, sc.electrolyte().compositionMolPerM3().values()
                .stream().mapToDouble(Double::doubleValue).max().orElse(1.0));
        int n = net.species().size();
        c = new double[n];
        cA = compartments.twoCompartments() ? new double[n] : c;
        signedC = new double[n];
        signedCA = compartments.twoCompartments() ? new double[n] : signedC;
        free = new double[n];
        freeA = compartments.twoCompartments() ? new double[n] : free;
        km = new double[n];
        metalShare = new double[net.depositMetals().size()];
        cathodeI = new double[net.cathodeSlots.size()];
        anodeI = new double[net.anodeSlots.size()];
        gasPerCharge = new double[cathodeI.length + anodeI.length];
        for (int k = 0; k < gasPerCharge.length; k++) {
            ReactionSlot s = slot(k);
            for (Participant p : s.reaction().participants()) {
                if (p.phase() == Phase.GAS) {
                    gasPerCharge[k] = Math.abs(p.coefficient()) / (s.n() * PhysicalConstants.FARADAY);
                }
            }
        }
    }

    ReactionSlot slot(int k) {
        int nc = cathodeI.length;
        return k < nc ? net.cathodeSlots.get(k) : net.anodeSlots.get(k - nc);
    }

    /** Unpacks the state into concentrations, temperature and mass-transfer coefficients. */
    void unpack(double t, double[] y) {
        shorted = t >= shortAtS;
        unpackBlock(y, 0, c, signedC);
        if (compartments.twoCompartments()) {
            unpackBlock(y, layout.anolyte0, cA, signedCA);
        }
        tempK = Math.min(Math.max(y[layout.temperature], PHYSICS_MIN_K), PHYSICS_MAX_K);
        double tEff = Math.max(t, FIRST_LAYER_S);
        diffusionFactor = props.diffusionFactor(tempK);
        waldenFactor = diffusionFactor * PhysicalConstants.REFERENCE_TEMPERATURE_K / tempK;
        for (int j = 0; j < c.length; j++) {
            double d = net.species().get(j).diffusionM2PerS() * diffusionFactor;
            double delta = Math.min(steadyLayerM, 2 * Math.sqrt(d * tEff / Math.PI));
            km[j] = d / delta;
        }
        double moles = 0;
        List<Metal> metals = net.depositMetals();
        for (int m = 0; m < metals.size(); m++) {
            moles += Math.max(y[layout.deposit0 + m], 0);
        }
        double thickness = depositThicknessM(y);
        thicknessM = thickness;
        coverage = 1 - Math.exp(-thickness / COVERAGE_THICKNESS_M);
        for (int m = 0; m < metals.size(); m++) {
            metalShare[m] = moles > 0 ? coverage * Math.max(y[layout.deposit0 + m], 0) / moles : 0;
        }
        dendriteM = Math.exp(y[layout.dendrite]);
        kappa = props.conductivity(c, tempK);
        freeOf(c, free);
        if (compartments.twoCompartments()) {
            kappaA = props.conductivity(cA, tempK);
            freeOf(cA, freeA);
        } else {
            kappaA = kappa;
        }
        cathode.prepare(c, free, km, tempK, coverage, metalShare);
        anode.prepare(cA, freeA, km, tempK, 0, null);
    }

    /** @return the mean thickness of the deposit in state {@code y} (m): its volume over the cathode's area */
    private double depositThicknessM(double[] y) {
        double volume = 0;
        List<Metal> metals = net.depositMetals();
        for (int m = 0; m < metals.size(); m++) {
            volume += Math.max(y[layout.deposit0 + m], 0) * metals.get(m).molarVolumeM3PerMol();
        }
        return volume / cathodeAreaM2;
    }

    /**
     * @return the height of the dendrite tip above the cathode in state {@code y} (m), as
     *     {@link DendriteGrowth#tipHeightM} gives after {@link #unpack}, without the rest of the unpacking:
     *     the short-circuit event asks for it at every check within each step
     */
    double tipHeightM(double[] y) {
        return depositThicknessM(y) + Math.exp(y[layout.dendrite]);
    }

    /** The concentrations that set activities, after the speciation of the last conductivity call. */
    private void freeOf(double[] total, double[] out) {
        System.arraycopy(total, 0, out, 0, total.length);
        if (net.hIndex >= 0) {
            out[net.hIndex] = props.freeConcentration(net.hIndex, total[net.hIndex]);
        }
    }

    /** Concentrations of one compartment's block, with H+ and OH- recovered from the net acidity. */
    private void unpackBlock(double[] y, int offset, double[] out, double[] signed) {
        for (int j = 0; j < out.length; j++) {
            signed[j] = y[offset + j];
            out[j] = Math.max(y[offset + j], 0);
        }
        if (net.waterEquilibrium()) {
            double h = y[offset + net.hIndex];
            double hPlus = h >= 0 ? 0.5 * (h + Math.sqrt(h * h + 4 * WATER_ION_PRODUCT))
                    : 2 * WATER_ION_PRODUCT / (-h + Math.sqrt(h * h + 4 * WATER_ION_PRODUCT));
            out[net.hIndex] = hPlus;
            out[net.ohIndex] = WATER_ION_PRODUCT / hPlus;
            signed[net.hIndex] = hPlus;
            signed[net.ohIndex] = out[net.ohIndex];
        }
    }

    /**
     * From time {@code t} on the cell is shorted by a dendrite: it conducts as a resistor and no electrode
     * reaction runs. Both electrodes are left at the cathode's potential at that moment (the last one solved).
     * Earlier times (the output sampled within the step that ended at the short) still see the open cell.
     */
    void shortCircuit(double t) {
        shortPotentialV = cathodeE;
        shortAtS = t;
        shorted = true;
    }

    /**
     * The target ion's limiting current fades out of {@link #targetLimitRatio} below this share of the bath's
     * most concentrated species: a millionth, a hundred times the integrator's absolute tolerance on
     * concentrations, below which the share of two vanishing currents would follow round-off.
     */
    static final double LIMIT_FLOOR_SHARE = 1e-6;

    /**
     * How close the target metal's deposition runs to its limiting current at the operating point last solved:
     * its net deposition current over its limiting current, 0 where the metal does not deposit (while shorted,
     * without a target, or where the deposit redissolves). Not the cathodic branch alone: for a metal with a
     * high exchange current density (Ag, Pb, Sn) both branches are far larger than the net current near its
     * equilibrium potential. Faded out as {@code c / (c + c_floor)} when the ion is all but gone (c_floor a
     * millionth of the bath's most concentrated species), so that it stays a smooth function of the state
     * where the ion comes and goes at round-off level (events watching it would otherwise chatter).
     */
    double targetLimitRatio() {
        int k = net.targetSlot;
        if (k < 0 || shorted) {
            return 0;
        }
        ReactionSlot s = net.cathodeSlots.get(k);
        double fade = 1;
        if (s.oxIndex().length > 0) {
            double ion = c[s.oxIndex()[0]];
            fade = ion / (ion + limitFloorMolPerM3);
        }
        return Math.max(0, -cathodeI[k]) * cathode.invIlC[k] * fade;
    }

    /** End of the integration segment under way (s): at its end the set value is the left limit. */
    double segmentEndS = Double.POSITIVE_INFINITY;

    private double setValue(double t) {
        return t >= segmentEndS ? supply.setValueBefore(t) : supply.setValueAt(t);
    }

    /** Solves the operating point of the supply at time {@code t} for the unpacked state. */
    void solve(double t) {
        double set = setValue(t);
        limited = false;
        if (supply.mode() == ControlMode.CURRENT) {
            double u = cellAt(set);
            if (u > supply.voltageLimitV()) {
                limited = true;
                currentFor(supply.voltageLimitV(), set);
            }
        } else {
            double i = currentFor(set, Double.POSITIVE_INFINITY);
            if (i > supply.currentLimitA()) {
                limited = true;
                cellAt(supply.currentLimitA());
            }
        }
    }

    /** @return the cell voltage the set current needs, ignoring the supply's voltage limit (V) */
    double voltageNeededAt(double t) {
        return cellAt(setValue(t));
    }

    /** @return the current the set voltage would drive, ignoring the supply's current limit (A) */
    double currentNeededAt(double t) {
        return currentFor(setValue(t), Double.POSITIVE_INFINITY);
    }

    /**
     * Sets the workspace to the cell at current {@code amps} and returns its terminal voltage.
     *
     * @param amps current through the cell (A), >= 0
     * @return the cell voltage (V)
     */
    double cellAt(double amps) {
        currentA = amps;
        if (shorted) {
            java.util.Arrays.fill(cathodeI, 0);
            java.util.Arrays.fill(anodeI, 0);
            cathodeE = shortPotentialV;
            anodeE = shortPotentialV;
            voidFraction = 0;
            rGapNoGas = shortOhm;
            rGap = shortOhm;
            cellVoltageV = amps * (shortOhm + contactOhm);
            return cellVoltageV;
        }
        cathodeE = cathode.potentialFor(-amps / cathodeAreaM2);
        anodeE = anode.potentialFor(amps / anodeAreaM2);
        cathode.currents(cathodeE, cathodeI);
        anode.currents(anodeE, anodeI);
        double gasMolPerS = 0;
        int nc = cathodeI.length;
        for (int k = 0; k < gasPerCharge.length; k++) {
            if (gasPerCharge[k] > 0) {
                double amp = k < nc ? cathodeI[k] * cathodeAreaM2 : anodeI[k - nc] * anodeAreaM2;
                gasMolPerS += Math.abs(amp) * gasPerCharge[k];
            }
        }
        double gasM3PerS = gasMolPerS * BathProperties.gasMolarVolume(tempK);
        voidFraction = gasM3PerS / (gasM3PerS + BUBBLE_RISE_M_PER_S * gapM * electrodeWidthM);
        double solution;
        double separator = 0;
        if (compartments.twoCompartments()) {
            double path = gapM - compartments.separatorThicknessM();
            solution = 0.5 * path / (kappa * ohmicAreaM2) + 0.5 * path / (kappaA * ohmicAreaM2);
            separator = compartments.separatorOhm(kappa, kappaA, waldenFactor);
        } else {
            solution = gapM / (kappa * ohmicAreaM2);
        }
        rGapNoGas = solution + separator;
        rGap = solution / Math.pow(1 - voidFraction, 1.5) + separator;
        cellVoltageV = anodeE - cathodeE + amps * (rGap + contactOhm);
        return cellVoltageV;
    }

    /**
     * Finds the current at which the cell voltage equals {@code volts}, between 0 and {@code maxAmps}, and
     * leaves the workspace there.
     */
    private double currentFor(double volts, double maxAmps) {
        double lo = 0;
        double fLo = cellAt(0) - volts;
        if (fLo >= 0) {
            return 0;
        }
        double hi = maxAmps;
        double fHi;
        if (Double.isInfinite(hi)) {
            hi = Math.max(1e-3, volts / Math.max(rGapNoGas + contactOhm, 1e-9));
            fHi = cellAt(hi) - volts;
            while (fHi < 0) {
                lo = hi;
                fLo = fHi;
                hi *= 2;
                fHi = cellAt(hi) - volts;
            }
        } else {
            fHi = cellAt(hi) - volts;
            if (fHi <= 0) {
                return hi;
            }
        }
        double root = illinois(volts, lo, fLo, hi, fHi);
        cellAt(root);
        return root;
    }

    /**
     * Regula falsi with the Illinois modification (Dowell &amp; Jarratt, BIT 11 (1971) 168) on a bracket whose
     * end values are known: it never evaluates an end again, so a value near zero cannot change sign between
     * evaluations (the potentials behind U(I) are solved iteratively, to round-off).
     */
    private double illinois(double volts, double lo, double fLo, double hi, double fHi) {
        int side = 0;
        double x = lo;
        for (int it = 0; it < 200; it++) {
            x = (lo * fHi - hi * fLo) / (fHi - fLo);
            if (!(x > lo && x < hi)) {
                x = 0.5 * (lo + hi);
            }
            double fx = cellAt(x) - volts;
            if (fx == 0 || hi - lo <= 1e-12 * Math.max(1, hi)) {
                return x;
            }
            if (fx < 0) {
                lo = x;
                fLo = fx;
                if (side == -1) {
                    fHi *= 0.5;
                }
                side = -1;
            } else {
                hi = x;
                fHi = fx;
                if (side == 1) {
                    fLo *= 0.5;
                }
                side = 1;
            }
            if (Math.abs(fx) <= 1e-12 * Math.max(1, Math.abs(volts))) {
                return x;
            }
        }
        return x;
    }
}
