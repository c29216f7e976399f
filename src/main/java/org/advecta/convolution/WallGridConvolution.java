package org.advecta.convolution;

import org.advecta.special.ErrorFunctions;
import org.advecta.special.Exponentials;

/**
 * The grid path of {@link ProfileConvolution#valuesOnGrid} beside a wall at x = 0
 * ({@link HalfLineKernel}): the free part G₀ as the discrete convolution of
 * {@link GridConvolution}, plus the wall terms (the image, and for the zero-flux wall the erfc
 * term) as a second discrete sum over the output points and segment offsets they reach. In
 * widths (X = x/L, Ξ = ξ/L, P = (vt/R)/L, Z = X + Ξ + P, y₀ = X − P, E = e^{−μt/R}):
 * <pre>
 * image   I·L = exp(4PX − Z²)/√π = G₀·L·e^{−4XΞ} = exp(−(X + Ξ − P)² − 4PΞ)/√π
 * erfc    (v/(2D))·T·L = 2P·e^{4PX}·erfc(Z)                           (zero-flux wall)
 * mass    ∫₀^∞ I dξ = ½e^{4PX}erfc(X + P),   ∫₀^∞ |v/(2D)|·T dξ = 2|P|·e^{4PX}·i¹erfc(X + P)
 * </pre>
 *
 * <p><b>Structure.</b> On a common spacing Δ the segment k = [ξₖ, ξₖ₊₁] seen from the output
 * xᵢ spans Z ∈ [z_d, z_d + Δ/L], d = i + k: the hat weights of its two ends (HalfLineKernel's
 * closed forms: Gaussian hats for the image, i¹erfc/i²erfc hats for the erfc term, see
 * WallIntegrals) depend on d alone, times e^{4PX}, which would overflow for P &gt; 0. So
 * <pre>
 * P &lt; 0:  wallᵢ = e^{4PXᵢ} · Σₖ [fₖ₊₁·W⁺(i + k) + fₖ·W⁻(i + k)]             e^{4PX} ≤ 1
 * P ≥ 0:  wallᵢ = Σₖ e^{−4PΞₖ}·[fₖ₊₁·W⁺(i + k) + fₖ·W⁻(i + k)],  W scaled by e^{4P(X + Ξₖ)}
 * </pre>
 * (for P ≥ 0 the closed forms come scaled by e^{z_d²}, and e^{4P(X + Ξₖ) − z_d²} = e^{−y²},
 * y = X + Ξₖ − P: every factor is at most 1, nothing overflows at any Péclet number). The
 * W(d) are computed once per offset (O(K) closed forms) and the sums are O(K) multiply-adds per
 * output point reached.
 *
 * <p><b>Which outputs.</b> The wall part at x is at most max|f|·E·(the two masses), bounded by
 * the envelope env(X) (erfcx ≤ 1, e^{z²}i¹erfc z ≤ min(1/√π, 1/(2√π z²)) for z ≥ 0,
 * erfc ≤ 2 and i¹erfc z ≤ 1/√π + 2|z| for z &lt; 0; A&amp;S 7.1.13, 7.2.1, the second from the
 * first):
 * <pre>
 * P ≥ 0:             env = e^{−y₀²}·(½ + min(2P, 1/P)/√π)   (the erfc part for the zero-flux wall only)
 * P &lt; 0, X + P ≥ 0:  env = e^{−y₀²}·(½ + 2|P|/√π)
 * P &lt; 0, X + P &lt; 0:  env = e^{4PX}·(1 + 2|P|·(1/√π + 2|X + P|))
 * </pre>
 * Outputs with env ≤ e^{−1 − CUT²} keep the free part alone (the wall would change them by
 * less than e^{−CUT²}·max|f|·E).
 *
 * <p><b>Which offsets.</b> For P ≥ 0 the offsets d with |X + Ξ − P| ≤ CUT: the image left out
 * holds at most erfc(CUT) of the mass of exp(−(X + Ξ − P)²)/√π, and the erfc term is at most 2I
 * pointwise (erfcx(Z) ≤ 1/(√π Z), Z ≥ P), so at most 2·erfc(CUT) more. For P &lt; 0 and the
 * absorbing wall |Z| ≤ CUT (left out: e^{4PX}·erfc(CUT)). For P &lt; 0 and the zero-flux wall
 * the erfc term reaches back from Z = 0 to the wall: offsets with |Z| ≤ Z_c,
 * Z_c² = CUT² + ln max(1, 2|P|), are summed; below them erfc(Z) = 2 less at most erfc(Z_c), so
 * those segments enter as (4|P|/L)·e^{4PX}·(their trapezoid mass) from a compensated prefix
 * sum; each side leaves out at most 2|P|·i¹erfc(Z_c) ≤ e^{−CUT²}/(2√π·CUT²) (i¹erfc z ≤
 * e^{−z²}/(2√π z²)). The constant extensions [0, ξ₀] and [ξ_{N−1}, ∞) are evaluated with the
 * per-point closed forms. All truncation together is below {@link #TRUNCATION}·max|f|·E
 * ≈ 1.6e-18·max|f|·E.
 *
 * <p><b>Rounding.</b> The W(d) are HalfLineKernel's segment closed forms at arguments that
 * differ from the per-point route's only in the rounding of the positions, so each obeys its
 * per-segment contract, (1e-12 + 16κ·2⁻⁵³) of the |φ|-weighted ∫(G₀ + |wall terms|),
 * κ = 2(1 + y)(|x| + |vt/R| + |ξ|)/L, here with y ≤ CUT + Z_c and ξ the largest kept node; in
 * sum at most that times max|f|·E·(1 + env) (for the zero-flux wall with flow towards it, whose
 * wall kernel is positive, 1 + 4|P|·e^{4PX}·(the kept length in widths), and the plateau and
 * constant pieces by their own magnitudes). The factors e^{−4PΞ}, e^{4PX} (argument A ≤ 745
 * where they are not negligible) add (A + 2)·2⁻⁵³ of the wall part, and the sum 2K·2⁻⁵³. The
 * bound returned is the free part's plus E·(the largest of these over the outputs +
 * TRUNCATION·max|f|).
 *
 * <p><b>Cost.</b> O(N) cheap tests (an exp and a log per output point), O(K) closed forms, and
 * O(N_w·K) multiply-adds for the N_w outputs the wall reaches, K ≈ 2·CUT·L/Δ offsets
 * (2·Z_c·L/Δ for the zero-flux wall with flow towards it). The wall reaches |x − vt/R| ≲ 6.6·L
 * for flow away from it and x ≲ min(|vt/R|, 11·L²/|vt/R|) + 6.6·L for flow towards it, so
 * N_w ≲ 14·L/Δ and the wall adds O((L/Δ)²) (at most N·K) to the free part. Memory: two arrays
 * of K doubles, and one of N for P ≠ 0 (the data factors or the prefix sums); none per point.
 *
 * <p>Package-private engine.
 */
final class WallGridConvolution {

    /** The window half-width in kernel widths, as for the free part. */
    static final double CUT = GridConvolution.CUT;
    /** Unit roundoff 2⁻⁵³. */
    private static final double U = 0x1.0p-53;
    /** HalfLineKernel's per-segment relative contract (its javadoc; tested there). */
    static final double SEGMENT_ERROR = 1e-12;
    /** The skip threshold on ln env: −1 − CUT² (a margin of e for the envelope's rounding). */
    private static final double SKIP = -1 - CUT * CUT;
    /**
     * The truncated wall mass, relative to max|f|·E, rounded up: at most 3·erfc(CUT) (P ≥ 0),
     * erfc(CUT) + e^{−CUT²}/(√π·CUT²) (P &lt; 0) or e^{−CUT²} (outputs skipped); taken as
     * 1.01·(3·(erfc(CUT) + ½e^{−CUT²}) + e^{−CUT²}).
     */
    static final double TRUNCATION = (3 * (ErrorFunctions.erfc(CUT) + 0.5 * Math.exp(-CUT * CUT))
        + Math.exp(-CUT * CUT)) * 1.01;
    private static final double ONE_OVER_SQRT_PI = SegmentIntegrals.ONE_OVER_SQRT_PI;

    private WallGridConvolution() {
    }

    /**
     * Evaluates the grid convolution beside a wall; see {@link ProfileConvolution#valuesOnGrid}.
     *
     * @param s the half-line kernel at t
     * @param p uniform data, nodes ≥ 0
     * @param outOrigin x₀ ≥ 0
     * @param out receives the values
     * @param method how the free part's discrete convolution is evaluated
     * @return a bound on the absolute error of every out[i]
     */
    static double evaluate(HalfLineKernel.Frozen s, PiecewiseLinearProfile p, double outOrigin,
                           double[] out, GridMethod method) {
        final InfiniteLineKernel.Frozen free = s.free();
        final double freeBound = GridConvolution.evaluate(free, p, outOrigin, out, method);
        final int nOut = out.length;
        if (s.collapsed() || nOut == 0) {
            // the wall layer is thinner than any resolvable length (as in value)
            return freeBound;
        }
        final double[] nodes = p.nodesView();
        final double[] f = p.valuesView();
        final int n = f.length;
        final double step = p.spacing();
        final double xi0 = nodes[0];
        final double last = nodes[n - 1];
        final double decay = s.decay();
        final double maxAbs = p.maxAbs();
        final boolean constant = p.extension() == PiecewiseLinearProfile.Extension.CONSTANT;
        final boolean zeroFlux = s.zeroFlux();
        final double pe = s.pe();
        final double absPe = Math.abs(pe);
        final double width = free.width();
        // the erfc term reaches back to the wall: zero-flux wall, flow towards it
        final boolean reachBack = zeroFlux && pe < 0;
        final double zc = Math.sqrt(CUT * CUT + Math.log(Math.max(1.0, 2 * absPe)));
        final double lnAway = Math.log(0.5 + (zeroFlux && pe > 0
            ? Math.min(2 * pe, 1 / pe) * ONE_OVER_SQRT_PI : 0.0));
        final double lnTowards = Math.log(0.5 + (zeroFlux ? 2 * absPe * ONE_OVER_SQRT_PI : 0.0));
        // the wall terms of segment k at output i depend on d = i + k (z = (x + ξ + vt/R)/L)
        // times a factor of x alone (P < 0: e^{4PX} ≤ 1) or of ξ alone (P ≥ 0: e^{−4PΞ} ≤ 1)
        final double h = free.scale(0.5 * step);
        final double zBase = ((outOrigin + xi0) + free.driftHigh()) + free.driftLow();
        final double yBase = free.origin(outOrigin) + xi0;
        final double reachOfWindow = reachBack ? zc : CUT;
        final double cBase = free.scale(pe >= 0 ? yBase : zBase);
        final double slack = 8 * U * free.scale(Math.abs(outOrigin) + Math.abs(free.drift()) + xi0
            + ((double) nOut + n) * step) + 8 * U * (zc + 1);
        final long dMax = (long) nOut - 1 + (n - 2);
        final long dLo = clamp(Math.floor((-reachOfWindow - slack - cBase) / (2 * h)) - 2, 0, dMax + 1);
        final long dHi = clamp(Math.ceil((reachOfWindow + slack - cBase) / (2 * h)) + 1, -1, dMax);
        final int kw = (int) Math.max(0, dHi - dLo + 1);
        final double[] high = new double[kw];
        final double[] low = new double[kw];
        weights(s, pe, zBase, yBase, step, h, dLo, high, low);
        // P > 0: the data carry e^{−4PΞ_k} (the left end's, for both ends of segment k)
        final double[] g = pe > 0 && n > 1 ? new double[n - 1] : null;
        if (g != null) {
            for (int k = 0; k < n - 1; k++) {
                g[k] = Math.exp(-4 * pe * free.scale(nodes[k]));
            }
        }
        final double[] prefix = reachBack ? trapezoidPrefix(f, step) : null;
        double worst = 0;
        for (int i = 0; i < nOut; i++) {
            final double x = Math.fma(i, step, outOrigin);
            if (constant) {
                // the free grid path extends f₀ down to −∞; the half-line's data stop at 0
                out[i] -= f[0] * free.below(x, 0.0);
            }
            if (!zeroFlux && x == 0) {
                // the absorbing wall: c(0, t) = 0 exactly for t > 0
                out[i] = 0.0;
                continue;
            }
            final double bigX = free.scale(x);
            final double y0 = free.scale(free.origin(x));
            final double z0 = bigX + pe;
            final double lnEnv;
            if (pe >= 0) {
                lnEnv = -y0 * y0 + lnAway;
            } else if (z0 >= 0) {
                lnEnv = -y0 * y0 + lnTowards;
            } else {
                lnEnv = 4 * pe * bigX + Math.log1p(zeroFlux
                    ? 2 * absPe * (ONE_OVER_SQRT_PI + 2 * -z0) : 0.0);
            }
            if (!(lnEnv > SKIP)) {
                continue;
            }
            // segments k with d = i + k in the window
            final long kLo = Math.max(0, dLo - i);
            final long kHi = Math.min(n - 2L, dHi - i);
            double sum = 0;
            if (g != null) {
                for (long k = kLo; k <= kHi; k++) {
                    final int j = (int) k;
                    final int e = (int) (i + k - dLo);
                    sum = Math.fma(f[j + 1] * g[j], high[e], Math.fma(f[j] * g[j], low[e], sum));
                }
            } else {
                for (long k = kLo; k <= kHi; k++) {
                    final int j = (int) k;
                    final int e = (int) (i + k - dLo);
                    sum = Math.fma(f[j + 1], high[e], Math.fma(f[j], low[e], sum));
                }
            }
            final double alpha = pe < 0 ? Math.exp(4 * pe * bigX) : 1.0;
            final long kept = Math.max(0, kHi - kLo + 1);
            final double top = kept > 0 ? free.scale(nodes[(int) kHi + 1]) : 0.0;
            final double kappa = 2 * (1 + CUT + zc) * (Math.abs(bigX) + absPe + Math.max(top, 0.0));
            final double rel = SEGMENT_ERROR + (16 * kappa + 2 * kept + 8) * U;
            // the factors e^{−4PΞ} (P > 0, arguments to 745) or e^{4PX} (P < 0) of the wall part
            final double factorError = (pe > 0 ? 750 : Math.abs(4 * pe * bigX) + 2) * U;
            double extra = 0;
            double err;
            if (reachBack) {
                // the kernel I + |v/(2D)|·T is positive here: the window's ∫|φ||wall| is at
                // most max|f|·(1 + 4|P|·e^{4PX}·(the kept segments' length in widths))
                err = rel * maxAbs * (1 + 4 * absPe * alpha * (kept * 2 * h))
                    + factorError * maxAbs * (alpha + 4 * absPe * alpha * (kept * 2 * h));
                final long plateau = Math.min(Math.max(0, dLo - i), n - 1L);
                if (plateau > 0) {
                    // segments below Z = −Z_c: −(v/(2D))·∫φ·e^{vx/D}·2 dξ = (4|P|/L)·e^{4PX}·mass
                    final double coefficient = 4 * absPe / width * alpha;
                    extra += coefficient * prefix[(int) plateau];
                    err += coefficient * maxAbs * (plateau * step) * (Math.abs(4 * pe * bigX) + 8) * U;
                }
                if (constant) {
                    // positive kernel: each constant piece's ∫|φ||wall| is |its value|
                    final double below = xi0 > 0 ? s.wallLinear(x, 0.0, xi0, f[0], f[0]) : 0.0;
                    final double above = f[n - 1] * s.wallAbove(x, last);
                    extra += below + above;
                    err += (rel + 4 * U) * (Math.abs(below) + Math.abs(above));
                }
            } else {
                if (constant) {
                    if (xi0 > 0) {
                        extra += s.wallLinear(x, 0.0, xi0, f[0], f[0]);
                    }
                    extra += f[n - 1] * s.wallAbove(x, last);
                }
                // the whole wall part's ∫|φ||wall| is at most max|f|·env
                final double env = Math.exp(lnEnv);
                err = rel * maxAbs * (1 + env) + factorError * maxAbs * env;
            }
            out[i] += decay * (alpha * sum + extra);
            worst = Math.max(worst, err);
        }
        final double wallBound = decay * (worst + (TRUNCATION + 8 * U) * maxAbs);
        return freeBound + wallBound * (1 + 16 * U);
    }

    /**
     * The wall weights of the high and low end of a segment with d = i + k, for d from dLo:
     * for P ≥ 0 multiplied by e^{4P·S_d} (S_d = X + Ξ at the segment's low end), which with
     * the scaling e^{z_a²} of the closed forms leaves e^{−y²}, y = S_d − P; for P &lt; 0
     * unscaled (the output's factor e^{4PX} is applied per point).
     */
    private static void weights(HalfLineKernel.Frozen s, double pe, double zBase, double yBase,
                                double step, double h, long dLo, double[] high, double[] low) {
        final InfiniteLineKernel.Frozen free = s.free();
        final boolean zeroFlux = s.zeroFlux();
        final double sign = zeroFlux ? 1.0 : -1.0;
        for (int e = 0; e < high.length; e++) {
            final long d = dLo + e;
            final double za = free.scale(Math.fma(d, step, zBase));
            final double zb = free.scale(Math.fma(d + 1.0, step, zBase));
            final double m = 0.5 * za + 0.5 * zb;
            // the image's scaling e^{ref²} (ref the end nearest 0) and the erfc hats' e^{za²}
            final double imageScale;
            final double erfcScale;
            if (pe >= 0) {
                // za ≥ 0: both scaled by e^{za²}; e^{4P·S_d − za²} = e^{−y²}
                imageScale = Exponentials.expMinusSquare(free.scale(Math.fma(d, step, yBase)));
                erfcScale = imageScale;
            } else if (za >= 0) {
                imageScale = Exponentials.expMinusSquare(za);
                erfcScale = imageScale;
            } else {
                imageScale = zb <= 0 ? Exponentials.expMinusSquare(zb) : 1.0;
                erfcScale = 1.0;
            }
            double hi = 0;
            double lo = 0;
            if (imageScale != 0) {
                hi = sign * imageScale * WallIntegrals.risingScaled(m, h, za, zb);
                lo = sign * imageScale * WallIntegrals.risingScaled(-m, h, -zb, -za);
            }
            if (zeroFlux && pe != 0 && erfcScale != 0) {
                // −(v/(2D))·L = −2P times the erfc hats
                hi -= 2 * pe * erfcScale * WallIntegrals.erfcHat(za, zb, h, true);
                lo -= 2 * pe * erfcScale * WallIntegrals.erfcHat(za, zb, h, false);
            }
            high[e] = hi;
            low[e] = lo;
        }
    }

    /** prefix[k] = Σ_{k′ &lt; k} Δ·(f_{k′} + f_{k′+1})/2 with Neumaier's compensated sum. */
    private static double[] trapezoidPrefix(double[] f, double step) {
        final double[] prefix = new double[f.length];
        double sum = 0;
        double comp = 0;
        for (int k = 0; k + 1 < f.length; k++) {
            prefix[k] = sum + comp;
            final double term = 0.5 * step * (f[k] + f[k + 1]);
            final double t = sum + term;
            comp += Math.abs(sum) >= Math.abs(term) ? (sum - t) + term : (term - t) + sum;
            sum = t;
        }
        prefix[f.length - 1] = sum + comp;
        return prefix;
    }

    private static long clamp(double v, long lo, long hi) {
        if (!(v >= lo)) {
            return lo;
        }
        if (!(v <= hi)) {
            return hi;
        }
        return (long) v;
    }
}
