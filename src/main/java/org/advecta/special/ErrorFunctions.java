package org.advecta.special;

import org.advecta.internal.HermiteSeries;
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
     * <p>Narrow intervals off the origin (h &lt; 1/2 and 4|m|h &lt; 1, so that exp(−s²) changes
     * by less than a factor e across them, and |m| &gt; 3h, and 8|m|h &lt; 1 where both ends
     * exceed the x of erf(x) = 1/2) use the Taylor series of erf about m (in Hermite
     * polynomials, summed to 2⁻⁶⁰ relative). The others use {@link #erfDifference(double, double)},
     * which then cannot cancel badly: for |m| ≤ 3h the two erf values either differ in sign
     * or differ by at least a third of their sum, and two erfc values beyond erf = 1/2 with
     * 8|m|h ≥ 1 differ by at least a quarter of theirs.
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
        if (!(h >= 0)) {
            return Double.NaN;
        }
        final double am = Math.abs(m);
        if (h < NARROW_HALF_WIDTH && 4 * am * h < 1 && am > 3 * h
            && (am - h < ERFC_FROM || 8 * am * h < 1)) {
            return narrowErfDifference(m, h);
        }
        return wideErfDifference(m - h, m + h);
    }

    /**
     * erf(b) − erf(a) for a ≤ b, with the branches of Commons Numbers' ErfDifference.value
     * (the same doubles): erfc values of the tail arguments where both lie beyond erf = ±1/2
     * on one side, else erf values. Written out because that method's recursive call (for
     * a &gt; b, which cannot occur here) kept the JIT from inlining it: 5 % of a slug's
     * time (JMH, 1024 points around the front).
     */
    private static double wideErfDifference(double a, double b) {
        if (a < -ERF_DIFFERENCE_CRITICAL) {
            return b < 0 ? Erfc.value(-b) - Erfc.value(-a) : Erf.value(b) - Erf.value(a);
        }
        return b > ERF_DIFFERENCE_CRITICAL && a > 0 ? Erfc.value(a) - Erfc.value(b)
            : Erf.value(b) - Erf.value(a);
    }

    /** The switch of Commons Numbers 1.2's ErfDifference (its X_CRIT, 1 ulp above ERFC_FROM). */
    private static final double ERF_DIFFERENCE_CRITICAL = 0.47693627620446993;

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

    /**
     * From here on (about the x where erf(x) = 1/2) Commons Numbers' ErfDifference takes the
     * difference of erfc values, which loses at most a factor coth(2|m|h) ≤ 4 when
     * 8|m|h ≥ 1.
     */
    private static final double ERFC_FROM = 0.4769362762044697;

    /** Half-widths below this may use the series of {@link #erfDifferenceCentred}. */
    private static final double NARROW_HALF_WIDTH = 0.5;
    /** 2/√π. */
    private static final double TWO_OVER_SQRT_PI = 1.1283791670955126;

    /**
     * erf(m + h) − erf(m − h) for a narrow interval off the origin (h &lt; 1/2, 4|m|h &lt; 1):
     * (4h/√π)·e^{−m²}·Σ_j T_{2j}/(2j + 1), the Taylor series of erf about m in Hermite
     * polynomials ({@link HermiteSeries}, Abramowitz &amp; Stegun 7.1.19), which cannot cancel.
     * One exponential (with its exponent in double-double), against 20 for a 10-point
     * quadrature.
     */
    private static double narrowErfDifference(double m, double h) {
        final double sum = HermiteSeries.centredSum(2 * m * h, 2 * h * h);
        return ScaledExp.value(2 * h * TWO_OVER_SQRT_PI * sum, 0.0, m);
    }

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
