package org.advecta.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;
import org.advecta.special.ErrorFunctions;

/**
 * e^s·(erf(hi) − erf(lo)) from the two ends, against the library's centred difference (a
 * different route: a series, or erfcx from m ± h) and by its exact symmetries. Its values
 * are checked to the contract through InitialSlug's fixtures (initial_slug_wide.csv).
 */
class ScaledErfDifferenceProperties {

    private static final double EPS = Math.ulp(1.0);

    /**
     * The same difference as erfDifferenceCentred(m, h, s) with m = (lo + hi)/2 and
     * h = (hi − lo)/2, for intervals 1 to 12 wide (the wide slugs that take this form; the
     * other part of its domain, narrow intervals far from 0, is checked through the slug's
     * fixtures). Tolerance: each side a few ulps, times the rounding of its exponent, about
     * 1 + n² + |s| ulps with n the end nearer 0 when both ends share a sign (else n = 0):
     * 16·(2 + n² + |s|)·ε relative.
     */
    @Property(tries = 3000)
    void agreesWithTheCentredForm(@ForAll @DoubleRange(min = -30, max = 30) @Scale(6) double lo,
                                  @ForAll @DoubleRange(min = 1, max = 12) @Scale(6)
                                  double width,
                                  @ForAll @DoubleRange(min = -100, max = 100) @Scale(3)
                                  double s) {
        final double hi = lo + width;
        final double m = 0.5 * lo + 0.5 * hi;
        final double h = 0.5 * hi - 0.5 * lo;
        final double ends = ScaledErfDifference.value(lo, hi, s);
        final double centred = ErrorFunctions.erfDifferenceCentred(m, h, s);
        final double near = Math.min(lo * lo, hi * hi) * (lo * hi > 0 ? 1 : 0);
        assertTrue(ends >= 0, () -> "negative at " + lo + ", " + hi + ", " + s);
        assertEquals(centred, ends, 16 * (2 + near + Math.abs(s)) * EPS * centred
            + Double.MIN_VALUE, () -> lo + ", " + hi + ", s = " + s);
    }

    /** Mirror symmetry: erf(hi) − erf(lo) = erf(−lo) − erf(−hi), to the bit. */
    @Property(tries = 1000)
    void mirrorSymmetric(@ForAll @DoubleRange(min = -30, max = 30) double lo,
                         @ForAll @DoubleRange(min = 0, max = 10) double width,
                         @ForAll @DoubleRange(min = -50, max = 50) double s) {
        final double hi = lo + width;
        assertEquals(ScaledErfDifference.value(lo, hi, s), ScaledErfDifference.value(-hi, -lo, s));
    }
}
