package org.advecta.cli;

/**
 * Equally spaced samples from {@code from} to {@code to}, both included. Immutable.
 */
final class Grid {

    private final double from;
    private final double to;
    private final int points;

    /**
     * Creates a grid (already validated: from &lt; to, finite, points ≥ 2).
     *
     * @param from first sample
     * @param to last sample
     * @param points number of samples
     */
    Grid(double from, double to, int points) {
        this.from = from;
        this.to = to;
        this.points = points;
    }

    /**
     * Returns the first sample.
     *
     * @return from
     */
    double from() {
        return from;
    }

    /**
     * Returns the last sample.
     *
     * @return to
     */
    double to() {
        return to;
    }

    /**
     * Returns the number of samples.
     *
     * @return at least 2
     */
    int points() {
        return points;
    }

    /**
     * Returns the i-th sample, from + (to − from)·i/(n − 1); the last is exactly {@code to}.
     *
     * @param i index, 0 ≤ i &lt; points
     * @return the sample
     */
    double at(int i) {
        return i == points - 1 ? to : from + (to - from) * i / (points - 1);
    }

    /**
     * Returns every sample.
     *
     * @return a new array
     */
    double[] values() {
        final double[] v = new double[points];
        for (int i = 0; i < points; i++) {
            v[i] = at(i);
        }
        return v;
    }
}
