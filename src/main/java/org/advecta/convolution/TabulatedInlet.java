package org.advecta.convolution;

import java.util.Locale;
import java.util.function.DoubleBinaryOperator;
import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.InletRamp;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * A clean half-line x ≥ 0 fed at x = 0 with a logged inlet concentration series: piecewise
 * constant ({@link #of}: g(t) = gₖ on (tₖ, tₖ₊₁], t₀ = 0, the last level held after the last
 * time; exact superposition (Duhamel) of the constant-input closed forms) or piecewise
 * linear ({@link #linear}: exact superposition of the closed-form ramp responses of
 * {@link InletRamp}). Immutable and thread-safe.
 *
 * <pre>
 * c(x, t) = Σ_{k: tₖ &lt; t} (gₖ − gₖ₋₁) · U(x, t − tₖ),   g₋₁ = 0
 * </pre>
 * where U is the unit constant-input solution: Ogata–Banks / van Genuchten–Alves for the
 * first type ({@link FirstTypeInlet}), Lindstrom et al. / van Genuchten–Alves for the third
 * type ({@link ThirdTypeInlet}). Superposition holds because the equation and the inlet
 * condition are linear and time-invariant (Duhamel's principle; Carslaw &amp; Jaeger 1959,
 * §1.14).
 *
 * <p><b>Accuracy.</b> Each U is within its class's max(16, 2κ) ULP; the sum is within
 * (n + 16 + 2κ)·2⁻⁵³·Σ|gₖ − gₖ₋₁|·U (n the number of levels) of the exact solution of the
 * tabulated (step) input. A constant table reproduces the closed form exactly (one term).
 *
 * <p><b>Cost.</b> One closed-form evaluation per level switched on before t.
 */
public final class TabulatedInlet implements Solution1D {

    private final TransportParameters parameters;
    private final InletCondition condition;
    private final double[] times;
    private final double[] jumps;
    /** Changes of slope at each time (piecewise-linear series), null for steps. */
    private final double[] kinks;
    private final Solution1D unit;
    /** The ramp response (piecewise-linear series), null for steps. */
    private final InletRamp ramp;

    private TabulatedInlet(TransportParameters parameters, InletCondition condition,
                           double[] times, double[] levels, boolean linear) {
        if (parameters == null) {
            throw new IllegalArgumentException("parameters: must not be null");
        }
        if (condition == null) {
            throw new IllegalArgumentException("condition: must not be null");
        }
        Checks.length("times", times, 1);
        Checks.length("levels", levels, times.length);
        if (levels.length != times.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "levels: needs exactly %d elements (one per time), got %d", times.length,
                levels.length));
        }
        if (times[0] != 0) {
            throw Checks.fail("times[0]", times[0], "must be 0");
        }
        this.times = times.clone();
        this.jumps = new double[levels.length];
        double previous = 0;
        for (int k = 0; k < times.length; k++) {
            Checks.finite("levels[" + k + "]", levels[k]);
            if (k > 0 && !(times[k] > times[k - 1] && times[k] < Double.POSITIVE_INFINITY)) {
                throw Checks.fail("times[" + k + "]", times[k],
                    "must be finite and > times[" + (k - 1) + "] = " + times[k - 1]);
            }
            jumps[k] = levels[k] - previous;
            previous = levels[k];
        }
        if (linear) {
            // g(t) = g₀ + Σₖ (sₖ − sₖ₋₁)(t − tₖ)₊, sₖ the slope on (tₖ, tₖ₊₁], 0 after the last
            this.kinks = new double[levels.length];
            double slopeBefore = 0;
            for (int k = 0; k < levels.length; k++) {
                final double slope = k + 1 < levels.length
                    ? (levels[k + 1] - levels[k]) / (times[k + 1] - times[k]) : 0.0;
                kinks[k] = slope - slopeBefore;
                slopeBefore = slope;
                if (k > 0) {
                    jumps[k] = 0.0;
                }
            }
        } else {
            this.kinks = null;
        }
        this.parameters = parameters;
        this.condition = condition;
        this.unit = condition == InletCondition.FIRST_TYPE
            ? FirstTypeInlet.of(parameters, InletInput.constant(1.0))
            : ThirdTypeInlet.of(parameters, InletInput.constant(1.0));
        this.ramp = !linear ? null : condition == InletCondition.FIRST_TYPE
            ? InletRamp.firstType(parameters) : InletRamp.thirdType(parameters);
    }

    /**
     * Returns the solution for the series.
     *
     * @param parameters v, D, R, μ (v &gt; 0 for the third type)
     * @param condition the inlet condition
     * @param times switching times t₀ = 0 &lt; t₁ &lt; …, finite; not modified (copied)
     * @param levels gₖ, finite, one per time; not modified (copied)
     * @return the solution
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static TabulatedInlet of(TransportParameters parameters, InletCondition condition,
                                    double[] times, double[] levels) {
        return new TabulatedInlet(parameters, condition, times, levels, false);
    }

    /**
     * Returns the solution for a series interpolated linearly between its points: g(t)
     * linear from (tₖ, gₖ) to (tₖ₊₁, gₖ₊₁), g₀ from t = 0⁺, the last level held after the
     * last time.
     *
     * <pre>
     * c(x, t) = g₀·U(x, t) + Σ_{k: tₖ &lt; t} (sₖ − sₖ₋₁)·W(x, t − tₖ),   s₋₁ = 0
     * </pre>
     * with sₖ the slope after tₖ (0 after the last time), U the unit step response and W the
     * ramp response (the response to g(t) = t, i.e. ∫₀^τ U(x, s) ds; Duhamel), both in
     * closed form: W is {@link InletRamp} (both inlet types, every μ ≥ 0).
     *
     * <p><b>Accuracy.</b> Each term is within its class's contract (max(16, 2κ) ULP for the
     * closed forms); the sum is within about (n + 16 + 2κ)·2⁻⁵³·(|g₀|·U + Σ|sₖ − sₖ₋₁|·W(x, t − tₖ))
     * of the exact solution for the interpolated input (n the number of points). The bound is
     * absolute: the ramps of a long series largely cancel (a plateau is two ramps of opposite
     * slope), so where c is much smaller than the terms its relative error is correspondingly
     * larger.
     *
     * @param parameters v, D, R, μ (v &gt; 0 for the third type)
     * @param condition the inlet condition
     * @param times t₀ = 0 &lt; t₁ &lt; …, finite; not modified (copied)
     * @param levels gₖ, finite; not modified (copied)
     * @return the solution
     * @throws IllegalArgumentException if an argument is invalid
     */
    public static TabulatedInlet linear(TransportParameters parameters, InletCondition condition,
                                        double[] times, double[] levels) {
        return new TabulatedInlet(parameters, condition, times, levels, true);
    }

    /**
     * Returns the inlet condition.
     *
     * @return the condition
     */
    public InletCondition condition() {
        return condition;
    }

    @Override
    public TransportParameters parameters() {
        return parameters;
    }

    @Override
    public Domain domain() {
        return Domain.HALF_LINE;
    }

    /**
     * Returns c(x, t): the sum of the closed-form step (and, for a linear series, ramp)
     * responses.
     *
     * @param x position, finite and ≥ 0
     * @param t time, finite and ≥ 0
     * @return c(x, t)
     * @throws IllegalArgumentException if x or t is invalid
     */
    @Override
    public double value(double x, double t) {
        final double steps = stepValue(x, t);
        if (kinks == null || t == 0) {
            return steps;
        }
        return superpose(steps, kinks, ramp::value, x, t);
    }

    /**
     * start + Σ_{k: tₖ &lt; t} wₖ·f(x, t − tₖ) over the non-zero weights, with Neumaier's
     * compensation (Duhamel's sum of shifted responses).
     */
    private double superpose(double start, double[] weights, DoubleBinaryOperator f, double x,
                             double t) {
        double sum = start;
        double comp = 0;
        for (int k = 0; k < times.length && times[k] < t; k++) {
            if (weights[k] != 0) {
                final double term = weights[k] * f.applyAsDouble(x, t - times[k]);
                final double s = sum + term;
                comp += Math.abs(sum) >= Math.abs(term) ? (sum - s) + term : (term - s) + sum;
                sum = s;
            }
        }
        return sum + comp;
    }

    private double stepValue(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
        final double sum = superpose(0, jumps, unit::value, x, t);
        if (t == 0 && x == 0 && condition == InletCondition.FIRST_TYPE) {
            // the inlet holds g(0⁺) from the start, as the constant-input classes do
            return jumps[0] * unit.value(0, 0);
        }
        return sum;
    }

    /**
     * Returns ∂c/∂x (step series only).
     *
     * @param x position, finite and ≥ 0
     * @param t time, finite and ≥ 0
     * @return ∂c/∂x
     * @throws IllegalArgumentException if x or t is invalid
     * @throws UnsupportedOperationException for a linear series (not implemented)
     */
    @Override
    public double gradient(double x, double t) {
        if (kinks != null) {
            throw new UnsupportedOperationException(
                "gradient of a linearly interpolated series is not implemented");
        }
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
        final double sum = superpose(0, jumps, unit::gradient, x, t);
        if (t == 0) {
            return jumps[0] * unit.gradient(x, 0);
        }
        return sum;
    }
}
