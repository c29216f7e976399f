package org.advecta.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Every "Special cases" line of the javadoc in this package, and sweeps across each branch
 * point that assert continuity and monotonicity on both sides of it.
 */
class SpecialCasesTest {

    private static final double INF = Double.POSITIVE_INFINITY;
    private static final double NAN = Double.NaN;

    @Test
    void erfSpecialCases() {
        assertEquals(0.0, ErrorFunctions.erf(0.0));
        assertEquals(-0.0, ErrorFunctions.erf(-0.0));
        assertEquals(1.0, ErrorFunctions.erf(INF));
        assertEquals(-1.0, ErrorFunctions.erf(-INF));
        assertEquals(NAN, ErrorFunctions.erf(NAN));
    }

    @Test
    void erfcSpecialCases() {
        assertEquals(2.0, ErrorFunctions.erfc(-INF));
        assertEquals(0.0, ErrorFunctions.erfc(INF));
        assertEquals(NAN, ErrorFunctions.erfc(NAN));
        // "subnormal for x above about 26.55 and rounds to 0 above about 27.23"
        assertTrue(ErrorFunctions.erfc(26.5) >= Double.MIN_NORMAL);
        final double sub = ErrorFunctions.erfc(26.6);
        assertTrue(sub > 0 && sub < Double.MIN_NORMAL, () -> "erfc(26.6) = " + sub);
        assertTrue(ErrorFunctions.erfc(27.2) > 0);
        assertEquals(0.0, ErrorFunctions.erfc(27.3));
    }

    @Test
    void erfcxSpecialCases() {
        assertEquals(0.0, ErrorFunctions.erfcx(INF));
        assertEquals(INF, ErrorFunctions.erfcx(-INF));
        assertEquals(NAN, ErrorFunctions.erfcx(NAN));
        // "+∞ for x below about −26.63 where 2·exp(x²) overflows"
        assertTrue(ErrorFunctions.erfcx(-26.6) < INF);
        assertEquals(INF, ErrorFunctions.erfcx(-26.7));
        assertEquals(1.0, ErrorFunctions.erfcx(0.0));
    }

    @Test
    void erfDifferenceSpecialCases() {
        assertEquals(NAN, ErrorFunctions.erfDifference(NAN, 1));
        assertEquals(NAN, ErrorFunctions.erfDifference(1, NAN));
        assertEquals(0.0, ErrorFunctions.erfDifference(7.5, 7.5));
        assertEquals(0.0, ErrorFunctions.erfDifference(-3, -3));
        assertEquals(2.0, ErrorFunctions.erfDifference(INF, -INF));
        assertEquals(-2.0, ErrorFunctions.erfDifference(-INF, INF));
        assertEquals(ErrorFunctions.erfc(6), ErrorFunctions.erfDifference(INF, 6));
    }

    @Test
    void logErfcSpecialCases() {
        assertEquals(Math.log(2), ErrorFunctions.logErfc(-INF));
        assertEquals(-INF, ErrorFunctions.logErfc(INF));
        assertEquals(NAN, ErrorFunctions.logErfc(NAN));
        assertEquals(-INF, ErrorFunctions.logErfc(1.35e154), "−x² below −MAX_VALUE");
        assertTrue(ErrorFunctions.logErfc(1.3e154) > -INF);
        assertEquals(-0.0, ErrorFunctions.logErfc(0.0));
        assertEquals(0.0, ErrorFunctions.logErfc(-0.0));
        // finite where erfc itself underflows
        assertTrue(ErrorFunctions.logErfc(30) > -INF && ErrorFunctions.erfc(30) == 0);
    }

    @Test
    void expErfcSpecialCases() {
        assertEquals(NAN, ExpErfc.value(NAN, 1));
        assertEquals(NAN, ExpErfc.value(1, NAN));
        assertEquals(NAN, ExpErfc.value(INF, NAN));
        assertEquals(NAN, ExpErfc.value(INF, INF), "∞·0");
        assertEquals(0.0, ExpErfc.value(-INF, 3));
        assertEquals(0.0, ExpErfc.value(-INF, -INF));
        assertEquals(0.0, ExpErfc.value(1e300, INF));
        assertEquals(INF, ExpErfc.value(INF, 1e300));
        assertEquals(Math.exp(1.5) * 2, ExpErfc.value(1.5, -INF));
        assertEquals(1.0, ExpErfc.value(0, 0));
        // +∞ only where the exact value exceeds MAX_VALUE: exp(709.5)·erfc(−1) ≈ 2.4e308
        // overflows while exp(709.5)·erfc(1) ≈ 2.4e307 does not.
        assertEquals(INF, ExpErfc.value(709.5, -1));
        assertTrue(ExpErfc.value(709.5, 1) < INF);
        // a large b squared overflows: the product is 0, not NaN
        assertEquals(0.0, ExpErfc.value(1e300, 1e160));
    }

    @Test
    void expMinusSquareSpecialCases() {
        assertEquals(0.0, Exponentials.expMinusSquare(INF));
        assertEquals(0.0, Exponentials.expMinusSquare(-INF));
        assertEquals(NAN, Exponentials.expMinusSquare(NAN));
        assertEquals(1.0, Exponentials.expMinusSquare(0x1.0p-27));
        assertTrue(Exponentials.expMinusSquare(Math.nextUp(0x1.0p-27)) < 1.0);
        assertEquals(0.0, Exponentials.expMinusSquare(27.3));
        assertTrue(Exponentials.expMinusSquare(27.2) > 0);
        assertEquals(NAN, Exponentials.expMinusSquare(NAN, 1));
        assertEquals(NAN, Exponentials.expMinusSquare(1, NAN));
        assertEquals(0.0, Exponentials.expMinusSquare(-INF, 3));
        assertEquals(0.0, Exponentials.expMinusSquare(5, INF));
        assertEquals(INF, Exponentials.expMinusSquare(INF, 3));
        assertEquals(NAN, Exponentials.expMinusSquare(INF, -INF));
        // exp(s) alone overflows, exp(s − x²) does not: exp(1000 − 30²) = exp(100)
        assertEquals(Math.exp(100), Exponentials.expMinusSquare(1000, 30),
            2 * Math.ulp(Math.exp(100)));
    }

    /**
     * ExpErfc switches formula at b = 0; the product engine switches at exponents 709 and
     * −708. Sweep consecutive doubles across each and check continuity and monotonicity.
     */
    @Test
    void expErfcIsContinuousAndMonotoneAcrossItsBranchPoints() {
        // b across 0: exp(a)·erfc(b) is decreasing in b.
        double b = -64 * Double.MIN_VALUE;
        double previous = ExpErfc.value(3.0, b);
        boolean crossed = false;
        for (int i = 0; i < 128; i++) {
            b = Math.nextUp(b);
            final double value = ExpErfc.value(3.0, b);
            assertTrue(value <= previous, "monotone in b at " + b);
            assertEquals(Math.exp(3.0), value, 2 * Math.ulp(value));
            crossed |= b > 0;
            previous = value;
        }
        assertTrue(crossed && b > 0, "the sweep reached b > 0");
        for (double edge : new double[] {709.0, -708.0}) {
            double a = edge - 64 * Math.ulp(edge);
            previous = ExpErfc.value(a, 0.0);
            for (int i = 0; i < 128; i++) {
                a = Math.nextUp(a);
                final double value = ExpErfc.value(a, 0.0);
                assertTrue(value >= previous, "monotone in a at " + a);
                // erfc(0) = 1 and exp(a) is a normal double on both sides of these edges
                assertEquals(Math.exp(a), value, 2 * Math.ulp(value), "at a = " + a);
                previous = value;
            }
            assertTrue(a > edge, "the sweep crossed " + edge);
        }
    }

    /**
     * logErfc switches formula at x = 1/2. Consecutive doubles across it must not jump by more
     * than the two branches' stated accuracies together (4 + 4 ULP). (Monotonicity is asserted only between points 128
     * ulp apart: the underlying erf of Commons Numbers is not semi-monotone at the ulp level,
     * and we do not claim that logErfc is.)
     */
    @Test
    void logErfcIsContinuousAcrossItsBranchPoint() {
        final double edge = 0.5;
        double x = edge - 64 * Math.ulp(edge);
        final double first = ErrorFunctions.logErfc(x);
        double previous = first;
        // below 0.5 the spacing of doubles is half of ulp(0.5): 256 steps reach 0.5 + 64 ulp
        for (int i = 0; i < 256; i++) {
            x = Math.nextUp(x);
            final double value = ErrorFunctions.logErfc(x);
            assertEquals(previous, value, 8 * Math.ulp(value), "jump at " + x);
            previous = value;
        }
        assertTrue(x > edge, "the sweep crossed " + edge);
        assertTrue(previous < first, "decreasing across the switch");
    }
}
