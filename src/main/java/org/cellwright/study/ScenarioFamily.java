package org.cellwright.study;

import java.util.List;

import org.cellwright.cell.Scenario;

/**
 * A scenario with some of its values left free: what a fit varies. The reading layer makes one from a
 * scenario file and the keys to free (see {@code io.ScenarioTemplate}); the window can make one from the
 * scenario it shows.
 */
public interface ScenarioFamily {

    /** @return the free parameters, with their starting values (those of the scenario as written) */
    List<FreeParameter> parameters();

    /**
     * @param values the free parameters' values (SI), in the order of {@link #parameters()}
     * @return the scenario with those values
     * @throws IllegalArgumentException when the scenario does not accept a value (the message says why)
     */
    Scenario at(double[] values);
}
