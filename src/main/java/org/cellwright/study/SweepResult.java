package org.cellwright.study;

import java.util.List;

/**
 * A finished (or cancelled) sweep: every grid point in grid order with its outcome.
 *
 * @param axes the varied keys (one or two)
 * @param points every point, in grid order (row-major, the first axis varies slowest)
 * @param cancelled true when the sweep was cancelled; points not run have status
 *     {@link SweepPoint.Status#NOT_RUN}
 * @param elapsedS wall-clock time the sweep took (s)
 * @param threads how many runs went in parallel
 */
public record SweepResult(List<SweepAxis> axes, List<SweepPoint> points, boolean cancelled, double elapsedS,
                          int threads) {

    public SweepResult {
        axes = List.copyOf(axes);
        points = List.copyOf(points);
    }

    /**
     * @param indices the value index on each axis
     * @return the point there
     */
    public SweepPoint at(int... indices) {
        if (indices.length != axes.size()) {
            throw new IllegalArgumentException("expected " + axes.size() + " indices, got " + indices.length);
        }
        int index = 0;
        for (int a = 0; a < axes.size(); a++) {
            if (indices[a] < 0 || indices[a] >= axes.get(a).size()) {
                throw new IndexOutOfBoundsException("index " + indices[a] + " on axis " + axes.get(a).key());
            }
            index = index * axes.get(a).size() + indices[a];
        }
        return points.get(index);
    }

    /** @return how many points ran */
    public long okCount() {
        return points.stream().filter(p -> p.status() == SweepPoint.Status.OK).count();
    }

    /** @return the points that were invalid or failed, in grid order */
    public List<SweepPoint> failures() {
        return points.stream().filter(p -> p.status() == SweepPoint.Status.INVALID
                || p.status() == SweepPoint.Status.FAILED).toList();
    }
}
