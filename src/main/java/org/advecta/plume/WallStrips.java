package org.advecta.plume;

import org.advecta.internal.CentredErfSeries;
import org.advecta.internal.ScaledExp;
import org.advecta.special.ErrorFunctions;

/**
 * The patch source's transverse strip factor beside a wall, with its image inside: for a
 * reflecting wall S(c) + S(c'), for an absorbing one S(c) − S(c') (c' = 2c_w − c, S the strip
 * factor of {@link PatchSource3D#scaledStrip}), both scaled, like S, by e^(d²/w²) with d the
 * distance from c to the strip. The absorbing difference is formed so that no two nearly
 * equal O(1) quantities are subtracted near the wall, and each call reports the cancellation
 * ratio that remains.
 *
 * <p>With Y = |c − c_w| the point's distance from the wall and [a₁, a₂] the strip's
 * (a₁ &gt; 0), S(c) − S(c') = ½[H(a₁) − H(a₂)], H(a) = erf((a + Y)/w) − erf((a − Y)/w), the
 * mass of the Gaussian over [a − Y, a + Y] (exact algebra: erf is odd). H(a) is proportional
 * to Y near the wall and is computed without cancellation (below), and H(a₁) ≥ H(a₂), whose
 * ratio depends on Y only weakly; what is left cancels only when the strip is narrow beside
 * the spread w (late times), by the ratio κ = (H(a₁) + H(a₂))/(H(a₁) − H(a₂)). Beyond the
 * strip (Y &gt; a₂) the two H are near 2 and cancel instead; there the direct difference of
 * the strip and its mirror is used, which cancels only when w ≫ a₁ + a₂.
 *
 * <p>Stateless; the results go into a caller-supplied array (no allocation per call).
 */
final class WallStrips {

    /** √π. */
    private static final double SQRT_PI = Math.sqrt(Math.PI);
    /** 4/√π. */
    private static final double FOUR_OVER_SQRT_PI = 2.256758334191025;
    /** The cancellation ratio reported where the difference rounds to ≤ 0 (a bound of 1). */
    static final double NO_DIGITS = 0x1.0p49;

    private WallStrips() {
    }

    /**
     * e^(d²/w²)·[S(c) − S(c')] for an absorbing wall at position with the strip [lo, hi] on
     * its side (+1 above, −1 below): out[0] the value (≥ 0), out[1] the cancellation ratio
     * (A + B)/(A − B) of the difference A − B it was formed as (≥ 1).
     */
    static void absorbing(double c, double lo, double hi, double w, double position, int side,
                          double[] out) {
        final double y = side * (c - position);
        final double nearGap = side > 0 ? lo - c : c - hi;    // a₁ − Y
        final double farGap = side > 0 ? hi - c : c - lo;     // a₂ − Y
        final double h = y / w;
        double big;
        double small;
        if (nearGap > 0) {
            // between the wall and the strip, d = a₁ − Y: ½[H(a₁) − H(a₂)] e^(d²/w²), with
            // e^(d²/w²) H(a₂) = e^(p² − q²) E(q, h), q = p + width (as in scaledStrip)
            final double p = nearGap / w;
            final double width = (hi - lo) / w;
            final double q = p + width;
            big = 0.5 * scaledDifference(p, h);
            small = 0.5 * scaleDown(scaledDifference(q, h), -width * (q + p));
        } else if (farGap >= 0) {
            // on the strip, d = 0: H(a₁) = erf((a₁ + Y)/w) + erf((Y − a₁)/w), two terms ≥ 0;
            // H(a₂) = e^(−p²) E(p, h), p = (a₂ − Y)/w
            final double aNear = side > 0 ? lo - position : position - hi;
            big = 0.5 * (ErrorFunctions.erf((aNear + y) / w) + ErrorFunctions.erf(-nearGap / w));
            final double p = farGap / w;
            small = 0.5 * ScaledExp.value(scaledDifference(p, h), 0.0, p);
        } else {
            // beyond the strip, d = Y − a₂: the strip minus its mirror, both scaled by
            // e^(d²/w²); the mirror lies d' = Y + a₁ from the strip
            final double d = -farGap;
            final double mirror = 2 * position - c;
            final double dMirror = side > 0 ? lo - mirror : mirror - hi;
            big = PatchSource3D.scaledStrip(c, lo, hi, w);
            small = scaleDown(PatchSource3D.scaledStrip(mirror, lo, hi, w),
                -((dMirror - d) / w) * ((dMirror + d) / w));
        }
        finish(big, small, out);
    }

    /**
     * e^(d²/w²)·[S(c) + S(c')] for a reflecting wall (the strip may touch it): out[0] the
     * value, out[1] = 0 (a sum of two terms ≥ 0: nothing cancels).
     */
    static void reflecting(double c, double lo, double hi, double w, double position,
                           double[] out) {
        final double d = outside(c, lo, hi);
        final double mirror = 2 * position - c;
        final double dMirror = outside(mirror, lo, hi);
        out[0] = PatchSource3D.scaledStrip(c, lo, hi, w)
            + scaleDown(PatchSource3D.scaledStrip(mirror, lo, hi, w),
                -((dMirror - d) / w) * ((dMirror + d) / w));
        out[1] = 0;
    }

    /**
     * An upper bound on the absorbing factor of {@link #absorbing} at spread w. From
     * S(c) − S(c') = ½∫ −H′(a) da over [a₁, a₂] with
     * −H′(a) = (2/(w√π))·e^(−(a − Y)²/w²)·(1 − e^(−4aY/w²)) and (a − Y)² ≥ d² on the strip's
     * distances: the scaled factor is at most (a₂ − a₁)/(√π w) and at most
     * 4a₂Y(a₂ − a₁)/(√π w³); where Y ≤ a₂ also at most ½H(a₁) ≤ 2Y/(√π w) (a Gaussian mass over
     * a width 2Y/w); and at most 1. With left = true: the coefficient min(2Y, a₂ − a₁)/(√π w)
     * alone (the bound's 1/w form, for the tail towards τ = 0).
     */
    static double bound(double c, double lo, double hi, double w, double position, int side,
                        boolean left) {
        final double y = side * (c - position);
        final double aFar = side > 0 ? hi - position : position - lo;
        final double width = hi - lo;
        final double linear = Math.min(2 * y, width) / (SQRT_PI * w);
        if (left) {
            return linear;
        }
        final double cubic = 4 * (aFar / w) * (y / w) * (width / w) / SQRT_PI;
        return Math.min(1.0, Math.min(linear, cubic));
    }

    private static void finish(double big, double small, double[] out) {
        final double diff = big - small;
        if (diff > 0) {
            out[0] = diff;
            out[1] = (big + small) / diff;
        } else {
            out[0] = 0;
            out[1] = big > 0 ? NO_DIGITS : 1;
        }
    }

    /** Distance from c to [lo, hi] (0 inside). */
    private static double outside(double c, double lo, double hi) {
        return c > hi ? c - hi : c < lo ? lo - c : 0.0;
    }

    /** x·e^e for e ≤ 0, 0 where e is −∞ or x·e^e underflows. */
    private static double scaleDown(double x, double e) {
        return e > -1456 ? ScaledExp.value(x, e, 0.0) : 0.0;
    }

    /**
     * E(p, h) = e^(p²)·[erf(p + 2h) − erf(p)] for p ≥ 0, h ≥ 0, without cancellation: the
     * scaled mass of the Gaussian over [p, p + 2h], centre m = p + h.
     * <pre>
     * narrow (h &lt; 1/2, 4mh &lt; 1):  (4h/√π)·e^(−2mh)·Σ_j (2mh)^(2j)/(2j)!·g_j,
     *     g_j = (1 + 2h²·g_(j+1))/(2j + 1)
     * otherwise (then 4mh ≥ 1):     erfcx(p) − e^(−4mh)·erfcx(p + 2h)
     * </pre>
     * The series is the one of {@link CentredErfSeries} (and of
     * {@link ErrorFunctions#erfDifferenceCentred}) multiplied by e^(p²)
     * (e^(p² − m² − h²) = e^(−2mh)); its terms are all positive, so it cannot cancel. In
     * the erfc form (A&amp;S 7.1.2) the second term is at most e^(−1) of the first (erfcx
     * decreases), a loss of at most a factor 1.6.
     */
    static double scaledDifference(double p, double h) {
        if (h == 0) {
            return 0.0;
        }
        final double m = p + h;
        if (h < 0.5 && 4 * m * h < 1) {
            return FOUR_OVER_SQRT_PI * h * CentredErfSeries.sum(m, h) * Math.exp(-2 * h * m);
        }
        final double q = p + 2 * h;
        return ErrorFunctions.erfcx(p) - scaleDown(ErrorFunctions.erfcx(q), -2 * h * (p + q));
    }
}
