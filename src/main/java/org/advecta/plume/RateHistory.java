package org.advecta.plume;

import java.util.Arrays;
import java.util.Locale;
import org.advecta.internal.Checks;

/**
 * A piecewise-constant source rate: rate q_k from time t_k until t_(k+1), the last rate for
 * ever after, and no release before t_0. Immutable and thread-safe.
 *
 * <p>A source with this history has the concentration given by Duhamel's theorem (Carslaw
 * &amp; Jaeger 1959, §1.14), with g the source's response to a unit instantaneous release and
 * c₁ its solution for a unit rate from time 0:
 * <pre>
 * c(t) = ∫₀ᵗ q(t − τ) g(τ) dτ = Σ_(t_k &lt; t) q_k ∫ g(τ) dτ over τ ∈ [t − t_(k+1), t − t_k]
 *      = Σ_(t_k &lt; t) (q_k − q_(k−1)) · c₁(t − t_k)          (q_(−1) = 0)
 * </pre>
 * (the first window of the sum starts at τ = 0 for the current piece). Both forms are exact for
 * a piecewise-constant rate; they differ in rounding.
 *
 * <p><b>Accuracy.</b> {@link LineSource2D} and {@link PatchSource3D} evaluate the window form:
 * every window's integrand is ≥ 0 and is integrated to its own relative error, so the
 * returned bound is at most 1e-10 of the result for a history whose rates are all ≥ 0, also
 * once a release has ended and the result is small. With a negative rate (withdrawal) the
 * windows can cancel, and the bound is then relative to Σ|q_k|·(window integral), not to the
 * result. {@link PointSource3D} and the closed-form mass fluxes evaluate the step form: a
 * rate that returns to zero makes nearly equal terms cancel once the release has passed, and
 * the absolute error is then about 2⁻⁵³ × the largest term, not relative to the (small)
 * result; so are the quadrature mass fluxes beside an absorbing wall
 * ({@code massFluxEstimate}), whose bound is the sum of the terms' bounds.
 */
public final class RateHistory {

    private final double[] times;
    private final double[] rates;
    private final double[] steps;

    private RateHistory(double[] times, double[] rates) {
        this.times = times;
        this.rates = rates;
        this.steps = new double[rates.length];
        for (int k = 0; k < rates.length; k++) {
            steps[k] = rates[k] - (k == 0 ? 0.0 : rates[k - 1]);
        }
    }

    /**
     * Returns a constant rate q from time 0 on.
     *
     * @param rate the rate, finite
     * @return the history
     * @throws IllegalArgumentException if the rate is not finite
     */
    public static RateHistory constant(double rate) {
        return new RateHistory(new double[] {0.0}, new double[] {Checks.finite("rate", rate)});
    }

    /**
     * Returns the history with rate {@code rates[k]} from {@code times[k]} on (until the next
     * time). The arrays are copied.
     *
     * @param times start times, finite, ≥ 0 and strictly increasing; at least one
     * @param rates the rates, finite (any sign: a negative rate withdraws), as many as times
     * @return the history
     * @throws IllegalArgumentException if an array is null, empty or of different length, or a
     *     value is invalid
     */
    public static RateHistory of(double[] times, double[] rates) {
        Checks.length("times", times, 1);
        Checks.length("rates", rates, times.length);
        if (rates.length != times.length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "rates: needs exactly %d elements (one per time), got %d", times.length,
                rates.length));
        }
        final double[] t = times.clone();
        final double[] q = rates.clone();
        for (int k = 0; k < t.length; k++) {
            Checks.nonNegative("times[" + k + "]", t[k]);
            Checks.finite("rates[" + k + "]", q[k]);
            if (k > 0 && !(t[k] > t[k - 1])) {
                throw Checks.fail("times[" + k + "]", t[k], "must be greater than times["
                    + (k - 1) + "] = " + t[k - 1]);
            }
        }
        return new RateHistory(t, q);
    }

    /**
     * Returns the number of pieces.
     *
     * @return the number of start times
     */
    public int size() {
        return times.length;
    }

    /**
     * Returns the start time of piece k.
     *
     * @param k the index, 0 ≤ k &lt; size()
     * @return t_k
     */
    public double time(int k) {
        return times[k];
    }

    /**
     * Returns the rate of piece k.
     *
     * @param k the index, 0 ≤ k &lt; size()
     * @return q_k
     */
    public double rate(int k) {
        return rates[k];
    }

    /**
     * Returns the rate at time t (0 before the first start time; at a start time the new
     * rate).
     *
     * @param t the time, finite
     * @return the rate
     * @throws IllegalArgumentException if t is not finite
     */
    public double rateAt(double t) {
        Checks.finite("t", t);
        double q = 0;
        for (int k = 0; k < times.length && times[k] <= t; k++) {
            q = rates[k];
        }
        return q;
    }

    /**
     * Returns the last rate, which the source keeps for ever (it sets the steady state).
     *
     * @return q_(n−1)
     */
    public double finalRate() {
        return rates[rates.length - 1];
    }

    /** The step q_k − q_(k−1). */
    double step(int k) {
        return steps[k];
    }

    @Override
    public boolean equals(Object obj) {
        return obj instanceof RateHistory && Arrays.equals(times, ((RateHistory) obj).times)
            && Arrays.equals(rates, ((RateHistory) obj).rates);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(times) + Arrays.hashCode(rates);
    }

    @Override
    public String toString() {
        return "RateHistory[times=" + Arrays.toString(times) + ", rates="
            + Arrays.toString(rates) + "]";
    }
}
