package org.advecta.verify;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * The observed order of accuracy p from errors E_k measured against an exact solution on
 * three or more grids of spacing h_k, assuming E ≈ C·h^p. Immutable and thread-safe.
 *
 * <pre>
 * pairwise:       p_k = ln(E_k / E_{k+1}) / ln(h_k / h_{k+1})          (consecutive levels)
 * least squares:  (ln C, p) minimise Σ (ln E_k − ln C − p·ln h_k)²
 * </pre>
 *
 * <p>The pairwise orders show whether the levels are in the asymptotic range (they approach a
 * constant); the least-squares order uses all levels at once (Roache 1998, <i>Verification and
 * Validation in Computational Science and Engineering</i>, Hermosa, ch. 5 (chapter recalled
 * from memory); Oberkampf &amp; Roy 2010, <i>Verification and Validation in Scientific
 * Computing</i>, §8.5 (section recalled from memory)). Its standard error is the usual one of
 * a straight-line fit, s/√(Σ(ln h_k − mean)²), with s² the residual variance over n − 2
 * degrees of freedom (0 for three collinear points).
 *
 * <p>Without an exact solution use {@link GridConvergenceIndex}, which estimates p from the
 * differences of three solutions.
 */
public final class ObservedOrder {

    private final double[] spacings;
    private final double[] errors;
    private final double[] pairwise;
    private final double order;
    private final double constant;
    private final double standardError;

    private ObservedOrder(double[] spacings, double[] errors, double[] pairwise, double order,
                          double constant, double standardError) {
        this.spacings = spacings;
        this.errors = errors;
        this.pairwise = pairwise;
        this.order = order;
        this.constant = constant;
        this.standardError = standardError;
    }

    /**
     * Returns the observed orders of errors on a sequence of grids.
     *
     * @param spacings grid spacings h_k (any representative length, e.g. (volume/cells)^{1/d}),
     *     finite, &gt; 0 and pairwise different, at least three, in any order (pairwise
     *     orders are formed between consecutive entries); copied
     * @param errors the errors E_k (any norm), finite and &gt; 0, as many; copied
     * @return the orders
     * @throws IllegalArgumentException if fewer than three levels are given, the lengths
     *     differ, a value is not finite and positive, or two consecutive spacings are equal
     */
    public static ObservedOrder of(double[] spacings, double[] errors) {
        Checks.length("spacings", spacings, 3);
        Checks.length("errors", errors, spacings.length);
        if (errors.length != spacings.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "errors: needs %d elements (as spacings), got %d", spacings.length,
                errors.length));
        }
        final int n = spacings.length;
        final double[] h = spacings.clone();
        final double[] e = errors.clone();
        final double[] lh = new double[n];
        final double[] le = new double[n];
        for (int k = 0; k < n; k++) {
            lh[k] = Math.log(Checks.positive("spacings[" + k + "]", h[k]));
            le[k] = Math.log(Checks.positive("errors[" + k + "]", e[k]));
        }
        final double[] p = new double[n - 1];
        for (int k = 0; k + 1 < n; k++) {
            if (h[k] == h[k + 1]) {
                throw Checks.fail("spacings[" + (k + 1) + "]", h[k + 1],
                    "must differ from the previous spacing");
            }
            p[k] = (le[k] - le[k + 1]) / (lh[k] - lh[k + 1]);
        }
        double mh = 0;
        double me = 0;
        for (int k = 0; k < n; k++) {
            mh += lh[k];
            me += le[k];
        }
        mh /= n;
        me /= n;
        double sxx = 0;
        double sxy = 0;
        for (int k = 0; k < n; k++) {
            sxx += (lh[k] - mh) * (lh[k] - mh);
            sxy += (lh[k] - mh) * (le[k] - me);
        }
        final double slope = sxy / sxx;
        final double intercept = me - slope * mh;
        double rss = 0;
        for (int k = 0; k < n; k++) {
            final double r = le[k] - intercept - slope * lh[k];
            rss += r * r;
        }
        final double se = Math.sqrt(rss / (n - 2) / sxx);
        return new ObservedOrder(h, e, p, slope, Math.exp(intercept), se);
    }

    /**
     * Returns the pairwise orders p_k between levels k and k + 1 (n − 1 values).
     *
     * @return a new array
     */
    public double[] pairwise() {
        return pairwise.clone();
    }

    /**
     * Returns the least-squares order p.
     *
     * @return p
     */
    public double leastSquares() {
        return order;
    }

    /**
     * Returns the standard error of the least-squares order.
     *
     * @return the standard error of p
     */
    public double leastSquaresStandardError() {
        return standardError;
    }

    /**
     * Returns the constant C of the least-squares fit E ≈ C·h^p.
     *
     * @return C
     */
    public double constant() {
        return constant;
    }

    /**
     * Returns the number of levels.
     *
     * @return n
     */
    public int levels() {
        return spacings.length;
    }

    /**
     * Returns the spacings as given.
     *
     * @return a new array
     */
    public double[] spacings() {
        return spacings.clone();
    }

    /**
     * Returns the errors as given.
     *
     * @return a new array
     */
    public double[] errors() {
        return errors.clone();
    }

    @Override
    public String toString() {
        final StringBuilder b = new StringBuilder("ObservedOrder[leastSquares=")
            .append(String.format(Locale.ROOT, "%.4f ± %.4f, pairwise=", order, standardError));
        for (int k = 0; k < pairwise.length; k++) {
            b.append(k == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.4f", pairwise[k]));
        }
        return b.append(']').toString();
    }
}
