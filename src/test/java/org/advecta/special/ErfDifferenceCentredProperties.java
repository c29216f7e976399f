package org.advecta.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

/**
 * Exact identities of erf(m + h) − erf(m − h) that hold for all inputs, across the branches of
 * {@link ErrorFunctions#erfDifferenceCentred} (the series for h ≤ 1/2, |m|h ≤ 1, the erfc and
 * erf forms outside it). The fixtures check values; these check that the branches fit
 * together.
 */
class ErfDifferenceCentredProperties {

    private static final double EPS = Math.ulp(1.0);

    /**
     * Splitting the interval at its centre: D(m, h) = D(m − h/2, h/2) + D(m + h/2, h/2), a sum
     * of two positive terms. Tolerance: the rounding of m ± h/2 moves a narrow interval's
     * value by about 2|m|·ulp(m) relative, so 64·(1 + m²)·ε relative (|m| ≤ 6, h from 1e-6
     * to 3, log-uniform).
     */
    @Property(tries = 2000)
    void halvesAddUp(@ForAll @DoubleRange(min = -6, max = 6) @Scale(12) double m,
                     @ForAll @DoubleRange(min = -6, max = 0.477) @Scale(12) double log10H) {
        final double h = Math.pow(10, log10H);
        final double whole = ErrorFunctions.erfDifferenceCentred(m, h);
        final double halves = ErrorFunctions.erfDifferenceCentred(m - 0.5 * h, 0.5 * h)
            + ErrorFunctions.erfDifferenceCentred(m + 0.5 * h, 0.5 * h);
        assertTrue(whole > 0 && whole <= 2, () -> "D(" + m + ", " + h + ") = " + whole);
        assertEquals(whole, halves, 64 * (1 + m * m) * EPS * whole,
            () -> "m = " + m + ", h = " + h);
    }

    /** The difference is even in m, to the bit. */
    @Property(tries = 1000)
    void evenInTheCentre(@ForAll @DoubleRange(min = -30, max = 30) @Scale(12) double m,
                         @ForAll @DoubleRange(min = 0, max = 5) @Scale(12) double h) {
        assertEquals(ErrorFunctions.erfDifferenceCentred(m, h),
            ErrorFunctions.erfDifferenceCentred(-m, h));
    }

    /**
     * The scaled form is the plain form times e^s: both within a few ulp, e^s within one, and
     * the rounding of s − h² in the exponent adds |s|·ε; tolerance 8·(4 + |s|)·ε relative.
     */
    @Property(tries = 2000)
    void scaleIsAFactor(@ForAll @DoubleRange(min = -6, max = 6) @Scale(12) double m,
                        @ForAll @DoubleRange(min = -6, max = 0.477) @Scale(12) double log10H,
                        @ForAll @DoubleRange(min = -50, max = 50) @Scale(12) double s) {
        final double h = Math.pow(10, log10H);
        final double scaled = ErrorFunctions.erfDifferenceCentred(m, h, s);
        final double product = ErrorFunctions.erfDifferenceCentred(m, h) * Math.exp(s);
        assertEquals(product, scaled, 8 * (4 + Math.abs(s)) * EPS * product,
            () -> "m = " + m + ", h = " + h + ", s = " + s);
    }
}
