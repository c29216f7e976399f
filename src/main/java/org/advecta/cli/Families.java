package org.advecta.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.kernel.FreeSpaceKernel2D;
import org.advecta.kernel.FreeSpaceKernel3D;
import org.advecta.solution.DecayingBackground;
import org.advecta.solution.Domain;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * The registry of solution families: one entry per family, in listing order. A new family is
 * one more entry in {@link #ALL}: a {@link Family} with its name, summary, domain,
 * dimensions, parameter specs and factory.
 *
 * <p>Dimensions in the parameter meanings: L length, T time, C concentration, in whatever
 * consistent units the user works in.
 */
final class Families {

    private static final String LINE = "line";
    private static final String HALF_LINE = "half-line x >= 0 (inlet at x = 0)";

    /** Every family, in listing order. */
    static final List<Family> ALL = concat(List.of(
        new Family("step", "a step of concentration C0 on one side of x0 at t = 0",
            LINE, 1, specs(transport(false, 1),
                ParamSpec.number("x0", "position of the step [L]").byDefault(0),
                ParamSpec.number("C0", "concentration on the loaded side [C]").byDefault(1),
                ParamSpec.choice("side", "which side is loaded at t = 0", "left",
                    "left", "right")),
            p -> line(InitialStep.of(p.transport(), p.get("x0"), p.get("C0"),
                "left".equals(p.word("side")) ? InitialStep.Side.LEFT : InitialStep.Side.RIGHT),
                null)),
        new Family("slug", "a slug of concentration C0 on a < x < b at t = 0",
            LINE, 1, specs(transport(false, 1),
                ParamSpec.number("a", "left end of the slug [L]"),
                ParamSpec.number("b", "right end of the slug, > a [L]"),
                ParamSpec.number("C0", "concentration in the slug [C]").byDefault(1)),
            p -> line(InitialSlug.of(p.transport(), p.get("a"), p.get("b"), p.get("C0")),
                decaying(p, p.get("C0") * (p.get("b") - p.get("a"))))),
        new Family("gaussian", "a Gaussian plume of amount M, centre xc, width s0 at t = 0",
            LINE, 1, specs(transport(false, 1),
                ParamSpec.number("xc", "centre at t = 0 [L]").byDefault(0),
                ParamSpec.number("s0", "standard deviation at t = 0 [L]").above(0),
                ParamSpec.number("M", "amount: the integral of c(x, 0) over x [C L]")
                    .byDefault(1)),
            p -> line(InitialGaussian.of(p.transport(), p.get("xc"), p.get("s0"), p.get("M")),
                decaying(p, p.get("M")))),
        new Family("background", "a uniform level Cb that decays with the medium",
            LINE, 1, specs(transport(false, 1),
                ParamSpec.number("Cb", "level at t = 0 [C]").byDefault(1)),
            p -> line(DecayingBackground.of(p.transport(), p.get("Cb")), null)),
        new Family("inlet-first",
            "inlet x = 0 held at concentration g(t) (first-type); initial level Ci",
            HALF_LINE, 1, specs(transport(false, 1), inletSpecs()),
            p -> line(FirstTypeInlet.of(p.transport(), input(p))
                .withInitialConcentration(p.get("Ci")), null)),
        new Family("inlet-third",
            "water entering at x = 0 with concentration g(t) (flux, third-type); initial level Ci",
            HALF_LINE, 1, specs(transport(true, 1), inletSpecs()),
            p -> line(ThirdTypeInlet.of(p.transport(), input(p))
                .withInitialConcentration(p.get("Ci")), new InletBudget(p))),
        new Family("release-1d", "instantaneous release of amount M at x0 at t = 0",
            LINE, 1, specs(transport(false, 1),
                ParamSpec.number("x0", "release point [L]").byDefault(0),
                ParamSpec.number("M", "amount released per unit cross-section and mobile-phase "
                    + "capacity, e.g. mass/(porosity x area) [C L]").byDefault(1)),
            Families::release1d),
        new Family("release-2d", "instantaneous release of amount M at (x0, y0), flow along x",
            "plane", 2, specs(transport(false, 2),
                ParamSpec.number("x0", "release point along the flow [L]").byDefault(0),
                ParamSpec.number("y0", "release point across the flow [L]").byDefault(0),
                ParamSpec.number("M", "amount released per unit thickness and mobile-phase "
                    + "capacity, e.g. mass/(porosity x thickness) [C L^2]").byDefault(1)),
            Families::release2d),
        new Family("release-3d",
            "instantaneous release of amount M at (x0, y0, z0), flow along x",
            "space", 3, specs(transport(false, 3),
                ParamSpec.number("x0", "release point along the flow [L]").byDefault(0),
                ParamSpec.number("y0", "release point across the flow [L]").byDefault(0),
                ParamSpec.number("z0", "release point in the third direction [L]").byDefault(0),
                ParamSpec.number("M", "amount released per unit mobile-phase capacity, "
                    + "e.g. mass/porosity [C L^3]").byDefault(1)),
            Families::release3d)), PlumeFamilies.all(), HalfSpaceFamilies.all());

    private Families() {
    }

    @SafeVarargs
    private static List<Family> concat(List<Family>... parts) {
        final List<Family> all = new ArrayList<>();
        for (List<Family> part : parts) {
            all.addAll(part);
        }
        return List.copyOf(all);
    }

    /**
     * Finds a family by name.
     *
     * @param name the name
     * @return the family
     * @throws UserError if there is none of that name
     */
    static Family find(String name) {
        for (Family f : ALL) {
            if (f.name().equals(name)) {
                return f;
            }
        }
        throw new UserError("unknown family '" + name + "' (families: "
            + String.join(", ", ALL.stream().map(Family::name).toArray(String[]::new)) + ")");
    }

    /**
     * The medium's specs: v, D, R, mu, and D_T (2D, 3D) and D_V (3D).
     *
     * @param positiveVelocity whether v must be &gt; 0
     * @param dimensions 1, 2 or 3
     * @return the specs, in listing order
     */
    static List<ParamSpec> transport(boolean positiveVelocity, int dimensions) {
        final ParamSpec v = ParamSpec.number("v", positiveVelocity
            ? "velocity along x, into the domain [L/T]" : "velocity along x [L/T]");
        final List<ParamSpec> specs = new ArrayList<>(List.of(
            positiveVelocity ? v.above(0) : v,
            ParamSpec.number("D", "dispersion coefficient along the flow [L^2/T]").above(0),
            ParamSpec.number("R", "retardation factor [-]").byDefault(1).atLeast(1),
            ParamSpec.number("mu", "first-order decay rate of the dissolved phase [1/T]")
                .byDefault(0).atLeast(0)));
        if (dimensions >= 2) {
            specs.add(ParamSpec.number("DT",
                "transverse dispersion coefficient, along y [L^2/T]").above(0));
        }
        if (dimensions >= 3) {
            specs.add(ParamSpec.number("DV",
                "transverse dispersion coefficient, along z [L^2/T]").above(0));
        }
        return specs;
    }

    private static ParamSpec[] inletSpecs() {
        return new ParamSpec[] {
            ParamSpec.choice("input", "inlet history g(t): C0 constant, C0 for t <= t0 "
                + "(pulse), or C0 exp(-lambda t)", "constant", "constant", "pulse",
                "exponential"),
            ParamSpec.number("C0", "inlet concentration [C]").byDefault(1),
            ParamSpec.number("t0", "pulse duration (input = pulse only) [T]").above(0)
                .optional(),
            ParamSpec.number("lambda", "rate of the exponential input (input = exponential "
                + "only; < 0 grows) [1/T]").optional(),
            ParamSpec.number("Ci", "initial concentration in the domain [C]").byDefault(0)};
    }

    /**
     * The common specs followed by the family's own.
     *
     * @param common the medium's specs
     * @param own the family's own
     * @return all of them, in listing order
     */
    static List<ParamSpec> specs(List<ParamSpec> common, ParamSpec... own) {
        final List<ParamSpec> all = new ArrayList<>(common);
        all.addAll(List.of(own));
        return all;
    }

    /**
     * Returns the inlet history an inlet family's parameters describe.
     *
     * @param p parameters of inlet-first or inlet-third
     * @return the input, with level C0
     * @throws UserError if t0 or lambda is missing for, or given without, its input kind
     */
    static InletInput input(Params p) {
        final String kind = p.word("input");
        requireOnlyWith(p, "t0", "pulse", kind);
        requireOnlyWith(p, "lambda", "exponential", kind);
        switch (kind) {
            case "pulse":
                return InletInput.pulse(p.get("C0"), p.get("t0"));
            case "exponential":
                return InletInput.exponential(p.get("C0"), p.get("lambda"));
            default:
                return InletInput.constant(p.get("C0"));
        }
    }

    private static void requireOnlyWith(Params p, String key, String kind, String given) {
        if (kind.equals(given) && !p.has(key)) {
            throw new UserError("family " + p.family().name() + ": input = " + kind
                + " needs parameter " + key);
        }
        if (!kind.equals(given) && p.has(key)) {
            throw new UserError("family " + p.family().name() + ": parameter " + key
                + " applies only to input = " + kind + " (input is " + given + ")");
        }
    }

    /**
     * The amount C·exp(−μt/R) of a released or initial amount that only decays.
     *
     * @param p the family's parameters (mu and R are read)
     * @param amount the amount C at t = 0
     * @return the budget
     */
    static Budget decaying(Params p, double amount) {
        final double rate = p.get("mu") / p.get("R");
        return t -> OptionalDouble.of(amount * Math.exp(-rate * t));
    }

    /** A closed-form amount in solution, per family. */
    @FunctionalInterface
    interface Budget {
        /**
         * Returns the amount in solution at time t.
         *
         * @param t time
         * @return the amount, or empty if it has no finite closed form
         */
        OptionalDouble mass(double t);

        /**
         * Returns the far-field level at time t.
         *
         * @param t time
         * @return the level (0 unless overridden)
         */
        default double background(double t) {
            return 0.0;
        }
    }

    /**
     * The amount that entered through a flux inlet: the total flux at x = 0 is v·g(t), so the
     * amount in both phases, m = R ∫(c − Cᵢe^{−μt/R}) dx, obeys dm/dt = v(g − Cᵢe^{−μt/R})
     * − (μ/R)·m and
     * <pre>
     * ∫(c − Cᵢe^{−μt/R}) dx = (v/R) [∫₀ᵗ g(s) e^{−μ(t−s)/R} ds − Cᵢ t e^{−μt/R}]
     * </pre>
     * (a balance over the half-line; the integral has closed forms for the three inputs).
     */
    private static final class InletBudget implements Budget {
        private final double v;
        private final double r;
        private final double m;
        private final double ci;
        private final InletInput input;

        InletBudget(Params p) {
            this.v = p.get("v");
            this.r = p.get("R");
            this.m = p.get("mu") / p.get("R");
            this.ci = p.get("Ci");
            this.input = input(p);
        }

        @Override
        public OptionalDouble mass(double t) {
            final double c0 = input.level();
            final double entered;
            switch (input.kind()) {
                case PULSE: {
                    final double on = Math.min(t, input.duration());
                    entered = c0 * Math.exp(-m * (t - on)) * relaxed(m, on);
                    break;
                }
                case EXPONENTIAL: {
                    // ∫₀ᵗ e^{−λs} e^{−m(t−s)} ds = e^{−mt} ∫₀ᵗ e^{(m−λ)s} ds
                    entered = c0 * Math.exp(-m * t) * grown(m - input.rate(), t);
                    break;
                }
                default:
                    entered = c0 * relaxed(m, t);
                    break;
            }
            final double mass = v / r * (entered - ci * t * Math.exp(-m * t));
            return Double.isFinite(mass) ? OptionalDouble.of(mass) : OptionalDouble.empty();
        }

        @Override
        public double background(double t) {
            return ci * Math.exp(-m * t);
        }

        /** ∫₀ᵗ e^{−m(t−s)} ds = (1 − e^{−mt})/m, t when m = 0. */
        private static double relaxed(double m, double t) {
            return m == 0 ? t : -Math.expm1(-m * t) / m;
        }

        /** ∫₀ᵗ e^{ks} ds = (e^{kt} − 1)/k, t when k = 0. */
        private static double grown(double k, double t) {
            return k == 0 ? t : Math.expm1(k * t) / k;
        }
    }

    /**
     * Wraps a one-dimensional solution as a field.
     *
     * @param s the solution
     * @param budget its closed-form amount in solution, or null for none
     * @return the field
     */
    static Field line(Solution1D s, Budget budget) {
        return new LineField(s, budget);
    }

    /** A one-dimensional solution as a field. */
    private static final class LineField implements Field {
        private final Solution1D solution;
        private final Budget budget;

        LineField(Solution1D solution, Budget budget) {
            this.solution = solution;
            this.budget = budget;
        }

        @Override
        public int dimensions() {
            return 1;
        }

        @Override
        public double minX() {
            return solution.domain() == Domain.HALF_LINE ? 0.0 : Double.NEGATIVE_INFINITY;
        }

        @Override
        public double value(double x, double y, double z, double t) {
            return solution.value(x, t);
        }

        @Override
        public void gradient(double x, double y, double z, double t, double[] out) {
            out[0] = solution.gradient(x, t);
        }

        @Override
        public void flux(double x, double y, double z, double t, double[] out) {
            out[0] = solution.flux(x, t);
        }

        @Override
        public double background(double t) {
            return budget == null ? 0.0 : budget.background(t);
        }

        @Override
        public Optional<Solution1D> line() {
            return Optional.of(solution);
        }

        @Override
        public OptionalDouble mass(double t) {
            return budget == null ? OptionalDouble.empty() : budget.mass(t);
        }
    }

    private static Field release1d(Params p) {
        final TransportParameters tp = p.transport();
        final FreeSpaceKernel1D k = FreeSpaceKernel1D.of(tp, p.get("x0"));
        final double amount = p.get("M");
        final Budget budget = decaying(p, amount);
        return new Field() {
            @Override
            public int dimensions() {
                return 1;
            }

            @Override
            public double minX() {
                return Double.NEGATIVE_INFINITY;
            }

            @Override
            public double value(double x, double y, double z, double t) {
                return amount * k.value(x, t);
            }

            @Override
            public void gradient(double x, double y, double z, double t, double[] out) {
                out[0] = amount * k.gradient(x, t);
            }

            @Override
            public void flux(double x, double y, double z, double t, double[] out) {
                out[0] = amount * k.flux(x, t);
            }

            @Override
            public OptionalDouble mass(double t) {
                return budget.mass(t);
            }
        };
    }

    private static Field release2d(Params p) {
        final FreeSpaceKernel2D k = FreeSpaceKernel2D.of(p.transport(), p.get("x0"), p.get("y0"));
        final double amount = p.get("M");
        final Budget budget = decaying(p, amount);
        return new Field() {
            @Override
            public int dimensions() {
                return 2;
            }

            @Override
            public double minX() {
                return Double.NEGATIVE_INFINITY;
            }

            @Override
            public double value(double x, double y, double z, double t) {
                return amount * k.value(x, y, t);
            }

            @Override
            public void gradient(double x, double y, double z, double t, double[] out) {
                out[0] = amount * k.gradientX(x, y, t);
                out[1] = amount * k.gradientY(x, y, t);
            }

            @Override
            public void flux(double x, double y, double z, double t, double[] out) {
                out[0] = amount * k.fluxX(x, y, t);
                out[1] = amount * k.fluxY(x, y, t);
            }

            @Override
            public OptionalDouble mass(double t) {
                return budget.mass(t);
            }
        };
    }

    private static Field release3d(Params p) {
        final FreeSpaceKernel3D k = FreeSpaceKernel3D.of(p.transport(), p.get("x0"), p.get("y0"),
            p.get("z0"));
        final double amount = p.get("M");
        final Budget budget = decaying(p, amount);
        return new Field() {
            @Override
            public int dimensions() {
                return 3;
            }

            @Override
            public double minX() {
                return Double.NEGATIVE_INFINITY;
            }

            @Override
            public double value(double x, double y, double z, double t) {
                return amount * k.value(x, y, z, t);
            }

            @Override
            public void gradient(double x, double y, double z, double t, double[] out) {
                out[0] = amount * k.gradientX(x, y, z, t);
                out[1] = amount * k.gradientY(x, y, z, t);
                out[2] = amount * k.gradientZ(x, y, z, t);
            }

            @Override
            public void flux(double x, double y, double z, double t, double[] out) {
                out[0] = amount * k.fluxX(x, y, z, t);
                out[1] = amount * k.fluxY(x, y, z, t);
                out[2] = amount * k.fluxZ(x, y, z, t);
            }

            @Override
            public OptionalDouble mass(double t) {
                return budget.mass(t);
            }
        };
    }
}
