package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ErrorFunctions;
import org.advecta.transport.TransportParameters;

/**
 * A slug of concentration C₀ on a &lt; x &lt; b at t = 0 on the infinite line, carried and spread
 * by the flow.
 *
 * <pre>
 * c(x, t) = C₀ · exp(−μt/R) · ½ [erf((x − vt/R − a)/L) − erf((x − vt/R − b)/L)],  L = √(4Dt/R)
 *         = C₀ · exp(−μt/R) · ½ [erf(m + h) − erf(m − h)],  m = (x − vt/R − (a+b)/2)/L,
 *                                                            h = (b − a)/(2L)
 * </pre>
 *
 * <p>The box convolved with the free-space kernel (Crank 1975, eq. 2.15 (number recalled), in the moving
 * coordinate). The difference of erf values is formed from the centre m and half-width h
 * ({@link ErrorFunctions#erfDifferenceCentred(double, double, double)}, which also applies
 * the decay), so it does not cancel in the tails (both erf near ±1) nor for a thin slug
 * (b − a ≪ L). The gradient uses
 * exp(−α²) − exp(−β²) = exp(−β²)·expm1(β² − α²) with β² − α² = −4mh computed from m and h.
 *
 * <p>At t = 0 the value is C₀ inside, 0 outside, C₀/2 at a and b; the gradient is 0 except
 * ±∞ at a and b (0 if C₀ = 0).
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double (κ with respect to x, t, a, b, C₀, v, D, R, μ).
 */
public final class InitialSlug extends AbstractSolution1D {

    private final double a;
    private final double b;
    private final double c0;
    private final double middle;
    private final double halfWidth;

    private InitialSlug(TransportParameters parameters, double a, double b, double c0) {
        super(parameters, Domain.LINE);
        this.a = Checks.finite("a", a);
        this.b = Checks.finite("b", b);
        if (!(b > a)) {
            throw Checks.fail("b", b, "must be > a = " + a);
        }
        this.c0 = Checks.finite("c0", c0);
        this.middle = 0.5 * a + 0.5 * b;
        this.halfWidth = 0.5 * b - 0.5 * a;
    }

    /**
     * Returns the solution for a slug on (a, b).
     *
     * @param parameters v, D, R, μ
     * @param a left end, finite
     * @param b right end, finite and &gt; a
     * @param c0 concentration in the slug, finite
     * @return the solution
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static InitialSlug of(TransportParameters parameters, double a, double b,
                                 double c0) {
        return new InitialSlug(parameters, a, b, c0);
    }

    /**
     * Returns the left end a of the slug at t = 0.
     *
     * @return a
     */
    public double left() {
        return a;
    }

    /**
     * Returns the right end b of the slug at t = 0.
     *
     * @return b
     */
    public double right() {
        return b;
    }

    /**
     * Returns the concentration C₀ in the slug at t = 0.
     *
     * @return C₀
     */
    public double concentration() {
        return c0;
    }

    @Override
    double valueAt(double x, double t) {
        return value(x, t, Spread.inverseLength(dispersion, retardation, t));
    }

    @Override
    double valueAt(double x, double t, Spread s) {
        return value(x, t, s.inverseLength());
    }

    private double value(double x, double t, double inverseLength) {
        final double m = (x - Math.fma(drift, t, middle)) * inverseLength;
        final double h = halfWidth * inverseLength;
        // the decay joins the difference's own exponential where its series serves
        return c0 * (0.5 * ErrorFunctions.erfDifferenceCentred(m, h, decayExponent(t)));
    }

    @Override
    double gradientAt(double x, double t) {
        final Spread s = Spread.ofInverseLength(dispersion, retardation, t);
        final double m = s.scaled(x - Math.fma(drift, t, middle));
        final double h = s.scaled(halfWidth);
        final double scale = s.inverseLength() / SQRT_PI;
        final double decay = decayExponent(t);
        // ∂c/∂x = C₀ e^{−μt/R}/(L√π) · [exp(−α²) − exp(−β²)],  α = m + h, β = m − h;
        // factor out the larger of the two exponentials: α² − β² = 4mh.
        final double diff;
        if (m >= 0) {
            diff = ScaledExp.value(scale * Math.expm1(-4 * m * h), decay, m - h);
        } else {
            diff = ScaledExp.value(-scale * Math.expm1(4 * m * h), decay, m + h);
        }
        return c0 * diff;
    }

    @Override
    double initialValue(double x) {
        if (x == a || x == b) {
            return 0.5 * c0;
        }
        return x > a && x < b ? c0 : 0.0;
    }

    @Override
    double initialGradient(double x) {
        if (c0 == 0 || (x != a && x != b)) {
            return 0.0;
        }
        return (x == a ? c0 : -c0) * Double.POSITIVE_INFINITY;
    }

    private static final double SQRT_PI = Math.sqrt(Math.PI);
}
