package org.advecta.solution;

import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ErrorFunctions;

/**
 * The unit response of the first-type inlet c(0, t) = 1 on a clean half-line:
 * <pre>
 * F(x, t) = ½ [exp((v−u)x/(2D))·erfc(A_u) + exp((v+u)x/(2D))·erfc(B_u)],   u = √(v² + 4μD)
 * A_u = (x − ut/R)/L,  B_u = (x + ut/R)/L,  L = √(4Dt/R)
 * </pre>
 * (Ogata &amp; Banks 1961, USGS Prof. Paper 411-A, for μ = 0; van Genuchten &amp; Alves 1982,
 * USDA Tech. Bull. 1661, for μ &gt; 0; Carslaw &amp; Jaeger 1959 §14.2). Since B_u² − A_u² = ux/D,
 * the second term is exp(s₁ − A_u²)·erfcx(B_u) with s₁ = (v−u)x/(2D) ≤ 0 (for μ ≥ 0), which
 * cannot overflow. v − u and v + u are formed without cancellation
 * ((v − u)(v + u) = −4μD).
 */
final class FirstTypeResponse implements UnitResponse {

    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private final double v;
    private final double d;
    private final double r;
    private final double mu;
    /** The medium's decay coefficient (μ differs from it by λR for an exponential input). */
    private final double muTrue;
    private final double u;
    /** v − u, without cancellation. */
    private final double vMinusU;
    /** v − |v|, for the decay-free response R₀ (u₀ = |v|). */
    private final double vMinusU0;
    // Quotients of the formulas, divided once here rather than at every point.
    private final double uR;
    private final double vR;
    private final double muR;
    private final double muTrueR;
    private final double vMinusUR;
    /** k = (v − u)/(2D), so that s₁ = k·x. */
    private final double k;
    /** (v − |v|)/(2D), s₁ of the decay-free response. */
    private final double k0;

    FirstTypeResponse(double v, double d, double r, double mu, double muTrue) {
        this.v = v;
        this.d = d;
        this.r = r;
        this.mu = mu;
        this.muTrue = muTrue;
        final double radicand = Math.fma(4 * mu, d, v * v);
        this.u = Math.sqrt(radicand);
        if (v >= 0) {
            this.vMinusU = v + u > 0 ? -4 * mu * d / (v + u) : 0.0;
        } else {
            this.vMinusU = v - u;
        }
        this.vMinusU0 = Math.min(v, 0) * 2;
        this.uR = u / r;
        this.vR = v / r;
        this.muR = mu / r;
        this.muTrueR = muTrue / r;
        this.vMinusUR = vMinusU / r;
        this.k = vMinusU / (2 * d);
        this.k0 = vMinusU0 / (2 * d);
    }

    /** e^{s₁}, without an exponential when μ = 0 (s₁ = 0, the steady state is 1). */
    private double expS1(double x) {
        return k == 0 ? 1.0 : Math.exp(s1(x));
    }

    /** s₁ = (v − u)x/(2D). */
    private double s1(double x) {
        return k * x;
    }

    /**
     * The exponent of the erfcx terms: s₁ + shift − A_u² = −A_v² − μt/R with the medium's
     * own μ (since B_u² − A_u² = ux/D and u² = v² + 4(μ − λR)D). Formed this way it carries no
     * cancellation between s₁ and −λt, both large for a fast exponential input.
     */
    private double trueDecay(double t) {
        return -muTrueR * t;
    }

    /** factor·exp(s₁ + shift)·erfc(A_u), as exp(−A_v² − μt/R)·erfcx(A_u) when A_u ≥ 0. */
    private double firstTerm(double factor, double x, double t, double shift, double il,
                             double au) {
        if (au >= 0) {
            return ScaledExp.value(factor * ErrorFunctions.erfcx(au), trueDecay(t),
                (x - vR * t) * il);
        }
        // erfc(A_u) is in (1, 2]; s₁ + shift ≤ 0 unless an input grows
        return ScaledExp.value(factor * ErrorFunctions.erfc(au), s1(x) + shift, 0.0);
    }

    @Override
    public double value(double x, double t, double shift) {
        return value(x, t, shift, Spread.inverseLength(d, r, t));
    }

    @Override
    public double value(double x, double t, double shift, double il) {
        final double au = (x - uR * t) * il;
        final double bu = (x + uR * t) * il;
        final double av = (x - vR * t) * il;
        final double second = 0.5 * ErrorFunctions.erfcx(bu);
        if (au >= ERFCX_FROM) {
            // both terms carry exp(−A_v² − μt/R): one exponential for the two
            return ScaledExp.value(0.5 * ErrorFunctions.erfcx(au) + second, trueDecay(t), av);
        }
        // erfc(A_u) ≥ erfc(1/2) ≈ 0.48 costs no exponential here, and e^{s₁+shift} is 1 when
        // μ = 0 and the input is constant (ScaledExp then skips it)
        final double e = s1(x) + shift;
        final double first = 0.5 * ErrorFunctions.erfc(au);
        return (e == 0 ? first : ScaledExp.value(first, e, 0.0))
            + ScaledExp.value(second, trueDecay(t), av);
    }

    /**
     * From this A_u on, the first term is evaluated as exp(−A_v² − μt/R)·erfcx(A_u): below
     * it erfcx needs an exponential of its own (Commons Numbers computes it from erf below
     * 1/2), while erfc(A_u) needs none.
     */
    private static final double ERFCX_FROM = 0.5;

    @Override
    public double gradient(double x, double t, double shift) {
        // ∂F/∂x = (v−u)/(4D)·e^{s1}erfc(A_u) − (e^{s1−A_u²}/L)·[(A_v + B_u)·erfcx(B_u) + 2φ(B_u)]
        // with A_v + B_u = (2x + (u − v)t/R)/L ≥ 0: every term is ≤ 0, nothing cancels.
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double au = s.scaled(x - uR * t);
        final double bu = s.scaled(x + uR * t);
        final double av = s.scaled(x - vR * t);
        final double avPlusBu = s.scaled(2 * x - vMinusUR * t);
        final double bracket = avPlusBu * ErrorFunctions.erfcx(bu) + 2 * ErfcxIntegrals.phi(bu);
        return firstTerm(vMinusU / (4 * d), x, t, shift, s.inverseLength(), au)
            - ScaledExp.value(s.inverseLength() * bracket, trueDecay(t), av);
    }

    @Override
    public double steadyRate() {
        return k;
    }

    @Override
    public double complementGradient(double x, double t) {
        // R(∞) − R = e^{s1}·J(a, b) = e^{−A_v² − μt/R}·∫_a^b φ, a = P_u − Q, b = P_u + Q, so
        // ∂/∂x = (e^{−A_v² − μt/R}/L)·[φ(a) + φ(b) − 2A_v·∫_a^b φ]: the exponent's own
        // x-derivative −2A_v/L is applied directly (k + 2a/L nearly cancel otherwise).
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double m = s.scaled(uR * t);
        final double h = s.scaled(x);
        final double a = m - h;
        final double b = m + h;
        if (a < 0) {
            return steadyRate() * complement(x, t) + gradientRemainder(x, t, s);
        }
        final double integral = ErfcxIntegrals.integralOfPhiAnyWidth(m, h);
        final double av = s.scaled(x - vR * t);
        final double bracket = ErfcxIntegrals.phi(a) + ErfcxIntegrals.phi(b) - 2 * av * integral;
        return ScaledExp.value(s.inverseLength() * bracket, trueDecay(t), av);
    }

    /** k·F − F_x = (2e^{s1 − A_u²}/L)·[φ(B_u) + Q·erfcx(B_u)],  Q = x/L. */
    private double gradientRemainder(double x, double t, Spread s) {
        final double au = s.scaled(x - uR * t);
        final double bu = s.scaled(x + uR * t);
        final double bracket = ErfcxIntegrals.phi(bu) + s.scaled(x) * ErrorFunctions.erfcx(bu);
        return ScaledExp.value(2 * s.inverseLength() * bracket, s1(x), au);
    }

    /**
     * Returns exp(shift)·(R − (D/v)·∂R/∂x) for v &lt; 0, where the two terms nearly cancel
     * (the steady state e^{s1} has exactly zero flux-averaged value when μ = 0). Rewritten
     * with B·erfcx(B) + φ(B) = 1/√π as two terms of one sign:
     * <pre>
     * R_f = −(v+u)/(4|v|)·e^{s1}erfc(A_u)
     *       − e^{−A_v² − μt/R}/(4|P_v|)·[(P_u − |P_v| + 2Q)·erfcx(B_u) + 2φ(B_u)]
     * </pre>
     * with P = ut/(RL), Q = x/L, v + u = 4μD/(u − v) ≥ 0.
     */
    double fluxAveragedUpstream(double x, double t, double shift) {
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double au = s.scaled(x - uR * t);
        final double bu = s.scaled(x + uR * t);
        final double av = s.scaled(x - vR * t);
        final double vPlusU = 4 * mu * d / (u - v);
        final double pv = s.scaled(-vR * t);
        final double puMinusPv = s.scaled(vPlusU / r * t);
        final double bracket = (puMinusPv + 2 * s.scaled(x)) * ErrorFunctions.erfcx(bu)
            + 2 * ErfcxIntegrals.phi(bu);
        return firstTerm(-vPlusU / (4 * -v), x, t, shift, s.inverseLength(), au)
            - ScaledExp.value(bracket / (4 * pv), trueDecay(t), av);
    }

    /**
     * A_u &lt; 0, i.e. x &lt; ut/R: then erfc(A_u) &gt; 1 and the first term alone exceeds
     * e^{s₁}/2, half the steady state.
     */
    @Override
    public boolean pastHalfSteady(double x, double t) {
        return x < uR * t;
    }

    @Override
    public double steady(double x) {
        return expS1(x);
    }

    @Override
    public double complement(double x, double t) {
        // F(∞) − F(t) = e^{s1}·½[erfc(−A_u) − e^{−A_u²}erfcx(B_u)] = e^{s1}·J(−A_u, B_u)
        // −A_u and B_u are P_u ∓ Q with P_u = ut/(RL), Q = x/L: pass those, not x ± ut/R
        final Spread s = Spread.ofInverseLength(d, r, t);
        return expS1(x) * ErfcxIntegrals.jCentred(s.scaled(uR * t), s.scaled(x));
    }

    @Override
    public double density(double x, double t) {
        return firstPassageDensity(x, t, d, r, vR, muR);
    }

    /**
     * ∂F/∂t = x/(t√π L)·exp(−μt/R − A_v²), the first-passage density (Duhamel): this inlet's
     * impulse response, and the flux inlet's flux-averaged one.
     */
    static double firstPassageDensity(double x, double t, double d, double r, double vR,
                                      double muR) {
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double av = s.scaled(x - vR * t);
        return ScaledExp.value(s.scaled(x) / (t * SQRT_PI), -muR * t, av);
    }

    @Override
    public double densityGradient(double x, double t) {
        // ∂/∂x of x/(t√π L)·e^{−μt/R − A²} = e^{−μt/R − A²}/(t√π L)·(1 − 2A·x/L)
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double av = s.scaled(x - vR * t);
        final double q = s.scaled(x);
        return ScaledExp.value(s.inverseLength() / (t * SQRT_PI), -muR * t, av)
            * (1 - 2 * av * q);
    }

    @Override
    public double fluxAveragedDensity(double x, double t) {
        // x/(t√π L)·e^{E} − (D/v)·e^{E}/(t√π L)·(1 − 2AQ), E = −μt/R − A², with
        // (2D/v)·A·Q = (2D/v)·Q² − x/2 (Q·P = x·vt/(RL²) and L² = 4Dt/R):
        // e^{E}/(t√π L)·[x/2 + (D/v)(2Q² − 1)], which changes sign once in t; 2Q² − 1 is
        // formed as 2(Q − 1/√2)(Q + 1/√2), so that its zero costs no more than the rounding of Q
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double q = s.scaled(x);
        final double bracket = 0.5 * x + d / v * (2 * (q - SQRT_HALF) * (q + SQRT_HALF));
        return ScaledExp.value(s.inverseLength() * bracket / (t * SQRT_PI), -muR * t,
            s.scaled(x - vR * t));
    }

    /** √½. */
    private static final double SQRT_HALF = Math.sqrt(0.5);

    @Override
    public double flush(double x, double t) {
        // 1 − F₀ = (1 − e^{s1⁰}) + e^{s1⁰}·J(−A₀, B₀), u₀ = |v|, s1⁰ = min(v, 0)·x/D ≤ 0:
        // two non-negative terms.
        final Spread s = Spread.ofInverseLength(d, r, t);
        final double s10 = k0 * x;
        return -Math.expm1(s10)
            + Math.exp(s10) * ErfcxIntegrals.jCentred(s.scaled(Math.abs(vR) * t), s.scaled(x));
    }

    @Override
    public double flushGradient(double x, double t) {
        return -new FirstTypeResponse(v, d, r, 0.0, 0.0).gradient(x, t, 0.0);
    }
}
