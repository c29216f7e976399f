package org.advecta.solution;

import org.advecta.internal.Checks;
import org.advecta.internal.Spread;
import org.advecta.transport.TransportParameters;

/**
 * Validation and the t = 0 split shared by the closed-form families: subclasses implement the
 * solution for t &gt; 0 and their initial data for t = 0, on already-validated arguments.
 */
abstract class AbstractSolution1D implements Solution1D {

    /** The transport parameters. */
    final TransportParameters parameters;
    /** v. */
    final double velocity;
    /** D (longitudinal). */
    final double dispersion;
    /** R. */
    final double retardation;
    /** v/R, the speed of a solute front (divided once here, not at every point). */
    final double drift;
    /** μ/R, the decay rate of the dissolved concentration of a released mass. */
    final double decayPerRetardation;
    private final Domain domain;
    /** The smallest valid x. */
    private final double lowestX;

    AbstractSolution1D(TransportParameters parameters, Domain domain) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        this.parameters = parameters;
        this.velocity = parameters.velocity();
        this.dispersion = parameters.dispersion();
        this.retardation = parameters.retardation();
        this.drift = parameters.velocity() / parameters.retardation();
        this.decayPerRetardation = parameters.decayRate() / parameters.retardation();
        this.domain = domain;
        this.lowestX = domain == Domain.HALF_LINE ? 0.0 : -Double.MAX_VALUE;
    }

    @Override
    public final TransportParameters parameters() {
        return parameters;
    }

    @Override
    public final Domain domain() {
        return domain;
    }

    @Override
    public final double value(double x, double t) {
        // the common case in one test; the rest (t = 0 or invalid) after it
        if (x >= lowestX && x < Double.POSITIVE_INFINITY && t > 0
            && t < Double.POSITIVE_INFINITY) {
            return valueAt(x, t);
        }
        checkPoint(x, t);
        return initialValue(x);
    }

    /**
     * A profile at one time: the time's own quantities (the spread) are computed once, and
     * each point costs only its own part. Gives the same doubles as {@link #value} point by
     * point.
     */
    @Override
    public void values(double[] x, double t, double[] out) {
        Checks.length("x", x, 0);
        Checks.length("out", out, x.length);
        Checks.nonNegative("t", t);
        if (t == 0) {
            for (int i = 0; i < x.length; i++) {
                out[i] = value(x[i], 0.0);
            }
            return;
        }
        final Spread s = spreadAt(t);
        for (int i = 0; i < x.length; i++) {
            final double xi = x[i];
            checkPoint(xi, t);
            out[i] = valueAt(xi, t, s);
        }
    }

    @Override
    public final double gradient(double x, double t) {
        if (x >= lowestX && x < Double.POSITIVE_INFINITY && t > 0
            && t < Double.POSITIVE_INFINITY) {
            return gradientAt(x, t);
        }
        checkPoint(x, t);
        return initialGradient(x);
    }

    /**
     * Returns c(x, t) for valid x and t &gt; 0.
     *
     * @param x position
     * @param t time, &gt; 0
     * @return c
     */
    abstract double valueAt(double x, double t);

    /**
     * Returns c(x, t) for valid x and t &gt; 0, given the time's quantities from
     * {@link #spreadAt(double)}. Families whose formula uses the spread of the moving
     * Gaussian override this (and compute {@link #valueAt(double, double)} through it), so
     * that a profile computes it once.
     *
     * @param x position
     * @param t time, &gt; 0
     * @param s {@code spreadAt(t)}
     * @return c
     */
    double valueAt(double x, double t, Spread s) {
        return valueAt(x, t);
    }

    /**
     * Returns what {@link #valueAt(double, double, Spread)} needs of the time t &gt; 0: by
     * default the inverse length 1/L with this solution's D and R (all that the erfc-based
     * families use; see {@link Spread#ofInverseLength}), or null where no spread is used.
     *
     * @param t time, &gt; 0
     * @return the spread, or null
     */
    Spread spreadAt(double t) {
        // the same doubles as Spread.inverseLength(D, R, t), which point evaluation uses, so
        // that a profile equals its points bit for bit
        return Spread.ofInverseLength(dispersion, retardation, t);
    }

    /**
     * Returns ∂c/∂x for valid x and t &gt; 0.
     *
     * @param x position
     * @param t time, &gt; 0
     * @return ∂c/∂x
     */
    abstract double gradientAt(double x, double t);

    /**
     * Returns the initial (and, at x = 0 on the half-line, boundary) value.
     *
     * @param x position
     * @return c(x, 0)
     */
    abstract double initialValue(double x);

    /**
     * Returns the initial gradient.
     *
     * @param x position
     * @return ∂c/∂x at t = 0
     */
    abstract double initialGradient(double x);

    /** The exponent −μt/R of the decay factor. */
    final double decayExponent(double t) {
        return -decayPerRetardation * t;
    }

    private void checkPoint(double x, double t) {
        // one test for the valid case (this runs at every point), the messages after it
        if (!(x >= lowestX && x < Double.POSITIVE_INFINITY && t >= 0
            && t < Double.POSITIVE_INFINITY)) {
            if (domain == Domain.HALF_LINE) {
                Checks.nonNegative("x", x);
            } else {
                Checks.finite("x", x);
            }
            Checks.nonNegative("t", t);
        }
    }
}
