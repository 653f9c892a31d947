package org.cellwright.study;

import java.util.List;

/**
 * One point of a sweep grid: one value of every axis.
 *
 * @param index the point's position in the grid, row-major (the first axis varies slowest), from 0
 * @param indices the value index on each axis
 * @param values the value on each axis
 */
public record GridPoint(int index, int[] indices, List<AxisValue> values) {

    public GridPoint {
        indices = indices.clone();
        values = List.copyOf(values);
    }

    @Override
    public int[] indices() {
        return indices.clone();
    }
}
