package org.advecta.convolution;

/**
 * Gauss–Hermite rules for the weight exp(−y²) on the whole line, of the orders
 * {@link #ORDERS}, computed once at class initialisation. Package-private engine; the
 * arrays are never handed out.
 *
 * <pre>
 * ∫ f(y)·exp(−y²) dy ≈ Σₖ wₖ·f(yₖ),  yₖ the zeros of Hₙ,  exact for polynomials of degree &lt; 2n
 * </pre>
 *
 * <p><b>Method.</b> Newton's iteration on the three-term recurrence of the orthonormal
 * Hermite polynomials p̃ⱼ (p̃₀ = π^{−1/4}, p̃ⱼ₊₁ = y·√(2/(j+1))·p̃ⱼ − √(j/(j+1))·p̃ⱼ₋₁),
 * with p̃ₙ′ = √(2n)·p̃ₙ₋₁ and the weight wₖ = 2/p̃ₙ′(yₖ)² (Christoffel numbers); the
 * starting values for the largest zeros are the asymptotic ones of Stroud &amp; Secrest
 * (1966, <i>Gaussian Quadrature Formulas</i>) as used in routine gauher of Press, Teukolsky,
 * Vetterling &amp; Flannery (2007, <i>Numerical Recipes</i>, 3rd ed., §4.6.1), each next
 * zero started by extrapolation from the previous two (the constants recalled from that
 * routine). The recurrence carries no exp(−y²/2) factor, so p̃ₙ′² stays below about
 * e^{2y²} ≤ 1e140 for n ≤ 160 (no overflow) and the tiny outer weights keep full relative
 * precision, unlike the eigenvector route of Golub–Welsch.
 *
 * <p><b>Accuracy.</b> Checked against 50/60-digit mpmath values (zeros of Hₙ polished on Hₙ
 * itself, weights by Abramowitz &amp; Stegun 25.4.46) in GaussHermiteTest: nodes within
 * 2 ulp (measured worst 1.08 ulp), weights within 1e-13 relative (measured worst 5.8e-14).
 */
final class GaussHermite {

    /** The orders n of the rules, each twice the previous one. */
    static final int[] ORDERS = {10, 20, 40, 80, 160};

    /** Non-negative nodes of each rule, increasing (index 0 is 0 for odd n only; n is even). */
    private static final double[][] NODES = new double[ORDERS.length][];
    /** The weights of those nodes. */
    private static final double[][] WEIGHTS = new double[ORDERS.length][];

    /** π^{−1/4}, the orthonormal p̃₀. */
    private static final double PI_M4 = 0.7511255444649425;
    /** Newton iteration cap (convergence takes 3–6 steps from these starting values). */
    private static final int MAX_NEWTON = 40;

    static {
        for (int i = 0; i < ORDERS.length; i++) {
            final int n = ORDERS[i];
            final double[] y = new double[n / 2];
            final double[] w = new double[n / 2];
            compute(n, y, w);
            NODES[i] = y;
            WEIGHTS[i] = w;
        }
    }

    private GaussHermite() {
    }

    /**
     * Returns the number of non-negative nodes of rule i (n/2; every order is even).
     *
     * @param i index into {@link #ORDERS}
     * @return n/2
     */
    static int halfSize(int i) {
        return NODES[i].length;
    }

    /**
     * Returns the k-th positive node of rule i (the rule also has −node).
     *
     * @param i rule index
     * @param k node index, increasing nodes
     * @return yₖ &gt; 0
     */
    static double node(int i, int k) {
        return NODES[i][k];
    }

    /**
     * Returns the weight of the k-th positive node of rule i (the same for −node).
     *
     * @param i rule index
     * @param k node index
     * @return wₖ
     */
    static double weight(int i, int k) {
        return WEIGHTS[i][k];
    }

    /**
     * Computes the n/2 positive zeros of Hₙ (n even) and their weights, increasing.
     * Press et al. (2007) §4.6.1, gauher: zeros from the largest down.
     */
    private static void compute(int n, double[] nodes, double[] weights) {
        final int m = n / 2;
        final double[] z = new double[m];
        final double[] w = new double[m];
        double x = 0;
        for (int i = 0; i < m; i++) {
            // starting values: largest zero asymptotically, then extrapolation (gauher)
            if (i == 0) {
                x = Math.sqrt(2.0 * n + 1) - 1.85575 * Math.pow(2.0 * n + 1, -0.16667);
            } else if (i == 1) {
                x -= 1.14 * Math.pow(n, 0.426) / x;
            } else if (i == 2) {
                x = 1.86 * x - 0.86 * z[0];
            } else if (i == 3) {
                x = 1.91 * x - 0.91 * z[1];
            } else {
                x = 2 * x - z[i - 2];
            }
            double derivative = 0;
            for (int it = 0; it < MAX_NEWTON; it++) {
                double p1 = PI_M4;
                double p2 = 0;
                for (int j = 0; j < n; j++) {
                    final double p3 = p2;
                    p2 = p1;
                    p1 = x * Math.sqrt(2.0 / (j + 1)) * p2 - Math.sqrt((double) j / (j + 1)) * p3;
                }
                derivative = Math.sqrt(2.0 * n) * p2;
                final double step = p1 / derivative;
                x -= step;
                if (Math.abs(step) <= 0x1.0p-52 * Math.abs(x)) {
                    break;
                }
            }
            // one more recurrence at the converged zero for the weight
            double p1 = PI_M4;
            double p2 = 0;
            for (int j = 0; j < n; j++) {
                final double p3 = p2;
                p2 = p1;
                p1 = x * Math.sqrt(2.0 / (j + 1)) * p2 - Math.sqrt((double) j / (j + 1)) * p3;
            }
            derivative = Math.sqrt(2.0 * n) * p2;
            z[i] = x;
            w[i] = 2 / (derivative * derivative);
        }
        // z is decreasing; store increasing
        for (int i = 0; i < m; i++) {
            nodes[i] = z[m - 1 - i];
            weights[i] = w[m - 1 - i];
        }
    }
}
