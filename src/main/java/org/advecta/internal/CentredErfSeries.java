package org.advecta.internal;

/**
 * The series of an erf difference about its centre m, for half-widths h ≤ 1/2 and |m|·h ≤ 1,
 * shared by {@link org.advecta.special.ErrorFunctions#erfDifferenceCentred}, the slug solutions
 * and the plume package's strip factors beside a wall.
 *
 * <p>With s = m + h·u and the odd powers of u integrating to 0 over [−1, 1]:
 * <pre>
 * erf(m + h) − erf(m − h) = (2h/√π) ∫_{−1}^{1} e^{−(m + hu)²} du
 *                         = (4h/√π)·e^{−m² − h²}·Σ_j (2mh)^{2j}/(2j)!·g_j,
 * g_j = e^{h²} ∫_0^1 u^{2j} e^{−h²u²} du,     g_j = (1 + 2h²·g_{j+1})/(2j + 1)
 * </pre>
 * (the recurrence by parts). Every term is positive, so the sum cannot cancel, and the only
 * exponential, e^{−m² − h²}, is left to the caller, who can join a decay factor to it.
 *
 * <p>Why this form: it replaces the Taylor series in Hermite polynomials (Abramowitz &amp;
 * Stegun 7.1.19), whose up to 15 steps each waited on the one before and which needed its own
 * exponential. Here the recurrence for g runs backwards, where it is stable (an error in
 * g_{j+1} reaches g_j damped by 2h²/(2j + 1)), from a start near its limit, for a fixed
 * {@link #LAST} + 1 steps, and the outer sum rides along by Horner's rule, both taken two
 * steps at a time. Truncation error, measured with mpmath on a 41 × 41 grid of
 * (2mh)² ∈ [0, 4], h² ∈ [0, 1/4]: below 0.007 ulp (0.81 ulp with one step fewer).
 *
 * <p>Not exported from the module.
 */
public final class CentredErfSeries {

    /** The largest half-width the series serves. */
    public static final double MAX_HALF_WIDTH = 0.5;
    /** The largest |m|·h the series serves. */
    public static final double MAX_CENTRE_TIMES_HALF_WIDTH = 1.0;

    /** Index of the last g_j kept (odd: the steps go in pairs). */
    private static final int LAST = 11;
    /** 1/(2j + 1), j = 0..LAST + 1. */
    private static final double[] ODD = new double[LAST + 2];
    /** 1/((2j + 3)(2j + 5)) = ODD[j + 1]·ODD[j + 2], j = 0..LAST − 1. */
    private static final double[] ODD_PAIR = new double[LAST];
    /** 1/((2j + 1)(2j + 2)), j = 0..LAST: the ratio of (2j)! to (2j + 2)!. */
    private static final double[] PAIR = new double[LAST + 1];
    /** PAIR[j]·PAIR[j + 1] = (2j)!/(2j + 4)!, j = 0..LAST − 1. */
    private static final double[] PAIR_PAIR = new double[LAST];

    static {
        for (int j = 0; j <= LAST + 1; j++) {
            ODD[j] = 1.0 / (2 * j + 1);
        }
        for (int j = 0; j <= LAST; j++) {
            PAIR[j] = 1.0 / ((2 * j + 1) * (2.0 * j + 2));
        }
        for (int j = 0; j < LAST; j++) {
            ODD_PAIR[j] = 1.0 / ((2 * j + 3) * (2.0 * j + 5));
            PAIR_PAIR[j] = 1.0 / ((2 * j + 1) * (2.0 * j + 2) * (2 * j + 3) * (2 * j + 4));
        }
    }

    private CentredErfSeries() {
    }

    /**
     * Returns Σ_j (2mh)^{2j}/(2j)!·g_j, so that
     * erf(m + h) − erf(m − h) = (4h/√π)·e^{−m² − h²}·sum.
     *
     * @param m the centre, |m|·h ≤ 1
     * @param h the half-width, in [0, 1/2]
     * @return the sum, ≥ 1 (within a few ulp of the exact sum; every term is positive)
     */
    public static double sum(double m, double h) {
        final double twoHH = 2 * h * h;
        final double a2 = 2 * twoHH * m * m;
        final double twoHH2 = twoHH * twoHH;
        final double a4 = a2 * a2;
        // With y_j = (2j + 1)·g_j = 1 + k_j·y_{j+1}, k_j = 2h²/(2j + 3), and the outer sum
        // S_j = g_j + w_j·S_{j+1}, w_j = (2mh)²/((2j + 1)(2j + 2)), both chains are taken two
        // steps at a time: y_j = (1 + k_j) + k_j·k_{j+1}·y_{j+2} and
        // S_j = g_j + w_j·g_{j+1} + w_j·w_{j+1}·S_{j+2}, one fused multiply-add per pair of
        // steps on each chain, the rest formed beside them. y_{LAST+1} starts near its limit.
        double y = (2 * LAST + 3) / (2 * LAST + 3 - twoHH);
        double sum = 0;
        for (int j = LAST - 1; j >= 0; j -= 2) {
            final double yNext = Math.fma(twoHH * ODD[j + 2], y, 1.0);
            y = Math.fma(twoHH2 * ODD_PAIR[j], y, Math.fma(twoHH, ODD[j + 1], 1.0));
            sum = Math.fma(a4 * PAIR_PAIR[j], sum,
                Math.fma(a2 * PAIR[j], yNext * ODD[j + 1], y * ODD[j]));
        }
        return sum;
    }
}
