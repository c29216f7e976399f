package org.advecta.plume;

/**
 * The window τ ∈ [τ_a, τ_b] of one piece of a rate history in the quadrature variable
 * w = ln(τ/τ_n), τ_n the window's normalisation point, with the rounding error of each end.
 *
 * <p>A piecewise-constant rate q(t) = qₖ on [tₖ, t_(k+1)) turns the Duhamel integral
 * c(t) = ∫₀ᵗ q(t − τ) g(τ) dτ (Carslaw &amp; Jaeger 1959, §1.14) into
 * Σₖ qₖ ∫ g(τ) dτ over τ ∈ [t − t_(k+1), t − tₖ] (from τ = 0 for the current piece). The ends
 * t − tₖ are kept exactly as unevaluated sums hi + lo (Knuth's two-difference, TAOCP vol. 2,
 * 4.2.2), so that a window that is narrow beside its distance from τ = 0 (a short pulse long
 * ago) is placed to a few units of rounding of its own width, not of t.
 *
 * <p>A workspace (not thread-safe): each evaluator owns one.
 */
final class TimeWindow {

    /** 2⁻⁵³, the unit roundoff. */
    private static final double ROUNDING = 0x1.0p-53;

    /** Which point of the window w is measured from. */
    enum Normalisation {
        /** The upper end τ_b (the window lies before the integrand's peak). */
        UPPER,
        /** The lower end τ_a (the window lies after the peak). */
        LOWER,
        /** The peak, inside the window. */
        PEAK
    }

    /** τ_b = hi + lo exactly. */
    final double[] upper = new double[2];
    /** τ_a = hi + lo exactly; hi = 0 for a window from τ = 0. */
    final double[] lower = new double[2];
    /** The window's ends in w (wA = −∞ for a window from τ = 0). */
    double wA;
    double wB;
    /** Absolute error bounds of each end alone, and of the position of the whole window. */
    double errA;
    double errB;
    double common;

    /**
     * Sets the window of piece k of the history at time t: τ ∈ [t − t_(k+1), t − tₖ], from
     * τ = 0 when piece k is the current one.
     *
     * @param history the history
     * @param k the piece, with tₖ &lt; t
     * @param t the time
     */
    void set(RateHistory history, int k, double t) {
        twoDiff(t, history.time(k), upper);
        if (k + 1 < history.size() && history.time(k + 1) < t) {
            twoDiff(t, history.time(k + 1), lower);
        } else {
            lower[0] = 0;
            lower[1] = 0;
        }
    }

    /** Sets the window [0, t] (t may be +∞). */
    void whole(double t) {
        upper[0] = t;
        upper[1] = 0;
        lower[0] = 0;
        lower[1] = 0;
    }

    /**
     * Places the window in w for the given normalisation.
     *
     * @param how the normalisation point
     * @param logUpper for {@link Normalisation#PEAK}: ln(hi(τ_b)/τ_p) as the caller computes
     *     it, within 3·2⁻⁵³(1 + |·|) (two roundings of the ratio, one of the logarithm)
     * @param logLower likewise ln(hi(τ_a)/τ_p) (unused when the window starts at 0)
     */
    void place(Normalisation how, double logUpper, double logLower) {
        final boolean fromZero = lower[0] == 0;
        common = 0;
        switch (how) {
            case UPPER:
                wB = Math.log1p(upper[1] / upper[0]);
                errB = 8 * ROUNDING * Math.abs(wB);
                wA = fromZero ? Double.NEGATIVE_INFINITY : logOver(lower, upper[0]);
                errA = fromZero ? 0 : 8 * ROUNDING * Math.abs(wA);
                break;
            case LOWER:
                wA = Math.log1p(lower[1] / lower[0]);
                errA = 8 * ROUNDING * Math.abs(wA);
                wB = upper[0] == Double.POSITIVE_INFINITY ? Double.POSITIVE_INFINITY
                    : logOver(upper, lower[0]);
                errB = 8 * ROUNDING * Math.abs(wB);
                break;
            default:
                // ln(τ_b/τ_p) = ln(hi/τ_p) + ln(1 + lo/hi), the last to first order (lo/hi ≤ 2⁻⁵³)
                wB = upper[0] == Double.POSITIVE_INFINITY ? Double.POSITIVE_INFINITY
                    : logUpper + upper[1] / upper[0];
                if (fromZero) {
                    // [0, τ_b]: only the upper end moves (not at all for τ_b = ∞)
                    wA = Double.NEGATIVE_INFINITY;
                    errA = 0;
                    errB = 0;
                    common = wB == Double.POSITIVE_INFINITY ? 0
                        : 3 * ROUNDING * (1 + Math.abs(wB));
                    break;
                }
                final double width = upper[0] == Double.POSITIVE_INFINITY
                    ? Double.POSITIVE_INFINITY : logRatio(upper, lower);
                if (width < 1) {
                    // narrow: the lower end from the upper one and the exact width, so that
                    // the window keeps its width to a few units of rounding of it and only
                    // moves as a whole (by common)
                    wA = wB - width;
                    errA = ROUNDING * Math.abs(wA) + 8 * ROUNDING * width;
                    errB = 0;
                    common = 3 * ROUNDING * (1 + Math.abs(wB));
                } else {
                    wA = logLower + lower[1] / lower[0];
                    errA = 3 * ROUNDING * (1 + Math.abs(wA));
                    errB = wB == Double.POSITIVE_INFINITY ? 0
                        : 3 * ROUNDING * (1 + Math.abs(wB));
                }
                break;
        }
    }

    /**
     * The error in the integral from the window's ends, given the normalised integrand at each
     * end (0 beyond a cut, where the tail bound covers the ends).
     *
     * @param fA the integrand at wA
     * @param fB the integrand at wB
     * @return the bound, in units of the normalised integral
     */
    double endError(double fA, double fB) {
        return common * Math.abs(fB - fA) + errA * fA + errB * fB;
    }

    /**
     * The exact difference t − tₖ as an unevaluated sum: {@code out[0]} = fl(t − tₖ),
     * {@code out[1]} its rounding error (Knuth's two-difference).
     */
    static void twoDiff(double t, double tk, double[] out) {
        final double s = t - tk;
        final double v = s - t;
        out[0] = s;
        out[1] = (t - (s - v)) - (tk + v);
    }

    /**
     * ln(n/d) for a positive double-double n and a positive double d (the normalisation
     * point), within 8·2⁻⁵³ |result|: through log1p((n − d)/d), with n_hi − d exact
     * (Sterbenz), when n_hi/d ∈ [1/2, 2]; else through ln(n_hi/d) plus the first-order
     * correction n_lo/n_hi, where |result| ≥ ln 2 − 2⁻⁵².
     */
    static double logOver(double[] n, double d) {
        if (n[0] >= 0.5 * d && n[0] <= 2 * d) {
            return Math.log1p(((n[0] - d) + n[1]) / d);
        }
        return Math.log(n[0] / d) + n[1] / n[0];
    }

    /**
     * ln(n/d) for positive double-double n, d (a window's width in w), within 8·2⁻⁵³ |result|:
     * through log1p((n − d)/d), with n_hi − d_hi exact (Sterbenz), when n_hi/d_hi ∈ [1/2, 2]
     * (dividing by d_hi instead of d costs a relative 2⁻⁵³); else through ln(n_hi/d_hi) plus
     * the first-order corrections, where |result| ≥ ln 2 − 2⁻⁵².
     */
    static double logRatio(double[] n, double[] d) {
        if (n[0] >= 0.5 * d[0] && n[0] <= 2 * d[0]) {
            return Math.log1p(((n[0] - d[0]) + (n[1] - d[1])) / d[0]);
        }
        return Math.log(n[0] / d[0]) + (n[1] / n[0] - d[1] / d[0]);
    }
}
