package org.advecta.halfspace;

/**
 * The condition a plane wall imposes on the concentration. The wall is the plane where the
 * coordinate normal to it is 0; the domain is the side where that coordinate is ≥ 0.
 */
public enum Wall {
    /**
     * The concentration is held at zero on the wall, c = 0: solute that reaches it leaves
     * the domain (a sink, a perfectly absorbing bed, a clean well-mixed reservoir).
     */
    ABSORBING,
    /**
     * No solute crosses the wall: the total normal flux vanishes there, v c − D ∂c/∂n = 0
     * (flow along the normal) or ∂c/∂n = 0 (flow parallel to the wall). With μ = 0 the mass in
     * the domain is conserved. For flow parallel to the wall this is the reflecting wall of
     * an impermeable ground surface or aquifer base.
     */
    ZERO_FLUX
}
