package org.advecta.solution;

import org.advecta.internal.CentredErfSeries;
import org.advecta.internal.Checks;
import org.advecta.internal.ScaledErfDifference;
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
 * <p>The box convolved with the free-space kernel (Crank 1975, eq. 2.15 (number recalled), in
 * the moving coordinate). For a slug up to a spread wide the difference of erf values is
 * formed from the centre m and half-width h ({@link ErrorFunctions#erfDifferenceCentred(double,
 * double, double)}, which also applies the decay), so it does not cancel for a thin slug
 * (b − a ≪ L); for a wider one, from the ends' arguments (x − vt/R − a)/L and
 * (x − vt/R − b)/L themselves, since m ± h would carry the rounding of m and h, each of the
 * slug's width in spreads. Either way it does not cancel in the tails (both erf near ±1). The
 * gradient uses exp(−α²) − exp(−β²) = exp(−β²)·expm1(β² − α²) with β² − α² = −4mh computed
 * from m and h, and β from its end where the slug is wide.
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
        if (h <= CentredErfSeries.MAX_HALF_WIDTH
            && Math.abs(m) * h <= CentredErfSeries.MAX_CENTRE_TIMES_HALF_WIDTH) {
            // the decay joins the difference's own exponential where its series serves
            return c0 * (0.5 * ErrorFunctions.erfDifferenceCentred(m, h, decayExponent(t)));
        }
        // a wide slug: the ends' arguments from x − a and x − b themselves, since m ± h
        // would carry the rounding of m and h, each of size the slug's width in units of L
        return c0 * (0.5 * ScaledErfDifference.value(edge(x, t, b, inverseLength),
            edge(x, t, a, inverseLength), decayExponent(t)));
    }

    /**
     * (x − vt/R − end)/L, with x − vt/R rounded once (fma) before the end is subtracted: were
     * vt/R + end rounded first, a drift far beyond the slug's ends would leave its rounding in
     * each end's argument (an end of 4e-4 beside vt/R = 1 gave 16 times max(16, 2κ) ULP).
     */
    private double edge(double x, double t, double end, double inverseLength) {
        return (Math.fma(-drift, t, x) - end) * inverseLength;
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
        // the exponent's argument from its own end (x − b or x − a), not from m ∓ h, whose
        // roundings are of the slug's width (1.5 times outside max(16, 2κ) ULP for a slug 90
        // spreads wide)
        final boolean wide = h > CentredErfSeries.MAX_HALF_WIDTH;
        final double diff;
        if (m >= 0) {
            diff = ScaledExp.value(scale * Math.expm1(-4 * m * h), decay,
                wide ? edge(x, t, b, s.inverseLength()) : m - h);
        } else {
            diff = ScaledExp.value(-scale * Math.expm1(4 * m * h), decay,
                wide ? edge(x, t, a, s.inverseLength()) : m + h);
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
