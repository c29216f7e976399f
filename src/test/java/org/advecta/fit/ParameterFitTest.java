package org.advecta.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.advecta.solution.InitialStep;
import org.advecta.solution.InletInput;
import org.advecta.solution.Solution1D;
import org.advecta.transport.TransportParameters;
import org.junit.jupiter.api.Test;

/**
 * Fits of synthetic data made by the library: exact recovery from noise-free data, coverage of
 * the 95 % intervals under seeded noise, identifiability and bad-data reports.
 */
class ParameterFitTest {

    private static double[] grid(double from, double to, int n) {
        final double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            s[i] = from + (to - from) * i / (n - 1);
        }
        return s;
    }

    private static double[] breakthrough(Solution1D s, double x, double[] t, boolean flux) {
        final double[] c = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            c[i] = flux ? s.fluxAveraged(x, t[i]) : s.value(x, t[i]);
        }
        return c;
    }

    private static void assertRecovered(FitResult fit, Parameter p, double truth) {
        assertTrue(fit.isConverged(), fit::toString);
        assertEquals(truth, fit.value(p), 1e-8 * Math.abs(truth), () -> p + ": " + fit);
    }

    @Test
    void noiseFreePulseBreakthroughRecoversVAndDFromMoments() {
        final ModelFamily family = ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.3));
        final Solution1D truth = family.create(TransportParameters.of(0.8, 0.02), 2.5);
        final double[] t = grid(0.05, 4, 80);
        final Observations data = Observations.breakthrough(1.2, t,
            breakthrough(truth, 1.2, t, true));
        final FitResult fit = ParameterFit.fit(TransportModel.of(family,
            Observable.FLUX_AVERAGED).withValue(Parameter.SOURCE, 2.5), data);
        assertRecovered(fit, Parameter.VELOCITY, 0.8);
        assertRecovered(fit, Parameter.DISPERSION, 0.02);
        assertEquals(1.0, fit.rSquared(), 1e-12);
    }

    @Test
    void noiseFreeFitsOfOtherSubsetsAndFamilies() {
        // v, D, μ and C₀ of a first-type constant input, two positions, resident concentration
        final TransportParameters p = TransportParameters.of(0.5, 0.03).withRetardation(1.8)
            .withDecay(0.04);
        final ModelFamily first = ModelFamily.firstTypeInlet(InletInput.constant(1));
        final Solution1D s1 = first.create(p, 3.0);
        final double[] t = grid(0.1, 12, 60);
        final Observations two = Observations.breakthrough(1.0, t, breakthrough(s1, 1.0, t,
            false)).and(Observations.breakthrough(2.0, t, breakthrough(s1, 2.0, t, false)));
        final FitResult f1 = ParameterFit.fit(TransportModel.of(first, Observable.RESIDENT)
            .withFree(Parameter.VELOCITY, Parameter.DISPERSION, Parameter.DECAY,
                Parameter.SOURCE)
            .withValue(Parameter.RETARDATION, 1.8), two);
        assertRecovered(f1, Parameter.VELOCITY, 0.5);
        assertRecovered(f1, Parameter.DISPERSION, 0.03);
        assertRecovered(f1, Parameter.DECAY, 0.04);
        assertRecovered(f1, Parameter.SOURCE, 3.0);
        assertEquals(4, f1.correlation().length);

        // R free with v fixed, first-type pulse
        final ModelFamily pulse = ModelFamily.firstTypeInlet(InletInput.pulse(1, 1.0));
        final Solution1D s2 = pulse.create(p, 1.0);
        final double[] t2 = grid(0.2, 15, 70);
        final FitResult f2 = ParameterFit.fit(TransportModel.of(pulse, Observable.RESIDENT)
            .withFree(Parameter.DISPERSION, Parameter.RETARDATION)
            .withValue(Parameter.VELOCITY, 0.5).withValue(Parameter.DECAY, 0.04),
            Observations.breakthrough(1.5, t2, breakthrough(s2, 1.5, t2, false)));
        assertRecovered(f2, Parameter.RETARDATION, 1.8);
        assertRecovered(f2, Parameter.DISPERSION, 0.03);

        // profiles: a Gaussian plume at two times (v, D and mass free), a step at one time
        final ModelFamily plume = ModelFamily.gaussian(0.2, 0.1);
        final Solution1D s3 = plume.create(p, 0.7);
        final double[] x = grid(-1, 4, 50);
        final double[] c3a = new double[x.length];
        final double[] c3b = new double[x.length];
        s3.values(x, 2.0, c3a);
        s3.values(x, 4.0, c3b);
        final FitResult f3 = ParameterFit.fit(TransportModel.of(plume, Observable.RESIDENT)
            .withFree(Parameter.VELOCITY, Parameter.DISPERSION, Parameter.SOURCE)
            .withValue(Parameter.RETARDATION, 1.8).withValue(Parameter.DECAY, 0.04),
            Observations.profile(2.0, x, c3a).and(Observations.profile(4.0, x, c3b)));
        assertRecovered(f3, Parameter.VELOCITY, 0.5);
        assertRecovered(f3, Parameter.DISPERSION, 0.03);
        assertRecovered(f3, Parameter.SOURCE, 0.7);

        final ModelFamily step = ModelFamily.step(0.0, InitialStep.Side.LEFT);
        final Solution1D s4 = step.create(TransportParameters.of(0.5, 0.03), 1.0);
        final double[] c4 = new double[x.length];
        s4.values(x, 3.0, c4);
        final FitResult f4 = ParameterFit.fit(TransportModel.of(step, Observable.RESIDENT),
            Observations.profile(3.0, x, c4));
        assertRecovered(f4, Parameter.VELOCITY, 0.5);
        assertRecovered(f4, Parameter.DISPERSION, 0.03);
    }

    /**
     * 200 seeded repetitions of a two-parameter fit (v, D) to 50 points of a flux-averaged
     * pulse breakthrough with Gaussian noise of standard deviation 2 % of the peak: the 95 %
     * intervals must cover the true values 90–99 % of the time (the check); the
     * binomial standard deviation of the count at 95 % is 3 of 200.
     */
    @Test
    void confidenceIntervalsCoverTheTruth() {
        final ModelFamily family = ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.5));
        final double v = 0.6;
        final double d = 0.015;
        final Solution1D truth = family.create(TransportParameters.of(v, d), 1.0);
        final double[] t = grid(0.1, 5, 50);
        final double[] clean = breakthrough(truth, 1.0, t, true);
        double peak = 0;
        for (double c : clean) {
            peak = Math.max(peak, c);
        }
        final double sigma = 0.02 * peak;
        final SplittableRandom random = new SplittableRandom(20240607L);
        final TransportModel model = TransportModel.of(family, Observable.FLUX_AVERAGED);
        int coverV = 0;
        int coverD = 0;
        final int reps = 200;
        for (int r = 0; r < reps; r++) {
            final double[] noisy = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                noisy[i] = clean[i] + sigma * gaussian(random);
            }
            final FitResult fit = ParameterFit.fit(model,
                Observations.breakthrough(1.0, t, noisy));
            assertTrue(fit.isConverged(), fit::toString);
            if (fit.lower95(Parameter.VELOCITY) <= v && v <= fit.upper95(Parameter.VELOCITY)) {
                coverV++;
            }
            if (fit.lower95(Parameter.DISPERSION) <= d
                && d <= fit.upper95(Parameter.DISPERSION)) {
                coverD++;
            }
        }
        System.out.printf("fit coverage over %d seeded repetitions: v %d, D %d%n", reps, coverV,
            coverD);
        assertTrue(coverV >= 180 && coverV <= 198, "v covered " + coverV + " of " + reps);
        assertTrue(coverD >= 180 && coverD <= 198, "D covered " + coverD + " of " + reps);
    }

    /** Standard normal deviate by the Box–Muller transform (Box &amp; Muller 1958). */
    private static double gaussian(SplittableRandom random) {
        final double u = 1 - random.nextDouble();
        final double w = random.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * w);
    }

    @Test
    void statisticsOfAKnownLinearCase() {
        // The source enters linearly: with v, D fixed and only C₀ free, the fit is linear
        // least squares, C₀ = Σ c·m/Σ m², SE = s/√(Σ m²).
        final ModelFamily family = ModelFamily.firstTypeInlet(InletInput.pulse(1, 0.5));
        final Solution1D unit = family.create(TransportParameters.of(1, 0.05), 1.0);
        final double[] t = grid(0.2, 3, 30);
        final double[] m = breakthrough(unit, 1.0, t, false);
        final double[] c = new double[t.length];
        final SplittableRandom random = new SplittableRandom(7);
        double smm = 0;
        double scm = 0;
        for (int i = 0; i < t.length; i++) {
            c[i] = 2 * m[i] + 0.01 * gaussian(random);
            smm += m[i] * m[i];
            scm += c[i] * m[i];
        }
        final double est = scm / smm;
        double rss = 0;
        for (int i = 0; i < t.length; i++) {
            rss += (c[i] - est * m[i]) * (c[i] - est * m[i]);
        }
        final double se = Math.sqrt(rss / (t.length - 1) / smm);
        final FitResult fit = ParameterFit.fit(TransportModel.of(family, Observable.RESIDENT)
            .withFree(Parameter.SOURCE).withValue(Parameter.VELOCITY, 1)
            .withValue(Parameter.DISPERSION, 0.05), Observations.breakthrough(1.0, t, c));
        assertEquals(est, fit.value(Parameter.SOURCE), 1e-9 * est);
        assertEquals(se, fit.standardError(Parameter.SOURCE), 1e-6 * se);
        // t quantile with 29 degrees of freedom: 2.0452296421327 (tables; e.g. NIST/SEMATECH
        // e-Handbook 1.3.6.7.2 gives 2.045)
        assertEquals(2.045229642, (fit.upper95(Parameter.SOURCE) - est) / se, 1e-6);
        assertEquals(1.0, fit.correlation()[0][0], 0);
        assertEquals(t.length, fit.residuals().length);
    }

    @Test
    void vAndRTogetherAreNotIdentifiable() {
        // only v/R and D/R enter a single family's solution
        final ModelFamily family = ModelFamily.firstTypeInlet(InletInput.constant(1));
        final Solution1D s = family.create(TransportParameters.of(0.5, 0.03)
            .withRetardation(2), 1.0);
        final double[] t = grid(0.1, 10, 40);
        final FitResult fit = ParameterFit.fit(TransportModel.of(family, Observable.RESIDENT)
            .withFree(Parameter.VELOCITY, Parameter.DISPERSION, Parameter.RETARDATION),
            Observations.breakthrough(1, t, breakthrough(s, 1, t, false)));
        assertEquals(FitStatus.NOT_IDENTIFIABLE, fit.status(), fit::toString);
        assertFalse(fit.isConverged());
        assertTrue(fit.message().contains("not determined"), fit.message());
        assertThrows(IllegalStateException.class, () -> fit.standardError(Parameter.VELOCITY));
        assertThrows(IllegalStateException.class, fit::correlation);
    }

    @Test
    void decayOfDataWithoutDecayRunsOntoItsBound() {
        final ModelFamily family = ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.5));
        final Solution1D s = family.create(TransportParameters.of(0.6, 0.015), 1.0);
        final double[] t = grid(0.1, 5, 50);
        final FitResult fit = ParameterFit.fit(TransportModel.of(family,
                Observable.FLUX_AVERAGED).withFree(Parameter.VELOCITY, Parameter.DISPERSION,
                Parameter.DECAY),
            Observations.breakthrough(1.0, t, breakthrough(s, 1.0, t, true)));
        assertEquals(FitStatus.AT_BOUND, fit.status(), fit::toString);
        assertTrue(fit.message().contains("mu"), fit.message());
    }

    @Test
    void badDataGiveClearIllegalArgumentExceptions() {
        final double[] t = {1, 2, 3};
        assertMessage("t[1] = -2.0", () -> Observations.breakthrough(1, new double[] {1, -2, 3},
            new double[] {0, 1, 0}));
        assertMessage("c[2] = NaN", () -> Observations.breakthrough(1, t,
            new double[] {0, 1, Double.NaN}));
        assertMessage("all 3 concentrations are 0", () -> Observations.breakthrough(1, t,
            new double[3]));
        assertMessage("weights[0] = -1.0", () -> Observations.breakthrough(1, t,
            new double[] {0, 1, 0}, new double[] {-1, 1, 1}));
        assertMessage("c: needs 3", () -> Observations.breakthrough(1, t, new double[2]));
        assertMessage("x = Infinity", () -> Observations.breakthrough(Double.POSITIVE_INFINITY,
            t, new double[] {0, 1, 0}));
        final TransportModel model = TransportModel.of(
            ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.5)), Observable.FLUX_AVERAGED)
            .withFree(Parameter.VELOCITY, Parameter.DISPERSION, Parameter.SOURCE);
        assertMessage("3 points for 3 free parameters", () -> ParameterFit.fit(model,
            Observations.breakthrough(1, t, new double[] {0, 1, 0})));
        assertMessage("D: a fixed dispersion needs a value", () -> ParameterFit.fit(
            model.withFree(Parameter.VELOCITY), Observations.breakthrough(1,
                new double[] {1, 2, 3, 4}, new double[] {0, 1, 0.5, 0})));
        assertMessage("v = -1.0", () -> ParameterFit.fit(model.withValue(Parameter.VELOCITY, -1),
            Observations.breakthrough(1, new double[] {1, 2, 3, 4},
                new double[] {0, 1, 0.5, 0})));
        assertMessage("custom family", () -> ParameterFit.fit(TransportModel.of(
            ModelFamily.custom((p, s) -> null), Observable.RESIDENT),
            Observations.breakthrough(1, new double[] {1, 2, 3, 4},
                new double[] {0, 1, 0.5, 0})));
        assertMessage("model", () -> ParameterFit.fit(null, Observations.breakthrough(1, t,
            new double[] {0, 1, 0})));
    }

    @Test
    void aModelThatCannotBeEvaluatedIsAFailedFitNotAnException() {
        // a fixed negative velocity is invalid for the flux inlet: reported, not thrown
        final TransportModel model = TransportModel.of(
                ModelFamily.thirdTypeInlet(InletInput.pulse(1, 0.5)), Observable.FLUX_AVERAGED)
            .withFree(Parameter.DISPERSION).withValue(Parameter.VELOCITY, -0.5)
            .withValue(Parameter.DISPERSION, 0.01);
        final FitResult fit = ParameterFit.fit(model, Observations.breakthrough(1,
            new double[] {1, 2, 3, 4}, new double[] {0, 1, 0.5, 0}));
        assertEquals(FitStatus.MODEL_FAILED, fit.status());
        assertTrue(fit.message().contains("v = -0.5"), fit.message());
    }

    @Test
    void customFamiliesFitFromGivenStartingValues() {
        final ModelFamily custom = ModelFamily.custom((p, m) -> org.advecta.solution
            .InitialGaussian.of(p, 0.0, 0.05, m));
        final Solution1D truth = custom.create(TransportParameters.of(0.4, 0.02), 2.0);
        final double[] x = grid(-0.5, 3, 40);
        final double[] c = new double[x.length];
        truth.values(x, 2.0, c);
        final FitResult fit = ParameterFit.fit(TransportModel.of(custom, Observable.RESIDENT)
            .withFree(Parameter.VELOCITY, Parameter.DISPERSION, Parameter.SOURCE)
            .withValue(Parameter.VELOCITY, 0.3).withValue(Parameter.DISPERSION, 0.01)
            .withValue(Parameter.SOURCE, 1.0), Observations.profile(2.0, x, c));
        assertRecovered(fit, Parameter.VELOCITY, 0.4);
        assertRecovered(fit, Parameter.DISPERSION, 0.02);
        assertRecovered(fit, Parameter.SOURCE, 2.0);
        // a builder that returns null is a failed model, not an exception
        final FitResult broken = ParameterFit.fit(TransportModel.of(
                ModelFamily.custom((p, m) -> null), Observable.RESIDENT)
            .withValue(Parameter.VELOCITY, 0.3).withValue(Parameter.DISPERSION, 0.01),
            Observations.profile(2.0, x, c));
        assertEquals(FitStatus.MODEL_FAILED, broken.status(), broken::toString);
    }

    private static void assertMessage(String expected,
                                      org.junit.jupiter.api.function.Executable call) {
        final IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }
}
