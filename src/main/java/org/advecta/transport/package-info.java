/**
 * The parameters of the medium and the flow: velocity, dispersion, retardation and decay,
 * in the convention {@code R ∂c/∂t = ∇·(D ∇c) − v ∂c/∂x − μ c} with the flow along x.
 */
package org.advecta.transport;
