package org.cellwright.study;

import org.cellwright.cell.Scenario;

/**
 * Makes the scenario of each sweep point: the base scenario with the point's values set into it. The command
 * line and the window read the base file once and set the values the way {@code --set} does, so any key
 * with any unit can be varied and is checked like a value written in the file. Must be safe to call from
 * several threads at once.
 */
@FunctionalInterface
public interface PointScenarios {

    /**
     * @param point the grid point
     * @return its scenario
     * @throws IllegalArgumentException when the point's values make the scenario invalid; the message says
     *     why in plain words (it goes into the sweep table)
     */
    Scenario scenarioAt(GridPoint point);
}
