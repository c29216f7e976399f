package org.advecta.internal;

/**
 * The series of a narrow erf difference about its centre m, shared by
 * {@link org.advecta.special.ErrorFunctions#erfDifferenceCentred} and the plume package's
 * strip factors beside a wall.
 *
 * <p>The Taylor series of erf about m has the derivatives
 * erf^(n+1)(z) = (−1)ⁿ(2/√π)Hₙ(z)e^{−z²} (Abramowitz &amp; Stegun 7.1.19, number recalled from
 * memory; Hₙ the Hermite polynomials), so only the odd powers of the half-width h survive:
 * <pre>
 * erf(m + h) − erf(m − h) = (4h/√π)·e^{−m²}·Σ_j T_{2j}/(2j + 1),   T_n = Hₙ(m)·hⁿ/n!
 * T_0 = 1, T_1 = 2mh, T_{n+1} = (2mh·T_n − 2h²·T_{n−1})/(n + 1)   (Hₙ₊₁ = 2zHₙ − 2nHₙ₋₁)
 * </pre>
 * For h &lt; 1/2 and 4|m|h &lt; 1 the T_n never overflow, fall like 2^{−n}/√(n!), and the sum
 * lies in [e^{−2|m|h−h²}, e^{2|m|h}], so it cannot cancel. Not exported from the module.
 */
public final class HermiteSeries {

    /** Largest n of T_n the series may reach; n = 30 is far beyond 2⁻⁶⁰ for h &lt; 1/2. */
    private static final int TERMS = 30;
    /** 1/k, k = 0..32 (index 0 unused). */
    private static final double[] RECIPROCALS = new double[TERMS + 3];
    /** 1/(2j + 1), j = 0..16. */
    private static final double[] RECIPROCALS_ODD = new double[TERMS / 2 + 2];

    static {
        for (int k = 1; k < RECIPROCALS.length; k++) {
            RECIPROCALS[k] = 1.0 / k;
        }
        for (int j = 0; j < RECIPROCALS_ODD.length; j++) {
            RECIPROCALS_ODD[j] = 1.0 / (2 * j + 1);
        }
    }

    private HermiteSeries() {
    }

    /**
     * Returns Σ_j T_{2j}/(2j + 1), summed until both the next even and odd terms fall below
     * 2⁻⁶⁰ of the sum.
     *
     * @param twoMH 2mh, |2mh| &lt; 1/2
     * @param twoHH 2h², &lt; 1/2
     * @return the sum, in [e^{−2|m|h−h²}, e^{2|m|h}]
     */
    public static double centredSum(double twoMH, double twoHH) {
        double previous = 1;
        double current = twoMH;
        double sum = 1;
        for (int n = 1; n < TERMS; n += 2) {
            // current = T_n (odd), previous = T_{n−1}: step twice to the next even term
            final double even = (twoMH * current - twoHH * previous) * RECIPROCALS[n + 1];
            final double odd = (twoMH * even - twoHH * current) * RECIPROCALS[n + 2];
            sum += even * RECIPROCALS_ODD[(n + 1) / 2];
            previous = even;
            current = odd;
            if (Math.abs(even) < 0x1.0p-60 * sum && Math.abs(odd) < 0x1.0p-60 * sum) {
                break;
            }
        }
        return sum;
    }
}
