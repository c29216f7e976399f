package org.advecta.solution;

import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * A half-line x ≥ 0 initially at uniform concentration Cᵢ, whose inlet x = 0 is held at the
 * concentration g(t) of an {@link InletInput} from t = 0 on (first-type, or Dirichlet,
 * condition): a column or aquifer fed with contaminated water, or flushed with clean water.
 *
 * <pre>
 * c(x, t) = C₀·R(x, t) + Cᵢ·exp(−μt/R)·(1 − R₀(x, t))
 * R(x, t) = ½ [exp((v−u)x/(2D))·erfc((x − ut/R)/L) + exp((v+u)x/(2D))·erfc((x + ut/R)/L)]
 * u = √(v² + 4μD),  L = √(4Dt/R),  R₀ = R with μ = 0
 * </pre>
 * for a constant input C₀ (Ogata &amp; Banks 1961, USGS Prof. Paper 411-A, eq. 20 (number recalled), for μ = 0;
 * van Genuchten &amp; Alves 1982, USDA Tech. Bull. 1661, for μ &gt; 0 and Cᵢ ≠ 0). A pulse of
 * duration t₀ is R(t) − R(t − t₀); an input C₀·e^{−λt} is C₀·e^{−λt}·R with μ replaced by
 * μ − λR. Every exp × erfc product is evaluated without overflow, the complements 1 − R
 * without cancellation, and the late-time pulse difference by quadrature of the impulse
 * response, so the solution is exact at any Péclet number.
 *
 * <p>Any sign of v is allowed (v ≤ 0: the inlet is at the downstream end, and solute enters
 * against the flow by dispersion only). Decay μ is the coefficient of −μc (see
 * {@link TransportParameters#withDecayOnBothPhases(double)} for the other convention).
 *
 * <p>At t = 0 the value is Cᵢ for x &gt; 0 and g(0⁺) at x = 0; the gradient is 0 for x &gt; 0
 * and −∞·(g(0⁺) − Cᵢ) at x = 0 (0 if they are equal).
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double, κ the componentwise condition number with respect to x, t, v, D, R, μ and
 * the input's parameters; measured against 50-digit references in the test suite.
 */
public final class FirstTypeInlet extends InletSolution {

    private FirstTypeInlet(TransportParameters parameters, InletInput input, double initial) {
        super(parameters, input, initial);
    }

    /**
     * Returns the solution with a clean initial half-line (Cᵢ = 0).
     *
     * @param parameters v, D, R, μ
     * @param input the inlet concentration history
     * @return the solution
     * @throws IllegalArgumentException if an argument is null, or an exponential input grows
     *     faster than (μ + v²/(4D))/R allows a closed form
     */
    public static FirstTypeInlet of(TransportParameters parameters, InletInput input) {
        return new FirstTypeInlet(parameters, input, 0.0);
    }

    /**
     * Returns a copy with uniform initial concentration Cᵢ.
     *
     * @param ci the initial concentration, finite
     * @return the new solution
     * @throws IllegalArgumentException if Cᵢ is not finite
     */
    public FirstTypeInlet withInitialConcentration(double ci) {
        return new FirstTypeInlet(parameters, input, ci);
    }

    /**
     * Returns the flux-averaged concentration c − (D/v)·∂c/∂x. For v &lt; 0 (solute entering
     * against the flow) its two terms nearly cancel, and for constant and exponential inputs
     * it is evaluated from a rewritten closed form whose terms share a sign; for pulses with
     * v &lt; 0 it is the plain difference, accurate to about 1e-16·(|c| + |D/v·∂c/∂x|). For
     * v &gt; 0 the input's part and the initial concentration's part are formed separately
     * (with Cᵢ near the input's level their gradients cancel), and for a pulse, whose terms
     * cancel behind its peak (where ∂c/∂x &gt; 0), the flux-averaged impulse response is
     * integrated over the pulse's window where they would lose more than a factor 2. Against
     * mpmath at 4 500 random pulse points and 2 500 random points of every input kind over
     * wide ranges (first_type_pulse_wide.csv keeps a sample) it was within max(16, 2κ) ULP
     * wherever the result is a normal double; the difference of the totals was up to 12.8
     * times outside.
     *
     * @param x position, ≥ 0
     * @param t time, ≥ 0
     * @return the flux-averaged concentration
     * @throws IllegalStateException if v = 0
     */
    @Override
    public double fluxAveraged(double x, double t) {
        if (velocity > 0) {
            return fluxAveragedWithFlow(x, t);
        }
        if (!(velocity < 0) || input.kind() == InletInput.Kind.PULSE || t == 0) {
            return super.fluxAveraged(x, t);
        }
        value(x, t); // validates x and t
        final FirstTypeResponse r = (FirstTypeResponse) response;
        final double shift = input.kind() == InletInput.Kind.EXPONENTIAL ? -input.rate() * t : 0;
        double c = input.level() == 0 ? 0 : input.level() * r.fluxAveragedUpstream(x, t, shift);
        if (initial != 0) {
            // Cᵢ·e^{−μt/R}·(1 − R₀_f), and R₀_f ≤ 0 here: no cancellation
            final FirstTypeResponse clean = new FirstTypeResponse(velocity, dispersion,
                retardation, 0.0, 0.0);
            c += initial * Math.exp(decayExponent(t))
                * (1 - clean.fluxAveragedUpstream(x, t, 0.0));
        }
        return c;
    }

    @Override
    double valueAt(double x, double t) {
        // the inlet holds the input exactly: c(0, t) = g(t) (the formula gives it to 1 ulp)
        return x == 0 ? input.valueAt(t) : super.valueAt(x, t);
    }

    @Override
    double valueAt(double x, double t, Spread s) {
        // as valueAt(x, t), for a profile
        return x == 0 ? input.valueAt(t) : super.valueAt(x, t, s);
    }

    @Override
    UnitResponse newResponse(double v, double d, double r, double mu, double muTrue) {
        return new FirstTypeResponse(v, d, r, mu, muTrue);
    }

    @Override
    double initialValue(double x) {
        return x == 0 ? input.level() : initial;
    }

    @Override
    double initialGradient(double x) {
        final double jump = input.level() - initial;
        return x == 0 && jump != 0 ? -jump * Double.POSITIVE_INFINITY : 0.0;
    }
}
