package org.advecta.fit;

/**
 * The transport parameters a fit can estimate, each with the transform that keeps it inside
 * its bounds: the optimiser works on an unbounded θ, and the parameter is a function of θ that
 * cannot leave its range.
 */
public enum Parameter {
    /** Velocity v &gt; 0 (fitted as v = e^θ). */
    VELOCITY("v", 0.0),
    /** Dispersion coefficient D &gt; 0 (D = e^θ). */
    DISPERSION("D", 0.0),
    /** Retardation factor R &gt; 1 (R = 1 + e^θ). */
    RETARDATION("R", 1.0),
    /** First-order decay rate μ &gt; 0 of the equation's −μc term (μ = e^θ). */
    DECAY("mu", 0.0),
    /** The source: inlet concentration C₀, initial concentration C₀, or plume mass M (&gt; 0,
     * = e^θ). */
    SOURCE("source", 0.0);

    private final String symbol;
    private final double lowerBound;

    Parameter(String symbol, double lowerBound) {
        this.symbol = symbol;
        this.lowerBound = lowerBound;
    }

    /**
     * Returns the short name used in messages (v, D, R, mu, source).
     *
     * @return the symbol
     */
    public String symbol() {
        return symbol;
    }

    /**
     * Returns the open lower bound of a fitted value (0, or 1 for R).
     *
     * @return the bound
     */
    public double lowerBound() {
        return lowerBound;
    }

    /** θ → parameter. */
    double fromFree(double theta) {
        return lowerBound + Math.exp(theta);
    }

    /** parameter → θ; the value must be above the bound. */
    double toFree(double value) {
        return Math.log(value - lowerBound);
    }

    /** d parameter / dθ at the given parameter value. */
    double derivative(double value) {
        return value - lowerBound;
    }
}
