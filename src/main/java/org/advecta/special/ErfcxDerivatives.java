package org.advecta.special;

import org.advecta.internal.Chebyshev;
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
 * ψ uses the fraction on [3/4, 3/2); a Chebyshev series in 1/x takes over on [3/2, 10),
 * where it is cheaper, and the asymptotic series beyond. φ comes from the rational
 * approximations of {@link ErfcxRational} on [1/2, 10), cheaper still, and from the same
 * asymptotic series beyond.
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
     * φ from {@link ErfcxRational} from here up; below, 1/√π − x·erfcx(x) loses at most a
     * factor (1/√π)/φ(1/2) ≈ 2 to cancellation.
     */
    private static final double PHI_RATIONAL_FROM = 0.5;
    /** ψ by the fraction from here up; below, the direct form loses at most a factor 5. */
    /**
     * On [3/2, 10) ψ comes from a Chebyshev series in y = 1/x ∈ (1/10, 2/3] of x³ψ, 32
     * terms, computed by gen_erfcx_chebyshev.py (beside the test fixtures) at 60
     * digits; truncation error below 1e-20 relative there. Clenshaw's recurrence costs 32
     * fused multiply-adds, against up to 155 divisions for the continued fraction.
     */
    private static final double CHEBYSHEV_FROM = 1.5;
    /** The interval of y = 1/x covered by the Chebyshev series. */
    private static final double Y_LOW = 0.1;
    /** Upper end of that interval, 2/3. */
    private static final double Y_HIGH = 2.0 / 3.0;

    // x³ψ(x), max relative truncation error 6.31e-21
    private static final double[] PSI_CHEBYSHEV = {
        0.4021469157004202,
        -0.15068886901669465,
        0.001521639835733393,
        0.0051660392049974095,
        -0.0012556075155689414,
        0.00010383760143674141,
        2.5205899206900333e-05,
        -1.1348615290597237e-05,
        2.081810096101318e-06,
        -8.358059329187095e-08,
        -7.457064324092228e-08,
        2.741751016152771e-08,
        -5.006059623506488e-09,
        2.1728427198211616e-10,
        1.9382777561929005e-10,
        -7.832336085607272e-11,
        1.6606214721178374e-11,
        -1.4701897712143478e-12,
        -4.2669710426838195e-13,
        2.432250841209122e-13,
        -6.526730696659352e-14,
        9.942523587848383e-15,
        2.0513999155689496e-16,
        -6.999928807417807e-16,
        2.618899796356117e-16,
        -5.916011273439147e-17,
        6.7641052769673674e-18,
        1.1382885785018575e-18,
        -9.147758129655155e-19,
        3.017024888654742e-19,
        -6.381275364026076e-20,
        6.187367232455739e-21};

    /** Σ c_k T_k(s) with s the image of y in [−1, 1]. */
    private static double clenshaw(double[] c, double y) {
        return Chebyshev.sum(c, (2 * y - (Y_LOW + Y_HIGH)) / (Y_HIGH - Y_LOW));
    }

    /** From here on φ and ψ come from the asymptotic series. */
    private static final double ASYMPTOTIC_FROM = 10;
    private static final double PSI_FRACTION_FROM = 0.75;

    private ErfcxDerivatives() {
    }

    static double phi(double x) {
        if (x >= ASYMPTOTIC_FROM) {
            return asymptotic(x, false);
        }
        if (x >= PHI_RATIONAL_FROM) {
            return ErfcxRational.phi(x);
        }
        // NaN falls through: erfcx(NaN) is NaN
        return ONE_OVER_SQRT_PI - x * Erfcx.value(x);
    }

    static double psi(double x) {
        if (x >= ASYMPTOTIC_FROM) {
            return asymptotic(x, true);
        }
        if (x >= CHEBYSHEV_FROM) {
            // ψ = y³·h(y), y = 1/x
            final double y = 1 / x;
            return y * y * y * clenshaw(PSI_CHEBYSHEV, y);
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
