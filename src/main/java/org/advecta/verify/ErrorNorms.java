package org.advecta.verify;

import java.util.Locale;
import org.advecta.internal.Checks;
import org.advecta.solution.Solution1D;

/**
 * Discrete error norms of a computed field against an exact one: the absolute and relative
 * L1, L2 and L∞ norms of e = computed − exact. Immutable and thread-safe.
 *
 * <pre>
 * ‖e‖₁ = Σ wᵢ·|eᵢ|      ‖e‖₂ = √(Σ wᵢ·eᵢ²)      ‖e‖∞ = max |eᵢ|
 * relative:  ‖e‖ / ‖exact‖   (the same norm and weights)
 * </pre>
 *
 * <p>With cell widths (or areas, volumes) as weights wᵢ these are the midpoint-rule
 * approximations of ∫|e| and (∫e²)^{1/2} over the grid, so they compare across refinement
 * levels; with weights omitted wᵢ = 1/n (mean absolute and root-mean-square error). L∞ does
 * not use the weights. Sums are compensated (Neumaier), so the norms are accurate to a few
 * ulps of the exact sums of the given terms.
 *
 * <p>On a finite-volume grid compare cell averages with exact cell averages
 * ({@link #onCells(Solution1D, double[], double, double[])}, which uses
 * {@link CellAverages}); a code that holds point values at cell centres compares with
 * {@link #atCellCentres(Solution1D, double[], double, double[])}.
 */
public final class ErrorNorms {

    private final int count;
    private final double l1;
    private final double l2;
    private final double lInf;
    private final double exactL1;
    private final double exactL2;
    private final double exactLInf;

    private ErrorNorms(int count, double l1, double l2, double lInf, double exactL1,
                       double exactL2, double exactLInf) {
        this.count = count;
        this.l1 = l1;
        this.l2 = l2;
        this.lInf = lInf;
        this.exactL1 = exactL1;
        this.exactL2 = exactL2;
        this.exactLInf = exactLInf;
    }

    /**
     * Returns the norms of computed − exact with the given weights.
     *
     * @param computed the computed values, finite; not modified
     * @param exact the exact values, finite, as many; not modified
     * @param weights the weights, finite and &gt; 0, as many; or null for wᵢ = 1/n; not
     *     modified
     * @return the norms
     * @throws IllegalArgumentException if an array is empty, null (except weights), of the
     *     wrong length, or holds a value that is not finite (or a weight that is not &gt; 0)
     */
    public static ErrorNorms of(double[] computed, double[] exact, double[] weights) {
        Checks.length("computed", computed, 1);
        final int n = computed.length;
        Checks.length("exact", exact, n);
        if (exact.length != n) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "exact: needs %d elements (as computed), got %d", n, exact.length));
        }
        if (weights != null && weights.length != n) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "weights: needs %d elements (as computed), got %d", n, weights.length));
        }
        final CellAverages.Sum e1 = new CellAverages.Sum();
        final CellAverages.Sum e2 = new CellAverages.Sum();
        final CellAverages.Sum x1 = new CellAverages.Sum();
        final CellAverages.Sum x2 = new CellAverages.Sum();
        double eMax = 0;
        double xMax = 0;
        final double uniform = 1.0 / n;
        for (int i = 0; i < n; i++) {
            final double c = Checks.finite("computed[" + i + "]", computed[i]);
            final double x = Checks.finite("exact[" + i + "]", exact[i]);
            final double w = weights == null ? uniform
                : Checks.positive("weights[" + i + "]", weights[i]);
            final double e = Math.abs(c - x);
            final double ax = Math.abs(x);
            e1.add(w * e);
            e2.add(w * e * e);
            x1.add(w * ax);
            x2.add(w * ax * ax);
            eMax = Math.max(eMax, e);
            xMax = Math.max(xMax, ax);
        }
        return new ErrorNorms(n, e1.value(), Math.sqrt(e2.value()), eMax, x1.value(),
            Math.sqrt(x2.value()), xMax);
    }

    /**
     * Returns the norms of a simulator's values at (x, t) points against an exact solution.
     *
     * @param exact the exact solution
     * @param x positions (valid for the solution's domain); not modified
     * @param t times (finite, ≥ 0), as many; not modified
     * @param computed the simulator's values, finite, as many; not modified
     * @param weights weights, finite and &gt; 0, as many, or null for wᵢ = 1/n; not modified
     * @return the norms
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static ErrorNorms atPoints(Solution1D exact, double[] x, double[] t,
                                      double[] computed, double[] weights) {
        CellAverages.checkSolution(exact);
        Checks.length("x", x, 1);
        Checks.length("t", t, x.length);
        Checks.length("computed", computed, x.length);
        if (t.length != x.length || computed.length != x.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "x, t and computed must have the same length, got %d, %d, %d", x.length,
                t.length, computed.length));
        }
        final double[] reference = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            reference[i] = exact.value(x[i], t[i]);
        }
        return of(computed, reference, weights);
    }

    /**
     * Returns the norms of a finite-volume field of cell averages against the exact cell
     * averages ({@link CellAverages}), weighted by the cell widths.
     *
     * @param exact the exact solution
     * @param faces the n + 1 cell faces, strictly increasing; not modified
     * @param t time, finite and ≥ 0
     * @param computed the n computed cell averages; not modified
     * @return the norms
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static ErrorNorms onCells(Solution1D exact, double[] faces, double t,
                                     double[] computed) {
        CellAverages.checkSolution(exact);
        CellAverages.checkFaces(exact, faces);
        checkCellCount(faces, computed);
        final double[] reference = new double[computed.length];
        CellAverages.averages(exact, faces, t, reference);
        return of(computed, reference, widths(faces));
    }

    /**
     * Returns the norms of values held at cell centres (x_{i+½} = (faces[i] + faces[i+1])/2)
     * against the exact point values there, weighted by the cell widths.
     *
     * @param exact the exact solution
     * @param faces the n + 1 cell faces, strictly increasing; not modified
     * @param t time, finite and ≥ 0
     * @param computed the n computed centre values; not modified
     * @return the norms
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static ErrorNorms atCellCentres(Solution1D exact, double[] faces, double t,
                                           double[] computed) {
        CellAverages.checkSolution(exact);
        CellAverages.checkFaces(exact, faces);
        checkCellCount(faces, computed);
        Checks.nonNegative("t", t);
        final double[] reference = new double[computed.length];
        for (int i = 0; i < reference.length; i++) {
            reference[i] = exact.value(0.5 * faces[i] + 0.5 * faces[i + 1], t);
        }
        return of(computed, reference, widths(faces));
    }

    private static void checkCellCount(double[] faces, double[] computed) {
        if (computed == null || computed.length != faces.length - 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "computed: needs %d cell values (faces.length - 1), got %s", faces.length - 1,
                computed == null ? "null" : Integer.toString(computed.length)));
        }
    }

    private static double[] widths(double[] faces) {
        final double[] w = new double[faces.length - 1];
        for (int i = 0; i < w.length; i++) {
            w[i] = faces[i + 1] - faces[i];
        }
        return w;
    }

    /**
     * Returns the number of values compared.
     *
     * @return n
     */
    public int count() {
        return count;
    }

    /**
     * Returns ‖e‖₁ = Σ wᵢ·|eᵢ|.
     *
     * @return the L1 norm of the error
     */
    public double l1() {
        return l1;
    }

    /**
     * Returns ‖e‖₂ = √(Σ wᵢ·eᵢ²).
     *
     * @return the L2 norm of the error
     */
    public double l2() {
        return l2;
    }

    /**
     * Returns ‖e‖∞ = max |eᵢ|.
     *
     * @return the L∞ norm of the error
     */
    public double lInf() {
        return lInf;
    }

    /**
     * Returns ‖e‖₁ / ‖exact‖₁.
     *
     * @return the relative L1 error
     * @throws IllegalStateException if the exact values are all 0
     */
    public double relativeL1() {
        return relative(l1, exactL1);
    }

    /**
     * Returns ‖e‖₂ / ‖exact‖₂.
     *
     * @return the relative L2 error
     * @throws IllegalStateException if the exact values are all 0
     */
    public double relativeL2() {
        return relative(l2, exactL2);
    }

    /**
     * Returns ‖e‖∞ / ‖exact‖∞.
     *
     * @return the relative L∞ error
     * @throws IllegalStateException if the exact values are all 0
     */
    public double relativeLInf() {
        return relative(lInf, exactLInf);
    }

    private static double relative(double error, double norm) {
        if (!(norm > 0)) {
            throw new IllegalStateException(
                "relative error undefined: the exact values are all 0");
        }
        return error / norm;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "ErrorNorms[n=%d, L1=%s, L2=%s, Linf=%s]", count,
            l1, l2, lInf);
    }
}
