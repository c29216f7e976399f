/**
 * Solutions next to a plane wall by the method of images: an absorbing wall (c = 0) or a
 * zero-flux wall (no solute crosses it), in one, two and three dimensions.
 *
 * <p>See {@link org.advecta.halfspace.HalfSpaceKernel1D} for the derivation. Supported:
 * <ul>
 *   <li>1D, wall x = 0 across the flow (v of either sign): the instantaneous release
 *       ({@link org.advecta.halfspace.HalfSpaceKernel1D}) with value, gradient, total flux,
 *       wall flux, mass out through the wall and mass in the domain;</li>
 *   <li>2D and 3D, instantaneous point release, one wall: x = 0 across the flow (the 1D
 *       half-line kernel times free transverse Gaussians) or y = 0 / z = 0 parallel to the
 *       flow (free longitudinal kernel times a mirrored transverse factor)
 *       ({@link org.advecta.halfspace.HalfSpaceKernel2D},
 *       {@link org.advecta.halfspace.HalfSpaceKernel3D}).</li>
 * </ul>
 */
package org.advecta.halfspace;
