package org.advecta.special;

import org.apache.commons.numbers.gamma.Erfcx;

/**
 * The engine behind {@link ErrorFunctions#erfcxDerivative(double)} and
 * {@link ErrorFunctions#erfcxSecondDerivative(double)}:
 * <pre>
 * φ(x) = 1/√π − x·erfcx(x)              = −erfcx′(x)/2
 * ψ(x) = (1 + 2x²)·erfcx(x) − 2x/√π     =  erfcx″(x)/2
 * </pre>
 * Both are differences of nearly equal terms for large x (φ ≈ 1/(2√π x²), ψ ≈ 1/(√π x³)).
 * Laplace's continued fraction (Abramowitz &amp; Stegun 7.1.14; Cuyt et al. 2008,
 * <i>Handbook of Continued Fractions for Special Functions</i>, eq. 13.2.20)
 * <pre>
 * √π·erfcx(x) = 1/(x + K₁),   K_i = (i/2) / (x + K_{i+1})
 * </pre>
 * gives them without cancellation: √π·φ = K₁/(x + K₁) and √π·ψ = K₂/((x + K₂)(x + K₁)).
 * The fraction is summed backward from ⌈180/x² + 100/x⌉ + 8 terms, which mpmath shows is
 * enough for 4 units of 2⁻⁵³ at x ≥ 1/2 (it converges more slowly as x decreases). From
 * x = 10 on, the asymptotic series (A&amp;S 7.1.23, differentiated)
 * <pre>
 * √π·φ(x) = Σ_{n≥1} (−1)^{n+1} (2n−1)!! / (2x²)^n
 * √π·ψ(x) = (1/x) Σ_{n≥1} (−1)^{n+1} 2n·(2n−1)!! / (2x²)^n
 * </pre>
 * is cheaper: its terms fall below 2⁻⁵⁶ of the sum within 20 terms there.
 */
final class ErfcxDerivatives {

    /** 1/√π. */
    private static final double ONE_OVER_SQRT_PI = 0.5641895835477563;
    /**
     * φ by the fraction from here up; below, 1/√π − x·erfcx(x) loses at most a factor
     * (1/√π)/φ(3/2) ≈ 7 to cancellation.
     */
    private static final double PHI_FRACTION_FROM = 1.5;
    /** ψ by the fraction from here up; below, the direct form loses at most a factor 5. */
    /** From here on φ and ψ come from the asymptotic series. */
    private static final double ASYMPTOTIC_FROM = 10;
    private static final double PSI_FRACTION_FROM = 0.75;

    private ErfcxDerivatives() {
    }

    static double phi(double x) {
        if (x >= ASYMPTOTIC_FROM) {
            return asymptotic(x, false);
        }
        if (x >= PHI_FRACTION_FROM) {
            final double k1 = 0.5 / (x + tail(x));
            return ONE_OVER_SQRT_PI * (k1 / (x + k1));
        }
        // NaN falls through: erfcx(NaN) is NaN
        return ONE_OVER_SQRT_PI - x * Erfcx.value(x);
    }

    static double psi(double x) {
        if (x >= ASYMPTOTIC_FROM) {
            return asymptotic(x, true);
        }
        if (x >= PSI_FRACTION_FROM) {
            final double k2 = tail(x);
            final double k1 = 0.5 / (x + k2);
            return ONE_OVER_SQRT_PI * (k2 / ((x + k2) * (x + k1)));
        }
        return (1 + 2 * x * x) * Erfcx.value(x) - 2 * ONE_OVER_SQRT_PI * x;
    }

    /** From here on the asymptotic series is used. */

    /** φ (or ψ) by the asymptotic series, for x ≥ 10. */
    private static double asymptotic(double x, boolean second) {
        if (x == Double.POSITIVE_INFINITY) {
            return 0.0;
        }
        // y = 1/(2x²); x ≥ 10 keeps y ≤ 0.005 (no overflow or underflow concerns: a huge x
        // gives y = 0 and the first term alone, which then underflows gracefully)
        final double y = 0.5 / x / x;
        double term = y;
        double sum = second ? 2 * y : y;
        for (int n = 2; n <= 30; n++) {
            term *= -(2 * n - 1) * y;
            final double add = second ? 2 * n * term : term;
            sum += add;
            if (Math.abs(add) < 0x1.0p-56 * Math.abs(sum)) {
                break;
            }
        }
        return second ? ONE_OVER_SQRT_PI * sum / x : ONE_OVER_SQRT_PI * sum;
    }

    /** Returns K₂ = 1/(x + (3/2)/(x + 2/(x + …))), for x ≥ 1/2. */
    private static double tail(double x) {
        final double terms = Math.min(1700, Math.ceil(180 / (x * x) + 100 / x) + 8);
        double k = 0;
        for (int i = (int) terms; i >= 2; i--) {
            k = 0.5 * i / (x + k);
        }
        return k;
    }
}
