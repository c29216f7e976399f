package org.advecta.convolution;

/** The kind of inlet condition at x = 0 of the half-line x ≥ 0. */
public enum InletCondition {
    /** First type (Dirichlet): c(0, t) = g(t). */
    FIRST_TYPE,
    /** Third type (flux, Robin): v·c − D·∂c/∂x = v·g(t) at x = 0 (needs v &gt; 0). */
    THIRD_TYPE
}
