/**
 * Verification of numerical solutions against the library's exact ones: exact cell averages
 * ({@link org.advecta.verify.CellAverages}), error norms
 * ({@link org.advecta.verify.ErrorNorms}), observed orders of accuracy from errors on three or
 * more grids ({@link org.advecta.verify.ObservedOrder}), Roache's grid convergence index with
 * Richardson extrapolation when no exact solution is at hand
 * ({@link org.advecta.verify.GridConvergenceIndex}), and exact solutions started at t₀ &gt; 0
 * so that discontinuous initial data do not spoil an order study
 * ({@link org.advecta.verify.TimeShiftedSolution}).
 *
 * <p>A typical study: start the exact solution at t₀ &gt; 0, initialise the simulator with
 * exact cell averages, run it on four or more grids, measure
 * {@link org.advecta.verify.ErrorNorms#onCells} at the end time on each, and pass the spacings
 * and errors to {@link org.advecta.verify.ObservedOrder#of}.
 */
package org.advecta.verify;
