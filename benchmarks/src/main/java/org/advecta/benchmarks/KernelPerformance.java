package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.advecta.kernel.FreeSpaceKernel1D;
import org.advecta.transport.TransportParameters;
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
 * Evaluation of the 1D free-space kernel G(x, t) at an array of positions, one time.
 *
 * <p>One benchmark, {@link #kernel()}, timed per call on an array of {@code size} points (divide
 * the score by {@code size} for ns per point), for each {@code impl}:
 * <ul>
 *   <li>{@code batch}: {@link FreeSpaceKernel1D#value(double[], double, double[])};</li>
 *   <li>{@code scalar}: {@link FreeSpaceKernel1D#value(double, double)} once per point;</li>
 *   <li>{@code naive}: the textbook formula a user would write,
 *       {@code exp(-mu t/R) / sqrt(4 pi D t/R) * exp(-(x - x0 - v t/R)^2 R / (4 D t))};</li>
 *   <li>{@code exp}: the floor, {@code out[i] = Math.exp(-x[i] * x[i])}, one exp per point and
 *       nothing else (a different function: not compared with the others in verify).</li>
 * </ul>
 *
 * <p>The parameters are chosen so that 4Dt/R = 1: the kernel's exponent is (x − centre)², of
 * the same size as the floor's x², so both exps see arguments in the same range. Regimes
 * ({@code regime}) for the scaled distance q = (x − centre)²·R/(4Dt):
 * <ul>
 *   <li>{@code bulk}: x − centre uniform in [−4, 4], q ≤ 16 (G from its peak down to ~1e−7 of it);</li>
 *   <li>{@code full}: x − centre uniform in [−28, 28], q ≤ 784: the bulk, the far tails, the
 *       subnormal range (q &gt; ~708) and underflow to 0 (q &gt; ~745).</li>
 * </ul>
 *
 * <p>Inputs live in this state object (nothing constant-folds), results are written into a
 * state array and returned (nothing is dead code), positions are random from a fixed, logged
 * seed, and {@link #verify()} checks before timing that batch and scalar agree bit for bit and
 * that the naive formula agrees with them to within its own rounding.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class KernelPerformance {

    /** What is timed. */
    @Param({"batch", "scalar", "naive", "exp"})
    public String impl;

    /** Where the positions lie relative to the plume. */
    @Param({"bulk", "full"})
    public String regime;

    /** Number of positions per call. */
    @Param({"1024"})
    public int size;

    /** Seed of the random positions (logged in setup). */
    @Param({"20250611"})
    public long seed;

    // Transport parameters: 4 D t / R = 4 * 0.3 * 1.25 / 1.5 = 1. Non-final fields, so the JIT
    // cannot fold them.
    private double v = 0.8;
    private double d = 0.3;
    private double r = 1.5;
    private double mu = 0.05;
    private double x0 = 0.25;
    private double t = 1.25;

    private FreeSpaceKernel1D kernel;
    private double[] x;
    private double[] out;
    private Impl which;

    private enum Impl { BATCH, SCALAR, NAIVE, EXP }

    @Setup(Level.Trial)
    public void setUp() {
        which = Impl.valueOf(impl.toUpperCase(Locale.ROOT));
        kernel = FreeSpaceKernel1D.of(TransportParameters.of(v, d).withRetardation(r).withDecay(mu), x0);
        final double centre = x0 + v * t / r;
        final double halfWidth;
        switch (regime) {
            case "bulk":
                halfWidth = 4;
                break;
            case "full":
                halfWidth = 28;
                break;
            default:
                throw new IllegalArgumentException("regime: " + regime);
        }
        System.out.printf(Locale.ROOT, "%n[KernelPerformance] seed = %d, impl = %s, regime = %s, size = %d%n",
            seed, impl, regime, size);
        final SplittableRandom random = new SplittableRandom(seed);
        x = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = centre + random.nextDouble(-halfWidth, halfWidth);
        }
        out = new double[size];
        verify();
    }

    /**
     * Throws unless the batch and scalar evaluations agree bit for bit and the naive formula
     * agrees with them to within its rounding of the exponent: relative error about q·2⁻⁵³
     * where the result is normal; both below 1e−300 where it underflows.
     */
    private void verify() {
        final double[] batch = new double[size];
        kernel.value(x, t, batch);
        final double[] naive = naive(x, new double[size]);
        int zeros = 0;
        double worst = 0;
        for (int i = 0; i < size; i++) {
            final double scalar = kernel.value(x[i], t);
            if (Double.doubleToRawLongBits(scalar) != Double.doubleToRawLongBits(batch[i])) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "batch %s != scalar %s at x = %s", batch[i], scalar, x[i]));
            }
            if (!(batch[i] >= 0 && batch[i] < Double.POSITIVE_INFINITY)) {
                throw new IllegalStateException("not finite: G(" + x[i] + ") = " + batch[i]);
            }
            final double xi = x[i] - x0 - v * t / r;
            final double q = xi * xi * r / (4 * d * t);
            final double diff = Math.abs(batch[i] - naive[i]);
            final double scale = Math.max(Math.abs(batch[i]), Math.abs(naive[i]));
            if (scale < 1e-300) {
                zeros += batch[i] == 0 ? 1 : 0;
                continue;
            }
            final double rel = diff / scale;
            worst = Math.max(worst, rel);
            if (rel > 1e-14 * (q + 10)) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "ours %s vs naive %s at x = %s (q = %s)", batch[i], naive[i], x[i], q));
            }
        }
        System.out.printf(Locale.ROOT,
            "[KernelPerformance] verified: batch == scalar bitwise; max relative |ours - naive| = %.3g"
                + " where >= 1e-300; %d of %d values underflow to 0%n", worst, zeros, size);
    }

    /** The kernel as a user would write it from the formula. */
    private double[] naive(double[] xs, double[] res) {
        final double v = this.v;
        final double d = this.d;
        final double r = this.r;
        final double mu = this.mu;
        final double x0 = this.x0;
        final double t = this.t;
        for (int i = 0; i < xs.length; i++) {
            final double xx = xs[i];
            res[i] = Math.exp(-mu * t / r) / Math.sqrt(4 * Math.PI * d * t / r)
                * Math.exp(-(xx - x0 - v * t / r) * (xx - x0 - v * t / r) * r / (4 * d * t));
        }
        return res;
    }

    /** One exp per point, nothing else: the floor. */
    private static double[] bareExp(double[] xs, double[] res) {
        for (int i = 0; i < xs.length; i++) {
            res[i] = Math.exp(-xs[i] * xs[i]);
        }
        return res;
    }

    private double[] scalar(double[] xs, double[] res) {
        final FreeSpaceKernel1D k = kernel;
        final double time = t;
        for (int i = 0; i < xs.length; i++) {
            res[i] = k.value(xs[i], time);
        }
        return res;
    }

    /**
     * Evaluates the chosen implementation at all {@code size} positions (one fork per impl, so
     * the switch is monomorphic and hoisted).
     *
     * @return the values (written into a state array: stores cannot be eliminated)
     */
    @Benchmark
    public double[] kernel() {
        switch (which) {
            case BATCH:
                kernel.value(x, t, out);
                return out;
            case SCALAR:
                return scalar(x, out);
            case NAIVE:
                return naive(x, out);
            case EXP:
                return bareExp(x, out);
            default:
                throw new AssertionError(which);
        }
    }
}
