/**
 * Green's functions (kernels) of an instantaneous release in a uniform flow: the drifting,
 * spreading and decaying Gaussians from which every other solution of the library is built by
 * integration, images or superposition.
 */
package org.advecta.kernel;
