package org.advecta.quadrature;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * A value computed by quadrature together with an estimate of its absolute error. Immutable
 * and thread-safe.
 *
 * <p>Each method that returns one says what its error is: for the continuous sources of
 * {@code org.advecta.plume} a bound (the sum over the adaptive rule's subintervals of
 * |K₁₅ − G₇|, which overstates the error of the Kronrod value for smooth integrands, plus the
 * truncated tails and the rounding of the exponents; the tests check that the exact value
 * lies within it); for the routes of {@code org.advecta.convolution} a realistic estimate
 * (the tests check that it exceeds the true error and stays within 100 times it).
 *
 * <p>Both are relative in origin: for a value below {@link Double#MIN_NORMAL} they can
 * underflow to 0 and do not cover the absolute rounding of the subnormal range, a few
 * {@link Double#MIN_VALUE} (the tests hold such values to 4 MIN_VALUE beyond the error, as
 * the reference fixtures hold subnormal results).
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
     * @param error the absolute error estimate, finite and ≥ 0
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
     * Returns the estimated absolute error of {@link #value()} (a bound where the method
     * that returned this estimate says so).
     *
     * @return the absolute error estimate, ≥ 0
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
     * Returns the sum of this and another estimate (values added, errors added).
     *
     * @param other the other estimate
     * @return the sum
     */
    public Estimate plus(Estimate other) {
        return new Estimate(value + other.value, error + other.error);
    }

    /**
     * Returns this estimate multiplied by a finite factor.
     *
     * @param factor the factor
     * @return the scaled estimate
     */
    public Estimate times(double factor) {
        return new Estimate(value * factor, error * Math.abs(factor));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Estimate[value=%s, error=%s]", value, error);
    }
}
