package org.advecta.halfspace;

import org.advecta.internal.GaussLegendre;
import org.advecta.internal.ScaledExp;
import org.advecta.special.ErrorFunctions;

/**
 * φ(s) = 1/√π − s·erfcx(s) = −erfcx′(s)/2 &gt; 0 and its integrals, which turn the
 * differences of erfc products of the half-space solutions into sums of positive terms:
 * ∫_a^b φ(s) ds = (erfcx(a) − erfcx(b))/2.
 */
final class Phi {

    private Phi() {
    }

    /** φ(s) = −erfcx′(s)/2. */
    static double phi(double s) {
        return -0.5 * ErrorFunctions.erfcxDerivative(s);
    }

    /**
     * Whether [m − h, m + h] is narrow enough for the 10-point Gauss–Legendre rule on φ, which
     * varies on the scale max(1, |m|) for m ≥ −1.
     */
    private static boolean narrow(double m, double h) {
        return m >= -1 && h <= 0.25 * Math.max(1, m);
    }

    /** ∫ φ over [m − h, m + h], m − h ≥ 0 or narrow: quadrature if narrow, else the difference. */
    static double integral(double m, double h) {
        if (narrow(m, h)) {
            return GaussLegendre.integrate(Phi::phi, m, h);
        }
        // wide: erfcx(m − h)/erfcx(m + h) is bounded away from 1 (at least 5/3 for m ≥ h)
        return 0.5 * (ErrorFunctions.erfcx(m - h) - ErrorFunctions.erfcx(m + h));
    }

    /**
     * exp(e)·J(m − h, m + h) with J(a, b) = ½[erfc(a) − e^{−a²}·erfcx(b)] (= ½[erfc(a) −
     * e^{4mh}·erfc(b)]), h ≥ 0, from the centre m and half-width h, without cancellation:
     * <pre>
     * a ≥ 0:        J = e^{−a²}·∫_a^b φ
     * b ≤ 0:        J = (1 − e^{4mh}) + e^{−a²}·∫_{|b|}^{|a|} φ    (erfc(s) = 2 − erfc(−s))
     * a &lt; 0 &lt; b:    J = e^{−a²}·∫_a^b φ (narrow, h ≤ 1/4) or the difference (wide)
     * </pre>
     *
     * @param e exponent of the factor
     * @param m centre
     * @param h half-width, ≥ 0
     * @param fourMH 4mh, given by the caller in a form without the rounding of m and h
     * @return exp(e)·J
     */
    static double expTimesJ(double e, double m, double h, double fourMH) {
        final double a = m - h;
        final double b = m + h;
        if (a >= 0) {
            return ScaledExp.value(integral(m, h), e, a);
        }
        if (b <= 0) {
            // the integral runs over [|b|, |a|] ⊂ [0, ∞): erfcx cannot overflow there
            return ScaledExp.value(-Math.expm1(fourMH), e, 0.0)
                + ScaledExp.value(integral(-m, h), e, a);
        }
        if (h <= 0.25) {
            return ScaledExp.value(GaussLegendre.integrate(Phi::phi, m, h), e, a);
        }
        return ScaledExp.value(0.5 * (ErrorFunctions.erfc(a)
            - ScaledExp.value(ErrorFunctions.erfcx(b), 0.0, a)), e, 0.0);
    }
}
