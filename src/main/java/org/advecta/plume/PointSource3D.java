package org.advecta.plume;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;

/**
 * A continuous point source in three dimensions: mass released at (x₀, y₀, z₀) at a constant
 * rate from t = 0 on (or with a {@link RateHistory}), carried by a uniform flow along x with
 * anisotropic dispersion, retardation and first-order decay. Immutable and thread-safe.
 *
 * <p>The concentration solves
 * {@code R ∂c/∂t = D_L ∂²c/∂x² + D_T ∂²c/∂y² + D_V ∂²c/∂z² − v ∂c/∂x − μc + q δ(x − x₀)δ(y − y₀)δ(z − z₀)}
 * with c = 0 at t = 0. The rate q is the released mass per unit time divided by whatever
 * turns mass into the concentration's units (the porosity, for a concentration per volume of
 * water): it is the rate at which ∫ R c dV grows without decay. With
 * r = √(Δx² + Δy² D_L/D_T + Δz² D_L/D_V), U = √(v² + 4μD_L) and
 * s = (Δx v − r U)/(2D_L) ≤ 0,
 * <pre>
 * c(t) = q / (8π r √(D_T D_V)) · [ e^s erfc(A) + e^(s − A²) erfcx(B) ],
 *        A = (R r − U t)/(2√(D_L R t)),  B = (R r + U t)/(2√(D_L R t))
 * c(∞) = q / (4π r √(D_T D_V)) · e^s
 * </pre>
 * the time integral of the instantaneous kernel (Carslaw &amp; Jaeger 1959, §10.4, moving point
 * source; Wexler 1992, USGS TWRI 3-B7, for the groundwater form; Hunt 1978, J. Hydraul. Div.
 * ASCE 104, for the steady state with decay; these citations and section numbers are recalled,
 * not re-checked against the books; the formula itself is checked against quadrature of the
 * kernel in the fixtures). The exponential factors are written so that
 * neither overflows at high Péclet number: e^(rU/D_L) erfc(B) = e^(−A²) erfcx(B) since
 * B² − A² = rU/D_L, and s is formed without cancellation (see the package documentation).
 *
 * <p><b>Mass flux.</b> {@link #massFlux(double, double)} is the total flux
 * ∫∫ (v c − D_L ∂c/∂x) dy dz through the plane x = X: the flux of the one-dimensional
 * continuous source, in closed form,
 * <pre>
 * F = ±(q/4) [ (1 ± v/U) e^(s₁) erfc(A₁) + (1 ∓ v/U) e^(s₁ − A₁²) erfcx(B₁) ]
 * </pre>
 * with r = |X − x₀| in A₁, B₁, s₁ and the upper signs downstream (X &gt; x₀). At steady state
 * it is q(1 + v/U)/2 · exp(−|X − x₀|(U − v)/(2D_L)) downstream, which is q when μ = 0.
 *
 * <p><b>Walls</b> ({@link #withWall(Wall)}): images across y and/or z. With reflecting walls
 * the mass flux is the free-space flux above. Beside an absorbing wall it has no closed form:
 * {@link #massFluxEstimate(double, double)} integrates the 1-D flux density j(τ) of the
 * instantaneous release times erf(a/√(4D_Tτ/R)) per absorbing wall (a the source's distance
 * from it; the transverse mass the image pair leaves on the source's side, method of images,
 * Carslaw &amp; Jaeger 1959, §2.10 and §10.10 — section numbers recalled, not re-checked)
 * over τ ∈ (0, t) by adaptive Gauss–Kronrod quadrature in log-time, with an error bound, and
 * {@link #massFlux(double, double)} returns its value.
 *
 * <p><b>Accuracy.</b> Concentrations and mass fluxes are within max(16, 2κ) ULP of the exact
 * result wherever it is a normal double (κ the componentwise condition number over all inputs
 * and parameters), for a constant rate without absorbing walls; checked against mpmath
 * fixtures whose values were confirmed by quadrature of the kernel in time. Mass fluxes by
 * quadrature ({@link #massFluxEstimate(double, double)}, and {@link #massFlux(double, double)}
 * beside an absorbing wall): the exact flux lies within the returned bound, at most 1e-10
 * relative for a constant rate (checked against mpmath fixtures confirmed by a 2-D
 * quadrature over time and the half-space); against the flow at late times, where the flux
 * is a near-cancelling difference, the bound is relative to ∫|j| instead.
 *
 * <p><b>Domain.</b> Coordinates finite; t finite and ≥ 0 (c = 0 at t = 0); the source point
 * itself is excluded (c is infinite there); with walls, points on the source's side.
 */
public final class PointSource3D {

    private static final double INV_8PI = 1 / (8 * Math.PI);

    private final Flow flow;
    private final double x0;
    private final double y0;
    private final double z0;
    private final RateHistory history;
    private final Images images;
    /** 1/(8π√(D_T D_V)). */
    private final double norm;

    private PointSource3D(Flow flow, double x0, double y0, double z0, RateHistory history,
                          Images images) {
        this.flow = flow;
        this.x0 = x0;
        this.y0 = y0;
        this.z0 = z0;
        this.history = history;
        this.images = images;
        this.norm = INV_8PI / Math.sqrt(flow.dT * flow.dV);
    }

    /**
     * Returns the source of constant rate q at (x₀, y₀, z₀), switched on at t = 0.
     *
     * @param parameters the transport parameters (D_L, D_T, D_V from
     *     {@link TransportParameters#withDispersion(double, double, double)})
     * @param x0 source position along the flow, finite
     * @param y0 source position across the flow, finite
     * @param z0 source position in the third direction, finite
     * @param rate the rate q, finite (any sign)
     * @return the source
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static PointSource3D of(TransportParameters parameters, double x0, double y0,
                                   double z0, double rate) {
        return new PointSource3D(new Flow(parameters), Checks.finite("x0", x0),
            Checks.finite("y0", y0), Checks.finite("z0", z0), RateHistory.constant(rate),
            Images.NONE);
    }

    /**
     * Returns this source with a piecewise-constant rate instead (Duhamel superposition of
     * shifted constant-rate solutions; see {@link RateHistory}).
     *
     * @param rates the rate history
     * @return the new source
     * @throws IllegalArgumentException if rates is null
     */
    public PointSource3D withRateHistory(RateHistory rates) {
        if (rates == null) {
            throw new IllegalArgumentException("rates: must not be null");
        }
        return new PointSource3D(flow, x0, y0, z0, rates, images);
    }

    /**
     * Returns this source beside a wall parallel to the flow (method of images; at most one
     * wall across y and one across z).
     *
     * @param wall the wall; the source must lie strictly on one side of it
     * @return the new source
     * @throws IllegalArgumentException if wall is null, the source is on it, or a wall on that
     *     axis is already set
     */
    public PointSource3D withWall(Wall wall) {
        final double c = wall != null && wall.axis() == Wall.Axis.Z ? z0 : y0;
        return new PointSource3D(flow, x0, y0, z0, history, images.with(wall, c, c, true));
    }

    /**
     * Returns the concentration c(x, y, z, t).
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time since the source was switched on, finite and ≥ 0
     * @return the concentration
     * @throws IllegalArgumentException if an argument is invalid or the point is the source
     */
    public double value(double x, double y, double z, double t) {
        Checks.finite("x", x);
        Checks.finite("y", y);
        Checks.finite("z", z);
        Checks.nonNegative("t", t);
        images.checkPoint(y, z);
        return sum(x, y, z, t);
    }

    /**
     * Returns the steady-state concentration c(x, y, z, ∞) for the final rate.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @return the steady concentration
     * @throws IllegalArgumentException if an argument is invalid or the point is the source
     */
    public double steadyValue(double x, double y, double z) {
        Checks.finite("x", x);
        Checks.finite("y", y);
        Checks.finite("z", z);
        images.checkPoint(y, z);
        return sum(x, y, z, Double.POSITIVE_INFINITY);
    }

    /**
     * Evaluates c at every (x[i], y[i], z[i]) at one time.
     *
     * @param x positions along the flow; not modified (unless also the output)
     * @param y positions across the flow, as long as x; not modified
     * @param z positions in the third direction, as long as x; not modified
     * @param t time, finite and ≥ 0
     * @param out receives the concentrations, at least as long as x; may be one of the inputs
     *     (each point is read before it is written)
     * @throws IllegalArgumentException if an argument is invalid (out is then partly written)
     */
    public void value(double[] x, double[] y, double[] z, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("z", z, x.length);
        Checks.length("out", out, x.length);
        Checks.nonNegative("t", t);
        for (int i = 0; i < x.length; i++) {
            final double xi = Checks.finite("x", x[i]);
            final double yi = Checks.finite("y", y[i]);
            final double zi = Checks.finite("z", z[i]);
            images.checkPoint(yi, zi);
            out[i] = sum(xi, yi, zi, t);
        }
    }

    /**
     * Returns the total mass flux through the plane x = X at time t,
     * ∫∫ (v c − D_L ∂c/∂x) dy dz over the whole plane (over the domain with walls).
     *
     * @param plane the plane's position X, finite and ≠ x₀
     * @param t time, finite and ≥ 0
     * @return the mass flux (positive along +x)
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double massFlux(double plane, double t) {
        Checks.nonNegative("t", t);
        if (images.absorbing()) {
            return massFluxEstimate(plane, t).value();
        }
        return fluxSum(plane, t);
    }

    /**
     * Returns the total mass flux through the plane x = X at time t by quadrature in time,
     * with its error bound, for any walls: F(t) = ∫₀ᵗ j(τ) Π f(τ) dτ, j the flux density of
     * the one-dimensional kernel and f = erf(a/√(4D_Tτ/R)) per absorbing wall at distance a
     * (1 for a reflecting wall); formula, derivation and method in the package-private
     * {@code WallFlux} and the class documentation. Beside an absorbing wall this is the route
     * of {@link #massFlux(double, double)}; without one it is an independent check of the
     * closed form.
     *
     * <p>Accuracy: the exact flux lies within the returned bound, which is at most 1e-10
     * relative for a constant rate (checked against mpmath); for a rate history the bound is
     * the sum of the terms' bounds.
     *
     * @param plane the plane's position X, finite and ≠ x₀
     * @param t time, finite and ≥ 0
     * @return the mass flux (positive along +x) and its error bound
     * @throws IllegalArgumentException if an argument is invalid
     */
    public Estimate massFluxEstimate(double plane, double t) {
        Checks.nonNegative("t", t);
        return fluxEstimate(flow, history, images, x0, plane, t, y0, y0, z0, z0);
    }

    /**
     * Returns the steady-state mass flux through the plane x = X for the final rate by
     * quadrature in time to τ = ∞ (see {@link #massFluxEstimate(double, double)}).
     *
     * @param plane the plane's position X, finite and ≠ x₀
     * @return the mass flux and its error bound
     * @throws IllegalArgumentException if an argument is invalid, or v = 0 and μ = 0
     */
    public Estimate steadyMassFluxEstimate(double plane) {
        return fluxEstimate(flow, history, images, x0, plane, Double.POSITIVE_INFINITY,
            y0, y0, z0, z0);
    }

    /**
     * Returns the steady-state mass flux through the plane x = X for the final rate.
     *
     * @param plane the plane's position X, finite and ≠ x₀
     * @return the mass flux
     * @throws IllegalArgumentException if an argument is invalid, or a wall is absorbing and
     *     v = 0 and μ = 0
     */
    public double steadyMassFlux(double plane) {
        if (images.absorbing()) {
            return steadyMassFluxEstimate(plane).value();
        }
        return fluxSum(plane, Double.POSITIVE_INFINITY);
    }

    private double fluxSum(double plane, double t) {
        final double dx = checkPlane(plane, x0, images);
        return superposeFlux(flow, history, dx, t);
    }

    static double checkPlane(double plane, double x0, Images images) {
        Checks.finite("plane", plane);
        final double dx = plane - x0;
        if (dx == 0) {
            throw Checks.fail("plane", plane, "must differ from the source's x0 (the flux jumps there)");
        }
        return dx;
    }

    /**
     * The mass flux by quadrature in time ({@link WallFlux}), after the checks; steady
     * (t = +∞) only with U &gt; 0.
     */
    static Estimate fluxEstimate(Flow flow, RateHistory history, Images images, double x0,
                                 double plane, double t, double yLo, double yHi, double zLo,
                                 double zHi) {
        final double dx = checkPlane(plane, x0, images);
        if (t == Double.POSITIVE_INFINITY && !(flow.u > 0)) {
            throw new IllegalArgumentException(
                "steadyMassFluxEstimate: no quadrature route without flow or decay (v = 0 and mu = 0)");
        }
        return WallFlux.estimate(flow, history, images, yLo, yHi, zLo, zHi, dx, t);
    }

    static double superposeFlux(Flow flow, RateHistory history, double dx, double t) {
        if (t == Double.POSITIVE_INFINITY) {
            return history.finalRate() * flow.sectionFlux(dx, t);
        }
        double sum = 0;
        for (int k = 0; k < history.size() && history.time(k) < t; k++) {
            sum += history.step(k) * flow.sectionFlux(dx, t - history.time(k));
        }
        return sum;
    }

    private double sum(double x, double y, double z, double t) {
        double sum = 0;
        for (int i = 0; i < images.count(); i++) {
            final double dx = x - x0;
            final double dy = (images.y(i, y) - y0) * flow.stretchY;
            final double dz = (images.z(i, z) - z0) * flow.stretchZ;
            final double rho2 = dy * dy + dz * dz;
            final double r = Math.sqrt(dx * dx + rho2);
            if (r == 0) {
                throw new IllegalArgumentException(
                    "(x, y, z) = (" + x + ", " + y + ", " + z + "): the source point itself");
            }
            final double s = flow.exponent(dx, rho2, r);
            final double sign = images.sign(i);
            if (t == Double.POSITIVE_INFINITY) {
                sum += sign * history.finalRate() * ScaledExp.value(2 * norm / r, s, 0.0);
                continue;
            }
            for (int k = 0; k < history.size() && history.time(k) < t; k++) {
                sum += sign * history.step(k) * norm / r
                    * flow.erfcPair(s, r, t - history.time(k), 1.0, 1.0);
            }
        }
        return sum;
    }
}
