package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.GaussLegendre;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * What the two inlet families share: the input shapes (by superposition of unit responses)
 * and the uniform initial concentration (by the decay-free flush response).
 */
abstract class InletSolution extends AbstractSolution1D {

    /**
     * The pulse response is integrated over [t − t₀, t] by quadrature when t₀ ≤ t/4 and the
     * impulse response changes by at most this factor across the interval; then the
     * difference R(t) − R(t − t₀) would cancel while the rule is exact to rounding.
     */
    private static final double NARROW_RATIO = Math.exp(2);

    /**
     * Largest factor by which the impulse response's curvature in log scale, f(a)·f(b)/f(m)²
     * at an interval's ends and middle, may differ from 1 for the 10-point rule: the ratio test
     * alone lets a peak through the middle (a front passing while decay cuts it off), and
     * for f = e^{αz + βz²/2} on [−1, 1] the rule's relative error is 1e−12 at β = −2.25 but at
     * most 7e−17 for |β| ≤ 1/2 and |α| ≤ 1 (mpmath, exact nodes; a pulse value far ahead of
     * the front under strong decay was 8.8 times outside max(16, 2κ) ULP without this test).
     */
    private static final double CURVATURE_RATIO = Math.exp(0.5);

    /** The input history. */
    final InletInput input;
    /** The uniform initial concentration Cᵢ. */
    final double initial;
    /** The unit response with the decay coefficient the input needs. */
    final UnitResponse response;
    // The input's parameters, read at every point.
    private final InletInput.Kind kind;
    private final double level;
    private final double rate;

    InletSolution(TransportParameters parameters, InletInput input, double initial) {
        super(parameters, Domain.HALF_LINE);
        if (input == null) {
            throw new IllegalArgumentException("input: must not be null");
        }
        this.input = input;
        this.kind = input.kind();
        this.level = input.level();
        this.rate = input.kind() == InletInput.Kind.EXPONENTIAL ? input.rate() : 0.0;
        this.initial = Checks.finite("ci", initial);
        final double mu = parameters.decayRate();
        double effective = mu;
        if (input.kind() == InletInput.Kind.EXPONENTIAL) {
            // c = e^{−λt}·w, where w solves the same problem with decay μ − λR.
            effective = mu - input.rate() * retardation;
            final double limit = (mu + velocity * velocity / (4 * dispersion)) / retardation;
            if (!(Math.fma(4 * effective, dispersion, velocity * velocity) >= 0)) {
                throw Checks.fail("lambda", input.rate(),
                    "must be <= (mu + v^2/(4D))/R = " + limit + " for the closed form (beyond it"
                        + " u = sqrt(v^2 + 4(mu - lambda R)D) is imaginary)");
            }
        }
        this.response = newResponse(velocity, dispersion, retardation, effective, mu);
    }

    /**
     * Returns the input history.
     *
     * @return g
     */
    public InletInput input() {
        return input;
    }

    /**
     * Returns the initial concentration Cᵢ.
     *
     * @return Cᵢ
     */
    public double initialConcentration() {
        return initial;
    }

    /**
     * Creates the family's unit response for decay coefficient mu (μ − λR for an exponential
     * input), where the medium's own decay coefficient is muTrue.
     */
    abstract UnitResponse newResponse(double v, double d, double r, double mu, double muTrue);

    @Override
    double valueAt(double x, double t) {
        // the same double as spreadAt(t).inverseLength(), without an object per point (a
        // pulse forms its own at its two times)
        return valueWith(x, t, kind == InletInput.Kind.PULSE ? Double.NaN
            : Spread.inverseLength(dispersion, retardation, t));
    }

    @Override
    Spread spreadAt(double t) {
        // a pulse evaluates the response at two times, each with its own spread
        return kind == InletInput.Kind.PULSE ? null
            : Spread.ofInverseLength(dispersion, retardation, t);
    }

    @Override
    double valueAt(double x, double t, Spread s) {
        return valueWith(x, t, s == null ? Double.NaN : s.inverseLength());
    }

    /** c(x, t) given 1/L (NaN for a pulse, which forms its own at two times). */
    private double valueWith(double x, double t, double il) {
        final double fromInput = level == 0 ? 0.0 : level * inputResponse(x, t, il);
        if (initial == 0) {
            return fromInput;
        }
        return fromInput + initial * Math.exp(decayExponent(t)) * response.flush(x, t);
    }

    @Override
    final double gradientAt(double x, double t) {
        final double fromInput = level == 0 ? 0.0 : level * inputResponseGradient(x, t);
        if (initial == 0) {
            return fromInput;
        }
        return fromInput + initial * Math.exp(decayExponent(t)) * response.flushGradient(x, t);
    }

    // Plain comparisons of the kind held in a field rather than a switch on the enum: these
    // run at every point of a profile, and the switch's lookup table is a load more.
    private double inputResponse(double x, double t, double il) {
        if (kind == InletInput.Kind.CONSTANT) {
            return response.value(x, t, 0.0, il);
        }
        return kind == InletInput.Kind.PULSE ? pulse(x, t) : response.value(x, t, -rate * t, il);
    }

    private double inputResponseGradient(double x, double t) {
        if (kind == InletInput.Kind.CONSTANT) {
            return response.gradient(x, t, 0.0);
        }
        return kind == InletInput.Kind.PULSE ? pulseGradient(x, t)
            : response.gradient(x, t, -rate * t);
    }

    /**
     * R(t) − R(t − t₀), the response to a rectangular pulse (superposition in time), chosen
     * among three cancellation-free forms: quadrature of the impulse response over
     * [t − t₀, t] when that is narrow; the direct difference while R(t − t₀) ≤ R(t)/2; else
     * the difference of the complements R(∞) − R, or, where that cancels, quadrature (see
     * {@link #afterFront}; cheaper forms first). The direct
     * difference is no longer taken merely because R(t) is below half its steady state: at
     * the flux inlet's x = 0 the response starts high and rises slowly, and that difference
     * was 8.6 times outside max(16, 2κ) ULP.
     */
    private double pulse(double x, double t) {
        // Each response is evaluated at one call site only (R(t) for both t ≤ t₀ and the
        // direct difference, R(t − t₀) for both tests of that difference): the JIT inlines
        // every call site of this method into the caller's compiled code, and four copies
        // of R made that code 17 KB instead of 12 KB (HotSpot 17, the pulse benchmark) for no
        // work saved. The branches and their order are those of the comment above; the
        // values are the same doubles.
        final double t0 = input.duration();
        final boolean ended = t > t0;
        final double t1 = t - t0;
        if (ended) {
            if (response.pastHalfSteady(x, t)) {
                return afterFront(x, t1, t);
            }
            if (narrowInTime(x, t1, t)) {
                return integrate(x, t1, t, DENSITY);
            }
        }
        final double now = response.value(x, t, 0.0);
        if (!ended) {
            return now;
        }
        // before the front has passed: the direct difference while it loses at most one bit;
        // else the complements (or the integral)
        final double before = response.value(x, t1, 0.0);
        if (before <= 0.5 * now) {
            return now - before;
        }
        return afterFront(x, t1, t);
    }

    /**
     * The pulse from the complements, R(∞) − R(t − t₀) minus R(∞) − R(t), while they cancel
     * by at most {@link #MAX_ROUTE_LOSS}. Beyond that, the 10-point rule where the interval
     * is narrow (complements cancelling 2.5-fold were 1.17 times outside max(16, 2κ) ULP at a
     * pulse's tail under decay); else the complements still, up to one bit; else the impulse
     * response integrated on pieces (so also where the interval is not narrow or reaches
     * x = 0: the flux inlet's pulse at the inlet was 24 ULP off, 1.3 times max(16, 2κ), from
     * complements that cancel 8-fold). Integrating on pieces wherever the complements cancel
     * more than 2-fold made the pulse benchmark about 70 % slower.
     */
    private double afterFront(double x, double t1, double t) {
        final double before = response.complement(x, t1);
        final double after = response.complement(x, t);
        final double difference = before - after;
        if (before + after <= MAX_ROUTE_LOSS * difference) {
            return difference;
        }
        // between a factor 2 and one bit, the single rule where it applies (cheap), else the
        // difference as before; beyond one bit, the rule on pieces
        if (narrowInTime(x, t1, t)) {
            return integrate(x, t1, t, DENSITY);
        }
        if (after <= 0.5 * before) {
            return difference;
        }
        return integrateAdaptive(x, t1, t, DENSITY, 0);
    }

    /**
     * ∂R/∂x(t) − ∂R/∂x(t − t₀), the gradient of the response to a rectangular pulse, by the
     * first of these routes that does not lose digits:
     * <ol>
     * <li>where [t − t₀, t] is narrow (see {@link #narrowInTime}), the integral of the impulse
     * response's gradient over it: the two step gradients, or their complements, agree to
     * many digits there (their difference was up to 2.94 times outside max(16, 2κ) ULP at the
     * flux inlet, where the complements' gradients were themselves cancelling);</li>
     * <li>the difference of the shifted step gradients before the front, of the complements'
     * gradients after it (those do not hold the steady state's; for the flux inlet under
     * strong decay in closed form from the flux identity, see ThirdTypeResponse), if its
     * terms cancel by at most {@link #MAX_ROUTE_LOSS};</li>
     * <li>for the flux inlet, ∂P₃/∂x = (v/D)·(P₃ − P₁), P₁ the first-type inlet's pulse with
     * the same data (the flux v·P₃ − D·∂P₃/∂x solves the same equation, is 0 at t = 0 and
     * v·g(t) at x = 0, so it is v·P₁: Kreft &amp; Zuber 1978; Parker &amp; van Genuchten 1984),
     * with the same limit; it comes after the differences because P₃ and P₁ are themselves
     * differences, whose errors of a few ulps it multiplies;</li>
     * <li>else the impulse response's gradient integrated on pieces (not at x = 0 for the
     * first-type inlet, whose impulse response is 0 there so that the pieces' test is blind:
     * the difference is kept).</li>
     * </ol>
     * For the flux inlet, checked against mpmath at 34 238 points (a grid of 25 200 points,
     * 2 000 random ones and 9 000 more drawn afterwards over wider ranges, gen_pulse_decay.py):
     * all within max(16, 2κ) ULP, the 7 534 narrow ones at most 0.91 of it, the others 0.95.
     * Taking the route that cancels least first left one point at 1.01 times, the identity
     * first three, up to 1.21 times, and the earlier limit of a factor 64 before integrating
     * four, up to 1.66.
     */
    private double pulseGradient(double x, double t) {
        final double t0 = input.duration();
        if (t <= t0) {
            return response.gradient(x, t, 0.0);
        }
        final double t1 = t - t0;
        if (narrowInTime(x, t1, t)) {
            return integrate(x, t1, t, GRADIENT);
        }
        final boolean early = beforeFront(x, t);
        final double now = early ? response.gradient(x, t, 0.0)
            : -response.complementGradient(x, t);
        final double before = early ? response.gradient(x, t1, 0.0)
            : -response.complementGradient(x, t1);
        final double difference = now - before;
        if (Math.abs(now) + Math.abs(before) <= MAX_ROUTE_LOSS * Math.abs(difference)) {
            return difference;
        }
        if (response instanceof ThirdTypeResponse) {
            final double p3 = pulse(x, t);
            final double p1 = companionPulse(x, t);
            final double diff = p3 - p1;
            if (Math.abs(p3) + Math.abs(p1) <= MAX_ROUTE_LOSS * Math.abs(diff)) {
                return velocity * diff / dispersion;
            }
        } else if (x == 0) {
            return difference;
        }
        return integrateAdaptive(x, t1, t, GRADIENT, 0);
    }

    /** Whether R(t) is below half its steady state and the front has not passed. */
    private boolean beforeFront(double x, double t) {
        return !response.pastHalfSteady(x, t)
            && response.value(x, t, 0.0) <= 0.5 * response.steady(x);
    }

    /**
     * Most cancellation the differences of {@link #pulseGradient} may suffer: each
     * of their terms carries a few ulps, so a factor more than 2 leaves too little margin
     * under max(16, 2κ) when κ is small.
     */
    private static final double MAX_ROUTE_LOSS = 2;

    /**
     * The unit pulse response of the first-type inlet with the same parameters, for the flux
     * inlet's gradient identity (NaN for the first-type inlet itself, which does not use it).
     */
    double companionPulse(double x, double t) {
        return Double.NaN;
    }

    /**
     * The flux-averaged concentration c − (D/v)·∂c/∂x for v &gt; 0, formed for the input's
     * part and the initial concentration's part separately: with Cᵢ near the input's level
     * the two parts' gradients nearly cancel, and the difference of the totals was 1.14
     * times outside max(16, 2κ) ULP. The initial part is Cᵢ·e^{−μt/R}·(1 − R₀ minus D/v
     * times its gradient); the input's part is the plain difference except for a pulse after
     * its end, where behind the pulse's peak ∂c/∂x &gt; 0 and the two terms cancel (where the
     * result was 70 times smaller than c, the difference was 12.8 times outside
     * max(16, 2κ) ULP, each term carrying the error of the exponent e^{−μt/R} in full).
     * There, if they cancel by more than {@link #MAX_ROUTE_LOSS}, the flux-averaged impulse
     * response is integrated over [t − t₀, t] instead (on pieces; not at x = 0, where the
     * first-type impulse response is 0 and the pieces' test is blind).
     */
    final double fluxAveragedWithFlow(double x, double t) {
        final double ratio = dispersion / velocity;
        if (!(x >= 0 && x < Double.POSITIVE_INFINITY && t > 0 && t < Double.POSITIVE_INFINITY)) {
            // t = 0 or invalid input: validated and answered by value and gradient
            return value(x, t) - ratio * gradient(x, t);
        }
        final double fromInput = level == 0 ? 0.0 : level * inputFluxAveraged(x, t, ratio);
        if (initial == 0) {
            return fromInput;
        }
        return fromInput + initial * Math.exp(decayExponent(t))
            * (response.flush(x, t) - ratio * response.flushGradient(x, t));
    }

    /** The input's unit part of {@link #fluxAveragedWithFlow}. */
    private double inputFluxAveraged(double x, double t, double ratio) {
        final double c = inputResponse(x, t, kind == InletInput.Kind.PULSE ? Double.NaN
            : Spread.inverseLength(dispersion, retardation, t));
        final double cx = inputResponseGradient(x, t);
        final double difference = c - ratio * cx;
        if (kind != InletInput.Kind.PULSE || x == 0
            || Math.abs(c) + ratio * Math.abs(cx) <= MAX_ROUTE_LOSS * Math.abs(difference)) {
            return difference;
        }
        final double t1 = t - input.duration();
        return t1 > 0 ? integrateAdaptive(x, t1, t, FLUX_AVERAGED, 0) : difference;
    }

    /** R(t) − R(t − t₀) of this inlet's unit response (a pulse input only). */
    final double unitPulse(double x, double t) {
        return pulse(x, t);
    }

    /**
     * Whether [t₁, t] is narrow for the 10-point rule: t − t₁ ≤ t/4, and the impulse response
     * is smooth there (see {@link #smoothForRule}).
     */
    private boolean narrowInTime(double x, double t1, double t) {
        if (!(t - t1 <= 0.25 * t)) {
            return false;
        }
        return smoothForRule(response.density(x, t1), response.density(x, 0.5 * t1 + 0.5 * t),
            response.density(x, t));
    }

    /**
     * Whether the impulse response, positive at an interval's ends and middle (fa, fm, fb),
     * changes by at most {@link #NARROW_RATIO} and bends by at most {@link #CURVATURE_RATIO}
     * there.
     */
    private static boolean smoothForRule(double fa, double fm, double fb) {
        final double max = Math.max(fa, Math.max(fm, fb));
        final double min = Math.min(fa, Math.min(fm, fb));
        if (!(min > 0 && max <= NARROW_RATIO * min)) {
            return false;
        }
        final double bend = fa / fm * (fb / fm);
        return bend <= CURVATURE_RATIO && bend * CURVATURE_RATIO >= 1;
    }

    /** Deepest subdivision of {@link #integrateAdaptive}; 2⁻⁴⁰ of the interval is far finer
     * than any impulse response needs. */
    private static final int MAX_DEPTH = 40;

    /**
     * ∫ over [a, b] of ∂R/∂t (the impulse response) or of ∂²R/∂x∂t by 10-point
     * Gauss–Legendre on subintervals halved until each is narrow, b − a ≤ b/4, and the
     * impulse response changes by at most a factor e² across it and bends little (see
     * {@link #CURVATURE_RATIO}); a piece where the impulse
     * response is 0 at both ends and the middle (underflow, or x = 0 for the first-type
     * inlet) contributes 0.
     *
     * <p>Why both: the impulse response is analytic in τ except at τ = 0, so on a narrow
     * piece (0 at least seven half-widths from its centre) the rule's error falls like
     * ρ⁻²⁰ with ρ = 7 + √48 ≈ 13.9 (Trefethen 2008, SIAM Review 50, 67–87: Gauss quadrature
     * converges geometrically in the Bernstein ellipse where the integrand is analytic), about
     * 1e−23 relative; the change in the response bounds its growth inside that ellipse. The
     * variation test alone is not enough: at x = 0, where the response varies like τ^(−1/2),
     * one rule over [0.052, 0.23] passes it and is off by 2e−10 relative.
     */
    private double integrateAdaptive(double x, double a, double b, int integrand,
                                     int depth) {
        final double da = response.density(x, a);
        final double dm = response.density(x, 0.5 * a + 0.5 * b);
        final double db = response.density(x, b);
        if (Math.max(da, Math.max(dm, db)) == 0) {
            return 0.0;
        }
        if (depth >= MAX_DEPTH || (b - a <= 0.25 * b && smoothForRule(da, dm, db))) {
            return integrate(x, a, b, integrand);
        }
        final double mid = 0.5 * a + 0.5 * b;
        return integrateAdaptive(x, a, mid, integrand, depth + 1)
            + integrateAdaptive(x, mid, b, integrand, depth + 1);
    }

    /** What {@link #integrate} integrates: the impulse response ∂R/∂t, ... */
    private static final int DENSITY = 0;
    /** ... its x-derivative ∂²R/∂x∂t, ... */
    private static final int GRADIENT = 1;
    /** ... or its flux-averaged form ∂R/∂t − (D/v)·∂²R/∂x∂t. */
    private static final int FLUX_AVERAGED = 2;

    /** ∫ over [t1, t] of the integrand (see {@link #DENSITY}), 10-point Gauss–Legendre. */
    private double integrate(double x, double t1, double t, int integrand) {
        final double m = 0.5 * t1 + 0.5 * t;
        final double h = 0.5 * t - 0.5 * t1;
        if (integrand == DENSITY) {
            return GaussLegendre.integrate(tau -> response.density(x, tau), m, h);
        }
        return GaussLegendre.integrate(integrand == GRADIENT
            ? tau -> response.densityGradient(x, tau)
            : tau -> response.fluxAveragedDensity(x, tau), m, h);
    }
}
