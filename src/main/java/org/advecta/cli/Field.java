package org.advecta.cli;

import java.util.Optional;
import java.util.OptionalDouble;
import org.advecta.quadrature.Estimate;
import org.advecta.solution.Solution1D;

/**
 * A concentration field in one, two or three dimensions, as the command line evaluates it:
 * the library's solution or kernel behind one signature. Coordinates a family does not have
 * are ignored. Implementations are immutable.
 */
interface Field {

    /**
     * Returns the number of space dimensions.
     *
     * @return 1, 2 or 3
     */
    int dimensions();

    /**
     * Returns the smallest valid x (0 on the half-line, −∞ otherwise).
     *
     * @return the lower end of the domain along x
     */
    double minX();

    /**
     * Returns c(x, y, z, t).
     *
     * @param x position along the flow
     * @param y position across the flow (2D, 3D)
     * @param z position in the third direction (3D)
     * @param t time
     * @return the concentration
     * @throws IllegalArgumentException if the library rejects an argument
     */
    double value(double x, double y, double z, double t);

    /**
     * Writes the gradient (∂c/∂x, ∂c/∂y, ∂c/∂z), as many components as dimensions.
     *
     * @param x position along the flow
     * @param y position across the flow (2D, 3D)
     * @param z position in the third direction (3D)
     * @param t time
     * @param out receives the components; length at least {@link #dimensions()}
     * @throws IllegalArgumentException if the library rejects an argument
     */
    void gradient(double x, double y, double z, double t, double[] out);

    /**
     * Writes the total flux (v·c − D_L ∂c/∂x, −D_T ∂c/∂y, −D_V ∂c/∂z), as many components as
     * dimensions.
     *
     * @param x position along the flow
     * @param y position across the flow (2D, 3D)
     * @param z position in the third direction (3D)
     * @param t time
     * @param out receives the components; length at least {@link #dimensions()}
     * @throws IllegalArgumentException if the library rejects an argument
     */
    void flux(double x, double y, double z, double t, double[] out);

    /**
     * Returns the level that c approaches far from the source at time t (for a mass
     * balance of the excess c − background).
     *
     * @param t time
     * @return the far-field level (0 for most families)
     */
    default double background(double t) {
        return 0.0;
    }

    /**
     * Returns the exact amount of solute in solution in the whole domain at time t, per unit
     * mobile-phase capacity: ∫ (c − background) dx (dy, dz), when the family knows it in
     * closed form and it is finite.
     *
     * @param t time
     * @return the amount, or empty
     */
    default OptionalDouble mass(double t) {
        return OptionalDouble.empty();
    }

    /**
     * Returns the library's one-dimensional solution behind this field, for what needs a
     * {@link Solution1D} (exact cell averages), when there is one.
     *
     * @return the solution, or empty (kernels, 2D and 3D fields)
     */
    default Optional<Solution1D> line() {
        return Optional.empty();
    }

    /**
     * Tells whether the field is a steady state: c does not depend on t, and t is not one of
     * its coordinates (a t column of a points table is then passed through unread).
     *
     * @return true for a steady state
     */
    default boolean steady() {
        return false;
    }

    /**
     * Tells whether {@link #gradient} and {@link #flux} are available.
     *
     * @return false for fields known only as values (the continuous sources)
     */
    default boolean hasDerivatives() {
        return true;
    }

    /**
     * Tells whether the field is computed by quadrature with an error bound
     * ({@link #estimate}).
     *
     * @return true for quadrature fields
     */
    default boolean hasErrorBound() {
        return false;
    }

    /**
     * Returns the concentration with its quadrature error bound; its value is
     * {@link #value}'s, bit for bit.
     *
     * @param x position along the flow
     * @param y position across the flow (2D, 3D)
     * @param z position in the third direction (3D)
     * @param t time
     * @return the value and its error bound
     * @throws IllegalArgumentException if the library rejects an argument
     * @throws IllegalStateException if the field has no error bound
     */
    default Estimate estimate(double x, double y, double z, double t) {
        throw new IllegalStateException("no error bound: the family is a closed form");
    }

    /**
     * Tells whether the field is the plume of a continuous source, which keeps adding solute
     * (so that no fixed amount can be balanced against a window's integral).
     *
     * @return true for a continuous source
     */
    default boolean continuousSource() {
        return false;
    }

    /**
     * Returns the steady state that a continuous source's c(x, y, z, t) approaches, when
     * there is one.
     *
     * @param x position along the flow
     * @param y position across the flow (2D, 3D)
     * @param z position in the third direction (3D)
     * @return c(x, y, z, ∞), or empty (no steady state, or not a continuous source)
     * @throws IllegalArgumentException if the library rejects an argument
     */
    default OptionalDouble steadyValue(double x, double y, double z) {
        return OptionalDouble.empty();
    }
}
