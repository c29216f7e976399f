package org.advecta.benchmarks;

import org.apache.commons.math3.special.Erf;

/**
 * The same naive formulas as {@link NaiveNumbers}, line for line, with Commons Math 3's
 * {@link Erf#erfc(double)} and {@link Erf#erf(double)}: the baseline {@code impl = math3} of
 * {@link SolutionPerformance} and the second naive form scanned by {@link NaiveFailureScan}.
 * A separate class, so that every call site of a benchmark fork sees one library only.
 */
final class NaiveMath3 {

    private NaiveMath3() {
    }

    /**
     * First-type (Dirichlet) inlet, constant input, μ = 0, Cᵢ = 0:
     * c₀/2·[erfc((x − vt/R)/L) + exp(vx/D)·erfc((x + vt/R)/L)], L = √(4Dt/R).
     */
    static double firstType(double x, double t, double v, double d, double r, double c0) {
        final double l = Math.sqrt(4 * d * t / r);
        return c0 / 2 * (Erf.erfc((x - v * t / r) / l)
            + Math.exp(v * x / d) * Erf.erfc((x + v * t / r) / l));
    }

    /**
     * First-type inlet with decay, constant input, Cᵢ = 0, u = √(v² + 4μD):
     * c₀/2·[exp((v−u)x/(2D))·erfc((x − ut/R)/L) + exp((v+u)x/(2D))·erfc((x + ut/R)/L)].
     */
    static double firstTypeDecay(double x, double t, double v, double d, double r, double mu,
                                 double c0) {
        final double u = Math.sqrt(v * v + 4 * mu * d);
        final double l = Math.sqrt(4 * d * t / r);
        return c0 / 2 * (Math.exp((v - u) * x / (2 * d)) * Erf.erfc((x - u * t / r) / l)
            + Math.exp((v + u) * x / (2 * d)) * Erf.erfc((x + u * t / r) / l));
    }

    /**
     * Third-type (flux) inlet, constant input, μ = 0, Cᵢ = 0:
     * c₀·[½erfc(A) + √(v²t/(πDR))·exp(−A²) − ½(1 + vx/D + v²t/(DR))·exp(vx/D)·erfc(B)],
     * A = (x − vt/R)/L, B = (x + vt/R)/L.
     */
    static double thirdType(double x, double t, double v, double d, double r, double c0) {
        final double l = Math.sqrt(4 * d * t / r);
        final double a = (x - v * t / r) / l;
        final double b = (x + v * t / r) / l;
        return c0 * (0.5 * Erf.erfc(a)
            + Math.sqrt(v * v * t / (Math.PI * d * r)) * Math.exp(-a * a)
            - 0.5 * (1 + v * x / d + v * v * t / (d * r)) * Math.exp(v * x / d) * Erf.erfc(b));
    }

    /** First-type inlet, pulse of duration t₀, μ = 0: F(t), and F(t) − F(t − t₀) for t &gt; t₀. */
    static double pulse(double x, double t, double v, double d, double r, double c0, double t0) {
        final double now = firstType(x, t, v, d, r, c0);
        return t <= t0 ? now : now - firstType(x, t - t0, v, d, r, c0);
    }

    /** Initial step, loaded left of x₀: c₀·exp(−μt/R)·½erfc((x − x₀ − vt/R)/L). */
    static double step(double x, double t, double v, double d, double r, double mu, double x0,
                       double c0) {
        return c0 * Math.exp(-mu * t / r) * 0.5
            * Erf.erfc((x - x0 - v * t / r) / Math.sqrt(4 * d * t / r));
    }

    /** Initial slug on (a, b): c₀·exp(−μt/R)·½[erf((x − vt/R − a)/L) − erf((x − vt/R − b)/L)]. */
    static double slug(double x, double t, double v, double d, double r, double mu, double a,
                       double b, double c0) {
        final double l = Math.sqrt(4 * d * t / r);
        return c0 * Math.exp(-mu * t / r) * 0.5
            * (Erf.erf((x - v * t / r - a) / l) - Erf.erf((x - v * t / r - b) / l));
    }
}
