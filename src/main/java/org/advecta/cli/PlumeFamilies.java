package org.advecta.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.advecta.plume.LineSource2D;
import org.advecta.plume.PatchSource3D;
import org.advecta.plume.PointSource3D;
import org.advecta.plume.Wall;
import org.advecta.quadrature.Estimate;

/**
 * The continuous sources of {@code org.advecta.plume} as command-line families:
 * {@code point-source-3d} ({@link PointSource3D}, closed form), {@code line-source-2d}
 * ({@link LineSource2D}, quadrature; steady state in closed form) and {@code patch-source-3d}
 * ({@link PatchSource3D}, quadrature, also at steady state).
 *
 * <p>Common keys besides the medium's: the constant release rate {@code q} (switched on at
 * t = 0), {@code steady = false | true} (true: the steady state c(x, y, z, ∞), for which t is
 * not a coordinate) and an optional wall parallel to the flow, {@code wall = none | reflecting
 * | absorbing} placed by {@code yw} (the plane y = yw) or, in 3D, {@code zw} (z = zw): exactly
 * one of them with a wall, neither without. The plume fields have values only (no gradient
 * or flux columns); the quadrature families also give an error bound.
 */
final class PlumeFamilies {

    private static final String WALL_MEANING = "a wall parallel to the flow: impermeable "
        + "(reflecting) or held at c = 0 (absorbing); placed by ";

    private PlumeFamilies() {
    }

    /**
     * Returns the three families, in listing order.
     *
     * @return point-source-3d, line-source-2d, patch-source-3d
     */
    static List<Family> all() {
        return List.of(point(), line(), patch());
    }

    private static Family point() {
        return new Family("point-source-3d",
            "continuous point source of rate q at (x0, y0, z0) from t = 0, flow along x "
                + "(closed form)",
            "space", 3, Families.specs(Families.transport(false, 3),
                ParamSpec.number("x0", "source position along the flow [L]").byDefault(0),
                ParamSpec.number("y0", "source position across the flow [L]").byDefault(0),
                ParamSpec.number("z0", "source position in the third direction [L]")
                    .byDefault(0),
                ParamSpec.number("q", "release rate: mass per time divided by the mobile-phase "
                    + "capacity, e.g. (mass/T)/porosity [C L^3/T]").byDefault(1),
                steady(), wall(true), yw(), zw()),
            p -> {
                PointSource3D s = PointSource3D.of(p.transport(), p.get("x0"), p.get("y0"),
                    p.get("z0"), p.get("q"));
                final Wall w = wall(p, true);
                if (w != null) {
                    s = s.withWall(w);
                }
                final PointSource3D source = s;
                if (steady(p)) {
                    return new PlumeField(3, true, false) {
                        @Override
                        public double value(double x, double y, double z, double t) {
                            return source.steadyValue(x, y, z);
                        }
                    };
                }
                return new PlumeField(3, false, false) {
                    @Override
                    public double value(double x, double y, double z, double t) {
                        return source.value(x, y, z, t);
                    }

                    @Override
                    public OptionalDouble steadyValue(double x, double y, double z) {
                        return OptionalDouble.of(source.steadyValue(x, y, z));
                    }
                };
            });
    }

    private static Family line() {
        return new Family("line-source-2d",
            "continuous line source (a well screened over the whole thickness) of rate q per "
                + "unit thickness at (x0, y0) from t = 0, flow along x (quadrature with error "
                + "bound; steady state in closed form)",
            "plane", 2, Families.specs(Families.transport(false, 2),
                ParamSpec.number("x0", "source position along the flow [L]").byDefault(0),
                ParamSpec.number("y0", "source position across the flow [L]").byDefault(0),
                ParamSpec.number("q", "release rate per unit thickness: mass per time divided by "
                    + "thickness and mobile-phase capacity, e.g. (mass/T)/(porosity x thickness) "
                    + "[C L^2/T]").byDefault(1),
                steady(), wall(false), yw()),
            p -> {
                LineSource2D s = LineSource2D.of(p.transport(), p.get("x0"), p.get("y0"),
                    p.get("q"));
                final Wall w = wall(p, false);
                if (w != null) {
                    s = s.withWall(w);
                }
                final LineSource2D source = s;
                if (steady(p)) {
                    requireSteadyState(p);
                    return new PlumeField(2, true, false) {
                        @Override
                        public double value(double x, double y, double z, double t) {
                            return source.steadyValue(x, y);
                        }
                    };
                }
                return new PlumeField(2, false, true) {
                    @Override
                    public double value(double x, double y, double z, double t) {
                        return source.value(x, y, t);
                    }

                    @Override
                    public Estimate estimate(double x, double y, double z, double t) {
                        return source.estimate(x, y, t);
                    }

                    @Override
                    public OptionalDouble steadyValue(double x, double y, double z) {
                        return hasSteadyState(p) ? OptionalDouble.of(source.steadyValue(x, y))
                            : OptionalDouble.empty();
                    }
                };
            });
    }

    private static Family patch() {
        return new Family("patch-source-3d",
            "continuous source of total rate q spread evenly over the rectangle x = x0, "
                + "y1 < y < y2, z1 < z < z2 from t = 0, flow along x (quadrature with error bound)",
            "space", 3, Families.specs(Families.transport(false, 3),
                ParamSpec.number("x0", "position of the rectangle along the flow [L]")
                    .byDefault(0),
                ParamSpec.number("y1", "lower edge of the rectangle in y [L]"),
                ParamSpec.number("y2", "upper edge of the rectangle in y, > y1 [L]"),
                ParamSpec.number("z1", "lower edge of the rectangle in z [L]"),
                ParamSpec.number("z2", "upper edge of the rectangle in z, > z1 [L]"),
                ParamSpec.number("q", "total release rate over the rectangle: mass per time "
                    + "divided by the mobile-phase capacity, e.g. (mass/T)/porosity [C L^3/T]")
                    .byDefault(1),
                steady(), wall(true), yw(), zw()),
            p -> {
                PatchSource3D s = PatchSource3D.of(p.transport(), p.get("x0"), p.get("y1"),
                    p.get("y2"), p.get("z1"), p.get("z2"), p.get("q"));
                final Wall w = wall(p, true);
                if (w != null) {
                    s = s.withWall(w);
                }
                final PatchSource3D source = s;
                if (steady(p)) {
                    requireSteadyState(p);
                    return new PlumeField(3, true, true) {
                        @Override
                        public double value(double x, double y, double z, double t) {
                            return source.steadyEstimate(x, y, z).value();
                        }

                        @Override
                        public Estimate estimate(double x, double y, double z, double t) {
                            return source.steadyEstimate(x, y, z);
                        }
                    };
                }
                return new PlumeField(3, false, true) {
                    @Override
                    public double value(double x, double y, double z, double t) {
                        return source.value(x, y, z, t);
                    }

                    @Override
                    public Estimate estimate(double x, double y, double z, double t) {
                        return source.estimate(x, y, z, t);
                    }

                    @Override
                    public OptionalDouble steadyValue(double x, double y, double z) {
                        return hasSteadyState(p)
                            ? OptionalDouble.of(source.steadyEstimate(x, y, z).value())
                            : OptionalDouble.empty();
                    }
                };
            });
    }

    private static ParamSpec steady() {
        return ParamSpec.choice("steady", "true: the steady state c(x, y, z, infinity) for "
            + "the constant rate (t is then not a coordinate: a t column is passed through "
            + "unread, and run takes no times)", "false", "false", "true");
    }

    private static ParamSpec wall(boolean threeD) {
        return ParamSpec.choice("wall", WALL_MEANING + (threeD ? "yw or zw" : "yw"), "none",
            "none", "reflecting", "absorbing");
    }

    private static ParamSpec yw() {
        return ParamSpec.number("yw", "the wall is the plane y = yw (wall = reflecting or "
            + "absorbing only) [L]").optional();
    }

    private static ParamSpec zw() {
        return ParamSpec.number("zw", "the wall is the plane z = zw (wall = reflecting or "
            + "absorbing only) [L]").optional();
    }

    private static boolean steady(Params p) {
        return "true".equals(p.word("steady"));
    }

    /** Without flow and decay a line or patch source has no steady state (c grows forever). */
    private static void requireSteadyState(Params p) {
        if (!hasSteadyState(p)) {
            throw new UserError("family " + p.family().name() + ": steady = true needs flow or "
                + "decay (with v = 0 and mu = 0 the concentration grows without bound)");
        }
    }

    /** A line or patch source has a steady state with flow or decay. */
    private static boolean hasSteadyState(Params p) {
        return p.get("v") != 0 || p.get("mu") != 0;
    }

    /**
     * The wall the keys describe, or null for wall = none.
     *
     * @throws UserError if yw/zw are given without a wall, or a wall has not exactly one
     */
    private static Wall wall(Params p, boolean threeD) {
        final String kind = p.word("wall");
        final List<String> given = new ArrayList<>();
        for (String key : threeD ? List.of("yw", "zw") : List.of("yw")) {
            if (p.has(key)) {
                given.add(key);
            }
        }
        final String family = "family " + p.family().name() + ": ";
        if ("none".equals(kind)) {
            if (!given.isEmpty()) {
                throw new UserError(family + "parameter " + given.get(0) + " places a wall: "
                    + "it needs wall = reflecting or absorbing (wall is none)");
            }
            return null;
        }
        if (given.isEmpty()) {
            throw new UserError(family + "wall = " + kind + " needs its position: "
                + (threeD ? "yw (the plane y = yw) or zw (the plane z = zw)"
                : "yw (the line y = yw)"));
        }
        if (given.size() > 1) {
            throw new UserError(family + "wall = " + kind + ": give yw or zw, not both "
                + "(one wall)");
        }
        final String key = given.get(0);
        final Wall.Axis axis = "yw".equals(key) ? Wall.Axis.Y : Wall.Axis.Z;
        return "absorbing".equals(kind) ? Wall.absorbing(axis, p.get(key))
            : Wall.reflecting(axis, p.get(key));
    }

    /** A plume field: values only (and error bounds for the quadratures). */
    private abstract static class PlumeField implements Field {
        private final int dimensions;
        private final boolean steady;
        private final boolean bounded;

        PlumeField(int dimensions, boolean steady, boolean bounded) {
            this.dimensions = dimensions;
            this.steady = steady;
            this.bounded = bounded;
        }

        @Override
        public int dimensions() {
            return dimensions;
        }

        @Override
        public double minX() {
            return Double.NEGATIVE_INFINITY;
        }

        @Override
        public void gradient(double x, double y, double z, double t, double[] out) {
            throw new IllegalStateException("a continuous source has no gradient here");
        }

        @Override
        public void flux(double x, double y, double z, double t, double[] out) {
            throw new IllegalStateException("a continuous source has no flux here");
        }

        @Override
        public boolean steady() {
            return steady;
        }

        @Override
        public boolean hasDerivatives() {
            return false;
        }

        @Override
        public boolean hasErrorBound() {
            return bounded;
        }

        @Override
        public boolean continuousSource() {
            return true;
        }
    }
}
