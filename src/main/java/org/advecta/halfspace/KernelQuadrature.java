package org.advecta.halfspace;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.advecta.internal.GaussLegendre;

/**
 * ∫ f(ξ) dξ over [a, b] for the ξ-dependence of the half-line kernel at fixed (x, t): a sum
 * of Gaussians and erfc's of width L centred at x − vt/R and −x − vt/R. The interval is cut
 * at those centres ± multiples of L/2 and, geometrically, near both ends (where a far tail
 * concentrates its mass), and each piece is integrated by the 10-point Gauss–Legendre rule,
 * halved adaptively until two levels agree to 1e-15 of the local |f| integral.
 */
final class KernelQuadrature {

    private static final int MAX_DEPTH = 24;
    private static final double TOLERANCE = 1e-15;
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
        double sum = 0;
        double comp = 0;
        double prev = a;
        for (double c : sorted) {
            if (c <= prev || c > b) {
                continue;
            }
            final double piece = adaptive(f, prev, c, 0);
            // Neumaier summation
            final double s = sum + piece;
            comp += Math.abs(sum) >= Math.abs(piece) ? (sum - s) + piece : (piece - s) + sum;
            sum = s;
            prev = c;
        }
        return sum + comp;
    }

    private static double adaptive(DoubleUnaryOperator f, double lo, double hi, int depth) {
        final double m = 0.5 * lo + 0.5 * hi;
        final double h = 0.5 * hi - 0.5 * lo;
        final double whole = GaussLegendre.integrate(f, m, h);
        final double left = GaussLegendre.integrate(f, 0.5 * lo + 0.5 * m, 0.5 * h);
        final double right = GaussLegendre.integrate(f, 0.5 * m + 0.5 * hi, 0.5 * h);
        final double both = left + right;
        final double scale = GaussLegendre.integrate(s -> Math.abs(f.applyAsDouble(s)), m, h);
        if (depth >= MAX_DEPTH || Math.abs(both - whole) <= TOLERANCE * scale) {
            return both;
        }
        return adaptive(f, lo, m, depth + 1) + adaptive(f, m, hi, depth + 1);
    }
}
