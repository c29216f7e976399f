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
    // Quotients of the formulas, divided once here rather than at every point.
    private final double uR;
    private final double vR;
    private final double muR;
    private final double muTrueR;
    private final double vMinusUR;
    /** k = (v − u)/(2D), so that s₁ = k·x. */
    private final double k;
    /** v/(u + v), the factor of the whole solution (½ when μ = 0). */
    private final double ratio;

    ThirdTypeResponse(double v, double d, double r, double mu, double muTrue) {
        this.v = v;
        this.d = d;
        this.r = r;
        this.mu = mu;
        this.muTrue = muTrue;
        this.u = Math.sqrt(Math.fma(4 * mu, d, v * v));
        this.vMinusU = -4 * mu * d / (v + u);
        this.uR = u / r;
        this.vR = v / r;
        this.muR = mu / r;
        this.muTrueR = muTrue / r;
        this.vMinusUR = vMinusU / r;
        this.k = vMinusU / (2 * d);
        this.ratio = v / (u + v);
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
            s = Spread.ofInverseLength(d, r, t);
            au = s.scaled(x - uR * t);
            bu = s.scaled(x + uR * t);
            bv = s.scaled(x + vR * t);
            pv = s.scaled(vR * t);
            q = s.scaled(x);
            s1 = k * x;
            av = s.scaled(x - vR * t);
            decay = -muTrueR * t;
        }
    }

    @Override
    public double value(double x, double t, double shift) {
        return value(x, t, shift, Spread.inverseLength(d, r, t));
    }

    @Override
    public double value(double x, double t, double shift, double il) {
        // The formula of the class comment with local variables only (no Point: this runs at
        // every point of a profile, and the allocation would cost as much as the formula).
        if (mu == 0 && shift == 0) {
            final double undecayed = withoutDecay(x, t, il);
            if (undecayed == undecayed) {
                return undecayed;
            }
        }
        final double q = x * il;
        final double pu = (uR * t) * il;
        final double av = (x - vR * t) * il;
        final double decay = -muTrueR * t;
        // 4 v/(u+v)·P_v·M, the multiplier of exp(−A_v² − μt/R)
        final double second = 4 * ratio * ((vR * t) * il)
            * ErfcxIntegrals.meanOfPhi((x + vR * t) * il, (x + uR * t) * il);
        final double a = q - pu;
        if (a >= 0) {
            // e^{s₁+shift}·J(A_u, B_u) = e^{−A_v² − μt/R}·∫φ over [A_u, B_u]: one exponential
            // for both terms (for A_u < 0 the integral holds e^{A_u²}, which must meet the
            // very same A_u in the exponent, as below)
            return ScaledExp.value(2 * ratio * ErfcxIntegrals.integralOfPhiAnyWidth(q, pu)
                + second, decay, av);
        }
        // the exponential factors applied as s₁ + shift − A_u², without the cancellation of
        // s₁ − λt against the decay
        return 2 * ratio * ErfcxIntegrals.expTimesJ(k * x + shift, q, pu)
            + ScaledExp.value(second, decay, av);
    }

    /**
     * T for μ = 0 and a constant input (u = v, s₁ = 0), where the class comment's form is
     * <pre>
     * T = ½erfc(A) + e^{−A²}·[2P·φ(B) − ½erfcx(B)]          (A &lt; 1/2)
     * T = e^{−A²}·[½(erfcx(A) − erfcx(B)) + 2P·φ(B)]        (A ≥ 1/2)
     * </pre>
     * with A = (x − vt/R)/L, B = (x + vt/R)/L, P = vt/(RL). Both need one exponential and no
     * erfcx of an argument below 1/2 (which costs one of its own). The bracket of the first
     * line is ≈ −A/(2√π B²): it cancels, but its error is a few units of 2⁻⁵³·erfcx(B),
     * small beside ½erfc(A) ≥ 0.24. For an interval [A, B] narrow beside its centre (early
     * times, P ≤ max(1, Q)/4), ½erfc(A) and the bracket would cancel: NaN is returned and
     * the caller takes the general path, which integrates φ there.
     */
    private double withoutDecay(double x, double t, double il) {
        final double q = x * il;
        final double p = (vR * t) * il;
        if (ErfcxIntegrals.narrow(q, p)) {
            return Double.NaN;
        }
        final double a = (x - vR * t) * il;
        final double b = (x + vR * t) * il;
        final double erfcxB = ErrorFunctions.erfcx(b);
        final double phiTerm = 2 * p * ErfcxIntegrals.phi(b);
        if (a >= ERFCX_FROM) {
            return ScaledExp.value(0.5 * (ErrorFunctions.erfcx(a) - erfcxB) + phiTerm, 0.0, a);
        }
        return 0.5 * ErrorFunctions.erfc(a) + ScaledExp.value(phiTerm - 0.5 * erfcxB, 0.0, a);
    }

    /** See {@link #withoutDecay}: from here on erfcx(A) costs no exponential. */
    private static final double ERFCX_FROM = 0.5;

    /**
     * factor × value, the factor applied inside the exponentials' multipliers so that a
     * normal result is never formed from a subnormal one.
     */
    private double valueTimes(double factor, Point p, double t, double shift) {
        final double m = ErfcxIntegrals.meanOfPhi(p.bv, p.bu);
        final double f = factor * ratio;
        // 2e^{s1+shift}·J(A_u, B_u): centre Q = x/L, half-width P_u = ut/(RL)
        final double first = expTimesJ(p, 2 * f, p.s1 + shift, p.q, p.s.scaled(uR * t));
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
        return k;
    }

    @Override
    public double complementGradient(double x, double t) {
        // ∂/∂x (T(∞) − T) = k·(T(∞) − T) + (k·T − T_x), and k·T − T_x =
        // −v/(u+v)·(4/L)·e^{−A_v² − μt/R}·inner ≥ 0: for μ > 0 (k < 0) the two terms have
        // opposite signs and cancel under decay strong beside advection, where the closed
        // forms from the flux identity are taken instead if they cancel less
        final Point p = new Point(x, t);
        final double decayed = steadyRate() * complement(x, t);
        final double remainder = -v / (u + v)
            * ScaledExp.value(4 * p.s.inverseLength() * inner(p, t), p.decay, p.av);
        final double sum = decayed + remainder;
        final double publishedLoss = (Math.abs(decayed) + remainder) / Math.abs(sum);
        if (!(publishedLoss > 2)) {
            return sum;
        }
        return fromFlux(p, t, sum, publishedLoss);
    }

    /**
     * ∂/∂x (T(∞) − T(t)) for μ &gt; 0 in closed form, without the cancellation of the
     * published form under decay much stronger than advection. The flux v·T − D·∂T/∂x of this
     * response is v times the first-type response T₁ (Kreft &amp; Zuber 1978; Parker &amp; van
     * Genuchten 1984), so ∂T/∂x = (v/D)(T − T₁), and with the published forms of both (van
     * Genuchten &amp; Alves 1982) the three terms of (T(∞) − T) − (T₁(∞) − T₁) share the factor
     * e^{−A_v² − μt/R} ((v−u)x/(2D) − A_u² = (v+u)x/(2D) − B_u² = vx/D − μt/R − B_v²
     * = −A_v² − μt/R, from u² = v² + 4μD):
     * <pre>
     * ∂(T(∞) − T)/∂x = (v/D)·e^{−A_v² − μt/R}·Q,  with a = −A_u, b = B_u, c = B_v, P = t/(RL),
     * Q = v/(2μD)·[u·erfcx(a) − v·erfcx(c)] − (u+v)/(2(u−v))·[erfcx(a) − erfcx(b)]
     *   = 2v/(u+v)·erfcx(a) − (u+3v)/(2(u+v))·[erfcx(a) − erfcx(c)] − (u+v)·P·M
     * </pre>
     * (M the mean of φ between c and b; the second line from the first with 1/(2μD) =
     * 2/((u−v)(u+v)) and erfcx(b) − erfcx(c) = −2(u−v)P·M). Each bracket is formed from
     * integrals of φ, so it carries no cancellation of its own; the first line's two terms
     * grow like 1/μ and cancel for weak decay, the second line's last two terms cancel for
     * strong decay, and where Q itself is small beside its terms (near the sign change of the
     * gradient in x) every form cancels alike.
     *
     * <p>Which form is taken: the published one carries its two exponentials separately, so
     * its error is its cancellation factor times the rounding of the exponent (about
     * 1 + |exponent| ulp); the closed forms add that rounding once, after their own
     * cancellation. The estimate with the smaller result wins (on the grid of
     * gen_pulse_decay.py at μ = 1000 the published form, cancelling 375-fold beside an
     * exponent of 300, was 6.7e−12 relative off; the closed forms, cancelling 1200-fold in
     * ordinary numbers, 7e−15).
     *
     * @param published the published form's value
     * @param publishedLoss the factor by which its terms cancel
     * @return the form with the smaller error estimate (the published one before the front,
     *     a &lt; −26, where erfcx(a) overflows)
     */
    private double fromFlux(Point p, double t, double published, double publishedLoss) {
        final double pu = p.s.scaled(uR * t);
        final double a = pu - p.q;
        if (a < ErfcxIntegrals.ERFCX_OVERFLOW) {
            return published;
        }
        final double erfcxA = ErrorFunctions.erfcx(a);
        final double uMinusV = -vMinusU;
        // first line: both brackets ≥ 0 (u·erfcx(a) ≥ v·erfcx(c): z ↦ z·erfcx(z + Q) grows)
        final double strongFirst = 2 * v / (uMinusV * (u + v))
            * (u * erfcxA - v * ErrorFunctions.erfcx(p.bv));
        final double strongSecond = (u + v) / (2 * uMinusV)
            * (2 * ErfcxIntegrals.integralOfPhiAnyWidth(pu, p.q));
        final double strong = strongFirst - strongSecond;
        final double strongLoss = (strongFirst + strongSecond) / Math.abs(strong);
        // second line: erfcx(a) − erfcx(c) = 2(c − a)·(mean of φ between a and c)
        final double weakFirst = 2 * v / (u + v) * erfcxA;
        final double weakSecond = (u + 3 * v) / (2 * (u + v))
            * (2 * (p.s.scaled(vMinusUR * t) + 2 * p.q) * ErfcxIntegrals.meanOfPhi(a, p.bv));
        final double weakThird = (u + v) * (t * p.s.inverseLength() / r)
            * ErfcxIntegrals.meanOfPhi(p.bv, p.bu);
        final double weak = weakFirst - weakSecond - weakThird;
        final double weakLoss = (weakFirst + Math.abs(weakSecond) + weakThird) / Math.abs(weak);
        // The published form's two terms carry their exponentials separately, each with the
        // rounding of its own arguments (about |exponent| ulp), and the cancellation
        // multiplies that; the closed forms apply the one shared exponential after the
        // cancellation, so its rounding is added once.
        final double exponentUlps = 1 + p.av * p.av + muR * t;
        final double fluxLoss = Math.min(strongLoss, weakLoss);
        if (!(fluxLoss + exponentUlps < publishedLoss * exponentUlps)) {
            return published;
        }
        final double q = strongLoss <= weakLoss ? strong : weak;
        return v / d * ScaledExp.value(q, -muR * t, p.av);
    }

    /** The bracket of the gradient (see {@link #gradient}); ≤ 0. */
    private double inner(Point p, double t) {
        final double pu = p.s.scaled(uR * t);
        final double m = ErfcxIntegrals.meanOfPhi(p.bv, p.bu);
        final double mPsi = ErfcxIntegrals.meanOfPsi(p.bv, p.bu);
        final double phiBu = ErfcxIntegrals.phi(p.bu);
        final double pvMinusPu = p.s.scaled(vMinusUR * t);
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
        return valueTimes(k, p, t, shift)
            + v / (u + v) * ScaledExp.value(4 * p.s.inverseLength() * inner(p, t), p.decay, p.av);
    }

    @Override
    public double steady(double x) {
        return 2 * v / (u + v) * Math.exp(k * x);
    }

    @Override
    public double complement(double x, double t) {
        // T(∞) − T(t) = v/(u+v)·e^{s1}·[core(A_u, B_u) + 4e^{−A_u²}(P_u φ(B_u) − P_v M)]
        final Point p = new Point(x, t);
        final double pu = p.s.scaled(uR * t);
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
        return ScaledExp.value(2 * p.pv / t * bracket, -muR * t, p.av);
    }

    @Override
    public double densityGradient(double x, double t) {
        // ∂/∂x of the density's bracket φ(B) + Q·erfcx(B) against e^{−A²}, with ψ = erfcx − 2Bφ
        // and B − A = 2P: 2[(2P − Q)·φ(B) − A·Q·erfcx(B)], both terms ≥ 0 behind the front
        // (A ≤ 0, Q ≤ P); the sign change in τ lies where P < Q < 2P
        final Point p = new Point(x, t);
        final double twoPMinusQ = p.s.scaled(2 * vR * t - x);
        final double bracket = 2 * (twoPMinusQ * ErfcxIntegrals.phi(p.bv)
            - p.av * p.q * ErrorFunctions.erfcx(p.bv));
        return ScaledExp.value(2 * p.pv / t * p.s.inverseLength() * bracket, -muR * t,
            p.av);
    }

    @Override
    public double fluxAveragedDensity(double x, double t) {
        // the flux-averaged response of this inlet is the first-type one (Parker & van
        // Genuchten 1984)
        return FirstTypeResponse.firstPassageDensity(x, t, d, r, vR, muR);
    }

    @Override
    public double flush(double x, double t) {
        // 1 − T₀ = ½·core(A_v, B_v), the decay-free complement
        final Spread s = Spread.ofInverseLength(d, r, t);
        return 0.5 * core(s.scaled(x - vR * t), s.scaled(x + vR * t));
    }

    @Override
    public double flushGradient(double x, double t) {
        // −∂T₀/∂x = (4P/L)·e^{−A²}·[2Qφ(B) + ψ(B)]
        final Point p = new Point(x, t);
        final double bracket = 2 * p.q * ErfcxIntegrals.phi(p.bv) + ErfcxIntegrals.psi(p.bv);
        return ScaledExp.value(4 * p.pv * p.s.inverseLength() * bracket, 0.0, p.av);
    }
}
