package org.advecta.solution;

import org.advecta.internal.ScaledExp;
import org.advecta.special.ErrorFunctions;

/**
 * The flux inlet's ramp response with decay (v &gt; 0, μ &gt; 0), W₃ = ∫₀ᵗ T(x, s) ds, as
 * sums and integrals of positive functions only.
 *
 * <p><b>Derivation.</b> In the Laplace domain (p ↔ t) the response to the input t is
 * W̄₃ = 2v·e^{λx}/(p²(v + w)), w = √(v² + 4D(Rp + μ)), λ = (v − w)/(2D). With
 * σ = √(p + α²), α = u/√(4DR), κ = v/√(4DR) this is
 * e^{vx/(2D)}·2κ·e^{−kσ}/((σ − α)²(σ + α)²(σ + κ)), k = x√(R/D), a rational function of σ
 * with poles at b ∈ {−α, −α, κ, α, α} (writing each factor as σ + b). The rational part is the
 * fourth divided difference over those nodes of 1/(σ + b) in b, so W₃ is the same divided
 * difference of the inverse of e^{−kσ}/(σ + b),
 * <pre>
 * G(b) = e^{−α²t}·L⁻¹[e^{−k√p}/(√p + b)] = e^{−α²t − Q²}·t^{−1/2}·H(Q + b√t),
 * H(z) = φ(z) + Q·erfcx(z)
 * </pre>
 * (Carslaw &amp; Jaeger 1959, Appendix V, the pair e^{−k√p}/(√p + b); φ = −erfcx′/2; Q = x/L,
 * L = √(4Dt/R)). In the variable z = Q + b√t the nodes are A_u, A_u, B_v, B_u, B_u
 * (A_u = Q − P_u, B = Q + P, P_u = ut/(RL), P_v = vt/(RL)), and e^{vx/(2D) − α²t − Q²} =
 * e^{−A_v² − μt/R}.
 *
 * <p><b>Ahead of and near the front</b> (A_u ≥ −1), by the Peano form of the divided
 * difference (the B-spline with those knots as weight),
 * <pre>
 * W₃ = 2P_v·t·e^{−A_v² − μt/R}·∫_{A_u}^{B_u} H⁗(z)·M(z) dz,   H⁗ = Q·erfcx⁗ − erfcx⁽⁵⁾/2 &gt; 0
 * </pre>
 * M the cubic B-spline weight of the knots (∫M = 1/24, M ≥ 0). Both terms of H⁗ are
 * positive (erfcx is completely monotone), so nothing cancels. With μ = 0 the knot B_v
 * merges with B_u.
 *
 * <p><b>Behind the front</b> (A_u &lt; −1), the nodes at −α are taken out in closed form (the
 * divided difference splits into the residues at b = −α and the divided difference over
 * {κ, α, α} of G(b)/(b + α)²):
 * <pre>
 * W₃ = e^{(v−u)x/(2D)}·(P_v t/(2P_u²(P_u + P_v)))·[−h′(A_u) − h(A_u)(2P_u + P_v)/(P_u(P_u + P_v))]
 *    + 2P_v t·e^{−A_v² − μt/R}·∫_{B_v}^{B_u} K″(z)·(z − B_v)/(B_u − B_v)² dz
 * </pre>
 * with h = e^{−A_u²}H, K = H/(z − A_u)². K″ = H″/d² − 4H′/d³ + 6H/d⁴ (d = z − A_u &gt; 0) has
 * positive terms; the bracket's two terms lose at most a factor 2.15 for A_u ≤ −1 (mpmath
 * over P_u ∈ [3/2, 10⁴], P_v/P_u ∈ [10⁻⁶, 1], Q ∈ [0, P_u + A_u]); ahead of the front the same
 * split cancels without bound, hence the two forms.
 *
 * <p><b>Quadrature.</b> The integrands are entire and smooth on the scale max(1, z) for
 * z ≥ −1 (as φ, ψ and χ = −erfcx‴/2, see {@link ThirdTypeRampIntegral}); the 10-point
 * Gauss–Legendre rule on panels of half-width at most a quarter of that scale, split at the
 * knots where the weight changes piece, is exact to rounding (checked by the reference
 * fixtures, 45-digit Duhamel quadrature of the published step response).
 *
 * <p>Derived here; both forms checked against mpmath's Duhamel quadrature of the step
 * response of van Genuchten &amp; Alves (1982) in the generator of the fixtures.
 */
final class ThirdTypeDecayRamp {

    private static final double ONE_OVER_SQRT_PI = 0.5641895835477563;
    /** From here down the split form is used (its bracket loses at most a factor 2.15). */
    static final double BEHIND_FROM = -1;

    /** ρ = v/u = P_v/P_u ∈ (0, 1). */
    private final double rho;
    /** 1 + ρ = (P_u + P_v)/P_u. */
    private final double onePlusRho;
    /** 1 − ρ = (u − v)/u, without cancellation. */
    private final double oneMinusRho;

    /**
     * @param v velocity &gt; 0
     * @param u √(v² + 4μD) &gt; v
     * @param uMinusV u − v = 4μD/(u + v), formed without cancellation
     */
    ThirdTypeDecayRamp(double v, double u, double uMinusV) {
        this.rho = v / u;
        this.onePlusRho = 1 + rho;
        this.oneMinusRho = uMinusV / u;
    }

    /**
     * Returns W₃.
     *
     * @param t time &gt; 0
     * @param q Q = x/L
     * @param pv P_v = vt/(RL)
     * @param pu P_u = ut/(RL)
     * @param au A_u = (x − ut/R)/L
     * @param av A_v = (x − vt/R)/L
     * @param decay −μt/R
     * @param kx (v − u)x/(2D) ≤ 0
     */
    double value(double t, double q, double pv, double pu, double au, double av, double decay,
                 double kx) {
        if (au >= BEHIND_FROM) {
            return ahead(t, q, pv, pu, au, av, decay);
        }
        return behind(t, q, pv, pu, au, av, decay, kx);
    }

    /**
     * 2P_v t e^{E}∫H⁗M dz with z = A_u + γη on [A_u, B_v] (γ = P_u + P_v) and z = B_u − δη on
     * [B_v, B_u] (δ = P_u − P_v), η ∈ [0, 1]; the B-spline pieces in these variables are
     * (with Δ = 2P_u) 6Δ³M = η²γ³[(Δ + 2γ)(1 − η) + 2δ]/γ and η²δ³[(Δ + 2δ)(1 − η) + 2γ]/δ,
     * both sums of positive terms (sympy, from the divided difference of (s − z)₊³).
     */
    double ahead(double t, double q, double pv, double pu, double au, double av,
                 double decay) {
        final double g = onePlusRho;
        final double dd = oneMinusRho;
        final double gamma = pu + pv;
        final double left = leftIntegral(q, au, gamma, 2 + 2 * g, 2 * dd);
        final double delta = dd * pu;
        final double right = delta > 0
            ? rightIntegral(q, q + pu, delta, 2 + 2 * dd, 2 * g) : 0.0;
        // 2P_v t/(6Δ³) = P_v t/(24 P_u³), with γ³/P_u³ = g³, δ³/P_u³ = dd³ (one power of each
        // is inside the integrals' brackets, divided out there)
        final double sum = g * g * left + dd * dd * right;
        return ScaledExp.value(pv * t / 24 * sum, decay, av);
    }

    /**
     * ∫₀¹ H⁗(A + γη)·η²·[c₁(1 − η) + c₀] dη, by composite Gauss–Legendre on panels in z of
     * half-width a quarter of max(1, z) at their left end.
     */
    private static double leftIntegral(double q, double a, double gamma, double c1, double c0) {
        return PanelSum.over(gamma, o -> 0.25 * Math.max(1, a + o), y -> {
            final double eta = y / gamma;
            return fourthDerivativeOfH(q, a + y) * eta * eta * Math.fma(c1, 1 - eta, c0);
        }) / gamma;
    }

    /**
     * ∫₀¹ H⁗(B − δη)·η²·[c₁(1 − η) + c₀] dη; z decreases along a panel, so its half-width is
     * chosen from the panel's far end: h = max(1/4, (B − o)/6) keeps h ≤ max(1, B − o − 2h)/4.
     */
    private static double rightIntegral(double q, double b, double delta, double c1,
                                        double c0) {
        return PanelSum.over(delta, o -> Math.max(0.25, (b - o) / 6), s -> {
            final double eta = s / delta;
            return fourthDerivativeOfH(q, b - s) * eta * eta * Math.fma(c1, 1 - eta, c0);
        }) / delta;
    }

    /**
     * The split form behind the front: the residues at b = −α (two terms, scaled by
     * e^{−A²}, divided by powers of P_u so that nothing overflows) plus the positive
     * integral over [B_v, B_u].
     */
    double behind(double t, double q, double pv, double pu, double au, double av,
                  double decay, double kx) {
        // e^{−A²}φ(A) = e^{−A²}/√π − A·erfc(A), e^{−A²}ψ(A) = (1 + 2A²)erfc(A) − 2A·e^{−A²}/√π,
        // each a sum of positive terms for A < 0; here divided by P_u resp. P_u² (a = A/P_u)
        final double ip = 1 / pu;
        final double a = au * ip;
        final double qq = q * ip;
        final double erfc = ErrorFunctions.erfc(au);
        final double gauss = au > -40 ? Math.exp(-au * au) * ONE_OVER_SQRT_PI * ip : 0.0;
        final double phiOverP = gauss - a * erfc;
        final double psiOverP2 = Math.fma(2 * a, a, ip * ip) * erfc - 2 * a * gauss;
        // −h′/P_u² = e^{−A²}(ψ + 2Qφ)/P_u², h/P_u³ = e^{−A²}(φ + Q·erfcx)/P_u³
        final double minusHPrime = psiOverP2 + 2 * qq * phiOverP;
        final double hOverP3 = (phiOverP + qq * erfc) * ip * ip;
        final double bracket = minusHPrime - (2 + rho) / onePlusRho * hOverP3;
        final double residues = ScaledExp.value(0.5 * rho / onePlusRho * t * bracket, kx, 0.0);
        final double delta = oneMinusRho * pu;
        final double integral = splitIntegral(q, pv, au, q + pv, delta, pu + pv);
        return residues + ScaledExp.value(2 * t * integral, decay, av);
    }

    /**
     * P_v·∫₀¹ K″(B_v + δη)·η dη (the δ → 0 limit P_v·K″(B)/2 where δ = 0), K = H/(z − A)².
     */
    private static double splitIntegral(double q, double pv, double a, double bv, double delta,
                                        double gamma) {
        if (delta == 0) {
            return 0.5 * pv * kSecond(q, a, bv, gamma);
        }
        // d = z − A = γ + s (no cancellation)
        return pv * PanelSum.over(delta, o -> 0.25 * Math.max(1, bv + o),
            s -> kSecond(q, a, bv + s, gamma + s) * (s / delta)) / delta;
    }

    /**
     * K″(z) = H″/d² − 4H′/d³ + 6H/d⁴ at z ≥ 0, d = z − A &gt; 0, with H = φ + Q·erfcx,
     * −H′ = ψ + 2Qφ, H″ = χ + 2Qψ, all positive.
     */
    private static double kSecond(double q, double a, double z, double d) {
        final double phi = ErfcxIntegrals.phi(z);
        final boolean tabled = z < ErfcxHigherDerivatives.TO;
        final double psi = tabled ? ErfcxHigherDerivatives.psi(z) : ErfcxIntegrals.psi(z);
        final double chi = tabled ? ErfcxHigherDerivatives.chi(z) : ThirdTypeRampIntegral.chi(z);
        final double h = phi + q * ErrorFunctions.erfcx(z);
        final double minusH1 = psi + 2 * q * phi;
        final double h2 = chi + 2 * q * psi;
        final double inv = 1 / d;
        return inv * inv * (h2 + inv * (4 * minusH1 + inv * 6 * h));
    }

    /**
     * H⁗(z) = 2Q·ω + ϑ with ω = erfcx⁗/2 &gt; 0 and ϑ = −erfcx⁽⁵⁾/2 &gt; 0, for z ≥ −3/2. Below
     * z = −1 from the recurrence χ = 4φ − 2zψ, ω = 6ψ − 2zχ, ϑ = 8χ − 2zω (only positive
     * terms there); on [−1, 10) from the Chebyshev series of {@link ErfcxHigherDerivatives};
     * from 10 on as ω = 2K₄χ,
     * ϑ = 2K₅ω, χ = 2K₃ψ with Laplace's continued fraction K_i = (i/2)/(z + K_{i+1}) (the
     * ratios of successive derivatives, A&amp;S 7.1.14), summed backward.
     */
    static double fourthDerivativeOfH(double q, double z) {
        final double omega;
        final double theta;
        if (z < ErfcxHigherDerivatives.FROM) {
            // z ∈ [−3/2, −1) (the split form's property test reaches below −1): the
            // recurrence, positive terms only
            final double psi = ErfcxIntegrals.psi(z);
            final double chi = 4 * ErfcxIntegrals.phi(z) - 2 * z * psi;
            omega = 6 * psi - 2 * z * chi;
            theta = 8 * chi - 2 * z * omega;
        } else if (z < ErfcxHigherDerivatives.TO) {
            omega = ErfcxHigherDerivatives.omega(z);
            theta = ErfcxHigherDerivatives.theta(z);
        } else {
            if (z == Double.POSITIVE_INFINITY) {
                return 0.0;
            }
            // at most 20 terms from z = 10 on
            final double terms = Math.ceil(180 / (z * z) + 100 / z) + 8;
            double kk = 0;
            for (int i = (int) terms; i >= 6; i--) {
                kk = 0.5 * i / (z + kk);
            }
            final double k5 = 2.5 / (z + kk);
            final double k4 = 2 / (z + k5);
            final double k3 = 1.5 / (z + k4);
            omega = 4 * k4 * k3 * ErfcxIntegrals.psi(z);
            theta = 2 * k5 * omega;
        }
        return 2 * q * omega + theta;
    }
}
