package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.advecta.halfspace.Wall;
import org.advecta.transport.TransportParameters;

/** Shared set-up of the wall grid tests: parameters in widths, data, and the comparison. */
final class WallGridSupport {

    /** The outcome of one comparison of the grid path with the per-point path. */
    static final class Outcome {
        /** The bound valuesOnGrid returned. */
        final double bound;
        /** max |grid − direct| over the outputs. */
        final double worst;
        /** max |direct| over the outputs. */
        final double largest;
        /** The grid values. */
        final double[] grid;

        Outcome(double bound, double worst, double largest, double[] grid) {
            this.bound = bound;
            this.worst = worst;
            this.largest = largest;
            this.grid = grid;
        }
    }

    private WallGridSupport() {
    }

    /**
     * Parameters with kernel width L = lOverDx·dx and drift vt/R = pe·L at the time t.
     *
     * @return v, D, R, μ
     */
    static TransportParameters params(double pe, double lOverDx, double dx, double t, double r,
                                      double mu) {
        final double l = lOverDx * dx;
        final double d = l * l * r / (4 * t);
        final double v = pe * l * r / t;
        return TransportParameters.of(v, d).withRetardation(r).withDecay(mu);
    }

    static double[] data(Random rnd, int n, boolean nonNegative) {
        final double[] v = new double[n];
        for (int j = 0; j < n; j++) {
            v[j] = nonNegative ? rnd.nextDouble() : rnd.nextDouble() * 2 - 0.7;
        }
        return v;
    }

    /**
     * Runs valuesOnGrid and values on the same points and checks, for every output, that the
     * two agree within the returned bound plus the per-point path's own error (which obeys
     * the same per-segment contract the bound's wall part sums, so it is below the bound too;
     * hence the tolerance 2·bound), that every value is finite, and that an absorbing wall
     * gives exactly 0 at x = 0.
     */
    static Outcome compare(TransportParameters p, Wall wall, PiecewiseLinearProfile prof,
                           double x0, double t, int nOut, GridMethod method) {
        final ProfileConvolution pc = ProfileConvolution.of(HalfLineKernel.of(p, wall), prof);
        final double[] grid = new double[nOut];
        final double bound = pc.valuesOnGrid(x0, t, grid, method);
        assertTrue(bound >= 0 && bound < Double.POSITIVE_INFINITY, "bound " + bound);
        final double[] x = new double[nOut];
        for (int i = 0; i < nOut; i++) {
            x[i] = Math.fma(i, prof.spacing(), x0);
        }
        final double[] direct = new double[nOut];
        pc.values(x, t, direct);
        double worst = 0;
        double largest = 0;
        for (int i = 0; i < nOut; i++) {
            final int at = i;
            assertTrue(Double.isFinite(grid[i]), () -> "not finite at i=" + at + " " + p + " " + wall);
            final double err = Math.abs(grid[i] - direct[i]);
            worst = Math.max(worst, err);
            largest = Math.max(largest, Math.abs(direct[i]));
            assertTrue(err <= 2 * bound, () -> "i=" + at + " x=" + x[at] + " grid=" + grid[at]
                + " direct=" + direct[at] + " bound=" + bound + " " + p + " " + wall + " t=" + t
                + " " + prof.extension() + " " + method);
            if (wall == Wall.ABSORBING && x[i] == 0 && t > 0) {
                assertTrue(grid[i] == 0.0, () -> "absorbing wall: c(0) = " + grid[at]);
            }
        }
        return new Outcome(bound, worst, largest, grid);
    }
}
