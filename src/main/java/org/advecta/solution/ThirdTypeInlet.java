package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.transport.TransportParameters;

/**
 * A half-line x ≥ 0 initially at uniform concentration Cᵢ, into which solute enters with the
 * water at concentration g(t) of an {@link InletInput}: the total flux at the inlet is
 * prescribed (third-type, flux, or Robin condition),
 * <pre>
 * v·c − D·∂c/∂x = v·g(t)   at x = 0,   v &gt; 0
 * </pre>
 * which conserves mass across the inlet and is the physically consistent condition for a
 * column or aquifer fed at a known concentration (Kreft &amp; Zuber 1978; Parker &amp; van
 * Genuchten 1984).
 *
 * <p>For a constant input C₀ and μ = 0 (Lindstrom et al. 1967, Water Resour. Res. 3(1)):
 * <pre>
 * c = Cᵢ + (C₀ − Cᵢ)·[½erfc(A) + √(v²t/(πDR))·e^{−A²} − ½(1 + vx/D + v²t/(DR))·e^{vx/D}·erfc(B)]
 * A = (x − vt/R)/L,  B = (x + vt/R)/L,  L = √(4Dt/R)
 * </pre>
 * and for μ &gt; 0 van Genuchten &amp; Alves (1982, USDA Tech. Bull. 1661). This class
 * evaluates them in a form without the 1/μ terms of the published decay solution and without
 * overflow at any Péclet number (see the package-private ThirdTypeResponse for the
 * identities used). Pulses and exponential inputs are formed as for {@link FirstTypeInlet}.
 *
 * <p>The flux-averaged concentration of this problem is the resident concentration of the
 * first-type problem with the same data (Parker &amp; van Genuchten 1984), and
 * {@link #fluxAveraged(double, double)} returns exactly that.
 *
 * <p>At t = 0 the value is Cᵢ everywhere (the flux condition prescribes the gradient, not the
 * value), and the gradient is 0 for x &gt; 0 and (v/D)(Cᵢ − g(0⁺)) at x = 0.
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double (κ with respect to x, t, v, D, R, μ and the input's parameters). The
 * gradient of a {@linkplain InletInput#pulse pulse} after the pulse has ended is the hardest
 * case: near the inlet, and under decay strong beside advection, the shifted step gradients,
 * their complements and ∂c/∂x = (v/D)·(c − c₁) (c₁ the first-type solution) all cancel, so
 * it is integrated in time where the pulse is short beside t, else a closed-form route is
 * taken while it cancels little, else the integral on pieces. Against mpmath on 25 200 grid
 * points, 2 000 random ones and 9 000 more drawn afterwards over wider ranges (μ up to
 * 1000), value, gradient and flux-averaged concentration of the pulse were within the
 * contract at every one, and so were those of every input kind, with and without Cᵢ, at
 * 2 500 more random points (fixture third_type_pulse_decay.csv keeps a sample).
 */
public final class ThirdTypeInlet extends InletSolution {

    private final FirstTypeInlet effluent;

    private ThirdTypeInlet(TransportParameters parameters, InletInput input, double initial) {
        super(checkInflow(parameters), input, initial);
        this.effluent = FirstTypeInlet.of(parameters, input).withInitialConcentration(initial);
    }

    private static TransportParameters checkInflow(TransportParameters parameters) {
        if (parameters != null && !(parameters.velocity() > 0)) {
            throw Checks.fail("v", parameters.velocity(),
                "must be > 0 for a flux (third-type) inlet, which needs inflow");
        }
        return parameters;
    }

    /**
     * Returns the solution with a clean initial half-line (Cᵢ = 0).
     *
     * @param parameters v &gt; 0, D, R, μ
     * @param input the inlet concentration history
     * @return the solution
     * @throws IllegalArgumentException if v ≤ 0, an argument is null, or an exponential
     *     input grows faster than (μ + v²/(4D))/R allows a closed form
     */
    public static ThirdTypeInlet of(TransportParameters parameters, InletInput input) {
        return new ThirdTypeInlet(parameters, input, 0.0);
    }

    /**
     * Returns a copy with uniform initial concentration Cᵢ.
     *
     * @param ci the initial concentration, finite
     * @return the new solution
     * @throws IllegalArgumentException if Cᵢ is not finite
     */
    public ThirdTypeInlet withInitialConcentration(double ci) {
        return new ThirdTypeInlet(parameters, input, ci);
    }

    /**
     * Returns the flux-averaged concentration c − (D/v)·∂c/∂x, which for this problem is
     * exactly the resident concentration of the {@link FirstTypeInlet} with the same data.
     *
     * @param x position, ≥ 0
     * @param t time, ≥ 0
     * @return the flux-averaged concentration
     */
    @Override
    public double fluxAveraged(double x, double t) {
        return effluent.value(x, t);
    }

    @Override
    double companionPulse(double x, double t) {
        return effluent.unitPulse(x, t);
    }

    @Override
    UnitResponse newResponse(double v, double d, double r, double mu, double muTrue) {
        return new ThirdTypeResponse(v, d, r, mu, muTrue);
    }

    @Override
    double initialValue(double x) {
        return initial;
    }

    @Override
    double initialGradient(double x) {
        return x == 0 ? velocity / dispersion * (initial - input.level()) : 0.0;
    }
}
