package org.advecta.solution;

/** Where a one-dimensional solution is defined. */
public enum Domain {
    /** The whole line, −∞ &lt; x &lt; ∞. */
    LINE,
    /** The half-line x ≥ 0, with an inlet (or wall) at x = 0. */
    HALF_LINE
}
