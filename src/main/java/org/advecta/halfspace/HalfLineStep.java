package org.advecta.halfspace;

import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * A half-line x ≥ 0 with a {@link Wall} at x = 0, initially at concentration C₀ beyond a ≥ 0
 * and clean between the wall and a (a = 0: uniformly loaded): the step integrated against the
 * half-line kernel, S = C₀·∫_a^∞ K(x, t; ξ) dξ. Immutable and thread-safe;
 * {@link Domain#HALF_LINE}.
 *
 * <pre>
 * absorbing:  c = C₀E·[½erfc(α) − ½e^{vx/D}·erfc(β)]
 * zero flux:  c = C₀E·[½erfc(α) + ½e^{vx/D}·erfc(β) − (vL/(2D))·e^{vx/D}·ierfc(β)]
 * α = (a − x + vt/R)/L,  β = (x + a + vt/R)/L,  L = √(4Dt/R),  E = e^{−μt/R}
 * </pre>
 * with ierfc(s) = ∫_s^∞ erfc = e^{−s²}/√π − s·erfc(s). Derivation: the kernels of
 * {@link HalfSpaceKernel1D} integrated over ξ; the image term gives
 * ∫ e^{−vξ/D}G(x, t; −ξ) dξ = E·e^{vx/D}·½erfc(β) and the erfc term
 * ∫ erfc((x + ξ + vt/R)/L) dξ = L·ierfc(β) (Carslaw &amp; Jaeger 1959, appendix II, for the
 * repeated integrals of erfc, recalled). For a = 0 the absorbing case is one minus the
 * Ogata–Banks solution and the zero-flux case (v &gt; 0) one minus the Lindstrom et al. (1967)
 * third-type solution: a clean inflow flushing a loaded column (van Genuchten &amp; Alves 1982).
 *
 * <p><b>Evaluation.</b> Both are rewritten as sums of non-negative terms (see the package's
 * step engine): with β² − α² = vx/D + xaR/(Dt) and φ = 1/√π − s·erfcx(s), the absorbing
 * form is E·J(α, β) + ½(1 − e^{−xaR/(Dt)})·E·e^{vx/D + xaR/(Dt)}·erfc(β) with
 * J(α, β) = ½[erfc(α) − e^{−α²}erfcx(β)] = e^{−α²}∫_α^β φ, and the zero-flux form adds
 * E·e^{−α² − xaR/(Dt)}·[ψ(β) + 2((x + a)/L)·φ(β)] (ψ = erfcx″/2) for v ≥ 0; for v &lt; 0 its
 * three terms are already positive. The gradient is formed the same way; the flux is
 * v·c − D·∂c/∂x.
 *
 * <p>At t = 0 the value is C₀ for x &gt; a, 0 for x &lt; a, C₀/2 at x = a &gt; 0; at x = a = 0 the
 * wall value (0 absorbing, C₀ zero flux). The gradient at t = 0 is 0 except at x = a, where
 * it is +∞·C₀ (and 0 for a zero-flux wall at a = 0).
 *
 * <p>Accuracy: value and gradient within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double, κ the componentwise condition number with respect to x, t, a, C₀, v, D, R, μ
 * (enforced by reference fixtures); no NaN or infinity for valid input.
 */
public final class HalfLineStep implements Solution1D {

    private final TransportParameters parameters;
    private final Wall wall;
    private final double a;
    private final double c0;
    private final StepEngine engine;

    private HalfLineStep(TransportParameters parameters, Wall wall, double a, double c0) {
        this.parameters = parameters;
        this.wall = wall;
        this.a = a;
        this.c0 = c0;
        this.engine = new StepEngine(parameters, wall);
    }

    /**
     * Returns the solution for concentration C₀ on x &gt; a at t = 0.
     *
     * @param parameters v (either sign), D, R, μ
     * @param wall the wall condition at x = 0
     * @param a where the loaded region starts, finite and ≥ 0
     * @param c0 the initial concentration, finite
     * @return the solution
     * @throws IllegalArgumentException if an argument is null or invalid
     */
    public static HalfLineStep of(TransportParameters parameters, Wall wall, double a, double c0) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (wall == null) {
            throw new IllegalArgumentException("wall: must not be null");
        }
        return new HalfLineStep(parameters, wall, Checks.nonNegative("a", a),
            Checks.finite("c0", c0));
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
            return x > a ? c0 : x == a ? 0.5 * c0 : 0.0;
        }
        return c0 * engine.value(x, t, a);
    }

    @Override
    public double gradient(double x, double t) {
        check(x, t);
        if (t == 0) {
            if (x != a || c0 == 0 || (a == 0 && wall == Wall.ZERO_FLUX)) {
                return 0.0;
            }
            return c0 * Double.POSITIVE_INFINITY;
        }
        return c0 * engine.gradient(x, t, a);
    }

    private static void check(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
    }
}
