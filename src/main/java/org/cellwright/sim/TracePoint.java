package org.cellwright.sim;

/**
 * One row of a run's time series.
 *
 * @param state the instant's operating point
 * @param depositKg deposit mass of each depositable metal so far (kg), in network order
 * @param chargeC charge passed so far (C)
 * @param energyJ electrical energy so far (J)
 * @param cumulativeEfficiency share of the charge so far that deposited the target metal
 */
public record TracePoint(InstantState state, double[] depositKg, double chargeC, double energyJ,
                         double cumulativeEfficiency) {

    /** @return the time (s) */
    public double timeS() {
        return state.timeS();
    }

    /** @return the total deposit (kg) */
    public double depositTotalKg() {
        double sum = 0;
        for (double d : depositKg) {
            sum += d;
        }
        return sum;
    }
}
