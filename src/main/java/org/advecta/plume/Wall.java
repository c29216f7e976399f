package org.advecta.plume;

import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * A plane boundary parallel to the flow (y = const or z = const), either impermeable
 * (reflecting: no flux across it) or absorbing (concentration 0 on it). Immutable and
 * thread-safe.
 *
 * <p>Since the flow is along the plane, there is no advection across it, and the method of
 * images is exact with a plain mirror image in the transverse coordinate (Carslaw &amp; Jaeger
 * 1959, §10.10; Bear 1972, §10.6):
 * <pre>
 * c(x, y, z) = c∞(x, y, z) ± c∞(x, 2y_w − y, z)      (+ reflecting, − absorbing)
 * </pre>
 * with c∞ the free-space solution. The domain is the side of the wall that holds the source.
 * Near an absorbing wall (and far from the source compared with its distance from the wall)
 * the two terms nearly cancel. The quadrature-based sources therefore form the difference
 * inside their time integrals: {@link LineSource2D} integrates the free kernel times
 * 1 − e^(−c/τ) = −expm1(−c/τ), c = R(y − y_w)(y₀ − y_w)/D_T ≥ 0 (the image's kernel differs
 * from the free one only in the transverse distance); {@link PatchSource3D} forms each strip
 * factor minus its mirror from the Gaussian masses H(a) = erf((a + Y)/w) − erf((a − Y)/w)
 * over the strip's distances a from the wall. Their returned bounds are then relative to the
 * result itself (at most 1e-10 at default settings, checked against mpmath down to 1e-6 of
 * the source–wall distance). The closed forms (the point source's values, the line source's
 * steady state) still superpose the terms: beside an absorbing wall they are accurate to
 * about 2⁻⁵³ × c∞ in absolute terms, not relative to their own (small) size. (The mass
 * fluxes beside an absorbing wall are quadratures with the factor erf(a/√(4D_Tτ/R)), see
 * {@link PointSource3D#massFluxEstimate(double, double)}.)
 */
public final class Wall {

    /** The coordinate that is constant on the wall. */
    public enum Axis {
        /** A plane y = const (in 2D: a line y = const). */
        Y,
        /** A plane z = const (3D only). */
        Z
    }

    private final Axis axis;
    private final double position;
    private final boolean absorbing;

    private Wall(Axis axis, double position, boolean absorbing) {
        this.axis = axis;
        this.position = position;
        this.absorbing = absorbing;
    }

    /**
     * Returns an impermeable (reflecting, no-flux) wall.
     *
     * @param axis which coordinate is constant on the wall
     * @param position the wall's coordinate, finite
     * @return the wall
     * @throws IllegalArgumentException if axis is null or position not finite
     */
    public static Wall reflecting(Axis axis, double position) {
        return new Wall(checkAxis(axis), Checks.finite("position", position), false);
    }

    /**
     * Returns an absorbing wall (concentration 0 on it).
     *
     * @param axis which coordinate is constant on the wall
     * @param position the wall's coordinate, finite
     * @return the wall
     * @throws IllegalArgumentException if axis is null or position not finite
     */
    public static Wall absorbing(Axis axis, double position) {
        return new Wall(checkAxis(axis), Checks.finite("position", position), true);
    }

    private static Axis checkAxis(Axis axis) {
        if (axis == null) {
            throw new IllegalArgumentException("axis: must not be null");
        }
        return axis;
    }

    /**
     * Returns the axis.
     *
     * @return Y or Z
     */
    public Axis axis() {
        return axis;
    }

    /**
     * Returns the wall's coordinate.
     *
     * @return y_w or z_w
     */
    public double position() {
        return position;
    }

    /**
     * Returns whether the wall is absorbing.
     *
     * @return true for absorbing, false for reflecting
     */
    public boolean isAbsorbing() {
        return absorbing;
    }

    /** The image's sign: +1 reflecting, −1 absorbing. */
    double sign() {
        return absorbing ? -1.0 : 1.0;
    }

    /** The mirror image 2w − c of a coordinate. */
    double mirror(double c) {
        return 2 * position - c;
    }

    /**
     * Returns the side (+1 above, −1 below) of the domain, from the source's extent
     * [lo, hi] along the wall's axis, which must lie on one side (touching is allowed for a
     * reflecting wall only).
     */
    int sideOf(double lo, double hi, String what) {
        if (lo > position || (!absorbing && lo == position && hi > position)) {
            return 1;
        }
        if (hi < position || (!absorbing && hi == position && lo < position)) {
            return -1;
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
            "%s [%s, %s] must lie on one side of the %s wall at %s = %s", what,
            Double.toString(lo), Double.toString(hi), absorbing ? "absorbing" : "reflecting",
            axis == Axis.Y ? "y" : "z", Double.toString(position)));
    }

    /** Throws unless c lies on the domain side (the wall itself included). */
    void checkSide(int side, String name, double c) {
        if (!(side * (c - position) >= 0)) {
            throw Checks.fail(name, c, String.format(Locale.ROOT,
                "must be on the source's side of the wall at %s", Double.toString(position)));
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Wall[%s %s = %s]",
            absorbing ? "absorbing" : "reflecting", axis == Axis.Y ? "y" : "z",
            Double.toString(position));
    }
}
