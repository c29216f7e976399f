/**
 * Fitting transport parameters to measured concentrations: breakthrough curves c(t) at one or
 * more positions or profiles c(x) at one or more times, for any solution family
 * ({@link org.advecta.fit.ModelFamily}), with any subset of v, D, R, μ and the source strength
 * free ({@link org.advecta.fit.TransportModel}), by weighted least squares with the
 * Levenberg–Marquardt method ({@link org.advecta.fit.ParameterFit}). Results carry estimates,
 * standard errors, 95 % confidence intervals, the correlation matrix, residuals and R², or a
 * failure status ({@link org.advecta.fit.FitResult}, {@link org.advecta.fit.FitStatus}).
 *
 * <p><b>Optional dependency.</b> This package needs
 * {@code org.apache.commons:commons-math3:3.6.1} at run time (the optimiser and Student's t
 * distribution). advecta declares it optional, so it is not inherited: add it to your own
 * build to fit parameters. On the module path it is the automatic module
 * {@code commons.math3} and must be resolved (require it from your module, or pass
 * {@code --add-modules commons.math3}). Without it
 * {@link org.advecta.fit.ParameterFit#fit(TransportModel, Observations)} throws an
 * {@link java.lang.IllegalStateException} naming the artifact; nothing else in advecta needs
 * it.
 *
 * <pre>{@code
 * Observations data = Observations.breakthrough(0.5, times, concentrations);
 * TransportModel model = TransportModel.of(
 *         ModelFamily.thirdTypeInlet(InletInput.pulse(1.0, 0.25)), Observable.FLUX_AVERAGED)
 *     .withFree(Parameter.VELOCITY, Parameter.DISPERSION);   // R = 1, μ = 0, C₀ = 1 fixed
 * FitResult fit = ParameterFit.fit(model, data);             // starting guess from moments
 * if (fit.isConverged()) {
 *     double v = fit.value(Parameter.VELOCITY);
 *     double[] ci = {fit.lower95(Parameter.VELOCITY), fit.upper95(Parameter.VELOCITY)};
 * }
 * }</pre>
 */
package org.advecta.fit;
