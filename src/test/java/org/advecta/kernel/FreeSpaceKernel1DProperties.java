package org.advecta.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of the one-dimensional Green's function that hold for all parameters: they follow
 * from the equation itself (exact identities), not from reference values.
 */
class FreeSpaceKernel1DProperties {

    /** Builds parameters from log-scaled draws, so that scales from 1e-3 to 1e1 are covered. */
    private static TransportParameters params(double v, double logD, double r, double mu) {
        return TransportParameters.of(v, Math.pow(10, logD)).withRetardation(r).withDecay(mu);
    }

    private static double sigma(TransportParameters p, double t) {
        return Math.sqrt(2 * p.dispersion() * t / p.retardation());
    }

    @Property(tries = 200)
    void massIsExpMinusMuTOverR(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                @ForAll @DoubleRange(min = -3, max = 1) double logD,
                                @ForAll @DoubleRange(min = 1, max = 5) double r,
                                @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                @ForAll @DoubleRange(min = -2, max = 2) double logT,
                                @ForAll @DoubleRange(min = -10, max = 10) double x0) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, x0);
        final double c = x0 + v * t / r;
        final double s = sigma(p, t);
        final double mass = Integrals.trapezoid(x -> g.value(x, t), c - 12 * s, c + 12 * s, 96);
        // Identity: ∫G dx = exp(−μt/R) (integrate the equation over x).
        assertEquals(Math.exp(-mu * t / r), mass, 1e-13);
    }

    @Property(tries = 200)
    void momentsMoveAtRetardedVelocityAndSpreadAsTwoDtOverR(
            @ForAll @DoubleRange(min = -10, max = 10) double v,
            @ForAll @DoubleRange(min = -3, max = 1) double logD,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 1) double mu,
            @ForAll @DoubleRange(min = -2, max = 2) double logT,
            @ForAll @DoubleRange(min = -10, max = 10) double x0) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, x0);
        final double c = x0 + v * t / r;
        final double s = sigma(p, t);
        final double m0 = Integrals.trapezoid(x -> g.value(x, t), c - 12 * s, c + 12 * s, 96);
        final double m1 = Integrals.trapezoid(x -> (x - x0) * g.value(x, t),
            c - 12 * s, c + 12 * s, 96) / m0;
        final double m2 = Integrals.trapezoid(x -> (x - c) * (x - c) * g.value(x, t),
            c - 12 * s, c + 12 * s, 96) / m0;
        // First moment about the release: vt/R; second central moment: 2Dt/R.
        assertEquals(v * t / r, m1, 1e-12 * (Math.abs(v * t / r) + s));
        assertEquals(s * s, m2, 1e-12 * s * s);
    }

    @Property(tries = 300)
    void positiveAndSymmetricAboutTheMovingCentre(
            @ForAll @DoubleRange(min = -10, max = 10) double v,
            @ForAll @DoubleRange(min = -3, max = 1) double logD,
            @ForAll @DoubleRange(min = 1, max = 5) double r,
            @ForAll @DoubleRange(min = 0, max = 1) double mu,
            @ForAll @DoubleRange(min = -2, max = 2) double logT,
            @ForAll @DoubleRange(min = 0, max = 8) double w) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, 0.0);
        final double c = v * t / r;
        final double d = w * sigma(p, t);
        final double right = g.value(c + d, t);
        final double left = g.value(c - d, t);
        assertTrue(right > 0 && left > 0, () -> "not positive: " + left + ", " + right);
        // c ± d and the kernel's own centre are rounded: each point is off by up to
        // ulp(|c| + d), which moves G by |∂G/∂x| = 2|w|/σ·G per unit of x (here w = d/σ and
        // ∂G/∂x = −ξ/σ²·G). Allow four such roundings plus 16 ulp.
        final double inputRounding = 4 * Math.ulp(Math.abs(c) + d) * 2 * w / sigma(p, t);
        assertEquals(left, right, right * inputRounding + 16 * Math.ulp(right));
    }

    @Property(tries = 100)
    void chapmanKolmogorov(@ForAll @DoubleRange(min = -5, max = 5) double v,
                           @ForAll @DoubleRange(min = -2, max = 1) double logD,
                           @ForAll @DoubleRange(min = 1, max = 3) double r,
                           @ForAll @DoubleRange(min = 0, max = 0.5) double mu,
                           @ForAll @DoubleRange(min = 0.5, max = 2) double t1,
                           @ForAll @DoubleRange(min = 0.5, max = 2) double t2,
                           @ForAll @DoubleRange(min = -2, max = 2) double xOffset) {
        final TransportParameters p = params(v, logD, r, mu);
        final FreeSpaceKernel1D first = FreeSpaceKernel1D.of(p, 0.0);
        final double s = sigma(p, t1 + t2);
        final double x = v * (t1 + t2) / r + xOffset * s;
        // G(x, t1+t2 | 0) = ∫ G(x, t2 | y) G(y, t1 | 0) dy: releasing, waiting t1, then
        // releasing everything again from where it got is the same as waiting t1 + t2.
        final double c1 = v * t1 / r;
        final double lo = Math.min(c1, x - v * t2 / r) - 12 * s;
        final double hi = Math.max(c1, x - v * t2 / r) + 12 * s;
        final double h = Math.min(sigma(p, t1), sigma(p, t2)) / 4;
        final double composed = Integrals.trapezoid(
            y -> FreeSpaceKernel1D.of(p, y).value(x, t2) * first.value(y, t1),
            lo, hi, (int) Math.ceil((hi - lo) / h));
        final double direct = first.value(x, t1 + t2);
        assertEquals(direct, composed, 1e-12 * direct);
    }

    /** The point a try found: v = μ = 0 at the inflection point, where every term is 0. */
    @Example
    void satisfiesTheEquationWhereEveryTermVanishes() {
        satisfiesTheEquation(0.0, 0.0, 1.0, 0.0, 0.0, 1.0);
    }

    @Property(tries = 200)
    void satisfiesTheEquation(@ForAll @DoubleRange(min = -10, max = 10) double v,
                              @ForAll @DoubleRange(min = -2, max = 1) double logD,
                              @ForAll @DoubleRange(min = 1, max = 5) double r,
                              @ForAll @DoubleRange(min = 0, max = 1) double mu,
                              @ForAll @DoubleRange(min = -1, max = 1) double logT,
                              @ForAll @DoubleRange(min = -5, max = 5) double w) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, 0.3);
        final double x = 0.3 + v * t / r + w * sigma(p, t);
        final double d = p.dispersion();
        // Fourth-order central differences: in t of the value, in x of the exact gradient.
        // Steps of 2e-4 of the scale on which G changes (σ in x; t, and σ·R/|v| for the
        // passing front, in t) make truncation (~h⁴) and rounding (~ε/h) both below 1e-12.
        final double ht = 2e-4 * Math.min(t, sigma(p, t) * r / Math.max(Math.abs(v), 1e-300));
        final double gt = (-g.value(x, t + 2 * ht) + 8 * g.value(x, t + ht)
            - 8 * g.value(x, t - ht) + g.value(x, t - 2 * ht)) / (12 * ht);
        final double hx = 2e-4 * sigma(p, t);
        final double gxx = (-g.gradient(x + 2 * hx, t) + 8 * g.gradient(x + hx, t)
            - 8 * g.gradient(x - hx, t) + g.gradient(x - 2 * hx, t)) / (12 * hx);
        final double gx = g.gradient(x, t);
        final double c = g.value(x, t);
        final double residual = r * gt - d * gxx + v * gx + mu * c;
        final double scale = Math.abs(r * gt) + Math.abs(d * gxx) + Math.abs(v * gx)
            + Math.abs(mu * c);
        // plus the differences' rounding, a few ε of the values over the step (|G_x| ≤
        // (1 + |w|)|G|/σ): where every term vanishes (v = μ = 0 at the inflection points
        // w = ±1, a try found this) the scale alone is rounding and would demand 0
        final double noise = 1e-14 * Math.abs(c)
            * (r / ht + d * (1 + Math.abs(w)) / (sigma(p, t) * hx));
        assertEquals(0.0, residual, 1e-8 * scale + noise);
    }

    @Property(tries = 200)
    void gradientAndFluxAgreeWithTheValue(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                          @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                          @ForAll @DoubleRange(min = 1, max = 5) double r,
                                          @ForAll @DoubleRange(min = -1, max = 1) double logT,
                                          @ForAll @DoubleRange(min = -5, max = 5) double w) {
        final TransportParameters p = params(v, logD, r, 0.1);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, -1.0);
        final double x = -1.0 + v * t / r + w * sigma(p, t);
        final double h = 1e-3 * sigma(p, t);
        final double fd = (-g.value(x + 2 * h, t) + 8 * g.value(x + h, t)
            - 8 * g.value(x - h, t) + g.value(x - 2 * h, t)) / (12 * h);
        final double peak = g.value(v * t / r - 1.0, t);
        assertEquals(fd, g.gradient(x, t), 1e-8 * peak / sigma(p, t));
        assertEquals(v * g.value(x, t) - p.dispersion() * g.gradient(x, t), g.flux(x, t),
            1e-13 * (Math.abs(v * g.value(x, t)) + Math.abs(p.dispersion() * g.gradient(x, t))));
    }

    @Property(tries = 50)
    void batchEqualsScalarBitForBit(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                    @ForAll @DoubleRange(min = -3, max = 1) double logD,
                                    @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                    @ForAll @DoubleRange(min = -2, max = 2) double logT) {
        final TransportParameters p = params(v, logD, 1.5, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, 2.0);
        final double[] x = new double[257];
        for (int i = 0; i < x.length; i++) {
            x[i] = 2.0 + v * t / 1.5 + (i - 128) * sigma(p, t) / 8;
        }
        final double[] value = new double[x.length];
        final double[] gradient = new double[x.length];
        final double[] flux = new double[x.length];
        g.value(x, t, value);
        g.gradient(x, t, gradient);
        g.flux(x, t, flux);
        for (int i = 0; i < x.length; i++) {
            assertEquals(g.value(x[i], t), value[i], 0.0);
            assertEquals(g.gradient(x[i], t), gradient[i], 0.0);
            assertEquals(g.flux(x[i], t), flux[i], 0.0);
        }
        // out may alias x
        final double[] alias = x.clone();
        g.value(alias, t, alias);
        for (int i = 0; i < x.length; i++) {
            assertEquals(value[i], alias[i], 0.0);
        }
    }

    @Property(tries = 300)
    void neverNaNOnValidInput(@ForAll @DoubleRange(min = -1e8, max = 1e8) double v,
                              @ForAll @DoubleRange(min = -12, max = 8) double logD,
                              @ForAll @DoubleRange(min = 1, max = 1e3) double r,
                              @ForAll @DoubleRange(min = 0, max = 1e3) double mu,
                              @ForAll @DoubleRange(min = -12, max = 8) double logT,
                              @ForAll @DoubleRange(min = -1e6, max = 1e6) double x) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, 0.0);
        final double c = g.value(x, t);
        assertTrue(c >= 0 && c < Double.POSITIVE_INFINITY, () -> "value " + c);
        assertTrue(!Double.isNaN(g.gradient(x, t)) && !Double.isNaN(g.flux(x, t)));
    }
}
