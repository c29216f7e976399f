package org.advecta.moments;

import java.util.Locale;
import org.advecta.internal.Checks;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * The zeroth moment (mass), mean and variance of a concentration curve: temporal moments of a
 * breakthrough curve c(t) at a fixed x, or spatial moments of a profile c(x) at a fixed t.
 * Immutable and thread-safe.
 *
 * <pre>
 * m₀ = ∫ c ds,    mean = ∫ s·c ds / m₀,    variance = ∫ (s − mean)²·c ds / m₀
 * </pre>
 *
 * <p><b>Analytic temporal moments</b> ({@link #breakthrough(Solution1D, double, boolean)}) of
 * the inlet families with a clean initial state: the Laplace transform of the response at x
 * is the input's transform G(s) times a transfer function H(s), and the cumulants (mean,
 * variance) of a product add. With w(s) = √(v² + 4D(Rs + μ)) and u = w(0) = √(v² + 4μD):
 * <pre>
 * first-type inlet, resident c (= flux-averaged c of the third-type inlet):
 *   H = exp(x(v − w)/(2D))          m₀ = e^{x(v−u)/(2D)},  mean = Rx/u,
 *                                   variance = 2DR²x/u³
 * third-type inlet, resident c:
 *   H = 2v/(v + w)·exp(x(v − w)/(2D))
 *     m₀ factor 2v/(v + u),  mean += 2DR/(u(v + u)),
 *     variance += 4D²R²/(u³(v + u)) + 4D²R²/(u²(v + u)²)
 * input: pulse C₀ on (0, t₀]:  m₀ = C₀t₀, mean t₀/2, variance t₀²/12
 *        C₀·e^{−λt}, λ &gt; 0:   m₀ = C₀/λ,  mean 1/λ,  variance 1/λ²
 * </pre>
 * For μ = 0 these are the classical relations mean = Rx/v, variance = 2DR²x/v³ of the
 * flux-averaged Dirac response (Kreft &amp; Zuber 1978, Chem. Eng. Sci. 33, 1471–1480) and
 * mean = R(x/v + D/v²), variance = 2DR²x/v³ + 3D²R²/v⁴ of the resident response to a flux
 * inlet (the method of moments from the Laplace-domain solution, e.g. Valocchi 1985, Water
 * Resour. Res. 21(6), 808–820; the equations are recalled from memory and were re-derived
 * here from H(s)). The tests check every formula against numerical integration of the
 * library's own solutions.
 *
 * <p><b>Analytic spatial moments</b> ({@link #profile(Solution1D, double)}) of the Gaussian
 * and slug families: the free-space kernel is a Gaussian of variance 2Dt/R centred at vt/R,
 * and the variances of convolved distributions add (Crank 1975, §2.2):
 * <pre>
 * Gaussian: m₀ = M·e^{−μt/R}, mean = x_c + vt/R, variance = s₀² + 2Dt/R
 * slug:     m₀ = C₀(b − a)·e^{−μt/R}, mean = (a + b)/2 + vt/R, variance = (b − a)²/12 + 2Dt/R
 * </pre>
 *
 * <p><b>Moments of data</b> ({@link #ofSamples(double[], double[])}): those of the
 * piecewise-linear interpolant of the samples over the sampled range (the trapezoidal rule,
 * exact for it), with the variance formed about the mean in a second pass so that it does not
 * cancel. A truncated curve gives the moments of the truncated curve.
 */
public final class Moments {

    private final double mass;
    private final double mean;
    private final double variance;

    private Moments(double mass, double mean, double variance) {
        this.mass = mass;
        this.mean = mean;
        this.variance = variance;
    }

    /**
     * Returns the moments of sampled data, c at sample points s (times or positions).
     *
     * @param s the sample points, finite and strictly increasing, at least three; not
     *     modified
     * @param c the concentrations, finite, as many; not modified
     * @return the moments of the piecewise-linear interpolant
     * @throws IllegalArgumentException if an array is invalid or the zeroth moment is not
     *     positive (e.g. an all-zero curve)
     */
    public static Moments ofSamples(double[] s, double[] c) {
        Checks.length("s", s, 3);
        if (c == null || c.length != s.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "c: needs %d elements (as s), got %s", s.length,
                c == null ? "null" : Integer.toString(c.length)));
        }
        for (int i = 0; i < s.length; i++) {
            Checks.finite("s[" + i + "]", s[i]);
            Checks.finite("c[" + i + "]", c[i]);
            if (i > 0 && !(s[i] > s[i - 1])) {
                throw Checks.fail("s[" + i + "]", s[i],
                    "sample points must increase strictly, previous " + s[i - 1]);
            }
        }
        // exact moments of the piecewise-linear interpolant: on [s_i, s_{i+1}] with c linear,
        // ∫ c = h(c_i + c_{i+1})/2, ∫ (s − a)c = h/6·((2y_i + y_{i+1})c_i + (y_i + 2y_{i+1})c_{i+1})
        // with y = s − a, and ∫ (s − a)²c from the same Simpson-exact form.
        double m0 = 0;
        double m1 = 0;
        final double origin = s[0];
        for (int i = 0; i + 1 < s.length; i++) {
            final double h = s[i + 1] - s[i];
            final double y0 = s[i] - origin;
            final double y1 = s[i + 1] - origin;
            m0 += 0.5 * h * (c[i] + c[i + 1]);
            m1 += h / 6 * ((2 * y0 + y1) * c[i] + (y0 + 2 * y1) * c[i + 1]);
        }
        if (!(m0 > 0) || !Double.isFinite(m0)) {
            throw Checks.fail("m0", m0, "the curve's zeroth moment must be finite and > 0"
                + " (an all-zero or negative curve has no mean)");
        }
        final double mean = m1 / m0;
        double m2 = 0;
        for (int i = 0; i + 1 < s.length; i++) {
            final double h = s[i + 1] - s[i];
            final double y0 = s[i] - origin - mean;
            final double y1 = s[i + 1] - origin - mean;
            // ∫ y²·c over a linear piece, y and c both linear: h/12·(c0(3y0² + 2y0y1 + y1²)
            // + c1(y0² + 2y0y1 + 3y1²))
            m2 += h / 12 * (c[i] * (3 * y0 * y0 + 2 * y0 * y1 + y1 * y1)
                + c[i + 1] * (y0 * y0 + 2 * y0 * y1 + 3 * y1 * y1));
        }
        return new Moments(m0, origin + mean, m2 / m0);
    }

    /**
     * Returns the analytic temporal moments of the breakthrough curve at x of an inlet
     * solution with a clean initial state (see the class description for the formulas).
     *
     * @param solution a {@link FirstTypeInlet} or {@link ThirdTypeInlet} with Cᵢ = 0, v &gt; 0,
     *     and a pulse or a decaying exponential (λ &gt; 0) input (a constant input has no
     *     finite zeroth moment)
     * @param x position, finite and &gt; 0
     * @param fluxAveraged true for the flux-averaged concentration (available for the
     *     third-type inlet, where it equals the first-type resident concentration)
     * @return m₀ (concentration × time), mean arrival time, temporal variance
     * @throws IllegalArgumentException if the solution is of another kind, or an argument is
     *     invalid
     */
    public static Moments breakthrough(Solution1D solution, double x, boolean fluxAveraged) {
        if (solution == null) {
            throw new IllegalArgumentException("solution: must not be null");
        }
        Checks.positive("x", x);
        final InletInput input;
        final double initial;
        final boolean third;
        if (solution instanceof FirstTypeInlet) {
            final FirstTypeInlet s = (FirstTypeInlet) solution;
            input = s.input();
            initial = s.initialConcentration();
            third = false;
            if (fluxAveraged) {
                throw new IllegalArgumentException("fluxAveraged: the flux-averaged"
                    + " concentration of a first-type inlet has no moments here (use the"
                    + " resident concentration)");
            }
        } else if (solution instanceof ThirdTypeInlet) {
            final ThirdTypeInlet s = (ThirdTypeInlet) solution;
            input = s.input();
            initial = s.initialConcentration();
            third = !fluxAveraged;
        } else {
            throw new IllegalArgumentException("solution: analytic temporal moments need a"
                + " FirstTypeInlet or ThirdTypeInlet, got " + solution.getClass().getName());
        }
        if (initial != 0) {
            throw Checks.fail("ci", initial, "must be 0 (a background has infinite mass)");
        }
        final TransportParameters p = solution.parameters();
        final double v = p.velocity();
        if (!(v > 0)) {
            throw Checks.fail("v", v, "must be > 0 for temporal moments at x > 0");
        }
        final double d = p.dispersion();
        final double r = p.retardation();
        final double u = Math.sqrt(Math.fma(4 * p.decayRate(), d, v * v));
        // the transfer function H(s) = exp(x(v − w)/(2D))
        double mass = Math.exp(-x * (2 * p.decayRate()) / (v + u)); // x(v − u)/(2D), stable
        double mean = r * x / u;
        double variance = 2 * d * r * r * x / (u * u * u);
        if (third) {
            mass *= 2 * v / (v + u);
            mean += 2 * d * r / (u * (v + u));
            final double k = 4 * d * d * r * r;
            variance += k / (u * u * u * (v + u)) + k / (u * u * (v + u) * (v + u));
        }
        switch (input.kind()) {
            case PULSE: {
                final double t0 = input.duration();
                return new Moments(mass * input.level() * t0, mean + 0.5 * t0,
                    variance + t0 * t0 / 12);
            }
            case EXPONENTIAL: {
                final double lambda = input.rate();
                if (!(lambda > 0)) {
                    throw Checks.fail("lambda", lambda,
                        "must be > 0 for a finite zeroth moment");
                }
                return new Moments(mass * input.level() / lambda, mean + 1 / lambda,
                    variance + 1 / (lambda * lambda));
            }
            default:
                throw new IllegalArgumentException("input: a constant input has no finite"
                    + " zeroth moment (use a pulse)");
        }
    }

    /**
     * Returns the analytic spatial moments at time t of a Gaussian or slug initial plume (see
     * the class description).
     *
     * @param solution an {@link InitialGaussian} or {@link InitialSlug}
     * @param t time, finite and ≥ 0
     * @return m₀ (concentration × length), centre of mass, spatial variance
     * @throws IllegalArgumentException if the solution is of another kind or t is invalid
     */
    public static Moments profile(Solution1D solution, double t) {
        if (solution == null) {
            throw new IllegalArgumentException("solution: must not be null");
        }
        Checks.nonNegative("t", t);
        final TransportParameters p = solution.parameters();
        final double r = p.retardation();
        final double spread = 2 * p.dispersion() * t / r;
        final double decay = Math.exp(-p.decayRate() / r * t);
        final double shift = p.velocity() / r * t;
        if (solution instanceof InitialGaussian) {
            final InitialGaussian g = (InitialGaussian) solution;
            return new Moments(g.mass() * decay, g.centre() + shift,
                g.width() * g.width() + spread);
        }
        if (solution instanceof InitialSlug) {
            final InitialSlug s = (InitialSlug) solution;
            final double w = s.right() - s.left();
            return new Moments(s.concentration() * w * decay,
                0.5 * s.left() + 0.5 * s.right() + shift, w * w / 12 + spread);
        }
        throw new IllegalArgumentException("solution: analytic spatial moments need an"
            + " InitialGaussian or InitialSlug, got " + solution.getClass().getName());
    }

    /**
     * Returns the zeroth moment m₀ = ∫ c ds.
     *
     * @return the mass (concentration × time or × length)
     */
    public double mass() {
        return mass;
    }

    /**
     * Returns the mean ∫ s·c ds / m₀ (mean arrival time, or centre of mass).
     *
     * @return the mean
     */
    public double mean() {
        return mean;
    }

    /**
     * Returns the central second moment ∫ (s − mean)²·c ds / m₀.
     *
     * @return the variance
     */
    public double variance() {
        return variance;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Moments[mass=%s, mean=%s, variance=%s]", mass, mean,
            variance);
    }
}
