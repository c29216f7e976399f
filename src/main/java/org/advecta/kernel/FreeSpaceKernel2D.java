package org.advecta.kernel;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of the two-dimensional equation
 * {@code R ∂c/∂t = D_L ∂²c/∂x² + D_T ∂²c/∂y² − v ∂c/∂x − μ c} in the whole plane: the
 * concentration after an instantaneous release δ(x − x₀)·δ(y − y₀) at t = 0, with the flow
 * along x. Immutable and thread-safe.
 *
 * <pre>
 * G(x, y, t) = exp(−μt/R) · R / (4π t √(D_L D_T))
 *              · exp(−R (x − x₀ − vt/R)² / (4 D_L t) − R (y − y₀)² / (4 D_T t))
 * </pre>
 *
 * <p>The product of two one-dimensional kernels, one per axis (Carslaw &amp; Jaeger 1959,
 * §10.3; Bear 1972, <i>Dynamics of Fluids in Porous Media</i>, §10.6). Its integral over the
 * plane is exp(−μt/R); the variances are 2D_L t/R and 2D_T t/R. The transverse coefficient
 * is {@link TransportParameters#transverseDispersion()}.
 *
 * <p><b>Time.</b> t must be finite and ≥ 0. At t = 0 (and when 4Dt/R along either axis is
 * below 2⁻⁶⁰⁰) every method returns the limit t → 0⁺ at fixed (x, y): 0 away from the
 * centre; at the centre the value is +∞, the gradient 0 and the x-flux v·∞ (0 when v = 0).
 *
 * <p><b>Accuracy.</b> Every quantity is within max(16, 2κ) ULP of the exact result at the
 * exact double arguments wherever it is a normal double (κ: the componentwise condition
 * number with respect to all arguments and parameters); subnormal results are within a few
 * {@link Double#MIN_VALUE}, and the result is 0 only where the exact value is below half of
 * it.
 *
 * <p><b>Arrays.</b> The batch methods read {@code x[i]} and {@code y[i]} before writing the
 * i-th output, so an output may be the same array as an input of the same index; nothing is
 * allocated per point.
 */
public final class FreeSpaceKernel2D {

    private final double x0;
    private final double y0;
    private final double velocity;
    private final double dL;
    private final double dT;
    private final double retardation;
    private final double decayRate;

    private FreeSpaceKernel2D(TransportParameters p, double x0, double y0) {
        this.x0 = x0;
        this.y0 = y0;
        this.velocity = p.velocity();
        this.dL = p.dispersion();
        this.dT = p.transverseDispersion();
        this.retardation = p.retardation();
        this.decayRate = p.decayRate();
    }

    /**
     * Returns the kernel of a unit release at (x₀, y₀).
     *
     * @param parameters the transport parameters
     * @param x0 release point along the flow, finite
     * @param y0 release point across the flow, finite
     * @return the kernel
     * @throws IllegalArgumentException if a coordinate is not finite or parameters is null
     */
    public static FreeSpaceKernel2D of(TransportParameters parameters, double x0, double y0) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        return new FreeSpaceKernel2D(parameters, Checks.finite("x0", x0), Checks.finite("y0", y0));
    }

    /**
     * Returns G(x, y, t).
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time since the release, finite and ≥ 0
     * @return the kernel value
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double value(double x, double y, double t) {
        final Frame f = frame(t);
        return f.value(Checks.finite("x", x), Checks.finite("y", y));
    }

    /**
     * Returns ∂G/∂x = −2ξ·R/(4D_L t)·G with ξ = x − x₀ − vt/R.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂G/∂x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientX(double x, double y, double t) {
        final Frame f = frame(t);
        return f.gradientX(Checks.finite("x", x), Checks.finite("y", y));
    }

    /**
     * Returns ∂G/∂y = −2(y − y₀)·R/(4D_T t)·G.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂G/∂y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientY(double x, double y, double t) {
        final Frame f = frame(t);
        return f.gradientY(Checks.finite("x", x), Checks.finite("y", y));
    }

    /**
     * Returns the x-component of the total flux, v·G − D_L·∂G/∂x.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxX(double x, double y, double t) {
        final Frame f = frame(t);
        return f.fluxX(Checks.finite("x", x), Checks.finite("y", y));
    }

    /**
     * Returns the y-component of the total flux, −D_T·∂G/∂y.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxY(double x, double y, double t) {
        return -dT * gradientY(x, y, t);
    }

    /**
     * Evaluates G at every (x[i], y[i]) at one time.
     *
     * @param x positions along the flow, each finite; not modified (unless also an output)
     * @param y positions across the flow, each finite, as long as x; not modified
     * @param t time since the release, finite and ≥ 0
     * @param out receives the values; at least as long as x
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void value(double[] x, double[] y, double t, double[] out) {
        checkArrays(x, y, out);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            out[i] = f.value(Checks.finite("x", x[i]), Checks.finite("y", y[i]));
        }
    }

    /**
     * Evaluates the gradient (∂G/∂x, ∂G/∂y) at every (x[i], y[i]) at one time.
     *
     * @param x positions along the flow, each finite; not modified (unless also an output)
     * @param y positions across the flow, each finite, as long as x; not modified
     * @param t time since the release, finite and ≥ 0
     * @param outX receives ∂G/∂x; at least as long as x
     * @param outY receives ∂G/∂y; at least as long as x; not the same array as outX
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void gradient(double[] x, double[] y, double t, double[] outX, double[] outY) {
        checkArrays(x, y, outX, outY);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = Checks.finite("x", x[i]);
            final double yi = Checks.finite("y", y[i]);
            outX[i] = f.gradientX(xi, yi);
            outY[i] = f.gradientY(xi, yi);
        }
    }

    /**
     * Evaluates the total flux (v·G − D_L ∂G/∂x, −D_T ∂G/∂y) at every (x[i], y[i]).
     *
     * @param x positions along the flow, each finite; not modified (unless also an output)
     * @param y positions across the flow, each finite, as long as x; not modified
     * @param t time since the release, finite and ≥ 0
     * @param outX receives the x-flux; at least as long as x
     * @param outY receives the y-flux; at least as long as x; not the same array as outX
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void flux(double[] x, double[] y, double t, double[] outX, double[] outY) {
        checkArrays(x, y, outX, outY);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = Checks.finite("x", x[i]);
            final double yi = Checks.finite("y", y[i]);
            outX[i] = f.fluxX(xi, yi);
            outY[i] = -dT * f.gradientY(xi, yi);
        }
    }

    private Frame frame(double t) {
        Checks.nonNegative("t", t);
        return new Frame(t);
    }

    private static void checkArrays(double[] x, double[] y, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("out", out, x.length);
    }

    private static void checkArrays(double[] x, double[] y, double[] outX, double[] outY) {
        checkArrays(x, y, outX);
        Checks.length("outY", outY, x.length);
        Checks.distinct(outX, outY);
    }

    /** The kernel at one time: the per-time constants computed once. */
    private final class Frame {
        private final Spread sx;
        private final Spread sy;
        private final double centreX;
        private final double centreLow;
        private final double decay;
        private final double decayLow;
        private final double norm;
        private final boolean limit;

        Frame(double t) {
            final double[] c = Spread.centre(x0, velocity, retardation, t);
            this.centreX = c[0];
            this.centreLow = c[1];
            final double[] d = Spread.decay(decayRate, retardation, t);
            this.decay = d[0];
            this.decayLow = d[1];
            if (t == 0) {
                this.sx = null;
                this.sy = null;
                this.limit = true;
                this.norm = 0;
            } else {
                this.sx = Spread.of(dL, retardation, t);
                this.sy = Spread.of(dT, retardation, t);
                this.limit = sx.collapsed || sy.collapsed;
                this.norm = sx.norm * sy.norm;
            }
        }

        double value(double x, double y) {
            if (limit) {
                return x == centreX && y == y0 ? Double.POSITIVE_INFINITY : 0.0;
            }
            return scaled(x, y, 1.0);
        }

        /** factor × G, the factor in the exponential's multiplier (no subnormal G first). */
        private double scaled(double x, double y, double factor) {
            final double hx = sx.exponentHigh(x, centreX, centreLow);
            final double hy = sy.exponentHigh(y, y0, 0.0);
            return Spread.combine(norm * factor, decay, hx,
                sx.exponentLow(x, centreX, centreLow, hx), hy,
                sy.exponentLow(y, y0, 0.0, hy) - decayLow);
        }

        double gradientX(double x, double y) {
            return limit ? 0.0 : scaled(x, y, -2 * ((x - centreX) - centreLow) * sx.high);
        }

        double gradientY(double x, double y) {
            return limit ? 0.0 : scaled(x, y, -2 * (y - y0) * sy.high);
        }

        double fluxX(double x, double y) {
            if (limit) {
                return x == centreX && y == y0 && velocity != 0
                    ? velocity * Double.POSITIVE_INFINITY : 0.0;
            }
            // v·G − D_L·∂G/∂x = G·(v + 2 D_L ξ R/(4 D_L t))
            return scaled(x, y, velocity + 2 * dL * ((x - centreX) - centreLow) * sx.high);
        }
    }
}
