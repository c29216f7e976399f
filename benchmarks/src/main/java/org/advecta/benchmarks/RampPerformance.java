package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.function.DoubleBinaryOperator;
import org.advecta.convolution.FunctionInlet;
import org.advecta.convolution.InletCondition;
import org.advecta.solution.InletRamp;
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
 * The ramp response W(x, t) (inlet input g(t) = t), the building block of a linearly
 * interpolated inlet series, in closed form ({@link InletRamp}) against the route a user would
 * otherwise take: Duhamel's integral of the impulse response with the library's adaptive
 * quadrature ({@link FunctionInlet} with g(t) = t, relative tolerance 1e-13), in one run.
 *
 * <p>{@code family}: {@code firstType} (μ = 0.02), {@code thirdType} (μ = 0) and
 * {@code thirdTypeDecay} (μ = 0.02, the closed form of this release). v = 0.5, D = 0.05,
 * R = 1.5; x uniform in [0.05, 5] (Péclet vx/D in [0.5, 50]) and t = f·Rx/v with f
 * log-uniform in [1/2, 2], so that points lie ahead of, at and behind the front. Timed per
 * call on {@code size} points. {@link #verify()} checks before timing that the two agree within
 * the quadrature's estimate plus 1e-12 relative at every point.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class RampPerformance {

    /** What is timed. */
    @Param({"closedForm", "quadrature"})
    public String impl;

    /** Inlet type and decay. */
    @Param({"firstType", "thirdType", "thirdTypeDecay"})
    public String family;

    /** Number of (x, t) points per call. */
    @Param({"256"})
    public int size;

    /** Seed of the random points (logged in setup). */
    @Param({"20261202"})
    public long seed;

    private double v = 0.5;
    private double d = 0.05;
    private double r = 1.5;
    private double mu = 0.02;

    private InletRamp ramp;
    private FunctionInlet duhamel;
    private DoubleBinaryOperator timed;
    private double[] x;
    private double[] t;
    private double[] out;

    @Setup(Level.Trial)
    public void setUp() {
        final boolean third = !family.equals("firstType");
        final double decay = family.equals("thirdType") ? 0.0 : mu;
        final TransportParameters p = TransportParameters.of(v, d).withRetardation(r)
            .withDecay(decay);
        ramp = third ? InletRamp.thirdType(p) : InletRamp.firstType(p);
        duhamel = FunctionInlet.of(p, third ? InletCondition.THIRD_TYPE
            : InletCondition.FIRST_TYPE, s -> s).withTolerance(1e-300, 1e-13);
        switch (impl) {
            case "closedForm":
                timed = ramp::value;
                break;
            case "quadrature":
                timed = (xi, ti) -> duhamel.value(xi, ti).value();
                break;
            default:
                throw new IllegalArgumentException("impl: " + impl);
        }
        final SplittableRandom random = new SplittableRandom(seed);
        x = new double[size];
        t = new double[size];
        out = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = random.nextDouble(0.05, 5);
            t[i] = Math.pow(2, random.nextDouble(-1, 1)) * r * x[i] / v;
        }
        System.out.printf(Locale.ROOT, "%n[RampPerformance] seed = %d, impl = %s, family = %s,"
            + " size = %d, v = %s, D = %s, R = %s, mu = %s%n", seed, impl, family, size, v, d, r,
            decay);
        verify();
    }

    /** Throws unless closed form and quadrature agree within its estimate + 1e-12 relative. */
    private void verify() {
        double worst = 0;
        for (int i = 0; i < size; i++) {
            final double c = ramp.value(x[i], t[i]);
            final var q = duhamel.value(x[i], t[i]);
            final double diff = Math.abs(c - q.value());
            if (!(Double.isFinite(c) && diff <= q.error() + 1e-12 * Math.abs(c))) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "%s at x = %s, t = %s: closed form %s, quadrature %s", family, x[i], t[i], c,
                    q));
            }
            worst = Math.max(worst, diff / Math.abs(c));
        }
        System.out.printf(Locale.ROOT, "[RampPerformance] verified %d points: max relative"
            + " |closed form - quadrature| %.3g%n", size, worst);
    }

    /**
     * Evaluates the chosen implementation at all {@code size} points.
     *
     * @return the values
     */
    @Benchmark
    public double[] ramp() {
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
