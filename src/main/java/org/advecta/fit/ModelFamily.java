package org.advecta.fit;

import org.advecta.internal.Checks;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialGaussian;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * A family of exact solutions with everything fixed except the transport parameters and the
 * source strength: the model a {@link TransportModel} fits. Immutable and thread-safe.
 *
 * <p>The source is the inlet level C₀ for the inlet families, C₀ for a step or slug, and the
 * mass M for a Gaussian plume. The factories also record what the automatic starting guess
 * (from moments) needs; a {@link #custom(Builder)} family has none, so its free parameters
 * need starting values.
 */
public final class ModelFamily {

    /** Builds a solution from transport parameters and a source strength. */
    @FunctionalInterface
    public interface Builder {
        /**
         * Returns the solution.
         *
         * @param parameters v, D, R, μ
         * @param source the source strength
         * @return the solution
         * @throws IllegalArgumentException if the parameters are invalid for the family
         */
        Solution1D create(TransportParameters parameters, double source);
    }

    /** How a curve of the family is shaped, for the moment-based starting guess. */
    enum Shape {
        /** Inlet, pulse input of duration {@link #duration}. */
        INLET_PULSE,
        /** Inlet, constant input (a front). */
        INLET_CONSTANT,
        /** Inlet, exponential input of rate {@link #rate}. */
        INLET_EXPONENTIAL,
        /** Plume of finite mass centred at {@link #origin} with initial variance. */
        PLUME,
        /** Front started at {@link #origin}. */
        STEP,
        /** Unknown: no automatic starting guess. */
        CUSTOM
    }

    private final Builder builder;
    private final Shape shape;
    private final boolean thirdType;
    private final double duration;
    private final double rate;
    private final double origin;
    private final double initialVariance;

    private ModelFamily(Builder builder, Shape shape, boolean thirdType, double duration,
                        double rate, double origin, double initialVariance) {
        this.builder = builder;
        this.shape = shape;
        this.thirdType = thirdType;
        this.duration = duration;
        this.rate = rate;
        this.origin = origin;
        this.initialVariance = initialVariance;
    }

    /**
     * A first-type (prescribed concentration) inlet on a clean half-line,
     * {@link FirstTypeInlet}, with the input history of the given shape; its level C₀ is the
     * source.
     *
     * @param input the input's shape (its level is replaced by the source)
     * @return the family
     * @throws IllegalArgumentException if input is null
     */
    public static ModelFamily firstTypeInlet(InletInput input) {
        return inlet(input, false);
    }

    /**
     * A third-type (flux) inlet on a clean half-line, {@link ThirdTypeInlet}, with the input
     * history of the given shape; its level C₀ is the source.
     *
     * @param input the input's shape (its level is replaced by the source)
     * @return the family
     * @throws IllegalArgumentException if input is null
     */
    public static ModelFamily thirdTypeInlet(InletInput input) {
        return inlet(input, true);
    }

    private static ModelFamily inlet(InletInput input, boolean third) {
        if (input == null) {
            throw new IllegalArgumentException("input: must not be null");
        }
        final Builder b;
        final Shape shape;
        switch (input.kind()) {
            case PULSE: {
                final double t0 = input.duration();
                b = (p, s) -> third ? ThirdTypeInlet.of(p, InletInput.pulse(s, t0))
                    : FirstTypeInlet.of(p, InletInput.pulse(s, t0));
                shape = Shape.INLET_PULSE;
                break;
            }
            case EXPONENTIAL: {
                final double lambda = input.rate();
                b = (p, s) -> third ? ThirdTypeInlet.of(p, InletInput.exponential(s, lambda))
                    : FirstTypeInlet.of(p, InletInput.exponential(s, lambda));
                shape = Shape.INLET_EXPONENTIAL;
                break;
            }
            default:
                b = (p, s) -> third ? ThirdTypeInlet.of(p, InletInput.constant(s))
                    : FirstTypeInlet.of(p, InletInput.constant(s));
                shape = Shape.INLET_CONSTANT;
        }
        return new ModelFamily(b, shape, third, input.duration(), input.rate(), 0.0, 0.0);
    }

    /**
     * A Gaussian plume, {@link InitialGaussian}, with fixed initial centre and width; the
     * mass is the source.
     *
     * @param centre x_c, finite
     * @param width s₀, finite and &gt; 0
     * @return the family
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static ModelFamily gaussian(double centre, double width) {
        Checks.finite("centre", centre);
        Checks.positive("width", width);
        return new ModelFamily((p, s) -> InitialGaussian.of(p, centre, width, s), Shape.PLUME,
            false, 0, 0, centre, width * width);
    }

    /**
     * A slug on (a, b), {@link InitialSlug}; its concentration C₀ is the source.
     *
     * @param a left end, finite
     * @param b right end, finite and &gt; a
     * @return the family
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static ModelFamily slug(double a, double b) {
        Checks.finite("a", a);
        Checks.finite("b", b);
        if (!(b > a)) {
            throw Checks.fail("b", b, "must be > a = " + a);
        }
        return new ModelFamily((p, s) -> InitialSlug.of(p, a, b, s), Shape.PLUME, false, 0, 0,
            0.5 * a + 0.5 * b, (b - a) * (b - a) / 12);
    }

    /**
     * A step at x₀, {@link InitialStep}, loaded on the given side; its concentration C₀ is
     * the source.
     *
     * @param x0 the step's position, finite
     * @param side the loaded side
     * @return the family
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static ModelFamily step(double x0, InitialStep.Side side) {
        Checks.finite("x0", x0);
        if (side == null) {
            throw new IllegalArgumentException("side: must not be null");
        }
        return new ModelFamily((p, s) -> InitialStep.of(p, x0, s, side), Shape.STEP, false, 0,
            0, x0, 0);
    }

    /**
     * Any family, built by the caller; fits of it need starting values for every free
     * parameter.
     *
     * @param builder builds a solution from (v, D, R, μ) and the source
     * @return the family
     * @throws IllegalArgumentException if builder is null
     */
    public static ModelFamily custom(Builder builder) {
        if (builder == null) {
            throw new IllegalArgumentException("builder: must not be null");
        }
        return new ModelFamily(builder, Shape.CUSTOM, false, 0, 0, 0, 0);
    }

    /**
     * Returns the family's solution for the given parameters and source.
     *
     * @param parameters v, D, R, μ
     * @param source the source strength
     * @return the solution
     * @throws IllegalArgumentException if the parameters are invalid for the family
     */
    public Solution1D create(TransportParameters parameters, double source) {
        return builder.create(parameters, source);
    }

    Shape shape() {
        return shape;
    }

    boolean isThirdType() {
        return thirdType;
    }

    double duration() {
        return duration;
    }

    double rate() {
        return rate;
    }

    double origin() {
        return origin;
    }

    double initialVariance() {
        return initialVariance;
    }
}
