package org.advecta.halfspace;

import org.advecta.internal.Checks;
import org.advecta.transport.TransportParameters;

/**
 * The Green's function of {@code R ∂c/∂t = D_L ∂²c/∂x² + D_T ∂²c/∂y² − v ∂c/∂x − μ c} in a
 * half-plane bounded by one straight {@link Wall}: the concentration after an instantaneous
 * unit point release at (x₀, y₀), the flow along x. Immutable and thread-safe.
 *
 * <p>Supported walls ({@link WallAxis}):
 * <pre>
 * X: wall x = 0 across the flow, x ≥ 0:   c = K(x, t; x₀) · g_T(y − y₀)
 * Y: wall y = 0 along the flow,  y ≥ 0:   c = G(x, t; x₀) · [g_T(y − y₀) ∓ g_T(y + y₀)]
 * </pre>
 * where K is {@link HalfSpaceKernel1D} (D = D_L, with the drift, retardation and decay, its
 * image weighted by e^{−vx₀/D_L} and, for a zero-flux wall, its erfc term), G the free 1D
 * kernel along x ({@link org.advecta.kernel.FreeSpaceKernel1D}), g_T(s) =
 * √(R/(4πD_T t))·exp(−s²R/(4D_T t)), and the sign − for an absorbing, + for a zero-flux
 * (reflecting) wall. The equation separates in x and y and each wall condition involves one
 * coordinate only, so the product of the 1D solutions solves it (Carslaw &amp; Jaeger 1959,
 * §10.10 (recalled), for products of one-dimensional Green's functions). For the wall
 * parallel to the flow there is no drift across it, and the image is the plain mirror copy.
 *
 * <p>Mass: {@link #massInDomain(double)} and {@link #massOut(double)} are those of the 1D
 * kernel along the wall's normal (the other factor integrates to 1).
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
public final class HalfSpaceKernel2D {

    private final PlaneWallCore core;
    private final double transverse;

    private HalfSpaceKernel2D(PlaneWallCore core, double transverse) {
        this.core = core;
        this.transverse = transverse;
    }

    /**
     * Returns the kernel of a unit release at (x₀, y₀) next to a wall.
     *
     * @param parameters v (along x), D_L, D_T, R, μ
     * @param wall the wall condition
     * @param axis {@link WallAxis#X} (wall x = 0; x₀ &gt; 0) or {@link WallAxis#Y} (wall
     *     y = 0; y₀ &gt; 0)
     * @param x0 release point along the flow, finite (and &gt; 0 for axis X)
     * @param y0 release point across the flow, finite (and &gt; 0 for axis Y)
     * @return the kernel
     * @throws IllegalArgumentException if an argument is null or invalid, or axis is Z
     */
    public static HalfSpaceKernel2D of(TransportParameters parameters, Wall wall, WallAxis axis,
                                       double x0, double y0) {
        final PlaneWallCore core = new PlaneWallCore(parameters, wall, axis, false, x0, y0, 0.0);
        return new HalfSpaceKernel2D(core, parameters.transverseDispersion());
    }

    /**
     * Returns c(x, y, t).
     *
     * @param x position along the flow (≥ 0 for axis X), finite
     * @param y position across the flow (≥ 0 for axis Y), finite
     * @param t time since the release, finite and ≥ 0
     * @return the concentration per unit released
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double value(double x, double y, double t) {
        return eval(PlaneWallCore.Quantity.VALUE, x, y, t);
    }

    /**
     * Returns ∂c/∂x.
     *
     * @param x position along the flow (≥ 0 for axis X), finite
     * @param y position across the flow (≥ 0 for axis Y), finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂c/∂x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientX(double x, double y, double t) {
        return eval(PlaneWallCore.Quantity.GRADIENT_X, x, y, t);
    }

    /**
     * Returns ∂c/∂y.
     *
     * @param x position along the flow (≥ 0 for axis X), finite
     * @param y position across the flow (≥ 0 for axis Y), finite
     * @param t time since the release, finite and ≥ 0
     * @return ∂c/∂y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double gradientY(double x, double y, double t) {
        return eval(PlaneWallCore.Quantity.GRADIENT_Y, x, y, t);
    }

    /**
     * Returns the x-component of the total flux, v·c − D_L·∂c/∂x.
     *
     * @param x position along the flow (≥ 0 for axis X), finite
     * @param y position across the flow (≥ 0 for axis Y), finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along x
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxX(double x, double y, double t) {
        return eval(PlaneWallCore.Quantity.FLUX_X, x, y, t);
    }

    /**
     * Returns the y-component of the total flux, −D_T·∂c/∂y.
     *
     * @param x position along the flow (≥ 0 for axis X), finite
     * @param y position across the flow (≥ 0 for axis Y), finite
     * @param t time since the release, finite and ≥ 0
     * @return the flux along y
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double fluxY(double x, double y, double t) {
        return -transverse * gradientY(x, y, t);
    }

    /**
     * Returns the fraction of the released mass in the domain at t: that of the 1D kernel
     * along the wall's normal ({@link HalfSpaceKernel1D#massInDomain(double)}; for axis Y with
     * v = 0 and D = D_T).
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
     * Evaluates c at every (x[i], y[i]) at one time.
     *
     * @param x positions along the flow; not modified (unless also out)
     * @param y positions across the flow, as long as x; not modified (unless also out)
     * @param t time since the release, finite and ≥ 0
     * @param out receives the values; at least as long as x; may be x or y
     * @throws IllegalArgumentException if an argument is invalid (out then partly written)
     */
    public void value(double[] x, double[] y, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("out", out, x.length);
        final PlaneWallCore.Frame f = core.frame(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = x[i];
            final double yi = y[i];
            core.check(xi, yi, 0.0);
            out[i] = core.evaluate(f, PlaneWallCore.Quantity.VALUE, xi, yi, 0.0);
        }
    }

    private double eval(PlaneWallCore.Quantity q, double x, double y, double t) {
        core.check(x, y, 0.0);
        return core.evaluate(core.frame(t), q, x, y, 0.0);
    }
}
