package org.advecta.benchmarks;

import java.util.Locale;
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
 * A profile c(x, t) at one time on a mesh of {@code size} points, as a simulator's check
 * evaluates it: advecta's {@link Solution1D#values(double[], double, double[])} ({@code ours}),
 * which computes the time's quantities once, against the naive textbook formula called point by
 * point ({@code numbers}: Commons Numbers; {@code math3}: Commons Math 3), for each
 * {@code family} of {@link SolutionFamily} in the same setting as {@link SolutionPerformance}.
 *
 * <p>The mesh is uniform on [0.05, 5] (Péclet vx/D in [0.5, 50]) and the time is
 * t = R·2.5/v = 7.5, when the front stands in the middle of the mesh (and the pulse of
 * duration 4 has ended). Setup verifies that both naive forms agree with ours to 1e−9 relative
 * at every point.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ProfilePerformance {

    /** What is timed. */
    @Param({"ours", "numbers", "math3"})
    public String impl;

    /** Which closed-form solution. */
    @Param({"firstType", "firstTypeDecay", "thirdType", "pulse", "step", "slug"})
    public String family;

    /** Number of mesh points. */
    @Param({"1024"})
    public int size;

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
    private double time;

    private Solution1D ours;
    private DoubleBinaryOperator naive;
    private boolean timedOurs;
    private double[] x;
    private double[] out;

    @Setup(Level.Trial)
    public void setUp() {
        final SolutionFamily which = SolutionFamily.of(family);
        final SolutionFamily.Setting setting =
            new SolutionFamily.Setting(v, d, r, mu, c0, t0, x0, slugA, slugB);
        ours = which.ours(setting);
        naive = "math3".equals(impl) ? which.math3(setting) : which.numbers(setting);
        if (!impl.equals("ours") && !impl.equals("numbers") && !impl.equals("math3")) {
            throw new IllegalArgumentException("impl: " + impl);
        }
        timedOurs = impl.equals("ours");
        time = r * 2.5 / v;
        x = new double[size];
        out = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = xMin + (xMax - xMin) * i / (size - 1);
        }
        verify(which, setting);
    }

    private void verify(SolutionFamily which, SolutionFamily.Setting setting) {
        final double[] c = new double[size];
        ours.values(x, time, c);
        double worst = 0;
        for (DoubleBinaryOperator f : new DoubleBinaryOperator[] {which.numbers(setting),
            which.math3(setting)}) {
            for (int i = 0; i < size; i++) {
                if (!(Math.abs(c[i]) >= Double.MIN_NORMAL && Math.abs(c[i]) < Double.MAX_VALUE)) {
                    throw new IllegalStateException(String.format(Locale.ROOT,
                        "%s: ours(%s, %s) = %s, not a normal double", family, x[i], time, c[i]));
                }
                final double rel = Math.abs(f.applyAsDouble(x[i], time) - c[i]) / Math.abs(c[i]);
                if (!(rel <= TOLERANCE)) {
                    throw new IllegalStateException(String.format(Locale.ROOT,
                        "%s at x = %s: naive differs from ours by %s relative", family, x[i], rel));
                }
                worst = Math.max(worst, rel);
            }
        }
        System.out.printf(Locale.ROOT, "%n[ProfilePerformance] %s, %s, t = %s: %d points verified,"
            + " max relative |naive - ours| %.3g (tolerance %.0e)%n", impl, family, time, size,
            worst, TOLERANCE);
    }

    /**
     * Evaluates the profile.
     *
     * @return the values (written into a state array: stores cannot be eliminated)
     */
    @Benchmark
    public double[] profile() {
        final double[] xs = x;
        final double[] res = out;
        final double t = time;
        if (timedOurs) {
            ours.values(xs, t, res);
            return res;
        }
        final DoubleBinaryOperator f = naive;
        for (int i = 0; i < xs.length; i++) {
            res[i] = f.applyAsDouble(xs[i], t);
        }
        return res;
    }
}
