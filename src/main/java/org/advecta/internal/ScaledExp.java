package org.advecta.internal;

/**
 * The engine behind every "prefactor × exp(shift − Σ w²)" in the library, evaluated so that
 * neither the exponent nor the product loses accuracy, overflows early or underflows early.
 *
 * <p>Why: the exponent of a drifting Gaussian or of an inlet solution is a difference of large
 * numbers ({@code vx/D − B²} with both of size Péclet). Rounding the exponent to a double costs
 * a relative error of about |exponent| × 2⁻⁵³ in the result, which is hundreds of ULP near the
 * underflow threshold. Here every square is split exactly with {@link Math#fma} and every sum
 * is split exactly with Knuth's two-sum, so the rounded exponent {@code e} is accompanied by
 * its exact-to-first-order error {@code c}, and {@code exp(e + c) = exp(e)·(1 + c)} to within
 * c²/2 (Dekker 1971, Numer. Math. 18, 224–242; Knuth, TAOCP vol. 2, 4.2.2).
 *
 * <p>Not exported from the module.
 */
public final class ScaledExp {

    /** Above this exponent exp(e) alone overflows: it is then applied as two halves. */
    private static final double EXP_OVERFLOW = 709.0;
    /**
     * Below this exponent exp(e) alone is subnormal (ln of {@link Double#MIN_NORMAL} is
     * −708.40) and would lose digits before a large m multiplies it: it is then applied as
     * two halves too.
     */
    private static final double EXP_SUBNORMAL = -708.0;
    /**
     * Below this exponent m × exp(e) is below half the smallest subnormal for every finite m:
     * ln(MAX_VALUE) + ln(2⁻¹⁰⁷⁵) ≈ 709.8 − 745.1, so anything under −1455 gives exactly 0.
     */
    private static final double EXP_UNDERFLOW = -1456.0;
    /** Corrections this small are applied as 1 + c (error c²/2 below 2⁻⁵⁴). */
    private static final double SMALL_CORRECTION = 0x1.0p-27;

    private ScaledExp() {
    }

    /**
     * Returns {@code m × exp(s − w²)}.
     *
     * @param m finite multiplier (its sign is the result's)
     * @param s finite shift
     * @param w any double
     * @return the product, 0 when it is below half the smallest subnormal, +∞ when it
     *     exceeds {@link Double#MAX_VALUE}; NaN only for NaN arguments
     */
    public static double value(double m, double s, double w) {
        final double p = w * w;
        if (p == Double.POSITIVE_INFINITY || w != w) {
            return w != w ? Double.NaN : Math.copySign(0.0, m);
        }
        final double pLow = Math.fma(w, w, -p);
        final double e = s - p;
        // two-sum: the exact rounding error of s − p
        final double bv = e - s;
        final double sumErr = (s - (e - bv)) + (-p - bv);
        return finish(m, e, sumErr - pLow);
    }

    /**
     * Returns {@code m × exp(s − (qHigh + qLow))}, for an exponent part given as an unevaluated
     * double-double sum (|qLow| ≤ ulp(qHigh)).
     *
     * @param m finite multiplier (its sign is the result's)
     * @param s finite shift
     * @param qHigh leading part of the subtracted exponent, ≥ 0 or +∞
     * @param qLow trailing part
     * @return the product, 0 when it is below half the smallest subnormal, +∞ when it
     *     exceeds {@link Double#MAX_VALUE}; NaN only for NaN arguments
     */
    public static double valueOfSplit(double m, double s, double qHigh, double qLow) {
        if (!(qHigh < Double.POSITIVE_INFINITY)) {
            return qHigh != qHigh ? Double.NaN : Math.copySign(0.0, m);
        }
        final double e = s - qHigh;
        final double bv = e - s;
        final double sumErr = (s - (e - bv)) + (-qHigh - bv);
        return finish(m, e, sumErr - qLow);
    }

    /**
     * Returns {@code m × exp(e) × exp(c)} for a rounded exponent e and its small error c.
     *
     * @param m multiplier
     * @param e rounded exponent
     * @param c error of e (|c| ≪ 1 except when e is so large that the result is 0 or ∞)
     * @return the product
     */
    private static double finish(double m, double e, double c) {
        // The common case in one test, so that a batch loop runs without further branches;
        // an exponent of exactly 0 (no decay, no square) needs no exponential at all.
        if (e >= EXP_SUBNORMAL && e <= EXP_OVERFLOW && Math.abs(c) < SMALL_CORRECTION) {
            return e == 0 ? m * (1.0 + c) : m * (1.0 + c) * Math.exp(e);
        }
        return finishRare(m, e, c);
    }

    private static double finishRare(double m, double e, double c) {
        if (e < EXP_UNDERFLOW) {
            return Math.copySign(0.0, m);
        }
        final double mc = m * correction(c);
        if (e >= EXP_SUBNORMAL && e <= EXP_OVERFLOW) {
            return mc * Math.exp(e);
        }
        // exp(e) alone would overflow, or be subnormal, while the product may be an ordinary
        // double: apply it in two halves (e/2 is exact). A product beyond MAX_VALUE becomes
        // +∞ and one below the subnormal range 0, as they should.
        final double half = Math.exp(0.5 * e);
        return half * (half * mc);
    }

    private static double correction(double c) {
        return Math.abs(c) < SMALL_CORRECTION ? 1.0 + c : Math.exp(c);
    }
}
