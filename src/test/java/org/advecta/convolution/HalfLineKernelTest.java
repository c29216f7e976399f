package org.advecta.convolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.advecta.halfspace.HalfLineSlug;
import org.advecta.halfspace.HalfLineStep;
import org.advecta.halfspace.HalfSpaceKernel1D;
import org.advecta.halfspace.Wall;
import org.advecta.solution.Domain;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * The half-line kernels' closed-form segment integrals against adaptive Gauss–Kronrod
 * quadrature of their own point values (an independent evaluation of the same integrals),
 * their gradients against central differences, and the wall conditions pointwise.
 */
class HalfLineKernelTest {

    private static final TransportParameters[] PARAMS = {
        TransportParameters.of(1.0, 0.1),
        TransportParameters.of(-2.0, 0.5).withRetardation(2.5).withDecay(0.3),
        TransportParameters.of(-1.0, 0.02),
        TransportParameters.of(4.0, 0.01).withRetardation(1.5),
        TransportParameters.of(0.0, 1.0),
        TransportParameters.of(-40.0, 0.01),
        TransportParameters.of(60.0, 0.01),
    };
    private static final double[] TIMES = {0.01, 0.3, 2.0};
    private static final double[] XS = {0.0, 0.05, 0.3, 1.0, 3.0};
    /** Segments: narrow, moderate, wide, at the wall, far. */
    private static final double[][] SEGMENTS = {
        {0.0, 0.01}, {0.0, 0.4}, {0.1, 0.1 + 1e-4}, {0.2, 0.9}, {0.5, 3.0}, {1.7, 1.75},
        {0.0, 6.0}, {2.5, 9.0},
    };

    private static ConvolutionKernel[] kernels(TransportParameters p) {
        return new ConvolutionKernel[] {HalfLineKernel.of(p, Wall.ABSORBING),
            HalfLineKernel.of(p, Wall.ZERO_FLUX)};
    }

    /** The panel width of the reference quadrature near the centres (set per kernel). */
    private static double panel = 1;
    /** The kernel's centre and the image's centre (set per point). */
    private static double[] centres = {0, 0};

    /**
     * ∫ f over [pts[0], pts[last]] split at the points, each piece cut into panels no wider
     * than {@link #panel} and summed by the 10-point Gauss–Legendre rule (Abramowitz &amp;
     * Stegun 25.4.29): with panels of a quarter kernel width the rule's error is far below
     * the tolerances used here.
     */
    private static double quad(AdaptiveKronrod.Integrand f, double... pts) {
        double sum = 0;
        for (int i = 0; i + 1 < pts.length; i++) {
            final double a = pts[i];
            final double b = pts[i + 1];
            // in the tails exp(−y²) falls off on the scale L/(2y): narrower panels there
            double near = Double.POSITIVE_INFINITY;
            for (double c : centres) {
                near = Math.min(near, c >= a && c <= b ? 0 : Math.min(Math.abs(c - a),
                    Math.abs(c - b)));
            }
            final double width = panel / (1 + 4 * near / (4 * panel));
            final int n = (int) Math.min(20_000, Math.ceil((b - a) / width));
            final double w = (b - a) / n;
            for (int j = 0; j < n; j++) {
                final double c = a + (j + 0.5) * w;
                for (int k = 0; k < org.advecta.internal.GaussLegendre.halfSize(); k++) {
                    final double u = 0.5 * w * org.advecta.internal.GaussLegendre.node(k);
                    sum += 0.5 * w * org.advecta.internal.GaussLegendre.weight(k)
                        * (f.at(c - u) + f.at(c + u));
                }
            }
        }
        return sum;
    }

    private static double[] splits(double a, double b, double... inner) {
        final double[] p = new double[inner.length + 2];
        int n = 0;
        p[n++] = a;
        java.util.Arrays.sort(inner);
        for (double s : inner) {
            if (s > p[n - 1] && s < b) {
                p[n++] = s;
            }
        }
        p[n++] = b;
        return java.util.Arrays.copyOf(p, n);
    }

    /**
     * 1e-12 plus the positions' own rounding, 16κ·2⁻⁵³ with κ = 2(1 + y)(|x| + |vt/R| + |ξ|)/L
     * at the segment's end nearest the kernel's centre (y its distance in widths): the
     * sensitivity the library's line kernel states for its own segment integrals.
     */
    private static double tolerance(double x, double d, double l, double a, double b) {
        final double c = x - d;
        final double y = c >= a && c <= b ? 0 : Math.min(Math.abs(c - a), Math.abs(c - b)) / l;
        final double kappa = 2 * (1 + y) * (Math.abs(x) + Math.abs(d) + Math.max(Math.abs(a),
            Math.abs(b))) / l;
        return 1e-12 + 16 * kappa * 0x1.0p-53;
    }

    @Test
    void segmentIntegralsEqualQuadratureOfThePointValues() {
        double worst = 0;
        int n = 0;
        for (TransportParameters p : PARAMS) {
            for (ConvolutionKernel k : kernels(p)) {
                for (double t : TIMES) {
                    final ConvolutionKernel.Snapshot s = k.at(t);
                    final double l = Math.sqrt(4 * p.dispersion() * t / p.retardation());
                    final double d = p.velocity() * t / p.retardation();
                    panel = l / 4;
                    for (double x : XS) {
                        centres = new double[] {x - d, -x - d};
                        for (double[] seg : SEGMENTS) {
                            final double a = seg[0];
                            final double b = seg[1];
                            final double fa = 1.25;
                            final double fb = -0.5;
                            final double closed = s.linear(x, a, b, fa, fb);
                            final double[] pts = splits(a, b, x - d, -x - d, x - d - 3 * l,
                                x - d + 3 * l, -x - d + 3 * l, -x - d - 3 * l);
                            final double num = quad(xi -> (fa + (fb - fa) * (xi - a) / (b - a))
                                * s.value(x, xi), pts);
                            // Σ|terms|: |φ|·|G| and the free part (the image is below it)
                            final double scale = quad(xi -> (Math.abs(fa) + Math.abs(fb))
                                * Math.abs(s.value(x, xi)), pts) + InfiniteLineKernel.of(p)
                                .at(t).linear(x, a, b, Math.abs(fa), Math.abs(fb));
                            final double err = Math.abs(closed - num);
                            final double tol = tolerance(x, d, l, a, b);
                            worst = Math.max(worst, err / (tol * scale + 1e-300));
                            n++;
                            final String where = k + " " + p + " t " + t + " x " + x + " [" + a
                                + ", " + b + "]";
                            assertTrue(err <= tol * scale + 1e-300, () -> where + ": closed " + closed
                                + " quadrature " + num + " error " + err + " scale " + scale);
                        }
                    }
                }
            }
        }
        System.out.printf("half-line segment integrals vs quadrature: %d cases, worst %.3g of "
            + "the tolerance%n", n, worst);
    }

    @Test
    void tailsAndGradientsEqualQuadrature() {
        for (TransportParameters p : PARAMS) {
            for (ConvolutionKernel k : kernels(p)) {
                for (double t : TIMES) {
                    final ConvolutionKernel.Snapshot s = k.at(t);
                    final ConvolutionKernel.Snapshot free = InfiniteLineKernel.of(p).at(t);
                    final double l = Math.sqrt(4 * p.dispersion() * t / p.retardation());
                    final double d = p.velocity() * t / p.retardation();
                    panel = l / 4;
                    for (double x : XS) {
                        centres = new double[] {x - d, -x - d};
                        final double far = Math.abs(x) + Math.abs(d) + 40 * l;
                        for (double b : new double[] {0.0, 0.4, 2.0}) {
                            final double[] pts = splits(b, far, x - d, -x - d, x - d - 3 * l,
                                x - d + 3 * l, b + l, b + 10 * l);
                            final double above = quad(xi -> s.value(x, xi), pts);
                            final double aboveScale = quad(xi -> Math.abs(s.value(x, xi)), pts)
                                + InfiniteLineKernel.of(p).at(t).above(x, b);
                            assertEquals(above, s.above(x, b), 10 * tolerance(x, d, l, b, far)
                                * aboveScale + 1e-300,
                                k + " " + p + " t " + t + " x " + x + " above " + b);
                            final double aboveG = quad(xi -> s.gradient(x, xi), pts);
                            final double gScale = quad(xi -> Math.abs(s.gradient(x, xi)), pts)
                                + quad(xi -> Math.abs(free.gradient(x, xi)), pts);
                            assertEquals(aboveG, s.aboveGradient(x, b), 1e-10 * gScale + 1e-300,
                                k + " " + p + " t " + t + " x " + x + " aboveGradient " + b);
                            if (b > 0) {
                                final double[] q = splits(0, b, x - d, -x - d, -x - d + 3 * l);
                                assertEquals(quad(xi -> s.value(x, xi), q), s.below(x, b),
                                    1e-11 * (quad(xi -> Math.abs(s.value(x, xi)), q)
                                    + free.linear(x, 0, b, 1, 1)) + 1e-300, k + " " + p + " t " + t
                                    + " x " + x + " below " + b);
                                final double lg = quad(xi -> (2 - xi) * s.gradient(x, xi), q);
                                final double lgScale = quad(xi -> Math.abs((2 - xi)
                                    * s.gradient(x, xi)), q) + quad(xi -> Math.abs((2 - xi)
                                    * free.gradient(x, xi)), q);
                                assertEquals(lg, s.linearGradient(x, 0, b, 2, 2 - b),
                                    1e-10 * lgScale + 1e-300, k + " " + p + " t " + t + " x "
                                    + x + " linearGradient [0, " + b + "]");
                            }
                        }
                        // the pointwise gradient against a central difference
                        if (x > 0.01) {
                            for (double xi : new double[] {0.0, 0.2, 1.1}) {
                                // the wall layer of the zero-flux wall is D/|v| thick
                                final double hh = 1e-5 * Math.min(l, p.velocity() == 0 ? l
                                    : p.dispersion() / Math.abs(p.velocity()));
                                final double fd = (s.value(x + hh, xi) - s.value(x - hh, xi))
                                    / (2 * hh);
                                final double g = s.gradient(x, xi);
                                final double sc = Math.abs(s.value(x, xi)) / l + Math.abs(g)
                                    + 1e-300;
                                assertEquals(fd, g, 1e-5 * sc, k + " " + p + " t " + t + " x "
                                    + x + " xi " + xi);
                            }
                        }
                    }
                }
            }
        }
    }

    /**
     * The half-space package's closed forms (org.advecta.halfspace, within max(16, 2κ) ULP by
     * their own fixtures): the point values and gradients equal HalfSpaceKernel1D, a box
     * (constant data on [a, b]) equals HalfLineSlug, the tail above a equals HalfLineStep.
     */
    @Test
    void agreesWithTheHalfSpaceClosedForms() {
        double worst = 0;
        for (TransportParameters p : PARAMS) {
            for (Wall wall : Wall.values()) {
                final ConvolutionKernel k = HalfLineKernel.of(p, wall);
                for (double t : TIMES) {
                    final ConvolutionKernel.Snapshot s = k.at(t);
                    final ConvolutionKernel.Snapshot free = InfiniteLineKernel.of(p).at(t);
                    final double l = Math.sqrt(4 * p.dispersion() * t / p.retardation());
                    final double d = p.velocity() * t / p.retardation();
                    for (double x : XS) {
                        // (HalfSpaceKernel1D takes sources ξ > 0)
                        for (double xi : new double[] {1e-3, 0.05, 0.3, 1.0, 2.5}) {
                            final HalfSpaceKernel1D g = HalfSpaceKernel1D.of(p, wall, xi);
                            final double scale = Math.abs(free.value(x, xi))
                                + Math.abs(g.value(x, t)) + 1e-300;
                            final double tol = tolerance(x, d, l, xi, xi);
                            worst = Math.max(worst, Math.abs(g.value(x, t) - s.value(x, xi))
                                / (tol * scale));
                            assertEquals(g.value(x, t), s.value(x, xi), tol * scale,
                                wall + " " + p + " t " + t + " x " + x + " xi " + xi);
                            final double gs = Math.abs(free.gradient(x, xi))
                                + Math.abs(g.gradient(x, t)) + scale / l;
                            assertEquals(g.gradient(x, t), s.gradient(x, xi), tol * gs,
                                wall + " " + p + " t " + t + " x " + x + " xi " + xi
                                + " gradient");
                        }
                        for (double[] seg : SEGMENTS) {
                            final double a = seg[0];
                            final double b = seg[1];
                            final double box = HalfLineSlug.of(p, wall, a, b, 1.5).value(x, t);
                            final double mine = s.linear(x, a, b, 1.5, 1.5);
                            final double scale = free.linear(x, a, b, 1.5, 1.5) + Math.abs(box)
                                + 1e-300;
                            final double tol = tolerance(x, d, l, a, b);
                            worst = Math.max(worst, Math.abs(box - mine) / (tol * scale));
                            assertEquals(box, mine, tol * scale, wall + " " + p + " t " + t
                                + " x " + x + " box [" + a + ", " + b + "]");
                            final double step = HalfLineStep.of(p, wall, a, 1.0).value(x, t);
                            final double tail = s.above(x, a);
                            final double tScale = free.above(x, a) + Math.abs(step) + 1e-300;
                            final double tTol = tolerance(x, d, l, a, a + 40 * l);
                            worst = Math.max(worst, Math.abs(step - tail) / (tTol * tScale));
                            assertEquals(step, tail, tTol * tScale, wall + " " + p + " t " + t
                                + " x " + x + " step at " + a);
                        }
                    }
                }
            }
        }
        System.out.printf("half-line kernel vs org.advecta.halfspace: worst %.3g of the "
            + "tolerance%n", worst);
    }

    @Test
    void wallConditionsHoldPointwise() {
        for (TransportParameters p : PARAMS) {
            for (double t : TIMES) {
                final ConvolutionKernel.Snapshot abs = HalfLineKernel.of(p, Wall.ABSORBING).at(t);
                final ConvolutionKernel.Snapshot zf = HalfLineKernel.of(p, Wall.ZERO_FLUX).at(t);
                for (double xi : new double[] {0.0, 0.05, 0.3, 1.0}) {
                    assertEquals(0.0, abs.value(0, xi), 0.0);
                    // v·G − D·∂G/∂x = 0 at x = 0 (relative to the size of each term)
                    final double g = zf.value(0, xi);
                    final double gx = zf.gradient(0, xi);
                    final double v = p.velocity();
                    final double dd = p.dispersion();
                    assertEquals(0.0, v * g - dd * gx, 1e-12 * (Math.abs(v * g) + Math.abs(dd * gx)
                        + Math.abs(v) * Math.abs(zf.value(xi, xi))) + 1e-300,
                        p + " t " + t + " xi " + xi);
                }
            }
        }
    }

    @Test
    void describesItself() {
        final TransportParameters p = TransportParameters.of(1, 1);
        assertEquals(Domain.HALF_LINE, HalfLineKernel.of(p, Wall.ABSORBING).domain());
        assertEquals(Wall.ZERO_FLUX, HalfLineKernel.of(p, Wall.ZERO_FLUX).wall());
        assertEquals(Wall.ABSORBING, HalfLineKernel.of(p, Wall.ABSORBING).wall());
        assertEquals(p, HalfLineKernel.of(p, Wall.ZERO_FLUX).parameters());
        assertTrue(!HalfLineKernel.of(p, Wall.ZERO_FLUX).at(1).translationInvariant());
        assertThrows(IllegalArgumentException.class,
            () -> HalfLineKernel.of(null, Wall.ABSORBING));
        assertThrows(IllegalArgumentException.class, () -> HalfLineKernel.of(p, null));
        assertThrows(IllegalArgumentException.class,
            () -> HalfLineKernel.of(p, Wall.ZERO_FLUX).at(-1));
        assertThrows(IllegalArgumentException.class, () -> HalfLineKernel.of(p, Wall.ZERO_FLUX)
            .at(Double.NaN));
    }
}
