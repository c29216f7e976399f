package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

/**
 * Pinned internal assumptions of {@link TimeWindow}: the differences t − tₖ are exact as
 * hi + lo, and each window end is ln(τ/τ_n) of the exact τ within its stated rounding bound
 * (checked against a 40-digit logarithm by the atanh series, ln q = 2 atanh((q − 1)/(q + 1)),
 * with ln 2 = 2 atanh(1/3): an exact identity, not a recalled constant).
 */
class TimeWindowProperties {

    private static final MathContext MC = new MathContext(45);
    private static final double ROUNDING = 0x1.0p-53;

    /** 2 atanh(z) = 2 Σ z^(2j+1)/(2j+1), |z| ≤ 1/3, to 45 digits. */
    private static BigDecimal twoAtanh(BigDecimal z) {
        BigDecimal sum = BigDecimal.ZERO;
        final BigDecimal z2 = z.multiply(z, MC);
        BigDecimal power = z;
        for (int j = 0; j < 200; j++) {
            final BigDecimal term = power.divide(BigDecimal.valueOf(2L * j + 1), MC);
            sum = sum.add(term, MC);
            if (term.abs().compareTo(new BigDecimal("1e-50")) < 0) {
                break;
            }
            power = power.multiply(z2, MC);
        }
        return sum.multiply(BigDecimal.valueOf(2), MC);
    }

    /** ln q for q &gt; 0, to about 40 digits: q = 2^k m with m ∈ [1/√2·…, 2]. */
    static double ln(BigDecimal q) {
        final BigDecimal two = BigDecimal.valueOf(2);
        final BigDecimal ln2 = twoAtanh(BigDecimal.ONE.divide(BigDecimal.valueOf(3), MC));
        int k = 0;
        BigDecimal m = q;
        while (m.compareTo(two) > 0) {
            m = m.divide(two, MC);
            k++;
        }
        while (m.compareTo(BigDecimal.ONE) < 0) {
            m = m.multiply(two, MC);
            k--;
        }
        // m ∈ [1, 2]: z = (m − 1)/(m + 1) ∈ [0, 1/3]
        final BigDecimal z = m.subtract(BigDecimal.ONE).divide(m.add(BigDecimal.ONE), MC);
        return twoAtanh(z).add(ln2.multiply(BigDecimal.valueOf(k), MC), MC).doubleValue();
    }

    private static BigDecimal exact(double t, double tk) {
        return new BigDecimal(t).subtract(new BigDecimal(tk));
    }

    @Property(tries = 300)
    void differencesAreExactAndEndsAreWithinTheirBounds(
            @ForAll @DoubleRange(min = -3, max = 6) @Scale(12) double logT,
            @ForAll @DoubleRange(min = -9, max = -0.0005) @Scale(12) double logF1,
            @ForAll @DoubleRange(min = -9, max = 0) @Scale(12) double logF2) {
        final double t = Math.pow(10, logT);
        final double f1 = Math.pow(10, logF1);
        final double f2 = Math.pow(10, logF2);
        // two start times t1 < t2 < t: the window τ ∈ [t − t2, t − t1]
        final double t1 = t * f1 * (1 - f2);
        final double t2 = t * f1;
        if (!(t1 < t2 && t2 < t)) {
            return;
        }
        final RateHistory h = RateHistory.of(new double[] {t1, t2}, new double[] {1, 0});
        final TimeWindow w = new TimeWindow();
        w.set(h, 0, t);
        // exact as hi + lo
        assertEquals(0, exact(t, t1).compareTo(new BigDecimal(w.upper[0])
            .add(new BigDecimal(w.upper[1]))), "t − t1 = hi + lo");
        assertEquals(0, exact(t, t2).compareTo(new BigDecimal(w.lower[0])
            .add(new BigDecimal(w.lower[1]))), "t − t2 = hi + lo");
        final BigDecimal tauA = exact(t, t2);
        final BigDecimal tauB = exact(t, t1);
        // normalised at the upper end (a double): wA = ln(τ_a/hi(τ_b)), wB = ln(τ_b/hi(τ_b))
        w.place(TimeWindow.Normalisation.UPPER, 0, 0);
        final BigDecimal nB = new BigDecimal(w.upper[0]);
        check(w.wA, w.errA, ln(tauA.divide(nB, MC)), "upper: wA");
        check(w.wB, w.errB, ln(tauB.divide(nB, MC)), "upper: wB");
        // normalised at the lower end
        w.place(TimeWindow.Normalisation.LOWER, 0, 0);
        final BigDecimal nA = new BigDecimal(w.lower[0]);
        check(w.wA, w.errA, ln(tauA.divide(nA, MC)), "lower: wA");
        check(w.wB, w.errB, ln(tauB.divide(nA, MC)), "lower: wB");
        // at a peak τ_p inside (here the geometric mean of the ends, as a double): the width
        // wB − wA within its bound whatever the common displacement
        final double peak = Math.sqrt(w.lower[0] * w.upper[0]);
        w.place(TimeWindow.Normalisation.PEAK, Math.log(w.upper[0] / peak),
            Math.log(w.lower[0] / peak));
        final double width = ln(tauB.divide(tauA, MC));
        final double computed = w.wB - w.wA;
        // (the subtraction wB − wA adds one rounding of the width)
        assertTrue(Math.abs(computed - width) <= w.errA + w.errB + ROUNDING * width
                + Math.ulp(width),
            "peak: width " + computed + " vs " + width + " (errors " + w.errA + ", " + w.errB
                + ")");
        check(w.wB, w.errB + w.common, ln(tauB.divide(new BigDecimal(peak), MC)), "peak: wB");
    }

    private static void check(double computed, double bound, double exact, String what) {
        // the oracle is the exact value rounded to a double (half an ULP)
        assertTrue(Math.abs(computed - exact) <= bound + Math.ulp(exact),
            what + " " + computed + " vs " + exact + ", bound " + bound);
    }
}
