package org.advecta.verify;

import org.advecta.internal.Checks;
import org.advecta.solution.Domain;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;

/**
 * An exact solution started at a later time: c̃(x, t) = c(x, t + t₀). Since the equation
 * {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c} has coefficients independent of t, c̃ solves it
 * exactly, with initial data c(x, t₀) and (on the half-line) inlet data g(t + t₀).
 *
 * <p>Use it for order-of-accuracy studies of families whose initial data is discontinuous (a
 * step, a slug, an inlet switched on at t = 0): the jump has an infinite gradient, so a
 * discretisation started from it converges at a reduced order for reasons that have nothing
 * to do with the scheme. Started at t₀ &gt; 0 the same family is smooth (analytic in x), its
 * spread length √(4Dt₀/R) setting the grid spacing at which the asymptotic range begins.
 *
 * <p>Every method validates its arguments as {@link Solution1D} requires (t ≥ 0 refers to the
 * shifted time) and returns the wrapped solution's result at time t + t₀, where t + t₀ is
 * rounded once to double. Immutable and thread-safe if the wrapped solution is.
 */
public final class TimeShiftedSolution implements Solution1D {

    private final Solution1D original;
    private final double shift;

    private TimeShiftedSolution(Solution1D original, double shift) {
        this.original = original;
        this.shift = shift;
    }

    /**
     * Returns the solution c(x, t + t₀).
     *
     * @param solution the exact solution c
     * @param t0 the start time t₀ of the original solution, finite and ≥ 0
     * @return the shifted solution
     * @throws IllegalArgumentException if the solution is null or t₀ is not finite and ≥ 0
     */
    public static TimeShiftedSolution of(Solution1D solution, double t0) {
        if (solution == null) {
            throw new IllegalArgumentException("solution: must not be null");
        }
        Checks.nonNegative("t0", t0);
        return new TimeShiftedSolution(solution, t0);
    }

    /**
     * Returns the wrapped solution c.
     *
     * @return c
     */
    public Solution1D original() {
        return original;
    }

    /**
     * Returns the start time t₀.
     *
     * @return t₀
     */
    public double shift() {
        return shift;
    }

    @Override
    public TransportParameters parameters() {
        return original.parameters();
    }

    @Override
    public Domain domain() {
        return original.domain();
    }

    @Override
    public double value(double x, double t) {
        return original.value(x, shifted(t));
    }

    @Override
    public double gradient(double x, double t) {
        return original.gradient(x, shifted(t));
    }

    @Override
    public double flux(double x, double t) {
        return original.flux(x, shifted(t));
    }

    @Override
    public double fluxAveraged(double x, double t) {
        return original.fluxAveraged(x, shifted(t));
    }

    private double shifted(double t) {
        Checks.nonNegative("t", t);
        return t + shift;
    }

    @Override
    public String toString() {
        return "TimeShiftedSolution[" + original + ", t0=" + shift + "]";
    }
}
