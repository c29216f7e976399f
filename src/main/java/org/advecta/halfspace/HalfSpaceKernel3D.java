package org.advecta.halfspace;

import org.advecta.internal.Checks;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of
 * {@code R ∂c/∂t = D_L ∂²c/∂x² + D_T ∂²c/∂y² + D_V ∂²c/∂z² − v ∂c/∂x − μ c} in a half-space
 * bounded by one plane {@link Wall}: the concentration after an instantaneous unit point
 * release at (x₀, y₀, z₀), the flow along x. Immutable and thread-safe.
 *
 * <p>Supported walls ({@link WallAxis}):
 * <pre>
 * X: wall x = 0 across the flow, x ≥ 0:  c = K(x, t; x₀) · g_T(y − y₀) · g_V(z − z₀)
 * Y: wall y = 0 along the flow,  y ≥ 0:  c = G(x, t; x₀) · [g_T(y − y₀) ∓ g_T(y + y₀)] · g_V(z − z₀)
 * Z: wall z = 0 along the flow,  z ≥ 0:  c = G(x, t; x₀) · g_T(y − y₀) · [g_V(z − z₀) ∓ g_V(z + z₀)]
 * </pre>
 * with K = {@link HalfSpaceKernel1D} (D = D_L), G the free 1D kernel along x (drift and decay),
 * g_T, g_V the free Gaussians √(R/(4πDt))·exp(−s²R/(4Dt)) with D = D_T, D_V, and − for an
 * absorbing, + for a zero-flux (reflecting) wall — the Z wall with + is the impermeable
 * ground surface or aquifer base. The product of the 1D solutions solves the separable
 * equation and each wall condition (Carslaw &amp; Jaeger 1959, §10.10, recalled). Only one
 * wall at a time: two or more walls (a corner, a layer of finite thickness) are not
 * provided.
 *
 * <p>Mass: {@link #massInDomain(double)} and {@link #massOut(double)} are those of the 1D
 * kernel along the wall's normal.
 *
 * <p>Time: at t = 0 (and when a spread 4Dt/R is below 2⁻⁶⁰⁰) every method returns the t → 0⁺
 * limit: 0 away from the release point, +∞ (value) at it.
 *
 * <p>Accuracy: within max(16, 2κ) ULP of the exact result wherever it is a normal double, κ
 * the componentwise condition number over all arguments and parameters (enforced by the
 * reference fixtures); no NaN or infinity for valid input.
 *
 * <p>Arrays: the batch method reads the i-th inputs before writing {@code out[i]}; nothing is
 * allocated per point.
 */
public final class HalfSpaceKernel3D {

    private final PlaneWallCore core;
    private final double transverse;
    private final double vertical;

    private HalfSpaceKernel3D(PlaneWallCore core, double transverse, double vertical) {
        this.core = core;
        this.transverse = transverse;
        this.vertical = vertical;
    }

    /**
     * Returns the kernel of a unit release at (x₀, y₀, z₀) next to a wall.
     *
     * @param parameters v (along x), D_L, D_T, D_V, R, μ
     * @param wall the wall condition
     * @param axis the wall's normal: X (wall x = 0, x₀ &gt; 0), Y (y = 0, y₀ &gt; 0) or Z
     *     (z = 0, z₀ &gt; 0)
     * @param x0 release point along the flow, finite
     * @param y0 release point across the flow, finite
     * @param z0 release point in the third direction, finite
     * @return the kernel
     * @throws IllegalArgumentException if an argument is null or invalid
     */
    public static HalfSpaceKernel3D of(TransportParameters parameters, Wall wall, WallAxis axis,
                                       double x0, double y0, double z0) {
        final PlaneWallCore core = new PlaneWallCore(parameters, wall, axis, true, x0, y0, z0);
        return new HalfSpaceKernel3D(core, parameters.transverseDispersion(),
            parameters.verticalDispersion());
    }

    /**
     * Returns c(x, y, z, t).
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return the concentration per unit released
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double value(double x, double y, double z, double t) {
        return eval(PlaneWallCore.Quantity.VALUE, x, y, z, t);
    }

    /**
     * Returns ∂c/∂x.
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return ∂c/∂x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientX(double x, double y, double z, double t) {
        return eval(PlaneWallCore.Quantity.GRADIENT_X, x, y, z, t);
    }

    /**
     * Returns ∂c/∂y.
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return ∂c/∂y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientY(double x, double y, double z, double t) {
        return eval(PlaneWallCore.Quantity.GRADIENT_Y, x, y, z, t);
    }

    /**
     * Returns ∂c/∂z.
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return ∂c/∂z
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientZ(double x, double y, double z, double t) {
        return eval(PlaneWallCore.Quantity.GRADIENT_Z, x, y, z, t);
    }

    /**
     * Returns the x-component of the total flux, v·c − D_L·∂c/∂x.
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return the flux along x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxX(double x, double y, double z, double t) {
        return eval(PlaneWallCore.Quantity.FLUX_X, x, y, z, t);
    }

    /**
     * Returns the y-component of the total flux, −D_T·∂c/∂y.
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return the flux along y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxY(double x, double y, double z, double t) {
        return -transverse * gradientY(x, y, z, t);
    }

    /**
     * Returns the z-component of the total flux, −D_V·∂c/∂z.
     *
     * @param x position along the flow, finite (≥ 0 for axis X)
     * @param y position across the flow, finite (≥ 0 for axis Y)
     * @param z position in the third direction, finite (≥ 0 for axis Z)
     * @param t time since the release, finite and ≥ 0
     * @return the flux along z
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxZ(double x, double y, double z, double t) {
        return -vertical * gradientZ(x, y, z, t);
    }

    /**
     * Returns the fraction of the released mass in the domain at t: that of the 1D kernel
     * along the wall's normal ({@link HalfSpaceKernel1D#massInDomain(double)}; for axes Y and
     * Z with v = 0 and D = D_T or D_V).
     *
     * @param t time, finite and ≥ 0
     * @return the fraction in [0, 1]
     * @throws IllegalArgumentException if t is invalid
     */
    public double massInDomain(double t) {
        return core.massKernel().massInDomain(t);
    }

    /**
     * Returns the fraction of the released mass that has left through the wall by t
     * ({@link HalfSpaceKernel1D#massOut(double)} along the wall's normal).
     *
     * @param t time, finite and ≥ 0
     * @return the fraction in [0, 1]
     * @throws IllegalArgumentException if t is invalid
     */
    public double massOut(double t) {
        return core.massKernel().massOut(t);
    }

    /**
     * Evaluates c at every (x[i], y[i], z[i]) at one time.
     *
     * @param x positions along the flow; not modified (unless also out)
     * @param y positions across the flow, as long as x; not modified (unless also out)
     * @param z positions in the third direction, as long as x; not modified (unless also out)
     * @param t time since the release, finite and ≥ 0
     * @param out receives the values; at least as long as x; may be an input array
     * @throws IllegalArgumentException if an argument is invalid (out then partly written)
     */
    public void value(double[] x, double[] y, double[] z, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("z", z, x.length);
        Checks.length("out", out, x.length);
        final PlaneWallCore.Frame f = core.frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = x[i];
            final double yi = y[i];
            final double zi = z[i];
            core.check(xi, yi, zi);
            out[i] = core.evaluate(f, PlaneWallCore.Quantity.VALUE, xi, yi, zi);
        }
    }

    private double eval(PlaneWallCore.Quantity q, double x, double y, double z, double t) {
        core.check(x, y, z);
        return core.evaluate(core.frame(t), q, x, y, z);
    }
}
