package org.advecta.halfspace;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.advecta.internal.GaussLegendre;

/**
 * ∫ f(ξ) dξ over [a, b] for the ξ-dependence of the half-line kernel at fixed (x, t): a sum
 * of Gaussians and erfc's of width L centred at x − vt/R and −x − vt/R. The interval is cut
 * at those centres ± multiples of L/2 and, geometrically, near both ends (where a far tail
 * concentrates its mass), and each piece is integrated by the 10-point Gauss–Legendre rule,
 * halved adaptively until two levels agree to 1e-16 of the whole |f| integral or to the
 * rounding level of the piece.
 */
final class KernelQuadrature {

    private static final int MAX_DEPTH = 16;
    /** Accept a piece when two levels agree to this fraction of the whole |f| integral. */
    private static final double GLOBAL_TOLERANCE = 1e-16;
    /** ... or to this fraction of the piece itself (the rounding level of its values). */
    private static final double LOCAL_TOLERANCE = 4e-16;
    private static final int CENTRE_STEPS = 24;
    private static final int END_STEPS = 40;

    private KernelQuadrature() {
    }

    static double integrate(DoubleUnaryOperator f, double a, double b, double centre1,
                            double centre2, double len) {
        final double[] cuts = new double[4 * CENTRE_STEPS + 2 * END_STEPS + 6];
        int n = 0;
        cuts[n++] = a;
        cuts[n++] = b;
        for (int k = -CENTRE_STEPS; k <= CENTRE_STEPS; k++) {
            cuts[n++] = centre1 + 0.5 * k * len;
            cuts[n++] = centre2 + 0.5 * k * len;
        }
        final double w = b - a;
        // near each end, the tail of a Gaussian centred at distance d decays on L²/(2d)
        final double da = Math.max(Math.min(Math.abs(a - centre1), Math.abs(a - centre2)), len);
        final double db = Math.max(Math.min(Math.abs(b - centre1), Math.abs(b - centre2)), len);
        double sa = 0.25 * len * len / da;
        double sb = 0.25 * len * len / db;
        for (int j = 0; j < END_STEPS && (sa < w || sb < w); j++) {
            cuts[n++] = a + sa;
            cuts[n++] = b - sb;
            sa *= 2;
            sb *= 2;
        }
        final double[] sorted = Arrays.copyOf(cuts, n);
        Arrays.sort(sorted);
        // a first pass estimates the whole |f| integral, the scale of the tolerance
        double scale = 0;
        double prev = a;
        for (double c : sorted) {
            if (c <= prev || c > b) {
                continue;
            }
            scale += GaussLegendre.integrate(s -> Math.abs(f.applyAsDouble(s)),
                0.5 * prev + 0.5 * c, 0.5 * c - 0.5 * prev);
            prev = c;
        }
        final double tolerance = GLOBAL_TOLERANCE * scale;
        double sum = 0;
        double comp = 0;
        prev = a;
        for (double c : sorted) {
            if (c <= prev || c > b) {
                continue;
            }
            final double piece = adaptive(f, prev, c, 0, tolerance);
            // Neumaier summation
            final double s = sum + piece;
            comp += Math.abs(sum) >= Math.abs(piece) ? (sum - s) + piece : (piece - s) + sum;
            sum = s;
            prev = c;
        }
        return sum + comp;
    }

    private static double adaptive(DoubleUnaryOperator f, double lo, double hi, int depth,
                                   double tolerance) {
        final double m = 0.5 * lo + 0.5 * hi;
        final double h = 0.5 * hi - 0.5 * lo;
        final double whole = GaussLegendre.integrate(f, m, h);
        final double left = GaussLegendre.integrate(f, 0.5 * lo + 0.5 * m, 0.5 * h);
        final double right = GaussLegendre.integrate(f, 0.5 * m + 0.5 * hi, 0.5 * h);
        final double both = left + right;
        final double gap = Math.abs(both - whole);
        if (depth >= MAX_DEPTH || gap <= tolerance || gap <= LOCAL_TOLERANCE * Math.abs(both)) {
            return both;
        }
        return adaptive(f, lo, m, depth + 1, tolerance) + adaptive(f, m, hi, depth + 1, tolerance);
    }
}
