/**
 * Continuous sources in a uniform flow along x: plumes from a point source in three
 * dimensions ({@link org.advecta.plume.PointSource3D}), a line source in two dimensions
 * ({@link org.advecta.plume.LineSource2D}) and a rectangular patch normal to the flow
 * ({@link org.advecta.plume.PatchSource3D}), at any time and at steady state, with
 * anisotropic dispersion, retardation and first-order decay.
 *
 * <p>Every solution is the time integral of the free-space kernel
 * ({@link org.advecta.kernel.FreeSpaceKernel3D}, {@link org.advecta.kernel.FreeSpaceKernel2D})
 * over the source. Where that integral has a closed form (point source; steady line source
 * with K₀; the mass flux through a plane x = const, which reduces every source to the
 * one-dimensional one) it is evaluated with overflow-free exp·erfc products; otherwise by
 * adaptive Gauss–Kronrod quadrature in log-time, returned with an error bound
 * ({@link org.advecta.quadrature.Estimate}); so is the mass flux beside an absorbing wall,
 * whose transverse factor erf(a/√(4D_Tτ/R)) stays inside the time integral
 * ({@code massFluxEstimate}).
 *
 * <p>Common to all sources: a {@link org.advecta.plume.RateHistory} (piecewise-constant rate,
 * Duhamel's theorem) and {@link org.advecta.plume.Wall}s parallel to the flow (method of
 * images). Beside an absorbing wall the quadrature-based sources integrate the free kernel
 * minus its image as one non-negative integrand (the line source's factor −expm1(−c/τ), the
 * patch's strip minus its mirror), so that their bounds stay within 1e-10 of the result near
 * the wall; the closed forms superpose the image (accurate relative to the free term there).
 * The rate q is the source's mass rate divided by whatever converts mass into the
 * concentration's units (the porosity, for a concentration per volume of water); it is the
 * growth rate of ∫ R c dV without decay, and at steady state without decay the mass flux
 * through any plane downstream equals it.
 *
 * <p>Stretched coordinates: with y' = y√(D_L/D_T) and z' = z√(D_L/D_V), the distance
 * r = √(Δx² + Δy'² + Δz'²) and U = √(v² + 4μD_L), each solution carries the factor e^s,
 * s = (Δx v − rU)/(2D_L) ≤ 0, which is evaluated as a sum of non-negative terms (no
 * cancellation just downstream on the centreline, where Δx ≈ r).
 */
package org.advecta.plume;
