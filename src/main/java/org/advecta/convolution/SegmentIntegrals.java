package org.advecta.convolution;

import org.advecta.internal.GaussLegendre;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;

/**
 * The exact integrals of a linear function against the unit Gaussian exp(−y²)/√π over one
 * segment, in the scaled coordinate y = (X − ξ)/L of the drifting kernel. Package-private
 * engine of {@link InfiniteLineKernel} and of the grid convolution.
 *
 * <p>On the segment y ∈ [m − h, m + h] the hat-function weights
 * <pre>
 * rising(m, h) = (1/√π) ∫ (y − (m − h)) / (2h) · exp(−y²) dy     (weight 1 at y = m + h)
 * rising(−m, h) = (1/√π) ∫ ((m + h) − y) / (2h) · exp(−y²) dy    (weight 1 at y = m − h)
 * </pre>
 * are non-negative integrals of non-negative integrands; their sum is
 * ½[erf(m + h) − erf(m − h)]. Each is evaluated without cancellation, so a linear piece
 * fa·rising(m, h) + fb·rising(−m, h) with fa, fb ≥ 0 is never negative.
 *
 * <p>With P(lo, hi) = ∫ (y − lo)·exp(−y²) dy over [lo, hi], rising(m, h) = P/(2h√π), and
 * (integrating by parts; T₀(y) = ∫_y^∞ exp(−s²) ds = (√π/2)·erfc(y),
 * T₁(y) = ∫_y^∞ (s − y)·exp(−s²) ds = −(√π/4)·exp(−y²)·erfcx′(y)):
 * <pre>
 * P = T₁(lo) − T₁(hi) − 2h·T₀(hi)                       lo ≥ 0
 * P = 2h·T₀(−hi) − T₁(−hi) + T₁(−lo)                     hi ≤ 0
 * P = ½[exp(−lo²) − exp(−hi²)] + (−lo)·(√π/2)[erf(hi) − erf(lo)]     lo &lt; 0 &lt; hi
 * </pre>
 * (Abramowitz &amp; Stegun 7.1.1, 7.1.2 and 7.2.1 for erfc and its first repeated integral;
 * the forms are elementary integrations, derived here.) Outside the narrow regime below, each
 * form loses at most a factor of about 3 to cancellation (the terms are within that factor of
 * P). In the narrow regime h &lt; ½ and 4|m|h &lt; 1, where the first two forms would cancel,
 * P/(2h) = (h/2)∫₋₁¹ (1 + u)·exp(−(m + hu)²) du is summed by the 10-point Gauss–Legendre
 * rule over positive terms (exp(−y²) changes by less than a factor e on the segment, and the
 * rule's error there is below 1e-17 relative; Abramowitz &amp; Stegun 25.4.29).
 *
 * <p>Where a weight is subnormal (|y| beyond about 26.6) its terms are subnormal before the
 * final division by 2h√π, which then scales their granularity: the weights hold to about
 * 2¹¹·{@link Double#MIN_VALUE} absolutely there (measured: 1204 MIN_VALUE at worst over
 * 2·10⁷ random segments with |m| ≤ 45, 10⁻¹² ≤ h ≤ 10³), not relatively. Factoring exp(−lo²)
 * out through the scaled exponential would make them relative; not done yet.
 */
final class SegmentIntegrals {

    /** Beyond |y| = 40 the factor exp(−y²) &lt; 1e-694 leaves nothing a sum of weights can see. */
    static final double FAR = 40;
    /** The narrow regime's half-width limit (the series of ErrorFunctions.erfDifferenceCentred
     * serves up to this half-width too). */
    private static final double NARROW_HALF_WIDTH = 0.5;
    /** √π. */
    static final double SQRT_PI = 1.7724538509055160;
    /** 1/√π. */
    static final double ONE_OVER_SQRT_PI = 0.5641895835477563;

    private SegmentIntegrals() {
    }

    /**
     * Returns rising(m, h), the weight of the end y = m + h of the segment.
     *
     * @param m the segment's centre in y, finite
     * @param h its half-width, finite and ≥ 0
     * @return the weight, in [0, ½·(erf(m + h) − erf(m − h))]
     */
    static double rising(double m, double h) {
        return rising(m, h, m - h, m + h);
    }

    /**
     * Returns rising(m, h) with the ends lo = m − h and hi = m + h given separately, each
     * computed from the positions with a single rounding (m − h would add the rounding of
     * m, up to 2⁻⁵³·|m|, to an end near 0 where the weight is most sensitive).
     *
     * @param m the segment's centre in y
     * @param h its half-width, ≥ 0
     * @param lo its lower end in y (≈ m − h)
     * @param hi its upper end in y (≈ m + h)
     * @return the weight
     */
    static double rising(double m, double h, double lo, double hi) {
        if (h == 0) {
            return 0.0;
        }
        if (h < NARROW_HALF_WIDTH && 4 * Math.abs(m) * h < 1) {
            double sum = 0;
            for (int k = GaussLegendre.halfSize() - 1; k >= 0; k--) {
                final double u = GaussLegendre.node(k);
                final double d = h * u;
                sum += GaussLegendre.weight(k) * ((1 + u) * Exponentials.expMinusSquare(m + d)
                    + (1 - u) * Exponentials.expMinusSquare(m - d));
            }
            return h * sum * (0.5 * ONE_OVER_SQRT_PI);
        }
        if (lo >= FAR || hi <= -FAR) {
            return 0.0;
        }
        final double twoH = 2 * h;
        final double p;
        if (lo >= 0) {
            p = t1(lo) - t1(hi) - twoH * t0(hi);
        } else if (hi <= 0) {
            p = twoH * t0(-hi) - t1(-hi) + t1(-lo);
        } else {
            // lo < 0 < hi: both terms are non-negative except a first term of at most ½
            // against a second one at least (−lo)·T₀-size; measured loss below a factor 2
            // erf(hi) − erf(lo) from the accurate ends (not erf(m ± h): m ± h would round an
            // end near 0 by 2⁻⁵³·|m|); lo < 0 < hi, so no cancellation
            final double mass = 0.5 * SQRT_PI * ErrorFunctions.erfDifference(hi, lo);
            p = 0.5 * (Exponentials.expMinusSquare(lo) - Exponentials.expMinusSquare(hi))
                + (-lo) * mass;
        }
        return Math.max(0.0, p) / (twoH * SQRT_PI);
    }

    /**
     * Returns ½[erf(m + h) − erf(m − h)], the Gaussian mass of the segment.
     *
     * @param m centre
     * @param h half-width, ≥ 0
     * @return the mass
     */
    static double mass(double m, double h) {
        return 0.5 * ErrorFunctions.erfDifferenceCentred(m, h);
    }

    /**
     * Returns the mass with the ends given separately (see
     * {@link #rising(double, double, double, double)}): narrow segments from m and h,
     * others from erf(hi) − erf(lo), which then does not cancel.
     *
     * @param m centre
     * @param h half-width, ≥ 0
     * @param lo lower end
     * @param hi upper end
     * @return the mass
     */
    static double mass(double m, double h, double lo, double hi) {
        if (h < NARROW_HALF_WIDTH && 4 * Math.abs(m) * h < 1) {
            return 0.5 * ErrorFunctions.erfDifferenceCentred(m, h);
        }
        return 0.5 * ErrorFunctions.erfDifference(hi, lo);
    }

    /** T₀(y) = ∫_y^∞ exp(−s²) ds for y ≥ 0. */
    private static double t0(double y) {
        return 0.5 * SQRT_PI * ErrorFunctions.erfc(y);
    }

    /** T₁(y) = ∫_y^∞ (s − y) exp(−s²) ds for y ≥ 0, from erfcx′ without cancellation. */
    private static double t1(double y) {
        if (y >= FAR) {
            return 0.0;
        }
        return -0.25 * SQRT_PI * Exponentials.expMinusSquare(y) * ErrorFunctions.erfcxDerivative(y);
    }
}
