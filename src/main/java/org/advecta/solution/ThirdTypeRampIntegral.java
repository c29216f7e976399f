package org.advecta.solution;

import org.advecta.internal.GaussLegendre;

/**
 * The bracket of the flux inlet's ramp response without decay,
 * <pre>
 * β(Q, P) = (1/(8P²))·∫₀^{2P} χ(A + τ)·τ·(4P − τ) dτ,   A = Q − P,   χ = −erfcx‴/2 &gt; 0
 * </pre>
 * so that W₃ = t·e^{−A²}·β (see {@link InletRamp}). It equals
 * (1/(4P²))∫_A^B (B − r)(ψ(r) − ψ(B)) dr (B = Q + P, integrate ψ(r) − ψ(B) = ∫_r^B χ by
 * parts) and, in closed form, [φ(A) − mean of φ on [A, B]]/(2P) − ψ(B)/2, whose terms cancel
 * (by a factor up to 19 ahead of the front): the integral of a positive function is used
 * instead.
 *
 * <p>χ is entire and, like φ and ψ, smooth on the scale max(1, s) for s ≥ −3/2, so the
 * 10-point rule on panels of half-width at most a quarter of max(1, s) at their left end is
 * exact to rounding (the library's criterion for φ, {@link ErfcxIntegrals#narrow}; checked
 * by the reference fixture).
 */
final class ThirdTypeRampIntegral {

    private static final double ONE_OVER_SQRT_PI = 0.5641895835477563;
    private ThirdTypeRampIntegral() {
    }

    /**
     * Returns β(Q, P) for P &gt; 0 with A = Q − P ≥ −3/2 (the caller passes A as it formed it).
     */
    static double bracket(double q, double p, double a) {
        if (ErfcxIntegrals.narrow(q, p)) {
            // one panel centred at Q: τ = P(1 + y), τ(4P − τ) = P²(1 + y)(3 − y), dτ = P dy:
            // β = (P/8)·∫_{−1}^{1} χ(Q + Py)(1 + y)(3 − y) dy (no division by P)
            return 0.125 * p * GaussLegendre.integrate(
                y -> chi(q + p * y) * (1 + y) * (3 - y), 0.0, 1.0);
        }
        // composite: panels [o, o + 2h] in τ, h a quarter of max(1, A + o)
        final double fourP = 4 * p;
        final double sum = PanelSum.over(2 * p, o -> 0.25 * Math.max(1, a + o),
            tau -> chi(a + tau) * tau * (fourP - tau));
        return sum / (8 * p * p);
    }

    /**
     * χ(s) = −erfcx‴(s)/2 = 4φ(s) − 2sψ(s) &gt; 0 (from erfcx′ = 2s·erfcx − 2/√π, differentiated
     * twice). That sum of positive terms is used below s = −1; on [−1, 10), where for s &gt; 0
     * it cancels (χ ≈ 3/(√π s⁴) while 4φ ≈ 2/(√π s²)), the Chebyshev series of
     * {@link ErfcxHigherDerivatives}; from s = 10 on the asymptotic series
     * √π·χ = s⁻² Σ_{n≥1} (−1)^{n+1}(2n−1)!!·2n(2n+1)·(2s²)⁻ⁿ (A&amp;S 7.1.23, differentiated
     * three times).
     */
    static double chi(double s) {
        if (s < ErfcxHigherDerivatives.FROM) {
            return 4 * ErfcxIntegrals.phi(s) - 2 * s * ErfcxIntegrals.psi(s);
        }
        if (s >= ErfcxHigherDerivatives.TO) {
            return asymptotic(s);
        }
        return ErfcxHigherDerivatives.chi(s);
    }

    private static double asymptotic(double s) {
        if (s == Double.POSITIVE_INFINITY) {
            return 0.0;
        }
        final double y = 0.5 / s / s;
        // term_n = (−1)^{n+1}(2n−1)!!·yⁿ, summed with the factor 2n(2n+1)
        double term = y;
        double sum = 6 * y;
        for (int n = 2; n <= 40; n++) {
            term *= -(2 * n - 1) * y;
            final double add = 2.0 * n * (2 * n + 1) * term;
            sum += add;
            if (Math.abs(add) < 0x1.0p-56 * Math.abs(sum)) {
                break;
            }
        }
        return ONE_OVER_SQRT_PI * sum / s / s;
    }
}
