package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.advecta.special.ExpErfc;
import org.apache.commons.math3.special.Erf;
import org.apache.commons.numbers.gamma.Erfc;
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
 * exp(a)·erfc(b) over an array of (a, b) pairs.
 *
 * <p>One benchmark, {@link #expErfc()}, timed per call on {@code size} pairs (divide the score
 * by {@code size} for ns per pair), for each {@code impl}:
 * <ul>
 *   <li>{@code ours}: {@link ExpErfc#value(double, double)};</li>
 *   <li>{@code numbers}: the naive product {@code Math.exp(a) * Erfc.value(b)} with Commons
 *       Numbers;</li>
 *   <li>{@code math3}: the naive product {@code Math.exp(a) * Erf.erfc(b)} with Commons Math 3.</li>
 * </ul>
 *
 * <p>Regimes ({@code regime}):
 * <ul>
 *   <li>{@code moderate}: a uniform in [0, 50] (Péclet-like), b uniform in [0, 5]. All three are
 *       finite and agree; {@link #verify()} checks that they do.</li>
 *   <li>{@code highPeclet}: a log-uniform in [1e3, 1e6], b = √(a + u) with u uniform in
 *       [−50, 690], so that the true value exp(a)·erfc(b) ≈ e^−u/(b√π) is an ordinary normal
 *       double. Here exp(a) overflows to +∞ and erfc(b) underflows to 0, so <b>both naive
 *       products return NaN</b> at every pair: they are timed only to show what the wrong answer
 *       costs, and verify checks only ours (against the asymptotic series of erfcx, which is
 *       accurate to ~1e−14 for b ≥ 30).</li>
 * </ul>
 *
 * <p>Inputs live in this state object (nothing constant-folds), results are written into a
 * state array and returned (nothing is dead code), pairs are random from a fixed, logged seed.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ExpErfcPerformance {

    /** What is timed. */
    @Param({"ours", "numbers", "math3"})
    public String impl;

    /** Range of the arguments. */
    @Param({"moderate", "highPeclet"})
    public String regime;

    /** Number of (a, b) pairs per call. */
    @Param({"1024"})
    public int size;

    /** Seed of the random pairs (logged in setup). */
    @Param({"20250611"})
    public long seed;

    private double[] a;
    private double[] b;
    private double[] out;
    private Impl which;

    private enum Impl { OURS, NUMBERS, MATH3 }

    @Setup(Level.Trial)
    public void setUp() {
        which = Impl.valueOf(impl.toUpperCase(Locale.ROOT));
        System.out.printf(Locale.ROOT, "%n[ExpErfcPerformance] seed = %d, impl = %s, regime = %s, size = %d%n",
            seed, impl, regime, size);
        final SplittableRandom random = new SplittableRandom(seed);
        a = new double[size];
        b = new double[size];
        out = new double[size];
        for (int i = 0; i < size; i++) {
            switch (regime) {
                case "moderate":
                    a[i] = random.nextDouble(0, 50);
                    b[i] = random.nextDouble(0, 5);
                    break;
                case "highPeclet":
                    a[i] = Math.pow(10, random.nextDouble(3, 6));
                    b[i] = Math.sqrt(a[i] + random.nextDouble(-50, 690));
                    break;
                default:
                    throw new IllegalArgumentException("regime: " + regime);
            }
        }
        verify();
    }

    /**
     * Throws unless ours is within its documented accuracy, max(16, 2κ) ULP with
     * κ = |a| + 2b², of the naive products (moderate: both naive products, which are accurate
     * there) or of the asymptotic reference (highPeclet, where the naive products are NaN).
     */
    private void verify() {
        double worstNumbers = 0;
        double worstMath3 = 0;
        double worstReference = 0;
        int naiveNotFinite = 0;
        for (int i = 0; i < size; i++) {
            final double ai = a[i];
            final double bi = b[i];
            final double ours = ExpErfc.value(ai, bi);
            if (!(ours > Double.MIN_NORMAL && ours < Double.POSITIVE_INFINITY)) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "ExpErfc.value(%s, %s) = %s, not a normal double", ai, bi, ours));
            }
            final double tol = Math.max(16, 2 * (Math.abs(ai) + 2 * bi * bi)) * 0x1.0p-52 + 1e-13;
            final double numbers = naiveNumbers(ai, bi);
            final double math3 = naiveMath3(ai, bi);
            if (!Double.isFinite(numbers) || !Double.isFinite(math3)) {
                naiveNotFinite++;
            }
            if (regime.equals("moderate")) {
                worstNumbers = Math.max(worstNumbers, check(ours, numbers, tol, "Commons Numbers", ai, bi));
                worstMath3 = Math.max(worstMath3, check(ours, math3, tol, "Commons Math 3", ai, bi));
            } else {
                worstReference = Math.max(worstReference,
                    check(ours, asymptotic(ai, bi), tol, "asymptotic reference", ai, bi));
            }
        }
        System.out.printf(Locale.ROOT, "[ExpErfcPerformance] verified %d pairs: max relative |ours - x| for"
                + " x = naive Commons Numbers %.3g, naive Commons Math 3 %.3g, asymptotic reference %.3g"
                + " (0 = not checked in this regime); naive products not finite at %d of %d pairs%n",
            size, worstNumbers, worstMath3, worstReference, naiveNotFinite, size);
    }

    private static double check(double ours, double other, double tol, String what, double ai, double bi) {
        final double rel = Math.abs(ours - other) / Math.abs(other);
        if (!(rel <= tol)) {
            throw new IllegalStateException(String.format(Locale.ROOT,
                "a = %s, b = %s: ExpErfc %s vs %s %s (relative %s > %s)", ai, bi, ours, what, other, rel, tol));
        }
        return rel;
    }

    /**
     * exp(a)·erfc(b) for b ≥ 30 from erfc(b) = e^(−b²)/(b√π)·Σ (−1)ⁿ(2n−1)!!/(2b²)ⁿ (five terms:
     * truncation below 1e−14) with a − b² rounded once by fma.
     */
    private static double asymptotic(double ai, double bi) {
        if (bi < 30) {
            throw new IllegalStateException("asymptotic reference needs b >= 30, got " + bi);
        }
        final double z = 1 / (2 * bi * bi);
        final double series = 1 - z * (1 - 3 * z * (1 - 5 * z * (1 - 7 * z)));
        return Math.exp(Math.fma(-bi, bi, ai)) / (bi * Math.sqrt(Math.PI)) * series;
    }

    private static double naiveNumbers(double ai, double bi) {
        return Math.exp(ai) * Erfc.value(bi);
    }

    private static double naiveMath3(double ai, double bi) {
        return Math.exp(ai) * Erf.erfc(bi);
    }

    /**
     * Evaluates the chosen implementation at all {@code size} pairs (one fork per impl, so the
     * switch is monomorphic and hoisted).
     *
     * @return the values (written into a state array: stores cannot be eliminated)
     */
    @Benchmark
    public double[] expErfc() {
        final double[] as = a;
        final double[] bs = b;
        final double[] res = out;
        switch (which) {
            case OURS:
                for (int i = 0; i < as.length; i++) {
                    res[i] = ExpErfc.value(as[i], bs[i]);
                }
                return res;
            case NUMBERS:
                for (int i = 0; i < as.length; i++) {
                    res[i] = naiveNumbers(as[i], bs[i]);
                }
                return res;
            case MATH3:
                for (int i = 0; i < as.length; i++) {
                    res[i] = naiveMath3(as[i], bs[i]);
                }
                return res;
            default:
                throw new AssertionError(which);
        }
    }
}
