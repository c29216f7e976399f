package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.advecta.halfspace.HalfSpaceKernel1D;
import org.advecta.halfspace.Wall;
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
 * The cost of the half-space kernel ({@link HalfSpaceKernel1D}) relative to the free-space
 * kernel ({@link FreeSpaceKernel1D}), in one run: the ratio of their scores is the answer.
 *
 * <p>One benchmark, {@link #kernel()}, evaluating {@code size} positions at one time through
 * the batch method of the chosen {@code impl}:
 * <ul>
 *   <li>{@code free}: {@link FreeSpaceKernel1D#value(double[], double, double[])}, the baseline;</li>
 *   <li>{@code absorbing}: the absorbing wall (one exponential and one expm1 more);</li>
 *   <li>{@code zeroFlux}: the zero-flux wall (with v &gt; 0: erfcx and φ as well; with v &lt; 0:
 *       a second exp·erfcx term).</li>
 * </ul>
 * {@code flow}: {@code away} (v &gt; 0) or {@code toward} (v &lt; 0) the wall. Positions are
 * uniform over [0, ξ + |v|t/R + 6L] from a fixed, logged seed, covering the wall layer, the
 * plume and its tail. {@link #verify()} checks before timing that batch equals scalar bit for
 * bit, that every value is finite and non-negative, and that the half-space kernel agrees
 * with the free-space kernel where the wall is out of reach (ξ moved 40 L away).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class HalfSpacePerformance {

    /** What is timed. */
    @Param({"free", "absorbing", "zeroFlux"})
    public String impl;

    /** Direction of the flow relative to the wall. */
    @Param({"away", "toward"})
    public String flow;

    /** Number of positions per call. */
    @Param({"1024"})
    public int size;

    /** Seed of the random positions (logged in setup). */
    @Param({"20261202"})
    public long seed;

    private double speed = 0.8;
    private double d = 0.3;
    private double r = 1.5;
    private double mu = 0.05;
    private double xi = 1.5;
    private double t = 1.25;

    private FreeSpaceKernel1D free;
    private HalfSpaceKernel1D half;
    private double[] x;
    private double[] out;
    private boolean baseline;

    @Setup(Level.Trial)
    public void setUp() {
        final double v = "away".equals(flow) ? speed : -speed;
        final TransportParameters p = TransportParameters.of(v, d).withRetardation(r).withDecay(mu);
        free = FreeSpaceKernel1D.of(p, xi);
        switch (impl) {
            case "free":
                baseline = true;
                half = HalfSpaceKernel1D.of(p, Wall.ABSORBING, xi);
                break;
            case "absorbing":
                half = HalfSpaceKernel1D.of(p, Wall.ABSORBING, xi);
                break;
            case "zeroFlux":
                half = HalfSpaceKernel1D.of(p, Wall.ZERO_FLUX, xi);
                break;
            default:
                throw new IllegalArgumentException("impl: " + impl);
        }
        final double len = Math.sqrt(4 * d * t / r);
        final double reach = xi + speed * t / r + 6 * len;
        System.out.printf(Locale.ROOT,
            "%n[HalfSpacePerformance] seed = %d, impl = %s, flow = %s, size = %d%n",
            seed, impl, flow, size);
        final SplittableRandom random = new SplittableRandom(seed);
        x = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = random.nextDouble(0, reach);
        }
        out = new double[size];
        verify(p, len);
    }

    private void verify(TransportParameters p, double len) {
        final double[] batch = new double[size];
        half.value(x, t, batch);
        for (int i = 0; i < size; i++) {
            final double scalar = half.value(x[i], t);
            if (Double.doubleToRawLongBits(scalar) != Double.doubleToRawLongBits(batch[i])) {
                throw new IllegalStateException("batch != scalar at x = " + x[i]);
            }
            if (!(batch[i] >= 0 && batch[i] < Double.POSITIVE_INFINITY)) {
                throw new IllegalStateException("c(" + x[i] + ") = " + batch[i]);
            }
        }
        // far from the wall the two kernels are the same function
        final double far = xi + 40 * len + speed * t / r;
        final HalfSpaceKernel1D distant = HalfSpaceKernel1D.of(p, half.wall(), far);
        final FreeSpaceKernel1D reference = FreeSpaceKernel1D.of(p, far);
        double worst = 0;
        for (int i = 0; i < size; i++) {
            final double y = far + p.retardedVelocity() * t + (x[i] / reachOf(len) - 0.5) * 6 * len;
            final double a = distant.value(y, t);
            final double b = reference.value(y, t);
            final double rel = Math.abs(a - b) / Math.max(b, Double.MIN_NORMAL);
            worst = Math.max(worst, rel);
            if (rel > 1e-13) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "half-space %s vs free %s at y = %s", a, b, y));
            }
        }
        System.out.printf(Locale.ROOT, "[HalfSpacePerformance] verified: batch == scalar bitwise, "
            + "all finite and >= 0; far from the wall max relative |half - free| = %.3g%n", worst);
    }

    private double reachOf(double len) {
        return xi + speed * t / r + 6 * len;
    }

    /**
     * Evaluates the chosen kernel at all {@code size} positions.
     *
     * @return the values (a state array: the stores cannot be eliminated)
     */
    @Benchmark
    public double[] kernel() {
        if (baseline) {
            free.value(x, t, out);
        } else {
            half.value(x, t, out);
        }
        return out;
    }
}
