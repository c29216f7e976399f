package org.advecta.convolution;

import java.util.Arrays;
import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * The exact solution for sampled initial data: the piecewise-linear (or piecewise-constant)
 * interpolant of a {@link PiecewiseLinearProfile} convolved with the kernel, segment by
 * segment in closed form. Immutable and thread-safe.
 *
 * <pre>
 * c(x, t) = Σₖ ∫ over [ξₖ, ξₖ₊₁] of φ(ξ)·G(x, ξ, t) dξ  (+ f₀·∫ below ξ₀ + f_{n−1}·∫ above ξ_{n−1})
 *         = e^{−μt/R} Σₖ [fₖ·rising(mₖ, hₖ) + fₖ₊₁·rising(−mₖ, hₖ)]   on the infinite line
 * </pre>
 * (the weights are described at {@link InfiniteLineKernel}). The result is exact for the
 * interpolant, not an approximation of it: a box (a slug) or a step given as samples
 * reproduces the closed forms to rounding. Each weight is non-negative, so non-negative
 * data give a non-negative solution.
 *
 * <p><b>Accuracy.</b> value(x, t) is within (48 + 4κ)·2⁻⁵³ of Σₖ |contributions| (the same
 * sum with |fₖ|; for non-negative data a relative bound), κ the condition number with
 * respect to the positions and the decay, (|x| + |vt/R| + max|ξ|)·|∂c/∂x|/|c| + μt/R
 * (measured against 50-digit quadrature: at most 0.18 of that bound, 622 units of 2⁻⁵³ at
 * κ ≈ 10³). Where the contributions themselves are subnormal (far tails, below 2.2e-308)
 * the bound holds in absolute terms only to about 2¹¹·{@link Double#MIN_VALUE} per segment:
 * the segment integrals are formed from subnormal exponentials before their final scaling
 * (see the property test of the weights). Each end of each segment enters with a single
 * rounding of its distance x − vt/R − ξ (two-sums), so a point near a node far from the
 * origin keeps its accuracy.
 * Segments farther than Y_cut widths from x − vt/R, with Y_cut² = 745 + ln max(1, max|f|),
 * are left out: together they hold less than half of {@link Double#MIN_VALUE}. The gradient
 * is, on the infinite line, the sum of φ(a)G(a) − φ(b)G(b) + φ′·∫ₐᵇG over the segments
 * (∂G/∂x = −∂G/∂ξ), every term added separately with compensated summation so that the end
 * terms of neighbouring segments cancel exactly; it is tested against the closed forms of
 * the box and the step to 1e-12 of Σ|jumps|·G.
 *
 * <p><b>Cost.</b> value: O(log n + w) for w segments within Y_cut·L of x − vt/R (w ≤ n).
 * {@link #valuesOnGrid}: O(N·K) or O(M log M) for a whole uniform grid, on the line and
 * beside a wall (see there).
 *
 * <p>At t = 0, and when the kernel width is far below any resolvable length, the value is
 * the interpolant itself at x − vt/R (times the decay), with the mean of the one-sided
 * values at jumps; the gradient is the slope there (the mean of the one-sided slopes at a
 * kink, ±∞ at a jump).
 */
public final class ProfileConvolution implements Solution1D {

    private final ConvolutionKernel kernel;
    private final PiecewiseLinearProfile profile;
    private final double cut;

    private ProfileConvolution(ConvolutionKernel kernel, PiecewiseLinearProfile profile) {
        if (kernel == null) {
            throw new IllegalArgumentException("kernel: must not be null");
        }
        if (profile == null) {
            throw new IllegalArgumentException("profile: must not be null");
        }
        if (kernel.domain() == Domain.HALF_LINE && profile.nodesView()[0] < 0) {
            throw Checks.fail("nodes[0]", profile.nodesView()[0],
                "must be >= 0 on the half-line");
        }
        this.kernel = kernel;
        this.profile = profile;
        this.cut = Math.sqrt(745 + Math.log(Math.max(1.0, profile.maxAbs())));
    }

    /**
     * Returns the solution on the infinite line for the given data.
     *
     * @param parameters v, D, R, μ
     * @param profile the initial data
     * @return the solution
     * @throws IllegalArgumentException if an argument is null
     */
    public static ProfileConvolution of(TransportParameters parameters,
                                        PiecewiseLinearProfile profile) {
        return new ProfileConvolution(InfiniteLineKernel.of(parameters), profile);
    }

    /**
     * Returns the solution for the given kernel (e.g. a half-line with a wall) and data.
     *
     * @param kernel the Green's function and its segment integrals
     * @param profile the initial data (nodes ≥ 0 on the half-line)
     * @return the solution
     * @throws IllegalArgumentException if an argument is null or a node is outside the domain
     */
    public static ProfileConvolution of(ConvolutionKernel kernel, PiecewiseLinearProfile profile) {
        return new ProfileConvolution(kernel, profile);
    }

    /**
     * Returns the initial data.
     *
     * @return the profile
     */
    public PiecewiseLinearProfile profile() {
        return profile;
    }

    /**
     * Returns the kernel.
     *
     * @return the kernel
     */
    public ConvolutionKernel kernel() {
        return kernel;
    }

    @Override
    public TransportParameters parameters() {
        return kernel.parameters();
    }

    @Override
    public Domain domain() {
        return kernel.domain();
    }

    @Override
    public double value(double x, double t) {
        checkX(x);
        return value(x, kernel.at(t));
    }

    @Override
    public double gradient(double x, double t) {
        checkX(x);
        return gradient(x, kernel.at(t));
    }

    /**
     * A profile at one time: {@code out[i] = value(x[i], t)}, the kernel's time constants
     * computed once.
     *
     * @param x positions; not modified (unless it is also out)
     * @param t time, finite and ≥ 0
     * @param out receives the concentrations; at least as long as x; may be x
     * @throws IllegalArgumentException if an argument is invalid (out then partly written)
     */
    @Override
    public void values(double[] x, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
        final ConvolutionKernel.Snapshot s = kernel.at(t);
        for (int i = 0; i < x.length; i++) {
            out[i] = value(checkX(x[i]), s);
        }
    }

    /**
     * Evaluates the solution on the whole uniform grid xᵢ = x₀ + i·Δ (i &lt; out.length,
     * computed as {@code Math.fma(i, Δ, x₀)}) for data on a uniform grid of the same
     * spacing Δ ({@link PiecewiseLinearProfile#uniform}), as one discrete convolution.
     *
     * <p>Method: on a common spacing the segment weights depend only on the index
     * difference, so the solution is the data convolved with the hat weights
     * H(d) = A(d) + B(d + 1) (a Toeplitz product) plus end corrections and tails. Offsets
     * farther than 6.5 kernel widths are dropped (at most erfc(6.5) ≈ 3.8e-20 of the kernel's
     * mass); the remaining K offsets are summed directly ({@link GridMethod#WINDOW},
     * O(N_out·K)) or by zero-padded FFT of length M ≥ N + K − 1 ({@link GridMethod#FFT},
     * O(M log M)). A kernel far narrower than Δ (tiny D) gives K ≈ 3 and exact weights.
     *
     * <p>Error bound (returned): every out[i] is within the returned value of the exact
     * convolution of the interpolant. It is the sum of the truncation 3.8e-20·max|f|·e^{−μt/R},
     * the weights' rounding (about 1.7e-14·max|f|·e^{−μt/R} at most) and the summation:
     * K·2⁻⁵³·max|f|·e^{−μt/R} for the window, and for the FFT the first-order bound of
     * Higham (2002, Thm 24.2) carried through the product, about
     * 2·log₂M·7·2⁻⁵³·(3‖f‖₂‖H‖₁ + 2.5‖f‖₁‖H‖₂); plus the rounding of the positions,
     * 4·2⁻⁵³·(|x₀| + |ξ₀| + |vt/R| + (N + N_out)Δ)·max|∂c/∂x| with
     * max|∂c/∂x| ≤ e^{−μt/R}·(max|slope| + (|f₀| + |f_{N−1}|)/(L√π)) (the last term only for
     * zero extension, whose ends are jumps). The bound is absolute: where the solution
     * is far below max|f| (far tails), use {@link #values} for relative accuracy. The data
     * are validated finite and scaled by a power of two before the FFT, so no element can
     * overflow or turn the transform into NaN.
     *
     * <p>Memory: two work arrays of K doubles (and two of M for the FFT) per call, none per
     * point.
     *
     * <p><b>Beside a wall</b> ({@link HalfLineKernel}, absorbing or zero-flux, either sign of
     * v): the free part as above (with the constant extension stopped at x = 0), plus the wall
     * terms. The image and the erfc term of a segment seen from xᵢ depend on xᵢ + ξₖ, i.e.
     * on i + k, times a factor of x alone (e^{vx/D} ≤ 1 for v &lt; 0) or of ξ alone
     * (e^{−vξ/D} ≤ 1 for v &gt; 0, the rest combined with the Gaussian), so they are weights
     * of the offset i + k, computed once with HalfLineKernel's closed forms and summed over
     * the offsets within 6.5 widths (for the zero-flux wall with flow towards it, within
     * Z_c = √(6.5² + ln max(1, 2|vt/R|/L)) of the erfc front, the segments behind it by a
     * prefix sum of their masses), only at the output points the wall reaches (an envelope of
     * the wall's mass, ≥ e^{−43}). No factor overflows at any Péclet number. The method
     * chooses how the free part is summed; the wall part is a direct sum of O(K) per point
     * reached, about 14·L/Δ points at most (O((L/Δ)²) in all, at most N·K). The returned bound
     * adds to the free part's: the truncation, below 1.6e-18·max|f|·e^{−μt/R}; and the rounding
     * of the wall terms by HalfLineKernel's per-segment contract, (1e-12 + 16κ·2⁻⁵³)·max|f|·
     * e^{−μt/R}·(1 + the wall's mass envelope), κ = 2(1 + 6.5 + Z_c)(|x| + |vt/R| + |ξ|)/L at
     * the points and nodes involved (beside a zero-flux wall with flow towards it the values
     * near the wall grow like 4|vt/R|/L·∫f dξ/L, and the bound with them: measured up to
     * 5.5e-6 of the largest value at |vt/R|/L = 1e8, 16κ·2⁻⁵³ with κ ∝ |vt/R|/L). Measured: the grid agrees with
     * {@link #values} within the bound for both walls and Péclet numbers |vt/R|/L to 1e8, and
     * with the 50-digit fixtures of data at a wall to 0.0023 of it; elsewhere, where the
     * difference from {@link #values} is measurable, the bound exceeds it by 3e3 (median) to
     * 3e4, the per-segment contract's 1e-12 dominating. On an absorbing wall the grid point x = 0 is exactly 0
     * (t &gt; 0). Output points must be ≥ 0 (x₀ ≥ 0).
     *
     * @param outOrigin x₀, finite (≥ 0 on the half-line)
     * @param t time, finite and ≥ 0
     * @param out receives c(xᵢ, t); its length is the number of output points
     * @param method how to evaluate the discrete convolution (of the free part)
     * @return a bound on |out[i] − c(xᵢ, t)| valid for every i
     * @throws IllegalArgumentException if an argument is invalid (x₀ &lt; 0 on the
     *     half-line), the kernel is neither {@link InfiniteLineKernel} nor
     *     {@link HalfLineKernel}, or the profile is not uniform
     */
    public double valuesOnGrid(double outOrigin, double t, double[] out, GridMethod method) {
        Checks.finite("outOrigin", outOrigin);
        Checks.length("out", out, 0);
        if (method == null) {
            throw new IllegalArgumentException("method: must not be null");
        }
        if (!(kernel instanceof InfiniteLineKernel) && !(kernel instanceof HalfLineKernel)) {
            throw new IllegalArgumentException(
                "kernel: the grid path needs the infinite-line kernel or a half-line kernel");
        }
        if (kernel.domain() == Domain.HALF_LINE) {
            Checks.nonNegative("outOrigin", outOrigin);
        }
        if (!profile.isUniform()) {
            throw new IllegalArgumentException(
                "profile: the grid path needs uniform data (PiecewiseLinearProfile.uniform)");
        }
        if (out.length > 0) {
            Checks.finite("last output point",
                Math.fma(out.length - 1, profile.spacing(), outOrigin));
        }
        if (kernel instanceof HalfLineKernel) {
            final HalfLineKernel.Frozen s = (HalfLineKernel.Frozen) kernel.at(t);
            return WallGridConvolution.evaluate(s, profile, outOrigin, out, method);
        }
        final InfiniteLineKernel.Frozen s = ((InfiniteLineKernel) kernel).at(t);
        return GridConvolution.evaluate(s, profile, outOrigin, out, method);
    }

    private double checkX(double x) {
        if (kernel.domain() == Domain.HALF_LINE) {
            return Checks.nonNegative("x", x);
        }
        return Checks.finite("x", x);
    }

    private double value(double x, ConvolutionKernel.Snapshot s) {
        if (s.collapsed()) {
            return s.decay() * profile.valueAt(s.origin(x));
        }
        final double[] nodes = profile.nodesView();
        final double[] f = profile.valuesView();
        final int n = nodes.length;
        final double centre = s.origin(x);
        final double reach = cut * s.width();
        final int from = Math.max(0, firstAtLeast(nodes, centre - reach) - 1);
        final int to = Math.min(n - 2, firstAbove(nodes, centre + reach) - 1);
        double sum = 0;
        double comp = 0;
        for (int k = from; k <= to; k++) {
            final double term = s.linear(x, nodes[k], nodes[k + 1], f[k], f[k + 1]);
            // Neumaier's compensated summation
            final double t = sum + term;
            comp += Math.abs(sum) >= Math.abs(term) ? (sum - t) + term : (term - t) + sum;
            sum = t;
        }
        if (profile.extension() == PiecewiseLinearProfile.Extension.CONSTANT) {
            final double lo = f[0] * s.below(x, nodes[0]);
            final double hi = f[n - 1] * s.above(x, nodes[n - 1]);
            double t = sum + lo;
            comp += Math.abs(sum) >= Math.abs(lo) ? (sum - t) + lo : (lo - t) + sum;
            sum = t;
            t = sum + hi;
            comp += Math.abs(sum) >= Math.abs(hi) ? (sum - t) + hi : (hi - t) + sum;
            sum = t;
        }
        return sum + comp;
    }

    private double gradient(double x, ConvolutionKernel.Snapshot s) {
        if (s.collapsed()) {
            return s.decay() * initialSlope(s.origin(x));
        }
        final double[] nodes = profile.nodesView();
        final double[] f = profile.valuesView();
        final int n = nodes.length;
        final double centre = s.origin(x);
        final double reach = cut * s.width();
        final int from = Math.max(0, firstAtLeast(nodes, centre - reach) - 1);
        final int to = Math.min(n - 2, firstAbove(nodes, centre + reach) - 1);
        final Neumaier acc = new Neumaier();
        final boolean split = s.translationInvariant();
        for (int k = from; k <= to; k++) {
            final double a = nodes[k];
            final double b = nodes[k + 1];
            if (!(b > a)) {
                continue;
            }
            if (split) {
                // ∂G/∂x = −∂G/∂ξ: φ(a)G(a) − φ(b)G(b) + φ′·∫ₐᵇ G, each term summed on its
                // own, so that the end terms of neighbouring segments cancel exactly
                acc.add(f[k] * s.value(x, a));
                acc.add(-f[k + 1] * s.value(x, b));
                if (f[k] != f[k + 1]) {
                    acc.add((f[k + 1] - f[k]) / (b - a) * s.linear(x, a, b, 1.0, 1.0));
                }
            } else {
                acc.add(s.linearGradient(x, a, b, f[k], f[k + 1]));
            }
        }
        double sum = acc.sum;
        double comp = acc.comp;
        if (profile.extension() == PiecewiseLinearProfile.Extension.CONSTANT) {
            final double lo = f[0] * s.belowGradient(x, nodes[0]);
            final double hi = f[n - 1] * s.aboveGradient(x, nodes[n - 1]);
            double t = sum + lo;
            comp += Math.abs(sum) >= Math.abs(lo) ? (sum - t) + lo : (lo - t) + sum;
            sum = t;
            t = sum + hi;
            comp += Math.abs(sum) >= Math.abs(hi) ? (sum - t) + hi : (hi - t) + sum;
            sum = t;
        }
        return sum + comp;
    }

    /** Neumaier's compensated sum (one per call). */
    private static final class Neumaier {
        double sum;
        double comp;

        void add(double term) {
            final double t = sum + term;
            comp += Math.abs(sum) >= Math.abs(term) ? (sum - t) + term : (term - t) + sum;
            sum = t;
        }
    }

    /** The slope of the interpolant at y (t = 0): mean at kinks, ±∞ at jumps. */
    private double initialSlope(double y) {
        final double[] nodes = profile.nodesView();
        final double[] f = profile.valuesView();
        final int n = nodes.length;
        final boolean constant = profile.extension() == PiecewiseLinearProfile.Extension.CONSTANT;
        if (y < nodes[0] || y > nodes[n - 1]) {
            return 0.0;
        }
        int i = Arrays.binarySearch(nodes, y);
        if (i < 0) {
            i = -i - 1;
            return (f[i] - f[i - 1]) / (nodes[i] - nodes[i - 1]);
        }
        while (i > 0 && nodes[i - 1] == y) {
            i--;
        }
        int j = i;
        if (j + 1 < n && nodes[j + 1] == y) {
            j++;
        }
        final double left = i == 0 ? (constant ? f[0] : 0.0) : f[i];
        final double right = j == n - 1 ? (constant ? f[n - 1] : 0.0) : f[j];
        if (left != right) {
            return (right - left) * Double.POSITIVE_INFINITY;
        }
        final double slopeIn = i == 0 ? 0.0 : (f[i] - f[i - 1]) / (nodes[i] - nodes[i - 1]);
        final double slopeOut = j == n - 1 ? 0.0 : (f[j + 1] - f[j]) / (nodes[j + 1] - nodes[j]);
        return 0.5 * slopeIn + 0.5 * slopeOut;
    }

    /** First index i with a[i] ≥ v (a.length if none). */
    private static int firstAtLeast(double[] a, double v) {
        int lo = 0;
        int hi = a.length;
        while (lo < hi) {
            final int mid = (lo + hi) >>> 1;
            if (a[mid] < v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** First index i with a[i] &gt; v (a.length if none). */
    private static int firstAbove(double[] a, double v) {
        int lo = 0;
        int hi = a.length;
        while (lo < hi) {
            final int mid = (lo + hi) >>> 1;
            if (a[mid] <= v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
