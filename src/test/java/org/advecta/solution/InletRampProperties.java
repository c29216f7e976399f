package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.advecta.internal.GaussLegendre;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Invariants of the ramp responses for all inputs: the time integral of the step response,
 * its time derivative, the equation, the inlet conditions, positivity and monotonicity, and
 * finiteness over a log grid of parameters. Tolerances are stated with their reasons.
 */
class InletRampProperties {

    private static TransportParameters params(double v, double logD, double r, double mu) {
        return TransportParameters.of(v, Math.pow(10, logD)).withRetardation(r).withDecay(mu);
    }

    private static InletRamp ramp(boolean third, TransportParameters p) {
        return third ? InletRamp.thirdType(p) : InletRamp.firstType(p);
    }

    private static Solution1D step(boolean third, TransportParameters p) {
        return third ? ThirdTypeInlet.of(p, InletInput.constant(1.0))
            : FirstTypeInlet.of(p, InletInput.constant(1.0));
    }

    /**
     * ∫₀ᵗ U ds by composite 10-point Gauss–Legendre on panels graded geometrically towards
     * both ends (t·2⁻ᵏ and t(1 − 2⁻ᵏ)), each split in 8: ahead of the front U rises within
     * t/A² of t, and near s = 0 it is flat.
     */
    private static double integrateStep(Solution1D u, double x, double t) {
        final double[] cuts = new double[2 * 60 + 1];
        int n = 0;
        for (int k = 60; k >= 1; k--) {
            cuts[n++] = t * Math.pow(2, -k);
        }
        cuts[n++] = 0.5 * t;
        for (int k = 2; k <= 60; k++) {
            cuts[n++] = t - t * Math.pow(2, -k);
        }
        double sum = 0;
        double lo = 0;
        for (int i = 0; i <= n; i++) {
            final double hi = i < n ? cuts[i] : t;
            final double w = (hi - lo) / 8;
            for (int j = 0; j < 8 && w > 0; j++) {
                final double a = lo + j * w;
                sum += GaussLegendre.integrate(s -> s == 0 ? 0 : u.value(x, s), a + 0.5 * w,
                    0.5 * w);
            }
            lo = hi;
        }
        return sum;
    }

    @Property(tries = 40)
    void rampIsTheTimeIntegralOfTheStep(@ForAll boolean third,
                                        @ForAll @DoubleRange(min = 0.05, max = 5) double v,
                                        @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                        @ForAll @DoubleRange(min = 1, max = 4) double r,
                                        @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                        @ForAll @DoubleRange(min = 0, max = 3) double x,
                                        @ForAll @DoubleRange(min = 0.05, max = 10) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final double w = ramp(third, p).value(x, t);
        final double q = integrateStep(step(third, p), x, t);
        // about 1000 graded panels of Gauss–Legendre on a smooth positive integrand: 1e-10
        // of the integral covers the steepest panels of the parameters here (D = 0.01)
        assertEquals(q, w, 1e-10 * Math.max(q, 1e-300) + 1e-300, third + " " + p + " x=" + x
            + " t=" + t);
    }

    @Property(tries = 100)
    void timeDerivativeIsTheStep(@ForAll boolean third,
                                 @ForAll @DoubleRange(min = 0.05, max = 5) double v,
                                 @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                 @ForAll @DoubleRange(min = 1, max = 4) double r,
                                 @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                 @ForAll @DoubleRange(min = 0, max = 3) double x,
                                 @ForAll @DoubleRange(min = 0.05, max = 10) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final InletRamp w = ramp(third, p);
        // the step of the difference on the time scale of W: at early times W ~ e^{−Q²},
        // Q² = x²R/(4Dt), changes by a factor e^{Q²·h/t} over h, so h = 1e-4·t/max(1, Q²)
        // (a plain 1e-4·t left a truncation error of 1e-7 at Q² ≈ 420 and failed a run)
        final double q2 = x * x * r / (4 * p.dispersion() * t);
        final double h = 1e-4 * t / Math.max(1, q2);
        // fourth-order central difference: error ~ h⁴·W⁽⁵⁾ plus rounding ~ 1e-16·W/h
        final double d = (8 * (w.value(x, t + h) - w.value(x, t - h))
            - (w.value(x, t + 2 * h) - w.value(x, t - 2 * h))) / (12 * h);
        final double u = step(third, p).value(x, t);
        assertEquals(u, d, 1e-7 * (u + w.value(x, t) / t) + 1e-200, third + " " + p + " x=" + x
            + " t=" + t);
    }

    @Property(tries = 100)
    void equationHolds(@ForAll boolean third,
                       @ForAll @DoubleRange(min = 0.05, max = 5) double v,
                       @ForAll @DoubleRange(min = -1, max = 1) double logD,
                       @ForAll @DoubleRange(min = 1, max = 4) double r,
                       @ForAll @DoubleRange(min = 0, max = 1) double mu,
                       @ForAll @DoubleRange(min = 0.2, max = 3) double x,
                       @ForAll @DoubleRange(min = 0.1, max = 10) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final InletRamp w = ramp(third, p);
        final double d = p.dispersion();
        // steps a small fraction of the scale on which W varies: L/(1 + Q) in x, t/(1 + Q²)
        // in t (ahead of the front W ~ exp(−Q²))
        final double l = Math.sqrt(4 * d * t / r);
        final double q = x / l;
        final double ht = 1e-3 * t / (1 + q * q);
        final double hx = 1e-3 * Math.min(x, l / (1 + q));
        final double c = w.value(x, t);
        final double ct = (w.value(x, t + ht) - w.value(x, t - ht)) / (2 * ht);
        final double cx = (w.value(x + hx, t) - w.value(x - hx, t)) / (2 * hx);
        final double cxx = (w.value(x + hx, t) - 2 * c + w.value(x - hx, t)) / (hx * hx);
        final double[] terms = {r * ct, d * cxx, v * cx, mu * c};
        double max = 0;
        for (double term : terms) {
            max = Math.max(max, Math.abs(term));
        }
        final double residual = r * ct - d * cxx + v * cx + mu * c;
        // second-order differences with h = 1e-3 of the scale: 1e-4 of the largest term
        // (h² times the ratio of fourth to second derivatives, and rounding 1e-16/h²)
        assertTrue(Math.abs(residual) <= 1e-4 * max + 1e-250, third + " " + p + " x=" + x
            + " t=" + t + " residual " + residual + " of " + max);
    }

    @Property(tries = 100)
    void inletConditionHolds(@ForAll boolean third,
                             @ForAll @DoubleRange(min = 0.05, max = 5) double v,
                             @ForAll @DoubleRange(min = -2, max = 1) double logD,
                             @ForAll @DoubleRange(min = 1, max = 4) double r,
                             @ForAll @DoubleRange(min = 0, max = 1) double mu,
                             @ForAll @DoubleRange(min = 0.01, max = 20) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final InletRamp w = ramp(third, p);
        if (!third) {
            // the first type holds the input exactly (the class special-cases x = 0)
            assertEquals(t, w.value(0, t), 0.0);
            return;
        }
        final double d = p.dispersion();
        // one-sided third-order difference for ∂W/∂x at 0, h a small fraction of the
        // boundary layer D/v and of the spread √(Dt/R)
        final double h = 1e-3 * Math.min(d / v, Math.sqrt(d * t / r));
        final double w0 = w.value(0, t);
        final double dx = (-11 * w0 + 18 * w.value(h, t) - 9 * w.value(2 * h, t)
            + 2 * w.value(3 * h, t)) / (6 * h);
        final double flux = v * w0 - d * dx;
        assertEquals(v * t, flux, 1e-6 * (v * t + v * w0), p + " t=" + t);
    }

    @Property(tries = 50)
    void positiveAndIncreasingInTime(@ForAll boolean third,
                                     @ForAll @DoubleRange(min = 0.01, max = 10) double v,
                                     @ForAll @DoubleRange(min = -4, max = 1) double logD,
                                     @ForAll @DoubleRange(min = 1, max = 4) double r,
                                     @ForAll @DoubleRange(min = 0, max = 2) double mu,
                                     @ForAll @DoubleRange(min = 0, max = 5) double x) {
        final InletRamp w = ramp(third, params(v, logD, r, mu));
        double previous = 0;
        for (double t = 1e-3; t < 200; t *= 1.25) {
            final double c = w.value(x, t);
            assertTrue(c >= 0 && Double.isFinite(c), "t=" + t + " c=" + c);
            // W_t = U ≥ 0; allow the closed form's relative rounding (16 ulp)
            assertTrue(c >= previous - 16 * Math.ulp(previous), "t=" + t + " " + c + " < "
                + previous);
            previous = c;
        }
    }

    @Test
    void finiteOnALogGridOfParameters() {
        int n = 0;
        for (int third = 0; third < 2; third++) {
            for (double v : new double[] {0, 1e-8, 1e-3, 1, 1e3, 1e8}) {
                if (third == 1 && v == 0) {
                    continue;
                }
                for (double d : new double[] {1e-8, 1e-3, 1, 1e3}) {
                    for (double r : new double[] {1, 30}) {
                        for (double mu : new double[] {0, 1e-6, 1e4}) {
                            final TransportParameters p = TransportParameters.of(v, d)
                                .withRetardation(r).withDecay(mu);
                            final InletRamp w = ramp(third == 1, p);
                            for (double x : new double[] {0, 1e-300, 1e-6, 1, 1e6}) {
                                for (double t : new double[] {0, 1e-300, 1e-6, 1, 1e6, 1e12}) {
                                    final double c = w.value(x, t);
                                    assertTrue(Double.isFinite(c) && c >= 0, (third == 1)
                                        + " " + p + " x=" + x + " t=" + t + " -> " + c);
                                    n++;
                                }
                            }
                        }
                    }
                }
            }
        }
        assertTrue(n > 4000);
    }

    @Property(tries = 60)
    void noDecayFluxInletMatchesTheLimitOfSmallDecay(
            @ForAll @DoubleRange(min = 0.05, max = 5) double v,
            @ForAll @DoubleRange(min = -2, max = 1) double logD,
            @ForAll @DoubleRange(min = 1, max = 4) double r,
            @ForAll @DoubleRange(min = 0, max = 3) double x,
            @ForAll @DoubleRange(min = 0.05, max = 10) double t,
            @ForAll @IntRange(min = 10, max = 300) int e) {
        // the μ = 0 closed form (Lindstrom's step integrated) against the μ > 0 one (a
        // different derivation, ThirdTypeDecayRamp) at μ = 10⁻ᵉ: they differ by about μt/R
        // relative (the decay over the time), plus the two forms' rounding (1e-13 covers
        // κ ≤ 400 at max(16, 2κ) ULP each; κ stays below that in this range: common practice
        // from the fixtures' condition numbers)
        final double mu = Math.pow(10, -e);
        final double a = InletRamp.thirdType(params(v, logD, r, 0)).value(x, t);
        final double b = InletRamp.thirdType(params(v, logD, r, mu)).value(x, t);
        assertEquals(a, b, (mu * t / r * 2 + 1e-13) * a + 1e-300, "x=" + x + " t=" + t);
    }

    @Property(tries = 200)
    void decayFormsAgreeWhereBothHold(@ForAll @DoubleRange(min = 0.05, max = 5) double v,
                                      @ForAll @DoubleRange(min = -3, max = 1) double logD,
                                      @ForAll @DoubleRange(min = 1, max = 4) double r,
                                      @ForAll @DoubleRange(min = -6, max = 1) double logMu,
                                      @ForAll @DoubleRange(min = 0, max = 3) double x,
                                      @ForAll @DoubleRange(min = -1.5, max = -0.75) double au) {
        // the flux inlet with decay has two forms, the B-spline integral ahead of the front
        // and the split form behind it (two residues and an integral over [B_v, B_u]); both
        // are sums of positive terms where A_u ∈ [−3/2, −3/4] and must agree there
        final double d = Math.pow(10, logD);
        final double mu = Math.pow(10, logMu);
        final double u = Math.sqrt(v * v + 4 * mu * d);
        // the time at which (x − ut/R)/√(4Dt/R) = A_u: (u/R)s² + A_u√(4D/R)s − x = 0, s = √t
        final double c = Math.sqrt(4 * d / r);
        final double s = (-au * c + Math.sqrt(au * au * c * c + 4 * u / r * x)) / (2 * u / r);
        final double t = s * s;
        final double il = Math.sqrt(r / (4 * d * t));
        final double q = x * il;
        final double pv = v / r * t * il;
        final double pu = u / r * t * il;
        final double a = (x - u / r * t) * il;
        final double av = (x - v / r * t) * il;
        final double uMinusV = 4 * mu * d / (u + v);
        final ThirdTypeDecayRamp w = new ThirdTypeDecayRamp(v, u, uMinusV);
        final double ahead = w.ahead(t, q, pv, pu, a, av, -mu / r * t);
        final double behind = w.behind(t, q, pv, pu, a, av, -mu / r * t,
            -uMinusV / (2 * d) * x);
        // the behind form's bracket loses up to a factor 2.15 here, the forward recurrence
        // of the ahead form up to 12 near z = 1: 1e-13 is about 450 ULP
        assertEquals(ahead, behind, 1e-13 * ahead + 1e-300, "A_u=" + a + " t=" + t);
    }
}
