package org.advecta.convolution;

import java.util.Locale;
import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.solution.FirstTypeInlet;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.solution.ThirdTypeInlet;
import org.advecta.transport.TransportParameters;

/**
 * A clean half-line x ≥ 0 fed at x = 0 with a logged, piecewise-constant inlet concentration
 * series: g(t) = gₖ on (tₖ, tₖ₊₁], t₀ = 0, the last level held after the last time. Exact
 * superposition (Duhamel) of the constant-input closed forms. Immutable and thread-safe.
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
    private final Solution1D unit;

    private TabulatedInlet(TransportParameters parameters, InletCondition condition,
                           double[] times, double[] levels) {
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
        this.parameters = parameters;
        this.condition = condition;
        this.unit = condition == InletCondition.FIRST_TYPE
            ? FirstTypeInlet.of(parameters, InletInput.constant(1.0))
            : ThirdTypeInlet.of(parameters, InletInput.constant(1.0));
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
        return new TabulatedInlet(parameters, condition, times, levels);
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

    @Override
    public double value(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
        double sum = 0;
        double comp = 0;
        for (int k = 0; k < times.length && times[k] < t; k++) {
            if (jumps[k] != 0) {
                final double term = jumps[k] * unit.value(x, t - times[k]);
                final double s = sum + term;
                comp += Math.abs(sum) >= Math.abs(term) ? (sum - s) + term : (term - s) + sum;
                sum = s;
            }
        }
        if (t == 0 && x == 0 && condition == InletCondition.FIRST_TYPE) {
            // the inlet holds g(0⁺) from the start, as the constant-input classes do
            return jumps[0] * unit.value(0, 0);
        }
        return sum + comp;
    }

    @Override
    public double gradient(double x, double t) {
        Checks.nonNegative("x", x);
        Checks.nonNegative("t", t);
        double sum = 0;
        double comp = 0;
        for (int k = 0; k < times.length && times[k] < t; k++) {
            if (jumps[k] != 0) {
                final double term = jumps[k] * unit.gradient(x, t - times[k]);
                final double s = sum + term;
                comp += Math.abs(sum) >= Math.abs(term) ? (sum - s) + term : (term - s) + sum;
                sum = s;
            }
        }
        if (t == 0) {
            return jumps[0] * unit.gradient(x, 0);
        }
        return sum + comp;
    }
}
