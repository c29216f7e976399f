package org.advecta.convolution;

import org.advecta.special.ErrorFunctions;

/**
 * The fast path of {@link ProfileConvolution#valuesOnGrid}: uniform samples fⱼ at
 * ξⱼ = ξ₀ + jΔ, outputs at xᵢ = x₀ + iΔ with the same Δ. The weight of segment k at output
 * i depends only on d = i − k (the scaled centre is m_d = (s + (d − ½)Δ)/L with
 * s = x₀ − ξ₀ − vt/R), so
 * <pre>
 * cᵢ = Σⱼ fⱼ·H(i − j) − f_{N−1}·A(i − N + 1) − f₀·B(i + 1) + tails,   H(d) = A(d) + B(d + 1)
 * A(d) = e^{−μt/R}·rising(m_d, h),  B(d) = e^{−μt/R}·rising(−m_d, h),  h = Δ/(2L)
 * </pre>
 * a Toeplitz (discrete) convolution of f with the hat weights H, plus end corrections for
 * the half hats at ξ₀ and ξ_{N−1}. Only the offsets whose segment reaches within
 * {@link #CUT} = 6.5 widths of the kernel's centre are kept: the segments left out carry at
 * most erfc(6.5) ≈ 3.8e-20 of the kernel's mass, so they change cᵢ by at most
 * 3.8e-20·max|f|·e^{−μt/R}.
 *
 * <p>Beside a wall, WallGridConvolution takes this as the free part and adds the wall terms.
 *
 * <p>Package-private engine.
 */
final class GridConvolution {

    /** The window half-width in kernel widths. */
    static final double CUT = 6.5;
    /** Unit roundoff 2⁻⁵³. */
    private static final double U = 0x1.0p-53;
    /**
     * Bound on the relative error of one weight A(d) or B(d), in units of U: the segment
     * integrals' 32 + 4κ with κ = 2y² ≤ 2·6.5² from rounding s + (d − ½)Δ (measured far
     * below, see the tests).
     */
    private static final double WEIGHT_ERROR = 32 + 4 * 2 * CUT * CUT;
    /** Butterfly operations per FFT element and pass, relative to one window multiply-add. */
    static final double FFT_COST = 3.0;
    /** The largest padded FFT length (2³⁰ doubles per array). */
    private static final int MAX_FFT = 1 << 30;

    private GridConvolution() {
    }

    /**
     * Evaluates the grid convolution; see {@link ProfileConvolution#valuesOnGrid}.
     *
     * @return a bound on the absolute error of every out[i]
     */
    static double evaluate(InfiniteLineKernel.Frozen s, PiecewiseLinearProfile p,
                           double outOrigin, double[] out, GridMethod method) {
        final double[] f = p.valuesView();
        final int n = f.length;
        final int nOut = out.length;
        final double step = p.spacing();
        final double decay = s.decay();
        final double maxAbs = p.maxAbs();
        final boolean constant = p.extension() == PiecewiseLinearProfile.Extension.CONSTANT;
        final double first = p.nodesView()[0];
        final double last = p.nodesView()[n - 1];
        if (s.collapsed()) {
            for (int i = 0; i < nOut; i++) {
                out[i] = decay * p.valueAt(s.origin(Math.fma(i, step, outOrigin)));
            }
            return 4 * U * maxAbs * decay;
        }
        if (nOut == 0) {
            return 0.0;
        }
        // s = x₀ − ξ₀ − vt/R, the scaled half-width h, and the window of segment offsets
        final double shift = ((outOrigin - p.origin()) - s.driftHigh()) - s.driftLow();
        final double h = s.scale(0.5 * step);
        final double reach = CUT * s.width() / step + 1;
        final double centreOffset = -shift / step + 0.5;
        final long lowest = -(n - 2);
        final long highest = nOut - 1;
        final long dLo = clampToLong(Math.floor(centreOffset - reach) - 1, lowest, highest + 1);
        final long dHi = clampToLong(Math.ceil(centreOffset + reach) + 1, lowest - 1, highest);
        if (dLo > dHi) {
            tailsOnly(s, outOrigin, step, f, first, last, constant, out);
            return (CUT_MASS + 8 * U) * maxAbs * decay;
        }
        final int k = (int) (dHi - dLo + 1);
        final double[] a = new double[k];
        final double[] b = new double[k];
        for (int e = 0; e < k; e++) {
            final long d = dLo + e;
            final double m = s.scale(Math.fma(d - 0.5, step, shift));
            final double lo = s.scale(Math.fma(d - 1.0, step, shift));
            final double hi = s.scale(Math.fma(d, step, shift));
            a[e] = decay * InfiniteLineKernel.Frozen.weights(m, h, lo, hi, 1.0, 0.0);
            b[e] = decay * InfiniteLineKernel.Frozen.weights(m, h, lo, hi, 0.0, 1.0);
        }
        // hat weights H(d) = A(d) + B(d + 1) for d in [dLo − 1, dHi]
        final int kh = k + 1;
        final long hLo = dLo - 1;
        final double[] hat = new double[kh];
        for (int e = 0; e < kh; e++) {
            final long d = hLo + e;
            final double av = d >= dLo ? a[(int) (d - dLo)] : 0.0;
            final double bv = d + 1 <= dHi ? b[(int) (d + 1 - dLo)] : 0.0;
            hat[e] = av + bv;
        }
        final long padded = Long.highestOneBit(Math.max(2L, (long) n + kh - 1) - 1) << 1;
        final boolean useFft;
        switch (method) {
            case WINDOW:
                useFft = false;
                break;
            case FFT:
                useFft = padded <= MAX_FFT;
                break;
            default:
                final double windowCost = (double) nOut * kh;
                final double fftCost = FFT_COST * padded * (63 - Long.numberOfLeadingZeros(padded));
                useFft = padded <= MAX_FFT && fftCost < windowCost;
        }
        double bound = (CUT_MASS + (WEIGHT_ERROR + 8) * U) * maxAbs * decay
            + positionError(s, p, outOrigin, nOut);
        if (useFft) {
            bound += fft(f, hat, hLo, out, (int) padded, maxAbs);
        } else {
            window(f, hat, hLo, out);
            bound += (kh + 2) * U * maxAbs * decay;
        }
        // end corrections (half hats at ξ₀ and ξ_{N−1}) and the tails
        for (int i = 0; i < nOut; i++) {
            double c = out[i];
            final long dEnd = (long) i - (n - 1);
            if (dEnd >= dLo && dEnd <= dHi) {
                c -= f[n - 1] * a[(int) (dEnd - dLo)];
            }
            final long dStart = (long) i + 1;
            if (dStart >= dLo && dStart <= dHi) {
                c -= f[0] * b[(int) (dStart - dLo)];
            }
            if (constant) {
                final double x = Math.fma(i, step, outOrigin);
                c += f[0] * s.below(x, first) + f[n - 1] * s.above(x, last);
            }
            out[i] = c;
        }
        return bound;
    }

    /**
     * The effect of rounding the scaled distances: s + (d − ½)Δ is rounded once (the direct
     * route rounds xᵢ − ξⱼ instead), a change of at most 2⁻⁵³·(|x₀| + |ξ₀| + |vt/R| +
     * (N + N_out)Δ) in position, hence of c by that times max|∂c/∂x| ≤ e^{−μt/R}·(max|slope|
     * + (|f₀| + |f_{N−1}|)/(L√π)) (the end jumps of zero-extended data); counted 4 times.
     */
    private static double positionError(InfiniteLineKernel.Frozen s, PiecewiseLinearProfile p,
                                        double outOrigin, int nOut) {
        final double[] f = p.valuesView();
        final int n = f.length;
        double slope = 0;
        for (int j = 1; j < n; j++) {
            slope = Math.max(slope, Math.abs(f[j] - f[j - 1]));
        }
        slope /= p.spacing();
        if (p.extension() == PiecewiseLinearProfile.Extension.ZERO) {
            slope += (Math.abs(f[0]) + Math.abs(f[n - 1])) / (s.width() * SegmentIntegrals.SQRT_PI);
        }
        final double reach = Math.abs(outOrigin) + Math.abs(p.origin()) + Math.abs(s.drift())
            + ((double) n + nOut) * p.spacing();
        return 4 * U * reach * slope * s.decay();
    }

    /** erfc(CUT) rounded up: the kernel mass outside the window. */
    private static final double CUT_MASS = ErrorFunctions.erfc(CUT) * (1 + 0x1.0p-40);

    private static long clampToLong(double v, long lo, long hi) {
        if (!(v >= lo)) {
            return lo;
        }
        if (!(v <= hi)) {
            return hi;
        }
        return (long) v;
    }

    private static void tailsOnly(InfiniteLineKernel.Frozen s, double outOrigin, double step,
                                  double[] f, double first, double last, boolean constant,
                                  double[] out) {
        for (int i = 0; i < out.length; i++) {
            if (constant) {
                final double x = Math.fma(i, step, outOrigin);
                out[i] = f[0] * s.below(x, first) + f[f.length - 1] * s.above(x, last);
            } else {
                out[i] = 0.0;
            }
        }
    }

    /** out[i] = Σⱼ f[j]·hat[i − j − hLo] over the j where the index is in range. */
    private static void window(double[] f, double[] hat, long hLo, double[] out) {
        final int n = f.length;
        final int kh = hat.length;
        for (int i = 0; i < out.length; i++) {
            // e = i − j − hLo ∈ [0, kh) ⟺ j ∈ (i − hLo − kh, i − hLo]
            final long base = i - hLo;
            final int jHi = (int) Math.min(n - 1L, base);
            final int jLo = (int) Math.max(0L, base - kh + 1);
            double sum = 0;
            if (jLo <= jHi) {
                final int b = (int) (base - jLo);
                for (int j = jLo, e = b; j <= jHi; j++, e--) {
                    sum = Math.fma(f[j], hat[e], sum);
                }
            }
            out[i] = sum;
        }
    }

    /**
     * out[i] = (f ∗ hat)[i − hLo] by zero-padded FFT of length m; returns the error bound.
     * The data are scaled by a power of two to max 1 (no overflow, no rounding), and hat by a
     * power of two that matches its 2-norm to that of f, so that the two real sequences can
     * share one complex transform (z = f + iσH) without one's rounding swamping the other.
     */
    private static double fft(double[] f, double[] hat, long hLo, double[] out, int m,
                              double maxAbs) {
        final int n = f.length;
        final int kh = hat.length;
        if (maxAbs == 0) {
            java.util.Arrays.fill(out, 0.0);
            return 0.0;
        }
        final int e = Math.getExponent(maxAbs) + 1;
        double f1 = 0;
        double f2 = 0;
        double g1 = 0;
        double g2 = 0;
        final double[] re = new double[m];
        final double[] im = new double[m];
        for (int j = 0; j < n; j++) {
            final double v = Math.scalb(f[j], -e);
            re[j] = v;
            f1 += Math.abs(v);
            f2 += v * v;
        }
        for (int j = 0; j < kh; j++) {
            g1 += Math.abs(hat[j]);
            g2 += hat[j] * hat[j];
        }
        f2 = Math.sqrt(f2);
        g2 = Math.sqrt(g2);
        if (g2 == 0) {
            java.util.Arrays.fill(out, 0.0);
            return 0.0;
        }
        final int sigmaExp = Math.getExponent(f2) - Math.getExponent(g2);
        for (int j = 0; j < kh; j++) {
            im[j] = Math.scalb(hat[j], sigmaExp);
        }
        final RadixTwoFft t = new RadixTwoFft(m);
        t.forward(re, im);
        // unpack F = (Z_k + conj Z_{m−k})/2 and σH = (Z_k − conj Z_{m−k})/(2i), multiply,
        // and store conj(F·σH) for the inverse transform (IFFT(P) = conj(FFT(conj P))/m)
        final double invSigma = Math.scalb(1.0, -sigmaExp);
        for (int k = 0; k <= m / 2; k++) {
            final int q = (m - k) & (m - 1);
            final double zr = re[k];
            final double zi = im[k];
            final double wr = re[q];
            final double wi = im[q];
            final double fr = 0.5 * (zr + wr);
            final double fi = 0.5 * (zi - wi);
            final double hr = 0.5 * (zi + wi);
            final double hi = -0.5 * (zr - wr);
            final double pr = (fr * hr - fi * hi) * invSigma;
            final double pi = (fr * hi + fi * hr) * invSigma;
            // P_k and P_{m−k} = conj P_k; store conj P at k and P at m − k
            re[k] = pr;
            im[k] = -pi;
            if (q != k) {
                re[q] = pr;
                im[q] = pi;
            }
        }
        t.forward(re, im);
        final double scale = Math.scalb(1.0, e) / m;
        final int total = n + kh - 1;
        for (int i = 0; i < out.length; i++) {
            final long idx = i - hLo;
            out[i] = idx >= 0 && idx < total ? re[(int) idx] * scale : 0.0;
        }
        // Higham (2002) Thm 24.2: ‖FFT error‖₂ ≤ δ·‖exact‖₂, δ = log₂M·η/(1 − log₂M·η),
        // η = μ + γ₄(√2 + μ), twiddle error μ ≤ 4U; carried through unpacking, product and
        // inverse (first order, with a margin of 2 for the second-order terms)
        final double mu = 4 * U;
        final double gamma4 = 4 * U / (1 - 4 * U);
        final double eta = mu + gamma4 * (Math.sqrt(2) + mu);
        final double lg = t.passes();
        final double delta = lg * eta / (1 - lg * eta);
        final double sigmaNorm = Math.scalb(f2, -sigmaExp);
        final double bound = (3 * delta + 3 * U) * f2 * g1 + delta * f1 * (sigmaNorm + g2);
        return 2 * bound * Math.scalb(1.0, e);
    }
}
