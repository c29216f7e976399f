/**
 * Closed-form solutions of {@code R ∂c/∂t = D ∂²c/∂x² − v ∂c/∂x − μ c} on the infinite line
 * (initial-value problems) and on the half-line x ≥ 0 (inlet problems), exact at any Péclet
 * number: every product of a large exponential and a small erfc is evaluated through the
 * overflow-free primitives of {@link org.advecta.special}.
 *
 * <p><b>Decay convention.</b> μ is the coefficient of −μc in the equation
 * ({@link org.advecta.transport.TransportParameters#decayRate()}); a decay acting on the
 * dissolved and sorbed phases alike with rate k enters as μ = kR
 * ({@link org.advecta.transport.TransportParameters#withDecayOnBothPhases(double)}).
 */
package org.advecta.solution;
