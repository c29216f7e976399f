package org.advecta.halfspace;

/**
 * The coordinate axis normal to the wall; the wall is the plane where that coordinate is 0.
 * The flow is along x, so {@link #X} is a wall across the flow and {@link #Y}, {@link #Z}
 * are walls parallel to it.
 */
public enum WallAxis {
    /** The wall x = 0, normal to the flow (an inlet face, a channel bed across the flow). */
    X,
    /** The wall y = 0, parallel to the flow (a side wall). */
    Y,
    /** The wall z = 0, parallel to the flow (a ground surface or an aquifer base). */
    Z
}
