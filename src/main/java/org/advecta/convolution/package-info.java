/**
 * Exact solutions for the user's own data: initial data convolved with the drifting Green's
 * function, and inlet histories superposed in time (Duhamel).
 *
 * <p>Three input routes for initial data on the infinite line:
 * <ol>
 *   <li>{@link org.advecta.convolution.FunctionConvolution}: φ(ξ) as a function, with
 *       optional support and breakpoints; adaptive Gauss–Kronrod quadrature around the
 *       moving centre, returning an {@link org.advecta.quadrature.Estimate} (value and
 *       error estimate); for data declared smooth
 *       ({@link org.advecta.convolution.FunctionConvolution#withSmoothData()}) Gauss–Hermite
 *       rules of doubling order first;</li>
 *   <li>{@link org.advecta.convolution.ProfileConvolution} of a
 *       {@link org.advecta.convolution.PiecewiseLinearProfile}: samples on any grid (or cell
 *       averages), each segment integrated in closed form, exact for the interpolant;</li>
 *   <li>{@link org.advecta.convolution.ProfileConvolution#valuesOnGrid}: uniform samples
 *       onto a whole uniform output grid as one discrete convolution (window or FFT), with a
 *       returned error bound.</li>
 * </ol>
 * Time-varying inlets on the half-line: {@link org.advecta.convolution.TabulatedInlet}
 * (piecewise-constant or piecewise-linear series, exact superposition of the closed-form
 * step and ramp responses) and
 * {@link org.advecta.convolution.FunctionInlet} (g(t) as a function, by quadrature of the
 * impulse response, with an error estimate).
 *
 * <p>The kernel is pluggable ({@link org.advecta.convolution.ConvolutionKernel}):
 * {@link org.advecta.convolution.HalfLineKernel} is the half-line x ≥ 0 with an absorbing or
 * zero-flux wall at x = 0 (free kernel plus images, closed-form segment integrals), and
 * routes 1 and 2 work on it unchanged; route 3 (the uniform grid) takes the free part as
 * on the line and adds the wall terms as weights of the offset between output and node.
 */
package org.advecta.convolution;
