package org.cellwright.sim;

/**
 * Something that happened during a run, located in time by root finding, with a plain-words explanation.
 *
 * @param timeS when it happened (s from the start)
 * @param kind what kind of event it is
 * @param message what happened and why the curves bend there, in plain words
 */
public record RunEvent(double timeS, Kind kind, String message) {

    /** Kinds of run events. */
    public enum Kind {
        /** The supply reached its voltage limit and now holds it; the current falls. */
        VOLTAGE_LIMIT_ENTERED,
        /** The supply is back to its set current. */
        VOLTAGE_LIMIT_LEFT,
        /** The supply reached its current limit in voltage control. */
        CURRENT_LIMIT_ENTERED,
        /** The supply left its current limit. */
        CURRENT_LIMIT_LEFT,
        /** The target metal's deposition reached 90 % of its mass-transfer limit. */
        NEAR_LIMITING_CURRENT,
        /** The target metal's deposition fell back below 85 % of its limit, after reaching 90 % (a hysteresis band). */
        BELOW_LIMITING_CURRENT,
        /** A species reached its stop concentration. */
        SPECIES_TARGET,
        /** A deposit reached its stop mass. */
        DEPOSIT_TARGET,
        /** The bath reached its stop temperature. */
        TEMPERATURE_LIMIT,
        /** The cell voltage reached its stop value. */
        VOLTAGE_STOP,
        /** A dendrite bridged the gap. */
        SHORT_CIRCUIT,
        /** A schedule point changed the supply's set value. */
        SCHEDULE_STEP,
        /** The run reached its duration. */
        END
    }
}
