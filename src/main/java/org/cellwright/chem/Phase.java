package org.cellwright.chem;

/** The phase in which a participant of a reaction appears. */
public enum Phase {
    /** An ion or neutral molecule dissolved in the electrolyte; tracked as a bulk concentration. */
    DISSOLVED,
    /** A solid metal (deposit or anode metal); activity 1. */
    SOLID,
    /** A gas evolved at 1 atm; activity 1. */
    GAS,
    /** The solvent water; activity 1. */
    WATER
}
