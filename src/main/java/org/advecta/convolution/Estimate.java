package org.advecta.convolution;

import java.util.Locale;

/**
 * A computed value with an estimate of its absolute error, as returned by the quadrature
 * routes. Immutable.
 */
public final class Estimate {

    private final double value;
    private final double error;

    private Estimate(double value, double error) {
        this.value = value;
        this.error = error;
    }

    /**
     * Returns an estimate.
     *
     * @param value the value
     * @param error the estimated absolute error, ≥ 0
     * @return the estimate
     */
    static Estimate of(double value, double error) {
        return new Estimate(value, error);
    }

    /**
     * Returns the computed value.
     *
     * @return the value
     */
    public double value() {
        return value;
    }

    /**
     * Returns the estimated absolute error of {@link #value()}.
     *
     * @return the error estimate, ≥ 0
     */
    public double error() {
        return error;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s ± %s", value, error);
    }
}
