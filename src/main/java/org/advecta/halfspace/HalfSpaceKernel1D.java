package org.advecta.halfspace;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.internal.Spread;
import org.advecta.special.ErrorFunctions;
import org.advecta.special.ExpErfc;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c} on the half-line
 * x ≥ 0 with a {@link Wall} at x = 0: the concentration after an instantaneous release
 * δ(x − ξ) at distance ξ &gt; 0 from the wall, the flow v (either sign) normal to the wall.
 * Immutable and thread-safe.
 *
 * <p>With the free-space kernel G(x, t; ξ) = e^{−μt/R}/√(4πDt/R)·exp(−(x − ξ − vt/R)²R/(4Dt))
 * ({@link org.advecta.kernel.FreeSpaceKernel1D}) and its image
 * I = e^{−vξ/D}·G(x, t; −ξ) = e^{−xξR/(Dt)}·G(x, t; ξ):
 * <pre>
 * absorbing wall, c(0, t) = 0:             c = G − I = G·(1 − e^{−xξR/(Dt)})
 * zero-flux wall, v c − D ∂c/∂x = 0:       c = G + I − (v/(2D))·e^{vx/D − μt/R}·erfc(B)
 *                                          B = (x + ξ + vt/R)/√(4Dt/R)
 * </pre>
 *
 * <p><b>Derivation.</b> The substitution c = exp(vx/(2D) − v²t/(4DR) − μt/R)·w turns the
 * equation into the heat equation R w_t = D w_xx with the initial data e^{−vξ/(2D)}δ(x − ξ).
 * The absorbing wall keeps w(0, t) = 0 and the zero-flux wall becomes the radiation condition
 * w_x = (v/(2D))·w at x = 0. The heat equation's Green's functions for these walls are the
 * mirror image with the opposite sign (Carslaw &amp; Jaeger 1959, <i>Conduction of Heat in
 * Solids</i>, §10.10 (section number recalled)) and, for the radiation condition,
 * g(x − ξ) + g(x + ξ) − 2h∫₀^∞ e^{−hη} g(x + ξ + η) dη with h = v/(2D) (Carslaw &amp;
 * Jaeger §14.2, eq. (1) there, number recalled). Transforming back, the exponential factor
 * evaluated at the image point −ξ leaves the image the weight e^{−vξ/D}, and the integral is
 * ½·exp(h(x + ξ) + v²t/(4DR))·erfc(B), which gives the erfc term. The key identity for
 * evaluation is I/G = exp(−xξR/(Dt)), independent of v.
 *
 * <p><b>Evaluation.</b> Every quantity is written as G times a bracket of non-negative terms
 * (plus, for a zero-flux wall with flow towards it, v &lt; 0, the positive erfc term as its
 * own overflow-free product exp(vx/D − μt/R − B²)·erfcx(B)). For the zero-flux wall with
 * v ≥ 0 the erfc term and the image combine, with φ(s) = 1/√π − s·erfcx(s) &gt; 0,
 * P = vt/(RL), α = (x + ξ)/L, into I·2√π·[φ(B) + α·erfcx(B)] ≥ 0 (B = α + P), so the
 * result is the absorbing one plus a positive term and never suffers the cancellation of the
 * published form, which at high Péclet loses all digits near the wall.
 *
 * <p><b>Mass.</b> With the unit release (∫c dx = 1 at t = 0), the fraction of the released
 * mass still in the domain is {@link #massInDomain(double)}, the fraction that has left
 * through the wall is {@link #massOut(double)}, and the rest has decayed. At the zero-flux
 * wall nothing leaves and the mass in the domain is e^{−μt/R}.
 *
 * <p><b>Time.</b> At t = 0 (and when 4Dt/R is below 2⁻⁶⁰⁰) value, gradient and flux are the
 * t → 0⁺ limit at fixed x: 0 away from the release point, +∞ (value) at it.
 *
 * <p><b>Accuracy.</b> value, gradient, flux, wall flux, mass in the domain and mass out are
 * within max(16, 2κ) ULP of the exact result at the exact double arguments wherever it is a
 * normal double, κ the componentwise condition number with respect to x, t, ξ, v, D, R and μ
 * (enforced by the reference fixtures in the tests); no NaN or infinity for valid input.
 *
 * <p><b>Arrays.</b> The batch method reads {@code x[i]} before writing {@code out[i]}, so
 * {@code out} may be {@code x}; nothing is allocated per point.
 */
public final class HalfSpaceKernel1D {

    private static final double SQRT_PI = Math.sqrt(Math.PI);
    private static final double TWO_SQRT_PI = 2 * SQRT_PI;

    private final Wall wall;
    private final double xi;
    private final double velocity;
    private final double dispersion;
    private final double retardation;
    private final double decayRate;
    /** u = √(v² + 4μD). */
    private final double u;
    /** u + v, without cancellation. */
    private final double uPlusV;
    /** u − v, without cancellation. */
    private final double uMinusV;

    private HalfSpaceKernel1D(TransportParameters p, Wall wall, double xi) {
        this.wall = wall;
        this.xi = xi;
        this.velocity = p.velocity();
        this.dispersion = p.dispersion();
        this.retardation = p.retardation();
        this.decayRate = p.decayRate();
        final double v = velocity;
        this.u = Math.sqrt(Math.fma(4 * decayRate, dispersion, v * v));
        if (decayRate == 0) {
            this.uPlusV = v >= 0 ? 2 * v : 0.0;
            this.uMinusV = v >= 0 ? 0.0 : -2 * v;
        } else if (v >= 0) {
            // (u − v)(u + v) = 4μD
            this.uPlusV = u + v;
            this.uMinusV = 4 * decayRate * dispersion / uPlusV;
        } else {
            this.uMinusV = u - v;
            this.uPlusV = 4 * decayRate * dispersion / uMinusV;
        }
    }

    /**
     * Returns the kernel of a unit release at distance ξ from the wall x = 0.
     *
     * @param parameters v (along x; &lt; 0 flows towards the wall), D, R, μ
     * @param wall the wall condition
     * @param xi the release point ξ, finite and &gt; 0
     * @return the kernel
     * @throws IllegalArgumentException if an argument is null or ξ is not finite and &gt; 0
     */
    public static HalfSpaceKernel1D of(TransportParameters parameters, Wall wall, double xi) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (wall == null) {
            throw new IllegalArgumentException("wall: must not be null");
        }
        return new HalfSpaceKernel1D(parameters, wall, Checks.positive("xi", xi));
    }

    /**
     * Returns the wall condition.
     *
     * @return the wall
     */
    public Wall wall() {
        return wall;
    }

    /**
     * Returns the release point ξ.
     *
     * @return ξ
     */
    public double source() {
        return xi;
    }

    /**
     * Returns c(x, t) (formula in the class description).
     *
     * @param x position, finite and ≥ 0
     * @param t time since the release, finite and ≥ 0
     * @return the concentration per unit released
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double value(double x, double t) {
        checkX(x);
        final Frame f = frame(t);
        if (f.limit) {
            return x == f.ch ? Double.POSITIVE_INFINITY : 0.0;
        }
        return value(f, x, 1.0, 0.0, 0.0);
    }

    /**
     * Returns ∂c/∂x at (x, t). For the absorbing wall
     * ∂c/∂x = G·[−2(x − ξ − vt/R)·R/(4Dt)·(1 − e^{−xξR/(Dt)}) + (ξR/(Dt))·e^{−xξR/(Dt)}];
     * for the zero-flux wall, ∂G/∂x + ∂I/∂x + (v/D)·I − (v²/(2D²))·e^{vx/D − μt/R}·erfc(B).
     *
     * @param x position, finite and ≥ 0
     * @param t time since the release, finite and ≥ 0
     * @return ∂c/∂x
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double gradient(double x, double t) {
        checkX(x);
        final Frame f = frame(t);
        return f.limit ? 0.0 : gradient(f, x, 1.0, 0.0, 0.0);
    }

    /**
     * Returns the total flux v·c − D·∂c/∂x at (x, t), positive along +x:
     * <pre>
     * absorbing:  (v/2)(G − I) + (R/(2t))·[x(G − I) − ξ(G + I)]
     * zero-flux:  (R/(2t))·[x(G + I) + (vt/R − ξ)(G − I)]
     * </pre>
     * (the erfc term of the zero-flux wall has no net flux of its own).
     *
     * @param x position, finite and ≥ 0
     * @param t time since the release, finite and ≥ 0
     * @return the flux
     * @throws IllegalArgumentException if x or t is invalid
     */
    public double flux(double x, double t) {
        checkX(x);
        final Frame f = frame(t);
        if (f.limit) {
            return x == f.ch && velocity != 0 ? velocity * Double.POSITIVE_INFINITY : 0.0;
        }
        return flux(f, x, 1.0, 0.0, 0.0);
    }

    /**
     * Returns the total flux through the wall, v·c − D·∂c/∂x at x = 0, positive along +x (into
     * the domain): for the absorbing wall −(ξR/t)·G(0, t; ξ) ≤ 0, for the zero-flux wall 0.
     *
     * @param t time since the release, finite and ≥ 0
     * @return the flux at the wall (0 at t = 0)
     * @throws IllegalArgumentException if t is invalid
     */
    public double wallFlux(double t) {
        final Frame f = frame(t);
        if (f.limit || wall == Wall.ZERO_FLUX) {
            return 0.0;
        }
        // −D·∂c/∂x at 0 = −D·G(0)·2ξ·R/(2Dt)
        return gaussTerm(f, 0.0, -4 * dispersion * xi * f.s.high, 0.0, 0.0);
    }

    /**
     * Returns the fraction of the released mass that has left through the wall by time t,
     * −(1/R)∫₀ᵗ wallFlux(s) ds. For the absorbing wall, with u = √(v² + 4μD) and
     * L = √(4Dt/R),
     * <pre>
     * W(t) = ½·e^{ξ(u − v)/(2D)}·erfc((ξ + ut/R)/L) + ½·e^{−ξ(u + v)/(2D)}·erfc((ξ − ut/R)/L)
     * </pre>
     * the first-passage distribution of the drifting Brownian motion weighted by the decay
     * e^{−μs/R} (the weight turns the drift v into u: Cox &amp; Miller 1965, <i>The Theory of
     * Stochastic Processes</i>, §5.7, for μ = 0, section recalled; the same function as the
     * Ogata–Banks solution with v replaced by −v). It tends to e^{−ξ(u + v)/(2D)} as t → ∞.
     * For the zero-flux wall, 0.
     *
     * @param t time, finite and ≥ 0
     * @return the fraction in [0, 1]
     * @throws IllegalArgumentException if t is invalid
     */
    public double massOut(double t) {
        final Frame f = frame(t);
        if (t == 0 || wall == Wall.ZERO_FLUX) {
            return 0.0;
        }
        final Spread s = f.s;
        final double ut = u / retardation * t;
        final double first = ExpErfc.value(xi * uMinusV / (2 * dispersion), s.scaled(xi + ut));
        final double second = ExpErfc.value(-xi * uPlusV / (2 * dispersion), s.scaled(xi - ut));
        return 0.5 * first + 0.5 * second;
    }

    /**
     * Returns the fraction of the released mass in the domain at time t, ∫₀^∞ c dx. For the
     * absorbing wall, with a = −(ξ + vt/R)/L and b = (ξ − vt/R)/L,
     * <pre>
     * M(t) = e^{−μt/R}·½·[erfc(a) − e^{−vξ/D}·erfc(b)]   (integral of G − I over x ≥ 0)
     * </pre>
     * evaluated as e^{−μt/R}·e^{−a²}·∫_a^b φ(s) ds with φ = 1/√π − s·erfcx(s) &gt; 0 (or,
     * where a and b are both negative, 1 − e^{−vξ/D} plus such a positive integral), so that
     * it does not cancel when little mass remains. For the zero-flux wall, e^{−μt/R}.
     *
     * @param t time, finite and ≥ 0
     * @return the fraction in [0, 1]
     * @throws IllegalArgumentException if t is invalid
     */
    public double massInDomain(double t) {
        final Frame f = frame(t);
        if (t == 0) {
            return 1.0;
        }
        if (wall == Wall.ZERO_FLUX) {
            return ScaledExp.valueOfSplit(1.0, f.dh, 0.0, -f.dl);
        }
        if (f.limit) {
            return Math.exp(f.dh);
        }
        final double m = -f.s.scaled(velocity / retardation * t);
        final double h = f.s.scaled(xi);
        return Phi.expTimesJ(f.dh, m, h, -velocity * xi / dispersion);
    }

    /**
     * Evaluates c at every x[i] at one time: {@code out[i] = value(x[i], t)}.
     *
     * @param x positions, each finite and ≥ 0; not modified (unless it is also {@code out})
     * @param t time since the release, finite and ≥ 0
     * @param out receives the values; at least as long as x; may be x itself
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void value(double[] x, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xv = checkX(x[i]);
            if (f.limit) {
                out[i] = xv == f.ch ? Double.POSITIVE_INFINITY : 0.0;
            } else {
                out[i] = value(f, xv, 1.0, 0.0, 0.0);
            }
        }
    }

    // ---------------------------------------------------------------------------------------
    // Engine, shared with the two- and three-dimensional kernels: each method returns
    // mult × (quantity) × exp(−(eh + el)), the extra exponent and multiplier being those of
    // the transverse factors, applied inside one exponential so that nothing underflows first.

    /** The per-time constants. */
    static final class Frame {
        final Spread s;
        final double ch;
        final double cl;
        final double dh;
        final double dl;
        final double t;
        final boolean limit;
        /** norm·e^{−μt/R} for the bulk path of {@link #gaussTerm}, or 0 where it is not used. */
        final double bulkScale;

        Frame(Spread s, double[] centre, double[] decay, double t) {
            this.s = s;
            this.ch = centre[0];
            this.cl = centre[1];
            this.dh = decay[0];
            this.dl = decay[1];
            this.t = t;
            this.limit = s == null || s.collapsed;
            final double scale = limit ? 0.0 : s.norm * Math.exp(dh);
            this.bulkScale = scale >= BULK_SCALE_MIN && scale <= BULK_SCALE_MAX ? scale : 0.0;
        }
    }

    /**
     * The bulk path keeps the exponent above −BULK_EXPONENT and the multiplier
     * m·norm·e^{−μt/R} in [BULK_SCALE_MIN, BULK_SCALE_MAX], so the result (at least 1e-40 ×
     * e^{−600} ≈ 3e-301) is a normal double; there the exponent q = (x − ξ − vt/R)²R/(4Dt) is
     * formed in plain double, whose few roundings move the result by a few units of q·2⁻⁵³,
     * inside the contract's 2κ ULP as for {@link org.advecta.kernel.FreeSpaceKernel1D}.
     */
    private static final double BULK_EXPONENT = 600;
    private static final double BULK_SCALE_MIN = 1e-40;
    private static final double BULK_SCALE_MAX = 0x1.0p300;

    Frame frame(double t) {
        Checks.nonNegative("t", t);
        final Spread s = t == 0 ? null : Spread.of(dispersion, retardation, t);
        return new Frame(s, Spread.centre(xi, velocity, retardation, t),
            Spread.decay(decayRate, retardation, t), t);
    }

    /** m·norm·exp(−μt/R − (x − ξ − vt/R)²R/(4Dt) − e): the free-space kernel times m. */
    static double gaussTerm(Frame f, double x, double m, double eh, double el) {
        final Spread s = f.s;
        if (eh == 0 && el == 0) {
            final double dist = (x - f.ch) - f.cl;
            final double q = dist * dist * s.high;
            final double scaled = m * f.bulkScale;
            final double size = Math.abs(scaled);
            if (q < BULK_EXPONENT && size >= BULK_SCALE_MIN && size <= BULK_SCALE_MAX) {
                return scaled * Math.exp(-q);
            }
        }
        final double qh = s.exponentHigh(x, f.ch, f.cl);
        final double ql = s.exponentLow(x, f.ch, f.cl, qh);
        final double h = qh + eh;
        final double bv = h - qh;
        final double err = (qh - (h - bv)) + (eh - bv);
        return ScaledExp.valueOfSplit(m * s.norm, f.dh, h, err + ql + el - f.dl);
    }

    /** The scaled distance of the erfc term, B = (x + ξ + vt/R)/L. */
    private double argumentB(Frame f, double x) {
        return f.s.scaled(Math.fma(velocity / retardation, f.t, x + xi));
    }

    /**
     * m·exp(vx/D − μt/R − e)·erfc(B), as exp(vx/D − μt/R − B² − e)·erfcx(B) for B ≥ 0 (the
     * erfc term of the zero-flux wall, used for v &lt; 0 where it is positive).
     */
    private double erfcTerm(Frame f, double x, double m, double eh, double el) {
        final double b = argumentB(f, x);
        final double shift = velocity * x / dispersion + f.dh;
        if (b >= 0) {
            final double bb = b * b;
            final double h = bb + eh;
            final double bv = h - bb;
            final double err = (bb - (h - bv)) + (eh - bv);
            return ScaledExp.valueOfSplit(m * ErrorFunctions.erfcx(b), shift, h,
                err + Math.fma(b, b, -bb) + el - f.dl);
        }
        return ScaledExp.valueOfSplit(m * ErrorFunctions.erfc(b), shift, eh, el - f.dl);
    }

    /** Φ = φ(B) + α·erfcx(B) ≥ 0 with α = (x + ξ)/L: the zero-flux correction for v ≥ 0. */
    private double capitalPhi(Frame f, double x, double b) {
        return Phi.phi(b) + f.s.scaled(x + xi) * ErrorFunctions.erfcx(b);
    }

    double value(Frame f, double x, double mult, double eh, double el) {
        final double kx = 4 * x * xi * f.s.high;
        final double e = Math.exp(-kx);
        final double em = oneMinus(kx, e);
        if (wall == Wall.ABSORBING) {
            return gaussTerm(f, x, mult * em, eh, el);
        }
        if (velocity >= 0) {
            final double b = argumentB(f, x);
            return gaussTerm(f, x, mult * (em + e * TWO_SQRT_PI * capitalPhi(f, x, b)), eh, el);
        }
        return gaussTerm(f, x, mult * (1 + e), eh, el)
            + erfcTerm(f, x, mult * (-velocity / (2 * dispersion)), eh, el);
    }

    double gradient(Frame f, double x, double mult, double eh, double el) {
        final Spread s = f.s;
        final double kx = 4 * x * xi * s.high;
        final double e = Math.exp(-kx);
        final double em = oneMinus(kx, e);
        final double dist = (x - f.ch) - f.cl;
        if (wall == Wall.ABSORBING) {
            // G_x − I_x = 2G·R/(4Dt)·[−(x − ξ − vt/R)(1 − e) + 2ξe]
            return gaussTerm(f, x, mult * 2 * s.high * (-dist * em + 2 * xi * e), eh, el);
        }
        if (velocity >= 0) {
            // G_x(1 − e) + G·k·e + d/dx(2√π I Φ), with dΦ/dx = (2P/L)·φ(B); the last two,
            // with χ = x/L, h = ξ/L and φ(B) + B·erfcx(B) = 1/√π, combine into
            // (4e/L)·√π·G·[P(2φ + (2h + χ)erfcx) − χ(φ + (h + χ)erfcx)] (proportional to x
            // near the wall when v = 0, as the exact gradient is)
            final double b = argumentB(f, x);
            final double p = s.scaled(velocity / retardation * f.t);
            final double chi = s.scaled(x);
            final double h = s.scaled(xi);
            final double ph = Phi.phi(b);
            final double ex = ErrorFunctions.erfcx(b);
            final double inner = p * (2 * ph + (2 * h + chi) * ex) - chi * (ph + (h + chi) * ex);
            final double bracket = -2 * s.high * dist * em
                + 4 * e * s.inverseLength() * SQRT_PI * inner;
            return gaussTerm(f, x, mult * bracket, eh, el);
        }
        // v < 0: G_x + I_x + (v/D)·I + (v/D)·(erfc term), where
        // G_x + I_x = 2G·R/(4Dt)·[−(x − vt/R)(1 + e) + ξ(1 − e)]
        final double bracket = 2 * s.high * (-Math.fma(-velocity / retardation, f.t, x) * (1 + e)
            + xi * em) + e * velocity / dispersion;
        return gaussTerm(f, x, mult * bracket, eh, el)
            + erfcTerm(f, x, mult * (-velocity / (2 * dispersion)) * (velocity / dispersion),
                eh, el);
    }

    double flux(Frame f, double x, double mult, double eh, double el) {
        final Spread s = f.s;
        final double kx = 4 * x * xi * s.high;
        final double e = Math.exp(-kx);
        final double em = oneMinus(kx, e);
        final double drift = velocity / retardation * f.t;
        // Two equal forms of each bracket (times R/(2t)); the first for e < 1/2, where its
        // image part is the smaller one, the second for e ≥ 1/2, where 1 − e is formed by
        // expm1 and the first would subtract nearly equal sums.
        final double bracket;
        if (wall == Wall.ABSORBING) {
            // (x − ξ + vt/R) − e(x + ξ + vt/R) = (x + vt/R)(1 − e) − ξ(1 + e)
            bracket = e < 0.5
                ? Math.fma(velocity / retardation, f.t, x - xi) - e * (x + xi + drift)
                : (x + drift) * em - xi * (1 + e);
        } else {
            // (x − ξ + vt/R) + e(x + ξ − vt/R) = x(1 + e) + (vt/R − ξ)(1 − e)
            bracket = e < 0.5
                ? Math.fma(velocity / retardation, f.t, x - xi)
                    + e * Math.fma(-velocity / retardation, f.t, x + xi)
                : x * (1 + e) + Math.fma(velocity / retardation, f.t, -xi) * em;
        }
        return gaussTerm(f, x, mult * 2 * dispersion * s.high * bracket, eh, el);
    }

    /** ln 2: above it 1 − e^{−k} loses nothing (e^{−k} &lt; 1/2), below expm1 is needed. */
    private static final double LN2 = 0.6931471805599453;

    /** 1 − e^{−k} given e = e^{−k}: the plain difference where it cannot cancel. */
    static double oneMinus(double k, double e) {
        return k > LN2 ? 1 - e : -Math.expm1(-k);
    }

    private static double checkX(double x) {
        return Checks.nonNegative("x", x);
    }
}
