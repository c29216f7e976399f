package org.advecta.internal;

import org.apache.commons.numbers.gamma.Erf;
import org.apache.commons.numbers.gamma.Erfc;
import org.apache.commons.numbers.gamma.Erfcx;

/**
 * e^s·(erf(hi) − erf(lo)) for lo ≤ hi, from the two end arguments themselves: when both lie
 * on one side of 0, as the tails' difference with one shared exponential (the erfcx form),
 * else as a sum of two erf values of one sign. The ends are taken as given, so a caller that
 * can form each from its own inputs (x − a rather than m + h of a wide slug) keeps their
 * rounding apart from the width's; a shared exponential e^{s − lo²} carries the decay, so a
 * small difference is never formed from an underflowed one (Commons Numbers' erfcx, a port of
 * Boost.Math's rational approximations). Not exported from the module.
 */
public final class ScaledErfDifference {

    /**
     * Below this argument Commons Numbers' erfcx goes through StrictMath.expm1 (slow), and
     * erfc itself is far from underflow: the two erfc values are used instead.
     */
    private static final double ERFCX_FROM = 0.5;

    private ScaledErfDifference() {
    }

    /**
     * Returns e^s·(erf(hi) − erf(lo)), for intervals with hi − lo ≥ 1 or |hi² − lo²| ≥ 4:
     * there the tails' two terms differ by a factor e² at least, so that their difference
     * loses under one bit (a narrower interval cancels in this form; the centred series of
     * ErrorFunctions.erfDifferenceCentred is made for it, and InitialSlug takes this form only
     * outside that series' range, h &gt; 1/2 or |m|·h &gt; 1).
     *
     * @param lo the lower end
     * @param hi the upper end, ≥ lo
     * @param s the exponent of the scale
     * @return the scaled difference, ≥ 0
     */
    public static double value(double lo, double hi, double s) {
        if (lo >= 0) {
            return tails(lo, hi, s);
        }
        if (hi <= 0) {
            return tails(-hi, -lo, s);
        }
        return ScaledExp.value(Erf.value(hi) - Erf.value(lo), s, 0.0);
    }

    /** e^s·(erfc(lo) − erfc(hi)) for 0 ≤ lo ≤ hi. */
    private static double tails(double lo, double hi, double s) {
        if (lo < ERFCX_FROM) {
            return ScaledExp.value(Erfc.value(lo) - Erfc.value(hi), s, 0.0);
        }
        // erfc(lo) − erfc(hi) = e^{−lo²}·[erfcx(lo) − e^{lo² − hi²}·erfcx(hi)], with
        // hi² − lo² = (hi − lo)(hi + lo) formed from the ends' difference and sum
        final double bracket = Erfcx.value(lo)
            - Math.exp(-(hi - lo) * (hi + lo)) * Erfcx.value(hi);
        return ScaledExp.value(bracket, s, lo);
    }
}
