package org.advecta.convolution;

import java.util.Arrays;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.advecta.internal.Checks;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;

/**
 * Releases at a fixed point x₀ of the infinite line with a time-varying rate: a train of
 * instantaneous releases (exact superposition) or a continuous release of rate q(t) (Duhamel
 * integral by adaptive quadrature, with an error estimate). Immutable and thread-safe (if the
 * rate function is).
 *
 * <pre>
 * train:       c(x, t) = Σ_{k: tₖ &lt; t} mₖ · G(x − x₀, t − tₖ)
 * continuous:  c(x, t) = ∫₀ᵗ q(s) · G(x − x₀, t − s) ds
 * </pre>
 * G is the free-space kernel {@link FreeSpaceKernel1D} (unit initial-concentration integral);
 * mₖ and q are released amounts (per unit cross-section and mobile-phase capacity) and
 * release rates in the same units, as for that kernel. Superposition in time is Duhamel's
 * principle for the linear, time-invariant equation (Carslaw &amp; Jaeger 1959, §1.14).
 *
 * <p><b>Accuracy.</b> Train: each term within the kernel's max(16, 2κ) ULP, summed with
 * compensation. Continuous: the Gauss sum of an adaptive 7/15-point Gauss–Kronrod quadrature
 * over [0, t], split at the declared breakpoints of q, returned with the estimate
 * 2·|Σ(K₁₅ − G₇)| + 0.02·Σ|K₁₅ − G₇| + 50·2⁻⁵³·∫|qG| (see {@link FunctionConvolution}).
 * At x = x₀ the integrand has an integrable 1/√(t − s) singularity at s = t, resolved by bisection.
 */
public final class PointRelease {

    private static final int MAX_INTERVALS = 2000;

    private final FreeSpaceKernel1D kernel;
    private final double[] times;
    private final double[] masses;
    private final DoubleUnaryOperator rate;
    private final double[] breakpoints;
    private final double absTol;
    private final double relTol;

    private PointRelease(FreeSpaceKernel1D kernel, double[] times, double[] masses,
                         DoubleUnaryOperator rate, double[] breakpoints, double absTol,
                         double relTol) {
        this.kernel = kernel;
        this.times = times;
        this.masses = masses;
        this.rate = rate;
        this.breakpoints = breakpoints;
        this.absTol = absTol;
        this.relTol = relTol;
    }

    /**
     * A train of instantaneous releases of amounts mₖ at times tₖ.
     *
     * @param parameters v, D, R, μ
     * @param x0 the release point, finite
     * @param times release times, finite, ≥ 0, strictly increasing; not modified (copied)
     * @param masses released amounts, finite, one per time; not modified (copied)
     * @return the release
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static PointRelease train(TransportParameters parameters, double x0, double[] times,
                                     double[] masses) {
        final FreeSpaceKernel1D k = FreeSpaceKernel1D.of(parameters, x0);
        Checks.length("times", times, 1);
        Checks.length("masses", masses, times.length);
        if (masses.length != times.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "masses: needs exactly %d elements (one per time), got %d", times.length,
                masses.length));
        }
        for (int i = 0; i < times.length; i++) {
            Checks.nonNegative("times[" + i + "]", times[i]);
            Checks.finite("masses[" + i + "]", masses[i]);
            if (i > 0 && !(times[i] > times[i - 1])) {
                throw Checks.fail("times[" + i + "]", times[i], "must be > times[" + (i - 1)
                    + "] = " + times[i - 1]);
            }
        }
        return new PointRelease(k, times.clone(), masses.clone(), null, new double[0], 0, 0);
    }

    /**
     * A continuous release at rate q(t) from t = 0 on, tolerance 1e-12 relative.
     *
     * @param parameters v, D, R, μ
     * @param x0 the release point, finite
     * @param rate q(t) for t ≥ 0, finite
     * @return the release
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static PointRelease continuous(TransportParameters parameters, double x0,
                                          DoubleUnaryOperator rate) {
        final FreeSpaceKernel1D k = FreeSpaceKernel1D.of(parameters, x0);
        if (rate == null) {
            throw new IllegalArgumentException("rate: must not be null");
        }
        return new PointRelease(k, null, null, rate, new double[0], 1e-300, 1e-12);
    }

    /**
     * Returns a copy of a continuous release whose quadrature splits at the given times
     * (kinks and jumps of q), with the given tolerance.
     *
     * @param absolute absolute tolerance, finite and ≥ 1e-300
     * @param relative relative tolerance, in [1e-15, 1)
     * @param points finite times; not modified (copied)
     * @return the new release
     * @throws IllegalArgumentException if an argument is invalid or this is a train
     */
    public PointRelease withQuadrature(double absolute, double relative, double... points) {
        if (rate == null) {
            throw new IllegalArgumentException("a train of releases needs no quadrature");
        }
        Checks.atLeast("absolute", absolute, 1e-300);
        if (!(relative >= 1e-15 && relative < 1)) {
            throw Checks.fail("relative", relative, "must be in [1e-15, 1)");
        }
        if (points == null) {
            throw new IllegalArgumentException("points: must not be null");
        }
        final double[] p = points.clone();
        for (int i = 0; i < p.length; i++) {
            Checks.finite("points[" + i + "]", p[i]);
        }
        Arrays.sort(p);
        return new PointRelease(kernel, null, null, rate, p, absolute, relative);
    }

    /**
     * Returns c(x, t) with an error estimate (0 for a train beyond its rounding, which is
     * within the kernel's contract per term).
     *
     * @param x position, finite
     * @param t time, finite and ≥ 0
     * @return the value and its estimate
     * @throws IllegalArgumentException if x or t is invalid, or the rate is not finite
     */
    public Estimate value(double x, double t) {
        Checks.finite("x", x);
        Checks.nonNegative("t", t);
        if (rate == null) {
            double sum = 0;
            double comp = 0;
            for (int k = 0; k < times.length && times[k] < t; k++) {
                final double term = masses[k] * kernel.value(x, t - times[k]);
                final double s = sum + term;
                comp += Math.abs(sum) >= Math.abs(term) ? (sum - s) + term : (term - s) + sum;
                sum = s;
            }
            return Estimate.of(sum + comp, 0.0);
        }
        if (t == 0) {
            return Estimate.of(0.0, 0.0);
        }
        final double[] pts = new double[breakpoints.length + 2];
        int np = 0;
        pts[np++] = 0;
        for (double b : breakpoints) {
            if (b > pts[np - 1] && b < t) {
                pts[np++] = b;
            }
        }
        pts[np++] = t;
        final AdaptiveKronrod q = new AdaptiveKronrod(MAX_INTERVALS);
        q.integrate(s -> {
            final double r = rate.applyAsDouble(s);
            if (!Double.isFinite(r)) {
                throw Checks.fail("rate(" + s + ")", r, "must be finite");
            }
            final double tau = t - s;
            return r == 0 || tau <= 0 ? 0.0 : r * kernel.value(x, tau);
        }, pts, np, absTol, relTol);
        return Estimate.of(q.value(), q.error());
    }
}
