package org.advecta.kernel;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.internal.ScaledExp;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c} on the infinite line:
 * the concentration after an instantaneous release at x₀ and t = 0 whose initial
 * concentration is the unit Dirac delta δ(x − x₀). Immutable and thread-safe.
 *
 * <pre>
 * G(x, t) = exp(−μt/R) / √(4π D t / R) · exp(−(x − x₀ − v t / R)² · R / (4 D t))
 * </pre>
 *
 * <p>The substitution y = x − vt/R turns the equation into the heat equation with diffusivity
 * D/R, whose fundamental solution is the Gaussian above (Carslaw &amp; Jaeger 1959,
 * <i>Conduction of Heat in Solids</i>, §10.2; Crank 1975, <i>The Mathematics of Diffusion</i>,
 * eq. 2.6). Its integral over x is exp(−μt/R), its centre moves at v/R, and its variance is
 * 2Dt/R. Multiply by the released mass per unit cross-section divided by the mobile-phase
 * capacity (e.g. M/(θA)) to obtain a concentration.
 *
 * <p><b>Time.</b> t must be finite and ≥ 0. At t = 0 every method returns the limit t → 0⁺ at
 * fixed x: value and gradient 0 away from x₀; at x = x₀ the value is +∞ (the delta), the
 * gradient 0 (by symmetry) and the flux v·∞ (0 when v = 0). The same limit, about the
 * centre x₀ + vt/R, is returned when 4Dt/R is below 2⁻⁶⁰⁰ ≈ 2.4e-181, a spread far below any
 * length that matters. Times t &lt; 0 are rejected: the kernel is
 * defined from the release on.
 *
 * <p><b>Accuracy.</b> value, gradient and flux are within max(16, 2κ) ULP of the exact result
 * at the exact double arguments wherever it is a normal double, where κ is the componentwise
 * condition number with respect to x, t, x₀, v, D, R and μ; far tails underflow to 0 only
 * where the exact value is below half of {@link Double#MIN_VALUE}, and subnormal results are
 * within a few {@link Double#MIN_VALUE}. The exponent is carried in double-double precision
 * (see the internal Spread class).
 *
 * <p><b>Arrays.</b> The batch methods read {@code x[i]} before writing {@code out[i]}, so
 * {@code out} may be the same array as {@code x}; no other array is modified, and nothing is
 * allocated per point.
 */
public final class FreeSpaceKernel1D {

    private final double source;
    private final double velocity;
    private final double dispersion;
    private final double retardation;
    private final double decayRate;

    private FreeSpaceKernel1D(TransportParameters p, double source) {
        this.source = source;
        this.velocity = p.velocity();
        this.dispersion = p.dispersion();
        this.retardation = p.retardation();
        this.decayRate = p.decayRate();
    }

    /**
     * Returns the kernel of a unit release at x₀.
     *
     * @param parameters the transport parameters (D is the longitudinal dispersion)
     * @param x0 the release point, finite
     * @return the kernel
     * @throws IllegalArgumentException if x₀ is not finite or parameters is null
     */
    public static FreeSpaceKernel1D of(TransportParameters parameters, double x0) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        return new FreeSpaceKernel1D(parameters, Checks.finite("x0", x0));
    }

    /**
     * Returns the release point x₀.
     *
     * @return x₀
     */
    public double source() {
        return source;
    }

    /**
     * Returns G(x, t).
     *
     * @param x position, finite
     * @param t time since the release, finite and ≥ 0
     * @return the concentration per unit released initial concentration integral
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double value(double x, double t) {
        Checks.finite("x", x);
        final Spread s = spread(t);
        if (s == null || s.collapsed) {
            return x == centre(t) ? Double.POSITIVE_INFINITY : 0.0;
        }
        final double[] c = Spread.centre(source, velocity, retardation, t);
        return scaled(x, c[0], c[1], s, decay(t), 1.0);
    }

    /**
     * Returns the gradient ∂G/∂x at (x, t) = −2ξ·R/(4Dt)·G with ξ = x − x₀ − vt/R.
     *
     * @param x position, finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂G/∂x
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double gradient(double x, double t) {
        Checks.finite("x", x);
        final Spread s = spread(t);
        if (s == null || s.collapsed) {
            return 0.0;
        }
        final double[] c = Spread.centre(source, velocity, retardation, t);
        return gradient(x, c[0], c[1], s, decay(t));
    }

    /**
     * Returns the total (advective plus dispersive) flux v·G − D·∂G/∂x at (x, t).
     *
     * @param x position, finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along x
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double flux(double x, double t) {
        Checks.finite("x", x);
        final Spread s = spread(t);
        if (s == null || s.collapsed) {
            return x == centre(t) && velocity != 0 ? velocity * Double.POSITIVE_INFINITY : 0.0;
        }
        final double[] c = Spread.centre(source, velocity, retardation, t);
        return flux(x, c[0], c[1], s, decay(t));
    }

    /**
     * Evaluates G at every x[i] at one time: {@code out[i] = value(x[i], t)}.
     *
     * @param x positions, each finite; not modified (unless it is also {@code out})
     * @param t time since the release, finite and ≥ 0
     * @param out receives the values; at least as long as x; may be x itself
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void value(double[] x, double t, double[] out) {
        checkArrays(x, out);
        final Spread s = spread(t);
        if (s == null || s.collapsed) {
            for (int i = 0; i < x.length; i++) {
                out[i] = value(x[i], t);
            }
            return;
        }
        final double[] c = Spread.centre(source, velocity, retardation, t);
        final double ch = c[0];
        final double cl = c[1];
        final double[] decay = decay(t);
        final double dh = decay[0];
        final double dl = decay[1];
        final double norm = s.norm;
        for (int i = 0; i < x.length; i++) {
            final double xi = Checks.finite("x", x[i]);
            final double qh = s.exponentHigh(xi, ch, cl);
            out[i] = ScaledExp.valueOfSplit(norm, dh, qh, s.exponentLow(xi, ch, cl, qh) - dl);
        }
    }

    /**
     * Evaluates ∂G/∂x at every x[i] at one time.
     *
     * @param x positions, each finite; not modified (unless it is also {@code out})
     * @param t time since the release, finite and ≥ 0
     * @param out receives the gradients; at least as long as x; may be x itself
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void gradient(double[] x, double t, double[] out) {
        checkArrays(x, out);
        final Spread s = spread(t);
        final double[] c = Spread.centre(source, velocity, retardation, t);
        final double[] decay = decay(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = Checks.finite("x", x[i]);
            out[i] = s == null || s.collapsed ? 0.0 : gradient(xi, c[0], c[1], s, decay);
        }
    }

    /**
     * Evaluates the total flux v·G − D·∂G/∂x at every x[i] at one time.
     *
     * @param x positions, each finite; not modified (unless it is also {@code out})
     * @param t time since the release, finite and ≥ 0
     * @param out receives the fluxes; at least as long as x; may be x itself
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void flux(double[] x, double t, double[] out) {
        checkArrays(x, out);
        final Spread s = spread(t);
        if (s == null || s.collapsed) {
            for (int i = 0; i < x.length; i++) {
                out[i] = flux(x[i], t);
            }
            return;
        }
        final double[] c = Spread.centre(source, velocity, retardation, t);
        final double[] decay = decay(t);
        for (int i = 0; i < x.length; i++) {
            out[i] = flux(Checks.finite("x", x[i]), c[0], c[1], s, decay);
        }
    }

    /**
     * Returns factor × G at x, for the centre ch + cl. The factor enters the multiplier of the
     * exponential, so that a gradient or flux that is a normal double is not formed from a
     * subnormal G; the distance x − centre is carried in double-double.
     */
    private static double scaled(double x, double ch, double cl, Spread s, double[] decay,
                                 double factor) {
        final double qh = s.exponentHigh(x, ch, cl);
        return ScaledExp.valueOfSplit(s.norm * factor, decay[0], qh,
            s.exponentLow(x, ch, cl, qh) - decay[1]);
    }

    private static double gradient(double x, double ch, double cl, Spread s, double[] decay) {
        // ∂G/∂x = −2ξ·R/(4Dt)·G
        return scaled(x, ch, cl, s, decay, -2 * ((x - ch) - cl) * s.high);
    }

    private double flux(double x, double ch, double cl, Spread s, double[] decay) {
        // v·G − D·∂G/∂x = G·(v + 2D·ξ·R/(4Dt))
        return scaled(x, ch, cl, s, decay, velocity + 2 * dispersion * ((x - ch) - cl) * s.high);
    }

    /** Returns the spread at t, or null at t = 0; validates t. */
    private Spread spread(double t) {
        Checks.nonNegative("t", t);
        return t == 0 ? null : Spread.of(dispersion, retardation, t);
    }

    private double centre(double t) {
        return Spread.centre(source, velocity, retardation, t)[0];
    }

    /** −μt/R in double-double. */
    private double[] decay(double t) {
        return Spread.decay(decayRate, retardation, t);
    }

    private static void checkArrays(double[] x, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
    }
}
