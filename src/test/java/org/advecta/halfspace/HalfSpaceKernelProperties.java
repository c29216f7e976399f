package org.advecta.halfspace;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;

/** Invariants of the 1D half-line kernels, for all inputs in the ranges drawn. */
class HalfSpaceKernelProperties {

    private static TransportParameters params(double v, double logD, double r, double mu) {
        return TransportParameters.of(v, Math.pow(10, logD)).withRetardation(r).withDecay(mu);
    }

    /**
     * e^{−μt/R} with the argument carried to double-double, so only Math.exp's 1-ulp error
     * and the first-order correction's rounding remain: within 2 ulp of a 60-digit value on
     * 10⁶ random points of the property's range. The plain {@code Math.exp(-mu * t / r)}
     * rounds μt/R twice and was off by up to 4 ulp there (it failed one CI run).
     */
    private static double decayFactor(double mu, double t, double r) {
        final double p = mu * t;
        final double pe = Math.fma(mu, t, -p);
        final double q = p / r;
        final double qe = (Math.fma(-q, r, p) + pe) / r;
        return Math.exp(-q) * (1 - qe);
    }

    private static Wall wall(boolean absorbing) {
        return absorbing ? Wall.ABSORBING : Wall.ZERO_FLUX;
    }

    @Property(tries = 400)
    void wallConditionHolds(@ForAll boolean absorbing,
                            @ForAll @DoubleRange(min = -1e6, max = 1e6) double v,
                            @ForAll @DoubleRange(min = -2, max = 1) double logD,
                            @ForAll @DoubleRange(min = 1, max = 4) double r,
                            @ForAll @DoubleRange(min = 0, max = 2) double mu,
                            @ForAll @DoubleRange(min = -6, max = 0.5) double logXi,
                            @ForAll @DoubleRange(min = -4, max = 1) double logT) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(p, wall(absorbing), Math.pow(10, logXi));
        if (absorbing) {
            // c(0, t) = 0 exactly; the wall flux is −D ∂c/∂x there
            assertEquals(0.0, k.value(0, t));
            final double g = k.gradient(0, t);
            assertTrue(g >= 0, "gradient at an absorbing wall must be >= 0: " + g);
            assertEquals(-p.dispersion() * g, k.wallFlux(t),
                1e-13 * Math.abs(p.dispersion() * g) + 1e-300);
        } else {
            // v c − D ∂c/∂x = 0 at x = 0: exactly for the flux, and from value and gradient
            assertEquals(0.0, k.flux(0, t));
            assertEquals(0.0, k.wallFlux(t));
            final double vc = v * k.value(0, t);
            final double dcx = p.dispersion() * k.gradient(0, t);
            assertEquals(0.0, vc - dcx, 1e-12 * Math.max(Math.abs(vc), Math.abs(dcx)) + 1e-300,
                () -> "v c = " + vc + ", D c_x = " + dcx);
        }
    }

    @Property(tries = 300)
    void satisfiesTheEquation(@ForAll boolean absorbing,
                              @ForAll @DoubleRange(min = -5, max = 5) double v,
                              @ForAll @DoubleRange(min = -1, max = 0.5) double logD,
                              @ForAll @DoubleRange(min = 1, max = 4) double r,
                              @ForAll @DoubleRange(min = 0, max = 1) double mu,
                              @ForAll @DoubleRange(min = 0.1, max = 3) double xi,
                              @ForAll @DoubleRange(min = 0.05, max = 6) double x,
                              @ForAll @DoubleRange(min = 0.1, max = 5) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final HalfSpaceKernel1D c = HalfSpaceKernel1D.of(p, wall(absorbing), xi);
        final double d = p.dispersion();
        // fourth-order central differences with steps 1e-3 of the scales on which c changes
        final double len = Math.sqrt(4 * d * t / r);
        final double a = Math.abs(x - xi - v * t / r) / len;
        final double ht = 1e-3 * Math.min(t / (1 + a * a),
            len * r / Math.max(Math.abs(v), 1e-300) / (1 + a));
        final double hx = 1e-3 * Math.min(x, len / (1 + a));
        final double ct = (-c.value(x, t + 2 * ht) + 8 * c.value(x, t + ht)
            - 8 * c.value(x, t - ht) + c.value(x, t - 2 * ht)) / (12 * ht);
        final double cxx = (-c.gradient(x + 2 * hx, t) + 8 * c.gradient(x + hx, t)
            - 8 * c.gradient(x - hx, t) + c.gradient(x - 2 * hx, t)) / (12 * hx);
        final double cx = c.gradient(x, t);
        final double cv = c.value(x, t);
        final double residual = r * ct - d * cxx + v * cx + mu * cv;
        final double scale = Math.abs(r * ct) + Math.abs(d * cxx) + Math.abs(v * cx)
            + Math.abs(mu * cv);
        final double noise = 1e-14 * Math.abs(cv) * (r / ht + d / (len * hx) + Math.abs(v) / len)
            + 1e-300;
        assertEquals(0.0, residual, 1e-6 * scale + noise, () -> "c = " + cv);
        // the gradient is the derivative of the value, the flux v c − D c_x
        final double fd = (-c.value(x + 2 * hx, t) + 8 * c.value(x + hx, t)
            - 8 * c.value(x - hx, t) + c.value(x - 2 * hx, t)) / (12 * hx);
        assertEquals(cx, fd, 1e-6 * (Math.abs(cx) + Math.abs(cv) / len) + 1e-300);
        final double flux = c.flux(x, t);
        assertEquals(v * cv - d * cx, flux,
            1e-12 * (Math.abs(v * cv) + Math.abs(d * cx)) + 1e-300);
    }

    @Property(tries = 100)
    void massAccounting(@ForAll boolean absorbing,
                        @ForAll @DoubleRange(min = -5, max = 5) double v,
                        @ForAll @DoubleRange(min = -1, max = 0.5) double logD,
                        @ForAll @DoubleRange(min = 1, max = 3) double r,
                        @ForAll @DoubleRange(min = 0, max = 1) double mu,
                        @ForAll @DoubleRange(min = 0.1, max = 3) double xi,
                        @ForAll @DoubleRange(min = 0.05, max = 4) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(p, wall(absorbing), xi);
        final double d = p.dispersion();
        final double len = Math.sqrt(4 * d * t / r);
        // mass in the domain by quadrature over x: the trapezoid rule on [0, far] with a step
        // of L/40 (the kernel's scale; for a zero-flux wall with v < 0 also the wall layer D/|v|)
        final double scale = Math.min(len, v < 0 ? d / -v : len);
        final double far = xi + Math.abs(v) * t / r + 14 * len;
        final int n = (int) Math.min(400_000, Math.ceil(far / (scale / 40)));
        final double inDomain = Integrals.trapezoid(x -> k.value(x, t), 0, far, n)
            - trapezoidEndCorrection(k, far, t, n);
        final double closed = k.massInDomain(t);
        assertEquals(closed, inDomain, 1e-7 * Math.max(closed, 1e-3));
        final double decayFactor = decayFactor(mu, t, r);
        if (!absorbing) {
            assertEquals(decayFactor, closed, 2 * Math.ulp(decayFactor));
            assertEquals(0.0, k.massOut(t));
            return;
        }
        // in the domain + out through the wall + decayed = 1; decayed = ∫ (μ/R)·M ds by the
        // trapezoid rule with its Euler–Maclaurin end correction h²/12·(f′(t) − f′(0)), where
        // f′ = (μ/R)·M′ and R·M′ = wallFlux − μM (the balance of the half-line)
        final int m = 20_000;
        final double h = t / m;
        final double decayed = mu == 0 ? 0.0
            : Integrals.trapezoid(s -> mu / r * k.massInDomain(s), 0, t, m)
                - h * h / 12 * (mu / r * (k.wallFlux(t) - mu * closed) / r
                    - mu / r * (-mu) / r);
        final double out = k.massOut(t);
        assertEquals(1.0, closed + out + decayed, mu == 0 ? 1e-14 : 1e-8);
        // mass out grows at the rate −wallFlux/R (fourth-order difference in time)
        final double arrival = (xi + Math.abs(v) * t / r) / len;
        final double ht = 1e-3 * Math.min(t / (1 + arrival * arrival),
            len * r / Math.max(Math.abs(v), 1e-300) / (1 + arrival));
        final double rate = (-k.massOut(t + 2 * ht) + 8 * k.massOut(t + ht)
            - 8 * k.massOut(t - ht) + k.massOut(t - 2 * ht)) / (12 * ht);
        assertEquals(-k.wallFlux(t) / r, rate, 1e-6 * Math.abs(rate) + 1e-12 * out / ht
            + 1e-300);
    }

    /** The trapezoid rule's first end correction at x = 0, where c does not vanish smoothly. */
    private static double trapezoidEndCorrection(HalfSpaceKernel1D k, double far, double t,
                                                 int n) {
        final double h = far / n;
        return -h * h / 12 * k.gradient(0, t);
    }

    @Property(tries = 400)
    void positiveAndBounded(@ForAll boolean absorbing,
                            @ForAll @DoubleRange(min = -1e8, max = 1e8) double v,
                            @ForAll @DoubleRange(min = -3, max = 2) double logD,
                            @ForAll @DoubleRange(min = 1, max = 10) double r,
                            @ForAll @DoubleRange(min = 0, max = 10) double mu,
                            @ForAll @DoubleRange(min = -9, max = 1) double logXi,
                            @ForAll @DoubleRange(min = 0, max = 100) double x,
                            @ForAll @DoubleRange(min = -9, max = 2) double logT) {
        final double t = Math.pow(10, logT);
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(params(v, logD, r, mu), wall(absorbing),
            Math.pow(10, logXi));
        final double c = k.value(x, t);
        assertTrue(c >= 0 && c < Double.POSITIVE_INFINITY, "c = " + c);
        assertTrue(Double.isFinite(k.gradient(x, t)));
        assertTrue(Double.isFinite(k.flux(x, t)));
        final double m = k.massInDomain(t);
        final double out = k.massOut(t);
        assertTrue(m >= 0 && m <= 1 + 1e-15, "mass in domain " + m);
        assertTrue(out >= 0 && out <= 1 + 1e-15, "mass out " + out);
        assertTrue(m + out <= 1 + 1e-12, "in + out = " + (m + out));
        assertTrue(k.wallFlux(t) <= 0);
    }

    @Property(tries = 300)
    void farFromTheWallIsTheFreeSpaceKernel(@ForAll boolean absorbing,
                                           @ForAll @DoubleRange(min = -5, max = 5) double v,
                                           @ForAll @DoubleRange(min = -1, max = 0.5) double logD,
                                           @ForAll @DoubleRange(min = 1, max = 3) double r,
                                           @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                           @ForAll @DoubleRange(min = -3, max = 3) double z,
                                           @ForAll @DoubleRange(min = 0.05, max = 4) double t) {
        // ξ far beyond the reach of the plume (the front of the image is 30 L from the wall):
        // the image and the erfc term are below 1e-300 of the kernel
        final TransportParameters p = params(v, logD, r, mu);
        final double len = Math.sqrt(4 * p.dispersion() * t / r);
        final double xi = Math.abs(v) * t / r + 30 * len;
        final double x = xi + v * t / r + z * len;
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(p, wall(absorbing), xi);
        final FreeSpaceKernel1D g = FreeSpaceKernel1D.of(p, xi);
        final double expected = g.value(x, t);
        assertEquals(expected, k.value(x, t), 64 * Math.ulp(expected) * (1 + z * z));
        final double grad = g.gradient(x, t);
        assertEquals(grad, k.gradient(x, t), 64 * (Math.ulp(grad) + Math.ulp(expected) / len)
            * (1 + z * z));
    }

    @Property(tries = 300)
    void withoutFlowTheImageIsTheMirror(@ForAll boolean absorbing,
                                        @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                        @ForAll @DoubleRange(min = 1, max = 3) double r,
                                        @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                        @ForAll @DoubleRange(min = 0.01, max = 3) double xi,
                                        @ForAll @DoubleRange(min = 0, max = 6) double x,
                                        @ForAll @DoubleRange(min = 0.01, max = 4) double t) {
        // v = 0: c = G(x; ξ) ∓ G(x; −ξ), the classical mirror images (Carslaw & Jaeger §10.10)
        final TransportParameters p = params(0.0, logD, r, mu);
        final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(p, wall(absorbing), xi);
        final double source = FreeSpaceKernel1D.of(p, xi).value(x, t);
        final double image = FreeSpaceKernel1D.of(p, -xi).value(x, t);
        final double expected = absorbing ? source - image : source + image;
        // the difference of two kernels loses ulp(source)·(its cancellation); both are within
        // max(16, 2κ) ulp with κ ≤ 2q + 3, q = (x ± ξ)²R/(4Dt)
        final double len = Math.sqrt(4 * p.dispersion() * t / r);
        final double q = (x + xi) * (x + xi) / (len * len);
        final double tol = (16 + 4 * q + 6) * (Math.ulp(source) + Math.ulp(image)) + 1e-300;
        assertEquals(expected, k.value(x, t), tol);
    }
}
