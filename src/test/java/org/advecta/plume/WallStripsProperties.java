package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.special.ErrorFunctions;
import org.junit.jupiter.api.Test;

/**
 * The absorbing wall's strip factor of the patch source ({@link WallStrips}): the scaled
 * Gaussian mass E(p, h) against the erf difference where that does not cancel, continuity
 * across its switch between series and erfc form (straddled, both sides asserted), and the
 * factor's identity S(c) − S(c') against the two strips where they do not cancel.
 */
class WallStripsProperties {

    @Property(tries = 500)
    void scaledDifferenceIsTheErfDifference(
            @ForAll @DoubleRange(min = 0, max = 4) double p,
            @ForAll @DoubleRange(min = 0.05, max = 3) double h) {
        // 2h ≥ 0.1 and p ≤ 4: erf(p + 2h) − erf(p) ≥ e^(−(p + 2h)²)·0.1 loses at most a few
        // digits to cancellation, κ ≤ 2·4.1·0.2/0.1 < 20 (common practice bound)
        final double direct = ErrorFunctions.erfDifference(p + 2 * h, p) * Math.exp(p * p);
        final double e = WallStrips.scaledDifference(p, h);
        assertEquals(direct, e, 1e-13 * direct, "p = " + p + ", h = " + h);
    }

    @Test
    void switchBetweenSeriesAndErfcFormIsStraddled() {
        // the switch is at 4mh = 1, m = p + h, for h < 1/2: sweep 200 consecutive doubles of p
        // about p* = 1/(4h) − h and assert that both sides were seen and the value is
        // continuous (relative steps of a few ULP only)
        for (double h : new double[] {0.01, 0.1, 0.3, 0.49}) {
            final double star = 1 / (4 * h) - h;
            double p = star;
            for (int i = 0; i < 100; i++) {
                p = Math.nextDown(p);
            }
            boolean below = false;
            boolean above = false;
            double previous = WallStrips.scaledDifference(p, h);
            for (int i = 0; i < 200; i++) {
                p = Math.nextUp(p);
                final double m = p + h;
                below |= 4 * m * h < 1;
                above |= 4 * m * h >= 1;
                final double e = WallStrips.scaledDifference(p, h);
                assertTrue(Math.abs(e - previous) <= 1e-14 * e,
                    "jump at p = " + p + ", h = " + h + ": " + previous + " -> " + e);
                previous = e;
            }
            assertTrue(below && above, "the sweep straddles the switch at h = " + h);
        }
    }

    @Property(tries = 500)
    void nearTheWallItIsLinearInTheDistance(
            @ForAll @DoubleRange(min = 0, max = 30) double p,
            @ForAll @DoubleRange(min = -12, max = -4) double logH) {
        // E(p, h) = (4h/√π)·e^(−h(2p + h))·(1 + O(mh)), here mh ≤ 31·1e-4: positive and
        // proportional to h to within 2mh + h² (the series' sum lies in [e^(−2mh−h²), e^(2mh)])
        final double h = Math.pow(10, logH);
        final double e = WallStrips.scaledDifference(p, h);
        final double lead = 4 * h / Math.sqrt(Math.PI) * Math.exp(-h * (2 * p + h));
        final double m = p + h;
        assertTrue(e > 0, "positive");
        assertEquals(lead, e, lead * (Math.expm1(2 * m * h + h * h) + 1e-15),
            "p = " + p + ", h = " + h);
    }

    @Property(tries = 500)
    void absorbingFactorIsTheStripMinusItsMirror(
            @ForAll @DoubleRange(min = 0.05, max = 3) double gap,
            @ForAll @DoubleRange(min = 0.05, max = 3) double width,
            @ForAll @DoubleRange(min = 0, max = 8) double pointFromWall,
            @ForAll @DoubleRange(min = 0.3, max = 5) double w,
            @ForAll boolean above) {
        // where the two strips differ by at least 1 % the direct difference keeps 13 digits
        final double position = 1.0;
        final int side = above ? 1 : -1;
        final double lo = above ? position + gap : position - gap - width;
        final double hi = lo + width;
        final double c = position + side * pointFromWall;
        final double mirror = 2 * position - c;
        final double d = c > hi ? c - hi : c < lo ? lo - c : 0.0;
        final double dm = mirror > hi ? mirror - hi : mirror < lo ? lo - mirror : 0.0;
        final double s = PatchSource3D.scaledStrip(c, lo, hi, w);
        final double sm = PatchSource3D.scaledStrip(mirror, lo, hi, w)
            * Math.exp((d * d - dm * dm) / (w * w));
        final double[] out = new double[2];
        WallStrips.absorbing(c, lo, hi, w, position, side, out);
        assertTrue(out[0] >= 0 && out[0] <= s * (1 + 1e-15), "between 0 and the strip");
        assertTrue(out[1] >= 1, "cancellation ratio ≥ 1");
        if (s - sm > 0.01 * s) {
            assertEquals(s - sm, out[0], 1e-12 * s, "strip minus mirror at c = " + c
                + ", [" + lo + ", " + hi + "], w = " + w);
        }
        WallStrips.reflecting(c, lo, hi, w, position, out);
        assertEquals(s + sm, out[0], 1e-14 * (s + sm), "reflecting");
    }
}
