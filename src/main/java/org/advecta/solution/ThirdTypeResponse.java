package org.advecta.solution;

import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ErrorFunctions;

/**
 * The unit response of the third-type (flux) inlet v·c − D·∂c/∂x = v at x = 0 on a clean
 * half-line, v &gt; 0. The published form (van Genuchten &amp; Alves 1982, USDA Tech. Bull. 1661;
 * Lindstrom et al. 1967 for μ = 0) is
 * <pre>
 * T = v/(v+u)·e^{(v−u)x/2D} erfc(A_u) + v/(v−u)·e^{(v+u)x/2D} erfc(B_u)
 *     + v²/(2μD)·e^{vx/D − μt/R} erfc(B_v)
 * </pre>
 * whose last two terms are each of size 1/μ and cancel as μ → 0. Using B² − A² = ux/D and
 * (v − u)(v + u) = −4μD, and φ = −erfcx′/2 &gt; 0, it is rewritten here as a sum of
 * non-negative terms,
 * <pre>
 * T = v/(u+v) · e^{s₁} · [ 2 J(A_u, B_u) + 4 P_v e^{−A_u²} M ],   s₁ = (v−u)x/(2D)
 * J(a, b) = ½[erfc(a) − e^{−a²} erfcx(b)] = e^{−a²} ∫_a^b φ,   P_v = vt/(RL)
 * M = mean of φ between B_v and B_u   (= φ(B) when μ = 0)
 * </pre>
 * which reduces to Lindstrom's μ = 0 solution and has no 1/μ.
 */
final class ThirdTypeResponse implements UnitResponse {

    private final double v;
    private final double d;
    private final double r;
    private final double mu;
    /** The medium's decay coefficient (μ differs from it by λR for an exponential input). */
    private final double muTrue;
    private final double u;
    /** v − u, without cancellation. */
    private final double vMinusU;

    ThirdTypeResponse(double v, double d, double r, double mu, double muTrue) {
        this.v = v;
        this.d = d;
        this.r = r;
        this.mu = mu;
        this.muTrue = muTrue;
        this.u = Math.sqrt(Math.fma(4 * mu, d, v * v));
        this.vMinusU = -4 * mu * d / (v + u);
    }

    /** The per-(x, t) quantities of the formula. */
    private final class Point {
        final Spread s;
        final double au;
        final double bu;
        final double bv;
        final double pv;
        final double q;
        final double s1;
        final double av;
        /** −μt/R with the medium's own μ: s₁ + shift − A_u² = −A_v² − μt/R. */
        final double decay;

        Point(double x, double t) {
            s = Spread.of(d, r, t);
            au = s.scaled(x - u / r * t);
            bu = s.scaled(x + u / r * t);
            bv = s.scaled(x + v / r * t);
            pv = s.scaled(v / r * t);
            q = s.scaled(x);
            s1 = vMinusU * x / (2 * d);
            av = s.scaled(x - v / r * t);
            decay = -muTrue / r * t;
        }
    }

    @Override
    public double value(double x, double t, double shift) {
        return valueTimes(1.0, new Point(x, t), t, shift);
    }

    /**
     * factor × value, the factor applied inside the exponentials' multipliers so that a
     * normal result is never formed from a subnormal one.
     */
    private double valueTimes(double factor, Point p, double t, double shift) {
        final double m = ErfcxIntegrals.meanOfPhi(p.bv, p.bu);
        final double f = factor * v / (u + v);
        // 2e^{s1+shift}·J(A_u, B_u): centre Q = x/L, half-width P_u = ut/(RL)
        final double first = expTimesJ(p, 2 * f, p.s1 + shift, p.q, p.s.scaled(u / r * t));
        final double second = ScaledExp.value(f * 4 * p.pv * m, p.decay, p.av);
        return first + second;
    }

    /**
     * exp(e)·J(m − h, m + h) where e − (m − h)² = −A_v² − μt/R: the exponential factors are
     * applied as that exponent, without the cancellation of e = s₁ − λt.
     */
    private static double expTimesJ(Point p, double factor, double e, double m, double h) {
        final double a = m - h;
        if (a < 0) {
            return factor * ErfcxIntegrals.expTimesJ(e, m, h);
        }
        return ScaledExp.value(factor * ErfcxIntegrals.integralOfPhiAnyWidth(m, h), p.decay,
            p.av);
    }

    @Override
    public double steadyRate() {
        return vMinusU / (2 * d);
    }

    @Override
    public double complementGradient(double x, double t) {
        // ∂/∂x (T(∞) − T) = k·(T(∞) − T) + (k·T − T_x), and k·T − T_x =
        // −v/(u+v)·(4/L)·e^{−A_v² − μt/R}·inner ≥ 0
        final Point p = new Point(x, t);
        final double remainder = -v / (u + v)
            * ScaledExp.value(4 * p.s.inverseLength() * inner(p, t), p.decay, p.av);
        return steadyRate() * complement(x, t) + remainder;
    }

    /** The bracket of the gradient (see {@link #gradient}); ≤ 0. */
    private double inner(Point p, double t) {
        final double pu = p.s.scaled(u / r * t);
        final double m = ErfcxIntegrals.meanOfPhi(p.bv, p.bu);
        final double mPsi = ErfcxIntegrals.meanOfPsi(p.bv, p.bu);
        final double phiBu = ErfcxIntegrals.phi(p.bu);
        final double pvMinusPu = p.s.scaled(vMinusU / r * t);
        return -pu * ErfcxIntegrals.psi(p.bu) - p.pv * mPsi
            - 4 * pu * p.q * phiBu - 2 * pu * p.au * (m - phiBu) - 2 * pvMinusPu * p.au * m;
    }

    @Override
    public double gradient(double x, double t, double shift) {
        // T_x = (v−u)/(2D)·T + v/(u+v)·(4/L)·e^{s1 − A_u²}·inner, where (with P_u = ut/(RL))
        // inner = −P_u ψ(B_u) − P_v M_ψ − 4 P_u Q φ(B_u) − 2 P_u A_u (M − φ(B_u))
        //         − 2 (P_v − P_u) A_u M
        // collects −P_u erfcx(B_u) − 2P_v A_u M − P_v M_ψ so that its leading terms share
        // a sign (erfcx = ψ + 2sφ, A_u + B_u = 2Q).
        final Point p = new Point(x, t);
        return valueTimes(vMinusU / (2 * d), p, t, shift)
            + v / (u + v) * ScaledExp.value(4 * p.s.inverseLength() * inner(p, t), p.decay, p.av);
    }

    @Override
    public double steady(double x) {
        return 2 * v / (u + v) * Math.exp(vMinusU * x / (2 * d));
    }

    @Override
    public double complement(double x, double t) {
        // T(∞) − T(t) = v/(u+v)·e^{s1}·[core(A_u, B_u) + 4e^{−A_u²}(P_u φ(B_u) − P_v M)]
        final Point p = new Point(x, t);
        final double pu = p.s.scaled(u / r * t);
        final double m = ErfcxIntegrals.meanOfPhi(p.bv, p.bu);
        final double phiBu = ErfcxIntegrals.phi(p.bu);
        final double correction = 4 * ((pu - p.pv) * phiBu + p.pv * (phiBu - m));
        return v / (u + v) * Math.exp(p.s1) * (core(p.au, p.bu)
            + ScaledExp.value(correction, 0.0, p.au));
    }

    /**
     * core(A, B) = erfc(−A) + e^{−A²}(ψ(B) + 2Aφ(B)) ≥ 0. For A &lt; 0 the terms erfc(|A|)
     * and 2Aφ(B) nearly cancel; with erfc(|A|) = e^{−A²}erfcx(|A|) and erfcx = ψ + 2sφ it is
     * e^{−A²}[ψ(|A|) + ψ(B) + 2|A|(B − |A|)·mean ψ on [|A|, B]], a sum of positive terms.
     */
    private static double core(double a, double b) {
        if (a >= 0) {
            return ErrorFunctions.erfc(-a) + ScaledExp.value(
                ErfcxIntegrals.psi(b) + 2 * a * ErfcxIntegrals.phi(b), 0.0, a);
        }
        final double abs = -a;
        final double sum = ErfcxIntegrals.psi(abs) + ErfcxIntegrals.psi(b)
            + 2 * abs * (b - abs) * ErfcxIntegrals.meanOfPsi(abs, b);
        return ScaledExp.value(sum, 0.0, a);
    }

    @Override
    public double density(double x, double t) {
        // ∂T/∂t = e^{−μt/R}·(2P_v/t)·e^{−A_v²}·[φ(B_v) + Q·erfcx(B_v)]; the decay factor is
        // exact because the unit impulse entered at t = 0 decays uniformly.
        final Point p = new Point(x, t);
        final double bracket = ErfcxIntegrals.phi(p.bv) + p.q * ErrorFunctions.erfcx(p.bv);
        return ScaledExp.value(2 * p.pv / t * bracket, -mu / r * t, p.av);
    }

    @Override
    public double densityGradient(double x, double t) {
        final Point p = new Point(x, t);
        final double bracket = ErrorFunctions.erfcx(p.bv) * (1 - 2 * p.av * p.q)
            - ErfcxIntegrals.psi(p.bv) - 2 * ErfcxIntegrals.phi(p.bv) * (p.av + p.q);
        return ScaledExp.value(2 * p.pv / t * p.s.inverseLength() * bracket, -mu / r * t,
            p.av);
    }

    @Override
    public double flush(double x, double t) {
        // 1 − T₀ = ½·core(A_v, B_v), the decay-free complement
        final Spread s = Spread.of(d, r, t);
        return 0.5 * core(s.scaled(x - v / r * t), s.scaled(x + v / r * t));
    }

    @Override
    public double flushGradient(double x, double t) {
        // −∂T₀/∂x = (4P/L)·e^{−A²}·[2Qφ(B) + ψ(B)]
        final Point p = new Point(x, t);
        final double bracket = 2 * p.q * ErfcxIntegrals.phi(p.bv) + ErfcxIntegrals.psi(p.bv);
        return ScaledExp.value(4 * p.pv * p.s.inverseLength() * bracket, 0.0, p.av);
    }
}
