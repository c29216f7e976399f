package org.advecta.special;

import org.advecta.internal.ScaledExp;
import org.apache.commons.numbers.gamma.Erfc;
import org.apache.commons.numbers.gamma.Erfcx;

/**
 * The product exp(a)·erfc(b), evaluated without intermediate overflow or underflow.
 *
 * <p>Every first-type inlet solution carries a term exp(vx/D)·erfc(B). Written naively, the
 * exponential overflows to +∞ once vx/D &gt; 709.78 while erfc(B) underflows to 0, and the
 * product is NaN, although the true value is an ordinary number. This class rewrites it with
 * the scaled function erfcx(b) = exp(b²)·erfc(b):
 *
 * <pre>
 * exp(a)·erfc(b) = exp(a − b²)·erfcx(b)     b ≥ 0
 *                = exp(a)·erfc(b)           b &lt; 0   (erfc b in (1, 2])
 * </pre>
 *
 * <p>The exponent a − b² is formed with an exact split of b² ({@link Math#fma}) and an exact
 * two-sum, so its rounding does not cost the hundreds of ULP that a plain {@code a - b*b}
 * does when a and b² are both large (Dekker 1971, Numer. Math. 18, 224–242). For b &lt; 1/2 and
 * |a| ≤ 700 the plain product is used: erfc(b) is then near 1 and exp(a) a normal double,
 * so it is accurate, and cheaper than erfcx, which needs exp(b²) there.
 */
public final class ExpErfc {

    /** |a| up to this keeps exp(a) a normal double (ln MAX_VALUE ≈ 709.78). */
    private static final double SAFE_EXPONENT = 700;
    /**
     * From here on the scaled form exp(a − b²)·erfcx(b) is used: one exponential instead of
     * the two of exp(a)·erfc(b) (erfc computes exp(−b²) itself for b ≥ 1/2), and no overflow.
     */
    private static final double SCALED_FROM = 0.5;

    private ExpErfc() {
    }

    /**
     * Returns exp(a)·erfc(b).
     *
     * <p>Special cases: NaN if a or b is NaN; NaN for a = +∞ with b = +∞ (the indeterminate
     * ∞·0); 0 for a = −∞ or b = +∞ otherwise; +∞ for a = +∞ otherwise; exp(a)·2 for b = −∞.
     * The result is +∞ only where the exact value exceeds {@link Double#MAX_VALUE}, and 0 only
     * where it is below half of {@link Double#MIN_VALUE}.
     *
     * <p>Accuracy: within 4 ULP for |a| ≤ 700 and b &lt; 1/2 where the result is a normal double;
     * elsewhere within max(16, 2κ) ULP of the exact result wherever it is a normal double,
     * where κ = |a| + |b·erfc′(b)/erfc(b)| ≈ |a| + 2b² is the condition number of the product
     * with respect to its arguments (a relative change δ in a alone moves the result by
     * |a|·δ); within a few {@link Double#MIN_VALUE} where the result is subnormal.
     *
     * @param a the exponent
     * @param b the erfc argument
     * @return exp(a)·erfc(b)
     */
    public static double value(double a, double b) {
        if (b < SCALED_FROM && a >= -SAFE_EXPONENT && a <= SAFE_EXPONENT) {
            // erfc(b) > 0.47 and exp(a) is a normal double: the plain product is within
            // 1 + 1 + 0.5 ULP, and cheaper than erfcx, which itself needs exp(b²) here.
            return Math.exp(a) * Erfc.value(b);
        }
        if (!(Math.abs(a) < Double.POSITIVE_INFINITY)) {
            return infiniteExponent(a, b);
        }
        if (b >= 0) {
            return b == Double.POSITIVE_INFINITY ? 0.0 : ScaledExp.value(Erfcx.value(b), a, b);
        }
        // b < 0 or NaN: erfc(b) is in (1, 2], only exp(a) can overflow.
        return ScaledExp.value(Erfc.value(b), a, 0.0);
    }

    private static double infiniteExponent(double a, double b) {
        if (a != a || b != b) {
            return Double.NaN;
        }
        if (a < 0) {
            return 0.0;
        }
        return b == Double.POSITIVE_INFINITY ? Double.NaN : Double.POSITIVE_INFINITY;
    }
}
