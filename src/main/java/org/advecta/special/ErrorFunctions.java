package org.advecta.special;

import org.advecta.internal.CentredErfSeries;
import org.advecta.internal.ScaledExp;
import org.apache.commons.numbers.gamma.Erf;
import org.apache.commons.numbers.gamma.ErfDifference;
import org.apache.commons.numbers.gamma.Erfc;
import org.apache.commons.numbers.gamma.Erfcx;

/**
 * The error function family: erf, erfc, the scaled erfcx, cancellation-free differences of
 * erf, and log erfc.
 *
 * <p>erf, erfc and erfcx delegate to Apache Commons Numbers 1.2 (a port of Boost.Math's
 * rational approximations), which is accurate to under 2 ULP; the tests hold it to the
 * accuracy stated on each method.
 */
public final class ErrorFunctions {

    /**
     * Where {@link #logErfc(double)} switches from log1p(−erf x) to −x² + log(erfcx x):
     * below it 1 − erf x lies in [0.47, 2], where log1p of the exactly negated erf loses
     * nothing (log of a rounded erfc near 1.5 would triple its error: 1/ln 1.5 ≈ 2.5);
     * above it the scaled form avoids the underflow of erfc (erfc x = 0 for x &gt; 27.3).
     */
    private static final double LOG_ERFC_SWITCH = 0.5;

    private ErrorFunctions() {
    }

    /**
     * The error function, erf(x) = (2/√π) ∫₀ˣ exp(−s²) ds.
     *
     * <p>Special cases: erf(±0) = ±0; erf(±∞) = ±1; erf(NaN) = NaN.
     *
     * <p>Accuracy: within 2 ULP of the exact result for all x.
     *
     * @param x the argument
     * @return erf(x)
     */
    public static double erf(double x) {
        return Erf.value(x);
    }

    /**
     * The complementary error function, erfc(x) = 1 − erf(x), accurate in its tail.
     *
     * <p>Special cases: erfc(−∞) = 2; erfc(+∞) = 0; erfc(NaN) = NaN; erfc(x) is subnormal
     * for x above about 26.55 and rounds to 0 above about 27.23.
     *
     * <p>Accuracy: within 4 ULP of the exact result wherever the result is a normal double
     * (measured: 2.5 at most), within 1 {@link Double#MIN_VALUE} where it is subnormal.
     *
     * @param x the argument
     * @return erfc(x)
     */
    public static double erfc(double x) {
        return Erfc.value(x);
    }

    /**
     * The scaled complementary error function, erfcx(x) = exp(x²)·erfc(x).
     *
     * <p>For x ≥ 0 it lies in (0, 1] and behaves like 1/(x√π) for large x, so it never
     * underflows where erfc does. For x &lt; 0 it grows like 2·exp(x²).
     *
     * <p>Special cases: erfcx(+∞) = 0; erfcx(−∞) = +∞; erfcx(x) = +∞ for x below about
     * −26.63 where 2·exp(x²) overflows; erfcx(NaN) = NaN.
     *
     * <p>Accuracy: within 4 ULP of the exact result wherever the result is a normal double
     * (measured: under 2).
     *
     * @param x the argument
     * @return exp(x²)·erfc(x)
     */
    public static double erfcx(double x) {
        return Erfcx.value(x);
    }

    /**
     * The difference erf(a) − erf(b), without the cancellation of the naive difference when
     * a and b are large and of the same sign: there it is formed as a difference of erfc
     * values of the (positive) tail arguments, each accurate to a few ULP.
     *
     * <p>Special cases: NaN if either argument is NaN; erfDifference(a, a) = 0; infinite
     * arguments use erf(±∞) = ±1.
     *
     * <p>Accuracy: within max(16, 2κ) ULP of the exact result wherever it is a normal
     * double, where κ = (|a·erf′(a)| + |b·erf′(b)|) / |erf(a) − erf(b)| is the condition
     * number of the difference (large only when a and b are close).
     *
     * @param a the first argument
     * @param b the second argument
     * @return erf(a) − erf(b)
     */
    public static double erfDifference(double a, double b) {
        if (Math.abs(a) < SMALL_ARGUMENT && Math.abs(b) < SMALL_ARGUMENT) {
            // erf(a) − erf(b) = (2/√π)(a − b)(1 − (a² + ab + b²)/3 + O(a⁴)): the difference of
            // the arguments is exact or correctly rounded, while two rounded erf values near
            // 1e-300 differ by whole multiples of their ulp.
            return TWO_OVER_SQRT_PI * (a - b) * (1 - (a * a + a * b + b * b) / 3);
        }
        // Commons Numbers' ErfDifference.value(x1, x2) is erf(x2) − erf(x1).
        return ErfDifference.value(b, a);
    }

    /**
     * Below this, the two-term series of {@link #erfDifference} is exact to double precision:
     * the next term is (a⁴ + a³b + a²b² + ab³ + b⁴)/10 &lt; 2⁻⁶⁰ relative.
     */
    private static final double SMALL_ARGUMENT = 0x1.0p-16;

    /**
     * The difference erf(m + h) − erf(m − h) over an interval given by its centre m and
     * half-width h ≥ 0, accurate also when the interval is so narrow that erf(m ± h) agree
     * in most of their digits (m ± h would then be rounded before erf sees them).
     *
     * <pre>
     * erf(m + h) − erf(m − h) = (2/√π) ∫ exp(−s²) ds over [m − h, m + h]
     * </pre>
     *
     * <p>For h ≤ 1/2 and |m|·h ≤ 1 it is a series of positive terms times e^{−m² − h²},
     * with m² split exactly; otherwise one exponential times a difference of erfcx values
     * that loses at most a factor 2.2, or a sum of erf values (see
     * {@link #erfDifferenceCentred(double, double, double)}, of which this is s = 0).
     *
     * <p>Special cases: NaN if m or h is NaN or h &lt; 0; 0 for h = 0; erf(±∞)
     * differences for infinite h.
     *
     * <p>Accuracy: within max(16, 2κ) ULP of the exact result wherever it is a normal double,
     * κ being its condition number with respect to m and h.
     *
     * @param m the centre of the interval
     * @param h the half-width, ≥ 0
     * @return erf(m + h) − erf(m − h)
     */
    public static double erfDifferenceCentred(double m, double h) {
        return erfDifferenceCentred(m, h, 0.0);
    }

    /**
     * The difference erf(m + h) − erf(m − h) scaled by e^s, for a solution that carries a
     * factor such as the decay e^{−μt/R}: e^s joins the exponential the difference needs
     * anyway, so the scaled difference costs one exponential where the product of the naive
     * formula costs three.
     *
     * <pre>
     * e^s·[erf(m + h) − erf(m − h)] = (4h/√π)·e^{s − m² − h²}·Σ_j (2mh)^{2j}/(2j)!·g_j,
     * g_j = e^{h²} ∫₀¹ u^{2j} e^{−h²u²} du = (1 + 2h²·g_{j+1})/(2j + 1)
     * </pre>
     *
     * <p>(substitute s = m + hu in the integral above; the odd powers of u cancel over
     * [−1, 1], and g_j follows by parts). For h ≤ 1/2 and |m|·h ≤ 1 that series is taken
     * ({@code CentredErfSeries}): its terms are all positive and its exponent is formed with
     * m² split exactly. Otherwise (the difference is even in m; lo = |m| − h, hi = |m| + h),
     * when both ends lie on one side of 0 it is e^{s − lo²}·[erfcx(lo) − e^{−4|m|h}·erfcx(hi)]
     * (A&amp;S 7.1.2, one exponential for both erfc values; lo² from the rounded lo, as erfc(lo)
     * would: forming it as m² − h(2|m| − h) cancels for wide intervals), whose second term is
     * at most e^{−1} of the first (erfcx decreases, and 4|m|h ≥ 1 there), a loss of at most a
     * factor 2.2 (for lo &lt; 1/2 the two erfc values themselves, with the same loss); when
     * they lie on both sides it is e^s·[erf(hi) + erf(−lo)], which cannot cancel.
     *
     * <p>Special cases: NaN if m, h or s is NaN or h &lt; 0; 0 for h = 0; erf(±∞)
     * differences for infinite h; +∞ where the scaled result exceeds
     * {@link Double#MAX_VALUE}.
     *
     * <p>Accuracy: within max(16, 2κ) ULP of the exact result wherever it is a normal double,
     * κ being its condition number with respect to m, h and s.
     *
     * @param m the centre of the interval
     * @param h the half-width, ≥ 0
     * @param s the logarithm of the scale
     * @return e^s·[erf(m + h) − erf(m − h)]
     */
    public static double erfDifferenceCentred(double m, double h, double s) {
        if (!(h > 0)) {
            return h == 0 && m == m ? 0.0 : Double.NaN;
        }
        final double am = Math.abs(m);
        if (h <= CentredErfSeries.MAX_HALF_WIDTH
            && am * h <= CentredErfSeries.MAX_CENTRE_TIMES_HALF_WIDTH) {
            // h² ≤ 1/4 is rounded by at most 2⁻⁵⁵ absolute: it can join s unsplit
            return ScaledExp.value(2 * h * TWO_OVER_SQRT_PI * CentredErfSeries.sum(m, h),
                s - h * h, m);
        }
        final double lo = am - h;
        if (lo > 0) {
            if (lo < ERFCX_BY_RATIONAL) {
                return ScaledExp.value(Erfc.value(lo) - Erfc.value(am + h), s, 0.0);
            }
            final double bracket = Erfcx.value(lo) - Math.exp(-4 * am * h) * Erfcx.value(am + h);
            return ScaledExp.value(bracket, s, lo);
        }
        return ScaledExp.value(Erf.value(am + h) - Erf.value(lo), s, 0.0);
    }

    /**
     * The derivative of the scaled complementary error function,
     * erfcx′(x) = 2x·erfcx(x) − 2/√π, accurate also for large x where the two terms agree in
     * most of their digits (erfcx′(x) ≈ −1/(√π x²)).
     *
     * <p>For x ≥ 3/2 it is evaluated without cancellation: from a Chebyshev series of
     * x²·erfcx′(x) in 1/x up to 10 (coefficients from mpmath) and from the asymptotic
     * series beyond; below 3/2 the direct formula loses at most a factor 7 to cancellation.
     *
     * <p>Special cases: NaN gives NaN; erfcxDerivative(+∞) = −0.0; −∞ for x below about
     * −26.6, where erfcx overflows.
     *
     * <p>Accuracy: within 16 ULP of the exact result wherever it is a normal double.
     *
     * @param x the argument
     * @return erfcx′(x) (negative for every x)
     */
    public static double erfcxDerivative(double x) {
        return -2 * ErfcxDerivatives.phi(x);
    }

    /**
     * The second derivative of the scaled complementary error function,
     * erfcx″(x) = 2(1 + 2x²)·erfcx(x) − 4x/√π, accurate also for large x where the terms
     * agree in most of their digits (erfcx″(x) ≈ 2/(√π x³)).
     *
     * <p>For x ≥ 3/4 it is evaluated without cancellation: from Laplace's continued
     * fraction for erfcx up to 3/2, a Chebyshev series of x³·erfcx″(x) in 1/x up to 10, and
     * the asymptotic series beyond; below 3/4 the direct formula loses at most a factor 5.
     *
     * <p>Special cases: NaN gives NaN; erfcxSecondDerivative(+∞) = 0; +∞ for x below about
     * −26.6, where erfcx overflows.
     *
     * <p>Accuracy: within 16 ULP of the exact result wherever it is a normal double.
     *
     * @param x the argument
     * @return erfcx″(x) (positive for every x)
     */
    public static double erfcxSecondDerivative(double x) {
        return 2 * ErfcxDerivatives.psi(x);
    }

    /** 2/√π. */
    private static final double TWO_OVER_SQRT_PI = 1.1283791670955126;
    /**
     * Commons Numbers 1.2 forms erfcx(x) below 1/2 from erfc with StrictMath.expm1, which
     * the JIT does not replace by an intrinsic (JMH stack profile of the slug): there the
     * two erfc values are subtracted instead, with the same loss.
     */
    private static final double ERFCX_BY_RATIONAL = 0.5;

    /**
     * The natural logarithm of erfc(x), finite for every finite x, including where erfc(x)
     * itself underflows to 0.
     *
     * <pre>
     * log erfc(x) = log1p(−erf x)           x ≤ 1/2
     *             = −x² + log(erfcx x)      x &gt; 1/2
     * </pre>
     *
     * <p>Special cases: logErfc(−∞) = ln 2; logErfc(+∞) = −∞; logErfc(NaN) = NaN;
     * logErfc(±0) = ∓0.0 (the exact result 0, as a signed zero); −∞ also for x above about 1.34e154, where −x² itself is below
     * −{@link Double#MAX_VALUE}.
     *
     * <p>Accuracy: within 4 ULP of the exact result for |x| ≥ 1/2 and within max(4, 2κ) ULP
     * for |x| &lt; 1/2, where κ = |x·erfc′(x)/(erfc(x)·log erfc(x))| (large only near
     * x = 0, where the result passes through 0).
     *
     * @param x the argument
     * @return log(erfc(x))
     */
    public static double logErfc(double x) {
        if (x > LOG_ERFC_SWITCH) {
            // erfc x = exp(−x²)·erfcx x, and both terms are negative: no cancellation.
            return -x * x + Math.log(Erfcx.value(x));
        }
        // NaN falls through to here and gives NaN
        return Math.log1p(-Erf.value(x));
    }
}
