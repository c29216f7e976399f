package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/**
 * The flux inlet's impulse response g₃ (the time derivative of its unit step response)
 * against the first-type inlet's g₁, by the flux identity at the impulse level: the flux
 * v·g₃ − D·∂g₃/∂x of the flux inlet's response solves the same equation, is 0 at t = 0 and
 * v·δ(t) at x = 0, so it is v·g₁ (Kreft &amp; Zuber 1978; Parker &amp; van Genuchten 1984).
 * The narrow pulse gradient integrates ∂g₃/∂x, and the flux-averaged concentration of a
 * pulse integrates the flux-averaged impulse responses, so their accuracy rests on these.
 */
class ImpulseResponseProperties {

    /**
     * D·∂g₃/∂x = v·(g₃ − g₁) to a few ulps of the terms, near the inlet (x down to 1e−6 of
     * the dispersion length) and under decay up to μ = 1000. The old form of ∂g₃/∂x, which
     * subtracted ψ(B) from erfcx(B), failed this at 64 ulps.
     */
    @Property(tries = 3000)
    void fluxOfTheImpulseResponseIsTheFirstTypeOne(
            @ForAll @DoubleRange(min = -2, max = 1) double logV,
            @ForAll @DoubleRange(min = -1.5, max = 1.5) double logD,
            @ForAll @DoubleRange(min = 1, max = 4) double r,
            @ForAll @DoubleRange(min = -3, max = 3) double logMu,
            @ForAll @DoubleRange(min = -6, max = 0.5) double logX,
            @ForAll @DoubleRange(min = -1.5, max = 1) double logT) {
        final double v = Math.pow(10, logV);
        final double d = Math.pow(10, logD);
        final double mu = Math.pow(10, logMu);
        final double t = Math.pow(10, logT);
        final double x = Math.pow(10, logX) * Math.sqrt(4 * d * t / r);
        final ThirdTypeResponse third = new ThirdTypeResponse(v, d, r, mu, mu);
        final FirstTypeResponse first = new FirstTypeResponse(v, d, r, mu, mu);
        final double g3 = third.density(x, t);
        final double g1 = first.density(x, t);
        final double g3x = third.densityGradient(x, t);
        final double lhs = d * g3x;
        final double rhs = v * (g3 - g1);
        // each side within a few ulps of its terms; the exponential factor e^{−A² − μt/R}
        // carries the rounding of its argument, about 1 + A² + μt/R ulps
        final double av = (x - v * t / r) / Math.sqrt(4 * d * t / r);
        final double exponentUlps = 1 + av * av + mu * t / r;
        final double scale = Math.abs(lhs) + v * (Math.abs(g3) + Math.abs(g1));
        final double tol = 64 * Math.ulp(1.0) * exponentUlps * scale + Double.MIN_NORMAL;
        assertTrue(Math.abs(lhs - rhs) <= tol, () -> String.format(
            "v=%s D=%s R=%s mu=%s x=%s t=%s: D g3x=%s v(g3-g1)=%s diff/scale=%s", v, d, r, mu,
            x, t, lhs, rhs, Math.abs(lhs - rhs) / scale));
    }

    /**
     * The flux-averaged impulse response of both inlets is g − (D/v)·∂g/∂x to a few ulps of
     * those terms (the flux inlet's is the first-type g₁ itself, by the identity above; the
     * first-type one is formed as e^E/(t√π L)·[x/2 + (D/v)(2Q² − 1)], and its terms are
     * those of g/x·(x − (D/v)(1 − 2AQ)) before 1 − 2AQ cancels).
     */
    @Property(tries = 3000)
    void fluxAveragedImpulseResponseIsTheDifference(
            @ForAll boolean third,
            @ForAll @DoubleRange(min = -2, max = 1) double logV,
            @ForAll @DoubleRange(min = -1.5, max = 1.5) double logD,
            @ForAll @DoubleRange(min = 1, max = 4) double r,
            @ForAll @DoubleRange(min = -3, max = 3) double logMu,
            @ForAll @DoubleRange(min = -6, max = 0.5) double logX,
            @ForAll @DoubleRange(min = -1.5, max = 1) double logT) {
        final double v = Math.pow(10, logV);
        final double d = Math.pow(10, logD);
        final double mu = Math.pow(10, logMu);
        final double t = Math.pow(10, logT);
        final double x = Math.pow(10, logX) * Math.sqrt(4 * d * t / r);
        final UnitResponse g = third ? new ThirdTypeResponse(v, d, r, mu, mu)
            : new FirstTypeResponse(v, d, r, mu, mu);
        final double density = g.density(x, t);
        final double gradient = d / v * g.densityGradient(x, t);
        final double expected = density - gradient;
        final double actual = g.fluxAveragedDensity(x, t);
        final double av = (x - v * t / r) / Math.sqrt(4 * d * t / r);
        final double exponentUlps = 1 + av * av + mu * t / r;
        // the scale of the terms before they cancel: for the first type, ∂g/∂x is
        // g/x·(1 − 2AQ) and 1 − 2AQ itself cancels near Q = 1/√2
        final double q = x / Math.sqrt(4 * d * t / r);
        final double scale = third ? Math.abs(density) + Math.abs(gradient)
            : density + d / v * density / x * (1 + 2 * Math.abs(av) * q);
        final double tol = 64 * Math.ulp(1.0) * exponentUlps * scale + Double.MIN_NORMAL;
        assertTrue(Math.abs(actual - expected) <= tol, () -> String.format(
            "third=%s v=%s D=%s R=%s mu=%s x=%s t=%s: %s against %s, diff/scale=%s", third, v,
            d, r, mu, x, t, actual, expected, Math.abs(actual - expected) / scale));
    }
}
