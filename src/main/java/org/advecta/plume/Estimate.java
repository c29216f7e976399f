package org.advecta.plume;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * A value computed by quadrature together with a bound on its error. Immutable and
 * thread-safe.
 *
 * <p>The error estimate is the sum, over the subintervals of the adaptive rule, of
 * |K₁₅ − G₇| (the difference between the 15-point Kronrod and the embedded 7-point Gauss
 * result, which overstates the error of the Kronrod value the estimate accompanies for
 * smooth integrands), plus a bound on the truncated tails of the integral, plus the rounding
 * of the exponents (8·2⁻⁵³ relative per unit of their size, which is what the inputs' own
 * rounding implies). For a rate history or images it is the sum of the terms' bounds. The
 * tests check that the exact value lies within it.
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
     * @param value the value, finite
     * @param error the absolute error bound, finite and ≥ 0
     * @return the estimate
     * @throws IllegalArgumentException if an argument is not finite or the error is negative
     */
    public static Estimate of(double value, double error) {
        return new Estimate(Checks.finite("value", value), Checks.nonNegative("error", error));
    }

    /**
     * Returns the value.
     *
     * @return the value
     */
    public double value() {
        return value;
    }

    /**
     * Returns the estimated bound on the absolute error of {@link #value()}.
     *
     * @return the absolute error bound, ≥ 0
     */
    public double error() {
        return error;
    }

    /**
     * Returns the error bound relative to the value, error/|value| (0 when both are 0,
     * +∞ when only the value is 0).
     *
     * @return the relative error bound
     */
    public double relativeError() {
        if (error == 0) {
            return 0.0;
        }
        return error / Math.abs(value);
    }

    /**
     * Returns the sum of this and another estimate (values added, error bounds added).
     *
     * @param other the other estimate
     * @return the sum
     */
    Estimate plus(Estimate other) {
        return new Estimate(value + other.value, error + other.error);
    }

    /**
     * Returns this estimate multiplied by a finite factor.
     *
     * @param factor the factor
     * @return the scaled estimate
     */
    Estimate times(double factor) {
        return new Estimate(value * factor, error * Math.abs(factor));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Estimate[value=%s, error=%s]", value, error);
    }
}
