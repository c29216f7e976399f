package org.advecta.fit;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.ValueAndJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.Pair;
import org.advecta.solution.Solution1D;

/**
 * The optimiser and the statistics: the only class that touches commons-math3, loaded only
 * after {@link ParameterFit} has checked that it is present.
 */
final class LevenbergMarquardtFit {

    /** Central-difference step in θ (relative step in the parameter). */
    private static final double STEP = 0x1.0p-17;
    private static final int MAX_EVALUATIONS = 5000;
    private static final int MAX_ITERATIONS = 2000;
    private static final double TOLERANCE = 1e-12;
    /** Condition number of the column-scaled Jacobian beyond which a parameter is not
     * identifiable (its square, that of JᵀJ, would exhaust double precision). */
    private static final double MAX_CONDITION = 1e8;
    /** A free parameter's distance to its bound below e^−25 (≈ 1.4e-11) of its starting
     * distance counts as on the bound. */
    private static final double BOUND_DROP = 25;
    /** Relative effect on the model of a parameter's whole distance to its bound below
     * which it counts as on the bound. */
    private static final double ON_BOUND = 1e-6;
    /** Residual of a model that cannot be evaluated at a trial point: the step is rejected. */
    private static final double PENALTY = 1e100;

    private LevenbergMarquardtFit() {
    }

    /** The weighted model as a function of θ, remembering the best point seen. */
    private static final class Evaluator implements ValueAndJacobianFunction {
        final TransportModel model;
        final List<Parameter> free;
        final double[] base;
        final double[] xs;
        final double[] ts;
        final double[] sqrtW;
        final double[] target;
        double[] best;
        double bestCost = Double.POSITIVE_INFINITY;
        int evaluations;
        int jacobians;

        Evaluator(TransportModel model, List<Parameter> free, double[] base, double[] xs,
                  double[] ts, double[] sqrtW, double[] target) {
            this.model = model;
            this.free = free;
            this.base = base;
            this.xs = xs;
            this.ts = ts;
            this.sqrtW = sqrtW;
            this.target = target;
        }

        double[] parameters(double[] theta) {
            final double[] all = base.clone();
            for (int j = 0; j < theta.length; j++) {
                final Parameter p = free.get(j);
                all[p.ordinal()] = p.fromFree(theta[j]);
            }
            return all;
        }

        /** sqrt(w)·model at θ, or null if the model cannot be evaluated there. */
        double[] weightedModel(double[] theta) {
            final double[] out = new double[xs.length];
            try {
                final Solution1D s = model.solution(parameters(theta));
                for (int i = 0; i < xs.length; i++) {
                    final double m = sqrtW[i] * model.predict(s, xs[i], ts[i]);
                    if (!Double.isFinite(m)) {
                        return null;
                    }
                    out[i] = m;
                }
            } catch (IllegalArgumentException | IllegalStateException e) {
                return null;
            }
            return out;
        }

        @Override
        public RealVector computeValue(double[] theta) {
            evaluations++;
            double[] m = weightedModel(theta);
            if (m == null) {
                m = new double[xs.length];
                for (int i = 0; i < m.length; i++) {
                    m[i] = target[i] + PENALTY;
                }
                return new ArrayRealVector(m, false);
            }
            double cost = 0;
            for (int i = 0; i < m.length; i++) {
                cost += (target[i] - m[i]) * (target[i] - m[i]);
            }
            if (cost < bestCost) {
                bestCost = cost;
                best = theta.clone();
            }
            return new ArrayRealVector(m, false);
        }

        @Override
        public RealMatrix computeJacobian(double[] theta) {
            jacobians++;
            return new Array2DRowRealMatrix(jacobian(theta), false);
        }

        /** ∂(sqrt(w)·model)/∂θ by central differences; columns of 0 where it fails. */
        double[][] jacobian(double[] theta) {
            final double[][] jac = new double[xs.length][theta.length];
            for (int j = 0; j < theta.length; j++) {
                final double[] plus = theta.clone();
                final double[] minus = theta.clone();
                plus[j] += STEP;
                minus[j] -= STEP;
                final double[] mp = weightedModel(plus);
                final double[] mm = weightedModel(minus);
                if (mp == null || mm == null) {
                    continue;
                }
                for (int i = 0; i < xs.length; i++) {
                    jac[i][j] = (mp[i] - mm[i]) / (2 * STEP);
                }
            }
            return jac;
        }

        @Override
        public Pair<RealVector, RealMatrix> value(RealVector point) {
            final double[] p = point.toArray();
            return new Pair<>(computeValue(p), computeJacobian(p));
        }
    }

    static FitResult run(TransportModel model, Observations data, double[] start) {
        final List<Parameter> free = new ArrayList<>(model.free());
        final int n = data.size();
        final int k = free.size();
        final double[] xs = new double[n];
        final double[] ts = new double[n];
        final double[] cs = new double[n];
        final double[] ws = new double[n];
        final double[] sqrtW = new double[n];
        final double[] target = new double[n];
        int i = 0;
        for (Observations.Curve c : data.curves()) {
            for (int j = 0; j < c.c.length; j++, i++) {
                xs[i] = c.x(j);
                ts[i] = c.t(j);
                cs[i] = c.c[j];
                ws[i] = c.w[j];
                sqrtW[i] = Math.sqrt(ws[i]);
                target[i] = sqrtW[i] * cs[i];
            }
        }
        final double[] theta0 = new double[k];
        for (int j = 0; j < k; j++) {
            theta0[j] = free.get(j).toFree(start[free.get(j).ordinal()]);
        }
        final Evaluator ev = new Evaluator(model, free, start, xs, ts, sqrtW, target);
        if (ev.weightedModel(theta0) == null) {
            String why;
            try {
                model.solution(start);
                why = "it gives a value that is not finite at some observation";
            } catch (IllegalArgumentException | IllegalStateException e) {
                why = e.getMessage();
            }
            return failure(FitStatus.MODEL_FAILED, "the model cannot be evaluated at the"
                + " starting values (" + why + "); give valid starting values", model, free,
                start, cs, ev, ev.weightedModel(theta0));
        }
        final LeastSquaresProblem problem = new LeastSquaresBuilder()
            .start(theta0)
            .model(ev)
            .target(target)
            .lazyEvaluation(true)
            .maxEvaluations(MAX_EVALUATIONS)
            .maxIterations(MAX_ITERATIONS)
            .build();
        final LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
            .withCostRelativeTolerance(TOLERANCE)
            .withParameterRelativeTolerance(TOLERANCE)
            .withOrthoTolerance(TOLERANCE);
        double[] theta;
        try {
            theta = optimizer.optimize(problem).getPoint().toArray();
        } catch (TooManyEvaluationsException | TooManyIterationsException e) {
            final double[] last = ev.best == null ? theta0 : ev.best;
            return failure(FitStatus.NOT_CONVERGED, "the optimiser did not converge within "
                + MAX_ITERATIONS + " iterations / " + MAX_EVALUATIONS + " evaluations ("
                + e.getMessage() + "); try other starting values or fix a parameter", model,
                free, ev.parameters(last), cs, ev, ev.weightedModel(last));
        } catch (ConvergenceException e) {
            // MINPACK's "tolerance too small": no further reduction is possible in double
            // precision, so the best point seen is the optimum to working accuracy.
            theta = ev.best == null ? theta0 : ev.best;
        }
        return statistics(model, free, ev, theta, theta0, cs, ws);
    }

    private static FitResult statistics(TransportModel model, List<Parameter> free,
                                        Evaluator ev, double[] theta, double[] theta0,
                                        double[] cs, double[] ws) {
        final int n = cs.length;
        final int k = free.size();
        final double[] values = ev.parameters(theta);
        final double[] m = ev.weightedModel(theta);
        if (m == null) {
            return failure(FitStatus.NOT_CONVERGED, "the optimiser ended where the model"
                + " cannot be evaluated; try other starting values", model, free, values, cs,
                ev, null);
        }
        final double[] residuals = new double[n];
        double rss = 0;
        double sw = 0;
        double swc = 0;
        for (int i = 0; i < n; i++) {
            residuals[i] = cs[i] - m[i] / ev.sqrtW[i];
            rss += ws[i] * residuals[i] * residuals[i];
            sw += ws[i];
            swc += ws[i] * cs[i];
        }
        final double meanC = swc / sw;
        double tss = 0;
        for (int i = 0; i < n; i++) {
            tss += ws[i] * (cs[i] - meanC) * (cs[i] - meanC);
        }
        final double r2 = tss > 0 ? 1 - rss / tss : 0.0;
        final int dof = n - k;
        final double s = Math.sqrt(rss / dof);
        // Jacobian in θ: a parameter whose whole distance to its bound changes the model by
        // less than ON_BOUND of its norm has run onto the bound (the optimum in θ is at −∞)
        final double[][] jac = ev.jacobian(theta);
        double modelNorm = 0;
        for (int i = 0; i < n; i++) {
            modelNorm += m[i] * m[i];
        }
        modelNorm = Math.sqrt(modelNorm);
        for (int j = 0; j < k; j++) {
            double effect = 0;
            for (int i = 0; i < n; i++) {
                effect += jac[i][j] * jac[i][j];
            }
            if (theta[j] < theta0[j] - BOUND_DROP || Math.sqrt(effect) <= ON_BOUND * modelNorm) {
                final Parameter p = free.get(j);
                return new FitResult(FitStatus.AT_BOUND, p.symbol() + " = "
                    + values[p.ordinal()] + " ran onto its bound " + p.lowerBound()
                    + "; fix it at the bound and fit again", model, free, values, null, null,
                    null, null, residuals, r2, s, ev.evaluations, ev.jacobians);
            }
        }
        // Jacobian in natural units: ∂m/∂p = (∂m/∂θ)/(dp/dθ), then column-scaled
        final double[] norms = new double[k];
        for (int j = 0; j < k; j++) {
            final double dp = free.get(j).derivative(values[free.get(j).ordinal()]);
            double sum = 0;
            for (int i = 0; i < n; i++) {
                jac[i][j] /= dp;
                sum += jac[i][j] * jac[i][j];
            }
            norms[j] = Math.sqrt(sum);
        }
        for (int j = 0; j < k; j++) {
            if (!(norms[j] > 0 && norms[j] < Double.POSITIVE_INFINITY)) {
                return notIdentifiable(model, free, values, residuals, r2, s, ev,
                    "the data do not depend on " + free.get(j).symbol());
            }
            for (int i = 0; i < n; i++) {
                jac[i][j] /= norms[j];
            }
        }
        final SingularValueDecomposition svd =
            new SingularValueDecomposition(new Array2DRowRealMatrix(jac, false));
        final double[] sv = svd.getSingularValues();
        final double condition = sv[0] / sv[k - 1];
        if (!(condition <= MAX_CONDITION)) {
            return notIdentifiable(model, free, values, residuals, r2, s, ev, String.format(
                java.util.Locale.ROOT, "the Jacobian's condition number %.3g exceeds %.0g:"
                    + " some combination of %s is not determined by the data", condition,
                MAX_CONDITION, symbols(free)));
        }
        // (JᵀWJ)⁻¹ = D⁻¹·V·Σ⁻²·Vᵀ·D⁻¹
        final RealMatrix v = svd.getV();
        final double[][] cov = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                double sum = 0;
                for (int l = 0; l < k; l++) {
                    sum += v.getEntry(a, l) * v.getEntry(b, l) / (sv[l] * sv[l]);
                }
                cov[a][b] = s * s * sum / (norms[a] * norms[b]);
            }
        }
        final double[] se = new double[k];
        for (int j = 0; j < k; j++) {
            se[j] = Math.sqrt(cov[j][j]);
        }
        final double[][] corr = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                corr[a][b] = a == b ? 1.0 : cov[a][b] / (se[a] * se[b]);
            }
        }
        final double quantile = new TDistribution(null, dof).inverseCumulativeProbability(0.975);
        final double[] lower = new double[k];
        final double[] upper = new double[k];
        for (int j = 0; j < k; j++) {
            final double est = values[free.get(j).ordinal()];
            lower[j] = est - quantile * se[j];
            upper[j] = est + quantile * se[j];
        }
        return new FitResult(FitStatus.CONVERGED, "converged", model, free, values, se, lower,
            upper, corr, residuals, r2, s, ev.evaluations, ev.jacobians);
    }

    private static String symbols(List<Parameter> free) {
        final StringBuilder b = new StringBuilder();
        for (Parameter p : free) {
            b.append(b.length() == 0 ? "" : ", ").append(p.symbol());
        }
        return b.toString();
    }

    private static FitResult notIdentifiable(TransportModel model, List<Parameter> free,
                                             double[] values, double[] residuals, double r2,
                                             double s, Evaluator ev, String why) {
        return new FitResult(FitStatus.NOT_IDENTIFIABLE, why + "; fix a parameter or add data"
            + " that constrain it", model, free, values, null, null, null, null, residuals, r2,
            s, ev.evaluations, ev.jacobians);
    }

    private static FitResult failure(FitStatus status, String message, TransportModel model,
                                     List<Parameter> free, double[] values, double[] cs,
                                     Evaluator ev, double[] weightedModel) {
        final double[] residuals = new double[cs.length];
        for (int i = 0; i < cs.length; i++) {
            residuals[i] = weightedModel == null ? Double.NaN
                : cs[i] - weightedModel[i] / ev.sqrtW[i];
        }
        return new FitResult(status, message, model, free, values, null, null, null, null,
            residuals, 0.0, Double.NaN, ev.evaluations, ev.jacobians);
    }
}
