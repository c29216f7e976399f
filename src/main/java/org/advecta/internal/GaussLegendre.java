package org.advecta.internal;

import java.util.function.DoubleUnaryOperator;

/**
 * The 10-point Gauss–Legendre rule, for the short intervals on which the library integrates
 * smooth functions that a closed form would lose to cancellation (Abramowitz &amp; Stegun
 * 25.4.29; nodes and weights checked against mpmath). Not exported from the module.
 */
public final class GaussLegendre {

    /** Positive nodes on [−1, 1]. */
    private static final double[] NODES = {0.14887433898163122, 0.4333953941292472,
        0.6794095682990244, 0.8650633666889845, 0.9739065285171717};
    /** Their weights. */
    private static final double[] WEIGHTS = {0.29552422471475287, 0.26926671930999635,
        0.21908636251598204, 0.1494513491505806, 0.06667134430868814};

    private GaussLegendre() {
    }

    /**
     * Returns the number of positive nodes (the rule has twice as many, symmetric about 0).
     *
     * @return 5
     */
    public static int halfSize() {
        return NODES.length;
    }

    /**
     * Returns the k-th positive node on [−1, 1], in increasing order.
     *
     * @param k index, 0 ≤ k &lt; {@link #halfSize()}
     * @return the node
     */
    public static double node(int k) {
        return NODES[k];
    }

    /**
     * Returns the weight of the nodes ±{@link #node(int) node(k)}.
     *
     * @param k index, 0 ≤ k &lt; {@link #halfSize()}
     * @return the weight
     */
    public static double weight(int k) {
        return WEIGHTS[k];
    }

    /**
     * Returns ∫ f over [m − h, m + h] by the 10-point rule, summing the smaller weights first.
     *
     * @param f the integrand
     * @param m the centre of the interval
     * @param h the half-width
     * @return the integral
     */
    public static double integrate(DoubleUnaryOperator f, double m, double h) {
        double sum = 0;
        for (int i = NODES.length - 1; i >= 0; i--) {
            final double d = h * NODES[i];
            sum += WEIGHTS[i] * (f.applyAsDouble(m + d) + f.applyAsDouble(m - d));
        }
        return h * sum;
    }
}
