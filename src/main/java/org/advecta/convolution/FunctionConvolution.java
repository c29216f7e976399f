package org.advecta.convolution;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.advecta.internal.Checks;
import org.advecta.quadrature.Estimate;
import org.advecta.solution.Domain;
import org.advecta.transport.TransportParameters;

/**
 * The solution for initial data given as a function φ(ξ), by adaptive quadrature of
 * ∫ φ(ξ)·G(x, ξ, t) dξ around the kernel's moving centre, with an error estimate.
 * Immutable and thread-safe (if φ is).
 *
 * <pre>
 * c(x, t) = ∫ φ(ξ)·G(x, ξ, t) dξ   over [X − g − 10L, X + g + 10L] ∩ support,  L = √(4Dt/R)
 * X = x − vt/R,  g = distance from X to the support (0 if X is inside it)
 * </pre>
 *
 * <p><b>Method.</b> The interval (split at ±3L about the centre and at every declared
 * breakpoint and support end inside it) is integrated by globally adaptive 7/15-point
 * Gauss–Kronrod quadrature (QUADPACK's qk15 pair, Piessens et al. 1983), bisecting the
 * interval with the largest |K₁₅ − G₇| until Σ|K₁₅ − G₇| meets the tolerance. The value is
 * the Gauss sum and the error estimate 2·|Σ(K₁₅ − G₇)| + 0.02·Σ|K₁₅ − G₇| +
 * 50·2⁻⁵³·∫|φG|: the Kronrod sum is
 * far more accurate on resolved intervals, so the estimate tracks the actual error of the
 * returned value (within a factor of a few in the tests, never below it). Declare kinks and
 * jumps of φ as breakpoints: an undeclared one is found by bisection, but the estimate is then
 * less reliable. The kernel's mass beyond 10 widths, erfc(10) ≈ 2.1e-45 of the total (and,
 * for data wholly in the kernel's tail, below e^{−100} of the integrand's mass), is not
 * integrated (φ must be bounded there; it is not part of the estimate).
 *
 * <p><b>Smooth data: Gauss–Hermite.</b> After {@link #withSmoothData()} (infinite line, whole
 * line support, no breakpoints) the integral is first taken with Gauss–Hermite rules about the
 * moving centre, ξ = X + L·y:
 * <pre>
 * c(x, t) = exp(−μt/R)/√π · ∫ φ(X + L·y)·exp(−y²) dy ≈ exp(−μt/R)/√π · Σₖ wₖ·φ(X + L·yₖ)
 * </pre>
 * with n = 10, 20, 40, 80, 160 nodes in turn (nodes and weights computed once, see
 * GaussHermite: Newton on the Hermite recurrence, Press et al. 2007 §4.6.1, checked against
 * 50-digit mpmath). As soon as consecutive rules satisfy 2·|Q₂ₙ − Qₙ| ≤ max(absolute,
 * relative·|Q₂ₙ|) and |Q₂ₙ − Qₙ| ≤ |Qₙ − Qₙ/₂|/8 (visibly fast convergence; or the
 * difference is at the rounding allowance), the value returned is Qₙ with the estimate
 * 2·|Q₂ₙ − Qₙ| + 50·2⁻⁵³·exp(−μt/R)/√π·Σ wₖ|φ(X + L·yₖ)| (Q₂ₙ, far more accurate for
 * smooth φ, makes the difference the error of Qₙ to within a small factor; the factor 2
 * covers |error of Q₂ₙ| up to half that of Qₙ). Otherwise (φ varies on a scale far below L,
 * the value is far below the data's size, or both rules return exactly 0) the adaptive
 * Gauss–Kronrod path above takes over.
 *
 * <p><b>Cost.</b> Adaptive path: 15 evaluations of φ per interval; smooth data need a few
 * intervals, each kink or jump about log₂(L/tolerance) more. Gauss–Hermite path: 10 + 20 +
 * 40 = 70 calls of φ when Q₂₀ is accepted, 150 for Q₄₀, 310 for Q₈₀; a failed attempt costs
 * 310 calls before the adaptive path starts. Measured on the 36 sech rows of the test fixture
 * (kernel widths 0.002 to 1.5): at the default 1e-12 relative tolerance 33 rows by
 * Gauss–Hermite, mean 154 calls (the other 3, wide kernels, by the fallback: at most 760);
 * at 1e-6, all 36 rows, mean 77 calls, at most 150 (FunctionConvolutionTest prints these
 * counts). {@link ProfileConvolution} is exact and faster for data that are piecewise
 * linear.
 *
 * <p>At t = 0 (or a collapsed kernel) the result is decay·φ(x − vt/R) (0 outside the
 * support) with error estimate 0. φ must return finite values on the support; a NaN or
 * infinite value throws IllegalArgumentException naming the point.
 */
public final class FunctionConvolution {

    /** Half-width of the integration interval in kernel widths. */
    private static final double REACH = 10;
    /** Interior split points in kernel widths. */
    private static final double INNER = 3;
    /** Split points, in units of the tail's decay length, for data in the kernel's tail. */
    private static final double[] TAIL_SPLITS = {0.25, 1, 3, 10, 30, 100};
    /** The interval budget per evaluation. */
    private static final int MAX_INTERVALS = 2000;
    /**
     * The Gauss–Hermite rules' differences must fall at least this much from one doubling to
     * the next before the latest is trusted as the error of Qₙ: with
     * |Q₂ₙ − Qₙ| ≤ |Qₙ − Qₙ/₂|/8 the error of Q₂ₙ is (for the super-geometric convergence of
     * Gauss–Hermite on smooth data) well below half that of Qₙ, which the factor 2 of the
     * estimate needs. A choice, not derived; the tests print the measured estimate/error.
     */
    private static final double CONTRACTION = 0.125;
    /** The unit roundoff 2⁻⁵³. */
    private static final double U = 0x1.0p-53;

    private final ConvolutionKernel kernel;
    private final DoubleUnaryOperator phi;
    private final double lower;
    private final double upper;
    private final double[] breakpoints;
    private final double absTol;
    private final double relTol;
    private final boolean smooth;

    private FunctionConvolution(ConvolutionKernel kernel, DoubleUnaryOperator phi, double lower,
                                double upper, double[] breakpoints, double absTol, double relTol,
                                boolean smooth) {
        this.kernel = kernel;
        this.smooth = smooth;
        this.phi = phi;
        this.lower = lower;
        this.upper = upper;
        this.breakpoints = breakpoints;
        this.absTol = absTol;
        this.relTol = relTol;
    }

    /**
     * Returns the infinite-line solution for data φ on the whole line, tolerance
     * 1e-12 relative (1e-300 absolute).
     *
     * @param parameters v, D, R, μ
     * @param phi the initial data
     * @return the solution
     * @throws IllegalArgumentException if an argument is null
     */
    public static FunctionConvolution of(TransportParameters parameters, DoubleUnaryOperator phi) {
        return of(InfiniteLineKernel.of(parameters), phi);
    }

    /**
     * Returns the solution for the given kernel (the support starts at 0 on the half-line).
     *
     * @param kernel the Green's function
     * @param phi the initial data
     * @return the solution
     * @throws IllegalArgumentException if an argument is null
     */
    public static FunctionConvolution of(ConvolutionKernel kernel, DoubleUnaryOperator phi) {
        if (kernel == null) {
            throw new IllegalArgumentException("kernel: must not be null");
        }
        if (phi == null) {
            throw new IllegalArgumentException("phi: must not be null");
        }
        final double lo = kernel.domain() == Domain.HALF_LINE ? 0.0 : Double.NEGATIVE_INFINITY;
        return new FunctionConvolution(kernel, phi, lo, Double.POSITIVE_INFINITY, new double[0],
            1e-300, 1e-12, false);
    }

    /**
     * Returns a copy with φ = 0 outside [lower, upper] (φ is not called there).
     *
     * @param lower lower end, not NaN (−∞ allowed; ≥ 0 on the half-line)
     * @param upper upper end, &gt; lower (+∞ allowed)
     * @return the new solution
     * @throws IllegalArgumentException if the bounds are invalid
     */
    public FunctionConvolution withSupport(double lower, double upper) {
        final double min = kernel.domain() == Domain.HALF_LINE ? 0.0 : Double.NEGATIVE_INFINITY;
        if (!(lower >= min) || lower == Double.POSITIVE_INFINITY) {
            throw Checks.fail("lower", lower, "must be >= " + min + " and < +Infinity");
        }
        if (!(upper > lower)) {
            throw Checks.fail("upper", upper, "must be > lower = " + lower);
        }
        if (smooth && (lower > Double.NEGATIVE_INFINITY || upper < Double.POSITIVE_INFINITY)) {
            throw Checks.fail("lower", lower, "smooth data (withSmoothData) live on the whole "
                + "line; a support needs the adaptive path");
        }
        return new FunctionConvolution(kernel, phi, lower, upper, breakpoints, absTol, relTol,
            smooth);
    }

    /**
     * Returns a copy whose quadrature splits at the given points (kinks and jumps of φ).
     *
     * @param points finite points, any order; not modified (copied)
     * @return the new solution
     * @throws IllegalArgumentException if a point is not finite
     */
    public FunctionConvolution withBreakpoints(double... points) {
        if (points == null) {
            throw new IllegalArgumentException("points: must not be null");
        }
        final double[] p = points.clone();
        for (int i = 0; i < p.length; i++) {
            Checks.finite("points[" + i + "]", p[i]);
        }
        Arrays.sort(p);
        if (smooth && p.length > 0) {
            throw Checks.fail("points[0]", p[0], "smooth data (withSmoothData) have no "
                + "breakpoints");
        }
        return new FunctionConvolution(kernel, phi, lower, upper, p, absTol, relTol, smooth);
    }

    /**
     * Returns a copy with the given tolerance: refinement stops once the estimated error is
     * below max(absolute, relative·|value|).
     *
     * @param absolute absolute tolerance, finite and ≥ 1e-300
     * @param relative relative tolerance, in [1e-15, 1)
     * @return the new solution
     * @throws IllegalArgumentException if a tolerance is invalid
     */
    public FunctionConvolution withTolerance(double absolute, double relative) {
        Checks.atLeast("absolute", absolute, 1e-300);
        if (!(relative >= 1e-15 && relative < 1)) {
            throw Checks.fail("relative", relative, "must be in [1e-15, 1)");
        }
        return new FunctionConvolution(kernel, phi, lower, upper, breakpoints, absolute, relative,
            smooth);
    }

    /**
     * Returns a copy that declares φ smooth (analytic, or at least many times differentiable
     * on the scale of the kernel's width) on the whole line: values are then taken by
     * Gauss–Hermite rules about the moving centre, with the adaptive path as fallback (see
     * the class documentation for the method, estimate and cost).
     *
     * @return the new solution
     * @throws IllegalArgumentException if the kernel is not the infinite-line kernel, or a
     *     support or breakpoints were declared (name and value of the offending item)
     */
    public FunctionConvolution withSmoothData() {
        if (!(kernel instanceof InfiniteLineKernel)) {
            throw new IllegalArgumentException("kernel: smooth data (Gauss–Hermite) need the "
                + "infinite-line kernel, got " + kernel.getClass().getSimpleName());
        }
        if (lower > Double.NEGATIVE_INFINITY || upper < Double.POSITIVE_INFINITY) {
            throw Checks.fail("lower", lower, "smooth data live on the whole line (upper = "
                + upper + "); withSupport is for the adaptive path");
        }
        if (breakpoints.length > 0) {
            throw Checks.fail("breakpoints[0]", breakpoints[0], "smooth data have no "
                + "breakpoints");
        }
        return new FunctionConvolution(kernel, phi, lower, upper, breakpoints, absTol, relTol,
            true);
    }

    /**
     * Returns whether φ was declared smooth ({@link #withSmoothData()}).
     *
     * @return true on the Gauss–Hermite path
     */
    public boolean smoothData() {
        return smooth;
    }

    /**
     * Returns c(x, t) with an estimate of its absolute error.
     *
     * @param x position, finite (≥ 0 on the half-line)
     * @param t time, finite and ≥ 0
     * @return the value and its error estimate
     * @throws IllegalArgumentException if x or t is invalid, or φ returns a non-finite value
     */
    public Estimate value(double x, double t) {
        final Workspace w = new Workspace(breakpoints.length);
        evaluate(checkX(x), kernel.at(t), w);
        return Estimate.of(w.quadrature.value(), w.quadrature.error());
    }

    /**
     * A profile with error estimates: out[i] = c(x[i], t), errors[i] its estimate. One
     * workspace serves all points (nothing is allocated per point).
     *
     * @param x positions; not modified (unless it is also out)
     * @param t time
     * @param out receives the values; at least as long as x; may be x
     * @param errors receives the estimates; at least as long as x; must differ from out
     * @throws IllegalArgumentException if an argument is invalid (outputs then partly written)
     */
    public void values(double[] x, double t, double[] out, double[] errors) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
        Checks.length("errors", errors, x.length);
        Checks.distinct(out, errors);
        if (errors == x) {
            throw new IllegalArgumentException("errors: must not be the input array");
        }
        final ConvolutionKernel.Snapshot s = kernel.at(t);
        final Workspace w = new Workspace(breakpoints.length);
        for (int i = 0; i < x.length; i++) {
            evaluate(checkX(x[i]), s, w);
            out[i] = w.quadrature.value();
            errors[i] = w.quadrature.error();
        }
    }

    private double checkX(double x) {
        return kernel.domain() == Domain.HALF_LINE ? Checks.nonNegative("x", x)
            : Checks.finite("x", x);
    }

    /** Mutable per-call state: the quadrature workspace and the integrand. */
    private final class Workspace implements AdaptiveKronrod.Integrand {
        final AdaptiveKronrod quadrature = new AdaptiveKronrod(MAX_INTERVALS);
        final double[] points;
        ConvolutionKernel.Snapshot snapshot;
        double x;
        double centre;

        Workspace(int breaks) {
            points = new double[breaks + 6 + TAIL_SPLITS.length];
        }

        /** The integrand in the offset s = ξ − origin(x) (see valueAtOffset). */
        @Override
        public double at(double s) {
            // φ is never called outside its support, even where centre + s rounds across an end
            final double xi = Math.min(upper, Math.max(lower, centre + s));
            final double f = phi.applyAsDouble(xi);
            if (!Double.isFinite(f)) {
                throw Checks.fail("phi(" + xi + ")", f, "must be finite");
            }
            return f == 0 ? 0.0 : f * snapshot.valueAtOffset(x, s);
        }
    }

    private void evaluate(double x, ConvolutionKernel.Snapshot s, Workspace w) {
        w.snapshot = s;
        w.x = x;
        final double centre = s.origin(x);
        w.centre = centre;
        if (s.collapsed()) {
            final double v = centre >= lower && centre <= upper ? phi.applyAsDouble(centre) : 0.0;
            if (!Double.isFinite(v)) {
                throw Checks.fail("phi(" + centre + ")", v, "must be finite");
            }
            setZero(w, s.decay() * v);
            return;
        }
        final double l = s.width();
        if (smooth && hermite(centre, l, s.decay(), w)) {
            return;
        }
        // reach 10 widths beyond the nearest point of the support, so that data lying wholly
        // in the kernel's tail are integrated too (relative neglect below e^{−100} there)
        final double gap = Math.max(0.0, Math.max(lower - centre, centre - upper));
        final double a = Math.max(lower, centre - (gap + REACH * l));
        final double b = Math.min(upper, centre + (gap + REACH * l));
        if (!(a < b)) {
            setZero(w, 0.0);
            return;
        }
        // candidate split points: the kernel's centre and ±3 widths, the breakpoints, and,
        // for data wholly in the kernel's tail, points near the support's near end on the
        // scale ℓ = L²/(2·gap) on which the integrand falls off there
        final double[] pts = w.points;
        int nc = 0;
        pts[nc++] = centre - INNER * l;
        pts[nc++] = centre;
        pts[nc++] = centre + INNER * l;
        for (double bp : breakpoints) {
            pts[nc++] = bp;
        }
        if (gap > INNER * l) {
            final double scale = l * l / (2 * gap);
            for (double k : TAIL_SPLITS) {
                pts[nc++] = lower > centre ? a + k * scale : b - k * scale;
            }
        }
        Arrays.sort(pts, 0, nc);
        // keep those strictly inside (a, b), increasing, after a
        int np = 0;
        double previous = a;
        for (int i = 0; i < nc; i++) {
            if (pts[i] > previous && pts[i] < b) {
                previous = pts[i];
                pts[np++] = previous;
            }
        }
        System.arraycopy(pts, 0, pts, 1, np);
        pts[0] = a;
        np++;
        pts[np++] = b;
        // integrate in the offset from the centre, so that a kernel narrower than the
        // spacing of doubles near ξ is still resolved (the quadrature nodes are exact offsets)
        for (int i = 0; i < np; i++) {
            pts[i] -= centre;
        }
        w.quadrature.integrate(w, pts, np, absTol, relTol);
    }

    /**
     * Gauss–Hermite about the centre (class documentation); true if a pair of rules met the
     * tolerance (the result is then in the workspace).
     */
    private boolean hermite(double centre, double l, double decay, Workspace w) {
        final double scale = decay * SegmentIntegrals.ONE_OVER_SQRT_PI;
        double previous = 0;
        double previousAbs = 0;
        double previousDiff = Double.NaN;
        for (int i = 0; i < GaussHermite.ORDERS.length; i++) {
            double sum = 0;
            double comp = 0;
            double abs = 0;
            for (int k = 0; k < GaussHermite.halfSize(i); k++) {
                final double d = l * GaussHermite.node(i, k);
                final double wk = GaussHermite.weight(i, k);
                final double f1 = phiAt(centre - d);
                final double f2 = phiAt(centre + d);
                final double term = wk * (f1 + f2);
                // Neumaier summation
                final double t = sum + term;
                comp += Math.abs(sum) >= Math.abs(term) ? (sum - t) + term : (term - t) + sum;
                sum = t;
                abs += wk * (Math.abs(f1) + Math.abs(f2));
            }
            final double q = scale * (sum + comp);
            final double qAbs = scale * abs;
            if (i > 0) {
                final double diff = Math.abs(q - previous);
                final double rounding = 50 * U * previousAbs;
                // accept Qₙ when Q₂ₙ agrees within the tolerance and the rules are seen to
                // converge fast (the difference fell at least CONTRACTION-fold, or is rounding)
                final boolean converging = diff <= Math.max(CONTRACTION * previousDiff, rounding);
                final boolean zero = q == 0 && previous == 0;
                if (!zero && converging && 2 * diff <= Math.max(absTol, relTol * Math.abs(q))) {
                    w.quadrature.setResult(previous, 2 * diff + rounding);
                    return true;
                }
                previousDiff = diff;
            }
            previous = q;
            previousAbs = qAbs;
        }
        return false;
    }

    private double phiAt(double xi) {
        final double f = phi.applyAsDouble(xi);
        if (!Double.isFinite(f)) {
            throw Checks.fail("phi(" + xi + ")", f, "must be finite");
        }
        return f;
    }

    private static void setZero(Workspace w, double v) {
        w.quadrature.setResult(v, 0.0);
    }
}
