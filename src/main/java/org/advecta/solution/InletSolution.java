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
     * the difference of the complements R(∞) − R, or, where that would lose more than one
     * bit, quadrature of the impulse response on pieces (cheaper forms first). The direct
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
                return integrate(x, t1, t, false);
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
     * The pulse from the complements, R(∞) − R(t − t₀) minus R(∞) − R(t), unless that would
     * lose more than one bit, where the impulse response is integrated instead (on pieces, so
     * also where the interval is not narrow or reaches x = 0: the flux inlet's pulse at the
     * inlet was 24 ULP off, 1.3 times max(16, 2κ), from complements that cancel 8-fold).
     */
    private double afterFront(double x, double t1, double t) {
        final double before = response.complement(x, t1);
        final double after = response.complement(x, t);
        if (before - after >= 0.5 * before) {
            return before - after;
        }
        return integrateAdaptive(x, t1, t, false, 0);
    }

    private double pulseGradient(double x, double t) {
        final double t0 = input.duration();
        if (t <= t0) {
            return response.gradient(x, t, 0.0);
        }
        final double t1 = t - t0;
        if (response instanceof ThirdTypeResponse) {
            return fluxInletPulseGradient(x, t1, t);
        }
        if (narrowInTime(x, t1, t)) {
            return integrate(x, t1, t, true);
        }
        return shiftedGradientDifference(x, t1, t);
    }

    /**
     * ∂R/∂x(t) − ∂R/∂x(t₁): before the front the gradients themselves, after it through the
     * complements, whose gradients do not hold the steady state's (the same difference).
     */
    private double shiftedGradientDifference(double x, double t1, double t) {
        if (beforeFront(x, t)) {
            return response.gradient(x, t, 0.0) - response.gradient(x, t1, 0.0);
        }
        return response.complementGradient(x, t1) - response.complementGradient(x, t);
    }

    /** Whether R(t) is below half its steady state and the front has not passed. */
    private boolean beforeFront(double x, double t) {
        return !response.pastHalfSteady(x, t)
            && response.value(x, t, 0.0) <= 0.5 * response.steady(x);
    }

    /**
     * The flux inlet's pulse gradient. Near the inlet the routes of the first-type inlet
     * cancel: the step gradients at both times are near −(v/D)(1 − c), the impulse response's
     * gradient changes sign in τ and is itself small beside its terms, and under strong
     * decay the complements' gradients are near each other. What does not cancel there is
     * ∂P₃/∂x = (v/D)·(P₃ − P₁), P₁ the first-type inlet's pulse with the same data (the flux
     * v·P₃ − D·∂P₃/∂x solves the same equation, is 0 at t = 0 and v·g(t) at x = 0, so it is
     * v·P₁: Kreft &amp; Zuber 1978; Parker &amp; van Genuchten 1984), with both pulses within
     * their contracts. So, of that identity and the difference of the shifted gradients (of
     * the complements' gradients after the front, in closed form from the same identity
     * under strong decay, see ThirdTypeResponse), the one whose terms cancel less, while that
     * is at most a factor {@link #MAX_ROUTE_LOSS}; else the impulse response's gradient
     * integrated over a narrow [t₁, t] where it keeps one sign, else on pieces. Checked
     * against mpmath on a grid of 25 200 points and 2 000 random ones (gen_pulse_decay.py):
     * five gradients outside max(16, 2κ) ULP, at most 2.94 times it (ThirdTypeInlet states
     * the exception); taking the identity first, or the integral before the differences,
     * left 85 to 172 points outside, up to 12 times.
     */
    private double fluxInletPulseGradient(double x, double t1, double t) {
        final double p3 = pulse(x, t);
        final double p1 = companionPulse(x, t);
        final double diff = p3 - p1;
        final double identityLoss = (Math.abs(p3) + Math.abs(p1)) / Math.abs(diff);
        final boolean early = beforeFront(x, t);
        final double now = early ? response.gradient(x, t, 0.0)
            : -response.complementGradient(x, t);
        final double before = early ? response.gradient(x, t1, 0.0)
            : -response.complementGradient(x, t1);
        final double g = now - before;
        final double timeLoss = (Math.abs(now) + Math.abs(before)) / Math.abs(g);
        final boolean identityOk = identityLoss <= MAX_ROUTE_LOSS;
        final boolean timeOk = timeLoss <= MAX_ROUTE_LOSS;
        if (identityOk && !(timeOk && timeLoss < identityLoss)) {
            return velocity * diff / dispersion;
        }
        if (timeOk) {
            return g;
        }
        if (narrowInTime(x, t1, t) && gradientOneSigned(x, t1, t)) {
            return integrate(x, t1, t, true);
        }
        return integrateAdaptive(x, t1, t, true, 0);
    }

    /** Whether the impulse response's gradient has one sign at t₁, the middle and t. */
    private boolean gradientOneSigned(double x, double t1, double t) {
        final double a = response.densityGradient(x, t1);
        final double b = response.densityGradient(x, 0.5 * t1 + 0.5 * t);
        final double c = response.densityGradient(x, t);
        return (a > 0 && b > 0 && c > 0) || (a < 0 && b < 0 && c < 0);
    }

    /** Most cancellation the routes of {@link #fluxInletPulseGradient} may suffer. */
    private static final double MAX_ROUTE_LOSS = 64;

    /**
     * The unit pulse response of the first-type inlet with the same parameters, for the flux
     * inlet's gradient identity (NaN for the first-type inlet itself, which does not use it).
     */
    double companionPulse(double x, double t) {
        return Double.NaN;
    }

    /** R(t) − R(t − t₀) of this inlet's unit response (a pulse input only). */
    final double unitPulse(double x, double t) {
        return pulse(x, t);
    }

    private boolean narrowInTime(double x, double t1, double t) {
        if (!(t - t1 <= 0.25 * t)) {
            return false;
        }
        final double a = response.density(x, t1);
        final double b = response.density(x, 0.5 * t1 + 0.5 * t);
        final double c = response.density(x, t);
        final double max = Math.max(a, Math.max(b, c));
        final double min = Math.min(a, Math.min(b, c));
        return min > 0 && max <= NARROW_RATIO * min;
    }

    /** Deepest subdivision of {@link #integrateAdaptive}; 2⁻⁴⁰ of the interval is far finer
     * than any impulse response needs. */
    private static final int MAX_DEPTH = 40;

    /**
     * ∫ over [a, b] of ∂R/∂t (the impulse response) or of ∂²R/∂x∂t by 10-point
     * Gauss–Legendre on subintervals halved until each is narrow, b − a ≤ b/4, and the
     * impulse response changes by at most a factor e² across it; a piece where the impulse
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
    private double integrateAdaptive(double x, double a, double b, boolean gradient,
                                     int depth) {
        final double da = response.density(x, a);
        final double dm = response.density(x, 0.5 * a + 0.5 * b);
        final double db = response.density(x, b);
        final double max = Math.max(da, Math.max(dm, db));
        final double min = Math.min(da, Math.min(dm, db));
        if (max == 0) {
            return 0.0;
        }
        if (depth >= MAX_DEPTH || (min > 0 && max <= NARROW_RATIO * min && b - a <= 0.25 * b)) {
            return integrate(x, a, b, gradient);
        }
        final double mid = 0.5 * a + 0.5 * b;
        return integrateAdaptive(x, a, mid, gradient, depth + 1)
            + integrateAdaptive(x, mid, b, gradient, depth + 1);
    }

    /** ∫ over [t1, t] of the impulse response (or its x-derivative), 10-point Gauss–Legendre. */
    private double integrate(double x, double t1, double t, boolean gradient) {
        return GaussLegendre.integrate(gradient ? tau -> response.densityGradient(x, tau)
            : tau -> response.density(x, tau), 0.5 * t1 + 0.5 * t, 0.5 * t - 0.5 * t1);
    }
}
