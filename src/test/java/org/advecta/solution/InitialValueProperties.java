package org.advecta.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.testing.Integrals;
import org.advecta.transport.TransportParameters;

/** Invariants of the infinite-line families. */
class InitialValueProperties {

    private static TransportParameters params(double v, double logD, double r, double mu) {
        return TransportParameters.of(v, Math.pow(10, logD)).withRetardation(r).withDecay(mu);
    }

    @Property(tries = 300)
    void slugIsTheDifferenceOfTwoSteps(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                       @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                       @ForAll @DoubleRange(min = 1, max = 4) double r,
                                       @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                       @ForAll @DoubleRange(min = -5, max = 5) double a,
                                       @ForAll @DoubleRange(min = 0.01, max = 5) double width,
                                       @ForAll @DoubleRange(min = -20, max = 20) double x,
                                       @ForAll @DoubleRange(min = 0.01, max = 10) double t) {
        // superposition: C₀ on (a, b) = C₀ on x > a minus C₀ on x > b
        final TransportParameters p = params(v, logD, r, mu);
        final double b = a + width;
        final double slug = InitialSlug.of(p, a, b, 3.0).value(x, t);
        final double left = InitialStep.of(p, a, 3.0, InitialStep.Side.RIGHT).value(x, t);
        final double right = InitialStep.of(p, b, 3.0, InitialStep.Side.RIGHT).value(x, t);
        // Each of the three is within its contract, (16 + 2κ) ulp. Their condition number
        // with respect to x, the edges and the drift is about 2|A|·(|x| + |edge| + |vt/R|)/L,
        // and with respect to D, t, R about 2A² + 1, where A = (x − vt/R − edge)/L: the
        // identity holds to the sum of the three bounds.
        final double len = Math.sqrt(4 * p.dispersion() * t / r);
        final double aa = (x - v * t / r - a) / len;
        final double ab = (x - v * t / r - b) / len;
        final double am = Math.max(Math.abs(aa), Math.abs(ab));
        final double positions = Math.abs(x) + Math.abs(a) + Math.abs(b) + Math.abs(v * t / r);
        final double kappa = 2 * am * positions / len + 2 * am * am + 1;
        final double tol = (16 + 2 * kappa)
            * (Math.ulp(left) + Math.ulp(right) + Math.ulp(slug)) + 1e-300;
        assertEquals(left - right, slug, tol);
        final double gSlug = InitialSlug.of(p, a, b, 3.0).gradient(x, t);
        final double gLeft = InitialStep.of(p, a, 3.0, InitialStep.Side.RIGHT).gradient(x, t);
        final double gRight = InitialStep.of(p, b, 3.0, InitialStep.Side.RIGHT).gradient(x, t);
        assertEquals(gLeft - gRight, gSlug, (16 + 2 * kappa)
            * (Math.ulp(gLeft) + Math.ulp(gRight) + Math.ulp(gSlug)) + 1e-300);
    }

    @Property(tries = 200)
    void stepSidesAddUpToTheDecayingBackground(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                               @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                               @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                               @ForAll @DoubleRange(min = -20, max = 20) double x,
                                               @ForAll @DoubleRange(min = 0.01, max = 10) double t) {
        final TransportParameters p = params(v, logD, 2, mu);
        final double sum = InitialStep.of(p, 1, 2, InitialStep.Side.LEFT).value(x, t)
            + InitialStep.of(p, 1, 2, InitialStep.Side.RIGHT).value(x, t);
        assertEquals(DecayingBackground.of(p, 2).value(x, t), sum, 4 * Math.ulp(sum));
    }

    @Property(tries = 100)
    void slugAndGaussianConserveMassUpToDecay(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                              @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                              @ForAll @DoubleRange(min = 1, max = 4) double r,
                                              @ForAll @DoubleRange(min = 0, max = 1) double mu,
                                              @ForAll @DoubleRange(min = 0.1, max = 3) double s0,
                                              @ForAll @DoubleRange(min = 0.01, max = 10) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final double decay = Math.exp(-mu * t / r);
        final double c = v * t / r;
        final double spread = Math.sqrt(2 * p.dispersion() * t / r);
        final InitialGaussian g = InitialGaussian.of(p, 0.5, s0, 2.0);
        final double sd = Math.sqrt(s0 * s0 + spread * spread);
        final double gaussMass = Integrals.trapezoid(y -> g.value(y, t),
            0.5 + c - 12 * sd, 0.5 + c + 12 * sd, 400);
        assertEquals(2.0 * decay, gaussMass, 1e-12);
        final InitialSlug slug = InitialSlug.of(p, -1, 1, 1.5);
        // the trapezoid rule converges fast for this smooth, rapidly decaying profile
        final double slugMass = Integrals.trapezoid(y -> slug.value(y, t),
            c - 1 - 14 * spread, c + 1 + 14 * spread, 20000);
        assertEquals(3.0 * decay, slugMass, 1e-8);
    }

    @Property(tries = 200)
    void gaussianIsTheKernelAtAShiftedTime(@ForAll @DoubleRange(min = -10, max = 10) double v,
                                           @ForAll @DoubleRange(min = -2, max = 1) double logD,
                                           @ForAll @DoubleRange(min = 1, max = 4) double r,
                                           @ForAll @DoubleRange(min = 0.01, max = 10) double t,
                                           @ForAll @DoubleRange(min = -4, max = 4) double w) {
        // a Gaussian of variance s₀² = 2D·τ/R is the kernel released τ earlier (μ = 0)
        final TransportParameters p = params(v, logD, r, 0);
        final double tau = 0.7;
        final double s0 = Math.sqrt(2 * p.dispersion() * tau / r);
        final InitialGaussian g = InitialGaussian.of(p, v * tau / r, s0, 1.0);
        final FreeSpaceKernel1D k = FreeSpaceKernel1D.of(p, 0.0);
        final double x = v * (t + tau) / r + w * Math.sqrt(2 * p.dispersion() * (t + tau) / r);
        final double kernel = k.value(x, t + tau);
        // the inputs (s₀, centre) are rounded: allow their first-order effect, κ ~ 2 + 2w²
        assertEquals(kernel, g.value(x, t), 64 * (2 + 2 * w * w) * Math.ulp(kernel));
    }

    @Property(tries = 300)
    void satisfiesTheEquation(@ForAll @DoubleRange(min = -10, max = 10) double v,
                              @ForAll @DoubleRange(min = -1, max = 1) double logD,
                              @ForAll @DoubleRange(min = 1, max = 4) double r,
                              @ForAll @DoubleRange(min = 0, max = 1) double mu,
                              @ForAll @DoubleRange(min = -3, max = 3) double w,
                              @ForAll @DoubleRange(min = 0.1, max = 10) double t) {
        final TransportParameters p = params(v, logD, r, mu);
        final double d = p.dispersion();
        final double len = Math.sqrt(4 * d * t / r);
        final double x = v * t / r + w * len;
        for (Solution1D c : new Solution1D[] {
            InitialStep.of(p, 0, 1, InitialStep.Side.LEFT),
            InitialSlug.of(p, -0.5 * len, 0.3 * len, 2),
            InitialGaussian.of(p, 0.2 * len, 0.5 * len, 1),
            DecayingBackground.of(p, 1.5)}) {
            // time steps also below the time the front takes to pass, L·R/|v|
            final double ht = 1e-3 * Math.min(t / (1 + w * w),
                len * r / Math.max(Math.abs(v), 1e-300) / (1 + Math.abs(w)));
            final double hx = 1e-3 * len / (1 + Math.abs(w));
            final double ct = (-c.value(x, t + 2 * ht) + 8 * c.value(x, t + ht)
                - 8 * c.value(x, t - ht) + c.value(x, t - 2 * ht)) / (12 * ht);
            final double cxx = (-c.gradient(x + 2 * hx, t) + 8 * c.gradient(x + hx, t)
                - 8 * c.gradient(x - hx, t) + c.gradient(x - 2 * hx, t)) / (12 * hx);
            final double cv = c.value(x, t);
            final double cx = c.gradient(x, t);
            final double residual = r * ct - d * cxx + v * cx + mu * cv;
            final double scale = Math.abs(r * ct) + Math.abs(d * cxx) + Math.abs(v * cx)
                + Math.abs(mu * cv);
            final double noise = 1e-14 * Math.abs(cv) * (r / ht + d / (len * hx)
                + Math.abs(v) / len);
            assertEquals(0.0, residual, 1e-6 * scale + noise, c.getClass().getSimpleName());
        }
    }

    @Property(tries = 200)
    void positiveAndBounded(@ForAll @DoubleRange(min = -100, max = 100) double v,
                            @ForAll @DoubleRange(min = -3, max = 2) double logD,
                            @ForAll @DoubleRange(min = 1, max = 4) double r,
                            @ForAll @DoubleRange(min = 0, max = 1) double mu,
                            @ForAll @DoubleRange(min = -100, max = 100) double x,
                            @ForAll @DoubleRange(min = -3, max = 2) double logT) {
        final TransportParameters p = params(v, logD, r, mu);
        final double t = Math.pow(10, logT);
        final double step = InitialStep.of(p, 0, 2, InitialStep.Side.LEFT).value(x, t);
        final double slug = InitialSlug.of(p, -1, 1, 2).value(x, t);
        assertTrue(step >= 0 && step <= 2 && slug >= 0 && slug <= 2,
            () -> "step " + step + ", slug " + slug);
    }

    @Property(tries = 200)
    void smallDispersionKeepsTheStepSharp(@ForAll @DoubleRange(min = 0.1, max = 10) double v,
                                          @ForAll @DoubleRange(min = 0.5, max = 1.5) double where,
                                          @ForAll @DoubleRange(min = 1, max = 10) double t) {
        final double front = v * t;
        final InitialStep step = InitialStep.of(TransportParameters.of(v, 1e-9 * v * front), 0,
            1, InitialStep.Side.LEFT);
        if (Math.abs(where - 1) > 1e-3) {
            assertEquals(where < 1 ? 1.0 : 0.0, step.value(where * front, t), 1e-12);
        }
    }
}
