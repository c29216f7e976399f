/**
 * Error functions and the exponential products built on them, evaluated without overflow,
 * premature underflow or cancellation.
 *
 * <p>These are plain mathematical functions and follow the conventions of
 * {@link java.lang.Math}: a NaN argument gives NaN, infinite arguments give the limit, and no
 * exception is thrown. Each method states its accuracy in units in the last place (ULP) of the
 * exact result at the exact double arguments, measured against 50-digit mpmath reference values
 * by the test suite. The model layers above ({@code org.advecta.kernel} and up) validate their
 * inputs instead and throw {@link IllegalArgumentException}.
 */
package org.advecta.special;
