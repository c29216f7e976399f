package org.advecta.cli;

import java.util.List;
import java.util.OptionalDouble;
import org.advecta.halfspace.HalfLineSlug;
import org.advecta.halfspace.HalfLineStep;
import org.advecta.halfspace.HalfSpaceKernel1D;
import org.advecta.halfspace.HalfSpaceKernel2D;
import org.advecta.halfspace.HalfSpaceKernel3D;
import org.advecta.halfspace.Wall;
import org.advecta.halfspace.WallAxis;

/**
 * The solutions of {@code org.advecta.halfspace} as command-line families: instantaneous
 * releases next to one wall ({@code release-wall-1d}, {@code -2d}, {@code -3d}) and the step
 * and slug initial data on the half-line x ≥ 0 ({@code step-wall}, {@code slug-wall}).
 *
 * <p>The wall is the plane where one coordinate is 0 (x = 0 in 1D; in 2D and 3D the key
 * {@code axis} says which), with {@code wall = absorbing} (c = 0 on it) or {@code zero-flux}
 * (no solute crosses it); the domain is the side where that coordinate is ≥ 0. Both keys are
 * required: there is no default wall. The amount in solution (for run's mass balance) is
 * the library's {@code massInDomain} for the releases, and C0 (b − a) e^{−μt/R} for a slug at
 * a zero-flux wall (nothing leaves); step-wall and an absorbing slug-wall have none.
 */
final class HalfSpaceFamilies {

    private static final String HALF_LINE = "half-line x >= 0 (wall at x = 0)";

    private HalfSpaceFamilies() {
    }

    /**
     * Returns the five families, in listing order.
     *
     * @return release-wall-1d, release-wall-2d, release-wall-3d, step-wall, slug-wall
     */
    static List<Family> all() {
        return List.of(release1d(), release2d(), release3d(), step(), slug());
    }

    private static ParamSpec wall(String where) {
        return ParamSpec.choice("wall", "the wall " + where + ": absorbing (c = 0 on it, "
            + "solute leaves) or zero-flux (no solute crosses it)", null, "absorbing",
            "zero-flux");
    }

    private static ParamSpec axis(boolean threeD) {
        return threeD
            ? ParamSpec.choice("axis", "the wall is the plane axis = 0: x (across the flow), "
                + "y or z (along the flow); the domain is axis >= 0", null, "x", "y", "z")
            : ParamSpec.choice("axis", "the wall is the line axis = 0: x (across the flow) or "
                + "y (along the flow); the domain is axis >= 0", null, "x", "y");
    }

    private static Wall wall(Params p) {
        return "absorbing".equals(p.word("wall")) ? Wall.ABSORBING : Wall.ZERO_FLUX;
    }

    private static WallAxis axis(Params p) {
        switch (p.word("axis")) {
            case "y":
                return WallAxis.Y;
            case "z":
                return WallAxis.Z;
            default:
                return WallAxis.X;
        }
    }

    private static Family release1d() {
        return new Family("release-wall-1d",
            "instantaneous release of amount M at x0 > 0 next to a wall at x = 0",
            HALF_LINE, 1, Families.specs(Families.transport(false, 1),
                wall("x = 0 (v < 0 flows towards it)"),
                ParamSpec.number("x0", "release point, distance from the wall [L]").above(0),
                ParamSpec.number("M", "amount released per unit cross-section and mobile-phase "
                    + "capacity, e.g. mass/(porosity x area) [C L]").byDefault(1)),
            p -> {
                final HalfSpaceKernel1D k = HalfSpaceKernel1D.of(p.transport(), wall(p),
                    p.get("x0"));
                final double m = p.get("M");
                return new Field() {
                    @Override
                    public int dimensions() {
                        return 1;
                    }

                    @Override
                    public double minX() {
                        return 0.0;
                    }

                    @Override
                    public double value(double x, double y, double z, double t) {
                        return m * k.value(x, t);
                    }

                    @Override
                    public void gradient(double x, double y, double z, double t, double[] out) {
                        out[0] = m * k.gradient(x, t);
                    }

                    @Override
                    public void flux(double x, double y, double z, double t, double[] out) {
                        out[0] = m * k.flux(x, t);
                    }

                    @Override
                    public OptionalDouble mass(double t) {
                        return OptionalDouble.of(m * k.massInDomain(t));
                    }
                };
            });
    }

    private static Family release2d() {
        return new Family("release-wall-2d",
            "instantaneous release of amount M at (x0, y0) next to a wall x = 0 or y = 0, flow "
                + "along x",
            "half-plane axis >= 0", 2, Families.specs(Families.transport(false, 2),
                wall("axis = 0"), axis(false),
                ParamSpec.number("x0", "release point along the flow (> 0 for axis = x) [L]"),
                ParamSpec.number("y0", "release point across the flow (> 0 for axis = y) [L]"),
                ParamSpec.number("M", "amount released per unit thickness and mobile-phase "
                    + "capacity, e.g. mass/(porosity x thickness) [C L^2]").byDefault(1)),
            p -> {
                final WallAxis axis = axis(p);
                final HalfSpaceKernel2D k = HalfSpaceKernel2D.of(p.transport(), wall(p), axis,
                    p.get("x0"), p.get("y0"));
                final double m = p.get("M");
                return new Field() {
                    @Override
                    public int dimensions() {
                        return 2;
                    }

                    @Override
                    public double minX() {
                        return axis == WallAxis.X ? 0.0 : Double.NEGATIVE_INFINITY;
                    }

                    @Override
                    public double value(double x, double y, double z, double t) {
                        return m * k.value(x, y, t);
                    }

                    @Override
                    public void gradient(double x, double y, double z, double t, double[] out) {
                        out[0] = m * k.gradientX(x, y, t);
                        out[1] = m * k.gradientY(x, y, t);
                    }

                    @Override
                    public void flux(double x, double y, double z, double t, double[] out) {
                        out[0] = m * k.fluxX(x, y, t);
                        out[1] = m * k.fluxY(x, y, t);
                    }

                    @Override
                    public OptionalDouble mass(double t) {
                        return OptionalDouble.of(m * k.massInDomain(t));
                    }
                };
            });
    }

    private static Family release3d() {
        return new Family("release-wall-3d",
            "instantaneous release of amount M at (x0, y0, z0) next to a wall x = 0, y = 0 or "
                + "z = 0, flow along x",
            "half-space axis >= 0", 3, Families.specs(Families.transport(false, 3),
                wall("axis = 0"), axis(true),
                ParamSpec.number("x0", "release point along the flow (> 0 for axis = x) [L]"),
                ParamSpec.number("y0", "release point across the flow (> 0 for axis = y) [L]"),
                ParamSpec.number("z0", "release point in the third direction (> 0 for "
                    + "axis = z) [L]"),
                ParamSpec.number("M", "amount released per unit mobile-phase capacity, "
                    + "e.g. mass/porosity [C L^3]").byDefault(1)),
            p -> {
                final WallAxis axis = axis(p);
                final HalfSpaceKernel3D k = HalfSpaceKernel3D.of(p.transport(), wall(p), axis,
                    p.get("x0"), p.get("y0"), p.get("z0"));
                final double m = p.get("M");
                return new Field() {
                    @Override
                    public int dimensions() {
                        return 3;
                    }

                    @Override
                    public double minX() {
                        return axis == WallAxis.X ? 0.0 : Double.NEGATIVE_INFINITY;
                    }

                    @Override
                    public double value(double x, double y, double z, double t) {
                        return m * k.value(x, y, z, t);
                    }

                    @Override
                    public void gradient(double x, double y, double z, double t, double[] out) {
                        out[0] = m * k.gradientX(x, y, z, t);
                        out[1] = m * k.gradientY(x, y, z, t);
                        out[2] = m * k.gradientZ(x, y, z, t);
                    }

                    @Override
                    public void flux(double x, double y, double z, double t, double[] out) {
                        out[0] = m * k.fluxX(x, y, z, t);
                        out[1] = m * k.fluxY(x, y, z, t);
                        out[2] = m * k.fluxZ(x, y, z, t);
                    }

                    @Override
                    public OptionalDouble mass(double t) {
                        return OptionalDouble.of(m * k.massInDomain(t));
                    }
                };
            });
    }

    private static Family step() {
        return new Family("step-wall",
            "concentration C0 on x > a >= 0 at t = 0, clean between the wall x = 0 and a",
            HALF_LINE, 1, Families.specs(Families.transport(false, 1),
                wall("x = 0"),
                ParamSpec.number("a", "where the loaded region starts (0: all of it) [L]")
                    .byDefault(0).atLeast(0),
                ParamSpec.number("C0", "concentration on the loaded side [C]").byDefault(1)),
            p -> Families.line(HalfLineStep.of(p.transport(), wall(p), p.get("a"),
                p.get("C0")), null));
    }

    private static Family slug() {
        return new Family("slug-wall",
            "a slug of concentration C0 on a < x < b at t = 0 next to a wall at x = 0",
            HALF_LINE, 1, Families.specs(Families.transport(false, 1),
                wall("x = 0"),
                ParamSpec.number("a", "left end of the slug [L]").byDefault(0).atLeast(0),
                ParamSpec.number("b", "right end of the slug, > a [L]"),
                ParamSpec.number("C0", "concentration in the slug [C]").byDefault(1)),
            p -> Families.line(HalfLineSlug.of(p.transport(), wall(p), p.get("a"), p.get("b"),
                p.get("C0")), wall(p) == Wall.ZERO_FLUX
                ? Families.decaying(p, p.get("C0") * (p.get("b") - p.get("a"))) : null));
    }
}
