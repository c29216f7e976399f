package org.advecta.convolution;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.advecta.internal.Checks;
import org.advecta.quadrature.Estimate;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;
import org.advecta.transport.TransportParameters;

/**
 * A clean half-line x ≥ 0 fed at x = 0 with an inlet concentration g(t) given as a function:
 * Duhamel's integral of g against the impulse response, by adaptive Gauss–Kronrod quadrature
 * with an error estimate. Immutable and thread-safe (if g is).
 *
 * <pre>
 * c(x, t) = ∫₀ᵗ g(s)·K(x, t − s) ds,   K(x, τ) = (1/R)·k(x, τ/R)·exp(−μτ/R)
 * first type:  k(x, τ) = x / √(4πDτ³) · exp(−(x − vτ)²/(4Dτ))
 * third type:  k(x, τ) = v/√(πDτ) · exp(−(x − vτ)²/(4Dτ)) − (v²/(2D))·exp(vx/D)·erfc((x + vτ)/√(4Dτ))
 *                      = (2v/ℓ)·exp(−a²)·[−½erfcx′(b) + (x/ℓ)·erfcx(b)],
 *              ℓ = √(4Dτ),  a = (x − vτ)/ℓ,  b = (x + vτ)/ℓ   (evaluated form, no cancellation)
 * </pre>
 * K is the response to a unit Dirac input: the time derivative of the constant-input
 * solution (Ogata &amp; Banks 1961; for the third type the flux-injection impulse response,
 * e.g. van Genuchten &amp; Alves 1982 — formula recalled from memory and verified in the tests by
 * ∫₀ᵗ K dτ = the library's constant-input solution). Decay acts on the released solute
 * only, so it enters as the factor exp(−μτ/R).
 *
 * <p><b>Method and accuracy.</b> The integral over [0, t] is split at the declared
 * breakpoints of g and at the arrival time t − xR/v of the impulse response's peak, then
 * integrated as in {@link FunctionConvolution} (Gauss sum returned, 2·|Σ(K₁₅ − G₇)| plus
 * rounding as the estimate). The third-type impulse response has an integrable 1/√τ
 * singularity at τ → 0 (x near 0), which the bisection resolves at some cost. At x = 0 the
 * first type returns g(t) exactly.
 */
public final class FunctionInlet {

    private static final int MAX_INTERVALS = 2000;

    private final TransportParameters parameters;
    private final InletCondition condition;
    private final DoubleUnaryOperator input;
    private final double[] breakpoints;
    private final double absTol;
    private final double relTol;

    private FunctionInlet(TransportParameters parameters, InletCondition condition,
                          DoubleUnaryOperator input, double[] breakpoints, double absTol,
                          double relTol) {
        this.parameters = parameters;
        this.condition = condition;
        this.input = input;
        this.breakpoints = breakpoints;
        this.absTol = absTol;
        this.relTol = relTol;
    }

    /**
     * Returns the solution for input g, tolerance 1e-12 relative (1e-300 absolute).
     *
     * @param parameters v, D, R, μ (v &gt; 0 for the third type)
     * @param condition the inlet condition
     * @param input g(t) for t ≥ 0, finite
     * @return the solution
     * @throws IllegalArgumentException if an argument is null or v ≤ 0 for the third type
     */
    public static FunctionInlet of(TransportParameters parameters, InletCondition condition,
                                   DoubleUnaryOperator input) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (condition == null) {
            throw new IllegalArgumentException("condition: must not be null");
        }
        if (input == null) {
            throw new IllegalArgumentException("input: must not be null");
        }
        if (condition == InletCondition.THIRD_TYPE && !(parameters.velocity() > 0)) {
            throw Checks.fail("v", parameters.velocity(), "must be > 0 for a third-type inlet");
        }
        return new FunctionInlet(parameters, condition, input, new double[0], 1e-300, 1e-12);
    }

    /**
     * Returns a copy whose quadrature splits at the given times (kinks and jumps of g).
     *
     * @param points finite times, any order; not modified (copied)
     * @return the new solution
     * @throws IllegalArgumentException if a point is not finite
     */
    public FunctionInlet withBreakpoints(double... points) {
        if (points == null) {
            throw new IllegalArgumentException("points: must not be null");
        }
        final double[] p = points.clone();
        for (int i = 0; i < p.length; i++) {
            Checks.finite("points[" + i + "]", p[i]);
        }
        Arrays.sort(p);
        return new FunctionInlet(parameters, condition, input, p, absTol, relTol);
    }

    /**
     * Returns a copy with the given tolerance (see
     * {@link FunctionConvolution#withTolerance(double, double)}).
     *
     * @param absolute absolute tolerance, finite and ≥ 1e-300
     * @param relative relative tolerance, in [1e-15, 1)
     * @return the new solution
     * @throws IllegalArgumentException if a tolerance is invalid
     */
    public FunctionInlet withTolerance(double absolute, double relative) {
        Checks.atLeast("absolute", absolute, 1e-300);
        if (!(relative >= 1e-15 && relative < 1)) {
            throw Checks.fail("relative", relative, "must be in [1e-15, 1)");
        }
        return new FunctionInlet(parameters, condition, input, breakpoints, absolute, relative);
    }

    /**
     * Returns c(x, t) with an estimate of its absolute error.
     *
     * @param x position, finite and ≥ 0
     * @param t time, finite and ≥ 0
     * @return the value and its estimate
     * @throws IllegalArgumentException if x or t is invalid or g returns a non-finite value
     */
    public Estimate value(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
        if (condition == InletCondition.FIRST_TYPE && x == 0) {
            return Estimate.of(t == 0 ? 0.0 : checked(t), 0.0);
        }
        if (t == 0) {
            return Estimate.of(0.0, 0.0);
        }
        final Integrand f = new Integrand(x, t);
        final double[] pts = new double[breakpoints.length + 3];
        int np = 0;
        pts[np++] = 0;
        final double peak = parameters.velocity() > 0
            ? t - x * parameters.retardation() / parameters.velocity() : -1;
        boolean peakDone = !(peak > 0 && peak < t);
        for (double b : breakpoints) {
            if (!peakDone && peak <= b) {
                if (peak > pts[np - 1]) {
                    pts[np++] = peak;
                }
                peakDone = true;
            }
            if (b > pts[np - 1] && b < t) {
                pts[np++] = b;
            }
        }
        if (!peakDone && peak > pts[np - 1]) {
            pts[np++] = peak;
        }
        pts[np++] = t;
        final AdaptiveKronrod q = new AdaptiveKronrod(MAX_INTERVALS);
        q.integrate(f, pts, np, absTol, relTol);
        return Estimate.of(q.value(), q.error());
    }

    private double checked(double s) {
        final double g = input.applyAsDouble(s);
        if (!Double.isFinite(g)) {
            throw Checks.fail("input(" + s + ")", g, "must be finite");
        }
        return g;
    }

    /**
     * Returns the impulse response K(x, τ) of this inlet (the concentration per unit of
     * input concentration × time released at τ = 0).
     *
     * @param x position, finite and ≥ 0
     * @param tau time since the release, finite and ≥ 0 (0 gives 0)
     * @return K(x, τ)
     * @throws IllegalArgumentException if x or τ is invalid
     */
    public double impulseResponse(double x, double tau) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("tau", tau);
        return tau == 0 ? 0.0 : impulse(x, tau);
    }

    private double impulse(double x, double tau) {
        final double v = parameters.velocity();
        final double d = parameters.dispersion();
        final double r = parameters.retardation();
        final double tp = tau / r;
        final double decay = -parameters.decayRate() * tp;
        final double len = Math.sqrt(4 * d * tp);
        final double a = (x - v * tp) / len;
        final double gauss = Exponentials.expMinusSquare(decay, a);
        if (condition == InletCondition.FIRST_TYPE) {
            // x/√(4πDτ³)·exp(−a²) = x/(len·τ√π)·exp(−a²)
            return x / (len * tp * SegmentIntegrals.SQRT_PI) * gauss / r;
        }
        // exp(vx/D)·erfc(b) = exp(−a²)·erfcx(b) (b² − a² = vx/D), and with
        // β = vτ/len = b − x/len the bracket 1/√π − β·erfcx(b) becomes
        // −½erfcx′(b) + (x/len)·erfcx(b): two non-negative terms, no cancellation
        final double b = (x + v * tp) / len;
        final double bracket = -0.5 * ErrorFunctions.erfcxDerivative(b)
            + x / len * ErrorFunctions.erfcx(b);
        return 2 * v / len * bracket * gauss / r;
    }

    private final class Integrand implements AdaptiveKronrod.Integrand {
        private final double x;
        private final double t;

        Integrand(double x, double t) {
            this.x = x;
            this.t = t;
        }

        @Override
        public double at(double s) {
            final double g = checked(s);
            final double tau = t - s;
            return g == 0 || tau <= 0 ? 0.0 : g * impulse(x, tau);
        }
    }
}
