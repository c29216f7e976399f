package org.advecta.solution;

import org.advecta.internal.Spread;

/**
 * The response R(x, t) of an inlet problem to a unit constant input switched on at t = 0 into
 * a clean half-line, for one decay coefficient μ_e, with the pieces that the input shapes and
 * the initial concentration need. Implementations hold precomputed constants only.
 */
interface UnitResponse {

    /** Returns exp(shift)·R(x, t), with the shift folded into the exponent. */
    double value(double x, double t, double shift);

    /**
     * Returns exp(shift)·R(x, t) given il = 1/L = √(R/(4Dt)) as {@link Spread#inverseLength}
     * forms it (computed once for a profile; a plain double, so that nothing is allocated per
     * point whatever the JIT inlines).
     */
    double value(double x, double t, double shift, double il);

    /** Returns exp(shift)·∂R/∂x. */
    double gradient(double x, double t, double shift);

    /**
     * Returns true only if R(x, t) &gt; R(x, ∞)/2 is certain without evaluating R (false means
     * "unknown"): a pulse then takes the difference of complements at once.
     */
    default boolean pastHalfSteady(double x, double t) {
        return false;
    }

    /** Returns R(x, ∞) (the steady state; for μ_e ≥ 0 only). */
    double steady(double x);

    /** Returns R(x, ∞) − R(x, t) ≥ 0 without cancellation (for μ_e ≥ 0 only). */
    double complement(double x, double t);

    /** Returns k = (v − u)/(2D) ≤ 0, the spatial decay rate of the steady state. */
    double steadyRate();

    /**
     * Returns ∂/∂x [R(x, ∞) − R(x, t)] (for μ_e ≥ 0), so that the gradient of a pulse after
     * the front has passed, R_x(t) − R_x(t − t₀), is a difference of two such terms of
     * different size instead of two nearly equal gradients.
     */
    double complementGradient(double x, double t);

    /** Returns ∂R/∂t, the response to a unit impulse of input at t = 0. */
    double density(double x, double t);

    /** Returns ∂²R/∂x∂t. */
    double densityGradient(double x, double t);

    /**
     * Returns ∂R/∂t − (D/v)·∂²R/∂x∂t, the flux-averaged response to a unit impulse of input,
     * in a form without the cancellation of that difference where it can be avoided.
     */
    double fluxAveragedDensity(double x, double t);

    /**
     * Returns 1 − R₀(x, t), R₀ the response without decay: the fraction of a uniform initial
     * concentration still present (before decay) when the inlet holds zero.
     */
    double flush(double x, double t);

    /** Returns −∂R₀/∂x. */
    double flushGradient(double x, double t);
}
