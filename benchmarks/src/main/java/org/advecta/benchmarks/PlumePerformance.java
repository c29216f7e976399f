package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.advecta.quadrature.Estimate;
import org.advecta.plume.LineSource2D;
import org.advecta.plume.PatchSource3D;
import org.advecta.plume.PointSource3D;
import org.advecta.plume.RateHistory;
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
 * Cost per evaluation of each continuous source, and of the closed forms against the
 * quadratures that compute the same quantity.
 *
 * <p>One benchmark, {@link #plume()}, timed per call on {@code size} random points (divide the
 * score by {@code size} for ns per evaluation), for each {@code impl}:
 * <ul>
 *   <li>{@code pointValue}: {@link PointSource3D#value(double, double, double, double)}, the
 *       closed form with its erfc pair;</li>
 *   <li>{@code pointAsPatch}: the same point source as a 10⁻⁵-wide square
 *       {@link PatchSource3D} (quadrature in time of erf products): what the closed form
 *       saves (agreement checked in {@link #verify()}: O(h²), below 1e−6);</li>
 *   <li>{@code pointSteady}: {@link PointSource3D#steadyValue(double, double, double)};</li>
 *   <li>{@code lineValue}: {@link LineSource2D#value(double, double, double)} (quadrature);</li>
 *   <li>{@code lineSteady}: {@link LineSource2D#steadyValue(double, double)}, the closed form
 *       with K₀;</li>
 *   <li>{@code lineLate}: {@link LineSource2D#value(double, double, double)} at a time late
 *       enough to equal the steady state: the quadrature the K₀ closed form replaces;</li>
 *   <li>{@code patchValue}, {@code patchSteady}: {@link PatchSource3D} (quadrature);</li>
 *   <li>{@code massFlux}: {@link PointSource3D#massFlux(double, double)} (closed form);</li>
 *   <li>{@code lineHistory}: the line source with a unit pulse over [0, 1]
 *       ({@link LineSource2D#withRateHistory(RateHistory)}, one Duhamel window per piece);</li>
 *   <li>{@code lineHistorySteps}: the same pulse as a user might write it, the constant source
 *       at t minus the constant source at t − 1 (cancels once the pulse has passed).</li>
 * </ul>
 *
 * <p>Points: x uniform in [0.05, 5], y in [−1, 1], z in [−0.5, 0.5] around a source at the
 * origin, from a fixed, logged seed; t = 3 (about the travel time to x = 3). Results go into
 * a state array that is returned.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class PlumePerformance {

    /** What is timed. */
    @Param({"pointValue", "pointAsPatch", "pointSteady", "lineValue", "lineSteady", "lineLate",
        "patchValue", "patchSteady", "massFlux", "lineHistory", "lineHistorySteps"})
    public String impl;

    /** Number of points per call. */
    @Param({"256"})
    public int size;

    /** Seed of the random points (logged in setup). */
    @Param({"20261202"})
    public long seed;

    private double t = 3.0;
    private double late = 1e5;
    private PointSource3D point;
    private PatchSource3D tinyPatch;
    private LineSource2D line;
    private LineSource2D linePulse;
    private PatchSource3D patch;
    private double[] x;
    private double[] y;
    private double[] z;
    private double[] out;

    @Setup(Level.Trial)
    public void setUp() {
        final TransportParameters p = TransportParameters.of(1.0, 0.1)
            .withDispersion(0.1, 0.01, 0.005).withRetardation(1.2).withDecay(0.01);
        point = PointSource3D.of(p, 0, 0, 0, 1.0);
        final double h = 0.5e-5;
        tinyPatch = PatchSource3D.of(p, 0, -h, h, -h, h, 1.0);
        line = LineSource2D.of(p, 0, 0, 1.0);
        linePulse = line.withRateHistory(RateHistory.of(new double[] {0, 1},
            new double[] {1, 0}));
        patch = PatchSource3D.of(p, 0, -0.5, 0.5, -0.25, 0.25, 1.0);
        System.out.printf(Locale.ROOT, "%n[PlumePerformance] seed = %d, impl = %s, size = %d%n",
            seed, impl, size);
        final SplittableRandom random = new SplittableRandom(seed);
        x = new double[size];
        y = new double[size];
        z = new double[size];
        for (int i = 0; i < size; i++) {
            x[i] = random.nextDouble(0.05, 5);
            y[i] = random.nextDouble(-1, 1);
            z[i] = random.nextDouble(-0.5, 0.5);
        }
        out = new double[size];
        verify();
    }

    /**
     * Throws unless the compared implementations agree: the point source's closed form and
     * the tiny patch within 1e−6 relative (O(h²) of the patch's size) where above 1e−100;
     * the late-time line quadrature and the K₀ steady state within the quadrature's bound;
     * batch and scalar line evaluations bit for bit; the pulse and the difference of two
     * constant sources within the sum of their bounds.
     */
    private void verify() {
        double worstPatch = 0;
        double worstLine = 0;
        final double[] batch = new double[size];
        final double[] error = new double[size];
        line.value(x, y, t, batch, error);
        for (int i = 0; i < size; i++) {
            final double c = point.value(x[i], y[i], z[i], t);
            final double q = tinyPatch.value(x[i], y[i], z[i], t);
            if (c > 1e-100) {
                final double rel = Math.abs(q - c) / c;
                worstPatch = Math.max(worstPatch, rel);
                if (!(rel < 1e-6)) {
                    throw new IllegalStateException(String.format(Locale.ROOT,
                        "point %s vs tiny patch %s at (%s, %s, %s)", c, q, x[i], y[i], z[i]));
                }
            }
            final Estimate e = line.estimate(x[i], y[i], late);
            final double s = line.steadyValue(x[i], y[i]);
            worstLine = Math.max(worstLine, Math.abs(e.value() - s) / s);
            if (!(Math.abs(e.value() - s) <= e.error() + 1e-14 * s)) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "line late %s vs steady %s at (%s, %s)", e, s, x[i], y[i]));
            }
            final Estimate pulse = linePulse.estimate(x[i], y[i], t);
            final Estimate on = line.estimate(x[i], y[i], t);
            final Estimate off = line.estimate(x[i], y[i], t - 1);
            if (!(Math.abs(pulse.value() - (on.value() - off.value()))
                    <= pulse.error() + on.error() + off.error())) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                    "line pulse %s vs steps %s - %s at (%s, %s)", pulse, on, off, x[i], y[i]));
            }
            final Estimate at = line.estimate(x[i], y[i], t);
            if (batch[i] != at.value() || error[i] != at.error()) {
                throw new IllegalStateException("line batch differs from scalar at " + i);
            }
        }
        System.out.printf(Locale.ROOT, "[PlumePerformance] verified: point vs tiny patch max "
            + "relative %.3g; late line quadrature vs K0 max relative %.3g%n", worstPatch,
            worstLine);
    }

    /**
     * Evaluates the chosen implementation at all points.
     *
     * @return the values (a state array, so the stores cannot be eliminated)
     */
    @Benchmark
    public double[] plume() {
        final double[] xs = x;
        final double[] ys = y;
        final double[] zs = z;
        final double[] res = out;
        final double time = t;
        switch (impl) {
            case "pointValue":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = point.value(xs[i], ys[i], zs[i], time);
                }
                break;
            case "pointAsPatch":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = tinyPatch.value(xs[i], ys[i], zs[i], time);
                }
                break;
            case "pointSteady":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = point.steadyValue(xs[i], ys[i], zs[i]);
                }
                break;
            case "lineValue":
                line.value(xs, ys, time, res, null);
                break;
            case "lineSteady":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = line.steadyValue(xs[i], ys[i]);
                }
                break;
            case "lineLate":
                line.value(xs, ys, late, res, null);
                break;
            case "patchValue":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = patch.value(xs[i], ys[i], zs[i], time);
                }
                break;
            case "patchSteady":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = patch.steadyEstimate(xs[i], ys[i], zs[i]).value();
                }
                break;
            case "massFlux":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = point.massFlux(xs[i], time);
                }
                break;
            case "lineHistory":
                linePulse.value(xs, ys, time, res, null);
                break;
            case "lineHistorySteps":
                for (int i = 0; i < xs.length; i++) {
                    res[i] = line.value(xs[i], ys[i], time) - line.value(xs[i], ys[i], time - 1);
                }
                break;
            default:
                throw new IllegalArgumentException("impl: " + impl);
        }
        return res;
    }
}
