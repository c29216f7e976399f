package org.advecta.convolution;

import java.util.Arrays;
import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * Initial data given as samples: the piecewise-linear interpolant of values f₀ … f_{n−1} at
 * nodes ξ₀ ≤ ξ₁ ≤ … ≤ ξ_{n−1}, extended outside [ξ₀, ξ_{n−1}] by zero or by the end values.
 * Immutable (the arrays are copied on the way in and on the way out).
 *
 * <p>A node repeated twice is a jump: the interpolant runs into it with the first value and
 * leaves it with the second (a node may appear at most twice). Piecewise-constant cell
 * averages, as finite-volume codes hold them, are such a profile with every interior edge
 * doubled ({@link #cellAverages(double[], double[])}); convolving it is exact for the
 * piecewise-constant field.
 *
 * <p>At a jump, and at an end with {@link Extension#ZERO}, {@link #valueAt(double)} returns
 * the mean of the two one-sided values (the limit of the convolution as t → 0⁺).
 */
public final class PiecewiseLinearProfile {

    /** How the data continue outside [ξ₀, ξ_{n−1}]. */
    public enum Extension {
        /** φ = 0 outside: a finite plume. */
        ZERO,
        /** φ = f₀ below ξ₀ and f_{n−1} above ξ_{n−1}: e.g. a step or a uniform background. */
        CONSTANT
    }

    private final double[] nodes;
    private final double[] values;
    private final Extension extension;
    private final double origin;
    private final double spacing;
    private final double maxAbs;

    private PiecewiseLinearProfile(double[] nodes, double[] values, Extension extension,
                                   double origin, double spacing) {
        this.nodes = nodes;
        this.values = values;
        this.extension = extension;
        this.origin = origin;
        this.spacing = spacing;
        double m = 0;
        for (double v : values) {
            m = Math.max(m, Math.abs(v));
        }
        this.maxAbs = m;
    }

    /**
     * Returns the interpolant of values at nodes.
     *
     * @param nodes the nodes, finite, non-decreasing, each at most twice, at least 2; not
     *     modified (copied)
     * @param values the values at the nodes, finite, as many as nodes; not modified (copied)
     * @param extension how the data continue outside the nodes
     * @return the profile
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static PiecewiseLinearProfile of(double[] nodes, double[] values,
                                            Extension extension) {
        checkExtension(extension);
        Checks.length("nodes", nodes, 2);
        Checks.length("values", values, nodes.length);
        if (values.length != nodes.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "values: needs exactly %d elements (one per node), got %d", nodes.length,
                values.length));
        }
        final double[] n = nodes.clone();
        final double[] v = values.clone();
        for (int i = 0; i < n.length; i++) {
            Checks.finite("nodes[" + i + "]", n[i]);
            Checks.finite("values[" + i + "]", v[i]);
            if (i > 0 && !(n[i] >= n[i - 1])) {
                throw Checks.fail("nodes[" + i + "]", n[i], "must be >= nodes[" + (i - 1)
                    + "] = " + n[i - 1]);
            }
            if (i > 1 && n[i] == n[i - 2]) {
                throw Checks.fail("nodes[" + i + "]", n[i], "a node may appear at most twice");
            }
        }
        if (n[0] == n[n.length - 1]) {
            throw Checks.fail("nodes[" + (n.length - 1) + "]", n[n.length - 1],
                "must be > nodes[0]: the profile needs a segment of positive length");
        }
        return new PiecewiseLinearProfile(n, v, extension, Double.NaN, Double.NaN);
    }

    /**
     * Returns the interpolant of values at the uniform nodes ξⱼ = origin + j·spacing
     * (computed as {@code Math.fma(j, spacing, origin)}), the input of the fast grid path.
     *
     * @param origin ξ₀, finite
     * @param spacing the node spacing, finite and &gt; 0
     * @param values the values, finite, at least 2; not modified (copied)
     * @param extension how the data continue outside the nodes
     * @return the profile
     * @throws IllegalArgumentException if an argument is invalid or the last node is not
     *     finite
     */
    public static PiecewiseLinearProfile uniform(double origin, double spacing, double[] values,
                                                 Extension extension) {
        checkExtension(extension);
        Checks.finite("origin", origin);
        Checks.positive("spacing", spacing);
        Checks.length("values", values, 2);
        final double[] n = new double[values.length];
        final double[] v = values.clone();
        for (int j = 0; j < n.length; j++) {
            n[j] = Math.fma(j, spacing, origin);
            Checks.finite("values[" + j + "]", v[j]);
        }
        Checks.finite("last node", n[n.length - 1]);
        for (int j = 1; j < n.length; j++) {
            if (!(n[j] > n[j - 1])) {
                throw Checks.fail("spacing", spacing, "is below the resolution of the nodes near "
                    + n[j]);
            }
        }
        return new PiecewiseLinearProfile(n, v, extension, origin, spacing);
    }

    /**
     * Returns the piecewise-constant field equal to averages[i] on cell (edges[i],
     * edges[i+1]) and zero outside, as a profile with doubled interior edges. Convolution of
     * it is exact for that field (finite-volume data).
     *
     * @param edges the cell edges, finite, strictly increasing, one more than averages; not
     *     modified
     * @param averages the cell averages, finite, at least 1; not modified
     * @return the profile
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static PiecewiseLinearProfile cellAverages(double[] edges, double[] averages) {
        Checks.length("averages", averages, 1);
        Checks.length("edges", edges, averages.length + 1);
        if (edges.length != averages.length + 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "edges: needs exactly %d elements (one more than averages), got %d",
                averages.length + 1, edges.length));
        }
        final int c = averages.length;
        final double[] n = new double[2 * c];
        final double[] v = new double[2 * c];
        for (int i = 0; i < c; i++) {
            Checks.finite("edges[" + i + "]", edges[i]);
            Checks.finite("edges[" + (i + 1) + "]", edges[i + 1]);
            if (!(edges[i + 1] > edges[i])) {
                throw Checks.fail("edges[" + (i + 1) + "]", edges[i + 1],
                    "must be > edges[" + i + "] = " + edges[i]);
            }
            n[2 * i] = edges[i];
            n[2 * i + 1] = edges[i + 1];
            v[2 * i] = Checks.finite("averages[" + i + "]", averages[i]);
            v[2 * i + 1] = averages[i];
        }
        return new PiecewiseLinearProfile(n, v, Extension.ZERO, Double.NaN, Double.NaN);
    }

    private static void checkExtension(Extension extension) {
        if (extension == null) {
            throw new IllegalArgumentException("extension: must not be null");
        }
    }

    /**
     * Returns the number of nodes (a jump counts twice).
     *
     * @return n
     */
    public int size() {
        return nodes.length;
    }

    /**
     * Returns a copy of the nodes.
     *
     * @return ξ₀ … ξ_{n−1}
     */
    public double[] nodes() {
        return nodes.clone();
    }

    /**
     * Returns a copy of the values.
     *
     * @return f₀ … f_{n−1}
     */
    public double[] values() {
        return values.clone();
    }

    /**
     * Returns the extension outside the nodes.
     *
     * @return the extension
     */
    public Extension extension() {
        return extension;
    }

    /**
     * Returns true if the nodes are uniform (made by {@link #uniform}).
     *
     * @return whether the fast grid path applies
     */
    public boolean isUniform() {
        return spacing == spacing;
    }

    /**
     * Returns the spacing of a uniform profile (NaN otherwise).
     *
     * @return the spacing
     */
    public double spacing() {
        return spacing;
    }

    /**
     * Returns ξ₀ of a uniform profile (NaN otherwise).
     *
     * @return the first node
     */
    public double origin() {
        return origin;
    }

    /**
     * Returns max |fⱼ|.
     *
     * @return the largest magnitude of the data
     */
    public double maxAbs() {
        return maxAbs;
    }

    /**
     * Returns φ(x), the interpolant (the mean of the one-sided values at a jump and at an end
     * with zero extension).
     *
     * @param x position, finite
     * @return φ(x)
     * @throws IllegalArgumentException if x is not finite
     */
    public double valueAt(double x) {
        Checks.finite("x", x);
        final int n = nodes.length;
        if (x < nodes[0]) {
            return extension == Extension.CONSTANT ? values[0] : 0.0;
        }
        if (x > nodes[n - 1]) {
            return extension == Extension.CONSTANT ? values[n - 1] : 0.0;
        }
        // first index with nodes[i] >= x
        int i = Arrays.binarySearch(nodes, x);
        if (i < 0) {
            i = -i - 1;
            final double a = nodes[i - 1];
            final double b = nodes[i];
            final double w = (x - a) / (b - a);
            return values[i - 1] * (1 - w) + values[i] * w;
        }
        while (i > 0 && nodes[i - 1] == x) {
            i--;
        }
        int j = i;
        if (j + 1 < n && nodes[j + 1] == x) {
            j++;
        }
        // one-sided limits: from the left the interpolant reaches values[i], to the right it
        // leaves with values[j]; beyond the end nodes the extension takes over
        final double outside0 = extension == Extension.CONSTANT ? values[0] : 0.0;
        final double outside1 = extension == Extension.CONSTANT ? values[n - 1] : 0.0;
        final double left = i == 0 ? outside0 : values[i];
        final double right = j == n - 1 ? outside1 : values[j];
        return left == right ? left : 0.5 * left + 0.5 * right;
    }

    /** Node array for the engines (not copied: package-private, read only). */
    double[] nodesView() {
        return nodes;
    }

    /** Value array for the engines (not copied: package-private, read only). */
    double[] valuesView() {
        return values;
    }
}
