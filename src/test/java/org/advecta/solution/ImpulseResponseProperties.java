package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

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
     * A point and parameters: v from 0.01 to 10, D from 0.03 to 30, R from 1 to 4, μ from
     * 0.001 to 1000, t from 0.03 to 10, and x from 1e−6 to 3 dispersion lengths √(4Dt/R), so
     * that the inlet's neighbourhood is sampled as densely as the front.
     */
    record Point(double v, double d, double r, double mu, double x, double t) {

        /** A², A = (x − vt/R)/L. */
        double aSquared() {
            final double a = (x - v * t / r) / length();
            return a * a;
        }

        double length() {
            return Math.sqrt(4 * d * t / r);
        }

        /** The rounding of the exponent −A² − μt/R in ulps of the result, about. */
        double exponentUlps() {
            return 1 + aSquared() + mu * t / r;
        }
    }

    @Provide
    Arbitrary<Point> points() {
        return Combinators.combine(Arbitraries.doubles().between(-2, 1),
                Arbitraries.doubles().between(-1.5, 1.5), Arbitraries.doubles().between(1, 4),
                Arbitraries.doubles().between(-3, 3), Arbitraries.doubles().between(-6, 0.5),
                Arbitraries.doubles().between(-1.5, 1))
            .as((logV, logD, r, logMu, logX, logT) -> {
                final double d = Math.pow(10, logD);
                final double t = Math.pow(10, logT);
                return new Point(Math.pow(10, logV), d, r, Math.pow(10, logMu),
                    Math.pow(10, logX) * Math.sqrt(4 * d * t / r), t);
            });
    }

    /**
     * D·∂g₃/∂x = v·(g₃ − g₁) to a few ulps of the terms, near the inlet and under decay up to
     * μ = 1000. The old form of ∂g₃/∂x, which subtracted ψ(B) from erfcx(B), failed this at
     * 64 ulps.
     */
    @Property(tries = 3000)
    void fluxOfTheImpulseResponseIsTheFirstTypeOne(@ForAll("points") Point p) {
        final ThirdTypeResponse third = new ThirdTypeResponse(p.v(), p.d(), p.r(), p.mu(),
            p.mu());
        final FirstTypeResponse first = new FirstTypeResponse(p.v(), p.d(), p.r(), p.mu(),
            p.mu());
        final double g3 = third.density(p.x(), p.t());
        final double g1 = first.density(p.x(), p.t());
        final double lhs = p.d() * third.densityGradient(p.x(), p.t());
        final double rhs = p.v() * (g3 - g1);
        // each side within a few ulps of its terms, times the rounding of the exponent
        final double scale = Math.abs(lhs) + p.v() * (Math.abs(g3) + Math.abs(g1));
        final double tol = 64 * Math.ulp(1.0) * p.exponentUlps() * scale + Double.MIN_NORMAL;
        assertTrue(Math.abs(lhs - rhs) <= tol, () -> String.format(
            "%s: D g3x=%s v(g3-g1)=%s diff/scale=%s", p, lhs, rhs,
            Math.abs(lhs - rhs) / scale));
    }

    /**
     * The flux-averaged impulse response of both inlets is g − (D/v)·∂g/∂x to a few ulps of
     * those terms (the flux inlet's is the first-type g₁ itself, by the identity above; the
     * first-type one is formed as e^E/(t√π L)·[x/2 + (D/v)(2Q² − 1)], and its terms are
     * those of g/x·(x − (D/v)(1 − 2AQ)) before 1 − 2AQ cancels).
     */
    @Property(tries = 3000)
    void fluxAveragedImpulseResponseIsTheDifference(@ForAll boolean third,
                                                    @ForAll("points") Point p) {
        final UnitResponse g = third ? new ThirdTypeResponse(p.v(), p.d(), p.r(), p.mu(), p.mu())
            : new FirstTypeResponse(p.v(), p.d(), p.r(), p.mu(), p.mu());
        final double density = g.density(p.x(), p.t());
        final double gradient = p.d() / p.v() * g.densityGradient(p.x(), p.t());
        final double expected = density - gradient;
        final double actual = g.fluxAveragedDensity(p.x(), p.t());
        // the scale of the terms before they cancel: for the first type, ∂g/∂x is
        // g/x·(1 − 2AQ) and 1 − 2AQ itself cancels near Q = 1/√2
        final double q = p.x() / p.length();
        final double scale = third ? Math.abs(density) + Math.abs(gradient)
            : density + p.d() / p.v() * density / p.x() * (1 + 2 * Math.sqrt(p.aSquared()) * q);
        final double tol = 64 * Math.ulp(1.0) * p.exponentUlps() * scale + Double.MIN_NORMAL;
        assertTrue(Math.abs(actual - expected) <= tol, () -> String.format(
            "third=%s %s: %s against %s, diff/scale=%s", third, p, actual, expected,
            Math.abs(actual - expected) / scale));
    }
}
