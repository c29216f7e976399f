package org.advecta.plume;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.quadrature.Estimate;
import org.advecta.special.ErrorFunctions;
import org.advecta.transport.TransportParameters;

/**
 * A continuous patch source in three dimensions: mass released uniformly over the rectangle
 * x = x₀, y₁ ≤ y ≤ y₂, z₁ ≤ z ≤ z₂ (normal to the flow, e.g. the downstream face of a
 * contaminated zone) at a constant total rate from t = 0 on (or with a {@link RateHistory}),
 * with uniform flow along x, anisotropic dispersion, retardation and first-order decay.
 * Immutable and thread-safe.
 *
 * <p>The source term is q/((y₂ − y₁)(z₂ − z₁)) δ(x − x₀) on the rectangle, q the total rate
 * (divided by the porosity for a concentration per volume of water). Integrating the
 * instantaneous kernel over the rectangle and over time (Carslaw &amp; Jaeger 1959, §10.4, the
 * superposition of point sources; the same integral as Wexler 1992, USGS TWRI 3-B7, for a
 * finite patch, here evaluated to full accuracy rather than approximated):
 * <pre>
 * c(t) = q/(R·A) ∫₀ᵗ e^(−μτ/R) √(R/(4πD_L τ)) e^(−R(Δx − vτ/R)²/(4D_L τ)) S_y(τ) S_z(τ) dτ,
 * S_y(τ) = ½[erf((y − y₁)/√(4D_T τ/R)) − erf((y − y₂)/√(4D_T τ/R))]   (S_z likewise, D_V)
 * </pre>
 * with A the area. The steady state is the same integral to t = ∞.
 *
 * <p><b>Method.</b> The integral is taken in w = ln(τ/τ_c), which turns the τ^(−1/2)
 * singularity on the patch into an exponentially decaying tail; τ_c maximises the bound
 * √τ·exp(−a/τ − bτ) of the integrand, where a adds to R Δx²/(4D_L) the squared distances
 * from the rectangle (each S factor is at most ½ exp(−d²R/(4Dτ)) outside it, and the
 * integrand is evaluated with that factor divided out, through erfcx). The range is cut where
 * the bound falls below e^(−50) of its peak (tail bound added to the error), and the rest is
 * integrated by adaptive Gauss–Kronrod (7/15) to a relative 1e-13. A {@link RateHistory} is
 * the Duhamel integral ∫₀ᵗ q(t − τ) g(τ) dτ split at τ = t − t_k: each piece is the window
 * τ ∈ [t − t_(k+1), t − t_k] of the same integrand, with τ_c its end nearest the peak (or the
 * peak inside it), cut and bounded likewise, its ends formed from the exact differences
 * t − t_k. Beside an absorbing wall the images are not integrated separately: each strip
 * factor is replaced by the strip minus its mirror (or plus, for a reflecting wall on the
 * other axis), S(c) − S(2c_w − c) = ½[H(a₁) − H(a₂)] with H(a) = erf((a + Y)/w) − erf((a − Y)/w),
 * Y the point's and a₁ &lt; a₂ the strip's distances from the wall (the method of images,
 * Carslaw &amp; Jaeger 1959, §10.10; the rearrangement is exact algebra). H is proportional to Y
 * near the wall and is evaluated without cancellation (a series of Hermite polynomials for
 * narrow intervals, else erfcx; beyond the strip, where both H are near 2, the direct
 * difference of the strip and its mirror). The integrand stays ≥ 0, the tails' bounds carry
 * the factor's bounds (at most min(2Y, a₂ − a₁)/(√π w) and 4a₂Y(a₂ − a₁)/(√π w³)), and the
 * rounding term includes the cancellation ratio (H(a₁) + H(a₂))/(H(a₁) − H(a₂)) that is left,
 * which grows only when the spread w is much larger than the strip's distances (late times:
 * about 140 at t = 5000 in the fixture).
 *
 * <p><b>Mass flux</b> through the whole plane x = X: the closed form of
 * {@link PointSource3D#massFlux(double, double)} with the total rate (the rectangle's
 * extent does not matter once the plane is integrated over). Beside an absorbing wall it
 * does: {@link #massFluxEstimate} integrates the 1-D flux density times, per absorbing wall,
 * the mean of erf(a/√(4D_Tτ/R)) over the rectangle's distances a ∈ [a₁, a₂] from it
 * (the mean of the point source's factor over the uniformly spread release).
 *
 * <p><b>Accuracy.</b> The exact value lies within the returned error bound (checked against
 * mpmath), and for a constant rate without walls the bound is at most 1e-10 relative (it
 * includes the rounding of the exponents). The same holds for a rate history whose rates are
 * all ≥ 0 (its windows' integrands are ≥ 0; checked against mpmath on pulses, also long after
 * the release); with a negative rate the bound is relative to Σ|q_k|·(window) instead.
 * Beside absorbing walls (across y, z or both, also with a reflecting one) the same holds,
 * relative to the (small) result itself: the bound is at most 1e-10 relative also at 1e-6 of
 * the wall–edge distance from a wall, late, at steady state and with decay (checked against
 * mpmath, where it is below 4e-13 and errors below 5e-14; before, the difference of the
 * separately integrated images had bounds of up to 3e-3 relative there), and the value on an
 * absorbing wall is exactly 0. Beside reflecting walls only, the bound is the sum of the
 * images' bounds (no cancellation). The mass fluxes are within max(16, 2κ) ULP, for a constant rate without
 * absorbing walls; beside one, within the bound {@link #massFluxEstimate} returns (at most
 * 1e-10 relative for a constant rate).
 *
 * <p><b>Domain.</b> Coordinates finite (points on the patch included); t finite and ≥ 0; the
 * steady state needs U = √(v² + 4μD_L) &gt; 0; with walls, points on the patch's side.
 */
public final class PatchSource3D {

    static final double CUT = LineSource2D.CUT;
    private static final double TAIL = Math.exp(-CUT);

    private final Flow flow;
    private final double x0;
    private final double y1;
    private final double y2;
    private final double z1;
    private final double z2;
    private final RateHistory history;
    private final Images images;
    /** b = U²/(4 D_L R). */
    private final double b;
    /** √(R/(4π D_L)) / (R · area). */
    private final double norm;

    private PatchSource3D(Flow flow, double x0, double y1, double y2, double z1, double z2,
                          RateHistory history, Images images) {
        this.flow = flow;
        this.x0 = x0;
        this.y1 = y1;
        this.y2 = y2;
        this.z1 = z1;
        this.z2 = z2;
        this.history = history;
        this.images = images;
        this.b = flow.u * flow.u / (4 * flow.dL * flow.retardation);
        final double area = (y2 - y1) * (z2 - z1);
        if (!(area > 0 && area < Double.POSITIVE_INFINITY)) {
            throw Checks.fail("area", area, "(y2 - y1)(z2 - z1) must be finite and > 0");
        }
        this.norm = Math.sqrt(flow.retardation / (4 * Math.PI * flow.dL))
            / (flow.retardation * area);
    }

    /**
     * Returns the patch source of total rate q on the rectangle x = x₀, y₁ ≤ y ≤ y₂,
     * z₁ ≤ z ≤ z₂, switched on at t = 0.
     *
     * @param parameters the transport parameters
     * @param x0 the rectangle's position along the flow, finite
     * @param y1 its lower edge in y, finite
     * @param y2 its upper edge in y, finite and &gt; y1
     * @param z1 its lower edge in z, finite
     * @param z2 its upper edge in z, finite and &gt; z1
     * @param rate the total rate q, finite (any sign)
     * @return the source
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static PatchSource3D of(TransportParameters parameters, double x0, double y1,
                                   double y2, double z1, double z2, double rate) {
        Checks.finite("y1", y1);
        Checks.finite("z1", z1);
        if (!(Checks.finite("y2", y2) > y1)) {
            throw Checks.fail("y2", y2, "must be greater than y1 = " + y1);
        }
        if (!(Checks.finite("z2", z2) > z1)) {
            throw Checks.fail("z2", z2, "must be greater than z1 = " + z1);
        }
        return new PatchSource3D(new Flow(parameters), Checks.finite("x0", x0), y1, y2, z1, z2,
            RateHistory.constant(rate), Images.NONE);
    }

    /**
     * Returns this source with a piecewise-constant rate instead: the Duhamel integral
     * ∫₀ᵗ q(t − τ) g(τ) dτ, split where the rate changes (see {@link RateHistory}; the bound
     * is at most 1e-10 relative when every rate is ≥ 0).
     *
     * @param rates the rate history (total rates)
     * @return the new source
     * @throws IllegalArgumentException if rates is null
     */
    public PatchSource3D withRateHistory(RateHistory rates) {
        if (rates == null) {
            throw new IllegalArgumentException("rates: must not be null");
        }
        return new PatchSource3D(flow, x0, y1, y2, z1, z2, rates, images);
    }

    /**
     * Returns this source beside a wall parallel to the flow (method of images; at most one
     * wall across y and one across z; beside an absorbing wall the images enter the strip
     * factors inside the time integral, so that {@link #estimate}'s bound stays relative to
     * the result near the wall).
     *
     * @param wall the wall; the rectangle must lie on one side (it may touch a reflecting
     *     wall)
     * @return the new source
     * @throws IllegalArgumentException if the wall is null, cuts the rectangle, or a wall on
     *     that axis is already set
     */
    public PatchSource3D withWall(Wall wall) {
        final boolean z = wall != null && wall.axis() == Wall.Axis.Z;
        return new PatchSource3D(flow, x0, y1, y2, z1, z2, history,
            images.with(wall, z ? z1 : y1, z ? z2 : y2, true));
    }

    /**
     * Returns the concentration c(x, y, z, t) with its quadrature error bound.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time, finite and ≥ 0
     * @return the concentration and its error bound
     * @throws IllegalArgumentException if an argument is invalid
     */
    public Estimate estimate(double x, double y, double z, double t) {
        Checks.nonNegative("t", t);
        checkPoint(x, y, z);
        final Evaluator e = new Evaluator();
        e.evaluate(x, y, z, t);
        return Estimate.of(e.value, e.error);
    }

    /**
     * Returns the concentration c(x, y, z, t) (the value of {@link #estimate}).
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @param t time, finite and ≥ 0
     * @return the concentration
     * @throws IllegalArgumentException if an argument is invalid
     */
    public double value(double x, double y, double z, double t) {
        return estimate(x, y, z, t).value();
    }

    /**
     * Returns the steady-state concentration for the final rate, with its error bound.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param z position in the third direction, finite
     * @return c(x, y, z, ∞) and its error bound
     * @throws IllegalArgumentException if an argument is invalid, or v = 0 and μ = 0
     */
    public Estimate steadyEstimate(double x, double y, double z) {
        checkPoint(x, y, z);
        if (!(flow.u > 0)) {
            throw new IllegalArgumentException(
                "steadyEstimate: not available without flow or decay (v = 0 and mu = 0)");
        }
        final Evaluator e = new Evaluator();
        e.evaluate(x, y, z, Double.POSITIVE_INFINITY);
        return Estimate.of(e.value, e.error);
    }

    /**
     * Evaluates c and its error bound at every point at one time, reusing one quadrature
     * workspace.
     *
     * @param x positions along the flow; not modified
     * @param y positions across the flow, as long as x; not modified
     * @param z positions in the third direction, as long as x; not modified
     * @param t time, finite and ≥ 0
     * @param out receives the concentrations, at least as long as x; may be an input
     * @param error receives the error bounds, or null; if given, a different array from out
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void value(double[] x, double[] y, double[] z, double t, double[] out,
                      double[] error) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("z", z, x.length);
        Checks.length("out", out, x.length);
        if (error != null) {
            Checks.length("error", error, x.length);
            Checks.distinct(out, error);
        }
        Checks.nonNegative("t", t);
        final Evaluator e = new Evaluator();
        for (int i = 0; i < x.length; i++) {
            checkPoint(x[i], y[i], z[i]);
            e.evaluate(x[i], y[i], z[i], t);
            out[i] = e.value;
            if (error != null) {
                error[i] = e.error;
            }
        }
    }

    /**
     * Returns the total mass flux through the plane x = X at time t, in closed form.
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
        return PointSource3D.superposeFlux(flow, history,
            PointSource3D.checkPlane(plane, x0, images), t);
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
        return PointSource3D.superposeFlux(flow, history,
            PointSource3D.checkPlane(plane, x0, images), Double.POSITIVE_INFINITY);
    }

    /**
     * Returns the mass flux through the plane x = X at time t by quadrature in time, with its
     * error bound, for any walls (see {@link PointSource3D#massFluxEstimate(double, double)};
     * for this source the factor of an absorbing wall is the mean of erf(a/√(4D_Tτ/R)) over
     * the source's distances a from the wall). Beside an absorbing wall this is the route of
     * {@link #massFlux(double, double)}.
     *
     * <p>Accuracy: the exact flux lies within the returned bound, which is at most 1e-10
     * relative for a constant rate (checked against mpmath).
     *
     * @param plane the plane's position X, finite and ≠ x₀
     * @param t time, finite and ≥ 0
     * @return the mass flux (positive along +x) and its error bound
     * @throws IllegalArgumentException if an argument is invalid
     */
    public Estimate massFluxEstimate(double plane, double t) {
        Checks.nonNegative("t", t);
        return PointSource3D.fluxEstimate(flow, history, images, x0, plane, t, y1, y2, z1, z2);
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
        return PointSource3D.fluxEstimate(flow, history, images, x0, plane,
            Double.POSITIVE_INFINITY, y1, y2, z1, z2);
    }

    private void checkPoint(double x, double y, double z) {
        Checks.finite("x", x);
        Checks.finite("y", y);
        Checks.finite("z", z);
        images.checkPoint(y, z);
    }

    /** Distance from c to the interval [lo, hi] (0 inside). */
    private static double outside(double c, double lo, double hi) {
        return c > hi ? c - hi : c < lo ? lo - c : 0.0;
    }

    /**
     * S(τ)·exp(d²/w²) with S = ½[erf((c − lo)/w) − erf((c − hi)/w)] and d the distance from c
     * to [lo, hi]: outside, ½[erfcx(p) − e^(p² − q²) erfcx(q)] with p = d/w &lt; q = p + width/w
     * (A&amp;S 7.1.2); inside, ½[erf((c − lo)/w) + erf((hi − c)/w)], two positive terms.
     */
    static double scaledStrip(double c, double lo, double hi, double w) {
        if (c >= hi || c <= lo) {
            final double p = (c >= hi ? c - hi : lo - c) / w;
            final double width = (hi - lo) / w;
            final double q = p + width;
            return 0.5 * (ErrorFunctions.erfcx(p)
                - ScaledExp.value(ErrorFunctions.erfcx(q), -width * (q + p), 0.0));
        }
        return 0.5 * (ErrorFunctions.erf((c - lo) / w) + ErrorFunctions.erf((hi - c) / w));
    }

    /** One evaluation's workspace and result (not thread-safe; one per call or batch). */
    private final class Evaluator implements TimeQuadrature.Integrand {
        private final TimeQuadrature quadrature = new TimeQuadrature();
        private final TimeWindow window = new TimeWindow();
        private double alpha;
        private double beta;
        private double tauC;
        private double yy;
        private double zz;
        /** Whether the images are combined inside the integrand (an absorbing wall). */
        private boolean combined;
        /** A wall factor and its cancellation ratio ({@link WallStrips}). */
        private final double[] strip = new double[2];
        /** The largest summed cancellation ratio of the walls' factors in this integral. */
        private double kappa;
        double value;
        double error;

        @Override
        public double at(double w) {
            final double tau = tauC * Math.exp(w);
            final double e = -0.5 * w + alpha * Math.expm1(-w) + beta * Math.expm1(w);
            final double wy = Math.sqrt(4 * flow.dT * tau / flow.retardation);
            final double wz = Math.sqrt(4 * flow.dV * tau / flow.retardation);
            if (!combined) {
                return Math.exp(-e) * scaledStrip(yy, y1, y2, wy) * scaledStrip(zz, z1, z2, wz);
            }
            final double sy = factor(images.wallY, images.sideY, yy, y1, y2, wy);
            final double k = strip[1];
            final double sz = factor(images.wallZ, images.sideZ, zz, z1, z2, wz);
            final double g = Math.exp(-e) * sy * sz;
            if (g > 0) {
                // relative rounding: each factor's difference within 16·2⁻⁵³ times its ratio
                kappa = Math.max(kappa, k + strip[1]);
            }
            return g;
        }

        /** The smallest coefficient c of the absorbing factors' bounds c·e^(−w/2). */
        private double leftFactor() {
            double c = 1;
            final double wy = Math.sqrt(4 * flow.dT * tauC / flow.retardation);
            final double wz = Math.sqrt(4 * flow.dV * tauC / flow.retardation);
            if (images.wallY != null && images.wallY.isAbsorbing()) {
                c = Math.min(c, WallStrips.bound(yy, y1, y2, wy, images.wallY.position(),
                    images.sideY, true));
            }
            if (images.wallZ != null && images.wallZ.isAbsorbing()) {
                c = Math.min(c, WallStrips.bound(zz, z1, z2, wz, images.wallZ.position(),
                    images.sideZ, true));
            }
            return c;
        }

        /** The product of the absorbing factors' bounds at w (each ≤ 1, non-increasing). */
        private double rightFactor(double w) {
            final double tau = tauC * Math.exp(w);
            double f = 1;
            if (images.wallY != null && images.wallY.isAbsorbing()) {
                f *= WallStrips.bound(yy, y1, y2, Math.sqrt(4 * flow.dT * tau / flow.retardation),
                    images.wallY.position(), images.sideY, false);
            }
            if (images.wallZ != null && images.wallZ.isAbsorbing()) {
                f *= WallStrips.bound(zz, z1, z2, Math.sqrt(4 * flow.dV * tau / flow.retardation),
                    images.wallZ.position(), images.sideZ, false);
            }
            return f;
        }

        /** One axis's strip factor with its wall's image inside (scaled as scaledStrip). */
        private double factor(Wall wall, int side, double c, double lo, double hi, double w) {
            if (wall == null) {
                strip[1] = 0;
                return scaledStrip(c, lo, hi, w);
            }
            if (wall.isAbsorbing()) {
                WallStrips.absorbing(c, lo, hi, w, wall.position(), side, strip);
            } else {
                WallStrips.reflecting(c, lo, hi, w, wall.position(), strip);
            }
            return strip[0];
        }

        /**
         * c(t) = Σₖ qₖ ∫ g(τ) dτ over τ ∈ [t − t_(k+1), t − tₖ] (from 0 for the current
         * piece): the Duhamel integral ∫₀ᵗ q(t − τ) g(τ) dτ split where the rate changes
         * ({@link TimeWindow}); every window's integrand is ≥ 0, so its bound is relative to
         * its own value. For t = ∞, the final rate times the integral to ∞.
         */
        void evaluate(double x, double y, double z, double t) {
            double v = 0;
            double err = 0;
            // beside an absorbing wall: one integral of the free term minus its images, each
            // axis's strip factor formed with its image inside (WallStrips), so that the bound
            // is relative to the result; else the sum over the images
            combined = images.absorbing();
            final int terms = combined ? 1 : images.count();
            for (int i = 0; i < terms; i++) {
                yy = images.y(i, y);
                zz = images.z(i, z);
                if (t == Double.POSITIVE_INFINITY) {
                    window.whole(t);
                    integrate(x - x0);
                    final double f = images.sign(i) * history.finalRate();
                    v += f * value;
                    err += Math.abs(f) * error;
                    continue;
                }
                for (int k = 0; k < history.size() && history.time(k) < t; k++) {
                    final double q = history.rate(k);
                    if (q == 0) {
                        continue;
                    }
                    window.set(history, k, t);
                    integrate(x - x0);
                    final double f = images.sign(i) * q;
                    v += f * value;
                    err += Math.abs(f) * error;
                }
            }
            value = v;
            error = err;
        }

        /**
         * The unit-rate integral over the window set in {@link #window}, at offset dx and point
         * (yy, zz): its value and error bound.
         */
        private void integrate(double dx) {
            final double r = flow.retardation;
            final double dy = outside(yy, y1, y2);
            final double dz = outside(zz, z1, z2);
            final double aX = r * dx * dx / (4 * flow.dL);
            final double aYZ = r * dy * dy / (4 * flow.dT) + r * dz * dz / (4 * flow.dV);
            final double a = aX + aYZ;
            // the maximum of σ/2 − a e^−σ − b e^σ: b X² − X/2 − a = 0
            final double peak = b > 0 ? (0.5 + Math.sqrt(0.25 + 4 * a * b)) / (2 * b)
                : Double.POSITIVE_INFINITY;
            final double bHi = window.upper[0];
            final double aHi = window.lower[0];
            // w = ln(τ/τ_c), τ_c the window's end nearest the peak, or the peak inside it
            if (bHi <= peak) {
                tauC = bHi;
                window.place(TimeWindow.Normalisation.UPPER, 0, 0);
            } else if (aHi > peak) {
                tauC = aHi;
                window.place(TimeWindow.Normalisation.LOWER, 0, 0);
            } else {
                tauC = peak;
                window.place(TimeWindow.Normalisation.PEAK, Math.log(bHi / tauC),
                    Math.log(aHi / tauC));
            }
            alpha = a / tauC;
            beta = b * tauC;
            if (!(alpha + beta < Double.POSITIVE_INFINITY)) {
                // the exponent is infinite on the whole window but at one point (τ_c tiny or
                // huge): the exact value is below MIN_VALUE, and so is its prefactor
                value = 0;
                error = 0;
                return;
            }
            final double wA = window.wA;
            final double wB = window.wB;
            // left cut: E(w) ≥ |w|/2 − β and E(w) ≥ α(e^|w| − 1) − β; an end inside a cut
            // needs no tail
            final double alphaCut = alpha > 0 ? Math.log1p((CUT + beta) / alpha)
                : Double.POSITIVE_INFINITY;
            final double lo = -Math.min(2 * (CUT + beta), alphaCut);
            double tail = wA <= lo ? 2 * TAIL : 0;
            if (combined && tail > 0 && alphaCut <= 2 * (CUT + beta)) {
                // an absorbing factor is at most c·e^(−w/2) (WallStrips.bound, c at τ_c), and
                // e^(−E) ≤ e^(w/2 + β − α(e^(−w) − 1)): the left tail is at most
                // c·e^(−CUT)/(α + CUT + β), relative to the (small) result near the wall
                tail = Math.min(tail, leftFactor() * TAIL / (alpha + CUT + beta));
            }
            double hi = wB;
            if (wB > 0) {
                // right cut: β(e^w − 1) − w/2 − α ≥ CUT, by fixed-point iteration plus a margin
                double w = 0;
                for (int j = 0; j < 6; j++) {
                    w = Math.log1p((CUT + alpha + 0.5 * w) / beta);
                }
                final double cut = Math.log1p((CUT + alpha + 0.5 * w + 1) / beta);
                if (cut < wB) {
                    hi = cut;
                    // beyond the cut the absorbing factors are at most their bound there
                    // (non-increasing in τ)
                    tail += TAIL / (CUT + 0.5) * (combined ? rightFactor(cut) : 1.0);
                }
            }
            kappa = 0;
            quadrature.integrate(this, Math.max(lo, wA), hi, 0.0);
            // the ends' rounding (an end beyond a cut is covered by the tail bound)
            final double ends = window.endError(wA > lo ? at(wA) : 0.0,
                wB <= hi && wB < Double.POSITIVE_INFINITY ? at(wB) : 0.0);
            // exponent at τ_c: Δx v/(2D_L) − a/τ_c − bτ_c = −ξ² − μτ_c/R − aYZ/τ_c
            final double xi = (r * dx - flow.velocity * tauC)
                / (2 * Math.sqrt(flow.dL * r) * Math.sqrt(tauC));
            final double shift = -flow.decay * tauC / r - aYZ / tauC;
            final double scale = ScaledExp.value(norm * Math.sqrt(tauC), shift, xi);
            value = scale * quadrature.value();
            // quadrature, tails and ends, plus rounding: of the prefactor's exponent (relative
            // 8·2⁻⁵³ per unit of its size) and of the integrand's exponent, whose terms of size
            // (α + β)|w| cancel near the peak, where |w| ~ √(CUT/(α + β))
            error = value == 0 ? scale * (quadrature.error() + tail + ends)
                : scale * (quadrature.error() + tail + ends) + Math.abs(value)
                    * (LineSource2D.ROUNDING * (16 + 8 * (xi * xi - shift)
                        + 8 * Math.sqrt(CUT * (alpha + beta)) + 16 * kappa));
        }
    }
}
