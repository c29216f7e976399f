package org.advecta.benchmarks;

import java.util.Locale;
import java.util.function.DoubleBinaryOperator;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InitialSlug;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * The closed-form families compared by {@link SolutionPerformance} and scanned by
 * {@link NaiveFailureScan}: for a {@link Setting}, advecta's solution ({@link #ours}) and the
 * naive formula with Commons Numbers ({@link #numbers}) and with Commons Math 3
 * ({@link #math3}), each as a function of (x, t).
 *
 * <p>Every lambda expression below is a class of its own, so a benchmark fork that times one
 * of them sees a monomorphic call site.
 */
enum SolutionFamily {

    /** First-type inlet, constant input, μ = 0 (the setting's μ is ignored). */
    FIRST_TYPE("firstType") {
        @Override
        Solution1D ours(Setting s) {
            return FirstTypeInlet.of(s.withoutDecay(), InletInput.constant(s.c0));
        }

        @Override
        DoubleBinaryOperator numbers(Setting s) {
            final double v = s.v, d = s.d, r = s.r, c0 = s.c0;
            return (x, t) -> NaiveNumbers.firstType(x, t, v, d, r, c0);
        }

        @Override
        DoubleBinaryOperator math3(Setting s) {
            final double v = s.v, d = s.d, r = s.r, c0 = s.c0;
            return (x, t) -> NaiveMath3.firstType(x, t, v, d, r, c0);
        }
    },

    /** First-type inlet, constant input, decay μ. */
    FIRST_TYPE_DECAY("firstTypeDecay") {
        @Override
        Solution1D ours(Setting s) {
            return FirstTypeInlet.of(s.withDecay(), InletInput.constant(s.c0));
        }

        @Override
        DoubleBinaryOperator numbers(Setting s) {
            final double v = s.v, d = s.d, r = s.r, mu = s.mu, c0 = s.c0;
            return (x, t) -> NaiveNumbers.firstTypeDecay(x, t, v, d, r, mu, c0);
        }

        @Override
        DoubleBinaryOperator math3(Setting s) {
            final double v = s.v, d = s.d, r = s.r, mu = s.mu, c0 = s.c0;
            return (x, t) -> NaiveMath3.firstTypeDecay(x, t, v, d, r, mu, c0);
        }
    },

    /** Third-type inlet, constant input, μ = 0 (the setting's μ is ignored). */
    THIRD_TYPE("thirdType") {
        @Override
        Solution1D ours(Setting s) {
            return ThirdTypeInlet.of(s.withoutDecay(), InletInput.constant(s.c0));
        }

        @Override
        DoubleBinaryOperator numbers(Setting s) {
            final double v = s.v, d = s.d, r = s.r, c0 = s.c0;
            return (x, t) -> NaiveNumbers.thirdType(x, t, v, d, r, c0);
        }

        @Override
        DoubleBinaryOperator math3(Setting s) {
            final double v = s.v, d = s.d, r = s.r, c0 = s.c0;
            return (x, t) -> NaiveMath3.thirdType(x, t, v, d, r, c0);
        }
    },

    /** First-type inlet, pulse of duration t₀, μ = 0 (the setting's μ is ignored). */
    PULSE("pulse") {
        @Override
        Solution1D ours(Setting s) {
            return FirstTypeInlet.of(s.withoutDecay(), InletInput.pulse(s.c0, s.t0));
        }

        @Override
        DoubleBinaryOperator numbers(Setting s) {
            final double v = s.v, d = s.d, r = s.r, c0 = s.c0, t0 = s.t0;
            return (x, t) -> NaiveNumbers.pulse(x, t, v, d, r, c0, t0);
        }

        @Override
        DoubleBinaryOperator math3(Setting s) {
            final double v = s.v, d = s.d, r = s.r, c0 = s.c0, t0 = s.t0;
            return (x, t) -> NaiveMath3.pulse(x, t, v, d, r, c0, t0);
        }
    },

    /** Initial step at x₀ on the line, loaded on the left, decay μ. */
    STEP("step") {
        @Override
        Solution1D ours(Setting s) {
            return InitialStep.of(s.withDecay(), s.x0, s.c0, InitialStep.Side.LEFT);
        }

        @Override
        DoubleBinaryOperator numbers(Setting s) {
            final double v = s.v, d = s.d, r = s.r, mu = s.mu, x0 = s.x0, c0 = s.c0;
            return (x, t) -> NaiveNumbers.step(x, t, v, d, r, mu, x0, c0);
        }

        @Override
        DoubleBinaryOperator math3(Setting s) {
            final double v = s.v, d = s.d, r = s.r, mu = s.mu, x0 = s.x0, c0 = s.c0;
            return (x, t) -> NaiveMath3.step(x, t, v, d, r, mu, x0, c0);
        }
    },

    /** Initial slug on (a, b) on the line, decay μ. */
    SLUG("slug") {
        @Override
        Solution1D ours(Setting s) {
            return InitialSlug.of(s.withDecay(), s.a, s.b, s.c0);
        }

        @Override
        DoubleBinaryOperator numbers(Setting s) {
            final double v = s.v, d = s.d, r = s.r, mu = s.mu, a = s.a, b = s.b, c0 = s.c0;
            return (x, t) -> NaiveNumbers.slug(x, t, v, d, r, mu, a, b, c0);
        }

        @Override
        DoubleBinaryOperator math3(Setting s) {
            final double v = s.v, d = s.d, r = s.r, mu = s.mu, a = s.a, b = s.b, c0 = s.c0;
            return (x, t) -> NaiveMath3.slug(x, t, v, d, r, mu, a, b, c0);
        }
    };

    /** The name used by the {@code family} parameter and in printed tables. */
    final String key;

    SolutionFamily(String key) {
        this.key = key;
    }

    /** advecta's solution for the setting. */
    abstract Solution1D ours(Setting s);

    /** The naive formula with Commons Numbers. */
    abstract DoubleBinaryOperator numbers(Setting s);

    /** The naive formula with Commons Math 3. */
    abstract DoubleBinaryOperator math3(Setting s);

    /**
     * Returns the family with the given {@link #key}.
     *
     * @throws IllegalArgumentException if there is none
     */
    static SolutionFamily of(String key) {
        for (SolutionFamily f : values()) {
            if (f.key.equals(key)) {
                return f;
            }
        }
        throw new IllegalArgumentException("family: " + key);
    }

    /**
     * Transport and source data: v, D, R, μ (used by the decaying families only), the inlet or
     * initial level c₀, the pulse duration t₀, the step position x₀ and the slug (a, b).
     */
    static final class Setting {
        final double v;
        final double d;
        final double r;
        final double mu;
        final double c0;
        final double t0;
        final double x0;
        final double a;
        final double b;

        Setting(double v, double d, double r, double mu, double c0, double t0, double x0,
                double a, double b) {
            this.v = v;
            this.d = d;
            this.r = r;
            this.mu = mu;
            this.c0 = c0;
            this.t0 = t0;
            this.x0 = x0;
            this.a = a;
            this.b = b;
        }

        TransportParameters withoutDecay() {
            return TransportParameters.of(v, d).withRetardation(r);
        }

        TransportParameters withDecay() {
            return TransportParameters.of(v, d).withRetardation(r).withDecay(mu);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT,
                "v = %s, D = %s, R = %s, mu = %s, c0 = %s, t0 = %s, x0 = %s, slug (%s, %s)",
                v, d, r, mu, c0, t0, x0, a, b);
        }
    }
}
