package org.advecta.convolution;

import org.advecta.internal.GaussLegendre;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;

/**
 * Scaled segment integrals for the wall terms of {@link HalfLineKernel}: the hat-function
 * weights of the Gaussian (as {@link SegmentIntegrals#rising}) multiplied by exp(ref²), and
 * the hat-function weights of erfc. Package-private engine.
 *
 * <p>On a segment z ∈ [lo, hi] (hi − lo = 2h) the erfc hat weights are
 * <pre>
 * low(lo, hi)  = ∫ (hi − z)/(2h)·erfc(z) dz      (weight 1 at z = lo)
 * high(lo, hi) = ∫ (z − lo)/(2h)·erfc(z) dz      (weight 1 at z = hi)
 * 2h·high = i²erfc(lo) − i²erfc(hi) − 2h·i¹erfc(hi)
 * 2h·low  = 2h·i¹erfc(lo) − i²erfc(lo) + i²erfc(hi)
 * i¹erfc(z) = −½·e^{−z²}·erfcx′(z),   i²erfc(z) = ⅛·e^{−z²}·erfcx″(z)      (z ≥ 0)
 * </pre>
 * (repeated integrals of erfc, Abramowitz &amp; Stegun 7.2.1–7.2.5; the relation to the
 * derivatives of erfcx, dⁿ/dzⁿ[e^{z²}erfc z] = (−2)ⁿn!·e^{z²}iⁿerfc z, follows from A&amp;S
 * 7.2.5 by induction; the hat forms are integrations by parts, derived here). For lo ≥ 0
 * they are returned multiplied by exp(lo²) (no underflow at high Péclet numbers); for
 * hi ≤ 0 erfc(z) = 2 − erfc(−z) turns them into 2h − (the mirrored weight) without
 * cancellation (the mirrored weight is at most h); a segment across 0 is split there. On
 * narrow segments (h &lt; ½ and 2h·|lo + hi| &lt; 1), where the closed forms would cancel,
 * the 10-point Gauss–Legendre rule sums positive terms (as {@link SegmentIntegrals}).
 */
final class WallIntegrals {

    private static final double SQRT_PI = SegmentIntegrals.SQRT_PI;

    private WallIntegrals() {
    }

    // ---------------------------------------------------------------- Gaussian hats, scaled

    /**
     * Returns rising(m, h) (see SegmentIntegrals) times exp(ref²), ref = lo if lo ≥ 0, hi if
     * hi ≤ 0, and 0 (no scaling) when the segment contains 0.
     *
     * @param m centre
     * @param h half-width, &gt; 0
     * @param lo lower end (≈ m − h)
     * @param hi upper end (≈ m + h)
     * @return the scaled weight of the end hi
     */
    static double risingScaled(double m, double h, double lo, double hi) {
        if (h == 0) {
            return 0.0;
        }
        if (lo < 0 && hi > 0) {
            return SegmentIntegrals.rising(m, h, lo, hi);
        }
        final boolean right = lo >= 0;
        final double ref = right ? lo : hi;
        if (h < 0.5 && 4 * Math.abs(m) * h < 1) {
            double sum = 0;
            for (int k = GaussLegendre.halfSize() - 1; k >= 0; k--) {
                final double u = GaussLegendre.node(k);
                final double d = h * u;
                sum += GaussLegendre.weight(k) * ((1 + u) * shifted(m + d, ref, right ? h * (u + 1)
                    : h * (u - 1)) + (1 - u) * shifted(m - d, ref, right ? h * (1 - u)
                    : -h * (u + 1)));
            }
            return h * sum * (0.5 * SegmentIntegrals.ONE_OVER_SQRT_PI);
        }
        final double twoH = 2 * h;
        final double p;
        if (right) {
            // P·e^{lo²} = T₁s(lo) − e^{lo² − hi²}·(T₁s(hi) + 2h·T₀s(hi))
            final double e = Math.exp(-twoH * (lo + hi));
            p = t1s(lo) - e * (t1s(hi) + twoH * t0s(hi));
        } else {
            // P·e^{hi²} = 2h·T₀s(−hi) − T₁s(−hi) + e^{hi² − lo²}·T₁s(−lo)
            final double e = Math.exp(twoH * (hi + lo));
            p = twoH * t0s(-hi) - t1s(-hi) + e * t1s(-lo);
        }
        return Math.max(0.0, p) / (twoH * SQRT_PI);
    }

    /** exp(ref² − z²) = exp(−(z − ref)(z + ref)), with z − ref = diff given exactly. */
    private static double shifted(double z, double ref, double diff) {
        return Math.exp(-diff * (z + ref));
    }

    /** T₀(y)·e^{y²} = (√π/2)·erfcx(y). */
    private static double t0s(double y) {
        return 0.5 * SQRT_PI * ErrorFunctions.erfcx(y);
    }

    /** T₁(y)·e^{y²} = −(√π/4)·erfcx′(y). */
    private static double t1s(double y) {
        return -0.25 * SQRT_PI * ErrorFunctions.erfcxDerivative(y);
    }

    // ---------------------------------------------------------------- erfc hats

    /**
     * Returns the erfc hat weight of the end hi (high) or lo (low), for lo ≥ 0 multiplied by
     * exp(lo²), otherwise unscaled (then lo &lt; 0 and the caller's factor is ≤ 1).
     *
     * @param lo lower end
     * @param hi upper end, &gt; lo
     * @param h half-width (hi − lo)/2
     * @param high true for the weight of hi
     * @return the weight (scaled if lo ≥ 0)
     */
    static double erfcHat(double lo, double hi, double h, boolean high) {
        if (!(h > 0)) {
            return 0.0;
        }
        if (lo >= 0) {
            return erfcHatRight(lo, hi, h, high);
        }
        if (hi <= 0) {
            // erfc(z) = 2 − erfc(−z): w = −z on [−hi, −lo], the weight of hi becomes that of
            // −hi (the low end of the mirrored segment) and vice versa
            final double mirrored = erfcHatRight(-hi, -lo, h, !high)
                * Exponentials.expMinusSquare(hi);
            return h - mirrored + h;
        }
        // across 0: [lo, 0] (half-width hl) and [0, hi] (half-width hr), the linear weight
        // carried onto each part (all terms non-negative)
        final double hl = -0.5 * lo;
        final double hr = 0.5 * hi;
        final double leftLow = erfcHat(lo, 0.0, hl, false);
        final double leftHigh = erfcHat(lo, 0.0, hl, true);
        final double rightLow = erfcHatRight(0.0, hi, hr, false);
        final double rightHigh = erfcHatRight(0.0, hi, hr, true);
        if (high) {
            // (z − lo)/(2h): on the left (hl/h)·(z − lo)/(2hl); on the right
            // (hr/h)·z/(2hr) + (−lo)/(2h)
            return (hl / h) * leftHigh + (hr / h) * rightHigh + (-lo / (2 * h))
                * (rightLow + rightHigh);
        }
        // (hi − z)/(2h): on the right (hr/h)·(hi − z)/(2hr); on the left
        // (hl/h)·(0 − z)/(2hl) + hi/(2h)
        return (hr / h) * rightLow + (hl / h) * leftLow + (hi / (2 * h)) * (leftLow + leftHigh);
    }

    /** The weights for 0 ≤ lo &lt; hi, times exp(lo²). */
    private static double erfcHatRight(double lo, double hi, double h, boolean high) {
        final double m = 0.5 * lo + 0.5 * hi;
        if (h < 0.5 && 2 * h * (lo + hi) < 1) {
            double sum = 0;
            for (int k = GaussLegendre.halfSize() - 1; k >= 0; k--) {
                final double u = GaussLegendre.node(k);
                final double d = h * u;
                final double zp = m + d;
                final double zm = m - d;
                // erfc(z)·e^{lo²} = erfcx(z)·exp(−(z − lo)(z + lo))
                final double fp = ErrorFunctions.erfcx(zp) * Math.exp(-(h * (1 + u)) * (zp + lo));
                final double fm = ErrorFunctions.erfcx(zm) * Math.exp(-(h * (1 - u)) * (zm + lo));
                // weight of hi at z = m + hu is (1 + u)/2, of lo (1 − u)/2
                sum += GaussLegendre.weight(k) * (high ? (1 + u) * fp + (1 - u) * fm
                    : (1 - u) * fp + (1 + u) * fm);
            }
            return 0.5 * h * sum;
        }
        final double twoH = 2 * h;
        final double e = Math.exp(-twoH * (lo + hi));
        final double r;
        if (high) {
            r = i2s(lo) - e * (i2s(hi) + twoH * i1s(hi));
        } else {
            r = twoH * i1s(lo) - i2s(lo) + e * i2s(hi);
        }
        return Math.max(0.0, r) / twoH;
    }

    /** e^{z²}·i¹erfc(z) = −½·erfcx′(z). */
    static double i1s(double z) {
        return -0.5 * ErrorFunctions.erfcxDerivative(z);
    }

    /** e^{z²}·i²erfc(z) = ⅛·erfcx″(z). */
    static double i2s(double z) {
        return 0.125 * ErrorFunctions.erfcxSecondDerivative(z);
    }

    /**
     * Returns i¹erfc(z) = ∫_z^∞ erfc for z &lt; 0, e^{−z²}/√π − z·erfc(z) (two non-negative
     * terms).
     *
     * @param z negative argument
     * @return i¹erfc(z)
     */
    static double i1Negative(double z) {
        return Exponentials.expMinusSquare(z) * SegmentIntegrals.ONE_OVER_SQRT_PI
            - z * ErrorFunctions.erfc(z);
    }
}
