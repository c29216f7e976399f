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
 * eq. 2.6, number recalled). Its integral over x is exp(−μt/R), its centre moves at v/R, and its variance is
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
 * condition number with respect to x, t, x₀, v, D, R and μ (measured: at most 0.3 of that
 * bound, median 1 ULP); far tails underflow to 0 only where the exact value is below half of
 * {@link Double#MIN_VALUE}, and subnormal results are within 4 {@link Double#MIN_VALUE}: near
 * underflow the distance from the moving centre, its square and the decay exponent are
 * carried in double-double.
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
        return scaled(x, frame(s, t), 1.0);
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
        return gradient(x, frame(s, t));
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
        return flux(x, frame(s, t));
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
        final Frame f = frame(s, t);
        // scaled(x, f, 1.0) written out with its constants in locals: the bulk path is the
        // exponential plus four operations
        final double ch = f.ch;
        final double cl = f.cl;
        final double high = s.high;
        final double bulk = f.bulkScale;
        // bulkScale = 0 sends every point to the tail path: the same results, one branch
        final double limit = bulk != 0 ? BULK_EXPONENT : -1;
        for (int i = 0; i < x.length; i++) {
            final double xv = x[i];
            final double xi = (xv - ch) - cl;
            final double qh = xi * xi * high;
            // a NaN or infinite x gives qh = NaN or ∞ and is rejected in tail()
            out[i] = qh < limit ? bulk * Math.exp(-qh) : tail(xv, f, 1.0);
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
        final Frame f = s == null || s.collapsed ? null : frame(s, t);
        for (int i = 0; i < x.length; i++) {
            final double xi = Checks.finite("x", x[i]);
            out[i] = f == null ? 0.0 : gradient(xi, f);
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
        final Frame f = frame(s, t);
        for (int i = 0; i < x.length; i++) {
            out[i] = flux(Checks.finite("x", x[i]), f);
        }
    }

    /**
     * The exponent of the bulk path stays above −BULK_EXPONENT, so the result (at least
     * 1e-40 × e^{−600} ≈ 3e-301 before the factor) is a normal double, far from underflow.
     */
    private static final double BULK_EXPONENT = 600;
    /** The bulk path's multiplier norm·e^{−μt/R} must lie in [BULK_SCALE_MIN, 2³⁰⁰]. */
    private static final double BULK_SCALE_MIN = 1e-40;

    /** The constants of one time: centre and decay in double-double, the spread. */
    private static final class Frame {
        final double ch;
        final double cl;
        final double dh;
        final double dl;
        final Spread s;
        /** norm·exp(−μt/R) for the bulk path, or 0 where that path is not used. */
        final double bulkScale;

        Frame(double[] centre, double[] decay, Spread s) {
            this.ch = centre[0];
            this.cl = centre[1];
            this.dh = decay[0];
            this.dl = decay[1];
            this.s = s;
            final double scale = s.norm * Math.exp(dh);
            this.bulkScale = scale >= BULK_SCALE_MIN && scale <= 0x1.0p300 ? scale : 0.0;
        }
    }

    private Frame frame(Spread s, double t) {
        return new Frame(Spread.centre(source, velocity, retardation, t),
            Spread.decay(decayRate, retardation, t), s);
    }

    /**
     * Returns factor × G at x. The factor enters the multiplier of the exponential, so that a
     * gradient or flux that is a normal double is never formed from a subnormal G.
     *
     * <p>Two paths. In the bulk (exponent above −600, result far above the subnormal range)
     * the exponent q = ξ²R/(4Dt) is formed in plain double: its few roundings move G by a
     * few units of q·2⁻⁵³, inside the contract's 2κ ULP since κ ≥ 2q + 3|q − ½| (x, x₀, v, t
     * and D, t, R contribute), and this path costs little more than the exponential itself.
     * In the far tail, where G approaches the subnormal range and must stay within a few
     * MIN_VALUE, ξ, its square and the decay are carried exactly in double-double (Spread).
     */
    private static double scaled(double x, Frame f, double factor) {
        final Spread s = f.s;
        final double xi = (x - f.ch) - f.cl;
        final double p = xi * xi;
        final double qh = p * s.high;
        if (qh < BULK_EXPONENT && f.bulkScale != 0) {
            return factor * f.bulkScale * Math.exp(-qh);
        }
        return tail(x, f, factor);
    }

    /** The far-tail path of {@link #scaled}, kept out of line so the bulk path inlines. */
    private static double tail(double x, Frame f, double factor) {
        Checks.finite("x", x);
        final Spread s = f.s;
        final double qh = s.exponentHigh(x, f.ch, f.cl);
        return ScaledExp.valueOfSplit(s.norm * factor, f.dh, qh,
            s.exponentLow(x, f.ch, f.cl, qh) - f.dl);
    }

    private static double gradient(double x, Frame f) {
        // ∂G/∂x = −2ξ·R/(4Dt)·G
        return scaled(x, f, -2 * ((x - f.ch) - f.cl) * f.s.high);
    }

    private double flux(double x, Frame f) {
        // v·G − D·∂G/∂x = G·(v + 2D·ξ·R/(4Dt))
        return scaled(x, f, velocity + 2 * dispersion * ((x - f.ch) - f.cl) * f.s.high);
    }

    /** Returns the spread at t, or null at t = 0; validates t. */
    private Spread spread(double t) {
        Checks.nonNegative("t", t);
        return t == 0 ? null : Spread.of(dispersion, retardation, t);
    }

    private double centre(double t) {
        return Spread.centre(source, velocity, retardation, t)[0];
    }


    private static void checkArrays(double[] x, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
    }
}
