package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.advecta.convolution.GridMethod;
import org.advecta.convolution.HalfLineKernel;
import org.advecta.convolution.PiecewiseLinearProfile;
import org.advecta.convolution.ProfileConvolution;
import org.advecta.halfspace.Wall;
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
 * Sampled initial data on a uniform grid of N points convolved onto the same N output points
 * (the fast grid path of {@link ProfileConvolution#valuesOnGrid}) against the direct
 * per-point sum ({@link ProfileConvolution#values}).
 *
 * <p>{@code impl}:
 * <ul>
 *   <li>{@code window}: {@link GridMethod#WINDOW}, O(N·K), K ≈ 13·L/Δ offsets;</li>
 *   <li>{@code fft}: {@link GridMethod#FFT}, O(M log M), M the padded power of two ≥ N + K;</li>
 *   <li>{@code automatic}: {@link GridMethod#AUTOMATIC}, the cheaper by operation count
 *       (the choice this benchmark is meant to calibrate);</li>
 *   <li>{@code direct}: the per-point exact sum over the segments within the underflow reach
 *       (≈ 2·38·L/Δ segments per point): the baseline a user without the grid path has.</li>
 * </ul>
 * {@code size} is N (10³ … 10⁶), {@code width} the kernel width L = √(4Dt/R) in grid
 * spacings (4: a window of ~55 offsets; 64: ~830). The target of the issue: N = 10⁶ in under
 * 1 s on one core, cost growing no faster than N log N. The direct sum grows like N·L/Δ: a
 * smoke run measured about 0.3 s (width 4) and 5 s (width 64) per call at N = 10⁴, so at
 * N = 10⁶ expect about 30 s and 500 s per call; exclude that corner with {@code -p} if the
 * full matrix is too long (e.g. {@code -p impl=direct -p size=1000,10000,100000}).
 *
 * <p>{@code wall}: {@code line} (the infinite line, data and outputs centred on 0);
 * {@code absorbing} (a {@link HalfLineKernel} with an absorbing wall at 0, v &gt; 0 away from
 * it) and {@code zeroflux} (a zero-flux wall, v &lt; 0 towards it: the pile-up), data and
 * outputs from the wall on. Beside a wall the method applies to the free part; the wall terms
 * add O(K) multiply-adds at the ≲ 14·L/Δ outputs they reach (so their share falls with N), and
 * the direct route evaluates the wall's closed forms at every segment within reach of every
 * point. To time only the walls: {@code -p wall=absorbing,zeroflux}.
 *
 * <p>Each call is long, so the mode is single-shot time. Data are random from a fixed, logged
 * seed; results go to a state array that is returned (no dead code). {@link #verify()} checks
 * before timing that the grid methods agree with the direct sum within the returned bound
 * (twice it beside a wall, where the direct route's own error obeys the same per-segment
 * contract) on 2000 points spread over the grid.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(1)
public class ConvolutionPerformance {

    /** What is timed. */
    @Param({"window", "fft", "automatic", "direct"})
    public String impl;

    /** Number of samples and of output points. */
    @Param({"1000", "10000", "100000", "1000000"})
    public int size;

    /** The domain: the infinite line, or the half-line with an absorbing or zero-flux wall. */
    @Param({"line", "absorbing", "zeroflux"})
    public String wall;

    /** Kernel width L in grid spacings. */
    @Param({"4", "64"})
    public double width;

    /** Seed of the random data (logged in setup). */
    @Param({"20261202"})
    public long seed;

    private double spacing = 0.01;
    private double t = 1.0;
    private double outOrigin;
    private ProfileConvolution solution;
    private double[] x;
    private double[] out;
    private double slack;

    @Setup(Level.Trial)
    public void setUp() {
        // L = √(4Dt/R) = width·Δ with R = 1, t = 1: D = (width·Δ)²/4
        final double d = width * spacing * width * spacing / 4;
        final boolean line = "line".equals(wall);
        final double v = "zeroflux".equals(wall) ? -0.37 : 0.37;
        final TransportParameters p = TransportParameters.of(v, d).withDecay(0.05);
        System.out.printf(Locale.ROOT, "%n[ConvolutionPerformance] seed = %d, impl = %s, size = %d,"
            + " width = %s, wall = %s%n", seed, impl, size, width, wall);
        final SplittableRandom random = new SplittableRandom(seed);
        final double[] f = new double[size];
        for (int j = 0; j < size; j++) {
            f[j] = random.nextDouble() * (1 + Math.sin(j * 1e-3));
        }
        final double origin = line ? -0.5 * size * spacing : 0.0;
        final PiecewiseLinearProfile data = PiecewiseLinearProfile.uniform(origin, spacing, f,
            PiecewiseLinearProfile.Extension.ZERO);
        switch (wall) {
            case "line":
                solution = ProfileConvolution.of(p, data);
                break;
            case "absorbing":
                solution = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ABSORBING), data);
                break;
            case "zeroflux":
                solution = ProfileConvolution.of(HalfLineKernel.of(p, Wall.ZERO_FLUX), data);
                break;
            default:
                throw new IllegalArgumentException("wall: " + wall);
        }
        outOrigin = line ? -0.5 * size * spacing + 0.25 * spacing : 0.0;
        // beside a wall the direct route obeys the same per-segment contract the bound sums
        slack = line ? 1.0 : 2.0;
        x = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = Math.fma(i, spacing, outOrigin);
        }
        out = new double[size];
        verify();
    }

    /** Throws unless every grid method agrees with the direct sum within its bound. */
    void verify() {
        final int stride = Math.max(1, size / 2000);
        for (GridMethod m : GridMethod.values()) {
            final double[] grid = new double[size];
            final double bound = solution.valuesOnGrid(outOrigin, t, grid, m);
            for (int i = 0; i < size; i += stride) {
                final double direct = solution.value(x[i], t);
                if (!(Math.abs(grid[i] - direct) <= slack * bound + 1e-15)) {
                    throw new IllegalStateException(String.format(Locale.ROOT,
                        "%s at i = %d: grid %s, direct %s, bound %s", m, i, grid[i], direct, bound));
                }
            }
        }
    }

    @Benchmark
    public double[] convolve() {
        switch (impl) {
            case "window":
                solution.valuesOnGrid(outOrigin, t, out, GridMethod.WINDOW);
                break;
            case "fft":
                solution.valuesOnGrid(outOrigin, t, out, GridMethod.FFT);
                break;
            case "automatic":
                solution.valuesOnGrid(outOrigin, t, out, GridMethod.AUTOMATIC);
                break;
            case "direct":
                solution.values(x, t, out);
                break;
            default:
                throw new IllegalArgumentException("impl: " + impl);
        }
        return out;
    }
}
