package org.advecta.halfspace;

import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * A half-line x ≥ 0 with a {@link Wall} at x = 0, initially at concentration C₀ on a box
 * a &lt; x &lt; b (0 ≤ a &lt; b) and clean elsewhere: c = C₀·∫_a^b K(x, t; ξ) dξ with K the
 * half-line kernel ({@link HalfSpaceKernel1D}). Immutable and thread-safe;
 * {@link Domain#HALF_LINE}.
 *
 * <pre>
 * c = S(x, t; a) − S(x, t; b)
 * </pre>
 * with S the step of {@link HalfLineStep} (C₀ = 1), whose closed forms carry over. The
 * difference (and that of the gradients) is used where it cannot cancel by more than a
 * factor 2 (opposite signs, or magnitudes more than a factor 2 apart); elsewhere (a thin box, or a point far downstream of the box, where both steps are nearly
 * equal) the integral of the kernel over the box is evaluated directly, by Gauss–Legendre
 * quadrature on pieces cut at the kernel's centres and halved adaptively, which cannot cancel
 * since the kernel is positive.
 *
 * <p>At t = 0 the value is C₀ inside, 0 outside, C₀/2 at a &gt; 0 and b (at x = a = 0 the wall
 * value: 0 absorbing, C₀ zero flux); the gradient is 0 except +∞·C₀ at a and −∞·C₀ at b (0
 * at a = 0 for a zero-flux wall). The flux is v·c − D·∂c/∂x.
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double, κ the componentwise condition number with respect to x, t, a, b, C₀, v, D,
 * R, μ (enforced by reference fixtures); no NaN or infinity for valid input.
 */
public final class HalfLineSlug implements Solution1D {

    private final TransportParameters parameters;
    private final Wall wall;
    private final double a;
    private final double b;
    private final double c0;
    private final StepEngine engine;

    private HalfLineSlug(TransportParameters parameters, Wall wall, double a, double b,
                         double c0) {
        this.parameters = parameters;
        this.wall = wall;
        this.a = a;
        this.b = b;
        this.c0 = c0;
        this.engine = new StepEngine(parameters, wall);
    }

    /**
     * Returns the solution for concentration C₀ on a &lt; x &lt; b at t = 0.
     *
     * @param parameters v (either sign), D, R, μ
     * @param wall the wall condition at x = 0
     * @param a left end of the box, finite and ≥ 0
     * @param b right end of the box, finite and &gt; a
     * @param c0 the initial concentration, finite
     * @return the solution
     * @throws IllegalArgumentException if an argument is null or invalid
     */
    public static HalfLineSlug of(TransportParameters parameters, Wall wall, double a, double b,
                                  double c0) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (wall == null) {
            throw new IllegalArgumentException("wall: must not be null");
        }
        Checks.nonNegative("a", a);
        Checks.finite("b", b);
        if (!(b > a)) {
            throw Checks.fail("b", b, "must be > a = " + a);
        }
        return new HalfLineSlug(parameters, wall, a, b, Checks.finite("c0", c0));
    }

    @Override
    public TransportParameters parameters() {
        return parameters;
    }

    @Override
    public Domain domain() {
        return Domain.HALF_LINE;
    }

    /**
     * Returns the wall condition.
     *
     * @return the wall
     */
    public Wall wall() {
        return wall;
    }

    @Override
    public double value(double x, double t) {
        check(x, t);
        if (t == 0) {
            if (x == 0 && a == 0) {
                return wall == Wall.ABSORBING ? 0.0 : c0;
            }
            if (x == a || x == b) {
                return 0.5 * c0;
            }
            return x > a && x < b ? c0 : 0.0;
        }
        final double sa = engine.value(x, t, a);
        final double sb = engine.value(x, t, b);
        if (!cancels(sa, sb)) {
            return c0 * (sa - sb);
        }
        return c0 * quadrature(x, t, false);
    }

    @Override
    public double gradient(double x, double t) {
        check(x, t);
        if (t == 0) {
            if (c0 == 0 || (x != a && x != b) || (x == 0 && wall == Wall.ZERO_FLUX)) {
                return 0.0;
            }
            return (x == a ? c0 : -c0) * Double.POSITIVE_INFINITY;
        }
        final double ga = engine.gradient(x, t, a);
        final double gb = engine.gradient(x, t, b);
        if (!cancels(ga, gb)) {
            return c0 * (ga - gb);
        }
        return c0 * quadrature(x, t, true);
    }

    /** Whether p − q loses more than one bit: same sign and within a factor 2 (Sterbenz). */
    private static boolean cancels(double p, double q) {
        return (p > 0 && q > 0 || p < 0 && q < 0) && Math.abs(q) > 0.5 * Math.abs(p)
            && Math.abs(p) > 0.5 * Math.abs(q);
    }

    private double quadrature(double x, double t, boolean gradient) {
        final double len = Math.sqrt(4 * parameters.dispersion() * t / parameters.retardation());
        final double drift = parameters.retardedVelocity() * t;
        return KernelQuadrature.integrate(xi -> {
            final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(parameters, wall, xi);
            return gradient ? k.gradient(x, t) : k.value(x, t);
        }, a, b, x - drift, -x - drift, len);
    }

    private static void check(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
    }
}
