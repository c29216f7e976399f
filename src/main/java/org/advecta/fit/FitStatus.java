package org.advecta.fit;

/**
 * How a fit ended. Only {@link #CONVERGED} carries standard errors and intervals.
 */
public enum FitStatus {
    /** The optimiser converged and every free parameter is identifiable from the data. */
    CONVERGED,
    /** The optimiser stopped without converging (iteration or evaluation limit). */
    NOT_CONVERGED,
    /**
     * The optimiser stopped, but the data do not determine every free parameter: the
     * Jacobian is (numerically) rank-deficient, e.g. v and R both free with one curve (only
     * v/R and D/R enter), or a parameter the data are insensitive to.
     */
    NOT_IDENTIFIABLE,
    /**
     * The optimum lies on a bound (e.g. μ → 0, R → 1): the estimate is the bound and a
     * linearised interval about it would be meaningless. Detected when the parameter's whole
     * distance to its bound changes the model by less than 1e-6 of its norm, or fell below
     * e^−25 of its starting distance. Fix the parameter at the bound and fit again.
     */
    AT_BOUND,
    /** The model could not be evaluated at the starting point. */
    MODEL_FAILED
}
