package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ErrorFunctions;
import org.advecta.transport.TransportParameters;

/**
 * The response W(x, t) of a clean half-line x ≥ 0 to an inlet input that rises linearly,
 * g(t) = t for t &gt; 0 (the ramp response), for the first-type inlet c(0, t) = t and for the
 * flux inlet v·c − D·∂c/∂x = v·t. It is the time integral of the unit step response
 * ({@link FirstTypeInlet}, {@link ThirdTypeInlet} with a unit constant input), and a
 * piecewise-linear inlet series is a sum of shifted ramps (Duhamel). Immutable and
 * thread-safe.
 *
 * <p><b>First type</b> (any v, μ ≥ 0): with u = √(v² + 4μD), L = √(4Dt/R),
 * A = (x − ut/R)/L, B = (x + ut/R)/L,
 * <pre>
 * W₁ = ½(t − Rx/u)·e^{(v−u)x/(2D)}·erfc(A) + ½(t + Rx/u)·e^{(v+u)x/(2D)}·erfc(B)
 * </pre>
 * the inverse of e^{(v − √(v² + 4D(Rp + μ)))x/(2D)}/p², from the Laplace pair
 * L⁻¹[e^{−k√(p+a)}/p²] = ½[(t − k/(2√a))e^{−k√a}erfc(k/(2√t) − √(at)) + (t + k/(2√a))
 * e^{k√a}erfc(k/(2√t) + √(at))] (its t-derivative is the step pair of Carslaw &amp; Jaeger 1959,
 * Appendix V, and of van Genuchten &amp; Alves 1982, USDA Tech. Bull. 1661; derived here and
 * checked against numerical Laplace inversion and the Duhamel quadrature in the test
 * fixtures). It is evaluated as
 * <pre>
 * W₁ = t·e^{−A_v² − μt/R}·mean of ψ over [A, B]                        (A ≥ 0)
 * W₁ = ½(t − Rx/u)·e^{(v−u)x/(2D)}·erfc(A) + ½(t + Rx/u)·e^{−A_v² − μt/R}·erfcx(B)   (A &lt; 0)
 * </pre>
 * with A_v = (x − vt/R)/L and ψ = erfcx″/2 &gt; 0: ahead of the front the two terms of the
 * published-style form cancel, and B·erfcx(B) − A·erfcx(A) = φ(A) − φ(B) = ∫_A^B ψ turns
 * them into one positive term (φ = −erfcx′/2). For u = 0 (v = μ = 0) this is
 * 4t·i²erfc(x/L) (Carslaw &amp; Jaeger 1959, §2.9, recalled from memory; checked in the
 * fixtures). At x = 0 the value is t exactly.
 *
 * <p><b>Third type</b> (v &gt; 0, μ = 0): with P = vt/(RL), Q = x/L, A = Q − P, B = Q + P,
 * <pre>
 * W₃ = (t/2 − Rx/(2v) − RD/(2v²))·erfc(A) + √(t/(πR))·(R√D/v + Rx/(2√D) + vt/(2√D))·e^{−A²}
 *      + (RD/(2v²) − Rx²/(4D) − t/2 − vxt/(2D) − v²t²/(4DR))·e^{vx/D}·erfc(B)
 *    = t·e^{−A²}·(1/(8P²))·∫₀^{2P} χ(A + τ)·τ·(4P − τ) dτ,    χ = −erfcx‴/2 &gt; 0
 * </pre>
 * (the time integral of the step solution of Lindstrom et al. 1967, Water Resour. Res. 3(1);
 * derived here by an ansatz solved with sympy and checked against the Duhamel quadrature,
 * numerical Laplace inversion, the flux condition and the PDE in the fixtures). The
 * integral form has only positive terms; it is evaluated by composite 10-point
 * Gauss–Legendre on panels short enough for the rule to be exact to rounding wherever
 * A ≥ 0 or P ≤ 3/2, and by the first line otherwise (behind the front with P &gt; 3/2, where
 * its terms lose at most a factor 1.8 to cancellation: measured with mpmath over the region).
 *
 * <p><b>Third type with decay</b> (v &gt; 0, μ &gt; 0): with u as above, P_u = ut/(RL),
 * P_v = vt/(RL), A_u = Q − P_u, B_u = Q + P_u, B_v = Q + P_v, the response 2v·e^{λx}/(p²(v + w))
 * is a fourth divided difference, over the nodes A_u, A_u, B_v, B_u, B_u, of the inverse
 * of the Laplace pair e^{−k√p}/(√p + b) (Carslaw &amp; Jaeger 1959, Appendix V). Ahead of and
 * near the front (A_u ≥ −1) it is evaluated as
 * <pre>
 * W₃ = 2P_v·t·e^{−A_v² − μt/R}·∫_{A_u}^{B_u} (Q·erfcx⁗(z) − erfcx⁽⁵⁾(z)/2)·M(z) dz
 * </pre>
 * with M ≥ 0 the cubic B-spline of those knots, and behind it (A_u &lt; −1) as two residues
 * at A_u in closed form plus a positive integral over [B_v, B_u]; each integral by composite
 * 10-point Gauss–Legendre on panels on which the rule is exact to rounding. Only positive
 * terms are added (the residues' bracket loses at most a factor 2.15), and nothing is
 * divided by μ, so μ → 0 meets the μ = 0 form. Derived here (the class
 * ThirdTypeDecayRamp has the steps); checked against 45-digit Duhamel quadrature of the
 * step response of van Genuchten &amp; Alves (1982) in two fixtures, and against the μ = 0
 * form and between its two forms by property tests.
 *
 * <p><b>Accuracy.</b> Every form: within max(16, 2κ) ULP of the exact result wherever it is a
 * normal double, κ the componentwise condition number with respect to x, t, v, D, R, μ;
 * measured against 45-digit references computed by an independent route (the test
 * fixtures).
 *
 * <p><b>Cost.</b> The first type, and the flux inlet without decay behind the front: a few
 * erfc and exp. Otherwise the flux inlet adds a composite Gauss–Legendre sum of 10 nodes per
 * panel, panels of half-width a quarter of max(1, z) over the interval of z integrated
 * (about 4·ln of the ratio of its ends once they pass 1: a few dozen panels at Péclet
 * numbers near 10⁸).
 *
 * <p><b>Range.</b> x ≥ 0 and t ≥ 0 finite; W(x, 0) = 0. No overflow at any Péclet number;
 * values below the double range are 0.
 */
public final class InletRamp {

    private static final double ONE_OVER_SQRT_PI = 0.5641895835477563;
    /**
     * Behind the front (A &lt; 0) the third-type closed form is used from this P on; below it
     * its terms cancel (a factor 4.6 at P = 1/2, 1.8 at P = 3/2: mpmath over Q ∈ [0, P]).
     */
    private static final double BEHIND_CLOSED_FROM = 1.5;
    private final TransportParameters parameters;
    private final boolean thirdType;
    private final double d;
    private final double r;
    private final double u;
    private final double uR;
    private final double vR;
    private final double muR;
    /** R/u (first type, behind the front only, where u &gt; 0). */
    private final double rOverU;
    /** R/v (third type). */
    private final double rOverV;
    /** DR/v² (third type). */
    private final double drOverV2;
    /** (v − u)/(2D) ≤ 0, without cancellation. */
    private final double k;
    /** The third type with decay; null otherwise. */
    private final ThirdTypeDecayRamp decayRamp;

    private InletRamp(TransportParameters parameters, boolean thirdType) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        final double v = parameters.velocity();
        if (thirdType && !(v > 0)) {
            throw Checks.fail("v", v,
                "must be > 0 for a flux (third-type) inlet, which needs inflow");
        }
        this.parameters = parameters;
        this.thirdType = thirdType;
        this.d = parameters.dispersion();
        this.r = parameters.retardation();
        final double mu = parameters.decayRate();
        this.u = Math.sqrt(Math.fma(4 * mu, d, v * v));
        final double vMinusU = v >= 0 ? (v + u > 0 ? -4 * mu * d / (v + u) : 0.0) : v - u;
        this.k = vMinusU / (2 * d);
        this.uR = u / r;
        this.vR = v / r;
        this.muR = mu / r;
        this.rOverU = r / u;
        this.rOverV = r / v;
        this.drOverV2 = d * r / v / v;
        this.decayRamp = thirdType && mu > 0 ? new ThirdTypeDecayRamp(v, u, -vMinusU) : null;
    }

    /**
     * Returns the ramp response of the first-type inlet c(0, t) = t.
     *
     * @param parameters v, D, R, μ (any v)
     * @return the response
     * @throws IllegalArgumentException if parameters is null
     */
    public static InletRamp firstType(TransportParameters parameters) {
        return new InletRamp(parameters, false);
    }

    /**
     * Returns the ramp response of the flux inlet v·c − D·∂c/∂x = v·t.
     *
     * @param parameters v &gt; 0, D, R, μ
     * @return the response
     * @throws IllegalArgumentException if parameters is null or v ≤ 0
     */
    public static InletRamp thirdType(TransportParameters parameters) {
        return new InletRamp(parameters, true);
    }

    /**
     * Returns the transport parameters.
     *
     * @return v, D, R, μ
     */
    public TransportParameters parameters() {
        return parameters;
    }

    /**
     * Returns whether this is the flux (third-type) inlet's response.
     *
     * @return true for the third type
     */
    public boolean isThirdType() {
        return thirdType;
    }

    /**
     * Returns W(x, t) (see the class comment for the formula and accuracy).
     *
     * @param x position, finite and ≥ 0
     * @param t time, finite and ≥ 0
     * @return the ramp response, ≥ 0
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double value(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
        if (t == 0) {
            return 0.0;
        }
        if (!thirdType) {
            return firstType(x, t);
        }
        return decayRamp == null ? thirdTypeNoDecay(x, t) : thirdTypeDecay(x, t);
    }

    /**
     * A breakthrough curve: {@code out[i] = value(x, t[i])}.
     *
     * @param x position
     * @param t times; not modified (unless it is also out)
     * @param out receives the values; at least as long as t; may be t
     * @throws IllegalArgumentException if an argument is invalid (out then partly written)
     */
    public void breakthrough(double x, double[] t, double[] out) {
        Checks.length("t", t, 0);
        Checks.length("out", out, t.length);
        for (int i = 0; i < t.length; i++) {
            out[i] = value(x, t[i]);
        }
    }

    private double firstType(double x, double t) {
        if (x == 0) {
            // the inlet holds the input exactly
            return t;
        }
        final double il = inverseLength(t);
        final double a = (x - uR * t) * il;
        final double av = (x - vR * t) * il;
        final double decay = -muR * t;
        if (a >= 0) {
            // ½(t − Rx/u)e^{s₁}erfc(A) + ½(t + Rx/u)e^{s₂}erfc(B) with t ∓ Rx/u = ∓tA/P,
            // e^{s₁}erfc(A) = e^{E}erfcx(A), e^{s₂}erfc(B) = e^{E}erfcx(B), E = −A_v² − μt/R:
            // (t/2P)e^{E}[B erfcx(B) − A erfcx(A)] = (t/2P)e^{E}[φ(A) − φ(B)] = t e^{E}·mean ψ
            final double b = (x + uR * t) * il;
            return ScaledExp.value(t * ErfcxIntegrals.meanOfPsi(a, b), decay, av);
        }
        // behind the front (u > 0 here): two positive terms, t − Rx/u > 0
        final double b = (x + uR * t) * il;
        final double lead = 0.5 * Math.fma(-rOverU, x, t) * ErrorFunctions.erfc(a);
        final double first = k == 0 ? lead : ScaledExp.value(lead, k * x, 0.0);
        final double trail = 0.5 * Math.fma(rOverU, x, t) * ErrorFunctions.erfcx(b);
        return first + ScaledExp.value(trail, decay, av);
    }

    /**
     * 1/L = √(R/(4Dt)) as {@link Spread} forms it (within 1 ulp), and where R/(4Dt) overflows
     * (t below about 1e-300·R/D) as √(R/(4D))/√t instead (within 2 ulp).
     */
    private double inverseLength(double t) {
        final double il = Spread.of(d, r, t).inverseLength();
        return il < Double.POSITIVE_INFINITY ? il : Math.sqrt(r / (4 * d)) / Math.sqrt(t);
    }

    private double thirdTypeNoDecay(double x, double t) {
        final double il = inverseLength(t);
        final double q = x * il;
        final double p = vR * t * il;
        final double a = (x - vR * t) * il;
        if (a >= 0 || p <= BEHIND_CLOSED_FROM) {
            return ScaledExp.value(t * ThirdTypeRampIntegral.bracket(q, p, a), 0.0, a);
        }
        // behind the front, P > 3/2:
        // W₃ = ½(t − Rx/v)erfc(A) − (DR/v²)·J(A, B) + t e^{−A²}[1/(2P√π) − ψ(B)/2]
        final double b = (x + vR * t) * il;
        final double lead = 0.5 * Math.fma(-rOverV, x, t) * ErrorFunctions.erfc(a);
        final double j = drOverV2 * ErfcxIntegrals.jCentred(q, p);
        final double tail = t * (0.5 * ONE_OVER_SQRT_PI / p - 0.5 * ErfcxIntegrals.psi(b));
        return lead - j + ScaledExp.value(tail, 0.0, a);
    }

    private double thirdTypeDecay(double x, double t) {
        final double il = inverseLength(t);
        final double q = x * il;
        final double pv = vR * t * il;
        final double pu = uR * t * il;
        final double au = (x - uR * t) * il;
        final double av = (x - vR * t) * il;
        return decayRamp.value(t, q, pv, pu, au, av, -muR * t, k * x);
    }
}
