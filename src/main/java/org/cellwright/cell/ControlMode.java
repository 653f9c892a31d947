package org.cellwright.cell;

/** What the power supply holds when it is within its limits. */
public enum ControlMode {
    /** Holds the set current; falls back to holding the voltage limit when the cell needs more. */
    CURRENT,
    /** Holds the set voltage; falls back to holding the current limit when the cell would draw more. */
    VOLTAGE
}
