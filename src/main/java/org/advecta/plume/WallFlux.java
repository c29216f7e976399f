package org.advecta.plume;

import org.advecta.internal.ScaledExp;
import org.advecta.quadrature.Estimate;
import org.advecta.special.ErrorFunctions;

/**
 * The mass flux through a plane x = X by quadrature in time, for any walls: the route used
 * beside an absorbing wall, where the flux has no closed form.
 *
 * <p><b>Formula.</b> For an instantaneous unit release at τ = 0 the transverse integral of
 * the free-space kernel over the whole plane is the one-dimensional kernel, whose flux
 * density through x = X at offset Δx = X − x₀ is (Ogata–Banks-type 1-D kernel with decay;
 * standard, derived here by differentiating the Gaussian)
 * <pre>
 * j(τ) = (R Δx + v τ) / (2 τ √(4π D_L R τ)) · exp(−(R Δx − v τ)²/(4 D_L R τ) − μτ/R).
 * </pre>
 * Beside an absorbing wall at distance a from a point source the transverse factor is the
 * integral of the image pair G(y − y₀) − G(y − y₀') over the half-space, which is
 * erf(a/σ) with σ = √(4 D_T τ/R) (method of images, Carslaw &amp; Jaeger 1959, §2.10 and
 * §10.10 — section numbers recalled from memory; the identity is the difference of the two
 * Gaussians' half-line masses, ½erfc(−a/σ) − ½erfc(a/σ)). Walls across y and z act
 * independently (the kernel factorises), so two absorbing walls give the product; a
 * reflecting wall gives the factor 1. For a source spread uniformly over distances
 * [a₁, a₂] from the wall (a patch) the factor is the mean of erf(a/σ) over a ∈ [a₁, a₂].
 * The flux of a source switched on at t = 0 with unit rate is then (Duhamel)
 * <pre>
 * F(t) = ∫₀ᵗ j(τ) Π_walls f(τ) dτ,   f = erf(a/σ) (point/line) or mean of erf (patch).
 * </pre>
 *
 * <p><b>Method.</b> In w = ln(τ/τ_ref), with τ_ref the peak R r/U of the free integrand
 * (or t when that is later), j τ = e^(s − A²) (p₁ e^(−w/2) + p₂ e^(w/2)) exp(−E(w)) / (2√(4π D_L R)),
 * E = α(e^(−w) − 1) + β(e^w − 1) ≥ 0 the same stable exponent as {@link LineSource2D} uses
 * (s, A as in the closed form: no overflow at high Péclet), p₁ = R Δx/√τ_ref, p₂ = v√τ_ref.
 * The range [w_lo, w_hi] is cut where E reaches 50 (E ≥ α(e^(−w) − 1) − β below and
 * E ≥ β(e^w − 1) − α above); the tails are then bounded by
 * (|p₁| e^(w_lo/2) + |p₂| e^(3w_lo/2)) e^(−50)/α below and
 * (|p₁| e^(−3w_hi/2) + |p₂| e^(−w_hi/2)) e^(−50)/β above (the factor f ≤ 1 only lowers
 * them), and the rest is integrated by the package's
 * adaptive Gauss–Kronrod 7/15 rule to a relative 1e-13. The mean of erf over [u₁, u₂]
 * is an 8-point Gauss–Legendre rule when u₂ − u₁ ≤ 1 (error below 1e-16 there) and
 * 1 − (ierfc(u₁) − ierfc(u₂))/(u₂ − u₁), ierfc(u) = e^(−u²)/√π − u erfc(u), otherwise
 * (no cancellation: the subtracted part is at most 0.57 of u₂ − u₁).
 *
 * <p><b>Error bound.</b> |K₁₅ − G₇| summed over the subintervals, plus the tail bounds,
 * plus the shift of the rounded upper limit (|integrand| there × 8·2⁻⁵³(1 + |w_end|)),
 * plus the rounding of the exponent and the sums, 2⁻⁵³(64 + 8(|s| + |ln max(|p₁|, |p₂|)| + A²))
 * relative to the
 * result, or to ∫|j τ| dw (integrated as well) where j changes sign (R Δx + vτ = 0 inside the
 * range: a plane against the flow, where the positive and negative parts cancel): the kind of
 * bound the other quadratures of the package return.
 */
final class WallFlux {

    /** Cut of the exponent E. */
    private static final double CUT = LineSource2D.CUT;
    private static final double TAIL = Math.exp(-CUT);
    private static final double ROUNDING = LineSource2D.ROUNDING;
    private static final double INV_SQRT_PI = 1 / Math.sqrt(Math.PI);
    /** Gauss–Legendre nodes and weights on [−1, 1], 8 points, computed by Newton's method. */
    private static final double[] GL_X = new double[8];
    private static final double[] GL_W = new double[8];

    static {
        final int n = GL_X.length;
        for (int i = 0; i < n; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double dp = 0;
            for (int it = 0; it < 100; it++) {
                double p0 = 1;
                double p1 = x;
                for (int k = 2; k <= n; k++) {
                    final double p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                dp = n * (x * p1 - p0) / (x * x - 1);
                final double dx = p1 / dp;
                x -= dx;
                if (Math.abs(dx) < 1e-17) {
                    break;
                }
            }
            GL_X[i] = x;
            GL_W[i] = 2 / ((1 - x * x) * dp * dp);
        }
    }

    private WallFlux() {
    }

    /**
     * Returns the mass flux through the plane at offset dx from the source, by quadrature.
     *
     * @param flow the medium
     * @param history the rate history
     * @param images the walls
     * @param yLo lower end of the source's extent in y (y₀ for a point)
     * @param yHi upper end of the source's extent in y
     * @param zLo lower end in z
     * @param zHi upper end in z
     * @param dx the plane's offset from the source, nonzero and finite
     * @param t the time, ≥ 0, or +∞ for the steady state (then U &gt; 0 is required)
     * @return the flux and its error bound
     */
    static Estimate estimate(Flow flow, RateHistory history, Images images, double yLo,
                             double yHi, double zLo, double zHi, double dx, double t) {
        final Evaluator e = new Evaluator(flow);
        e.setWall(0, images.wallY, yLo, yHi, flow.dT);
        e.setWall(1, images.wallZ, zLo, zHi, flow.dV);
        if (t == Double.POSITIVE_INFINITY) {
            e.unit(dx, t);
            final double q = history.finalRate();
            return Estimate.of(q * e.value, Math.abs(q) * e.error);
        }
        double v = 0;
        double err = 0;
        for (int k = 0; k < history.size() && history.time(k) < t; k++) {
            e.unit(dx, t - history.time(k));
            final double q = history.step(k);
            v += q * e.value;
            err += Math.abs(q) * e.error;
        }
        return Estimate.of(v, err);
    }

    /**
     * Returns the mean of erf over [u₁, u₂], 0 ≤ u₁ ≤ u₂ (erf(u₁) when they are equal).
     *
     * @param u1 lower end, ≥ 0 (may be +∞)
     * @param u2 upper end, ≥ u1 (may be +∞)
     * @return the mean, in [0, 1]
     */
    static double meanErf(double u1, double u2) {
        if (u1 > 6) {
            // erfc(6) = 2.2e-17: erf is 1 to within half an ulp beyond
            return 1.0;
        }
        if (u2 == u1) {
            return ErrorFunctions.erf(u1);
        }
        final double width = u2 - u1;
        if (width <= 1) {
            final double m = 0.5 * (u1 + u2);
            final double h = 0.5 * width;
            double s = 0;
            for (int i = 0; i < GL_X.length; i++) {
                s += GL_W[i] * ErrorFunctions.erf(m + h * GL_X[i]);
            }
            return 0.5 * s;
        }
        return 1 - (ierfc(u1) - ierfc(u2)) / width;
    }

    /** ∫ᵤ^∞ erfc = e^(−u²)/√π − u erfc(u), u ≥ 0. */
    private static double ierfc(double u) {
        if (u > 27) {
            return 0.0;
        }
        return Math.exp(-u * u) * INV_SQRT_PI - u * ErrorFunctions.erfc(u);
    }

    /** One evaluation's workspace (not thread-safe). */
    private static final class Evaluator implements TimeQuadrature.Integrand {
        private final Flow flow;
        private final TimeQuadrature quadrature = new TimeQuadrature();
        /** Per absorbing wall (index 0: y, 1: z): distances a₁ ≤ a₂ and dispersion. */
        private final boolean[] on = new boolean[2];
        private final double[] a1 = new double[2];
        private final double[] a2 = new double[2];
        private final double[] disp = new double[2];
        /** 1/σ at τ_ref for each wall. */
        private final double[] invSigma = new double[2];
        private double alpha;
        private double beta;
        private double logP1;
        private double signP1;
        private double logP2;
        private double signP2;
        /** Whether {@link #at} returns |integrand| (for the rounding bound under cancellation). */
        private boolean magnitude;
        double value;
        double error;

        Evaluator(Flow flow) {
            this.flow = flow;
        }

        void setWall(int i, Wall wall, double lo, double hi, double dispersion) {
            if (wall == null || !wall.isAbsorbing()) {
                return;
            }
            final double d1 = Math.abs(lo - wall.position());
            final double d2 = Math.abs(hi - wall.position());
            on[i] = true;
            a1[i] = Math.min(d1, d2);
            a2[i] = Math.max(d1, d2);
            disp[i] = dispersion;
        }

        @Override
        public double at(double w) {
            final double h = Math.sinh(0.5 * w);
            // E as in LineSource2D: 2(α + β) sinh²(w/2) − (α − β) sinh w, both terms ≥ 0
            // (exactly 0 at the reference point w = 0, also when 2(α + β) overflows)
            final double e = w == 0 ? 0.0
                : 2 * (alpha + beta) * h * h - (alpha - beta) * Math.sinh(w);
            double g = 0;
            if (signP1 != 0) {
                g += signP1 * Math.exp(logP1 - e - 0.5 * w);
            }
            if (signP2 != 0) {
                g += signP2 * Math.exp(logP2 - e + 0.5 * w);
            }
            if (g == 0) {
                return 0.0;
            }
            if (magnitude) {
                g = Math.abs(g);
            }
            final double grow = Math.exp(-0.5 * w);
            for (int i = 0; i < 2; i++) {
                if (on[i]) {
                    final double k = invSigma[i] * grow;
                    g *= meanErf(a1[i] * k, a2[i] * k);
                }
            }
            return g;
        }

        /** The unit-rate flux at offset dx, time t &gt; 0 (or +∞). */
        void unit(double dx, double t) {
            if (t == 0) {
                value = 0;
                error = 0;
                return;
            }
            final double r = Math.abs(dx);
            final double s = flow.exponent(dx, 0.0, r);
            final double rr = flow.retardation * r;
            final double ut = flow.u * t;
            final double tauRef;
            final double wEnd;
            final double shift;
            if (ut < rr) {
                // peak after t: normalise at τ = t, where the exponent is s − A²
                final double root = 2 * Math.sqrt(flow.dL * flow.retardation) * Math.sqrt(t);
                shift = (rr - ut) / root;
                alpha = rr * r / (4 * flow.dL * t);
                beta = flow.u * ut / (4 * flow.dL * flow.retardation);
                tauRef = t;
                wEnd = 0;
            } else {
                // peak at τ_c = R r/U, where the exponent is s
                alpha = r * flow.u / (4 * flow.dL);
                beta = alpha;
                tauRef = rr / flow.u;
                wEnd = t == Double.POSITIVE_INFINITY ? Double.POSITIVE_INFINITY
                    : Math.log(ut / rr);
                shift = 0;
            }
            if (!(alpha < Double.POSITIVE_INFINITY)) {
                // R r²/(4 D_L t) overflows: the flux is below exp(−1e308), zero in double
                value = 0;
                error = 0;
                return;
            }
            final double root = Math.sqrt(tauRef);
            final double p1 = flow.retardation * dx / root;
            final double p2 = flow.velocity * root;
            // p₁, p₂ are scaled by the larger of them, whose logarithm joins the exponent of
            // the scale (so that neither a huge p nor a tiny e^(s − A²) is formed alone)
            final double logP = Math.log(Math.max(Math.abs(p1), Math.abs(p2)));
            signP1 = Math.signum(p1);
            logP1 = p1 == 0 ? 0 : Math.log(Math.abs(p1)) - logP;
            signP2 = Math.signum(p2);
            logP2 = p2 == 0 ? 0 : Math.log(Math.abs(p2)) - logP;
            final double q1 = p1 == 0 ? 0 : Math.exp(logP1);
            final double q2 = p2 == 0 ? 0 : Math.exp(logP2);
            for (int i = 0; i < 2; i++) {
                if (on[i]) {
                    invSigma[i] = 1 / Math.sqrt(4 * disp[i] * tauRef / flow.retardation);
                }
            }
            final double lo = Math.max(-LineSource2D.FAR, -Math.log1p((CUT + beta) / alpha));
            final double hiCut = beta > 0
                ? Math.min(LineSource2D.FAR, Math.log1p((CUT + alpha) / beta))
                : Double.POSITIVE_INFINITY;
            final double hi = Math.min(wEnd, hiCut);
            // tails (the erf factors are ≤ 1): below lo, with u = e^(−w) and E ≥ α(u − 1) − β,
            // ∫ (|p₁|u^(1/2) + |p₂|u^(−1/2)) e^(−E) dw ≤ (|p₁|e^(lo/2) + |p₂|e^(3lo/2)) e^(−CUT)/α;
            // above hi, with u = e^w, ≤ (|p₁|e^(−3hi/2) + |p₂|e^(−hi/2)) e^(−CUT)/β
            double tail = (q1 * Math.exp(0.5 * lo) + q2 * Math.exp(1.5 * lo)) * TAIL / alpha;
            if (hi < wEnd) {
                tail += (q1 * Math.exp(-1.5 * hi) + q2 * Math.exp(-0.5 * hi)) * TAIL / beta;
            }
            final double scale = ScaledExp.value(
                1 / (2 * Math.sqrt(4 * Math.PI * flow.dL * flow.retardation)), s + logP, shift);
            // where the density changes sign (R Δx + vτ = 0 inside the range: a plane against
            // the flow) the positive and negative parts cancel, and rounding is relative to
            // ∫|j| rather than to the result: integrate |j| too for that part of the bound
            double magnitudeIntegral = 0;
            if (signP1 * signP2 < 0) {
                magnitude = true;
                quadrature.integrate(this, lo, hi, 0.0);
                magnitude = false;
                magnitudeIntegral = quadrature.value() + quadrature.error();
            }
            quadrature.integrate(this, lo, hi, 0.0);
            value = scale * quadrature.value();
            final double size = Math.max(Math.abs(value), scale * magnitudeIntegral);
            // the upper limit ln(Ut/(Rr)) is rounded (a few ulps of 1 + |w|): at a sharp front
            // (high Péclet) the integrand there is large, so its shift counts
            final double limit = hi == wEnd && hi < Double.POSITIVE_INFINITY
                ? Math.abs(at(hi)) * (ROUNDING * 8 * (1 + Math.abs(hi))) : 0.0;
            error = scale * (quadrature.error() + tail + limit) + (size == 0 ? 0.0
                : size * (ROUNDING * (64 + 8 * (Math.abs(s) + Math.abs(logP) + shift * shift))));
        }
    }
}
