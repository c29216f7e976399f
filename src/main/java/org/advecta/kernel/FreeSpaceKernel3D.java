package org.advecta.kernel;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of the three-dimensional equation
 * {@code R ∂c/∂t = D_L ∂²c/∂x² + D_T ∂²c/∂y² + D_V ∂²c/∂z² − v ∂c/∂x − μ c} in all of space:
 * the concentration after an instantaneous release δ(x − x₀)·δ(y − y₀)·δ(z − z₀) at t = 0,
 * with the flow along x. Immutable and thread-safe.
 *
 * <pre>
 * G(x, y, z, t) = exp(−μt/R) · (R / (4π t))^{3/2} / √(D_L D_T D_V)
 *     · exp(−R (x − x₀ − vt/R)² / (4 D_L t) − R (y − y₀)² / (4 D_T t) − R (z − z₀)² / (4 D_V t))
 * </pre>
 *
 * <p>The product of three one-dimensional kernels (Carslaw &amp; Jaeger 1959, §10.2; Baetsle
 * 1969 for its use with anisotropic dispersion in groundwater). Its integral over space is
 * exp(−μt/R); the variances are 2D_L t/R, 2D_T t/R and 2D_V t/R.
 *
 * <p><b>Time.</b> t must be finite and ≥ 0. At t = 0 (and when 4Dt/R along any axis is below
 * 2⁻⁶⁰⁰) every method returns the limit t → 0⁺ at fixed (x, y, z): 0 away from the centre; at
 * the centre the value is +∞, the gradient 0 and the x-flux v·∞ (0 when v = 0).
 *
 * <p><b>Accuracy.</b> As {@link FreeSpaceKernel2D}: within max(16, 2κ) ULP wherever the
 * exact result is a normal double, a few {@link Double#MIN_VALUE} where it is subnormal.
 *
 * <p><b>Arrays.</b> The batch methods read the i-th inputs before writing the i-th outputs,
 * so an output may be the same array as an input; the outputs of one call must be distinct
 * arrays; nothing is allocated per point.
 */
public final class FreeSpaceKernel3D {

    private final double x0;
    private final double y0;
    private final double z0;
    private final double velocity;
    private final double dL;
    private final double dT;
    private final double dV;
    private final double retardation;
    private final double decayRate;

    private FreeSpaceKernel3D(TransportParameters p, double x0, double y0, double z0) {
        this.x0 = x0;
        this.y0 = y0;
        this.z0 = z0;
        this.velocity = p.velocity();
        this.dL = p.dispersion();
        this.dT = p.transverseDispersion();
        this.dV = p.verticalDispersion();
        this.retardation = p.retardation();
        this.decayRate = p.decayRate();
    }

    /**
     * Returns the kernel of a unit release at (x₀, y₀, z₀).
     *
     * @param parameters the transport parameters
     * @param x0 release point along the flow, finite
     * @param y0 release point across the flow, finite
     * @param z0 release point in the third direction, finite
     * @return the kernel
     * @throws IllegalArgumentException if a coordinate is not finite or parameters is null
     */
    public static FreeSpaceKernel3D of(TransportParameters parameters, double x0, double y0,
                                       double z0) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        return new FreeSpaceKernel3D(parameters, Checks.finite("x0", x0),
            Checks.finite("y0", y0), Checks.finite("z0", z0));
    }

    /**
     * Returns G(x, y, z, t).
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return the kernel value
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double value(double x, double y, double z, double t) {
        return frame(t).value(finiteX(x), finiteY(y), finiteZ(z));
    }

    /**
     * Returns ∂G/∂x = −2ξ·R/(4D_L t)·G with ξ = x − x₀ − vt/R.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂G/∂x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientX(double x, double y, double z, double t) {
        return frame(t).gradient(0, finiteX(x), finiteY(y), finiteZ(z));
    }

    /**
     * Returns ∂G/∂y = −2(y − y₀)·R/(4D_T t)·G.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂G/∂y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientY(double x, double y, double z, double t) {
        return frame(t).gradient(1, finiteX(x), finiteY(y), finiteZ(z));
    }

    /**
     * Returns ∂G/∂z = −2(z − z₀)·R/(4D_V t)·G.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂G/∂z
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientZ(double x, double y, double z, double t) {
        return frame(t).gradient(2, finiteX(x), finiteY(y), finiteZ(z));
    }

    /**
     * Returns the x-component of the total flux, v·G − D_L·∂G/∂x.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxX(double x, double y, double z, double t) {
        return frame(t).fluxX(finiteX(x), finiteY(y), finiteZ(z));
    }

    /**
     * Returns the y-component of the total flux, −D_T·∂G/∂y.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxY(double x, double y, double z, double t) {
        return -dT * gradientY(x, y, z, t);
    }

    /**
     * Returns the z-component of the total flux, −D_V·∂G/∂z.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along z
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxZ(double x, double y, double z, double t) {
        return -dV * gradientZ(x, y, z, t);
    }

    /**
     * Evaluates G at every (x[i], y[i], z[i]) at one time.
     *
     * @param x positions along the flow, each finite; not modified (unless also the output)
     * @param y positions across the flow, each finite, as long as x; not modified
     * @param z positions in the third direction, each finite, as long as x; not modified
     * @param t time since the release, finite and ≥ 0
     * @param out receives the values; at least as long as x
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void value(double[] x, double[] y, double[] z, double t, double[] out) {
        checkArrays(x, y, z, out);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            out[i] = f.value(finiteX(x[i]), finiteY(y[i]), finiteZ(z[i]));
        }
    }

    /**
     * Evaluates the gradient (∂G/∂x, ∂G/∂y, ∂G/∂z) at every point at one time.
     *
     * @param x positions along the flow, each finite; not modified (unless also an output)
     * @param y positions across the flow, each finite, as long as x; not modified
     * @param z positions in the third direction, each finite, as long as x; not modified
     * @param t time since the release, finite and ≥ 0
     * @param out three distinct arrays, each at least as long as x, receiving the x, y and z
     *     components
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void gradient(double[] x, double[] y, double[] z, double t, double[][] out) {
        checkOutputs(x, y, z, out);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = finiteX(x[i]);
            final double yi = finiteY(y[i]);
            final double zi = finiteZ(z[i]);
            out[0][i] = f.gradient(0, xi, yi, zi);
            out[1][i] = f.gradient(1, xi, yi, zi);
            out[2][i] = f.gradient(2, xi, yi, zi);
        }
    }

    /**
     * Evaluates the total flux (v·G − D_L ∂G/∂x, −D_T ∂G/∂y, −D_V ∂G/∂z) at every point.
     *
     * @param x positions along the flow, each finite; not modified (unless also an output)
     * @param y positions across the flow, each finite, as long as x; not modified
     * @param z positions in the third direction, each finite, as long as x; not modified
     * @param t time since the release, finite and ≥ 0
     * @param out three distinct arrays, each at least as long as x, receiving the x, y and z
     *     components
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void flux(double[] x, double[] y, double[] z, double t, double[][] out) {
        checkOutputs(x, y, z, out);
        final Frame f = frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = finiteX(x[i]);
            final double yi = finiteY(y[i]);
            final double zi = finiteZ(z[i]);
            out[0][i] = f.fluxX(xi, yi, zi);
            out[1][i] = -dT * f.gradient(1, xi, yi, zi);
            out[2][i] = -dV * f.gradient(2, xi, yi, zi);
        }
    }

    private Frame frame(double t) {
        Checks.nonNegative("t", t);
        return new Frame(t);
    }

    private static double finiteX(double x) {
        return Checks.finite("x", x);
    }

    private static double finiteY(double y) {
        return Checks.finite("y", y);
    }

    private static double finiteZ(double z) {
        return Checks.finite("z", z);
    }

    private static void checkArrays(double[] x, double[] y, double[] z, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("z", z, x.length);
        Checks.length("out", out, x.length);
    }

    private static void checkOutputs(double[] x, double[] y, double[] z, double[][] out) {
        if (out == null || out.length != 3) {
            throw new IllegalArgumentException("out: needs exactly 3 arrays");
        }
        checkArrays(x, y, z, out[0]);
        Checks.length("out[1]", out[1], x.length);
        Checks.length("out[2]", out[2], x.length);
        Checks.distinct(out[0], out[1]);
        Checks.distinct(out[0], out[2]);
        Checks.distinct(out[1], out[2]);
    }

    /** The kernel at one time: the per-time constants computed once. */
    private final class Frame {
        private final Spread[] spreads;
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
                this.spreads = null;
                this.limit = true;
                this.norm = 0;
            } else {
                this.spreads = new Spread[] {Spread.of(dL, retardation, t),
                    Spread.of(dT, retardation, t), Spread.of(dV, retardation, t)};
                this.limit = spreads[0].collapsed || spreads[1].collapsed
                    || spreads[2].collapsed;
                this.norm = spreads[0].norm * spreads[1].norm * spreads[2].norm;
            }
        }

        private boolean atCentre(double x, double y, double z) {
            return x == centreX && y == y0 && z == z0;
        }

        double value(double x, double y, double z) {
            if (limit) {
                return atCentre(x, y, z) ? Double.POSITIVE_INFINITY : 0.0;
            }
            return scaled(x, y, z, 1.0);
        }

        /** factor × G, the factor in the exponential's multiplier (no subnormal G first). */
        private double scaled(double x, double y, double z, double factor) {
            final Spread sx = spreads[0];
            final Spread sy = spreads[1];
            final Spread sz = spreads[2];
            final double hx = sx.exponentHigh(x, centreX, centreLow);
            final double hy = sy.exponentHigh(y, y0, 0.0);
            final double hz = sz.exponentHigh(z, z0, 0.0);
            return Spread.combine(norm * factor, decay, hx,
                sx.exponentLow(x, centreX, centreLow, hx), hy, sy.exponentLow(y, y0, 0.0, hy),
                hz, sz.exponentLow(z, z0, 0.0, hz) - decayLow);
        }

        double gradient(int axis, double x, double y, double z) {
            if (limit) {
                return 0.0;
            }
            final double d = axis == 0 ? (x - centreX) - centreLow : axis == 1 ? y - y0 : z - z0;
            return scaled(x, y, z, -2 * d * spreads[axis].high);
        }

        double fluxX(double x, double y, double z) {
            if (limit) {
                return atCentre(x, y, z) && velocity != 0
                    ? velocity * Double.POSITIVE_INFINITY : 0.0;
            }
            // v·G − D_L·∂G/∂x = G·(v + 2 D_L ξ R/(4 D_L t))
            return scaled(x, y, z,
                velocity + 2 * dL * ((x - centreX) - centreLow) * spreads[0].high);
        }
    }
}
