package org.cellwright.cell;

import java.util.List;
import java.util.Objects;

/**
 * A bench power supply with both a current and a voltage limit.
 *
 * <p>In {@link ControlMode#CURRENT} it holds the set current (or the schedule's) until the cell would need
 * more than {@code voltageLimitV}, then holds that voltage. In {@link ControlMode#VOLTAGE} it holds the set
 * voltage until the cell would draw more than {@code currentLimitA}, then holds that current.
 *
 * @param mode what the supply holds
 * @param currentA set current (A), used in current control
 * @param voltageV set voltage (V), used in voltage control
 * @param voltageLimitV voltage limit (V), infinite when none
 * @param currentLimitA current limit (A), infinite when none
 * @param schedule set points over time in the mode's unit; empty for a constant set value
 */
public record PowerSupply(ControlMode mode, double currentA, double voltageV, double voltageLimitV,
                          double currentLimitA, List<SetPoint> schedule) {

    public PowerSupply {
        Objects.requireNonNull(mode, "mode");
        schedule = List.copyOf(schedule);
        if (mode == ControlMode.CURRENT && schedule.isEmpty()) {
            Checks.positive("supply.current", currentA, "A");
        }
        if (mode == ControlMode.VOLTAGE && schedule.isEmpty()) {
            Checks.positive("supply.voltage", voltageV, "V");
        }
        if (!(voltageLimitV > 0)) {
            throw new IllegalArgumentException("supply.voltage_limit must be > 0 V, got " + voltageLimitV);
        }
        if (!(currentLimitA > 0)) {
            throw new IllegalArgumentException("supply.current_limit must be > 0 A, got " + currentLimitA);
        }
        for (int i = 1; i < schedule.size(); i++) {
            if (schedule.get(i).atS() < schedule.get(i - 1).atS()) {
                throw new IllegalArgumentException("supply.schedule times must not decrease (point " + (i + 1) + ")");
            }
        }
    }

    /** @return a constant-current supply with no voltage limit */
    public static PowerSupply constantCurrent(double amps) {
        return new PowerSupply(ControlMode.CURRENT, amps, 0, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
                List.of());
    }

    /** @return a constant-voltage supply with no current limit */
    public static PowerSupply constantVoltage(double volts) {
        return new PowerSupply(ControlMode.VOLTAGE, 0, volts, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
                List.of());
    }

    /**
     * The set value (A or V by mode) at time {@code tS}, following the schedule's steps and ramps.
     *
     * @param tS time from the start (s)
     * @return the set current (A) or set voltage (V)
     */
    public double setValueAt(double tS) {
        return setValue(tS, false);
    }

    /**
     * The set value just before time {@code tS}: equal to {@link #setValueAt} except at a step, where it is the
     * value before the step (the left limit, for the end of an integration segment).
     *
     * @param tS time from the start (s)
     * @return the set current (A) or set voltage (V)
     */
    public double setValueBefore(double tS) {
        return setValue(tS, true);
    }

    private double setValue(double tS, boolean leftLimit) {
        if (schedule.isEmpty()) {
            return mode == ControlMode.CURRENT ? currentA : voltageV;
        }
        double value = schedule.get(0).value();
        for (int i = 0; i < schedule.size(); i++) {
            SetPoint p = schedule.get(i);
            boolean reached = leftLimit ? tS > p.atS() : tS >= p.atS();
            if (p.ramp() && i > 0) {
                SetPoint prev = schedule.get(i - 1);
                if (tS >= p.atS()) {
                    value = p.value();
                } else if (tS > prev.atS()) {
                    double f = (tS - prev.atS()) / (p.atS() - prev.atS());
                    return prev.value() + f * (p.value() - prev.value());
                } else {
                    break;
                }
            } else if (reached || (i == 0 && tS >= p.atS())) {
                value = p.value();
            } else {
                break;
            }
        }
        return value;
    }

    /** @return a copy holding another constant current (A), schedule dropped */
    public PowerSupply withCurrent(double amps) {
        return new PowerSupply(ControlMode.CURRENT, amps, voltageV, voltageLimitV, currentLimitA, List.of());
    }

    /** @return a copy holding another constant voltage (V), schedule dropped */
    public PowerSupply withVoltage(double volts) {
        return new PowerSupply(ControlMode.VOLTAGE, currentA, volts, voltageLimitV, currentLimitA, List.of());
    }

    /** @return a copy with another schedule */
    public PowerSupply withSchedule(List<SetPoint> points) {
        return new PowerSupply(mode, currentA, voltageV, voltageLimitV, currentLimitA, points);
    }
}
