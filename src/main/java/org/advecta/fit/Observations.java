package org.advecta.fit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * Measured concentrations to fit: one or more breakthrough curves c(t) at fixed positions
 * and/or profiles c(x) at fixed times, with optional weights. Immutable and thread-safe
 * (arrays are copied in and out).
 *
 * <p>Validation on construction: positions and concentrations finite, times finite and ≥ 0,
 * weights finite and &gt; 0, at least one point per curve, and no curve all zero (it carries
 * no information about v or D); otherwise an {@link IllegalArgumentException} names the array,
 * the index and the value.
 *
 * <p>Weights enter the least-squares sum Σ wᵢ·(cᵢ − model)², so wᵢ = 1/σᵢ² for measurement
 * errors of standard deviation σᵢ; equal weights (the default) for errors of equal size.
 */
public final class Observations {

    /** One curve: the fixed coordinate and the varying one. */
    static final class Curve {
        final boolean breakthrough;
        final double fixed;
        final double[] varying;
        final double[] c;
        final double[] w;

        Curve(boolean breakthrough, double fixed, double[] varying, double[] c, double[] w) {
            this.breakthrough = breakthrough;
            this.fixed = fixed;
            this.varying = varying;
            this.c = c;
            this.w = w;
        }

        double x(int i) {
            return breakthrough ? fixed : varying[i];
        }

        double t(int i) {
            return breakthrough ? varying[i] : fixed;
        }
    }

    private final List<Curve> curves;

    private Observations(List<Curve> curves) {
        this.curves = Collections.unmodifiableList(curves);
    }

    /**
     * A breakthrough curve c(t) at position x, equal weights.
     *
     * @param x the position, finite
     * @param t the sampling times, finite and ≥ 0; copied
     * @param c the concentrations, finite, as many, not all 0; copied
     * @return the observations
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static Observations breakthrough(double x, double[] t, double[] c) {
        return breakthrough(x, t, c, null);
    }

    /**
     * A breakthrough curve c(t) at position x with weights.
     *
     * @param x the position, finite
     * @param t the sampling times, finite and ≥ 0; copied
     * @param c the concentrations, finite, as many, not all 0; copied
     * @param weights the weights, finite and &gt; 0, as many, or null for equal weights; copied
     * @return the observations
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static Observations breakthrough(double x, double[] t, double[] c,
                                            double[] weights) {
        Checks.finite("x", x);
        final List<Curve> list = new ArrayList<>();
        list.add(curve(true, x, t, "t", c, weights));
        return new Observations(list);
    }

    /**
     * A profile c(x) at time t, equal weights.
     *
     * @param t the time, finite and ≥ 0
     * @param x the positions, finite; copied
     * @param c the concentrations, finite, as many, not all 0; copied
     * @return the observations
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static Observations profile(double t, double[] x, double[] c) {
        return profile(t, x, c, null);
    }

    /**
     * A profile c(x) at time t with weights.
     *
     * @param t the time, finite and ≥ 0
     * @param x the positions, finite; copied
     * @param c the concentrations, finite, as many, not all 0; copied
     * @param weights the weights, finite and &gt; 0, as many, or null for equal weights; copied
     * @return the observations
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static Observations profile(double t, double[] x, double[] c, double[] weights) {
        Checks.nonNegative("t", t);
        final List<Curve> list = new ArrayList<>();
        list.add(curve(false, t, x, "x", c, weights));
        return new Observations(list);
    }

    /**
     * Returns these observations together with other ones (e.g. breakthrough curves at
     * several positions).
     *
     * @param other more observations
     * @return the union
     * @throws IllegalArgumentException if other is null
     */
    public Observations and(Observations other) {
        if (other == null) {
            throw new IllegalArgumentException("other: must not be null");
        }
        final List<Curve> list = new ArrayList<>(curves);
        list.addAll(other.curves);
        return new Observations(list);
    }

    private static Curve curve(boolean breakthrough, double fixed, double[] varying,
                               String name, double[] c, double[] weights) {
        Checks.length(name, varying, 1);
        final int n = varying.length;
        if (c == null || c.length != n) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "c: needs %d elements (as %s), got %s", n, name,
                c == null ? "null" : Integer.toString(c.length)));
        }
        if (weights != null && weights.length != n) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "weights: needs %d elements (as %s), got %d", n, name, weights.length));
        }
        final double[] s = varying.clone();
        final double[] cc = c.clone();
        final double[] w = new double[n];
        boolean nonZero = false;
        for (int i = 0; i < n; i++) {
            if (breakthrough) {
                Checks.nonNegative(name + "[" + i + "]", s[i]);
            } else {
                Checks.finite(name + "[" + i + "]", s[i]);
            }
            Checks.finite("c[" + i + "]", cc[i]);
            nonZero |= cc[i] != 0;
            w[i] = weights == null ? 1.0 : Checks.positive("weights[" + i + "]", weights[i]);
        }
        if (!nonZero) {
            throw new IllegalArgumentException("c: all " + n + " concentrations are 0;"
                + " such a curve says nothing about the transport parameters");
        }
        return new Curve(breakthrough, fixed, s, cc, w);
    }

    /**
     * Returns the total number of points.
     *
     * @return n
     */
    public int size() {
        int n = 0;
        for (Curve c : curves) {
            n += c.c.length;
        }
        return n;
    }

    List<Curve> curves() {
        return curves;
    }
}
