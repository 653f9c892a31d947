package org.cellwright.cell;

/**
 * One point of a supply schedule: from time {@code atS} the supply holds {@code value} (A in current
 * control, V in voltage control). With {@code ramp}, the set value moves linearly from the previous point's
 * value to this one instead of stepping at {@code atS}.
 *
 * @param atS time from the start of the run (s), >= 0
 * @param value set current (A) or voltage (V), >= 0
 * @param ramp true to ramp linearly from the previous point
 */
public record SetPoint(double atS, double value, boolean ramp) {

    public SetPoint {
        Checks.nonNegative("supply.schedule.at", atS, "s");
        Checks.nonNegative("supply.schedule value", value, "A or V");
    }
}
