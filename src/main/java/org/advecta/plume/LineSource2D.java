package org.advecta.plume;

import org.advecta.internal.Checks;
import org.advecta.internal.ScaledExp;
import org.advecta.quadrature.Estimate;
import org.advecta.special.ModifiedBessel;
import org.advecta.transport.TransportParameters;

/**
 * A continuous line source in two dimensions (a fully penetrating well, or a source line
 * across the whole depth of an aquifer): mass released along the vertical line through
 * (x₀, y₀) at a constant rate per unit length from t = 0 on (or with a {@link RateHistory}),
 * with uniform flow along x, anisotropic dispersion, retardation and first-order decay.
 * Immutable and thread-safe.
 *
 * <p>The concentration solves
 * {@code R ∂c/∂t = D_L ∂²c/∂x² + D_T ∂²c/∂y² − v ∂c/∂x − μc + q δ(x − x₀)δ(y − y₀)}, c = 0 at
 * t = 0, with q the rate per unit length (divided by the porosity for a concentration per
 * volume of water). With r = √(Δx² + Δy² D_L/D_T), U = √(v² + 4μD_L) and
 * s = (Δx v − rU)/(2D_L) ≤ 0:
 * <pre>
 * c(t) = q e^(Δx v/(2D_L)) / (4π √(D_L D_T)) · ∫₀ᵗ exp(−R r²/(4D_L τ) − U²τ/(4D_L R)) dτ/τ
 * c(∞) = q / (2π √(D_L D_T)) · e^s · [e^z K₀(z)],   z = rU/(2D_L)
 * </pre>
 * the time integral of the instantaneous kernel (Carslaw &amp; Jaeger 1959, §10.4; the integral
 * is Hantush's leaky-well function W(u, β) at u = R r²/(4D_L t), β = z, Hantush &amp; Jacob 1955) and its
 * limit, 2K₀(z) (Abramowitz &amp; Stegun 9.6.24; the steady state of Bear 1972, §10.6).
 * Citations recalled, not re-checked; both forms are checked against mpmath quadrature of the
 * kernel in the fixtures.
 *
 * <p><b>Method.</b> The finite-time integral is evaluated in w = ln(τ/τ_c), τ_c the
 * integrand's peak (or t when the peak is later), where the integrand is
 * exp(−α(e^(−w) − 1) − β(e^w − 1)): smooth, with no singularity at τ → 0 and exactly 1 at
 * its peak; the range is cut where the exponent reaches 50 (the tail bound is added to the
 * error), and the rest is integrated by adaptive Gauss–Kronrod (7/15) to a relative 1e-13
 * (see {@link Estimate}). A {@link RateHistory} is the same integral with the rate inside,
 * ∫₀ᵗ q(t − τ) g(τ) dτ, split at τ = t − t_k: each piece is the window of the same integrand
 * over τ ∈ [t − t_(k+1), t − t_k], normalised at its end nearest the peak (or at the peak
 * inside it), cut and bounded likewise (a window end inside the cut needs no tail), with its
 * ends kept to a few units of rounding of the window's own width (the differences t − t_k
 * are formed exactly). Beside an absorbing wall y = y_w the image's kernel differs from the
 * free one only in the transverse distance, (2y_w − y − y₀)² − (y − y₀)² = 4(y − y_w)(y₀ − y_w),
 * so the difference of the two is integrated as one non-negative integrand,
 * <pre>
 * g_free(τ) − g_image(τ) = g_free(τ)·(−expm1(−c/τ)),   c = R(y − y_w)(y₀ − y_w)/D_T ≥ 0,
 * </pre>
 * with no cancellation near the wall (where c/τ is small) or late (the method of images,
 * Carslaw &amp; Jaeger 1959, §10.10; the factorisation is exact algebra); the tails' bounds carry
 * the factor too (at most γe^(−w) on the left, γ = c/τ_n, and its value at the cut on the
 * right). A reflecting wall adds its image's integral. The steady state uses
 * {@link ModifiedBessel#k0Scaled(double)} and exists only when U &gt; 0 (v ≠ 0 or μ &gt; 0).
 *
 * <p><b>Mass flux</b> through the line x = X (per unit depth): the closed form of
 * {@link PointSource3D#massFlux(double, double)}, which it shares; beside an absorbing wall,
 * the quadrature in time with the factor erf(a/√(4D_Tτ/R)) of
 * {@link PointSource3D#massFluxEstimate(double, double)} ({@link #massFluxEstimate}).
 *
 * <p><b>Accuracy.</b> {@link #estimate(double, double, double)}: the exact value lies within
 * the returned error bound (checked against mpmath), and for a constant rate without walls
 * the bound is at most 1e-10 relative (it includes the rounding of the exponent, about
 * 8·2⁻⁵³ per unit of |s| + A², so very early times far from the source, whose values are
 * below about 1e-300, come closest); measured errors are below 3e-13. For a rate history whose
 * rates are all ≥ 0 the same holds: its windows' integrands are ≥ 0, so the bound is at most
 * 1e-10 relative to the result itself, also long after a release has ended (checked against
 * mpmath on pulses); with a negative rate it is relative to Σ|q_k|·(window) instead. Beside
 * an absorbing wall the same holds, relative to the (small) result itself: the bound is at
 * most 1e-10 relative also at 1e-6 of the source–wall distance from the wall, late and with
 * decay (checked against mpmath, where it is below 3e-13 and errors below 1e-13; before,
 * the difference of the separately integrated terms had bounds of up to 4e-8 there), and
 * the value on the wall is exactly 0. Beside a reflecting wall the bound is the sum of the
 * two terms' bounds (no cancellation). {@link #steadyValue(double, double)} and the mass
 * fluxes: within max(16, 2κ) ULP wherever the result is a normal double, for a constant rate
 * without absorbing walls (beside one, the steady state superposes its two K₀ terms, κ
 * including their cancellation); beside one, the mass fluxes within the bound
 * {@link #massFluxEstimate} returns (at most 1e-10 relative for a constant rate).
 *
 * <p><b>Domain.</b> Coordinates finite; t finite and ≥ 0; the source line itself is excluded
 * (c is infinite there); with a wall (across y), points on the source's side.
 */
public final class LineSource2D {

    /** Where the exponent of the truncated integrand reaches this, the tails are cut. */
    static final double CUT = 50;
    private static final double TAIL = Math.exp(-CUT);
    /** |w| beyond which α e^|w| &gt; 1e300·α: the integrand is 0 there for any α ≥ MIN_VALUE. */
    static final double FAR = 1500;
    /** 2⁻⁵³, the unit roundoff. */
    static final double ROUNDING = 0x1.0p-53;

    private final Flow flow;
    private final double x0;
    private final double y0;
    private final RateHistory history;
    private final Images images;
    /** 1/(4π√(D_L D_T)). */
    private final double norm;

    private LineSource2D(Flow flow, double x0, double y0, RateHistory history, Images images) {
        this.flow = flow;
        this.x0 = x0;
        this.y0 = y0;
        this.history = history;
        this.images = images;
        this.norm = 1 / (4 * Math.PI * Math.sqrt(flow.dL * flow.dT));
    }

    /**
     * Returns the line source of constant rate q per unit length through (x₀, y₀), switched on
     * at t = 0.
     *
     * @param parameters the transport parameters (D_L and D_T; D_V is not used)
     * @param x0 source position along the flow, finite
     * @param y0 source position across the flow, finite
     * @param rate the rate per unit length q, finite (any sign)
     * @return the source
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static LineSource2D of(TransportParameters parameters, double x0, double y0,
                                  double rate) {
        return new LineSource2D(new Flow(parameters), Checks.finite("x0", x0),
            Checks.finite("y0", y0), RateHistory.constant(rate), Images.NONE);
    }

    /**
     * Returns this source with a piecewise-constant rate instead: the Duhamel integral
     * ∫₀ᵗ q(t − τ) g(τ) dτ, split where the rate changes (see {@link RateHistory}; the bound
     * is at most 1e-10 relative when every rate is ≥ 0).
     *
     * @param rates the rate history
     * @return the new source
     * @throws IllegalArgumentException if rates is null
     */
    public LineSource2D withRateHistory(RateHistory rates) {
        if (rates == null) {
            throw new IllegalArgumentException("rates: must not be null");
        }
        return new LineSource2D(flow, x0, y0, rates, images);
    }

    /**
     * Returns this source beside a wall y = y_w parallel to the flow (method of images; beside
     * an absorbing wall the free term minus its image is integrated as one non-negative
     * integrand, so that {@link #estimate}'s bound stays relative to the result near the
     * wall).
     *
     * @param wall the wall, across y; the source must lie strictly on one side of it
     * @return the new source
     * @throws IllegalArgumentException if the wall is null, across z, already set, or through
     *     the source
     */
    public LineSource2D withWall(Wall wall) {
        return new LineSource2D(flow, x0, y0, history, images.with(wall, y0, y0, false));
    }

    /**
     * Returns the concentration c(x, y, t) with its quadrature error bound.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time, finite and ≥ 0
     * @return the concentration and its error bound
     * @throws IllegalArgumentException if an argument is invalid or the point is on the source
     */
    public Estimate estimate(double x, double y, double t) {
        checkPoint(x, y);
        Checks.nonNegative("t", t);
        final Evaluator e = new Evaluator();
        e.evaluate(x, y, t);
        return Estimate.of(e.value, e.error);
    }

    /**
     * Returns the concentration c(x, y, t) (the value of {@link #estimate}).
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @param t time, finite and ≥ 0
     * @return the concentration
     * @throws IllegalArgumentException if an argument is invalid or the point is on the source
     */
    public double value(double x, double y, double t) {
        checkPoint(x, y);
        Checks.nonNegative("t", t);
        final Evaluator e = new Evaluator();
        e.evaluate(x, y, t);
        return e.value;
    }

    /**
     * Evaluates c and its error bound at every (x[i], y[i]) at one time, reusing one
     * quadrature workspace.
     *
     * @param x positions along the flow; not modified
     * @param y positions across the flow, as long as x; not modified
     * @param t time, finite and ≥ 0
     * @param out receives the concentrations, at least as long as x; may be x or y
     * @param error receives the error bounds, at least as long as x, or null; if given, a
     *     different array from out
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void value(double[] x, double[] y, double t, double[] out, double[] error) {
        Checks.length("x", x, 0);
        Checks.length("y", y, x.length);
        Checks.length("out", out, x.length);
        if (error != null) {
            Checks.length("error", error, x.length);
            Checks.distinct(out, error);
        }
        Checks.nonNegative("t", t);
        final Evaluator e = new Evaluator();
        for (int i = 0; i < x.length; i++) {
            checkPoint(x[i], y[i]);
            e.evaluate(x[i], y[i], t);
            out[i] = e.value;
            if (error != null) {
                error[i] = e.error;
            }
        }
    }

    /**
     * Returns the steady-state concentration for the final rate, in closed form with K₀.
     *
     * @param x position along the flow, finite
     * @param y position across the flow, finite
     * @return c(x, y, ∞)
     * @throws IllegalArgumentException if an argument is invalid, the point is on the source,
     *     or there is no steady state (v = 0 and μ = 0)
     */
    public double steadyValue(double x, double y) {
        checkPoint(x, y);
        if (!(flow.u > 0)) {
            throw new IllegalArgumentException(
                "steadyValue: no steady state without flow or decay (v = 0 and mu = 0)");
        }
        double sum = 0;
        for (int i = 0; i < images.count(); i++) {
            final double dx = x - x0;
            final double dy = (images.y(i, y) - y0) * flow.stretchY;
            final double rho2 = dy * dy;
            final double r = radius(x, y, dx, rho2);
            final double s = flow.exponent(dx, rho2, r);
            final double k0s = ModifiedBessel.k0Scaled(r * flow.u / (2 * flow.dL));
            sum += images.sign(i) * ScaledExp.value(2 * norm * k0s, s, 0.0);
        }
        return history.finalRate() * sum;
    }

    /**
     * Returns the mass flux through the line x = X per unit depth at time t,
     * ∫ (v c − D_L ∂c/∂x) dy, in closed form.
     *
     * @param plane the position X, finite and ≠ x₀
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
     * Returns the steady-state mass flux through the line x = X for the final rate.
     *
     * @param plane the position X, finite and ≠ x₀
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
        return PointSource3D.fluxEstimate(flow, history, images, x0, plane, t, y0, y0, 0.0, 0.0);
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
            Double.POSITIVE_INFINITY, y0, y0, 0.0, 0.0);
    }

    private void checkPoint(double x, double y) {
        Checks.finite("x", x);
        Checks.finite("y", y);
        images.checkPoint(y, 0.0);
    }

    private static double radius(double x, double y, double dx, double rho2) {
        final double r = Math.sqrt(dx * dx + rho2);
        if (r == 0) {
            throw new IllegalArgumentException(
                "(x, y) = (" + x + ", " + y + "): on the source line itself");
        }
        return r;
    }

    /** One evaluation's workspace and result (not thread-safe; one per call or batch). */
    private final class Evaluator implements TimeQuadrature.Integrand {
        private final TimeQuadrature quadrature = new TimeQuadrature();
        private final TimeWindow window = new TimeWindow();
        private double alpha;
        private double beta;
        /** Whether the absorbing wall's factor multiplies the integrand. */
        private boolean absorbing;
        /** c = R(y − y_w)(y₀ − y_w)/D_T ≥ 0, and γ = c/τ_n for the current window. */
        private double wallC;
        private double gamma;
        double value;
        double error;

        @Override
        public double at(double w) {
            // exp(−(α(e^−w − 1) + β(e^w − 1))): the integrand over its value at the window's
            // normalisation point, with the exponent as 2(α + β) sinh²(w/2) − (α − β) sinh w:
            // both terms are ≥ 0, since α ≥ β for a window before the peak (normalised at its
            // upper end, w ≤ 0), α ≤ β for one after it (w ≥ 0) and α = β at the peak
            if (w == 0) {
                // exactly 1, also where 2(α + β) overflows
                return absorbing ? wallFactor(0.0) : 1.0;
            }
            final double h = Math.sinh(0.5 * w);
            final double g =
                Math.exp(-(2 * (alpha + beta) * h * h - (alpha - beta) * Math.sinh(w)));
            return absorbing ? g * wallFactor(w) : g;
        }

        /**
         * 1 − g_image/g_free = −expm1(−γ e^(−w)) ∈ [0, 1] at τ = τ_n e^w, γ = c/τ_n: the
         * absorbing wall's image differs from the free kernel only in the transverse distance,
         * (y' − y₀)² − (y − y₀)² = 4(y − y_w)(y₀ − y_w) with y' = 2y_w − y, so
         * g_image/g_free = exp(−R(y − y_w)(y₀ − y_w)/(D_T τ)) = exp(−c/τ) (method of images,
         * Carslaw &amp; Jaeger 1959, §10.10; the ratio is exact algebra).
         */
        private double wallFactor(double w) {
            // exactly 0 on the wall (γ = 0), also where e^(−w) overflows
            return gamma == 0 ? 0.0 : -Math.expm1(-gamma * Math.exp(-w));
        }

        /**
         * c(t) = Σₖ qₖ ∫ g(τ) dτ over τ ∈ [t − t_(k+1), t − tₖ] (from 0 for the current
         * piece): the Duhamel integral ∫₀ᵗ q(t − τ) g(τ) dτ split where the rate changes
         * ({@link TimeWindow}); every window's integrand is ≥ 0, so its bound is relative to
         * its own value.
         */
        void evaluate(double x, double y, double t) {
            double v = 0;
            double err = 0;
            // beside an absorbing wall: one integral of g_free − g_image = g_free·(1 − e^(−c/τ)),
            // non-negative, so that its bound is relative to the result (the difference of the
            // two integrated terms cancels near the wall); else the sum over the images
            absorbing = images.absorbing();
            if (absorbing) {
                final double yw = images.wallY.position();
                wallC = flow.retardation * ((y - yw) * (y0 - yw)) / flow.dT;
            }
            final int terms = absorbing ? 1 : images.count();
            for (int i = 0; i < terms; i++) {
                final double dx = x - x0;
                final double dy = (images.y(i, y) - y0) * flow.stretchY;
                final double rho2 = dy * dy;
                final double r = radius(x, y, dx, rho2);
                final double s = flow.exponent(dx, rho2, r);
                for (int k = 0; k < history.size() && history.time(k) < t; k++) {
                    final double q = history.rate(k);
                    if (q == 0) {
                        continue;
                    }
                    window.set(history, k, t);
                    integrate(r, s);
                    final double f = images.sign(i) * q;
                    v += f * value;
                    err += Math.abs(f) * error;
                }
            }
            value = v;
            error = err;
        }

        /**
         * The unit-rate integral over the window set in {@link #window}, at stretched distance
         * r and exponent s: its value and error bound.
         */
        private void integrate(double r, double s) {
            final double rr = flow.retardation * r;
            final double bHi = window.upper[0];
            final double aHi = window.lower[0];
            // w = ln(τ/τ_n), τ_n the window's end nearest the integrand's peak τ_p = R r/U, or
            // τ_p itself when the window contains it
            final double tn;
            if (flow.u * bHi < rr) {
                tn = bHi;
                window.place(TimeWindow.Normalisation.UPPER, 0, 0);
            } else if (aHi > 0 && flow.u * aHi > rr) {
                tn = aHi;
                window.place(TimeWindow.Normalisation.LOWER, 0, 0);
            } else {
                tn = Double.NaN;
                window.place(TimeWindow.Normalisation.PEAK, Math.log(flow.u * bHi / rr),
                    Math.log(flow.u * aHi / rr));
            }
            final double shift;
            if (Double.isNaN(tn)) {
                // the peak, where a/τ = bτ = rU/(4D_L): the exponent there is s
                alpha = r * flow.u / (4 * flow.dL);
                beta = alpha;
                shift = 0;
                gamma = absorbing ? wallC * flow.u / rr : 0.0;
            } else {
                gamma = absorbing ? wallC / tn : 0.0;
                // normalise at τ_n, where the exponent is s − A², A = (R r − Uτ_n)/√(4D_L R τ_n)
                final double ut = flow.u * tn;
                final double root = 2 * Math.sqrt(flow.dL * flow.retardation) * Math.sqrt(tn);
                alpha = rr * r / (4 * flow.dL * tn);
                beta = flow.u * ut / (4 * flow.dL * flow.retardation);
                shift = (rr - ut) / root;
            }
            if (!(alpha + beta < Double.POSITIVE_INFINITY)) {
                // the exponent is infinite on the whole window but at one point (τ_n tiny or
                // huge): the exact value is below MIN_VALUE, and so is its prefactor
                value = 0;
                error = 0;
                return;
            }
            // cut where the exponent reaches CUT (bounded by ±FAR, where even the smallest
            // positive α, β make the integrand 0); an end inside the cut needs no tail
            final double lo = Math.max(-FAR, -Math.log1p((CUT + beta) / alpha));
            final double hiCut = beta > 0 ? Math.min(FAR, Math.log1p((CUT + alpha) / beta))
                : Double.POSITIVE_INFINITY;
            final double wA = window.wA;
            final double wB = window.wB;
            final double hi = Math.min(wB, hiCut);
            final double oneTail = TAIL / (alpha + beta + CUT);
            double tail;
            if (!absorbing) {
                tail = wA <= lo ? oneTail : 0;
                if (hi < wB) {
                    tail += oneTail;
                }
            } else {
                // with the wall's factor f ≤ min(1, γe^(−w)): on the left, E(w) ≥ α(e^(−w) − 1) − β
                // gives ∫ e^(−E)·γe^(−w) dw ≤ γ e^(−CUT)/α; on the right f is decreasing, at most
                // its value at the cut; both stay relative to the (small) result near the wall
                tail = wA <= lo && gamma > 0 ? Math.min(oneTail, gamma * (TAIL / alpha)) : 0;
                if (hi < wB) {
                    tail += oneTail * wallFactor(hi);
                }
            }
            quadrature.integrate(this, Math.max(lo, wA), hi, 0.0);
            // the ends' rounding (an end beyond a cut is covered by the tail bound)
            final double ends = window.endError(wA > lo ? at(wA) : 0.0,
                wB < hiCut ? at(wB) : 0.0);
            final double scale = ScaledExp.value(norm, s, shift);
            value = scale * quadrature.value();
            // quadrature, tails and ends, plus the rounding of the exponent s − A², whose terms
            // are formed from rounded inputs (relative 8·2⁻⁵³ per unit of |s| + A², as κ says)
            // (and, beside an absorbing wall, of c, γ and the factor: 8·2⁻⁵³ more); the
            // relative factor is formed first, since |value|·2⁻⁵³ alone is 0 for a value below
            // MIN_NORMAL (and coarse below 2⁻⁹⁶⁹) where the whole term is hundreds of MIN_VALUE
            error = value == 0 ? scale * (quadrature.error() + tail + ends)
                : scale * (quadrature.error() + tail + ends)
                    + Math.abs(value) * (ROUNDING * ((absorbing ? 24 : 16)
                        + 8 * (Math.abs(s) + shift * shift)));
        }
    }
}
