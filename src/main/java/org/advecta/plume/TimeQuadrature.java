package org.advecta.plume;

import java.util.Arrays;

/**
 * Adaptive Gauss–Kronrod (7/15-point) quadrature of a smooth integrand over a finite interval,
 * the engine behind the time integrals of the continuous sources.
 *
 * <p>Nodes and weights: the G7/K15 pair of QUADPACK's {@code qk15} (Piessens, de Doncker-Kapenga,
 * Überhuber &amp; Kahaner 1983, <i>QUADPACK</i>, Springer), recalled from memory; a test checks
 * that the Kronrod rule integrates xᵏ exactly for k ≤ 22 and the Gauss rule for k ≤ 13. The
 * subinterval with the largest error estimate |K₁₅ − G₇| is bisected until the sum of the
 * estimates is below the relative tolerance or the subinterval budget is spent. Sums are
 * compensated (Neumaier).
 *
 * <p>An instance is a workspace (not thread-safe): a batch evaluation reuses one, so that
 * nothing is allocated per point once its arrays have grown.
 */
final class TimeQuadrature {

    /** Relative target of the summed error estimates. */
    static final double RELATIVE_TOLERANCE = 1e-13;
    /** Most subintervals. */
    static final int MAX_INTERVALS = 400;

    /** Kronrod nodes on [0, 1], largest first; the odd-indexed ones are the Gauss nodes. */
    private static final double[] XK = {0.991455371120812639206854697526329,
        0.949107912342758524526189684047851, 0.864864423359769072789712788640926,
        0.741531185599394439863864773280788, 0.586087235467691130294144845693013,
        0.405845151377397166906606412076961, 0.207784955007898467600689403773245, 0.0};
    /** Kronrod weights. */
    private static final double[] WK = {0.022935322010529224963732008058970,
        0.063092092629978553290700663189204, 0.104790010322250183839876322541518,
        0.140653259715525918745189590510238, 0.169004726639267902826583426598550,
        0.190350578064785409913256402421014, 0.204432940075298892414161999234649,
        0.209482141084727828012999174891714};
    /** Gauss weights for the nodes XK[1], XK[3], XK[5], XK[7]. */
    private static final double[] WG = {0.129484966168869693270611432679082,
        0.279705391489276667901467771423780, 0.381830050505118944950369775488975,
        0.417959183673469387755102040816327};

    /** The integrand. */
    @FunctionalInterface
    interface Integrand {
        /**
         * Returns the integrand at w.
         *
         * @param w the abscissa
         * @return the value, finite
         */
        double at(double w);
    }

    /** Interval store: ends, values and error estimates. */
    private double[] a = new double[16];
    private double[] b = new double[16];
    private double[] val = new double[16];
    private double[] err = new double[16];
    private final double[] r = new double[2];
    /** The last result. */
    private double value;
    private double error;

    TimeQuadrature() {
    }

    /** The value of the last {@link #integrate}. */
    double value() {
        return value;
    }

    /** The error estimate of the last {@link #integrate}. */
    double error() {
        return error;
    }

    /**
     * Integrates f over [lo, hi] (nothing if hi ≤ lo); the result is then in {@link #value()}
     * and {@link #error()}.
     *
     * @param f the integrand
     * @param lo lower limit
     * @param hi upper limit
     * @param split an interior point at which to split first (the integrand's peak), or NaN
     */
    void integrate(Integrand f, double lo, double hi, double split) {
        value = 0;
        error = 0;
        if (!(hi > lo)) {
            return;
        }
        int n;
        if (split > lo && split < hi) {
            rule(f, lo, split, r);
            a[0] = lo;
            b[0] = split;
            val[0] = r[0];
            err[0] = r[1];
            rule(f, split, hi, r);
            a[1] = split;
            b[1] = hi;
            val[1] = r[0];
            err[1] = r[1];
            n = 2;
        } else {
            rule(f, lo, hi, r);
            a[0] = lo;
            b[0] = hi;
            val[0] = r[0];
            err[0] = r[1];
            n = 1;
        }
        while (true) {
            double sum = 0;
            double comp = 0;
            double errSum = 0;
            int worst = 0;
            for (int i = 0; i < n; i++) {
                final double t = sum + val[i];
                comp += Math.abs(sum) >= Math.abs(val[i]) ? (sum - t) + val[i] : (val[i] - t) + sum;
                sum = t;
                errSum += err[i];
                if (err[i] > err[worst]) {
                    worst = i;
                }
            }
            final double total = sum + comp;
            if (errSum <= RELATIVE_TOLERANCE * Math.abs(total) || n >= MAX_INTERVALS
                    || errSum == 0) {
                value = total;
                error = errSum;
                return;
            }
            if (n == a.length) {
                a = Arrays.copyOf(a, 2 * n);
                b = Arrays.copyOf(b, 2 * n);
                val = Arrays.copyOf(val, 2 * n);
                err = Arrays.copyOf(err, 2 * n);
            }
            final double lo2 = a[worst];
            final double hi2 = b[worst];
            final double mid = 0.5 * (lo2 + hi2);
            if (!(mid > lo2 && mid < hi2)) {
                // the interval cannot be split further in double precision
                value = total;
                error = errSum;
                return;
            }
            rule(f, lo2, mid, r);
            b[worst] = mid;
            val[worst] = r[0];
            err[worst] = r[1];
            rule(f, mid, hi2, r);
            a[n] = mid;
            b[n] = hi2;
            val[n] = r[0];
            err[n] = r[1];
            n++;
        }
    }

    /** The G7/K15 pair on [lo, hi]: out = {Kronrod value, |Kronrod − Gauss|}. */
    private static void rule(Integrand f, double lo, double hi, double[] out) {
        // out = {K15, |K15 − G7|}
        final double c = 0.5 * (lo + hi);
        final double h = 0.5 * (hi - lo);
        final double fc = f.at(c);
        double kron = WK[7] * fc;
        double gauss = WG[3] * fc;
        for (int j = 0; j < 7; j++) {
            final double d = h * XK[j];
            final double s = f.at(c - d) + f.at(c + d);
            kron += WK[j] * s;
            if ((j & 1) == 1) {
                gauss += WG[j >> 1] * s;
            }
        }
        out[0] = h * kron;
        out[1] = Math.abs(h * (kron - gauss));
    }

    /**
     * Exposes the rule's nodes for the exactness test: returns the Kronrod (gauss = false) or
     * Gauss (gauss = true) approximation of ∫ xᵏ over [−1, 1].
     *
     * @param k the power
     * @param gauss which rule
     * @return the rule's value
     */
    static double monomial(int k, boolean gauss) {
        final double[] out = new double[2];
        rule(x -> Math.pow(x, k), -1, 1, out);
        return gauss ? gaussOnly(k) : out[0];
    }

    private static double gaussOnly(int k) {
        double s = k == 0 ? WG[3] : 0.0;
        for (int j = 1; j < 7; j += 2) {
            s += WG[j >> 1] * 2 * Math.pow(XK[j], k);
        }
        return s;
    }
}
