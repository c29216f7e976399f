/**
 * Solutions next to a plane wall by the method of images: an absorbing wall (c = 0) or a
 * zero-flux wall (no solute crosses it), in one, two and three dimensions.
 *
 * <p>Supported (one wall at a time):
 * <ul>
 *   <li>1D, wall x = 0 across the flow (v of either sign), instantaneous release at ξ &gt; 0:
 *       {@link org.advecta.halfspace.HalfSpaceKernel1D}, with value, gradient, total flux,
 *       wall flux, mass out through the wall and mass in the domain;</li>
 *   <li>1D, same wall, initial step C₀ on x &gt; a and box C₀ on a &lt; x &lt; b:
 *       {@link org.advecta.halfspace.HalfLineStep}, {@link org.advecta.halfspace.HalfLineSlug}
 *       ({@link org.advecta.solution.Solution1D} on the
 *       {@link org.advecta.solution.Domain#HALF_LINE});</li>
 *   <li>2D and 3D, instantaneous point release, wall x = 0 across the flow (the 1D half-line
 *       kernel times free transverse Gaussians) or y = 0 / z = 0 parallel to the flow (the
 *       free drifting kernel along x times the mirrored transverse factor):
 *       {@link org.advecta.halfspace.HalfSpaceKernel2D},
 *       {@link org.advecta.halfspace.HalfSpaceKernel3D}.</li>
 * </ul>
 *
 * <p>Not provided: two or more walls (corners, layers of finite thickness), step or box data
 * in 2D/3D, walls oblique to the flow. The derivations are in the class descriptions (the key
 * step: after c = exp(vx/(2D) − v²t/(4DR) − μt/R)·w the walls become Dirichlet and radiation
 * conditions for the heat equation, whose image solutions are in Carslaw &amp; Jaeger 1959).
 */
package org.advecta.halfspace;
