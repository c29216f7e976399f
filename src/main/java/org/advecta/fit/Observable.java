package org.advecta.fit;

/**
 * What the measured concentrations are.
 */
public enum Observable {
    /** The resident concentration c(x, t) (e.g. from a probe or a sediment core). */
    RESIDENT,
    /**
     * The flux-averaged concentration c − (D/v)·∂c/∂x (an effluent sample or a pumping well;
     * Kreft &amp; Zuber 1978).
     */
    FLUX_AVERAGED
}
