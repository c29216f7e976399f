package org.advecta.fit;

import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.advecta.solution.Solution1D;

/**
 * The outcome of a {@link ParameterFit}: estimates, standard errors, 95 % confidence
 * intervals, the correlation matrix, residuals and R², or a failure report. Immutable and
 * thread-safe (arrays are copied out).
 *
 * <p>Statistics of a converged fit, with n points, k free parameters, weights wᵢ, residuals
 * rᵢ = cᵢ − model(xᵢ, tᵢ) and J the n×k Jacobian of the model with respect to the free
 * parameters (in their natural units) at the optimum (Seber &amp; Wild 1989, <i>Nonlinear
 * Regression</i>, §2.1 and §5.1; Bates &amp; Watts 1988, <i>Nonlinear Regression Analysis and
 * Its Applications</i>, §2.3; section numbers recalled from memory):
 * <pre>
 * s²  = Σ wᵢrᵢ² / (n − k)
 * Cov = s²·(JᵀWJ)⁻¹,   SEⱼ = √Covⱼⱼ,   ρⱼₗ = Covⱼₗ / (SEⱼ·SEₗ)
 * 95 % interval: estimate ± t_{0.975, n−k}·SE    (Student's t quantile)
 * R²  = 1 − Σ wᵢrᵢ² / Σ wᵢ(cᵢ − c̄)²,   c̄ = Σ wᵢcᵢ / Σ wᵢ
 * </pre>
 * These are the linearised (asymptotic) intervals; they are accurate when the model is
 * nearly linear in the parameters over the interval, which the coverage test checks for a
 * typical breakthrough fit.
 */
public final class FitResult {

    private final FitStatus status;
    private final String message;
    private final TransportModel model;
    private final List<Parameter> free;
    private final double[] values;
    private final double[] standardErrors;
    private final double[] lower;
    private final double[] upper;
    private final double[][] correlation;
    private final double[] residuals;
    private final double rSquared;
    private final double residualStandardError;
    private final int evaluations;
    private final int iterations;

    FitResult(FitStatus status, String message, TransportModel model, List<Parameter> free,
              double[] values, double[] standardErrors, double[] lower, double[] upper,
              double[][] correlation, double[] residuals, double rSquared,
              double residualStandardError, int evaluations, int iterations) {
        this.status = status;
        this.message = message;
        this.model = model;
        this.free = Collections.unmodifiableList(free);
        this.values = values;
        this.standardErrors = standardErrors;
        this.lower = lower;
        this.upper = upper;
        this.correlation = correlation;
        this.residuals = residuals;
        this.rSquared = rSquared;
        this.residualStandardError = residualStandardError;
        this.evaluations = evaluations;
        this.iterations = iterations;
    }

    /**
     * Returns how the fit ended.
     *
     * @return the status
     */
    public FitStatus status() {
        return status;
    }

    /**
     * Returns true if the fit converged to identifiable estimates.
     *
     * @return status() == CONVERGED
     */
    public boolean isConverged() {
        return status == FitStatus.CONVERGED;
    }

    /**
     * Returns a human-readable account of the outcome (for a failure: what went wrong and what
     * to try).
     *
     * @return the message
     */
    public String message() {
        return message;
    }

    /**
     * Returns the free parameters, in the order of {@link #correlation()}.
     *
     * @return an unmodifiable list
     */
    public List<Parameter> freeParameters() {
        return free;
    }

    /**
     * Returns the value of a parameter: the estimate of a free one (the last point the
     * optimiser reached if the fit failed), the fixed value otherwise.
     *
     * @param parameter the parameter
     * @return its value
     */
    public double value(Parameter parameter) {
        return values[parameter.ordinal()];
    }

    /**
     * Returns the standard error of a free parameter's estimate.
     *
     * @param parameter a free parameter
     * @return SE
     * @throws IllegalStateException if the fit did not converge
     * @throws IllegalArgumentException if the parameter is not free
     */
    public double standardError(Parameter parameter) {
        return standardErrors[index(parameter)];
    }

    /**
     * Returns the lower end of the 95 % confidence interval of a free parameter.
     *
     * @param parameter a free parameter
     * @return estimate − t·SE
     * @throws IllegalStateException if the fit did not converge
     * @throws IllegalArgumentException if the parameter is not free
     */
    public double lower95(Parameter parameter) {
        return lower[index(parameter)];
    }

    /**
     * Returns the upper end of the 95 % confidence interval of a free parameter.
     *
     * @param parameter a free parameter
     * @return estimate + t·SE
     * @throws IllegalStateException if the fit did not converge
     * @throws IllegalArgumentException if the parameter is not free
     */
    public double upper95(Parameter parameter) {
        return upper[index(parameter)];
    }

    /**
     * Returns the correlation matrix of the free parameters' estimates, in the order of
     * {@link #freeParameters()}.
     *
     * @return a new k×k array
     * @throws IllegalStateException if the fit did not converge
     */
    public double[][] correlation() {
        requireConverged();
        final double[][] c = new double[correlation.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = correlation[i].clone();
        }
        return c;
    }

    /**
     * Returns the residuals cᵢ − model(xᵢ, tᵢ) (unweighted), in the order of the observations
     * (curve by curve as they were combined).
     *
     * @return a new array
     */
    public double[] residuals() {
        return residuals.clone();
    }

    /**
     * Returns the weighted coefficient of determination R².
     *
     * @return R² (≤ 1)
     */
    public double rSquared() {
        return rSquared;
    }

    /**
     * Returns s = √(Σ wᵢrᵢ²/(n − k)), the residual standard error (for unit weights, the
     * estimated standard deviation of the measurement noise).
     *
     * @return s
     */
    public double residualStandardError() {
        return residualStandardError;
    }

    /**
     * Returns the number of model evaluations of the optimiser (each evaluates the model at
     * every observation).
     *
     * @return the evaluation count
     */
    public int evaluations() {
        return evaluations;
    }

    /**
     * Returns the number of optimiser iterations.
     *
     * @return the iteration count
     */
    public int iterations() {
        return iterations;
    }

    /**
     * Returns the fitted solution (the family at the estimates).
     *
     * @return the solution
     */
    public Solution1D solution() {
        return model.solution(values);
    }

    private int index(Parameter parameter) {
        requireConverged();
        final int i = free.indexOf(parameter);
        if (i < 0) {
            throw new IllegalArgumentException("parameter: " + parameter + " is not free");
        }
        return i;
    }

    private void requireConverged() {
        if (status != FitStatus.CONVERGED) {
            throw new IllegalStateException("the fit did not converge (" + status + "): "
                + message);
        }
    }

    @Override
    public String toString() {
        final StringBuilder b = new StringBuilder("FitResult[").append(status);
        for (Parameter p : free) {
            b.append(", ").append(p.symbol()).append('=').append(values[p.ordinal()]);
            if (status == FitStatus.CONVERGED) {
                b.append(String.format(Locale.ROOT, " ± %.3g", standardError(p)));
            }
        }
        if (status == FitStatus.CONVERGED) {
            b.append(String.format(Locale.ROOT, ", R²=%.6f", rSquared));
        } else {
            b.append(": ").append(message);
        }
        return b.append(']').toString();
    }
}
