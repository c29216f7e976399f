package org.advecta.fit;

/**
 * Fits the free parameters of a {@link TransportModel} to {@link Observations} by weighted
 * least squares, minimising Σ wᵢ·(cᵢ − model(xᵢ, tᵢ))² with the Levenberg–Marquardt method
 * (Levenberg 1944; Marquardt 1963, J. SIAM 11(2), 431–441; Commons Math 3.6.1's
 * {@code LevenbergMarquardtOptimizer}, a port of MINPACK's lmder: Moré 1978).
 *
 * <p><b>Bounds.</b> Each free parameter is fitted through an unbounded variable θ
 * ({@link Parameter}): v, D, μ and the source as e^θ, R as 1 + e^θ, so no iterate can leave
 * the valid range. The Jacobian is formed by central differences in θ (step 2⁻¹⁷, relative
 * error about 1e-10) and converted to natural units for the statistics.
 *
 * <p><b>Starting guess.</b> Free parameters without a starting value get one from the
 * data's temporal or spatial moments ({@link org.advecta.moments.Moments}): for a
 * breakthrough curve at travel distance L the relations mean = R·L/v and
 * variance = 2·D·R²·L/v³ (Kreft &amp; Zuber 1978, for the flux-averaged Dirac response), after
 * removing the input's own mean and variance (t₀/2 and t₀²/12 for a pulse); for a front
 * (constant input, step) the moments of the curve's increments; for a profile at time t,
 * centre = x₀ + v·t/R and variance = s₀² + 2·D·t/R. The source then follows by linear least
 * squares (the model is linear in it), μ starts at 0.05/(mean time).
 *
 * <p><b>Failures are reported, not hidden.</b> Bad data (fewer points than free
 * parameters plus one, NaN, negative times, an all-zero curve) throw
 * {@link IllegalArgumentException} before the optimiser runs (most already in
 * {@link Observations}); a fit that does not converge, whose parameters are not identifiable
 * (rank-deficient Jacobian: condition number of the column-scaled Jacobian above 1e8), or
 * whose optimum lies on a bound returns a {@link FitResult} with that {@link FitStatus} and a
 * message, and no standard errors.
 *
 * <p><b>Optional dependency.</b> Fitting needs {@code org.apache.commons:commons-math3:3.6.1},
 * an optional dependency of advecta (not inherited by users who embed only the solutions):
 * add it to your build to fit. On the module path it is the automatic module
 * {@code commons.math3}, and must be resolved (required by your module or named in
 * {@code --add-modules}). Without it {@link #fit(TransportModel, Observations)} throws
 * {@link IllegalStateException} naming the artifact, before looking at its arguments.
 *
 * <p>Thread-safe: a fit keeps no state outside the call.
 */
public final class ParameterFit {

    /** The class whose presence shows that the optional dependency is on the path. */
    static final String OPTIMIZER_CLASS =
        "org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer";

    private ParameterFit() {
    }

    /**
     * Fits the model's free parameters to the data.
     *
     * @param model the model: family, observable, free and fixed parameters
     * @param data the observations
     * @return the result; check {@link FitResult#status()}
     * @throws IllegalStateException if commons-math3 is not available at run time
     * @throws IllegalArgumentException if an argument is null, the data have no more points
     *     than free parameters, a fixed parameter lacks a value or is invalid, a starting
     *     value is outside its bounds, or no starting guess can be formed (a custom family)
     */
    public static FitResult fit(TransportModel model, Observations data) {
        requireOptimizer();
        if (model == null) {
            throw new IllegalArgumentException("model: must not be null");
        }
        if (data == null) {
            throw new IllegalArgumentException("data: must not be null");
        }
        final int k = model.free().size();
        final int n = data.size();
        if (n <= k) {
            throw new IllegalArgumentException("data: " + n + " points for " + k
                + " free parameters; a fit needs more points than free parameters");
        }
        final double[] start = StartingGuess.of(model, data);
        return LevenbergMarquardtFit.run(model, data, start);
    }

    /**
     * Throws if the optional commons-math3 is not on the class or module path.
     */
    private static void requireOptimizer() {
        try {
            Class.forName(OPTIMIZER_CLASS, false, ParameterFit.class.getClassLoader());
        } catch (ClassNotFoundException | LinkageError e) {
            throw new IllegalStateException("parameter fitting needs"
                + " org.apache.commons:commons-math3:3.6.1 (an optional dependency of advecta)"
                + " on the class path, or the module commons.math3 resolved on the module path",
                e);
        }
    }
}
