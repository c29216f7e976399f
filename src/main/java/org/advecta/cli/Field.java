package org.advecta.cli;

import java.util.Optional;
import java.util.OptionalDouble;
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
}
