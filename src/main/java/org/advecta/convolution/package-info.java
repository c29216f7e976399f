/**
 * Exact solutions for the user's own data: initial data convolved with the drifting Green's
 * function, and inlet histories superposed in time (Duhamel).
 *
 * <p>Three input routes for initial data on the infinite line:
 * <ol>
 *   <li>{@link org.advecta.convolution.FunctionConvolution}: φ(ξ) as a function, with
 *       optional support and breakpoints; adaptive Gauss–Kronrod quadrature around the
 *       moving centre, returning an {@link org.advecta.quadrature.Estimate} (value and
 *       error estimate);</li>
 *   <li>{@link org.advecta.convolution.ProfileConvolution} of a
 *       {@link org.advecta.convolution.PiecewiseLinearProfile}: samples on any grid (or cell
 *       averages), each segment integrated in closed form, exact for the interpolant;</li>
 *   <li>{@link org.advecta.convolution.ProfileConvolution#valuesOnGrid}: uniform samples
 *       onto a whole uniform output grid as one discrete convolution (window or FFT), with a
 *       returned error bound.</li>
 * </ol>
 * Time-varying inlets on the half-line: {@link org.advecta.convolution.TabulatedInlet}
 * (piecewise-constant series, exact superposition of the constant-input closed forms) and
 * {@link org.advecta.convolution.FunctionInlet} (g(t) as a function, by quadrature of the
 * impulse response, with an error estimate).
 *
 * <p>The kernel is pluggable ({@link org.advecta.convolution.ConvolutionKernel}): a
 * half-line with a wall supplies its Green's function and segment integrals, and routes 1
 * and 2 work on it unchanged.
 */
package org.advecta.convolution;
