package org.advecta.internal;

/**
 * Sums of Chebyshev series, for the library's fitted approximations (coefficients computed
 * with mpmath by the generators beside the test fixtures).
 */
public final class Chebyshev {

    private Chebyshev() {
    }

    /**
     * Returns Σ c_k T_k(s) by Clenshaw's recurrence, with fused multiply-adds (its rounding
     * error is a few ulp of Σ|c_k|).
     *
     * @param c the coefficients c_0, c_1, …; at least one
     * @param s the argument, in [−1, 1]
     * @return the sum
     */
    public static double sum(double[] c, double s) {
        final double s2 = 2 * s;
        double b1 = 0;
        double b2 = 0;
        for (int k = c.length - 1; k >= 1; k--) {
            final double b0 = Math.fma(s2, b1, c[k] - b2);
            b2 = b1;
            b1 = b0;
        }
        return Math.fma(s, b1, c[0] - b2);
    }
}
