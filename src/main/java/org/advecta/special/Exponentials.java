package org.advecta.special;

import org.advecta.internal.ScaledExp;

/**
 * Gaussian exponentials exp(s − x²) with the square formed exactly.
 *
 * <p>The Gaussian factor of every kernel and the second term of every inlet solution
 * (exp(vx/D)·erfc(B) = exp(−A²)·erfcx(B), since B² − A² = vx/D) need exp(−A²) for an A
 * that may be large. {@code Math.exp(-a * a)} rounds a·a first, which costs a relative
 * error of up to a²·2⁻⁵³ (about 350 ULP near the underflow threshold a ≈ 26.6). Here the
 * square is split exactly with {@link Math#fma} and the error is carried into the result.
 */
public final class Exponentials {

    private Exponentials() {
    }

    /**
     * Returns exp(−x²).
     *
     * <p>Special cases: exp(−(±∞)²) = 0; NaN gives NaN; the result is 1 for |x| ≤ 2⁻²⁷
     * ≈ 7.45e-9 (where x² ≤ 2⁻⁵⁴ and exp(−x²) rounds to 1) and 0 for |x| above about 27.3.
     *
     * <p>Accuracy: within 2 ULP of the exact result wherever it is a normal double, within
     * 1 {@link Double#MIN_VALUE} where it is subnormal. (The inherent sensitivity to x is
     * κ = 2x², which the accuracy does not depend on.)
     *
     * @param x the argument
     * @return exp(−x²)
     */
    public static double expMinusSquare(double x) {
        return ScaledExp.value(1.0, 0.0, x);
    }

    /**
     * Returns exp(s − x²), also where exp(s) alone would overflow.
     *
     * <p>Special cases: NaN if either argument is NaN; 0 for s = −∞ or x = ±∞ with s
     * finite; +∞ for s = +∞ with x finite; NaN for s = +∞ with x = ±∞.
     *
     * <p>Accuracy: within 2 ULP of the exact result wherever it is a normal double (the
     * exponent is carried in double-double precision), within 1 {@link Double#MIN_VALUE}
     * where it is subnormal.
     *
     * @param s the shift
     * @param x the argument that is squared
     * @return exp(s − x²)
     */
    public static double expMinusSquare(double s, double x) {
        if (!(Math.abs(s) < Double.POSITIVE_INFINITY)) {
            if (s != s || x != x) {
                return Double.NaN;
            }
            if (s < 0) {
                return 0.0;
            }
            return Math.abs(x) == Double.POSITIVE_INFINITY ? Double.NaN : Double.POSITIVE_INFINITY;
        }
        return ScaledExp.value(1.0, s, x);
    }
}
