package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.function.DoubleBinaryOperator;
import org.advecta.solution.Solution1D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The closed-form solution families evaluated point by point, c(x, t) over an array of (x, t)
 * points, against the naive textbook formulas.
 *
 * <p>One benchmark, {@link #solution()}, timed per call on {@code size} points (divide the score
 * by {@code size} for ns per point), for each {@code family} (see {@link SolutionFamily}):
 * {@code firstType}, {@code firstTypeDecay}, {@code thirdType}, {@code pulse}, {@code step},
 * {@code slug}; and each {@code impl}:
 * <ul>
 *   <li>{@code ours}: advecta's {@link Solution1D#value(double, double)};</li>
 *   <li>{@code numbers}: the naive formula ({@link NaiveNumbers}) with Commons Numbers'
 *       {@code Erfc.value}/{@code Erf.value} and {@code Math.exp};</li>
 *   <li>{@code math3}: the same formula ({@link NaiveMath3}) with Commons Math 3's
 *       {@code Erf.erfc}/{@code Erf.erf}.</li>
 * </ul>
 *
 * <p>One regime, where the naive forms are still valid, so that the comparison is fair:
 * v = 0.5, D = 0.05, R = 1.5 (μ = 0.02 for {@code firstTypeDecay}, {@code step} and
 * {@code slug}, 0 for the others), c₀ = 1, pulse duration t₀ = 4, step at x₀ = 0, slug on
 * (−0.5, 0). Positions x uniform in [0.05, 5], so the Péclet number vx/D lies in [0.5, 50];
 * times around the front, t = f·Rx/v with f log-uniform in [1/2, 2]. {@link #verify()} checks
 * before timing that both naive forms agree with ours to 1e−9 relative at every point
 * ({@link NaiveFailureScan} shows where they stop doing so).
 *
 * <p>Inputs live in this state object (nothing constant-folds), results are written into a
 * state array and returned (nothing is dead code), points are random from a fixed, logged
 * seed. All three impls are called through the same {@link DoubleBinaryOperator} field, one
 * implementation per fork, so the call site is monomorphic and the indirection is the same
 * for all.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SolutionPerformance {

    /** What is timed. */
    @Param({"ours", "numbers", "math3"})
    public String impl;

    /** Which closed-form solution. */
    @Param({"firstType", "firstTypeDecay", "thirdType", "pulse", "step", "slug"})
    public String family;

    /** Number of (x, t) points per call. */
    @Param({"1024"})
    public int size;

    /** Seed of the random points (logged in setup). */
    @Param({"20250611"})
    public long seed;

    /** Tolerance of verify: relative difference of each naive form from ours. */
    private static final double TOLERANCE = 1e-9;

    // Non-final fields, so the JIT cannot fold them.
    private double v = 0.5;
    private double d = 0.05;
    private double r = 1.5;
    private double mu = 0.02;
    private double c0 = 1.0;
    private double t0 = 4.0;
    private double x0 = 0.0;
    private double slugA = -0.5;
    private double slugB = 0.0;
    private double xMin = 0.05;
    private double xMax = 5.0;

    private SolutionFamily which;
    private SolutionFamily.Setting setting;
    private Solution1D ours;
    private DoubleBinaryOperator timed;
    private double[] x;
    private double[] t;
    private double[] out;

    @Setup(Level.Trial)
    public void setUp() {
        which = SolutionFamily.of(family);
        setting = new SolutionFamily.Setting(v, d, r, mu, c0, t0, x0, slugA, slugB);
        ours = which.ours(setting);
        switch (impl) {
            case "ours":
                timed = ours::value;
                break;
            case "numbers":
                timed = which.numbers(setting);
                break;
            case "math3":
                timed = which.math3(setting);
                break;
            default:
                throw new IllegalArgumentException("impl: " + impl);
        }
        System.out.printf(Locale.ROOT,
            "%n[SolutionPerformance] seed = %d, impl = %s, family = %s, size = %d; %s (mu used by"
                + " firstTypeDecay, step and slug only)%n",
            seed, impl, family, size, setting);
        final SplittableRandom random = new SplittableRandom(seed);
        x = new double[size];
        t = new double[size];
        out = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = random.nextDouble(xMin, xMax);
            t[i] = Math.pow(2, random.nextDouble(-1, 1)) * r * x[i] / v;
        }
        verify();
    }

    /**
     * Throws unless ours is a finite normal double at every point and both naive forms agree
     * with it to {@link #TOLERANCE} relative.
     */
    private void verify() {
        final DoubleBinaryOperator numbers = which.numbers(setting);
        final DoubleBinaryOperator math3 = which.math3(setting);
        double worstNumbers = 0;
        double worstMath3 = 0;
        double minValue = Double.POSITIVE_INFINITY;
        double maxValue = 0;
        int afterPulse = 0;
        for (int i = 0; i < size; i++) {
            final double xi = x[i];
            final double ti = t[i];
            final double c = ours.value(xi, ti);
            if (!(Math.abs(c) >= Double.MIN_NORMAL && Math.abs(c) < Double.POSITIVE_INFINITY)) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "%s: ours(%s, %s) = %s, not a normal double", family, xi, ti, c));
            }
            minValue = Math.min(minValue, Math.abs(c));
            maxValue = Math.max(maxValue, Math.abs(c));
            afterPulse += ti > t0 ? 1 : 0;
            worstNumbers = Math.max(worstNumbers,
                check(c, numbers.applyAsDouble(xi, ti), "Commons Numbers", xi, ti));
            worstMath3 = Math.max(worstMath3,
                check(c, math3.applyAsDouble(xi, ti), "Commons Math 3", xi, ti));
        }
        System.out.printf(Locale.ROOT, "[SolutionPerformance] verified %d points (Peclet vx/D in [%.3g, %.3g],"
                + " |c| in [%.3g, %.3g]%s): max relative |naive - ours| for naive Commons Numbers %.3g,"
                + " naive Commons Math 3 %.3g (tolerance %.0e)%n",
            size, v * xMin / d, v * xMax / d, minValue, maxValue,
            which == SolutionFamily.PULSE ? ", " + afterPulse + " points after the pulse ended" : "",
            worstNumbers, worstMath3, TOLERANCE);
    }

    private double check(double ours, double naive, String what, double xi, double ti) {
        final double rel = Math.abs(naive - ours) / Math.abs(ours);
        if (!(rel <= TOLERANCE)) {
            throw new IllegalStateException(String.format(Locale.ROOT,
                "%s at x = %s, t = %s: ours %s vs naive %s %s (relative %s > %s)",
                family, xi, ti, ours, what, naive, rel, TOLERANCE));
        }
        return rel;
    }

    /**
     * Evaluates the chosen implementation at all {@code size} points.
     *
     * @return the values (written into a state array: stores cannot be eliminated)
     */
    @Benchmark
    public double[] solution() {
        final DoubleBinaryOperator f = timed;
        final double[] xs = x;
        final double[] ts = t;
        final double[] res = out;
        for (int i = 0; i < xs.length; i++) {
            res[i] = f.applyAsDouble(xs[i], ts[i]);
        }
        return res;
    }
}
