package org.advecta.testing;

import java.util.function.DoubleUnaryOperator;

/**
 * Numerical integration for property tests: the composite trapezoid rule with Neumaier
 * summation. For a smooth integrand that decays like a Gaussian of standard deviation σ, with
 * step h ≤ σ/4 and the interval reaching ±10σ beyond the bulk, the rule's error is below
 * 1e-20 relative (its error for periodic or rapidly decaying analytic integrands falls like
 * exp(−2π²σ²/h²): Trefethen &amp; Weideman 2014, SIAM Review 56(3), 385–458), so what the tests
 * see is rounding.
 */
public final class Integrals {

    private Integrals() {
    }

    /**
     * Integrates f over [a, b] with n equal steps by the trapezoid rule.
     *
     * @param f the integrand
     * @param a lower limit
     * @param b upper limit
     * @param n number of steps (≥ 1)
     * @return the integral
     */
    public static double trapezoid(DoubleUnaryOperator f, double a, double b, int n) {
        final double h = (b - a) / n;
        final Sum s = new Sum();
        s.add(0.5 * f.applyAsDouble(a));
        s.add(0.5 * f.applyAsDouble(b));
        for (int i = 1; i < n; i++) {
            s.add(f.applyAsDouble(a + i * h));
        }
        return s.value() * h;
    }

    /** Neumaier's compensated sum (Neumaier 1974, ZAMM 54, 39–51). */
    public static final class Sum {
        private double sum;
        private double compensation;

        /**
         * Adds a term.
         *
         * @param x the term
         */
        public void add(double x) {
            final double t = sum + x;
            if (Math.abs(sum) >= Math.abs(x)) {
                compensation += (sum - t) + x;
            } else {
                compensation += (x - t) + sum;
            }
            sum = t;
        }

        /**
         * Returns the sum so far.
         *
         * @return the sum
         */
        public double value() {
            return sum + compensation;
        }
    }
}
