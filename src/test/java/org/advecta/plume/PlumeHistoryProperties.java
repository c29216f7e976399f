package org.advecta.plume;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import org.advecta.quadrature.Estimate;
import org.advecta.transport.TransportParameters;

/**
 * Invariants of the line and patch sources with piecewise-constant rates: superposition in
 * time (a history is the sum of its pulses, and the sum of its rate steps applied to the
 * constant source), non-negativity, the bound of 1e-10 relative for non-negative
 * rates, and a pulse long after its end (between the mean-value bounds of its window,
 * decreasing to 0).
 */
class PlumeHistoryProperties {

    /** The bound on the returned relative error estimate at default settings. */
    private static final double MAX_RELATIVE_ESTIMATE = EstimateAudit.MAX_RELATIVE_ESTIMATE;
    /** Values at least this large are judged relative (far above underflow). */
    private static final double JUDGED = 1e-250;

    private static TransportParameters params(double v, double logDL, double r, double mu) {
        final double dl = Math.pow(10, logDL);
        return TransportParameters.of(v, dl).withDispersion(dl, 0.1 * dl, 0.05 * dl)
            .withRetardation(r).withDecay(mu);
    }

    /** x rounded to a multiple of 2⁻¹⁰, so that differences of such times are exact. */
    static double dyadic(double x) {
        return Math.rint(x * 1024) / 1024;
    }

    /** A history of n pieces: durations, rates, some of them zero; dyadic times. */
    private static RateHistory history(int n, List<Double> durations, List<Double> rates,
                                       List<Boolean> zero, double start) {
        final double[] t = new double[n];
        final double[] q = new double[n];
        double s = dyadic(start);
        for (int k = 0; k < n; k++) {
            t[k] = s;
            q[k] = zero.get(k) ? 0.0 : rates.get(k);
            s += dyadic(durations.get(k));
        }
        return RateHistory.of(t, q);
    }

    /** Piece k alone: its rate from tₖ to t_(k+1), then 0 (or for ever, the last piece). */
    private static RateHistory pulse(RateHistory h, int k) {
        if (k + 1 == h.size()) {
            return RateHistory.of(new double[] {h.time(k)}, new double[] {h.rate(k)});
        }
        return RateHistory.of(new double[] {h.time(k), h.time(k + 1)},
            new double[] {h.rate(k), 0.0});
    }

    /** Either source at one point, for a given history. */
    @FunctionalInterface
    private interface Evaluation {
        Estimate at(RateHistory h, double t);
    }

    private static void checkSuperposition(Evaluation source, RateHistory h, double t,
                                           String where) {
        final Estimate e = source.at(h, t);
        assertTrue(e.value() >= 0, "non-negative: " + e + where);
        // (1) the sum of the pulses, each evaluated on its own
        double sum = 0;
        double sumError = 0;
        // (2) the rate steps applied to the constant unit source switched on at tₖ: another
        // route (windows [0, t − tₖ] instead of [t − t_(k+1), t − tₖ]); t − tₖ is exact
        // (dyadic times), and the sum of n terms costs at most n·2⁻⁵² of their magnitudes
        double steps = 0;
        double stepsError = 0;
        final RateHistory unit = RateHistory.constant(1.0);
        for (int k = 0; k < h.size() && h.time(k) < t; k++) {
            final Estimate p = source.at(pulse(h, k), t);
            sum += p.value();
            sumError += p.error();
            final double step = h.rate(k) - (k == 0 ? 0.0 : h.rate(k - 1));
            final Estimate c = source.at(unit, t - h.time(k));
            steps += step * c.value();
            stepsError += Math.abs(step) * c.error()
                + Math.abs(step * c.value()) * 0x1.0p-52 * (k + 1);
        }
        assertTrue(Math.abs(e.value() - sum) <= e.error() + sumError,
            "history " + e + " vs sum of pulses " + sum + " ± " + sumError + where);
        assertTrue(Math.abs(e.value() - steps) <= e.error() + stepsError,
            "history " + e + " vs rate steps " + steps + " ± " + stepsError + where);
        if (e.value() >= JUDGED) {
            assertTrue(e.error() <= MAX_RELATIVE_ESTIMATE * e.value(),
                "bound " + e.relativeError() + " > 1e-10 relative: " + e + where);
        }
    }

    @Property(tries = 80)
    void lineSourceHistoryIsTheSumOfItsPulsesWithinABoundOf1e10(
            @ForAll @IntRange(min = 2, max = 5) int n,
            @ForAll @Size(5) List<@DoubleRange(min = 0.05, max = 3) Double> durations,
            @ForAll @Size(5) List<@DoubleRange(min = 0.1, max = 3) Double> rates,
            @ForAll @Size(5) List<Boolean> zero,
            @ForAll @DoubleRange(min = 0, max = 1) double start,
            @ForAll @DoubleRange(min = 0.02, max = 15) double when,
            @ForAll @DoubleRange(min = -2, max = 5) double v,
            @ForAll @DoubleRange(min = -1.5, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.3) double mu,
            @ForAll @DoubleRange(min = -2, max = 6) double x,
            @ForAll @DoubleRange(min = -1, max = 1) double y) {
        if (x == 0 && y == 0) {
            return;    // the source line itself
        }
        final RateHistory h = history(n, durations, rates, zero, start);
        final double end = h.time(n - 1) + durations.get(n - 1);
        final double t = dyadic(h.time(0) + (end - h.time(0)) * when / 3);
        final LineSource2D base = LineSource2D.of(params(v, logDL, r, mu), 0, 0, 1.0);
        checkSuperposition((hh, tt) -> base.withRateHistory(hh).estimate(x, y, tt), h, t,
            " at " + h + ", t = " + t + ", x = " + x + ", y = " + y);
    }

    @Property(tries = 50)
    void patchSourceHistoryIsTheSumOfItsPulsesWithinABoundOf1e10(
            @ForAll @IntRange(min = 2, max = 5) int n,
            @ForAll @Size(5) List<@DoubleRange(min = 0.05, max = 3) Double> durations,
            @ForAll @Size(5) List<@DoubleRange(min = 0.1, max = 3) Double> rates,
            @ForAll @Size(5) List<Boolean> zero,
            @ForAll @DoubleRange(min = 0, max = 1) double start,
            @ForAll @DoubleRange(min = 0.02, max = 15) double when,
            @ForAll @DoubleRange(min = -2, max = 5) double v,
            @ForAll @DoubleRange(min = -1.5, max = 0.5) double logDL,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.3) double mu,
            @ForAll @DoubleRange(min = -2, max = 6) double x,
            @ForAll @DoubleRange(min = -2, max = 2) double y,
            @ForAll @DoubleRange(min = -1, max = 1) double z) {
        final RateHistory h = history(n, durations, rates, zero, start);
        final double end = h.time(n - 1) + durations.get(n - 1);
        final double t = dyadic(h.time(0) + (end - h.time(0)) * when / 3);
        final PatchSource3D base = PatchSource3D.of(params(v, logDL, r, mu), 0, -1, 1, -0.5,
            0.5, 1.0);
        checkSuperposition((hh, tt) -> base.withRateHistory(hh).estimate(x, y, z, tt), h, t,
            " at " + h + ", t = " + t + ", x = " + x + ", y = " + y + ", z = " + z);
    }

    /**
     * The line source's kernel for a unit rate, g(τ) = e^(Δx v/(2D_L)) exp(−R r²/(4D_L τ)
     * − U²τ/(4D_L R)) / (4π τ √(D_L D_T)) (the integrand of the class javadoc), r² = Δx² +
     * Δy² D_L/D_T, U² = v² + 4μD_L.
     */
    private static double kernel(double v, double dl, double dt, double r, double mu,
                                 double x, double y, double tau) {
        final double r2 = x * x + y * y * dl / dt;
        final double u2 = v * v + 4 * mu * dl;
        return Math.exp(x * v / (2 * dl) - r * r2 / (4 * dl * tau) - u2 * tau / (4 * dl * r))
            / (4 * Math.PI * tau * Math.sqrt(dl * dt));
    }

    @Property(tries = 60)
    void aPulseLongAfterItsEndTendsToZeroWithinTheBound(
            @ForAll @DoubleRange(min = 0.01, max = 2) double duration,
            @ForAll @DoubleRange(min = 0.1, max = 3) double rate,
            @ForAll @DoubleRange(min = 0.2, max = 3) double v,
            @ForAll @DoubleRange(min = -1, max = 0.3) double logDL,
            @ForAll @DoubleRange(min = 1, max = 3) double r,
            @ForAll @DoubleRange(min = 0, max = 0.1) double mu,
            @ForAll @DoubleRange(min = 0.5, max = 5) double x,
            @ForAll @DoubleRange(min = -1, max = 1) double y) {
        final double dl = Math.pow(10, logDL);
        final double dt = 0.1 * dl;
        final LineSource2D s = LineSource2D.of(params(v, logDL, r, mu), 0, 0, 1.0)
            .withRateHistory(RateHistory.of(new double[] {0, duration},
                new double[] {rate, 0}));
        // g decreases for τ > τ*, the root of Bτ² + τ − A (A = R r²/(4D_L), B = U²/(4D_L R))
        final double a = r * (x * x + y * y * dl / dt) / (4 * dl);
        final double b = (v * v + 4 * mu * dl) / (4 * dl * r);
        final double tauStar = (-1 + Math.sqrt(1 + 4 * a * b)) / (2 * b);
        double previous = Double.POSITIVE_INFINITY;
        int judged = 0;
        for (double t = 2 * (tauStar + duration); ; t *= 1.5) {
            final double lower = rate * duration * kernel(v, dl, dt, r, mu, x, y, t);
            final double upper = rate * duration
                * kernel(v, dl, dt, r, mu, x, y, t - duration);
            if (upper < JUDGED) {
                break;
            }
            final Estimate e = s.estimate(x, y, t);
            final String where = " at t = " + t + ": " + e;
            // the mean-value theorem on the window [t − Δ, t], where g is decreasing (the
            // closed-form g carries its own rounding, a few hundred ULP of its exponent)
            assertTrue(e.value() >= lower * (1 - 1e-12) && e.value() <= upper * (1 + 1e-12),
                "pulse between Δ·g(t) = " + lower + " and Δ·g(t − Δ) = " + upper + where);
            assertTrue(e.value() < previous, "decreasing" + where);
            assertTrue(e.error() <= MAX_RELATIVE_ESTIMATE * e.value(),
                "bound " + e.relativeError() + " > 1e-10 relative" + where);
            previous = e.value();
            judged++;
        }
        assertTrue(judged >= 1, "at least the first time is judged");
    }
}
