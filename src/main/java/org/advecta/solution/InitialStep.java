package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ExpErfc;
import org.advecta.transport.TransportParameters;
import org.apache.commons.numbers.gamma.Erfc;

/**
 * A step of concentration C₀ on one side of x₀ at t = 0, carried and spread by the flow on the
 * infinite line: a front moving into clean ground (or a clean front moving into contaminated
 * ground).
 *
 * <pre>
 * c(x, t) = C₀ · exp(−μt/R) · ½ erfc( ±(x − x₀ − vt/R) / √(4Dt/R) )     (+ for C₀ at x &lt; x₀)
 * </pre>
 *
 * <p>The initial step convolved with the free-space kernel (Crank 1975, <i>The Mathematics of
 * Diffusion</i>, eq. 2.14 (number recalled), with the moving coordinate x − vt/R). The product of the decay
 * factor and erfc is evaluated as one {@link ExpErfc} so that neither underflows first.
 *
 * <p>At t = 0 the value is C₀ on the loaded side, 0 on the other, C₀/2 at x₀; the gradient
 * is 0 away from x₀ and ∓∞ at x₀ (0 if C₀ = 0).
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double, κ the componentwise condition number with respect to x, t, x₀, C₀, v, D, R
 * and μ; no overflow, and 0 only below half of {@link Double#MIN_VALUE}.
 */
public final class InitialStep extends AbstractSolution1D {

    /** Which side of the step carries the concentration at t = 0. */
    public enum Side {
        /** c(x, 0) = C₀ for x &lt; x₀: the front advances into clean ground when v &gt; 0. */
        LEFT,
        /** c(x, 0) = C₀ for x &gt; x₀. */
        RIGHT
    }

    private final double x0;
    private final double c0;
    private final Side side;

    private InitialStep(TransportParameters parameters, double x0, double c0, Side side) {
        super(parameters, Domain.LINE);
        this.x0 = Checks.finite("x0", x0);
        this.c0 = Checks.finite("c0", c0);
        if (side == null) {
            throw new IllegalArgumentException("side: must not be null");
        }
        this.side = side;
    }

    /**
     * Returns the solution for a step at x₀.
     *
     * @param parameters v, D, R, μ
     * @param x0 position of the step, finite
     * @param c0 concentration on the loaded side, finite
     * @param side which side is loaded
     * @return the solution
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static InitialStep of(TransportParameters parameters, double x0, double c0,
                                 Side side) {
        return new InitialStep(parameters, x0, c0, side);
    }

    /**
     * Returns the position x₀ of the step.
     *
     * @return x₀
     */
    public double position() {
        return x0;
    }

    /**
     * Returns the concentration C₀ on the loaded side.
     *
     * @return C₀
     */
    public double concentration() {
        return c0;
    }

    /**
     * Returns which side is loaded at t = 0.
     *
     * @return the side
     */
    public Side side() {
        return side;
    }

    private double sign() {
        return side == Side.LEFT ? 1.0 : -1.0;
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
        final double a = sign() * ((x - centre(t)) * inverseLength);
        final double decay = decayExponent(t);
        if (a < PLAIN_ERFC_BELOW && decay >= -PLAIN_DECAY_ABOVE) {
            // Both factors are normal doubles here (erfc(a) > 1e-295, e^decay > 1e-304), so
            // the plain product is within a few ULP (Commons Numbers' erfc: 1.6 ULP in its
            // far tail, NUMERICS.md; exp 1; the product 0.5; initial_step.csv measures the
            // whole); ExpErfc's scaled form, for exponents this solution never has, cost
            // about a twentieth of its time (interleaved timing against the plain formula).
            return c0 * (0.5 * (Math.exp(decay) * Erfc.value(a)));
        }
        return c0 * (0.5 * ExpErfc.value(decay, a));
    }

    /** erfc(a) is a normal double for a below this (it becomes subnormal near 26.55). */
    private static final double PLAIN_ERFC_BELOW = 26;
    /** e^decay is a normal double for decay above minus this. */
    private static final double PLAIN_DECAY_ABOVE = 700;

    @Override
    double gradientAt(double x, double t) {
        // ∂/∂x ½erfc(±ξ/L) = ∓exp(−ξ²/L²)/(L√π)
        final Spread s = Spread.ofInverseLength(dispersion, retardation, t);
        final double a = s.scaled(x - centre(t));
        return -sign() * c0
            * ScaledExp.value(s.inverseLength() / SQRT_PI, decayExponent(t), a);
    }

    @Override
    double initialValue(double x) {
        if (x == x0) {
            return 0.5 * c0;
        }
        return (x < x0) == (side == Side.LEFT) ? c0 : 0.0;
    }

    @Override
    double initialGradient(double x) {
        return x == x0 && c0 != 0 ? -sign() * c0 * Double.POSITIVE_INFINITY : 0.0;
    }

    private double centre(double t) {
        return Math.fma(drift, t, x0);
    }

    private static final double SQRT_PI = Math.sqrt(Math.PI);
}
