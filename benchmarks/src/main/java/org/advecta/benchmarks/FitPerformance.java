package org.advecta.benchmarks;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.advecta.fit.FitResult;
import org.advecta.fit.ModelFamily;
import org.advecta.fit.Observable;
import org.advecta.fit.Observations;
import org.advecta.fit.Parameter;
import org.advecta.fit.ParameterFit;
import org.advecta.fit.TransportModel;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
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
 * Time to fit v and D to a 200-point breakthrough curve: {@link ParameterFit#fit} on the
 * flux-averaged concentration of a third-type inlet with a pulse input (t₀ = 0.5, C₀ = 1,
 * R = 1, μ = 0 fixed), true v = 0.6, D = 0.015, observed at x = 1 for t in [0.1, 5], with
 * Gaussian noise of 1 % of the peak from a fixed, logged seed.
 *
 * <p>{@code start}: {@code moments} lets the fit form its starting guess from the curve's
 * temporal moments (the default a user gets); {@code given} starts from v = 0.5, D = 0.02.
 * {@link #verify()} in the setup checks that both converge, to the same estimates within
 * 1e-6 relative, and that the estimates lie within 5 standard errors of the truth.
 *
 * <p>The data live in this state object and the result is returned (nothing is folded or
 * eliminated). One call is one complete fit.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class FitPerformance {

    /** Where the starting values come from. */
    @Param({"moments", "given"})
    public String start;

    /** Number of points of the curve. */
    @Param({"200"})
    public int size;

    /** Seed of the noise (logged in setup). */
    @Param({"20250611"})
    public long seed;

    private double v = 0.6;
    private double d = 0.015;
    private double x = 1.0;
    private double noise = 0.01;

    private TransportModel model;
    private Observations data;

    @Setup(Level.Trial)
    public void setUp() {
        final ModelFamily family = ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.5));
        final Solution1D truth = family.create(TransportParameters.of(v, d), 1.0);
        final double[] t = new double[size];
        final double[] c = new double[size];
        double peak = 0;
        for (int i = 0; i < size; i++) {
            t[i] = 0.1 + 4.9 * i / (size - 1);
            c[i] = truth.fluxAveraged(x, t[i]);
            peak = Math.max(peak, c[i]);
        }
        final SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < size; i++) {
            final double u = 1 - random.nextDouble();
            c[i] += noise * peak * Math.sqrt(-2 * Math.log(u))
                * Math.cos(2 * Math.PI * random.nextDouble());
        }
        data = Observations.breakthrough(x, t, c);
        model = model(start, family);
        System.out.printf(Locale.ROOT, "%n[FitPerformance] seed = %d, start = %s, size = %d%n",
            seed, start, size);
        verify(family);
    }

    private static TransportModel model(String start, ModelFamily family) {
        final TransportModel m = TransportModel.of(family, Observable.FLUX_AVERAGED);
        switch (start) {
            case "moments":
                return m;
            case "given":
                return m.withValue(Parameter.VELOCITY, 0.5).withValue(Parameter.DISPERSION, 0.02);
            default:
                throw new IllegalArgumentException("start: " + start);
        }
    }

    /** Throws unless both starts converge to the same estimates near the truth. */
    private void verify(ModelFamily family) {
        final FitResult a = ParameterFit.fit(model("moments", family), data);
        final FitResult b = ParameterFit.fit(model("given", family), data);
        for (FitResult r : new FitResult[] {a, b}) {
            if (!r.isConverged()) {
                throw new IllegalStateException("fit did not converge: " + r);
            }
        }
        for (Parameter p : new Parameter[] {Parameter.VELOCITY, Parameter.DISPERSION}) {
            final double rel = Math.abs(a.value(p) - b.value(p)) / Math.abs(b.value(p));
            if (!(rel <= 1e-6)) {
                throw new IllegalStateException(p + ": the two starts disagree: " + a + " vs " + b);
            }
        }
        if (!(Math.abs(a.value(Parameter.VELOCITY) - v) <= 5 * a.standardError(Parameter.VELOCITY)
            && Math.abs(a.value(Parameter.DISPERSION) - d)
                <= 5 * a.standardError(Parameter.DISPERSION))) {
            throw new IllegalStateException("estimates far from the truth: " + a);
        }
        System.out.printf(Locale.ROOT, "[FitPerformance] verified: %s (%d evaluations)%n", a,
            a.evaluations());
    }

    /**
     * One complete fit.
     *
     * @return the result
     */
    @Benchmark
    public FitResult fit() {
        return ParameterFit.fit(model, data);
    }
}
