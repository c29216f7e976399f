package org.advecta.internal;

import java.util.Locale;

/**
 * Argument validation shared by every public entry point.
 *
 * <p>Each check states the valid condition and throws otherwise, so that NaN (for which every
 * comparison is false) can never slip through. Messages name the parameter and its value,
 * formatted with {@link Locale#ROOT}. Not exported from the module.
 */
public final class Checks {

    private Checks() {
    }

    /**
     * Requires a finite value.
     *
     * @param name the parameter's name in messages
     * @param value the value
     * @return {@code value}
     * @throws IllegalArgumentException if {@code value} is NaN or infinite
     */
    public static double finite(String name, double value) {
        if (Double.isFinite(value)) {
            return value;
        }
        throw fail(name, value, "must be finite");
    }

    /**
     * Requires a finite value strictly greater than zero.
     *
     * @param name the parameter's name in messages
     * @param value the value
     * @return {@code value}
     * @throws IllegalArgumentException otherwise
     */
    public static double positive(String name, double value) {
        if (value > 0 && value < Double.POSITIVE_INFINITY) {
            return value;
        }
        throw fail(name, value, "must be finite and > 0");
    }

    /**
     * Requires a finite value greater than or equal to zero.
     *
     * @param name the parameter's name in messages
     * @param value the value
     * @return {@code value}
     * @throws IllegalArgumentException otherwise
     */
    public static double nonNegative(String name, double value) {
        if (value >= 0 && value < Double.POSITIVE_INFINITY) {
            return value;
        }
        throw fail(name, value, "must be finite and >= 0");
    }

    /**
     * Requires a finite value greater than or equal to {@code min}.
     *
     * @param name the parameter's name in messages
     * @param value the value
     * @param min the smallest valid value
     * @return {@code value}
     * @throws IllegalArgumentException otherwise
     */
    public static double atLeast(String name, double value, double min) {
        if (value >= min && value < Double.POSITIVE_INFINITY) {
            return value;
        }
        throw fail(name, value, "must be finite and >= " + format(min));
    }

    /**
     * Requires a non-null array of at least {@code length} elements.
     *
     * @param name the parameter's name in messages
     * @param array the array
     * @param length the smallest valid length
     * @return {@code array}
     * @throws IllegalArgumentException if {@code array} is null or too short
     */
    public static double[] length(String name, double[] array, int length) {
        if (array != null && array.length >= length) {
            return array;
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
            "%s: needs at least %d elements, got %s", name, length,
            array == null ? "null" : Integer.toString(array.length)));
    }

    /**
     * Requires two output arrays to be different objects, since each receives its own
     * component.
     *
     * @param first the first output
     * @param second the second output
     * @throws IllegalArgumentException if they are the same array
     */
    public static void distinct(double[] first, double[] second) {
        if (first == second) {
            throw new IllegalArgumentException("output arrays must be different arrays");
        }
    }

    /**
     * Builds the exception for an invalid value.
     *
     * @param name the parameter's name
     * @param value the offending value
     * @param rule what a valid value is
     * @return the exception, for the caller to throw
     */
    public static IllegalArgumentException fail(String name, double value, String rule) {
        return new IllegalArgumentException(String.format(Locale.ROOT,
            "%s = %s: %s", name, format(value), rule));
    }

    private static String format(double value) {
        // Double.toString round-trips and does not depend on the default locale.
        return Double.toString(value);
    }
}
